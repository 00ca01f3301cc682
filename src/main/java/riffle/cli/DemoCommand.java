package riffle.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import riffle.app.DemoProject;
import riffle.app.ImportReport;

/** {@code riffle demo}: builds (or reuses) the demo project from the bundled sample waves. */
@Command(
    name = "demo",
    mixinStandardHelpOptions = true,
    description = {
      "Builds the demo project from the bundled sample waves (an invented shop's buyer survey)",
      "in a working folder outside the repository, reusing it on later runs."
    })
final class DemoCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(
      names = "--dir",
      paramLabel = "FOLDER",
      description = "Working folder (default: ~/.riffle/demo).")
  Path dir;

  @Mixin JsonOption json;

  @Override
  public Integer call() throws IOException {
    Path folder = dir != null ? dir : Path.of(System.getProperty("user.home"), ".riffle", "demo");
    DemoProject.Result result = DemoProject.prepare(folder, TerminalProgress.forStderr());
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      Json.print(out, result);
      return 0;
    }
    if (result.reused()) {
      out.println("Reusing the demo project (the sample waves have not changed).");
    } else {
      for (ImportReport r : result.imports()) {
        out.printf(
            Locale.ROOT,
            "Imported %s as \"%s\": %d rows, %d answers, %d problems%n",
            r.source(),
            r.wave(),
            r.rows(),
            r.answers(),
            r.problems().size());
      }
    }
    Summaries.print(out, result.project(), result.summary());
    out.printf(
        Locale.ROOT,
        "%nTry:%n  riffle phrases --project %1$s --question 1%n"
            + "  riffle phrases --project %1$s --question 1 --wave \"Wave 3\" --against \"Wave 2\"%n"
            + "  riffle search --project %1$s --query '\"delivery date\" AND wave:\"Wave 3\"'%n",
        result.project());
    return 0;
  }
}
