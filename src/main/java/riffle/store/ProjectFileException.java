package riffle.store;

import riffle.model.InputException;

/** A project file that cannot be used as asked: missing, foreign, too new, or busy. */
public final class ProjectFileException extends InputException {
  private static final long serialVersionUID = 1L;

  /** Creates the exception with a message that says what to do. */
  public ProjectFileException(String message) {
    super(message, null);
  }

  ProjectFileException(String message, Throwable cause) {
    super(message, cause);
  }
}
