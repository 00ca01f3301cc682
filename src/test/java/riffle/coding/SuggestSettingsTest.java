package riffle.coding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import riffle.model.InputException;

class SuggestSettingsTest {
  @Test
  void defaultsAreTheDocumentedOnes() {
    SuggestSettings s = SuggestSettings.defaults();
    assertEquals(5, s.folds());
    assertEquals(0.8, s.targetPrecision());
    assertEquals(8, s.minExamples());
    assertEquals(2, s.cutoff());
    assertEquals(SuggestSettings.DEFAULT_SEED, s.seed());
    assertTrue(s.toString().contains("minExamples=8"));
  }

  @Test
  void builderKeepsWhatIsSet() {
    SuggestSettings s =
        SuggestSettings.builder()
            .seed(7)
            .folds(10)
            .targetPrecision(0.9)
            .minExamples(3)
            .cutoff(1)
            .get();
    assertEquals(7, s.seed());
    assertEquals(10, s.folds());
    assertEquals(0.9, s.targetPrecision());
    assertEquals(3, s.minExamples());
    assertEquals(1, s.cutoff());
  }

  @Test
  void valuesOutOfRangeAreRefusedNamingTheSetting() {
    assertMessage("folds must be between 2 and 20, got 1", SuggestSettings.builder().folds(1));
    assertMessage(
        "targetPrecision must be above 0 and at most 1, got 1.5",
        SuggestSettings.builder().targetPrecision(1.5));
    assertMessage(
        "targetPrecision must be above 0 and at most 1, got NaN",
        SuggestSettings.builder().targetPrecision(Double.NaN));
    assertMessage(
        "minExamples must be between 2 and 10000, got 1", SuggestSettings.builder().minExamples(1));
    assertMessage("cutoff must be between 1 and 100, got 0", SuggestSettings.builder().cutoff(0));
  }

  private static void assertMessage(String message, SuggestSettings.Builder b) {
    assertEquals(message, assertThrows(InputException.class, b::get).getMessage());
  }
}
