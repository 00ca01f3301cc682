package riffle.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.net.HttpURLConnection;
import java.net.Socket;
import java.net.URI;
import java.net.URISyntaxException;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.Future;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.app.Project;
import riffle.model.InputException;
import riffle.model.Progress;

/** The API as the page meets it: a real server on port 0, a real project, plain HTTP. */
class WebServerTest {
  static final String HOSTILE = "<img src=x onerror=alert(1)>";

  @TempDir static Path dir;
  static WebServer server;
  static final HttpClient HTTP =
      HttpClient.newBuilder().followRedirects(HttpClient.Redirect.NEVER).build();

  static Path fixture(String name) {
    try {
      return Path.of(WebServerTest.class.getResource("/riffle/web/" + name).toURI());
    } catch (URISyntaxException e) {
      throw new IllegalStateException(e);
    }
  }

  /** A project holding the small fixture wave, as "Wave 1". */
  static Path smallProject(Path folder) throws Exception {
    Path project = folder.resolve("shop.riffle");
    Project.importInto(
        project,
        ImportRequest.from(new ImportSource.File(fixture("small-wave.csv"))).wave("Wave 1").get(),
        Progress.NONE);
    return project;
  }

  @BeforeAll
  static void start() throws Exception {
    server = WebServer.start(smallProject(dir), WebServer.Options.defaults());
  }

  @AfterAll
  static void stop() {
    server.close();
  }

  record Answer(int status, JsonNode json, HttpResponse<String> raw) {}

  static String origin(WebServer s) {
    String u = s.url().toString();
    return u.substring(0, u.length() - 1);
  }

  static Answer get(String path) throws Exception {
    return send(HttpRequest.newBuilder(server.url().resolve(path)).GET());
  }

  static Answer post(String path, String json) throws Exception {
    return send(
        HttpRequest.newBuilder(server.url().resolve(path))
            .header("Origin", origin(server))
            .header("Content-Type", "application/json")
            .POST(HttpRequest.BodyPublishers.ofString(json)));
  }

  static Answer send(HttpRequest.Builder request) throws Exception {
    HttpResponse<String> r =
        HTTP.send(request.build(), HttpResponse.BodyHandlers.ofString(StandardCharsets.UTF_8));
    JsonNode json =
        r.headers().firstValue("Content-Type").orElse("").startsWith("application/json")
            ? ApiJson.MAPPER.readTree(r.body())
            : null;
    return new Answer(r.statusCode(), json, r);
  }

  static String q(String s) {
    return URLEncoder.encode(s, StandardCharsets.UTF_8);
  }

  static String pasteJson(String text) throws Exception {
    return ApiJson.MAPPER.writeValueAsString(java.util.Map.of("paste", text));
  }

  @Test
  void projectSummaryCountsTheWaves() throws Exception {
    Answer a = get("/api/project");
    assertEquals(200, a.status());
    assertEquals("shop.riffle", a.json().get("name").asText());
    JsonNode waves = a.json().get("summary").get("waves");
    assertEquals("Wave 1", waves.get(0).get("name").asText());
    assertEquals(12, waves.get(0).get("answers").asInt());
    assertEquals(11, waves.get(0).get("substantive").asInt(), "'nothing' is a non-answer");
  }

  @Test
  void everyAnswerCarriesTheSecurityHeaders() throws Exception {
    Answer page = get("/");
    assertEquals(200, page.status());
    assertTrue(page.raw().body().contains("js/app.js"));
    String csp = page.raw().headers().firstValue("Content-Security-Policy").orElseThrow();
    assertTrue(csp.startsWith("default-src 'self'"), csp);
    assertFalse(csp.contains("unsafe-inline"), csp);
    assertEquals("nosniff", page.raw().headers().firstValue("X-Content-Type-Options").get());
    Answer api = get("/api/project");
    assertEquals("no-store", api.raw().headers().firstValue("Cache-Control").get());
    assertTrue(api.raw().headers().firstValue("Content-Security-Policy").isPresent());
    assertTrue(page.raw().body().contains("<link rel=\"icon\" href=\"favicon.svg\""));
    Answer icon = get("/favicon.svg");
    assertEquals(200, icon.status());
    assertTrue(
        icon.raw().headers().firstValue("Content-Type").get().contains("image/svg+xml"),
        "the favicon needs its image type under nosniff");
    assertTrue(csp.contains("img-src 'self'"), "the page's own favicon is allowed: " + csp);
    Answer script = get("/js/dom.js");
    assertEquals(200, script.status());
    assertTrue(
        script.raw().headers().firstValue("Content-Type").get().contains("javascript"),
        "modules need a JavaScript type under nosniff");
  }

  @Test
  void malformedJsonIsRefusedWithItsPosition() throws Exception {
    Answer a = post("/api/import/preview", "{\"paste\": \"a\tb\n");
    assertEquals(400, a.status());
    assertTrue(a.json().get("error").asText().contains("not valid JSON"), a.json().toString());
    assertEquals(1, a.json().get("where").get("line").asInt());
    Answer empty = post("/api/import/preview", "");
    assertEquals(400, empty.status());
    Answer notObject = post("/api/import/preview", "[1, 2]");
    assertEquals(400, notObject.status());
    assertTrue(notObject.json().get("error").asText().contains("JSON object"));
  }

  @Test
  void unknownFieldsAreRefusedByName() throws Exception {
    Answer a = post("/api/import/preview", "{\"paste\": \"x\", \"delimeter\": \"tab\"}");
    assertEquals(400, a.status());
    assertEquals("delimeter", a.json().get("where").get("field").asText());
    assertTrue(a.json().get("error").asText().contains("delimiter"), "lists the real fields");
    Answer role =
        post(
            "/api/import/preview",
            "{\"paste\": \"x\", \"columns\": [{\"header\": \"x\", \"role\": \"question\"}]}");
    assertEquals(400, role.status());
    assertEquals("columns.0.role", role.json().get("where").get("field").asText());
    assertTrue(
        role.json().get("error").asText().contains("id, date, text, meta"), role.json() + "");
  }

  @Test
  void missingItemsAre404() throws Exception {
    assertEquals(404, get("/api/imports/j12345").status());
    assertEquals(404, get("/api/answers/999999/similar").status());
    Answer route = get("/api/nowhere");
    assertEquals(404, route.status());
    assertTrue(route.json().get("error").asText().contains("/api/nowhere"));
    Answer upload = post("/api/import/preview", "{\"upload\": \"u999\"}");
    assertEquals(404, upload.status());
    assertTrue(upload.json().get("error").asText().contains("choose the file again"));
    assertEquals(400, get("/api/answers/abc/similar").status());
  }

  @Test
  void aBadQueryIs400WithItsColumn() throws Exception {
    Answer a = get("/api/search?q=" + q("(delivery OR price"));
    assertEquals(400, a.status());
    JsonNode where = a.json().get("where");
    assertEquals("query", where.get("source").asText());
    assertEquals(19, where.get("column").asInt(), a.json().toString());
    assertEquals(400, get("/api/search").status());
    Answer limit = get("/api/search?q=delivery&limit=lots");
    assertEquals(400, limit.status());
    assertEquals("limit", limit.json().get("where").get("parameter").asText());
    assertEquals("limit must be a whole number, not 'lots'", limit.json().get("error").asText());
    Answer tooMany = get("/api/search?q=delivery&limit=100000");
    assertEquals(400, tooMany.status());
    assertTrue(
        tooMany
            .json()
            .get("error")
            .asText()
            .matches("limit must be a whole number from 1 to \\d+, not '100000'"),
        tooMany.json().toString());
  }

  @Test
  void searchFindsAnswersWithHighlightsAndCountsPerWave() throws Exception {
    Answer a = get("/api/search?q=" + q("\"delivery date\""));
    assertEquals(200, a.status());
    assertEquals(2, a.json().get("total").asInt());
    assertEquals(2, a.json().get("waves").get("Wave 1").asInt());
    JsonNode hit = a.json().get("hits").get(0);
    String text = hit.get("text").asText();
    JsonNode stretch = hit.get("highlight").get(0);
    assertEquals(
        "delivery date",
        text.substring(stretch.get("start").asInt(), stretch.get("end").asInt())
            .toLowerCase(java.util.Locale.ROOT));
    long id = hit.get("answer_id").asLong();
    Answer like = get("/api/answers/" + id + "/similar");
    assertEquals(200, like.status());
    assertTrue(like.json().get("total").asInt() > 0);
    for (JsonNode h : like.json().get("hits")) {
      assertFalse(h.get("answer_id").asLong() == id, "an answer is not like itself");
    }
  }

  @Test
  void hostileTextComesBackAsData() throws Exception {
    Answer a = get("/api/search?q=onerror");
    assertEquals(200, a.status());
    assertTrue(a.raw().headers().firstValue("Content-Type").get().startsWith("application/json"));
    assertEquals(HOSTILE, a.json().get("hits").get(0).get("text").asText());
  }

  @Test
  void personalDataIsMaskedInSearchAndPreview() throws Exception {
    Answer preview =
        post(
            "/api/import/preview",
            pasteJson("id\tWhy?\n1\tmail me at zoe.k@example.com about the grinder please\n"));
    assertEquals(200, preview.status());
    String cell = preview.json().get("rows").get(0).get("cells").get(1).asText();
    assertTrue(cell.contains("[email]"), cell);
    assertFalse(cell.contains("zoe.k"), cell);
  }

  @Test
  void changesFromAnotherOriginAreRefused() throws Exception {
    String body = pasteJson("id\tWhy?\n1\tthe delivery date was unclear to me\n");
    HttpRequest.Builder foreign =
        HttpRequest.newBuilder(server.url().resolve("/api/import/preview"))
            .header("Origin", "http://evil.example")
            .POST(HttpRequest.BodyPublishers.ofString(body));
    Answer a = send(foreign);
    assertEquals(403, a.status());
    assertTrue(a.json().get("error").asText().contains("evil.example"));
    Answer none =
        send(
            HttpRequest.newBuilder(server.url().resolve("/api/import/preview"))
                .POST(HttpRequest.BodyPublishers.ofString(body)));
    assertEquals(403, none.status());
    Answer referer =
        send(
            HttpRequest.newBuilder(server.url().resolve("/api/import/preview"))
                .header("Referer", server.url().resolve("/#bring").toString())
                .POST(HttpRequest.BodyPublishers.ofString(body)));
    assertEquals(200, referer.status(), "the page's own Referer stands in for a missing Origin");
  }

  @Test
  void anotherHostNameIsRefused() throws Exception {
    // A page on another name rebound to 127.0.0.1 sends its own name as Host.
    try (Socket s = new Socket(server.url().getHost(), server.url().getPort())) {
      OutputStream out = s.getOutputStream();
      out.write(
          ("GET /api/project HTTP/1.1\r\nHost: evil.example:"
                  + server.url().getPort()
                  + "\r\nConnection: close\r\n\r\n")
              .getBytes(StandardCharsets.US_ASCII));
      out.flush();
      BufferedReader in =
          new BufferedReader(new InputStreamReader(s.getInputStream(), StandardCharsets.UTF_8));
      String status = in.readLine();
      assertTrue(status.contains(" 403 "), status);
    }
    assertEquals(
        200,
        send(HttpRequest.newBuilder(
                    URI.create("http://localhost:" + server.url().getPort() + "/api/project"))
                .GET())
            .status(),
        "localhost names the same server");
  }

  @Test
  void aTokenIsRequiredWhenTheServerAsksForOne() throws Exception {
    Path other = Files.createDirectories(dir.resolve("token"));
    try (WebServer guarded =
        WebServer.start(smallProject(other), WebServer.Options.defaults().withToken())) {
      String token = guarded.accessToken().orElseThrow();
      assertTrue(token.length() >= 32);
      assertTrue(guarded.openUrl().toString().endsWith("?token=" + token));
      URI project = guarded.url().resolve("/api/project");
      assertEquals(401, send(HttpRequest.newBuilder(project).GET()).status());
      Answer wrong = send(HttpRequest.newBuilder(project).header(Guard.TOKEN_HEADER, "x").GET());
      assertEquals(401, wrong.status());
      assertTrue(wrong.json().get("error").asText().contains("?token="));
      assertEquals(
          200,
          send(HttpRequest.newBuilder(project).header(Guard.TOKEN_HEADER, token).GET()).status());

      Answer first = send(HttpRequest.newBuilder(guarded.openUrl()).GET());
      assertEquals(303, first.status());
      assertEquals("/", first.raw().headers().firstValue("Location").orElseThrow());
      String cookie = first.raw().headers().firstValue("Set-Cookie").orElseThrow();
      assertTrue(cookie.startsWith(Guard.TOKEN_COOKIE + "=" + token), cookie);
      assertTrue(cookie.contains("HttpOnly"), cookie);
      assertTrue(cookie.toLowerCase(java.util.Locale.ROOT).contains("samesite=strict"), cookie);
      assertEquals(
          200,
          send(HttpRequest.newBuilder(project)
                  .header("Cookie", Guard.TOKEN_COOKIE + "=" + token)
                  .GET())
              .status());
      assertEquals(
          401, send(HttpRequest.newBuilder(guarded.url().resolve("/?token=guess")).GET()).status());
    }
  }

  @Test
  void beyondLoopbackATokenIsAlwaysRequired() {
    assertTrue(Guard.isLoopback("127.0.0.1"));
    assertTrue(Guard.isLoopback("localhost"));
    assertTrue(Guard.isLoopback("::1"));
    assertFalse(Guard.isLoopback("0.0.0.0"));
    assertFalse(Guard.isLoopback("192.168.1.20"));
  }

  @Test
  void uploadPreviewThenImportWithAChangedRole() throws Exception {
    byte[] bytes =
        ("id;plan;Why did you choose us?\n"
                + "A1;basic;The refurbished grinder was half the price of a new one\n"
                + "A2;plus;Friendly chat support answered within minutes\n"
                + "A3;basic;The warranty made the used machine feel safe\n")
            .getBytes(StandardCharsets.UTF_8);
    Answer upload =
        send(
            HttpRequest.newBuilder(server.url().resolve("/api/uploads?name=choose.csv"))
                .header("Origin", origin(server))
                .POST(HttpRequest.BodyPublishers.ofByteArray(bytes)));
    assertEquals(201, upload.status());
    String id = upload.json().get("upload").asText();
    Answer preview = post("/api/import/preview", "{\"upload\": \"" + id + "\"}");
    assertEquals(200, preview.status(), preview.json() + "");
    assertEquals("semicolon", preview.json().get("delimiter").asText());
    assertTrue(preview.json().get("delimiter_detected").asBoolean());
    assertEquals(3, preview.json().get("total_rows").asInt());
    assertEquals("meta", preview.json().get("columns").get(1).get("role").asText());

    String commit =
        "{\"upload\": \""
            + id
            + "\", \"wave\": \"Wave 2\", \"date\": \"2026-11-01\", \"columns\": ["
            + "{\"header\": \"id\", \"role\": \"id\"},"
            + "{\"header\": \"plan\", \"role\": \"ignored\"},"
            + "{\"header\": \"Why did you choose us?\", \"role\": \"text\"}]}";
    Answer started = post("/api/imports", commit);
    assertEquals(202, started.status(), started.json() + "");
    JsonNode job = poll(started.json().get("job").asText());
    assertEquals("done", job.get("state").asText(), job.toString());
    JsonNode report = job.get("report");
    assertEquals("Wave 2", report.get("wave").asText());
    assertEquals("2026-11-01", report.get("fielded_on").asText());
    assertEquals(3, report.get("answers").asInt());
    assertEquals("ignored", report.get("columns").get(1).get("role").asText());
    JsonNode waves = get("/api/project").json().get("summary").get("waves");
    assertTrue(waves.size() >= 2);
    assertEquals(200, get("/api/search?q=" + q("wave:\"Wave 2\" AND warranty")).status());
  }

  @Test
  void aWorkbookUploadIsPreviewedSheetBySheet() throws Exception {
    org.apache.poi.xssf.usermodel.XSSFWorkbook wb =
        new org.apache.poi.xssf.usermodel.XSSFWorkbook();
    Object[] header = {"id", "Why did you choose us?"};
    riffle.ingest.Workbooks.sheet(
        wb,
        "Answers",
        header,
        new Object[] {1, "The refurbished grinder was half the price of a new one"},
        new Object[] {2, "Friendly chat support answered within minutes"});
    riffle.ingest.Workbooks.sheet(
        wb, "Wave 2", header, new Object[] {3, "The warranty made the used machine feel safe"});
    Answer upload =
        send(
            HttpRequest.newBuilder(server.url().resolve("/api/uploads?name=choose.xlsx"))
                .header("Origin", origin(server))
                .POST(HttpRequest.BodyPublishers.ofByteArray(riffle.ingest.Workbooks.bytes(wb))));
    assertEquals(201, upload.status());
    String id = upload.json().get("upload").asText();
    Answer first = post("/api/import/preview", "{\"upload\": \"" + id + "\"}");
    assertEquals(200, first.status(), first.json() + "");
    assertEquals("Excel workbook (sheet 'Answers')", first.json().get("encoding").asText());
    assertEquals(2, first.json().get("total_rows").asInt());
    assertEquals(
        "sheet 'Wave 2' (2 rows) was not read; --sheet 2 reads it",
        first.json().get("problems").get(0).get("message").asText());
    Answer second =
        post("/api/import/preview", "{\"upload\": \"" + id + "\", \"sheet\": \"Wave 2\"}");
    assertEquals(200, second.status(), second.json() + "");
    assertEquals("choose.xlsx:Wave 2", second.json().get("source").asText());
    assertEquals(1, second.json().get("total_rows").asInt());
    Answer none = post("/api/import/preview", "{\"upload\": \"" + id + "\", \"sheet\": \"9\"}");
    assertEquals(400, none.status(), none.json() + "");
    assertTrue(none.json().get("error").asText().contains("no sheet '9'"), none.json() + "");
  }

  static JsonNode poll(String job) throws Exception {
    for (int i = 0; i < 1_200; i++) {
      JsonNode state = get("/api/imports/" + job).json();
      if (!state.get("state").asText().matches("queued|running")) {
        return state;
      }
      Thread.sleep(50);
    }
    throw new AssertionError("the import did not finish within a minute");
  }

  @Test
  void aBadPasteIsRefusedWithItsLine() throws Exception {
    String paste = Files.readString(fixture("unclosed-quote.tsv"), StandardCharsets.UTF_8);
    Answer a = post("/api/import/preview", pasteJson(paste));
    assertEquals(400, a.status(), a.json() + "");
    assertEquals(3, a.json().get("where").get("line").asInt());
    assertEquals("paste", a.json().get("where").get("source").asText());
    int wavesBefore = get("/api/project").json().get("summary").get("waves").size();
    Answer commit =
        post(
            "/api/imports",
            ApiJson.MAPPER.writeValueAsString(java.util.Map.of("paste", paste, "wave", "Broken")));
    JsonNode job = poll(commit.json().get("job").asText());
    assertEquals("failed", job.get("state").asText());
    assertEquals(3, job.get("error").get("where").get("line").asInt());
    assertEquals(wavesBefore, get("/api/project").json().get("summary").get("waves").size());
  }

  @Test
  void importChoicesAreCheckedFieldByField() throws Exception {
    String paste = "id\tWhy?\n1\tthe delivery date was unclear to me\n";
    Answer date =
        post(
            "/api/imports",
            ApiJson.MAPPER.writeValueAsString(
                java.util.Map.of("paste", paste, "date", "15/09/2026")));
    assertEquals(400, date.status());
    assertEquals("date", date.json().get("where").get("field").asText());
    Answer both = post("/api/imports", "{\"paste\": \"x\", \"upload\": \"u1\"}");
    assertEquals(400, both.status());
    Answer twoIds =
        post(
            "/api/import/preview",
            ApiJson.MAPPER.writeValueAsString(
                java.util.Map.of(
                    "paste",
                    paste,
                    "columns",
                    java.util.List.of(
                        java.util.Map.of("header", "id", "role", "id"),
                        java.util.Map.of("header", "Why?", "role", "id")))));
    assertEquals(400, twoIds.status());
    assertEquals("columns.1", twoIds.json().get("where").get("field").asText());
    Answer delimiter =
        post(
            "/api/import/preview",
            ApiJson.MAPPER.writeValueAsString(java.util.Map.of("paste", paste, "delimiter", "#")));
    assertEquals("delimiter", delimiter.json().get("where").get("field").asText());
  }

  @Test
  void phrasesPerWaveAndTheirChecks() throws Exception {
    Answer a = get("/api/phrases?question=1&wave=" + q("Wave 1"));
    assertEquals(200, a.status(), a.json() + "");
    assertTrue(a.json().get("answers").asInt() >= 11);
    assertTrue(a.json().has("phrases") && a.json().has("clusters"));
    Answer against = get("/api/phrases?against=" + q("Wave 1"));
    assertEquals(400, against.status());
    assertTrue(against.json().get("error").asText().contains("wave"));
    Answer unknown = get("/api/phrases?wave=" + q("Wave 77"));
    assertEquals(400, unknown.status());
    Answer segment = get("/api/phrases?segment=mobile");
    assertEquals(400, segment.status());
    assertEquals("segment", segment.json().get("where").get("parameter").asText());
  }

  @Test
  void workWaitsItsTurnAndIsAnsweredBusyAfterTheWait() throws Exception {
    try (ProjectAccess access = ProjectAccess.open(dir.resolve("busy.riffle"), 100)) {
      CountDownLatch release = new CountDownLatch(1);
      Future<Object> holder =
          access.submit(
              p -> {
                release.await();
                return null;
              });
      ApiError busy = assertThrows(ApiError.class, () -> access.call(p -> p.summary()));
      assertEquals(503, busy.status());
      assertTrue(busy.getMessage().contains("busy"));
      release.countDown();
      holder.get();
      assertEquals(0, access.call(p -> p.summary()).answers());
      IllegalArgumentException bad =
          assertThrows(
              IllegalArgumentException.class,
              () ->
                  access.call(
                      p -> {
                        throw new IllegalArgumentException("no such wave");
                      }));
      assertEquals("no such wave", bad.getMessage());
    }
  }

  @Test
  void unexpectedFailuresAreAGeneric500() {
    Errors.Failure f = Errors.of(new IllegalStateException("answer text: " + HOSTILE));
    assertEquals(500, f.status());
    assertFalse(f.body().get("error").toString().contains(HOSTILE));
    assertEquals(422, Errors.of(new riffle.model.InputException("not a project", null)).status());
  }

  @Test
  void aBrokenInvariantIsAFaultOfRiffleAndASettingIsNamedAsSuch() {
    Errors.Failure bug = Errors.of(new IllegalArgumentException("counts must not be negative"));
    assertEquals(500, bug.status(), "a bug is not the person's bad input");
    assertFalse(bug.body().get("error").toString().contains("negative"));
    Errors.Failure wave =
        Errors.of(new riffle.model.SettingException("wave", "no wave named \"Spring\""));
    assertEquals(400, wave.status());
    assertEquals("no wave named \"Spring\"", wave.body().get("error"));
    assertEquals(java.util.Map.of("setting", "wave"), wave.body().get("where"));
    assertEquals(400, Errors.of(new riffle.model.InputException("a code needs a name")).status());
  }

  @Test
  void aWebFolderWithoutAPageIsRefused() throws Exception {
    Path empty = Files.createDirectories(dir.resolve("empty-web"));
    InputException e =
        assertThrows(
            InputException.class,
            () ->
                WebServer.start(
                    dir.resolve("x.riffle"), WebServer.Options.defaults().webDir(empty)));
    assertTrue(e.getMessage().contains("index.html"));
    assertThrows(InputException.class, () -> WebServer.Options.defaults().at("127.0.0.1", 70000));
  }

  @Test
  void theWorkingCopyOfThePageCanBeServed() throws Exception {
    Path other = Files.createDirectories(dir.resolve("dev"));
    try (WebServer dev =
        WebServer.start(
            other.resolve("dev.riffle"), WebServer.Options.defaults().webDir(Path.of("web")))) {
      HttpURLConnection c =
          (HttpURLConnection) dev.url().resolve("/js/app.js").toURL().openConnection();
      assertEquals(200, c.getResponseCode());
      c.disconnect();
    }
  }
}
