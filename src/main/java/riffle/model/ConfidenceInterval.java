package riffle.model;

/**
 * A 95% confidence interval, as the findings print it.
 *
 * @param lower the lower limit
 * @param upper the upper limit, not below {@code lower}
 */
public record ConfidenceInterval(double lower, double upper) {
  /** Checks that the limits are ordered. */
  public ConfidenceInterval {
    if (!(lower <= upper)) {
      throw new IllegalArgumentException("interval limits out of order: " + lower + ", " + upper);
    }
  }
}
