package riffle.model;

import java.util.Objects;
import java.util.Optional;

/**
 * A quote pinned to a copy board, linked to the answer it came from.
 *
 * @param text the quote, verbatim from the masked answer
 * @param answerId the answer it came from
 * @param respondent that answer's respondent
 * @param wave that answer's wave
 * @param question the question it answers
 * @param code the code it was found under
 * @param workingLine the copywriter's own line written beside the quote, when there is one; the
 *     quote itself is never changed
 */
public record BoardItem(
    String text,
    long answerId,
    String respondent,
    String wave,
    String question,
    String code,
    Optional<String> workingLine) {
  /** Checks the components; a blank working line counts as none. */
  public BoardItem {
    Objects.requireNonNull(text, "text");
    Objects.requireNonNull(respondent, "respondent");
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(code, "code");
    workingLine = Objects.requireNonNull(workingLine, "workingLine").filter(l -> !l.isBlank());
  }

  /** A quote as a board item, without a working line. */
  public static BoardItem of(Quote quote) {
    return new BoardItem(
        quote.text(),
        quote.answerId(),
        quote.respondent(),
        quote.wave(),
        quote.question(),
        quote.code(),
        Optional.empty());
  }

  /** This item with another working line (blank or empty removes it). */
  public BoardItem withWorkingLine(Optional<String> line) {
    return new BoardItem(text, answerId, respondent, wave, question, code, line);
  }
}
