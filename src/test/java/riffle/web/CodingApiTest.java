package riffle.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.ByteArrayInputStream;
import java.io.StringReader;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The coding API as the page meets it: a real server on port 0 over the small fixture wave. Each
 * test makes codes of its own (names differ), so the tests do not depend on their order.
 */
class CodingApiTest {
  @TempDir static Path dir;
  static WebServer server;

  @BeforeAll
  static void start() throws Exception {
    server = WebServer.start(WebServerTest.smallProject(dir), WebServer.Options.defaults());
    WebServerTest.server = server;
  }

  @AfterAll
  static void stop() {
    server.close();
  }

  static WebServerTest.Answer get(String path) throws Exception {
    return WebServerTest.send(HttpRequest.newBuilder(server.url().resolve(path)).GET());
  }

  static WebServerTest.Answer post(String path, Object body) throws Exception {
    String json = body instanceof String s ? s : ApiJson.MAPPER.writeValueAsString(body);
    return WebServerTest.send(
        HttpRequest.newBuilder(server.url().resolve(path))
            .header("Origin", WebServerTest.origin(server))
            .header("Content-Type", "application/json")
            .POST(HttpRequest.BodyPublishers.ofString(json)));
  }

  static WebServerTest.Answer patch(String path, Object body) throws Exception {
    return WebServerTest.send(
        HttpRequest.newBuilder(server.url().resolve(path))
            .header("Origin", WebServerTest.origin(server))
            .header("Content-Type", "application/json")
            .method(
                "PATCH",
                HttpRequest.BodyPublishers.ofString(ApiJson.MAPPER.writeValueAsString(body))));
  }

  static long code(String name, String key) throws Exception {
    WebServerTest.Answer a =
        post(
            "/api/codes",
            key == null
                ? Map.of("coder", "ana", "name", name)
                : Map.of("coder", "ana", "name", name, "key", key));
    assertEquals(201, a.status(), a.raw().body());
    return a.json().get("code").get("id").asLong();
  }

  /** The answer ids of the fixture, in id order. */
  static List<Long> answers() throws Exception {
    JsonNode page = get("/api/answers?limit=100").json();
    List<Long> ids = new ArrayList<>();
    page.get("answers").forEach(a -> ids.add(a.get("id").asLong()));
    return ids;
  }

  static List<String> codesOf(long answer) throws Exception {
    JsonNode a = get("/api/assignments?answers=" + answer).json().get("assignments");
    List<String> out = new ArrayList<>();
    JsonNode list = a.get(Long.toString(answer));
    if (list != null) {
      list.forEach(x -> out.add(x.get("code_id").asText()));
    }
    return out;
  }

  @Test
  void theCodebookIsBuiltChangedMergedSplitAndArchived() throws Exception {
    long late = code("Late parcel", "l");
    long slow = code("Slow parcel", null);
    WebServerTest.Answer dup = post("/api/codes", Map.of("coder", "ana", "name", "late PARCEL"));
    assertEquals(400, dup.status(), "names are unique regardless of case");

    WebServerTest.Answer changed =
        patch(
            "/api/codes/" + late,
            Map.of(
                "coder", "ana",
                "name", "Parcel too late",
                "description", "The parcel came after the promised day",
                "colour", "#a34",
                "direction", "friction"));
    assertEquals(200, changed.status(), changed.raw().body());
    assertEquals("Parcel too late", changed.json().get("code").get("name").asText());
    assertEquals("l", changed.json().get("code").get("key").asText(), "absent fields stay");
    assertEquals("friction", changed.json().get("code").get("direction").asText());
    WebServerTest.Answer badKey = patch("/api/codes/" + slow, Map.of("coder", "ana", "key", "j"));
    assertEquals(400, badKey.status(), "j moves on the coding screen");

    long answer = answers().get(1);
    assertEquals(200, post("/api/assignments", assign(answer, slow)).status());
    WebServerTest.Answer merged =
        post("/api/codes/merge", Map.of("coder", "ana", "codes", List.of(slow), "into", late));
    assertEquals(200, merged.status(), merged.raw().body());
    assertTrue(merged.json().get("message").asText().contains("1 assignment(s) moved"));
    assertTrue(codesOf(answer).contains(Long.toString(late)), codesOf(answer).toString());
    assertFalse(codesOf(answer).contains(Long.toString(slow)));

    WebServerTest.Answer split =
        post(
            "/api/codes/" + late + "/split",
            Map.of("coder", "ana", "code", Map.of("name", "Date changed"), "query", "changed"));
    assertEquals(200, split.status(), split.raw().body());

    WebServerTest.Answer moved =
        post("/api/codes/" + late + "/move", Map.of("coder", "ana", "place", 1));
    assertEquals(200, moved.status(), moved.raw().body());
    JsonNode book = get("/api/codes").json();
    assertEquals("Parcel too late", book.get("codes").get(0).get("name").asText());
    assertEquals(1, book.get("uses").get(Long.toString(late)).asInt());

    WebServerTest.Answer archived =
        post("/api/codes/" + late + "/archive", Map.of("coder", "ana", "archived", true));
    assertEquals(200, archived.status());
    WebServerTest.Answer refused = post("/api/assignments", assign(answers().get(2), late));
    assertEquals(400, refused.status(), "an archived code codes nothing");
    assertTrue(refused.json().get("error").asText().contains("archived"));
  }

  static Map<String, Object> assign(long answer, long code) {
    return Map.of("coder", "ana", "answer", answer, "code", code);
  }

  @Test
  void badRequestsAre4xxAndNameTheProblem() throws Exception {
    long answer = answers().get(0);
    WebServerTest.Answer unknown = post("/api/assignments", assign(answer, 999_999));
    assertEquals(404, unknown.status());
    assertTrue(unknown.json().get("error").asText().contains("no code 999999"));

    long code = code("Arrival worry", null);
    WebServerTest.Answer pastEnd =
        post(
            "/api/assignments",
            Map.of(
                "coder",
                "ana",
                "answer",
                answer,
                "code",
                code,
                "span",
                Map.of("start", 3, "end", 5_000)));
    assertEquals(400, pastEnd.status());
    assertTrue(pastEnd.json().get("error").asText().contains("runs past the end"));
    WebServerTest.Answer backwards =
        post(
            "/api/assignments",
            Map.of(
                "coder",
                "ana",
                "answer",
                answer,
                "code",
                code,
                "span",
                Map.of("start", 9, "end", 4)));
    assertEquals(400, backwards.status());
    assertEquals("span", backwards.json().get("where").get("field").asText());
    assertEquals(List.of(), codesOf(answer), "nothing was given");

    WebServerTest.Answer noAnswer = post("/api/assignments", assign(123_456, code));
    assertEquals(400, noAnswer.status());

    WebServerTest.Answer badQuery =
        get("/api/answers?wave=Wave%201&q=" + WebServerTest.q("(price OR"));
    assertEquals(400, badQuery.status(), badQuery.raw().body());
    assertEquals("query", badQuery.json().get("where").get("source").asText());
    assertEquals(
        10,
        badQuery.json().get("where").get("column").asInt(),
        "the column counts in what the person typed, not in the query the filters made");

    WebServerTest.Answer malformed =
        post("/api/assignments", "{\"coder\": \"ana\",\n \"answer\": }");
    assertEquals(400, malformed.status());
    assertEquals(2, malformed.json().get("where").get("line").asInt());

    WebServerTest.Answer noCoder = post("/api/assignments", Map.of("answer", answer, "code", code));
    assertEquals(400, noCoder.status());
    assertEquals("coder", noCoder.json().get("where").get("field").asText());

    WebServerTest.Answer unknownField =
        post("/api/undo", Map.of("coder", "ana", "everything", true));
    assertEquals(400, unknownField.status());

    assertEquals(400, get("/api/answers?wave=Wave%209").status());
    assertEquals(400, get("/api/answers?coded=maybe").status());
    assertEquals(404, get("/api/answers?code=424242").status());
    assertEquals(400, get("/api/answers?limit=501").status());
    assertEquals(400, get("/api/suggestions?answers=1,x").status());
  }

  @Test
  void twoConcurrentAssignmentsToOneAnswerBothLand() throws Exception {
    long a = code("Gift timing", null);
    long b = code("Weekend arrival", null);
    long answer = answers().get(11);
    CountDownLatch go = new CountDownLatch(1);
    ExecutorService pool = Executors.newFixedThreadPool(2);
    try {
      List<Future<WebServerTest.Answer>> both = new ArrayList<>();
      for (long code : List.of(a, b)) {
        both.add(
            pool.submit(
                () -> {
                  go.await();
                  return post(
                      "/api/assignments",
                      Map.of("coder", code == a ? "ana" : "ben", "answer", answer, "code", code));
                }));
      }
      go.countDown();
      for (Future<WebServerTest.Answer> f : both) {
        assertEquals(200, f.get().status(), f.get().raw().body());
      }
    } finally {
      pool.shutdown();
    }
    List<String> codes = codesOf(answer);
    assertTrue(
        codes.contains(Long.toString(a)) && codes.contains(Long.toString(b)), codes.toString());
  }

  @Test
  void undoTakesBackOnlyTheCodersOwnChange() throws Exception {
    long code = code("Pump doubts", null);
    long answer = answers().get(2);
    WebServerTest.Answer given =
        post(
            "/api/assignments",
            Map.of(
                "coder",
                "cai",
                "answer",
                answer,
                "code",
                code,
                "span",
                Map.of("start", 18, "end", 26)));
    assertEquals(200, given.status(), given.raw().body());
    JsonNode span = given.json().get("assignments").get(0).get("span");
    assertEquals(18, span.get("start").asInt());
    assertEquals(
        "warranty",
        get("/api/answers?q=pump")
            .json()
            .get("answers")
            .get(0)
            .get("text")
            .asText()
            .substring(18, 26));
    long other = code("Cover doubts", null);
    assertEquals(
        200,
        post("/api/assignments", Map.of("coder", "dee", "answer", answer, "code", other)).status());
    WebServerTest.Answer undone = post("/api/undo", Map.of("coder", "cai"));
    assertEquals(200, undone.status());
    assertEquals(List.of(Long.toString(other)), codesOf(answer), "dee's code stays");
    assertEquals(200, post("/api/redo", Map.of("coder", "cai")).status());
    assertEquals(2, codesOf(answer).size());
    WebServerTest.Answer off =
        post("/api/assignments/remove", Map.of("coder", "dee", "answer", answer, "code", other));
    assertEquals(1, off.json().get("assignments").size());
    JsonNode history = get("/api/history?limit=5").json().get("history");
    assertEquals("unassign", history.get(0).get("action").asText());
    assertEquals("dee", history.get(0).get("actor").asText());
  }

  @Test
  void theAnswerListPagesThroughFilteredAnswers() throws Exception {
    JsonNode all = get("/api/answers?limit=5").json();
    assertEquals(12, all.get("total").asInt());
    assertEquals(5, all.get("answers").size());
    JsonNode second = get("/api/answers?limit=5&offset=5").json();
    assertTrue(
        second.get("answers").get(0).get("id").asLong()
            > all.get("answers").get(4).get("id").asLong(),
        "pages follow id order");
    JsonNode mobile =
        get("/api/answers?segment=device%3Dmobile&q=" + WebServerTest.q("sure")).json();
    assertEquals(2, mobile.get("total").asInt(), mobile.toString());
    mobile
        .get("answers")
        .forEach(a -> assertEquals("mobile", a.get("segments").get("device").asText()));
    JsonNode hostile = get("/api/answers?q=onerror").json().get("answers").get(0);
    assertEquals(WebServerTest.HOSTILE, hostile.get("text").asText());
    assertEquals(1, hostile.get("question_number").asInt());

    long code = code("Price worry", null);
    long answer = get("/api/answers?q=descaling").json().get("answers").get(0).get("id").asLong();
    post("/api/assignments", assign(answer, code));
    JsonNode withCode = get("/api/answers?code=" + code).json();
    assertEquals(1, withCode.get("total").asInt());
    assertEquals(answer, withCode.get("answers").get(0).get("id").asLong());
    JsonNode uncoded = get("/api/answers?coded=no&q=price").json();
    for (JsonNode a : uncoded.get("answers")) {
      assertFalse(a.get("id").asLong() == answer, "the coded answer is not among the uncoded");
    }
    assertTrue(uncoded.get("query").asText().contains("is:uncoded"));
  }

  @Test
  void rulesAndBulkCodingPreviewBeforeTheyCode() throws Exception {
    long code = code("Delivery date unclear", null);
    WebServerTest.Answer preview =
        post("/api/rules/preview", Map.of("code", code, "query", "\"delivery date\"", "sample", 3));
    assertEquals(200, preview.status(), preview.raw().body());
    assertEquals(2, preview.json().get("would_code").asInt());
    assertEquals(2, preview.json().get("sample").size());
    WebServerTest.Answer rule =
        post("/api/rules", Map.of("coder", "ana", "code", code, "query", "\"delivery date\""));
    assertEquals(201, rule.status());
    assertEquals(
        "\"delivery date\"",
        get("/api/rules").json().get("rules").findValuesAsText("query").get(0));
    WebServerTest.Answer applied = post("/api/rules/apply", Map.of("coder", "ana", "code", code));
    assertTrue(applied.json().get("message").asText().contains("2 answer(s) coded"));
    WebServerTest.Answer bad = post("/api/rules/preview", Map.of("code", code, "query", "\"open"));
    assertEquals(400, bad.status());
    assertEquals(1, bad.json().get("where").get("column").asInt());
    long ruleId = rule.json().get("rule").get("id").asLong();
    assertEquals(200, post("/api/rules/" + ruleId + "/remove", Map.of("coder", "ana")).status());
    assertEquals(404, post("/api/rules/" + ruleId + "/remove", Map.of("coder", "ana")).status());

    long cost = code("Delivery cost", null);
    WebServerTest.Answer before =
        post("/api/assignments/bulk/preview", Map.of("code", cost, "query", "delivery"));
    int would = before.json().get("would_code").asInt();
    assertEquals(4, would, before.raw().body());
    WebServerTest.Answer bulk =
        post("/api/assignments/bulk", Map.of("coder", "eli", "code", cost, "query", "delivery"));
    assertEquals(200, bulk.status(), bulk.raw().body());
    assertEquals(would, get("/api/answers?code=" + cost).json().get("total").asInt());
    post("/api/undo", Map.of("coder", "eli"));
    assertEquals(0, get("/api/answers?code=" + cost).json().get("total").asInt(), "one undo");
  }

  @Test
  void anAnswerIsMarkedReadWithNoCodeAndTheProgressCountsSubstantiveAnswersRead() throws Exception {
    JsonNode all = get("/api/answers?limit=100").json();
    assertEquals(12, all.get("total").asInt());
    assertEquals(11, all.get("substantive").asInt(), "the non-answer is apart");
    JsonNode page = get("/api/answers?q=break").json();
    JsonNode entry = page.get("answers").get(0);
    long answer = entry.get("id").asLong();
    assertFalse(entry.get("read").asBoolean());
    assertEquals(0, page.get("read").asInt());

    WebServerTest.Answer marked =
        post("/api/answers/read", Map.of("coder", "ana", "answer", answer));
    assertEquals(200, marked.status(), marked.raw().body());
    assertTrue(marked.json().get("read").asBoolean());
    assertTrue(marked.json().get("marked").asBoolean());
    assertTrue(marked.json().get("outcome").get("message").asText().contains("as read"));
    JsonNode after = get("/api/answers?q=break").json();
    assertEquals(1, after.get("read").asInt());
    assertTrue(after.get("answers").get(0).get("marked").asBoolean());
    assertEquals(
        0, get("/api/answers?coded=no&q=break").json().get("total").asInt(), "read: not to do");
    JsonNode state = get("/api/assignments?answers=" + answer).json();
    assertEquals(answer, state.get("read").get(0).asLong());
    assertEquals(answer, state.get("marked").get(0).asLong());

    WebServerTest.Answer off =
        post("/api/answers/read/remove", Map.of("coder", "ana", "answer", answer));
    assertEquals(200, off.status(), off.raw().body());
    assertFalse(off.json().get("read").asBoolean());
    assertEquals(0, get("/api/answers?q=break").json().get("read").asInt());
    assertEquals(400, post("/api/answers/read", Map.of("answer", answer)).status(), "no coder");
    assertEquals(400, post("/api/answers/read", Map.of("coder", "ana", "answer", 99_999)).status());
  }

  @Test
  void findingsAndExportsComeFromTheProject() throws Exception {
    long code = code("Returns unclear", null);
    long answer = get("/api/answers?q=returns").json().get("answers").get(0).get("id").asLong();
    post("/api/assignments", assign(answer, code));
    JsonNode findings = get("/api/findings").json();
    JsonNode q = findings.get("questions").get(0);
    // The base is the answers a person read (here and in the other tests) of the wave's 11.
    int read = q.get("coverage").get("Wave 1").get("read").asInt();
    assertTrue(read >= 1 && read < 11, q.toString());
    assertEquals(read, q.get("bases").get("Wave 1").asInt());
    assertEquals(11, q.get("coverage").get("Wave 1").get("answers").asInt());
    assertNotNull(q.get("saturation").get("chao1"));
    boolean found = false;
    for (JsonNode c : q.get("codes")) {
      if (c.get("code").asText().equals("Returns unclear")) {
        found = true;
        JsonNode share = c.get("waves").get("Wave 1");
        assertEquals(1, share.get("count").asInt());
        assertTrue(share.get("small_base").asBoolean(), "a few answers read is a small base");
      }
    }
    assertTrue(found);
    WebServerTest.Answer html = get("/api/report.html");
    assertEquals(200, html.status());
    assertTrue(
        html.raw()
            .headers()
            .firstValue("Content-Disposition")
            .orElse("")
            .contains("findings.html"));
    assertTrue(html.raw().body().contains("Returns unclear"));
    WebServerTest.Answer csv = get("/api/export/coded.csv");
    assertTrue(csv.raw().body().lines().findFirst().orElse("").contains("Returns unclear"));
    assertTrue(get("/api/export/codebook.csv").raw().body().contains("Returns unclear"));
    assertTrue(get("/api/report.md").raw().body().contains("Returns unclear"));
    assertEquals(400, get("/api/findings?from=Wave%201").status());
    assertEquals(400, get("/api/findings?question=9").status());
  }

  @Test
  void theCodedAnswersDownloadAsAWorkbookWithTheCsvRows() throws Exception {
    HttpResponse<byte[]> r =
        WebServerTest.HTTP.send(
            HttpRequest.newBuilder(server.url().resolve("/api/export/coded.xlsx")).GET().build(),
            HttpResponse.BodyHandlers.ofByteArray());
    assertEquals(200, r.statusCode());
    assertEquals(FindingsRoutes.XLSX, r.headers().firstValue("Content-Type").orElse(""));
    assertTrue(
        r.headers().firstValue("Content-Disposition").orElse("").contains("coded-answers.xlsx"));
    List<CSVRecord> csv =
        CSVFormat.RFC4180
            .parse(new StringReader(get("/api/export/coded.csv").raw().body()))
            .getRecords();
    try (XSSFWorkbook book = new XSSFWorkbook(new ByteArrayInputStream(r.body()))) {
      Sheet coded = book.getSheet("Coded answers");
      assertEquals(csv.size() - 1, coded.getLastRowNum(), "one row per answer, as the CSV");
      List<String> header = new ArrayList<>();
      coded.getRow(0).forEach(c -> header.add(c.getStringCellValue()));
      assertEquals(csv.get(0).toList(), header);
      for (String sheet : List.of("Codes given", "Codebook", "Findings", "Changes")) {
        assertNotNull(book.getSheet(sheet), sheet);
      }
    }
    WebServerTest.Answer bad = get("/api/export/coded.xlsx?question=9");
    assertEquals(400, bad.status());
    assertNotNull(bad.json(), "an error answer, not half a file");
  }

  @Test
  void suggestionsAreEmptyUntilTrainedAndAcceptAboveChecksItsInput() throws Exception {
    List<Long> ids = answers();
    WebServerTest.Answer s = get("/api/suggestions?answers=" + ids.get(0) + "," + ids.get(1));
    assertEquals(200, s.status(), s.raw().body());
    assertTrue(s.json().has("ready"));
    assertEquals(0, s.json().get("suggestions").size(), "no code has 8 human-coded examples");
    WebServerTest.Answer bad =
        post(
            "/api/suggestions/accept-above",
            Map.of("coder", "ana", "answers", List.of(ids.get(0)), "above", 1.5));
    assertEquals(400, bad.status());
    WebServerTest.Answer none =
        post(
            "/api/suggestions/accept-above",
            Map.of("coder", "ana", "answers", List.of(ids.get(0)), "above", 0.9));
    assertEquals(200, none.status(), none.raw().body());
    assertTrue(none.json().get("message").asText().contains("Accepted 0"));
  }
}
