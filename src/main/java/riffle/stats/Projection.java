package riffle.stats;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * A code's share in a simple random sample of a wave's answers and the count it projects for the
 * whole wave (228 of 1,000 read: "about 1,140 of 5,000, 95% interval 1,028–1,260").
 *
 * @param population N, the answers of the wave (or segment) sampled from
 * @param sample n, the answers read at random, 1 ≤ n ≤ N
 * @param count r, the read answers carrying the code
 * @param share r / n
 * @param interval the interval for the population's share ({@link FinitePopulation#wilson})
 * @param confidence the interval's confidence level
 * @param projected N · r / n, the estimated count in the population
 * @param lower the smallest whole count inside the interval (at least r)
 * @param upper the largest whole count inside the interval (at most r + N − n)
 * @param standardError Cochran's estimated standard error of the projected count; 0 when the whole
 *     population was read, empty for a sample of one
 */
public record Projection(
    long population,
    long sample,
    long count,
    double share,
    Interval interval,
    double confidence,
    double projected,
    long lower,
    long upper,
    OptionalDouble standardError) {
  /** Checks the counts and limits. */
  public Projection {
    Objects.requireNonNull(interval, "interval");
    Objects.requireNonNull(standardError, "standardError");
    if (sample < 1 || sample > population || count < 0 || count > sample) {
      throw new IllegalArgumentException(
          "need 0 <= r <= n, 1 <= n <= N; got r=" + count + ", n=" + sample + ", N=" + population);
    }
    if (lower > upper || lower < count || upper > count + population - sample) {
      throw new IllegalArgumentException("count limits out of range: " + lower + ", " + upper);
    }
  }

  /** Whether every answer was read: the count is then known, not estimated. */
  public boolean census() {
    return sample == population;
  }
}
