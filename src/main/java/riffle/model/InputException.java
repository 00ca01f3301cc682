package riffle.model;

import java.io.IOException;
import java.util.Optional;

/**
 * Input that cannot be used as given: an unreadable export, a missing or foreign project file, a
 * project written by a newer schema. The message says what is wrong and what to do; the command
 * line shows it and exits 2, the web layer answers 4xx.
 */
public class InputException extends IOException {
  private static final long serialVersionUID = 1L;

  private final transient InputProblem problem;

  /** For input that has a position: the problem names the file, line and column. */
  public InputException(InputProblem problem) {
    super(problem.toString());
    this.problem = problem;
  }

  /** For input without a position, such as a project file. */
  public InputException(String message, Throwable cause) {
    super(message, cause);
    this.problem = null;
  }

  /** Where the problem is, when the input has positions. */
  public Optional<InputProblem> located() {
    return Optional.ofNullable(problem);
  }
}
