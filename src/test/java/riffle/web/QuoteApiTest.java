package riffle.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.net.http.HttpRequest;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.CopyBoard;

/**
 * The copy board's API over the precoded pilot: quotes and candidates per use, pin, move, working
 * line, unpin, undo, and the exports with their consent notice and answer ids.
 */
class QuoteApiTest {
  @TempDir static Path dir;
  static WebServer server;

  @BeforeAll
  static void start() throws Exception {
    server = WebServer.start(BoardProject.build(dir), WebServer.Options.defaults());
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

  static List<JsonNode> candidates(JsonNode findings, String slot) {
    List<JsonNode> out = new ArrayList<>();
    findings
        .get("quotes")
        .forEach(
            q -> {
              if (slot.equals(q.get("slot").asText())) {
                out.add(q);
              }
            });
    return out;
  }

  static Map<String, Object> pinOf(String slot, JsonNode quote) {
    return Map.of(
        "coder", "mia",
        "slot", slot,
        "answer_id", quote.get("answer_id").asLong(),
        "text", quote.get("text").asText(),
        "code", quote.get("code").asText());
  }

  static JsonNode items(JsonNode board, String slot) {
    for (JsonNode s : board.get("slots")) {
      if (slot.equals(s.get("slot").asText())) {
        return s.get("items");
      }
    }
    throw new AssertionError("no slot " + slot + " in " + board);
  }

  static JsonNode board() throws Exception {
    WebServerTest.Answer a = get("/api/board");
    assertEquals(200, a.status(), a.raw().body());
    return a.json();
  }

  @Test
  void quotesComeRankedPerCodeAndAsCandidatesForEachUse() throws Exception {
    WebServerTest.Answer a = get("/api/quotes");
    assertEquals(200, a.status(), a.raw().body());
    JsonNode findings = a.json();
    assertFalse(candidates(findings, "headline").isEmpty(), "headline ideas from praise themes");
    List<JsonNode> objections = candidates(findings, "objection");
    assertFalse(objections.isEmpty(), "objections from friction themes");
    assertFalse(BoardProject.PRAISE.contains(objections.get(0).get("code").asText()));
    assertTrue(findings.get("codes").size() > 10);
    assertTrue(findings.get("quotes").get(0).has("fresh"));

    JsonNode wave2 = get("/api/quotes?wave=wave%202").json();
    for (JsonNode q : wave2.get("quotes")) {
      assertEquals("Wave 2", q.get("wave").asText(), "the wave filter chooses what is quoted");
      assertTrue(q.get("fresh").asBoolean(), "wave 2 is the latest, its wording is new");
    }
    JsonNode mobile = get("/api/quotes?segment=device=mobile&code=fast%20delivery").json();
    for (JsonNode q : mobile.get("quotes")) {
      assertEquals("mobile", q.get("segments").get("device").asText());
      assertEquals("fast delivery", q.get("code").asText());
    }

    WebServerTest.Answer wave = get("/api/quotes?wave=Wave%209");
    assertEquals(400, wave.status());
    assertTrue(wave.json().get("error").asText().contains("Wave 9"));
    assertEquals(400, get("/api/quotes?code=nothing%20like%20it").status());
    WebServerTest.Answer segment = get("/api/quotes?segment=device");
    assertEquals(400, segment.status());
    assertEquals("segment", segment.json().get("where").get("parameter").asText());
  }

  @Test
  void aBoardIsPinnedMovedAnnotatedUnpinnedAndExported() throws Exception {
    JsonNode findings = get("/api/quotes").json();
    JsonNode headline = candidates(findings, "headline").get(0);
    JsonNode second = candidates(findings, "headline").get(1);
    JsonNode objection = candidates(findings, "objection").get(0);
    assertEquals(CopyBoard.CONSENT_NOTICE, board().get("consent_notice").asText());
    assertTrue(board().get("taken_off").isArray(), "quotes taken off because of new masks");

    WebServerTest.Answer pinned = post("/api/board/pin", pinOf("headline", headline));
    assertEquals(200, pinned.status(), pinned.raw().body());
    assertTrue(pinned.json().get("outcome").get("message").asText().startsWith("Pinned"));
    assertEquals(200, post("/api/board/pin", pinOf("headline", second)).status());
    assertEquals(200, post("/api/board/pin", pinOf("objection", objection)).status());
    WebServerTest.Answer again = post("/api/board/pin", pinOf("headline", headline));
    assertTrue(again.json().get("outcome").get("message").asText().startsWith("Already"));
    JsonNode heads = items(again.json().get("board"), "headline");
    assertEquals(2, heads.size(), "pinning the same quote twice keeps one");
    assertEquals(headline.get("text").asText(), heads.get(0).get("text").asText());
    assertEquals(headline.get("answer_id").asLong(), heads.get(0).get("answer_id").asLong());

    // reorder: the second headline idea goes first
    WebServerTest.Answer up =
        post(
            "/api/board/move",
            Map.of(
                "coder", "mia", "slot", "headline", "from", 1, "to_slot", "headline", "place", 0));
    assertEquals(200, up.status(), up.raw().body());
    heads = items(up.json().get("board"), "headline");
    assertEquals(second.get("text").asText(), heads.get(0).get("text").asText());

    WebServerTest.Answer line =
        post(
            "/api/board/line",
            Map.of(
                "coder", "mia", "slot", "headline", "index", 0, "line", "Here tomorrow, like new"));
    assertEquals(200, line.status(), line.raw().body());
    JsonNode item = items(line.json().get("board"), "headline").get(0);
    assertEquals("Here tomorrow, like new", item.get("working_line").asText());
    assertEquals(second.get("text").asText(), item.get("text").asText(), "the quote is unchanged");

    // to another slot: the objection becomes a proof quote
    WebServerTest.Answer moved =
        post(
            "/api/board/move",
            Map.of("coder", "mia", "slot", "objection", "from", 0, "to_slot", "proof", "place", 0));
    assertEquals(200, moved.status(), moved.raw().body());
    assertEquals(0, items(moved.json().get("board"), "objection").size());
    assertEquals(
        objection.get("text").asText(),
        items(moved.json().get("board"), "proof").get(0).get("text").asText());

    for (String format : List.of("md", "txt", "csv")) {
      WebServerTest.Answer export = get("/api/board/export?format=" + format);
      assertEquals(200, export.status());
      assertTrue(
          export
              .raw()
              .headers()
              .firstValue("Content-Disposition")
              .orElse("")
              .contains("attachment"));
      String body = export.raw().body();
      assertTrue(body.contains("consent"), format + " carries the consent notice");
      assertTrue(body.contains(headline.get("answer_id").asText()), format + " has answer ids");
      assertTrue(body.contains("Here tomorrow, like new"), format + " has the working line");
    }
    assertEquals(400, get("/api/board/export?format=pdf").status());

    WebServerTest.Answer unpinned =
        post("/api/board/unpin", Map.of("coder", "mia", "slot", "headline", "index", 1));
    assertEquals(200, unpinned.status(), unpinned.raw().body());
    assertEquals(1, items(unpinned.json().get("board"), "headline").size());
    assertEquals(200, post("/api/undo", Map.of("coder", "mia")).status());
    assertEquals(2, items(board(), "headline").size(), "undo puts the quote back");
    assertEquals(
        200,
        post("/api/board/unpin", Map.of("coder", "mia", "slot", "headline", "index", 1)).status());
    assertEquals(
        200,
        post("/api/board/unpin", Map.of("coder", "mia", "slot", "headline", "index", 0)).status());
    assertEquals(
        200,
        post("/api/board/unpin", Map.of("coder", "mia", "slot", "proof", "index", 0)).status());
  }

  @Test
  void wordingThatIsNotTheAnswersOwnIsRefused() throws Exception {
    JsonNode quote = candidates(get("/api/quotes").json(), "benefit").get(0);
    Map<String, Object> rewritten =
        Map.of(
            "coder",
            "mia",
            "slot",
            "benefit",
            "answer_id",
            quote.get("answer_id").asLong(),
            "text",
            quote.get("text").asText() + " and it was the best shop ever",
            "code",
            quote.get("code").asText());
    WebServerTest.Answer refused = post("/api/board/pin", rewritten);
    assertEquals(400, refused.status());
    assertTrue(refused.json().get("error").asText().contains("own words"));
    assertEquals(0, items(board(), "benefit").size(), "nothing was pinned");

    Map<String, Object> noCode = new java.util.HashMap<>(pinOf("benefit", quote));
    noCode.put("code", "not a code");
    assertEquals(404, post("/api/board/pin", noCode).status());
    Map<String, Object> badSlot = new java.util.HashMap<>(pinOf("benefit", quote));
    badSlot.put("slot", "footer");
    WebServerTest.Answer slot = post("/api/board/pin", badSlot);
    assertEquals(400, slot.status());
    assertTrue(slot.json().get("error").asText().contains("headline"), slot.raw().body());
    Map<String, Object> noCoder = new java.util.HashMap<>(pinOf("benefit", quote));
    noCoder.remove("coder");
    assertEquals(
        "coder", post("/api/board/pin", noCoder).json().get("where").get("field").asText());

    WebServerTest.Answer past =
        post("/api/board/unpin", Map.of("coder", "mia", "slot", "benefit", "index", 3));
    assertEquals(400, past.status());
    assertTrue(past.json().get("error").asText().contains("no number 4"), past.raw().body());
    assertEquals(
        400,
        post("/api/board/move", Map.of("coder", "mia", "slot", "benefit", "from", -1)).status());
    assertEquals(
        400,
        post(
                "/api/board/line",
                Map.of("coder", "mia", "slot", "benefit", "index", 0, "line", "a\nb"))
            .status());
  }
}
