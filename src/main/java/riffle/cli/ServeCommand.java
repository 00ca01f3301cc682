package riffle.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import riffle.model.InputException;
import riffle.web.WebServer;

/** {@code riffle serve}: the project in the browser, until interrupted. */
@Command(
    name = "serve",
    mixinStandardHelpOptions = true,
    description = {
      "Serves the project to your browser: bring in waves, search the answers, see the "
          + "recurring phrases.",
      "Listens on 127.0.0.1 unless told otherwise; any other address needs the access token "
          + "printed at start. Runs until interrupted (Ctrl+C)."
    })
final class ServeCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(
      names = "--project",
      required = true,
      paramLabel = "P",
      description = "Project file (NAME.riffle); created when missing.")
  Path project;

  @Option(
      names = "--host",
      paramLabel = "HOST",
      defaultValue = "127.0.0.1",
      description = "Address to listen on (default: ${DEFAULT-VALUE}).")
  String host;

  @Option(
      names = "--port",
      paramLabel = "N",
      defaultValue = "0",
      description = "Port to listen on; 0 picks a free one (default: ${DEFAULT-VALUE}).")
  int port;

  @Option(
      names = "--web-dir",
      paramLabel = "DIR",
      description = "Serve the page from this folder (the repository's web/) instead of the jar.")
  Path webDir;

  @Override
  public Integer call() throws InputException {
    return Serving.serve(project, options(host, port, webDir), spec.commandLine().getOut());
  }

  static WebServer.Options options(String host, int port, Path webDir) {
    WebServer.Options options = WebServer.Options.defaults().at(host, port);
    return webDir == null ? options : options.webDir(webDir);
  }
}
