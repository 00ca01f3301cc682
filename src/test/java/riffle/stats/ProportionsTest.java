package riffle.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class ProportionsTest {

  private static void assertInterval(double lower, double upper, Interval actual, double tol) {
    assertEquals(lower, actual.lower(), tol, "lower limit of " + actual);
    assertEquals(upper, actual.upper(), tol, "upper limit of " + actual);
  }

  @Test
  @DisplayName("Wilson without correction: Newcombe (1998) Stat Med 17:857, Table I, method 3")
  void wilsonMatchesNewcombeTableOne() {
    assertInterval(0.255289, 0.366210, Proportions.wilson(81, 263), 5e-7);
    assertInterval(0.0624, 0.1605, Proportions.wilson(15, 148), 5e-5);
    assertInterval(0.0000, 0.1611, Proportions.wilson(0, 20), 5e-5);
    assertInterval(0.0061, 0.1718, Proportions.wilson(1, 29), 5e-5);
  }

  @Test
  @DisplayName(
      "Wilson with continuity correction: Newcombe (1998) Stat Med 17:857, Table I, method 4")
  void correctedWilsonMatchesNewcombeTableOne() {
    assertInterval(0.2535, 0.3682, Proportions.wilson(81, 263, 0.95, true), 5e-5);
    assertInterval(0.0598, 0.1644, Proportions.wilson(15, 148, 0.95, true), 5e-5);
    assertInterval(0.0000, 0.2005, Proportions.wilson(0, 20, 0.95, true), 5e-5);
    assertInterval(0.0018, 0.1963, Proportions.wilson(1, 29, 0.95, true), 5e-5);
  }

  @Test
  @DisplayName("Newcombe hybrid score: Newcombe (1998) Stat Med 17:873, Table II, method 10")
  void newcombeMatchesTableTwo() {
    assertInterval(0.0524, 0.3339, Proportions.newcombe(56, 70, 48, 80), 5e-5);
    assertInterval(0.1705, 0.8090, Proportions.newcombe(9, 10, 3, 10), 5e-5);
    assertInterval(0.0582, 0.8062, Proportions.newcombe(6, 7, 2, 7), 5e-5);
    assertInterval(-0.0381, 0.1926, Proportions.newcombe(5, 56, 0, 29), 5e-5);
    assertInterval(-0.1611, 0.2775, Proportions.newcombe(0, 10, 0, 20), 5e-5);
    assertInterval(0.6791, 1.0000, Proportions.newcombe(10, 10, 0, 20), 5e-5);
  }

  /**
   * The score interval is the set of p whose score test does not reject: at each limit the
   * standardised distance |p̂ − p| / √(p(1 − p)/n) equals z. Checked on seeded random inputs and
   * levels, with z from commons-math3's normal quantile (NormalQuantileTest checks ours).
   */
  @Test
  void wilsonLimitsAreWhereTheScoreTestJustRejects() {
    Random random = new Random(1998L);
    for (int i = 0; i < 2_000; i++) {
      long n = 1 + random.nextInt(i % 2 == 0 ? 50 : 100_000);
      long r = (long) Math.floor(random.nextDouble() * (n + 1));
      double confidence = 0.5 + 0.499 * random.nextDouble();
      double z =
          new org.apache.commons.math3.distribution.NormalDistribution(null, 0, 1)
              .inverseCumulativeProbability(1 - (1 - confidence) / 2);
      Interval ci = Proportions.wilson(r, n, confidence, false);
      double phat = (double) r / n;
      for (double limit : new double[] {ci.lower(), ci.upper()}) {
        if (limit == 0 || limit == 1) {
          continue;
        }
        double score = Math.abs(phat - limit) / Math.sqrt(limit * (1 - limit) / n);
        assertEquals(z, score, 1e-6 * z, "r=" + r + ", n=" + n + ", level " + confidence);
      }
      assertTrue(ci.contains(phat));
    }
  }

  @Test
  void intervalsWidenWithConfidenceAndStayInsideTheUnitRange() {
    Interval ninety = Proportions.wilson(12, 40, 0.90, false);
    Interval ninetyNine = Proportions.wilson(12, 40, 0.99, false);
    assertTrue(ninetyNine.width() > ninety.width());
    assertEquals(1.0, Proportions.wilson(40, 40).upper());
    assertEquals(new Interval(0, 1), Proportions.wilson(0, 0));
    Interval diff = Proportions.newcombe(0, 1, 1, 1);
    assertTrue(diff.lower() >= -1 && diff.upper() <= 1);
  }

  @Test
  void rejectsImpossibleCounts() {
    assertThrows(IllegalArgumentException.class, () -> Proportions.wilson(5, 4));
    assertThrows(IllegalArgumentException.class, () -> Proportions.wilson(-1, 4));
    assertThrows(IllegalArgumentException.class, () -> Proportions.newcombe(0, 0, 1, 2));
    assertThrows(IllegalArgumentException.class, () -> Proportions.wilson(1, 4, 1.0, false));
    assertThrows(IllegalArgumentException.class, () -> new Interval(2, 1));
  }
}
