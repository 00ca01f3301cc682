package riffle.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.distribution.HypergeometricDistribution;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class FisherExactTest {

  @Test
  @DisplayName(
      "Tea tasting: Fisher (1935), Agresti (2002) p. 91 — 17/70 one-sided, 34/70 two-sided")
  void teaTastingTable() {
    assertEquals(17.0 / 70, FisherExact.greater(3, 1, 1, 3), 1e-12);
    assertEquals(34.0 / 70, FisherExact.twoSided(3, 1, 1, 3), 1e-12);
    assertEquals(1 - 1.0 / 70, FisherExact.less(3, 1, 1, 3), 1e-12);
  }

  @Test
  @DisplayName(
      "Convictions of twins: R fisher.test documentation, values from src/test/resources/riffle/stats/checks.md")
  void convictionsOfTwins() {
    assertEquals(0.000465181, FisherExact.less(2, 10, 15, 3), 5e-10);
    assertEquals(0.000536724, FisherExact.twoSided(2, 10, 15, 3), 5e-10);
  }

  /** commons-math3's HypergeometricDistribution, on seeded random tables up to n = 100,000. */
  @Test
  void agreesWithCommonsMathHypergeometricTails() {
    Random random = new Random(1935L);
    for (int i = 0; i < 400; i++) {
      int scale = i % 4 == 0 ? 100_000 : i % 4 == 1 ? 2_000 : 60;
      int n = 1 + random.nextInt(scale);
      int m = random.nextInt(n + 1);
      int k = random.nextInt(n + 1);
      HypergeometricDistribution h = new HypergeometricDistribution(null, n, m, k);
      int lo = Math.max(0, k - (n - m));
      int hi = Math.min(k, m);
      // Observed counts spread over the support, tails included.
      if (lo == hi) {
        // One possible table (commons-math3 mishandles these degenerate margins): p = 1.
        assertEquals(1.0, FisherExact.twoSided(lo, m - lo, k - lo, n - m - k + lo));
        continue;
      }
      int a = lo + (int) Math.round((hi - lo) * Math.pow(random.nextDouble(), i % 3 + 1));
      long b = m - a;
      long c = k - a;
      long d = n - m - k + a;
      String table = "[[" + a + ", " + b + "], [" + c + ", " + d + "]]";
      double greater = h.upperCumulativeProbability(a);
      double less = h.cumulativeProbability(a);
      assertEquals(greater, FisherExact.greater(a, b, c, d), 1e-12 + 1e-8 * greater, table);
      assertEquals(less, FisherExact.less(a, b, c, d), 1e-12 + 1e-8 * less, table);
      if (i % 4 != 0 || i < 80) {
        double twoSided = libraryTwoSided(h, a, lo, hi);
        assertEquals(twoSided, FisherExact.twoSided(a, b, c, d), 1e-12 + 1e-8 * twoSided, table);
      }
    }
  }

  private static double libraryTwoSided(HypergeometricDistribution h, int a, int lo, int hi) {
    double threshold = h.probability(a) * (1 + 1e-7);
    double sum = 0;
    for (int x = lo; x <= hi; x++) {
      double p = h.probability(x);
      if (p <= threshold) {
        sum += p;
      }
    }
    return Math.min(1, sum);
  }

  @Test
  void extremeLargeTablesGiveTinyButPositivePValues() {
    double p = FisherExact.twoSided(3_000, 47_000, 1_000, 49_000);
    assertTrue(p > 0 && p < 1e-100, "p = " + p);
    assertEquals(1.0, FisherExact.twoSided(500, 49_500, 500, 49_500), 1e-12);
    assertEquals(1.0, FisherExact.twoSided(0, 0, 0, 0));
  }

  @Test
  void rejectsNegativeCounts() {
    assertThrows(IllegalArgumentException.class, () -> FisherExact.twoSided(-1, 2, 3, 4));
  }
}
