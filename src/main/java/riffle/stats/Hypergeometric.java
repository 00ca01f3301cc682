package riffle.stats;

/**
 * The hypergeometric distribution: the number X of successes among n draws without replacement from
 * a population of N holding M successes, P(X = x) = C(M, x) C(N − M, n − x) / C(N, n) on max(0, n −
 * (N − M)) ≤ x ≤ min(n, M) (Johnson NL, Kemp AW, Kotz S (2005) Univariate Discrete Distributions,
 * 3rd ed., §6.1).
 *
 * <p>The probability comes from log-factorials ({@link Gamma#logFactorial}); the tails are those of
 * Fisher's exact test on the table [[x, M − x], [n − x, N − M − n + x]] (rows: success or not;
 * columns: drawn or not), which sums them outward with the ratio of neighbouring terms ({@link
 * FisherExact}).
 */
final class Hypergeometric {
  private final long population;
  private final long successes;
  private final long draws;
  private final long lo;
  private final long hi;

  /**
   * @param population N, not negative
   * @param successes M, from 0 to N
   * @param draws n, from 0 to N
   * @throws IllegalArgumentException when a count is out of range
   */
  Hypergeometric(long population, long successes, long draws) {
    if (population < 0
        || successes < 0
        || successes > population
        || draws < 0
        || draws > population) {
      throw new IllegalArgumentException(
          "need 0 <= M <= N and 0 <= n <= N, got N="
              + population
              + ", M="
              + successes
              + ", n="
              + draws);
    }
    this.population = population;
    this.successes = successes;
    this.draws = draws;
    this.lo = Math.max(0, draws - (population - successes));
    this.hi = Math.min(draws, successes);
  }

  /** P(X = x). */
  double pmf(long x) {
    if (x < lo || x > hi) {
      return 0;
    }
    return Math.exp(
        logChoose(successes, x)
            + logChoose(population - successes, draws - x)
            - logChoose(population, draws));
  }

  /** P(X ≤ x). */
  double cdf(long x) {
    if (x < lo) {
      return 0;
    }
    if (x >= hi) {
      return 1;
    }
    return FisherExact.less(x, successes - x, draws - x, population - successes - draws + x);
  }

  /** P(X ≥ x). */
  double upper(long x) {
    if (x <= lo) {
      return 1;
    }
    if (x > hi) {
      return 0;
    }
    return FisherExact.greater(x, successes - x, draws - x, population - successes - draws + x);
  }

  private static double logChoose(long n, long k) {
    return Gamma.logFactorial(n) - Gamma.logFactorial(k) - Gamma.logFactorial(n - k);
  }
}
