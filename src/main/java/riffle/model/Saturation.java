package riffle.model;

import java.util.List;
import java.util.Objects;

/**
 * Whether coding has found (nearly) all the codes a question's answers call for.
 *
 * @param coded substantive answers a person has read so far (coded, or marked as read with no code
 *     applying); 0 before anyone has read one
 * @param observed distinct codes they carry
 * @param chao1 the bias-corrected Chao1 estimate of how many codes there are
 * @param ci its 95% log-linear interval
 * @param curve distinct codes against answers read, in reading order (thinned to at most a few
 *     hundred points, always keeping the points where a new code appeared and the last one)
 * @param window how many of the latest read answers {@code newInWindow} looks at (50)
 * @param newInWindow codes first given in those latest answers
 */
public record Saturation(
    int coded,
    int observed,
    double chao1,
    ConfidenceInterval ci,
    List<SaturationPoint> curve,
    int window,
    int newInWindow) {
  /** Checks the components and copies the curve. */
  public Saturation {
    Objects.requireNonNull(ci, "ci");
    curve = List.copyOf(curve);
  }
}
