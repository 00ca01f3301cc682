package riffle.stats;

/**
 * A closed confidence interval [lower, upper].
 *
 * @param lower the lower limit
 * @param upper the upper limit, not below {@code lower}
 */
public record Interval(double lower, double upper) {
  /** Checks that the limits are ordered. */
  public Interval {
    if (!(lower <= upper)) {
      throw new IllegalArgumentException("interval limits out of order: " + lower + ", " + upper);
    }
  }

  /** The width of the interval, {@code upper − lower}. */
  public double width() {
    return upper - lower;
  }

  /** Whether {@code x} lies inside the interval, limits included. */
  public boolean contains(double x) {
    return lower <= x && x <= upper;
  }
}
