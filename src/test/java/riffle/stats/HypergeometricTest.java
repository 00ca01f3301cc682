package riffle.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import org.apache.commons.math3.distribution.HypergeometricDistribution;
import org.junit.jupiter.api.Test;

class HypergeometricTest {

  /** commons-math3 3.6.1's HypergeometricDistribution on seeded random populations up to 20,000. */
  @Test
  void agreesWithCommonsMathOnSeededInputs() {
    Random random = new Random(1977L);
    for (int i = 0; i < 600; i++) {
      int scale = i % 3 == 0 ? 20_000 : i % 3 == 1 ? 2_000 : 40;
      int population = 2 + random.nextInt(scale);
      int successes = random.nextInt(population + 1);
      int draws = 1 + random.nextInt(population);
      HypergeometricDistribution reference =
          new HypergeometricDistribution(null, population, successes, draws);
      Hypergeometric ours = new Hypergeometric(population, successes, draws);
      int lo = Math.max(0, draws - (population - successes));
      int hi = Math.min(draws, successes);
      if (lo == hi) {
        // One possible count (commons-math3 answers NaN for these degenerate margins).
        assertEquals(1, ours.pmf(lo), 1e-12);
        continue;
      }
      for (int k = 0; k < 5; k++) {
        int x = lo + (int) Math.round((hi - lo) * random.nextDouble());
        String where = "N=" + population + ", M=" + successes + ", n=" + draws + ", x=" + x;
        double pmf = reference.probability(x);
        double cdf = reference.cumulativeProbability(x);
        double upper = reference.upperCumulativeProbability(x);
        assertEquals(pmf, ours.pmf(x), 1e-13 + 1e-9 * pmf, where);
        assertEquals(cdf, ours.cdf(x), 1e-12 + 1e-8 * cdf, where);
        assertEquals(upper, ours.upper(x), 1e-12 + 1e-8 * upper, where);
      }
    }
  }

  @Test
  void outsideTheSupportTheProbabilitiesAreZeroOrOne() {
    // 10 drawn from 12 holding 5 successes: at least 3 successes, at most 5.
    Hypergeometric h = new Hypergeometric(12, 5, 10);
    assertEquals(0, h.pmf(2));
    assertEquals(0, h.pmf(6));
    assertEquals(0, h.cdf(2));
    assertEquals(1, h.cdf(5));
    assertEquals(1, h.upper(3));
    assertEquals(0, h.upper(6));
    double sum = 0;
    for (int x = 3; x <= 5; x++) {
      sum += h.pmf(x);
    }
    assertEquals(1, sum, 1e-12);
  }

  @Test
  void refusesImpossibleCounts() {
    assertThrows(IllegalArgumentException.class, () -> new Hypergeometric(10, 11, 3));
    assertThrows(IllegalArgumentException.class, () -> new Hypergeometric(10, 3, 11));
    assertThrows(IllegalArgumentException.class, () -> new Hypergeometric(-1, 0, 0));
  }
}
