package riffle.model;

/**
 * A code the suggestion engine proposes for an answer; never applied without an analyst's action.
 *
 * @param answerId the answer's id
 * @param codeId the proposed code's id
 * @param confidence the model's probability that the code applies, in (0, 1); always above the
 *     code's threshold (see {@link CodeMetrics#threshold()})
 */
public record Suggestion(long answerId, long codeId, double confidence) {
  /** Checks the confidence. */
  public Suggestion {
    if (!(confidence >= 0 && confidence <= 1)) {
      throw new IllegalArgumentException("confidence must be in [0, 1], got " + confidence);
    }
  }
}
