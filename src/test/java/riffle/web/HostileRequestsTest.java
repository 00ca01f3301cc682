package riffle.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Socket;
import java.net.http.HttpRequest;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Requests a prober sends rather than the page: a body of JSON {@code null} on every changing
 * route, bodies and uploads over the limits, and requests so malformed that Jetty refuses them
 * before any route runs. Each is a 4xx in the API's {@code {error, where}} shape, names no
 * exception class, and leaves the project as it was. A real server on port 0.
 */
class HostileRequestsTest {
  @TempDir static Path dir;
  static WebServer server;

  /** Every route that takes a JSON body, with a path the route answers. */
  static final List<String> JSON_ROUTES =
      List.of(
          "POST /api/import/preview",
          "POST /api/imports",
          "POST /api/codes",
          "PATCH /api/codes/1",
          "POST /api/codes/1/archive",
          "POST /api/codes/1/remove",
          "POST /api/codes/1/move",
          "POST /api/codes/1/split",
          "POST /api/codes/merge",
          "POST /api/rules",
          "POST /api/rules/preview",
          "POST /api/rules/apply",
          "POST /api/rules/1/remove",
          "POST /api/assignments",
          "POST /api/assignments/remove",
          "POST /api/assignments/accept",
          "POST /api/assignments/bulk/preview",
          "POST /api/assignments/bulk",
          "POST /api/undo",
          "POST /api/redo",
          "POST /api/suggestions/accept-above",
          "POST /api/board/pin",
          "POST /api/board/unpin",
          "POST /api/board/move",
          "POST /api/board/line");

  @BeforeAll
  static void start() throws Exception {
    server = WebServer.start(WebServerTest.smallProject(dir), WebServer.Options.defaults());
  }

  @AfterAll
  static void stop() {
    server.close();
  }

  static JsonNode summary() throws Exception {
    return WebServerTest.send(HttpRequest.newBuilder(server.url().resolve("/api/project")).GET())
        .json()
        .get("summary");
  }

  static void assertRefusal(int status, JsonNode body, String what) {
    assertTrue(body != null && body.has("error") && body.has("where"), what + ": " + body);
    assertFalse(body.get("error").asText().contains("Exception"), what + ": " + body);
    assertTrue(status >= 400 && status < 500, what + ": " + status + " " + body);
  }

  @Test
  void aNullBodyIs400OnEveryRouteThatReadsJson() throws Exception {
    JsonNode before = summary();
    for (String route : JSON_ROUTES) {
      String[] mp = route.split(" ");
      WebServerTest.Answer a =
          WebServerTest.send(
              HttpRequest.newBuilder(server.url().resolve(mp[1]))
                  .header("Origin", WebServerTest.origin(server))
                  .header("Content-Type", "application/json")
                  .method(mp[0], HttpRequest.BodyPublishers.ofString("null")));
      assertEquals(400, a.status(), route + ": " + a.json());
      assertRefusal(a.status(), a.json(), route);
      assertTrue(a.json().get("error").asText().contains("JSON object"), route + ": " + a.json());
    }
    assertEquals(before, summary());
  }

  @Test
  void aJsonBodyOverItsLimitIs413InTheApisShape() throws Exception {
    String big = "{\"paste\": \"" + "a".repeat((int) WebServer.MAX_JSON) + "\"}";
    WebServerTest.Answer a =
        WebServerTest.send(
            HttpRequest.newBuilder(server.url().resolve("/api/import/preview"))
                .header("Origin", WebServerTest.origin(server))
                .header("Content-Type", "application/json")
                .POST(HttpRequest.BodyPublishers.ofString(big)));
    assertEquals(413, a.status());
    assertRefusal(a.status(), a.json(), "413");
    assertTrue(a.json().get("error").asText().contains("16 MiB"), a.json().toString());
  }

  @Test
  void anUploadDeclaredOverTheLimitIsRefusedUnread() throws Exception {
    JsonNode before = summary();
    Raw r =
        raw(
            "POST /api/uploads?name=huge.csv HTTP/1.1\r\nHost: "
                + host()
                + "\r\nOrigin: "
                + WebServerTest.origin(server)
                + "\r\nContent-Length: "
                + (WebServer.MAX_UPLOAD + 1)
                + "\r\nConnection: close\r\n\r\n");
    assertEquals(413, r.status(), r.body());
    JsonNode json = ApiJson.MAPPER.readTree(r.body());
    assertRefusal(r.status(), json, "upload");
    assertTrue(json.get("error").asText().contains("100 MiB"), r.body());
    assertEquals(before, summary());
  }

  @Test
  void jettysOwnRefusalsComeAsJson() throws Exception {
    Raw badAddress =
        raw("GET /api/%zz HTTP/1.1\r\nHost: " + host() + "\r\nConnection: close\r\n\r\n");
    assertEquals(400, badAddress.status(), badAddress.body());
    assertTrue(badAddress.contentType().startsWith("application/json"), badAddress.head());
    assertRefusal(400, ApiJson.MAPPER.readTree(badAddress.body()), "bad address");

    Raw bigHeader =
        raw(
            "GET /api/project HTTP/1.1\r\nHost: "
                + host()
                + "\r\nX-Filler: "
                + "x".repeat(20_000)
                + "\r\nConnection: close\r\n\r\n");
    assertEquals(431, bigHeader.status(), bigHeader.head());
    assertTrue(bigHeader.contentType().startsWith("application/json"), bigHeader.head());
    assertRefusal(431, ApiJson.MAPPER.readTree(bigHeader.body()), "big header");

    Raw longAddress =
        raw(
            "GET /api/search?q="
                + "a".repeat(20_000)
                + " HTTP/1.1\r\nHost: "
                + host()
                + "\r\nConnection: close\r\n\r\n");
    assertEquals(414, longAddress.status(), longAddress.head());
    JsonNode json = ApiJson.MAPPER.readTree(longAddress.body());
    assertRefusal(414, json, "long address");
    assertTrue(json.get("error").asText().contains("address is too long"), json.toString());
  }

  @Test
  void namesWithControlCharactersAreRefusedByField() throws Exception {
    JsonNode before = summary();
    JsonNode codesBefore = get("/api/codes");
    WebServerTest.Answer code =
        post("/api/codes", "{\"coder\": \"ana\", \"name\": \"Price\u202Eoff\"}");
    assertEquals(400, code.status(), code.json() + "");
    assertTrue(code.json().get("error").asText().contains("\\u202E"), code.json() + "");
    WebServerTest.Answer theme =
        post(
            "/api/codes",
            "{\"coder\": \"ana\", \"name\": \"Price\", \"parent\": \"Cost\\nand more\"}");
    assertEquals(400, theme.status(), theme.json() + "");
    WebServerTest.Answer wave =
        post(
            "/api/import/preview",
            "{\"paste\": \"id\\tWhy?\\n1\\tthe delivery date was unclear\\n\", \"wave\":"
                + " \"Wave\\u001b[2J 3\"}");
    assertEquals(400, wave.status(), wave.json() + "");
    assertEquals("wave", wave.json().get("where").get("field").asText());
    WebServerTest.Answer coder = post("/api/undo", "{\"coder\": \"ana\\u009b8m\"}");
    assertEquals(400, coder.status(), coder.json() + "");
    assertEquals("coder", coder.json().get("where").get("field").asText());
    WebServerTest.Answer segment =
        WebServerTest.send(
            HttpRequest.newBuilder(server.url().resolve("/api/answers?segment=dev%1Bice%3Dmobile"))
                .GET());
    assertEquals(400, segment.status(), segment.json() + "");
    assertTrue(segment.json().get("error").asText().contains("segment column"));
    assertEquals("segment", segment.json().get("where").get("parameter").asText());
    for (String route : List.of("/api/phrases", "/api/quotes")) {
      WebServerTest.Answer other =
          WebServerTest.send(
              HttpRequest.newBuilder(server.url().resolve(route + "?segment=dev%E2%80%AEice%3Dx"))
                  .GET());
      assertEquals(400, other.status(), route + ": " + other.json());
      assertEquals("segment", other.json().get("where").get("parameter").asText(), route);
    }
    assertEquals(before, summary());
    assertEquals(codesBefore, get("/api/codes"));
  }

  private static JsonNode get(String path) throws Exception {
    return WebServerTest.send(HttpRequest.newBuilder(server.url().resolve(path)).GET()).json();
  }

  private static WebServerTest.Answer post(String path, String json) throws Exception {
    return WebServerTest.send(
        HttpRequest.newBuilder(server.url().resolve(path))
            .header("Origin", WebServerTest.origin(server))
            .header("Content-Type", "application/json")
            .POST(HttpRequest.BodyPublishers.ofString(json)));
  }

  @Test
  void aLongAnswerIsSentShortenedWithAWayToTheWhole() throws Exception {
    // A 1 MiB answer, made here: its first words, filler, and a word only its end holds.
    StringBuilder cell = new StringBuilder("The grinder was late");
    while (cell.length() < (1 << 20)) {
      cell.append(" and the burrs were fine");
    }
    cell.append(" zanzibarish");
    String csv =
        "id,What almost stopped you?\nL1,\""
            + cell
            + "\"\nS1,The grinder arrived early and well packed\n";
    Path folder = java.nio.file.Files.createDirectories(dir.resolve("long"));
    Path file = folder.resolve("long.csv");
    java.nio.file.Files.writeString(file, csv, StandardCharsets.UTF_8);
    Path project = folder.resolve("long.riffle");
    riffle.app.Project.importInto(
        project,
        riffle.app.ImportRequest.from(new riffle.app.ImportSource.File(file)).wave("W").get(),
        riffle.model.Progress.NONE);
    try (WebServer s = WebServer.start(project, WebServer.Options.defaults())) {
      HttpRequest.Builder page = HttpRequest.newBuilder(s.url().resolve("/api/answers")).GET();
      WebServerTest.Answer answers = WebServerTest.send(page);
      assertEquals(200, answers.status());
      assertTrue(answers.raw().body().length() < 20_000, "a page never ships the megabyte");
      JsonNode longOne = null;
      for (JsonNode a : answers.json().get("answers")) {
        if (a.get("respondent").asText().equals("L1")) {
          longOne = a;
        } else {
          assertFalse(a.get("truncated").asBoolean());
        }
      }
      assertTrue(longOne.get("truncated").asBoolean());
      assertEquals(cell.length(), longOne.get("length").asInt());
      assertEquals(
          cell.substring(0, riffle.model.ShownText.MAX_CHARS), longOne.get("text").asText());

      long id = longOne.get("id").asLong();
      WebServerTest.Answer whole =
          WebServerTest.send(
              HttpRequest.newBuilder(s.url().resolve("/api/answers/" + id + "/text")).GET());
      assertEquals(cell.toString(), whole.json().get("text").asText());
      assertEquals(
          404,
          WebServerTest.send(
                  HttpRequest.newBuilder(s.url().resolve("/api/answers/999999/text")).GET())
              .status());

      WebServerTest.Answer end =
          WebServerTest.send(
              HttpRequest.newBuilder(s.url().resolve("/api/search?q=zanzibarish")).GET());
      assertEquals(1, end.json().get("total").asInt(), "the whole answer is searched");
      JsonNode hit = end.json().get("hits").get(0);
      assertTrue(hit.get("truncated").asBoolean());
      assertEquals(riffle.model.ShownText.MAX_CHARS, hit.get("text").asText().length());
      assertEquals(0, hit.get("highlight").size(), "the match lies past what was sent");
      WebServerTest.Answer start =
          WebServerTest.send(HttpRequest.newBuilder(s.url().resolve("/api/search?q=late")).GET());
      JsonNode first = start.json().get("hits").get(0).get("highlight").get(0);
      assertEquals("late", cell.substring(first.get("start").asInt(), first.get("end").asInt()));
      assertTrue(start.raw().body().length() < 20_000);
    }
  }

  @Test
  void anUnexpectedFailureNamesNoExceptionClass() {
    Errors.Failure f = Errors.of(new NullPointerException("Cannot invoke \"String.strip()\""));
    assertEquals(500, f.status());
    String message = f.body().get("error").toString();
    assertFalse(message.contains("NullPointerException"), message);
    assertFalse(message.contains("strip"), message);
    assertTrue(message.contains("nothing was half-written"), message);

    // Javalin's own refusals keep their status and get our words, never their reason text
    Errors.Failure inside = Errors.of(new io.javalin.http.InternalServerErrorResponse("boom"));
    assertEquals(500, inside.status());
    assertTrue(inside.body().get("error").toString().contains("nothing was half-written"));
    Errors.Failure odd = Errors.of(new io.javalin.http.HttpResponseException(418, "teapot"));
    assertEquals(418, odd.status());
    assertEquals("the request cannot be served (HTTP 418)", odd.body().get("error"));
  }

  private static String host() {
    return "127.0.0.1:" + server.url().getPort();
  }

  /**
   * A response read off a raw socket.
   *
   * @param status the status code
   * @param head the status line and headers
   * @param body the body
   */
  record Raw(int status, String head, String body) {
    String contentType() {
      for (String line : head.split("\r\n")) {
        if (line.toLowerCase(java.util.Locale.ROOT).startsWith("content-type:")) {
          return line.substring("content-type:".length()).strip();
        }
      }
      return "";
    }
  }

  /** Sends bytes the HTTP client would refuse to send, and reads the answer until it closes. */
  static Raw raw(String request) throws IOException {
    try (Socket s = new Socket(server.url().getHost(), server.url().getPort())) {
      s.setSoTimeout(10_000);
      OutputStream out = s.getOutputStream();
      out.write(request.getBytes(StandardCharsets.ISO_8859_1));
      out.flush();
      ByteArrayOutputStream all = new ByteArrayOutputStream();
      InputStream in = s.getInputStream();
      try {
        in.transferTo(all);
      } catch (java.net.SocketException e) {
        // the server may reset after answering; what arrived is the answer
      }
      String text = all.toString(StandardCharsets.UTF_8);
      int split = text.indexOf("\r\n\r\n");
      String head = split < 0 ? text : text.substring(0, split);
      String body = split < 0 ? "" : text.substring(split + 4);
      int status = Integer.parseInt(head.substring(9, 12));
      return new Raw(status, head, body);
    }
  }
}
