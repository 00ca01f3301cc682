package riffle.model;

import java.util.List;
import java.util.Objects;

/**
 * One answer read from an export, ready to be stored.
 *
 * @param question the question text (the column header)
 * @param original the cell exactly as the export holds it
 * @param normalized the text used for analysis (Unicode NFC)
 * @param substantive false for non-answers such as "n/a", which stay out of bases
 * @param line the 1-based physical line where the respondent's record starts
 * @param column the 1-based field number of the answer
 * @param codes codes assigned elsewhere, in the order given; empty when none
 * @param coder who assigned {@code codes}
 * @param analysis the text analysis of {@code normalized}: the masked text, language and masks the
 *     project file keeps (its sentences may be left out: the parse goes to the derived cache apart)
 * @param codedElsewhere whether a codes column of the export covers this answer: then it was read
 *     by {@code coder}, with or without codes
 */
public record NewAnswer(
    String question,
    String original,
    String normalized,
    boolean substantive,
    long line,
    int column,
    List<String> codes,
    String coder,
    Analysis analysis,
    boolean codedElsewhere) {
  public NewAnswer {
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(original, "original");
    Objects.requireNonNull(normalized, "normalized");
    codes = List.copyOf(codes);
    Objects.requireNonNull(coder, "coder");
    Objects.requireNonNull(analysis, "analysis");
    if (!codes.isEmpty() && !codedElsewhere) {
      throw new IllegalArgumentException(
          "an answer with codes from the export was coded elsewhere");
    }
  }

  /** An answer coded elsewhere exactly when the export gives it codes. */
  public NewAnswer(
      String question,
      String original,
      String normalized,
      boolean substantive,
      long line,
      int column,
      List<String> codes,
      String coder,
      Analysis analysis) {
    this(
        question,
        original,
        normalized,
        substantive,
        line,
        column,
        codes,
        coder,
        analysis,
        !codes.isEmpty());
  }
}
