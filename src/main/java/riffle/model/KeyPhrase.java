package riffle.model;

import java.util.Objects;

/**
 * A phrase whose frequency differs between a focus and a reference (two waves, or a segment and the
 * rest).
 *
 * @param phrase the phrase's label (as in {@link Phrase#phrase()})
 * @param focus answers of the focus that contain it
 * @param reference answers of the reference that contain it
 * @param logLikelihood Dunning's G² of the 2×2 table (contains it or not, focus or reference)
 * @param logRatio Hardie's Log Ratio: log2 of the ratio of the shares of answers containing it (1:
 *     twice the share in the focus; a zero count taken as 0.5)
 * @param p the p-value of the log-likelihood (chi-square, one degree of freedom)
 * @param pAdjusted {@code p} adjusted by Benjamini–Hochberg across every phrase compared
 * @param direction "more" when its share is at least as high in the focus, else "less"
 * @param verdict "rose" or "fell" (in the focus, against the reference) only when {@code pAdjusted}
 *     is under {@link WaveChange#SIGNIFICANCE}, the findings' threshold; else "no clear change"
 */
public record KeyPhrase(
    String phrase,
    int focus,
    int reference,
    double logLikelihood,
    double logRatio,
    double p,
    double pAdjusted,
    String direction,
    String verdict) {
  /** Checks the components. */
  public KeyPhrase {
    Objects.requireNonNull(phrase, "phrase");
    Objects.requireNonNull(direction, "direction");
    Objects.requireNonNull(verdict, "verdict");
  }

  /** The verdict the findings' rule allows for a phrase with this direction and adjusted p. */
  public static String verdict(String direction, double pAdjusted) {
    if (!(pAdjusted < WaveChange.SIGNIFICANCE)) {
      return WaveChange.NO_CLEAR_CHANGE;
    }
    return direction.equals("more") ? WaveChange.ROSE : WaveChange.FELL;
  }
}
