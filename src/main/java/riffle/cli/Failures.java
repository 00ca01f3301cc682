package riffle.cli;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import picocli.CommandLine;
import picocli.CommandLine.ParseResult;
import riffle.model.InputException;
import riffle.model.InputProblem;

/**
 * Maps failures to exit codes and messages, once for every command: bad input or usage exits 2 with
 * a message that says what to do; anything else exits 1 as an internal failure. Never a stack
 * trace, unless {@code RIFFLE_DEBUG} is set in the environment.
 */
final class Failures implements CommandLine.IExecutionExceptionHandler {
  static final int BAD_INPUT = 2;
  static final int INTERNAL = 1;

  @Override
  public int handleExecutionException(Exception ex, CommandLine cl, ParseResult parsed) {
    PrintWriter err = cl.getErr();
    boolean badInput = ex instanceof InputException || ex instanceof IllegalArgumentException;
    String message =
        badInput
            ? Objects.requireNonNullElse(ex.getMessage(), ex.getClass().getSimpleName())
            : "internal error ("
                + ex.getClass().getSimpleName()
                + (ex.getMessage() == null ? "" : ": " + ex.getMessage())
                + "); nothing was half-written. Please report it with the command you ran.";
    err.println("riffle: " + message);
    if (System.getenv("RIFFLE_DEBUG") != null) {
      ex.printStackTrace(err);
    }
    err.flush();
    if (cl.getParseResult().hasMatchedOption("--json")) {
      Map<String, Object> error = new LinkedHashMap<>();
      error.put("message", message);
      if (ex instanceof InputException input && input.located().isPresent()) {
        InputProblem p = input.located().get();
        error.put("file", p.source());
        error.put("line", p.line());
        error.put("column", p.column());
        error.put("message", p.message());
      }
      JsonOutput.print(cl.getOut(), Map.of("error", error));
    }
    return badInput ? BAD_INPUT : INTERNAL;
  }
}
