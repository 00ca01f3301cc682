package riffle.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.distribution.HypergeometricDistribution;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class FinitePopulationTest {
  static final double Z = 1.959963984540054;

  /**
   * Cochran WG (1977) Sampling Techniques, 3rd ed., ch. 3, the example of §3.6 (recalled from
   * memory; the figures below are recomputed with the book's formulas): of 200 names drawn at
   * random from a list of 3,042, 38 had a wrong address. The estimated total is Np = 578; Theorem
   * 3.2's estimated standard error of it, N √((N − n)/(N(n − 1)) pq), is 81.8; and the normal
   * limits with the continuity correction N/(2n), Np ± (1.96 s + 7.6), are 410 and 746.
   */
  @Test
  @DisplayName("Cochran (1977) ch. 3: 38 wrong addresses in 200 of 3,042 names — 578, s.e. 81.8")
  void cochransWrongAddresses() {
    Projection p = FinitePopulation.project(38, 200, 3_042).orElseThrow();
    assertEquals(578, Math.round(p.projected()));
    assertEquals(81.8, p.standardError().orElseThrow(), 0.05);
    double continuity = 3_042 / (2.0 * 200);
    assertEquals(
        410, Math.round(p.projected() - (Z * p.standardError().getAsDouble() + continuity)));
    assertEquals(
        746, Math.round(p.projected() + (Z * p.standardError().getAsDouble() + continuity)));
    // Wilson's limits with the same correction are not symmetric about 578: the share is below ½.
    assertEquals(0.1431, p.interval().lower(), 5e-5);
    assertEquals(0.2478, p.interval().upper(), 5e-5);
    assertEquals(436, p.lower());
    assertEquals(753, p.upper());
  }

  /**
   * Cochran (1977) ch. 3, Theorem 3.1: V(p) = (PQ/n)(N − n)/(N − 1). The interval's limits are the
   * shares P at which the sample share lies exactly z standard errors away under that variance.
   */
  @Test
  void wilsonLimitsLieZStandardErrorsFromTheShareUnderCochransVariance() {
    Random random = new Random(31L);
    int checked = 0;
    for (int i = 0; i < 3_000; i++) {
      long population = 2 + random.nextInt(i % 2 == 0 ? 300 : 50_000);
      long n = 1 + (long) Math.floor(random.nextDouble() * (population - 1));
      long r = (long) Math.floor(random.nextDouble() * (n + 1));
      double confidence = 0.8 + 0.19 * random.nextDouble();
      double z = Normal.criticalValue(confidence);
      double p = (double) r / n;
      Interval w = FinitePopulation.wilson(r, n, population, confidence);
      for (double limit : new double[] {w.lower(), w.upper()}) {
        boolean cut =
            limit == (double) r / population
                || limit == (double) (r + population - n) / population
                || limit == 0
                || limit == 1;
        if (cut) {
          continue;
        }
        double variance = limit * (1 - limit) / n * (population - n) / (population - 1);
        String where = r + "/" + n + " of " + population + " at " + confidence;
        assertEquals(z, Math.abs(p - limit) / Math.sqrt(variance), 1e-7, where);
        checked++;
      }
    }
    assertTrue(checked > 4_000, "enough interior limits checked: " + checked);
  }

  @Test
  @DisplayName("Far more answers than read: the ordinary Wilson interval, Newcombe (1998) Table I")
  void aHugePopulationGivesWilsonsInterval() {
    Interval w = FinitePopulation.wilson(81, 263, 1_000_000_000_000L, 0.95);
    assertEquals(0.255289, w.lower(), 5e-6);
    assertEquals(0.366210, w.upper(), 5e-6);
    Interval none = FinitePopulation.wilson(0, 20, 1_000_000_000_000L, 0.95);
    assertEquals(0, none.lower());
    assertEquals(0.1611, none.upper(), 5e-5);
  }

  @Test
  void readingEveryAnswerLeavesNoSamplingError() {
    assertEquals(new Interval(0.25, 0.25), FinitePopulation.wilson(25, 100, 100, 0.95));
    assertEquals(new Interval(0.25, 0.25), FinitePopulation.exact(25, 100, 100, 0.95));
    Projection all = FinitePopulation.project(25, 100, 100).orElseThrow();
    assertTrue(all.census());
    assertEquals(25, all.projected(), 1e-12);
    assertEquals(25, all.lower());
    assertEquals(25, all.upper());
    assertEquals(0, all.standardError().orElseThrow());
  }

  @Test
  void reachingTheEdgesKeepsTheLimitsToWhatThePopulationCanHold() {
    // None of 200 read carries the code: the share may still be above 0, never above the unread.
    Projection none = FinitePopulation.project(0, 200, 2_000).orElseThrow();
    assertEquals(0, none.interval().lower());
    assertTrue(none.interval().upper() > 0.01 && none.interval().upper() < 0.03, none.toString());
    assertEquals(0, none.lower());
    assertTrue(none.upper() > 20 && none.upper() < 60, none.toString());
    // Every one read carries it.
    Projection every = FinitePopulation.project(200, 200, 2_000).orElseThrow();
    assertEquals(1, every.interval().upper());
    assertEquals(2_000, every.upper());
    assertTrue(every.lower() > 1_940 && every.lower() < 1_990, every.toString());
    // Nine of ten read, one unread: the count is 9 or 10, whatever the normal theory says.
    Projection nearly = FinitePopulation.project(9, 10, 11).orElseThrow();
    assertTrue(nearly.lower() >= 9 && nearly.upper() <= 10, nearly.toString());
    assertTrue(nearly.interval().lower() >= 9.0 / 11, nearly.toString());
    // One read, from a wave of one thousand: an interval, but no standard error.
    Projection one = FinitePopulation.project(1, 1, 1_000).orElseThrow();
    assertFalse(one.standardError().isPresent());
    assertTrue(one.interval().lower() < 0.3, one.toString());
  }

  @Test
  void theReadmesExampleProjectsAboutElevenHundredAndForty() {
    Projection p = FinitePopulation.project(228, 1_000, 5_000).orElseThrow();
    assertEquals(1_140, p.projected(), 1e-9);
    assertEquals(1_028, p.lower());
    assertEquals(1_260, p.upper());
    assertFalse(p.census());
  }

  @Test
  void nothingReadGivesNoEstimate() {
    assertTrue(FinitePopulation.project(0, 0, 500).isEmpty());
    assertThrows(IllegalArgumentException.class, () -> FinitePopulation.wilson(0, 0, 500, 0.95));
    assertThrows(IllegalArgumentException.class, () -> FinitePopulation.project(3, 2, 500));
    assertThrows(IllegalArgumentException.class, () -> FinitePopulation.project(1, 600, 500));
    assertThrows(IllegalArgumentException.class, () -> FinitePopulation.exact(1, 2, 5, 1.0));
  }

  /**
   * The exact interval's limits are where commons-math3's hypergeometric tails cross (1 − level)/2:
   * the lower limit is the smallest M whose upper tail at r exceeds it, the upper limit the largest
   * M whose lower tail at r does.
   */
  @Test
  void exactLimitsAreWhereCommonsMathTailsCrossTheLevel() {
    Random random = new Random(1987L);
    for (int i = 0; i < 300; i++) {
      int population = 2 + random.nextInt(i % 2 == 0 ? 60 : 3_000);
      int n = 1 + random.nextInt(population);
      int r = random.nextInt(n + 1);
      double tail = (1 - 0.95) / 2;
      Interval e = FinitePopulation.exact(r, n, population, 0.95);
      long lower = Math.round(e.lower() * population);
      long upper = Math.round(e.upper() * population);
      String where = r + "/" + n + " of " + population;
      if (r > 0) {
        assertTrue(upperTail(population, lower, n, r) > tail, where);
        assertTrue(lower == r || upperTail(population, lower - 1, n, r) <= tail, where);
      } else {
        assertEquals(0, lower, where);
      }
      if (r < n) {
        assertTrue(lowerTail(population, upper, n, r) > tail, where);
        assertTrue(
            upper == r + population - n || lowerTail(population, upper + 1, n, r) <= tail, where);
      } else {
        assertEquals(population, upper, where);
      }
    }
  }

  private static double upperTail(int population, long successes, int n, int r) {
    return new HypergeometricDistribution(null, population, (int) successes, n)
        .upperCumulativeProbability(r);
  }

  private static double lowerTail(int population, long successes, int n, int r) {
    return new HypergeometricDistribution(null, population, (int) successes, n)
        .cumulativeProbability(r);
  }

  /**
   * The measurement that chose the interval: for N = 2,000 and n = 200, the probability that each
   * interval covers the true share M/N, summed exactly over commons-math3's hypergeometric
   * distribution for every M from 20 to 1,980 (as {@code CoverageBench} prints). Wilson's averages
   * the nominal 95%; the exact one never falls below it but averages about 96% and covers rare
   * codes nearly always (it is wider than it needs to be).
   */
  @Test
  void wilsonAveragesTheNominalCoverageAndTheExactIntervalOverCovers() {
    int population = 2_000;
    int n = 200;
    Interval[] wilson = new Interval[n + 1];
    Interval[] exact = new Interval[n + 1];
    for (int r = 0; r <= n; r++) {
      wilson[r] = FinitePopulation.wilson(r, n, population, 0.95);
      exact[r] = FinitePopulation.exact(r, n, population, 0.95);
    }
    double wilsonSum = 0;
    double exactSum = 0;
    double wilsonLeast = 1;
    double exactLeast = 1;
    double exactMost = 0;
    int wilsonInBand = 0;
    int exactInBand = 0;
    int shares = 0;
    for (int m = 20; m <= 1_980; m++) {
      HypergeometricDistribution h = new HypergeometricDistribution(null, population, m, n);
      double truth = (double) m / population;
      double w = 0;
      double e = 0;
      for (int r = Math.max(0, n - (population - m)); r <= Math.min(n, m); r++) {
        double pr = h.probability(r);
        w += wilson[r].contains(truth) ? pr : 0;
        e += exact[r].contains(truth) ? pr : 0;
      }
      wilsonSum += w;
      exactSum += e;
      wilsonLeast = Math.min(wilsonLeast, w);
      exactLeast = Math.min(exactLeast, e);
      exactMost = Math.max(exactMost, e);
      wilsonInBand += w >= 0.935 && w <= 0.965 ? 1 : 0;
      exactInBand += e >= 0.935 && e <= 0.965 ? 1 : 0;
      shares++;
    }
    double wilsonMean = wilsonSum / shares;
    double exactMean = exactSum / shares;
    assertEquals(0.95, wilsonMean, 0.002, "Wilson's mean coverage");
    assertTrue(wilsonLeast > 0.92, "Wilson's least coverage " + wilsonLeast);
    assertTrue(exactLeast >= 0.95 - 1e-9, "exact least coverage " + exactLeast);
    assertTrue(exactMean > 0.958, "exact mean coverage " + exactMean);
    assertTrue(exactMost > 0.99, "exact coverage of rare codes " + exactMost);
    // The band, 93.5–96.5%: Wilson's coverage lies in it for 97.9% of the shares, the
    // exact interval's for 84.4%.
    assertTrue(wilsonInBand > 0.97 * shares, "Wilson inside the band: " + wilsonInBand);
    assertTrue(exactInBand < 0.86 * shares, "exact inside the band: " + exactInBand);
  }

  /**
   * The check of issue 13: 2,000 waves of N = 2,000 answers with a known share, 200 read at random
   * from each (a partial Fisher–Yates shuffle with a seeded generator); the 95% interval must cover
   * the true share in 93.5–96.5% of the waves.
   */
  @ParameterizedTest
  @ValueSource(doubles = {0.05, 0.2, 0.5})
  void simulatedWavesAreCoveredAtTheNominalRate(double share) {
    int population = 2_000;
    int n = 200;
    int waves = 2_000;
    int carrying = (int) Math.round(share * population);
    double truth = (double) carrying / population;
    Random random = new Random(13L + carrying);
    int[] answers = new int[population];
    int covered = 0;
    for (int wave = 0; wave < waves; wave++) {
      for (int i = 0; i < population; i++) {
        answers[i] = i < carrying ? 1 : 0;
      }
      int r = 0;
      for (int i = 0; i < n; i++) {
        int j = i + random.nextInt(population - i);
        int t = answers[i];
        answers[i] = answers[j];
        answers[j] = t;
        r += answers[i];
      }
      if (FinitePopulation.project(r, n, population).orElseThrow().interval().contains(truth)) {
        covered++;
      }
    }
    double coverage = (double) covered / waves;
    assertTrue(
        coverage >= 0.935 && coverage <= 0.965, "coverage at share " + share + ": " + coverage);
  }
}
