package riffle.ingest;

import java.util.Optional;
import riffle.model.InputProblem;

/**
 * Internal signal that the input is unusable, with its position; {@link SurveyReader} adds the
 * source and turns it into an {@link UnreadableInputException}.
 */
final class BadInput extends Exception {
  private final long line;
  private final int column;
  private final String setting;

  BadInput(String message) {
    this(0, 0, message);
  }

  BadInput(long line, int column, String message) {
    this(line, column, message, null);
  }

  /** A problem whose fix is to change {@code setting} (plain words, such as {@code max size}). */
  BadInput(long line, int column, String message, String setting) {
    super(message, null, false, false);
    this.line = line;
    this.column = column;
    this.setting = setting;
  }

  /** The problem at {@code source}. */
  InputProblem at(String source) {
    return new InputProblem(source, line, column, getMessage(), Optional.ofNullable(setting));
  }

  long line() {
    return line;
  }

  int column() {
    return column;
  }
}
