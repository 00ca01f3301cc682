package riffle.model;

import java.util.Objects;

/**
 * A code the engine proposes for an answer, as an analyst is shown it.
 *
 * @param answerId the answer
 * @param respondent the respondent's id from the export
 * @param wave the wave's name
 * @param question the question's text
 * @param codeId the proposed code
 * @param code its name
 * @param confidence the model's probability that the code applies
 */
public record ShownSuggestion(
    long answerId,
    String respondent,
    String wave,
    String question,
    long codeId,
    String code,
    double confidence) {
  public ShownSuggestion {
    Objects.requireNonNull(respondent, "respondent");
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(code, "code");
  }
}
