package riffle.phrases;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Set;
import org.junit.jupiter.api.Test;
import riffle.model.InputException;

class PhraseSettingsTest {

  @Test
  void defaultsAreDocumented() {
    PhraseSettings s = PhraseSettings.defaults();
    assertEquals(3, s.minAnswers());
    assertEquals(5, s.maxWords());
    assertEquals(50, s.limit());
    assertEquals(3, s.examples());
    assertEquals(PhraseSettings.DEFAULT_STOP_PHRASES, s.stopPhrases());
    assertTrue(s.stopPhrases().contains("to be honest"));
  }

  @Test
  void outOfRangeValuesAreRefusedNamingTheOption() {
    assertMessage("minAnswers", () -> PhraseSettings.builder().minAnswers(1).get());
    assertMessage("maxWords", () -> PhraseSettings.builder().maxWords(0).get());
    assertMessage("maxWords", () -> PhraseSettings.builder().maxWords(9).get());
    assertMessage("limit", () -> PhraseSettings.builder().limit(0).get());
    assertMessage("examples", () -> PhraseSettings.builder().examples(21).get());
  }

  @Test
  void stopPhrasesAreComparedInCanonicalForm() {
    PhraseSettings s =
        PhraseSettings.builder().stopPhrases(Set.of("  Didn\u2019t  Know ", "THANK you")).get();
    assertEquals(Set.of("didn't know", "thank you"), s.stopPhrases());
  }

  private static void assertMessage(String option, Runnable build) {
    InputException e = assertThrows(InputException.class, build::run);
    assertTrue(e.getMessage().startsWith(option), e.getMessage());
  }
}
