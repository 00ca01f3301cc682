package riffle.model;

import java.util.Objects;

/**
 * How one code's share changed from one wave to another, and what an analyst may conclude.
 *
 * @param code the code's name
 * @param codeId the code's id in the codebook
 * @param from the earlier wave
 * @param to the later wave
 * @param diff the share in {@code to} minus the share in {@code from}
 * @param ci the 95% Newcombe hybrid-score interval of {@code diff}
 * @param p the two-sided Fisher exact p-value
 * @param pAdjusted the Benjamini–Hochberg adjusted p-value across the codes compared between the
 *     two waves
 * @param verdict "rose", "fell", "no clear change" or "too few answers to tell" (rule in {@code
 *     riffle.report})
 * @param byRule whether both shares are by rule (over the answers its rules ran on), not over the
 *     answers people read
 */
public record WaveChange(
    String code,
    String codeId,
    String from,
    String to,
    double diff,
    ConfidenceInterval ci,
    double p,
    double pAdjusted,
    String verdict,
    boolean byRule) {
  /** The adjusted p-value below which a change may be called a rise or a fall. */
  public static final double SIGNIFICANCE = 0.05;

  /** "The share rose": the adjusted p is below 0.05 and the interval lies above zero. */
  public static final String ROSE = "rose";

  /** "The share fell": the adjusted p is below 0.05 and the interval lies below zero. */
  public static final String FELL = "fell";

  /** Enough answers, but no difference that survives the adjustment and the interval. */
  public static final String NO_CLEAR_CHANGE = "no clear change";

  /** A base under 30, or a code too rare (or too common) for the test to say anything. */
  public static final String TOO_FEW = "too few answers to tell";

  /** Checks the components. */
  public WaveChange {
    Objects.requireNonNull(code, "code");
    Objects.requireNonNull(codeId, "codeId");
    Objects.requireNonNull(from, "from");
    Objects.requireNonNull(to, "to");
    Objects.requireNonNull(ci, "ci");
    Objects.requireNonNull(verdict, "verdict");
  }
}
