package riffle.ingest;

/**
 * Internal signal that the input is unusable, with its position; {@link SurveyReader} adds the
 * source and turns it into an {@link UnreadableInputException}.
 */
final class BadInput extends Exception {
  private final long line;
  private final int column;

  BadInput(String message) {
    this(0, 0, message);
  }

  BadInput(long line, int column, String message) {
    super(message, null, false, false);
    this.line = line;
    this.column = column;
  }

  long line() {
    return line;
  }

  int column() {
    return column;
  }
}
