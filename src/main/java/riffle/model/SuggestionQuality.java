package riffle.model;

import java.util.Objects;

/**
 * How well one code's suggestions perform on one question, cross-validated on human codes only (see
 * {@link CodeMetrics} for each figure; null where undefined).
 *
 * @param question the question the model learned from
 * @param code the code's name
 * @param codeId the code's id
 * @param examples human-coded answers learned from
 * @param support those that carry the code
 * @param precision share of suggestions that were right
 * @param recall share of the code's answers that got the suggestion
 * @param f1 harmonic mean of the two
 * @param threshold least confidence shown
 * @param ready whether the code has enough examples to get suggestions
 */
public record SuggestionQuality(
    String question,
    String code,
    long codeId,
    int examples,
    int support,
    Double precision,
    Double recall,
    Double f1,
    Double threshold,
    boolean ready) {
  public SuggestionQuality {
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(code, "code");
  }
}
