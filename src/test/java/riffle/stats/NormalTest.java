package riffle.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;

class NormalTest {

  /** src/test/resources/riffle/stats/checks.md gives z = 1.959963984540054 for 95%. */
  @Test
  void ninetyFivePercentCriticalValueIsTheCheckedOne() {
    assertEquals(1.959963984540054, Normal.quantile(0.975), 1e-15);
    assertEquals(Normal.Z95, Normal.criticalValue(0.95));
    // Two-sided 99% value, 2.5758293035489 (tables of the normal distribution; library agrees).
    assertEquals(2.5758293035489, Normal.criticalValue(0.99), 1e-12);
  }

  /**
   * commons-math3 computes the quantile through erfInv(2p − 1), which loses digits of p below about
   * 10⁻⁶; far tails are checked by inverting Φ below instead.
   */
  @Test
  void agreesWithCommonsMathInverseCumulativeProbability() {
    NormalDistribution library = new NormalDistribution(null, 0, 1);
    Random random = new Random(241L);
    for (int i = 0; i < 5_000; i++) {
      double p =
          switch (i % 3) {
            case 0 -> random.nextDouble();
            case 1 -> Math.pow(10, -1 - 5 * random.nextDouble());
            default -> 1 - Math.pow(10, -1 - 5 * random.nextDouble());
          };
      double expected = library.inverseCumulativeProbability(p);
      assertEquals(expected, Normal.quantile(p), 1e-9 * Math.max(1, Math.abs(expected)), "p " + p);
    }
  }

  /** The quantile inverts Φ(z) = erfc(−z/√2)/2, computed with Cody's erfc (ErfTest). */
  @Test
  void quantileInvertsTheDistributionFunction() {
    for (double p = 1e-300; p < 0.5; p *= 3.7) {
      double z = Normal.quantile(p);
      double back = Erf.erfc(-z / Math.sqrt(2)) / 2;
      // A relative error e in z moves p by about z² e; allow for it.
      assertEquals(p, back, 2e-15 * (1 + z * z) * p, "p " + p);
      if (p > 1e-10) {
        // 1 − p is rounded to a multiple of 2⁻⁵³, so the mirrored quantile is a little off.
        assertEquals(-z, Normal.quantile(1 - p), 1e-15 / p);
      }
    }
  }

  @Test
  void edgesAndBadArguments() {
    assertEquals(Double.NEGATIVE_INFINITY, Normal.quantile(0));
    assertEquals(Double.POSITIVE_INFINITY, Normal.quantile(1));
    assertEquals(0, Normal.quantile(0.5));
    assertThrows(IllegalArgumentException.class, () -> Normal.quantile(1.5));
    assertThrows(IllegalArgumentException.class, () -> Normal.quantile(Double.NaN));
    assertThrows(IllegalArgumentException.class, () -> Normal.criticalValue(0));
  }
}
