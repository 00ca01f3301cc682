package riffle.cli;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import picocli.CommandLine;
import picocli.CommandLine.ParseResult;
import riffle.model.InputException;
import riffle.model.InputProblem;
import riffle.model.SettingException;

/**
 * Maps failures to exit codes and messages, once for every command: bad input (an {@link
 * InputException}) exits 2 with a message that says what to do, a setting's problem led by the
 * option that gives it; anything else, an {@code IllegalArgumentException} included, exits 1 as an
 * internal failure. Never a stack trace, unless {@code RIFFLE_DEBUG} is set in the environment.
 */
final class Failures implements CommandLine.IExecutionExceptionHandler {
  static final int BAD_INPUT = 2;
  static final int INTERNAL = 1;

  /** The option that gives each setting the lower layers name in plain words. */
  private static final Map<String, String> OPTIONS =
      Map.ofEntries(
          Map.entry("wave", "--wave"),
          Map.entry("against", "--against"),
          Map.entry("from", "--from"),
          Map.entry("to", "--to"),
          Map.entry("question", "--question"),
          Map.entry("limit", "--limit"),
          Map.entry("max size", "--max-mb"),
          Map.entry("max columns", "--max-columns"),
          Map.entry("delimiter", "--delimiter"),
          Map.entry("date order", "--date-order"),
          Map.entry("encoding", "--encoding"),
          Map.entry("sheet", "--sheet"),
          Map.entry("text column", "--text-column"),
          Map.entry("id column", "--id-column"),
          Map.entry("date column", "--date-column"),
          Map.entry("codes column", "--codes-column"),
          Map.entry("coder column", "--coder-column"),
          Map.entry("segment column", "--meta-column"),
          Map.entry("skipped column", "--skip-column"),
          Map.entry("host", "--host"),
          Map.entry("port", "--port"),
          Map.entry("web folder", "--web-dir"));

  /**
   * The message for bad input: a setting's problem is led by the option that gives it; a problem in
   * a file whose fix is a setting ends with that option.
   */
  static String phrased(InputException input) {
    String message = Objects.requireNonNullElse(input.getMessage(), "the input cannot be used");
    if (input instanceof SettingException s && OPTIONS.containsKey(s.setting())) {
      return OPTIONS.get(s.setting()) + ": " + message;
    }
    return input
        .located()
        .flatMap(InputProblem::setting)
        .filter(OPTIONS::containsKey)
        .map(setting -> message + " (" + OPTIONS.get(setting) + ")")
        .orElse(message);
  }

  @Override
  public int handleExecutionException(Exception ex, CommandLine cl, ParseResult parsed) {
    PrintWriter err = cl.getErr();
    boolean badInput = ex instanceof InputException;
    String message =
        ex instanceof InputException input
            ? phrased(input)
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
