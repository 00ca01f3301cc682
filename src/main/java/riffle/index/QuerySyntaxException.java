package riffle.index;

import riffle.model.InputException;
import riffle.model.InputProblem;

/** A query the analyst typed that cannot be read; the problem gives the column where it fails. */
public final class QuerySyntaxException extends InputException {
  private static final long serialVersionUID = 1L;

  QuerySyntaxException(int column, String message) {
    super(new InputProblem("query", 1, column, message));
  }
}
