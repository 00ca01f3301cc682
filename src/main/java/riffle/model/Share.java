package riffle.model;

import java.util.Objects;

/**
 * How many answers of one wave carry a code, out of the wave's base.
 *
 * @param count substantive answers carrying the code (or, for a theme, any of its codes)
 * @param base substantive answers to the question in the wave
 * @param share count / base (0 when the base is 0)
 * @param ci the 95% Wilson score interval of the share
 * @param smallBase whether the base is under 30 (see {@code riffle.report})
 * @param imprecise whether the interval is wider than 20 percentage points
 */
public record Share(
    int count,
    int base,
    double share,
    ConfidenceInterval ci,
    boolean smallBase,
    boolean imprecise) {
  /** Checks the components. */
  public Share {
    Objects.requireNonNull(ci, "ci");
    if (count < 0 || base < count) {
      throw new IllegalArgumentException("need 0 <= count <= base, got " + count + "/" + base);
    }
  }
}
