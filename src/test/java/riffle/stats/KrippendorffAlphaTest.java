package riffle.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class KrippendorffAlphaTest {
  static final double X = Double.NaN;

  /** Krippendorff (2011), four observers and twelve units, "." missing. */
  static final double[][] KRIPPENDORFF_2011 = {
    {1, 2, 3, 3, 2, 1, 4, 1, 2, X, X, X},
    {1, 2, 3, 3, 2, 2, 4, 1, 2, 5, X, 3},
    {X, 3, 3, 3, 2, 3, 4, 2, 2, 5, 1, X},
    {1, 2, 3, 3, 2, 4, 4, 1, 2, 5, 1, X}
  };

  @Test
  @DisplayName("Krippendorff (2011) example: nominal .743, ordinal .815, interval .849, ratio .797")
  void krippendorffsWorkedExample() {
    assertEquals(0.743421, alpha(KrippendorffAlpha.Level.NOMINAL), 5e-7);
    assertEquals(0.815, alpha(KrippendorffAlpha.Level.ORDINAL), 5e-4);
    assertEquals(0.849, alpha(KrippendorffAlpha.Level.INTERVAL), 5e-4);
    assertEquals(0.797, alpha(KrippendorffAlpha.Level.RATIO), 5e-4);
  }

  private static double alpha(KrippendorffAlpha.Level level) {
    return KrippendorffAlpha.alpha(KRIPPENDORFF_2011, level);
  }

  /** Two observers, ten binary units: α = 0.095 (from memory; library 0.095238). */
  @Test
  void twoObserversBinaryExample() {
    double[][] data = {{0, 1, 0, 0, 0, 0, 0, 0, 1, 0}, {1, 1, 1, 0, 0, 1, 0, 0, 0, 0}};
    assertEquals(0.095238, KrippendorffAlpha.alpha(data, KrippendorffAlpha.Level.NOMINAL), 5e-7);
  }

  @Test
  void perfectAgreementIsOneAndNoVariationIsUndefined() {
    double[][] same = {{1, 2, 3, X}, {1, 2, 3, 4}};
    assertEquals(1, KrippendorffAlpha.alpha(same, KrippendorffAlpha.Level.INTERVAL), 1e-12);
    double[][] constant = {{2, 2, 2}, {2, 2, X}};
    assertTrue(Double.isNaN(KrippendorffAlpha.alpha(constant, KrippendorffAlpha.Level.NOMINAL)));
  }

  @Test
  void rejectsUnusableData() {
    assertThrows(
        IllegalArgumentException.class,
        () ->
            KrippendorffAlpha.alpha(
                new double[][] {{1, X}, {X, 2}}, KrippendorffAlpha.Level.NOMINAL));
    assertThrows(
        IllegalArgumentException.class,
        () ->
            KrippendorffAlpha.alpha(new double[][] {{1, 2}, {1}}, KrippendorffAlpha.Level.NOMINAL));
    assertThrows(
        IllegalArgumentException.class,
        () ->
            KrippendorffAlpha.alpha(
                new double[][] {{-1, 2}, {1, 2}}, KrippendorffAlpha.Level.RATIO));
    assertThrows(
        IllegalArgumentException.class,
        () -> KrippendorffAlpha.alpha(new double[0][], KrippendorffAlpha.Level.NOMINAL));
  }
}
