package riffle.ingest;

import java.util.Objects;
import riffle.model.InputException;
import riffle.model.InputProblem;

/**
 * Thrown when an input cannot be used at all: it is empty, binary, too large, has an unclosed
 * quote, names a column it does not have, or holds no open-text column. The message is {@link
 * InputProblem#toString()} of the problem ({@code source:line:column: what is wrong and what to
 * do}), fit to show an analyst as it is. An {@link InputException}, so the command line exits 2 and
 * the web layer answers 4xx.
 */
public final class UnreadableInputException extends InputException {
  /**
   * Creates the exception for one positioned problem.
   *
   * @param problem where and why the input is unusable
   */
  public UnreadableInputException(InputProblem problem) {
    super(Objects.requireNonNull(problem, "problem"));
  }

  /** Returns where and why the input is unusable. */
  public InputProblem problem() {
    return located().orElseThrow();
  }
}
