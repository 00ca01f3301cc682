package riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import riffle.model.InputException;
import riffle.web.WebServer;

/** Serves a project until the process is interrupted, for {@code serve} and {@code demo}. */
final class Serving {
  private Serving() {}

  /**
   * Starts the server, prints {@code Listening on URL} (and the token address when one is needed)
   * and blocks until the thread is interrupted or the process is stopped.
   */
  static int serve(Path project, WebServer.Options options, PrintWriter out) throws InputException {
    WebServer server = WebServer.start(project, options);
    Thread hook = new Thread(server::close, "riffle-stop");
    Runtime.getRuntime().addShutdownHook(hook);
    out.println("Listening on " + server.url());
    if (server.accessToken().isPresent()) {
      out.println("This address is reachable beyond this machine, so the page needs its token:");
      out.println("  open " + server.openUrl());
    }
    out.println("Press Ctrl+C to stop.");
    out.flush();
    try {
      new CountDownLatch(1).await();
    } catch (InterruptedException e) {
      // Interrupted: stop serving and return normally.
    }
    Runtime.getRuntime().removeShutdownHook(hook);
    server.close();
    return 0;
  }
}
