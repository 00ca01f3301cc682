package riffle.model;

/**
 * How well the suggestions of one code perform, measured by cross-validation on human codes only.
 *
 * <p>Undefined figures are {@code null} (serialised as JSON {@code null}, never as {@code NaN}): a
 * code that is not ready has no model, so no precision, recall, F1 or threshold; a ready code whose
 * held-out predictions never reached its threshold has no precision (nothing was predicted).
 *
 * @param codeId the code's id
 * @param examples the coded answers the engine learned from (with and without this code)
 * @param support the coded answers that carry this code (human-coded positives)
 * @param precision cross-validated share of suggestions that were right, or null when undefined
 * @param recall cross-validated share of the code's answers that got the suggestion, or null when
 *     the code is not ready
 * @param f1 the harmonic mean of precision and recall ({@code 2TP / (2TP + FP + FN)}), or null when
 *     the code is not ready
 * @param threshold the least confidence a suggestion of this code must reach, or null when the code
 *     is not ready
 * @param ready true when the code has enough positive and negative examples to get suggestions
 */
public record CodeMetrics(
    long codeId,
    int examples,
    int support,
    Double precision,
    Double recall,
    Double f1,
    Double threshold,
    boolean ready) {
  /** Checks the counts. */
  public CodeMetrics {
    if (examples < 0 || support < 0 || support > examples) {
      throw new IllegalArgumentException(
          "need 0 <= support <= examples, got support " + support + " of " + examples);
    }
  }
}
