package riffle.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class KeynessTest {

  /**
   * src/test/resources/riffle/stats/checks.md, "Keyness between two waves": Rayson &amp; Garside
   * (2000) log-likelihood (two-term form of the UCREL calculator) and Hardie (2014) Log Ratio,
   * library values.
   */
  @Test
  void reproducesTheWorkedKeynessExamples() {
    assertEquals(16.9899, Keyness.logLikelihood(100, 50, 100_000, 100_000), 5e-5);
    assertEquals(1.0, Keyness.logRatio(100, 50, 100_000, 100_000), 1e-12);
    assertEquals(22.0540, Keyness.logLikelihood(30, 10, 5_000, 8_000), 5e-5);
    assertEquals(2.2630, Keyness.logRatio(30, 10, 5_000, 8_000), 5e-5);
  }

  @Test
  void logRatioIsNegativeWhenTheFocusHasLessAndSymmetricWhenSwapped() {
    assertEquals(-1.0, Keyness.logRatio(50, 100, 100_000, 100_000), 1e-12);
    assertEquals(
        Keyness.logLikelihood(30, 10, 5_000, 8_000),
        Keyness.logLikelihood(10, 30, 8_000, 5_000),
        1e-12);
  }

  /**
   * Hardie (2014) replaces a zero frequency with 0.5 (the substitution is recalled from memory of
   * that note; CQPweb-style calculators do the same): 5 against 0 in equal corpora is log2(10).
   */
  @Test
  void zeroFrequencyCountsAsOneHalf() {
    assertEquals(Math.log(10) / Math.log(2), Keyness.logRatio(5, 0, 1_000, 1_000), 1e-12);
    assertEquals(-Math.log(10) / Math.log(2), Keyness.logRatio(0, 5, 1_000, 1_000), 1e-12);
    assertEquals(0, Keyness.logRatio(0, 0, 1_000, 2_000));
    assertEquals(0, Keyness.logLikelihood(0, 0, 1_000, 2_000));
    assertTrue(Keyness.logLikelihood(5, 0, 1_000, 1_000) > 6.63);
  }

  /** The two-term form leaves out the "everything else" cells, which barely matter when rare. */
  @Test
  void closeToTheFourCellStatisticForRareItems() {
    double twoTerm = Keyness.logLikelihood(30, 10, 50_000, 80_000);
    double fourCell = LogLikelihood.g2(30, 50_000 - 30, 10, 80_000 - 10);
    assertEquals(fourCell, twoTerm, fourCell * 0.01);
  }

  @Test
  void rejectsImpossibleCounts() {
    assertThrows(IllegalArgumentException.class, () -> Keyness.logLikelihood(5, 1, 4, 10));
    assertThrows(IllegalArgumentException.class, () -> Keyness.logRatio(1, 1, 0, 10));
    assertThrows(IllegalArgumentException.class, () -> Keyness.logRatio(-1, 1, 5, 10));
  }
}
