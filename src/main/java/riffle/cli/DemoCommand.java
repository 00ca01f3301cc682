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
    description =
        "Builds the demo project from the bundled sample waves (an invented shop's buyer "
            + "survey) in a working folder outside the repository, reusing it on later runs, then "
            + "serves it to your browser until interrupted (leave that out with --no-serve).")
final class DemoCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(
      names = "--dir",
      paramLabel = "FOLDER",
      description = "Working folder (default: ~/.riffle/demo).")
  Path dir;

  @Option(names = "--no-serve", description = "Only build the project; do not serve it.")
  boolean noServe;

  @Option(
      names = "--port",
      paramLabel = "N",
      defaultValue = "0",
      description = "Port to serve on; 0 picks a free one (default: ${DEFAULT-VALUE}).")
  int port;

  @Option(
      names = "--web-dir",
      paramLabel = "DIR",
      description = "Serve the page from this folder (the repository's web/) instead of the jar.")
  Path webDir;

  @Mixin JsonOption json;

  @Override
  public Integer call() throws IOException {
    Path folder = dir != null ? dir : Path.of(System.getProperty("user.home"), ".riffle", "demo");
    DemoProject.Result result = DemoProject.prepare(folder, TerminalProgress.forStderr());
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      JsonOutput.print(out, result);
      return serve(result, spec.commandLine().getErr());
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
    SummaryText.print(out, result.project(), result.summary());
    out.printf(
        Locale.ROOT,
        "%nTry:%n  riffle phrases --project %1$s --question 1%n"
            + "  riffle phrases --project %1$s --question 1 --wave \"Wave 3\" --against \"Wave 2\"%n"
            + "  riffle search --project %1$s --query '\"delivery date\" AND wave:\"Wave 3\"'%n"
            + "  riffle codes --project %1$s%n"
            + "  riffle suggest --project %1$s --wave \"Wave 1\"%n"
            + "  riffle report --project %1$s --question 1%n"
            + "  riffle quotes --project %1$s%n",
        result.project());
    return serve(result, out);
  }

  private int serve(DemoProject.Result result, PrintWriter out) throws IOException {
    if (noServe) {
      return 0;
    }
    out.println();
    return Serving.serve(result.project(), ServeCommand.options("127.0.0.1", port, webDir), out);
  }
}
