package riffle.model;

import java.util.Optional;

/**
 * Input that cannot be used as given: an unreadable export, a missing or foreign project file, a
 * project written by a newer schema, a request the project cannot carry out (a code name taken, a
 * wave it lacks). The message says what is wrong and what to do; the command line shows it and
 * exits 2, the web layer answers 4xx. Only this exception (and its kinds) is shown as bad input:
 * any other exception is a fault of Riffle's and is reported as one.
 *
 * <p>Unchecked, as every use case may refuse its input; methods still declare it where they do.
 */
public class InputException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  private final transient InputProblem problem;
  private final boolean request;

  /** For input that has a position: the problem names the file, line and column. */
  public InputException(InputProblem problem) {
    super(problem.toString());
    this.problem = problem;
    this.request = false;
  }

  /** For a request the project cannot carry out as asked. */
  public InputException(String message) {
    super(message);
    this.problem = null;
    this.request = true;
  }

  /** For input without a position, such as a project file. */
  public InputException(String message, Throwable cause) {
    super(message, cause);
    this.problem = null;
    this.request = false;
  }

  /**
   * Whether the problem is the request itself (a name taken, a wave the project lacks), rather than
   * a file it reads (an export, the project file).
   */
  public boolean inRequest() {
    return request;
  }

  /** Where the problem is, when the input has positions. */
  public Optional<InputProblem> located() {
    return Optional.ofNullable(problem);
  }
}
