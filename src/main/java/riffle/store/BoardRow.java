package riffle.store;

import java.util.Objects;
import java.util.Optional;

/**
 * A quote pinned to the copy board, as stored, with its answer's place.
 *
 * @param id the item's id
 * @param slot headline, subheadline, benefit, objection or proof
 * @param position its place in the slot, from 1
 * @param answerId the answer the quote is from
 * @param code the code it was found under
 * @param text the quote, verbatim from the masked answer
 * @param workingLine the copywriter's line beside it, when written
 * @param respondent the answer's respondent (read only)
 * @param wave the answer's wave (read only)
 * @param question the answer's question (read only)
 */
public record BoardRow(
    long id,
    String slot,
    int position,
    long answerId,
    String code,
    String text,
    Optional<String> workingLine,
    String respondent,
    String wave,
    String question) {
  public BoardRow {
    Objects.requireNonNull(slot, "slot");
    Objects.requireNonNull(code, "code");
    Objects.requireNonNull(text, "text");
    Objects.requireNonNull(workingLine, "workingLine");
    Objects.requireNonNull(respondent, "respondent");
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
  }

  /** This item at another place. */
  public BoardRow at(String newSlot, int newPosition) {
    return new BoardRow(
        id, newSlot, newPosition, answerId, code, text, workingLine, respondent, wave, question);
  }

  /** This item with another working line. */
  public BoardRow withWorkingLine(Optional<String> line) {
    return new BoardRow(
        id,
        slot,
        position,
        answerId,
        code,
        text,
        line.filter(l -> !l.isBlank()),
        respondent,
        wave,
        question);
  }
}
