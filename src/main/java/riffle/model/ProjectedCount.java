package riffle.model;

import java.util.Locale;
import java.util.Objects;

/**
 * What a share read from a random sample of a wave says about the whole wave: "about 1,140 of 5,000
 * (1,010–1,280)". Only made when the answers a person read are a simple random sample of the wave's
 * answers to the question (the first k of its review queue's order).
 *
 * @param population the wave's substantive answers to the question (N)
 * @param sample the answers read, a random sample of them (n)
 * @param count the projected number of the wave's answers carrying the code, N × share
 * @param lower the smallest whole count inside the interval
 * @param upper the largest whole count inside the interval
 * @param ci the 95% interval of the wave's share: Wilson's score interval with the
 *     finite-population correction (see {@code riffle.stats.FinitePopulation})
 */
public record ProjectedCount(
    int population, int sample, double count, long lower, long upper, ConfidenceInterval ci) {
  /** Checks the components. */
  public ProjectedCount {
    Objects.requireNonNull(ci, "ci");
    if (sample < 1 || population < sample || lower > upper || lower < 0 || upper > population) {
      throw new IllegalArgumentException(
          "inconsistent projection: "
              + lower
              + "–"
              + upper
              + " of "
              + population
              + " from "
              + sample);
    }
  }

  /** "about 536 of 5000 in the wave (300–850)". */
  public String describe() {
    return String.format(
        Locale.ROOT, "about %.0f of %d in the wave (%d–%d)", count, population, lower, upper);
  }
}
