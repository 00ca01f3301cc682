package riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import riffle.model.ControlChars;
import riffle.model.EditOutcome;

/** The options every command that reads or changes the coding shares. */
final class CodingOptions {
  @Option(names = "--project", required = true, paramLabel = "P", description = "Project file.")
  Path project;

  @Option(
      names = "--coder",
      paramLabel = "NAME",
      description = "Who makes the change, for undo and the audit trail (default: your user name).")
  String coder;

  @Mixin JsonOption json;

  String coder() {
    return coder == null || coder.isBlank()
        ? Actor.current()
        : ControlChars.checkName("--coder", coder.strip());
  }

  /** Prints what a change did: its sentence, or the outcome as JSON. */
  void print(PrintWriter out, EditOutcome outcome) {
    if (json.enabled) {
      JsonOutput.print(out, outcome);
    } else {
      out.println(outcome.message());
    }
  }
}
