package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintStream;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code riffle serve}: prints where it listens, serves until interrupted, then exits 0. */
class ServeCommandTest {
  @TempDir Path dir;

  /** Collects what the command prints, and completes once the listening line is out. */
  static final class Lines extends OutputStream {
    private final StringBuilder text = new StringBuilder();
    final CompletableFuture<URI> url = new CompletableFuture<>();

    @Override
    public synchronized void write(int b) {
      text.append((char) b);
      Matcher m = Pattern.compile("Listening on (http://\\S+/)").matcher(text);
      if (!url.isDone() && m.find()) {
        url.complete(URI.create(m.group(1)));
      }
    }

    synchronized String text() {
      return text.toString();
    }
  }

  @Test
  void servesTheProjectUntilInterrupted() throws Exception {
    CliTest.Run imported =
        CliTest.riffle(
            "import",
            "--project",
            dir.resolve("shop.riffle").toString(),
            "--file",
            CliTest.fixture("two-questions.csv").toString(),
            "--wave",
            "Wave 1");
    assertEquals(0, imported.code(), imported.err());
    Lines out = new Lines();
    int[] code = {-1};
    Thread serving =
        new Thread(
            () ->
                code[0] =
                    Main.run(
                        new String[] {
                          "serve", "--project", dir.resolve("shop.riffle").toString(), "--port", "0"
                        },
                        new ByteArrayInputStream(new byte[0]),
                        new PrintStream(out, true, StandardCharsets.UTF_8),
                        new PrintStream(
                            OutputStream.nullOutputStream(), true, StandardCharsets.UTF_8)));
    serving.start();
    URI url = out.url.get(60, TimeUnit.SECONDS);
    assertEquals("127.0.0.1", url.getHost());
    HttpResponse<String> project =
        HttpClient.newHttpClient()
            .send(
                HttpRequest.newBuilder(url.resolve("/api/project")).build(),
                HttpResponse.BodyHandlers.ofString());
    assertEquals(200, project.statusCode());
    assertTrue(project.body().contains("\"Wave 1\""), project.body());
    serving.interrupt();
    serving.join(30_000);
    assertEquals(0, code[0], out.text());
  }

  @Test
  void aBadPortIsAUsageError() throws IOException {
    CliTest.Run run =
        CliTest.riffle("serve", "--project", dir.resolve("x.riffle").toString(), "--port", "99999");
    assertEquals(2, run.code());
    assertTrue(run.err().contains("--port"), run.err());
  }
}
