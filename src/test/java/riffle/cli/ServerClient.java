package riffle.cli;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;

/** The page's side of a running server on loopback: JSON requests with the page's own headers. */
final class ServerClient {
  private final URI url;
  private final String origin;
  private final HttpClient http =
      HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(10)).build();

  ServerClient(URI url) {
    this.url = url;
    String u = url.toString();
    this.origin = u.substring(0, u.length() - 1);
  }

  /** One answer: its status and JSON body (null when the body is not JSON). */
  record Answer(int status, JsonNode json, String body) {
    boolean ok() {
      return status >= 200 && status < 300;
    }
  }

  Answer get(String path) throws IOException, InterruptedException {
    return send(HttpRequest.newBuilder(url.resolve(path)).GET());
  }

  Answer post(String path, Object body) throws IOException, InterruptedException {
    return send(
        HttpRequest.newBuilder(url.resolve(path))
            .header("Origin", origin)
            .header("Content-Type", "application/json")
            .POST(HttpRequest.BodyPublishers.ofString(JsonOutput.MAPPER.writeValueAsString(body))));
  }

  private Answer send(HttpRequest.Builder request) throws IOException, InterruptedException {
    HttpResponse<String> r =
        http.send(
            request.timeout(Duration.ofSeconds(60)).build(),
            HttpResponse.BodyHandlers.ofString(StandardCharsets.UTF_8));
    JsonNode json = null;
    if (r.headers().firstValue("Content-Type").orElse("").startsWith("application/json")) {
      json = JsonOutput.MAPPER.readTree(r.body());
    }
    return new Answer(r.statusCode(), json, r.body());
  }

  static String q(String s) {
    return URLEncoder.encode(s, StandardCharsets.UTF_8);
  }
}
