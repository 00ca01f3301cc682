package riffle.quotes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.api.Test;
import riffle.model.InputException;

class QuoteSettingsTest {
  @Test
  void defaultsAreTheDocumentedOnes() {
    QuoteSettings s = QuoteSettings.defaults();
    assertEquals(6, s.minWords());
    assertEquals(25, s.maxWords());
    assertEquals(10, s.headlineMaxWords());
    assertEquals(5, s.perCode());
    assertEquals(10, s.perSlot());
    assertEquals(5, s.leadingThemes());
    assertEquals(2, s.objectionQuotes());
    assertEquals(0.6, s.similarity());
    assertEquals(Optional.empty(), s.latestWave());
    assertEquals(Set.of(), s.waves());
    assertEquals(Map.of(), s.segments());
    assertEquals(Set.of(), s.codes());
  }

  @Test
  void badValuesAreRefusedWithWhatIsAllowed() {
    assertEquals(
        "quote length must satisfy 1 <= min words <= max words <= 100, got 9 to 4",
        message(QuoteSettings.builder().words(9, 4)));
    assertEquals(
        "quotes per code must be 1 to 1000, got 0", message(QuoteSettings.builder().perCode(0)));
    assertEquals(
        "headline max words must be 2 to 30, got 1",
        message(QuoteSettings.builder().headlineMaxWords(1)));
    assertEquals(
        "candidates per slot must be 1 to 1000, got 0",
        message(QuoteSettings.builder().perSlot(0)));
    assertEquals(
        "leading themes must be 1 to 100, got 0",
        message(QuoteSettings.builder().leadingThemes(0)));
    assertEquals(
        "quotes per objection must be 1 to 20, got 21",
        message(QuoteSettings.builder().objectionQuotes(21)));
    assertEquals(
        "the near-duplicate similarity must be above 0 and at most 1, got 0.0",
        message(QuoteSettings.builder().similarity(0)));
    assertEquals("the latest wave needs a name", message(QuoteSettings.builder().latestWave(" ")));
  }

  @Test
  void givenValuesAreKept() {
    QuoteSettings s =
        QuoteSettings.builder()
            .words(4, 30)
            .latestWave("Wave 3")
            .waves(Set.of("Wave 3"))
            .segments(Map.of("device", "mobile"))
            .codes(Set.of(3L))
            .get();
    assertEquals(4, s.minWords());
    assertEquals(30, s.maxWords());
    assertEquals(Optional.of("Wave 3"), s.latestWave());
    assertEquals(Set.of("Wave 3"), s.waves());
    assertEquals(Map.of("device", "mobile"), s.segments());
    assertEquals(Set.of(3L), s.codes());
  }

  private static String message(QuoteSettings.Builder b) {
    return assertThrows(InputException.class, b::get).getMessage();
  }
}
