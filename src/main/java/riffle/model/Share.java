package riffle.model;

import java.util.Objects;
import java.util.Optional;

/**
 * How many answers of one wave carry a code, out of the wave's base.
 *
 * @param count answers of the base carrying the code (or, for a theme, any of its codes)
 * @param base the answers the share is over: the substantive answers to the question in the wave
 *     that a person has read, or, {@code byRule}, all of them (the answers its rules ran on)
 * @param share count / base (0 when the base is 0)
 * @param ci the 95% Wilson score interval of the share
 * @param smallBase whether the base is under 30 (see {@code riffle.report})
 * @param imprecise whether the interval is wider than 20 percentage points
 * @param byRule whether the code is given only by rules here, so the share counts what its rules
 *     found, over the answers they ran on, and no person's reading
 * @param projected the count it projects for the whole wave, when the answers read are a random
 *     sample of the wave (never for a share by rule or of a wave read in full)
 */
public record Share(
    int count,
    int base,
    double share,
    ConfidenceInterval ci,
    boolean smallBase,
    boolean imprecise,
    boolean byRule,
    Optional<ProjectedCount> projected) {
  /** Checks the components. */
  public Share {
    Objects.requireNonNull(ci, "ci");
    Objects.requireNonNull(projected, "projected");
    if (count < 0 || base < count) {
      throw new IllegalArgumentException("need 0 <= count <= base, got " + count + "/" + base);
    }
  }
}
