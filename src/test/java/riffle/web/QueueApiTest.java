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
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The random review queue's API on a real server over the small fixture wave (11 answers). */
class QueueApiTest {
  @TempDir Path dir;
  WebServer server;

  @BeforeEach
  void start() throws Exception {
    server = WebServer.start(WebServerTest.smallProject(dir), WebServer.Options.defaults());
  }

  @AfterEach
  void stop() {
    server.close();
  }

  WebServerTest.Answer get(String path) throws Exception {
    return WebServerTest.send(HttpRequest.newBuilder(server.url().resolve(path)).GET());
  }

  WebServerTest.Answer post(String path, Object body) throws Exception {
    String json = body instanceof String s ? s : ApiJson.MAPPER.writeValueAsString(body);
    return WebServerTest.send(
        HttpRequest.newBuilder(server.url().resolve(path))
            .header("Origin", WebServerTest.origin(server))
            .header("Content-Type", "application/json")
            .POST(HttpRequest.BodyPublishers.ofString(json)));
  }

  static List<Long> ids(JsonNode page) {
    List<Long> out = new ArrayList<>();
    page.get("answers").forEach(a -> out.add(a.get("id").asLong()));
    return out;
  }

  @Test
  void theCodingScreenReadsAWaveInItsRandomOrderAndLearnsWhenItIsASample() throws Exception {
    WebServerTest.Answer none = get("/api/queues/answers?wave=Wave%201&question=1");
    assertEquals(404, none.status(), none.raw().body());
    assertTrue(none.json().get("error").asText().contains("start one"));

    WebServerTest.Answer started =
        post("/api/queues", Map.of("coder", "ana", "wave", "Wave 1", "question", "1", "seed", 9));
    assertEquals(201, started.status(), started.raw().body());
    assertEquals(9, started.json().get("queue").get("seed").asLong());
    assertEquals(11, started.json().get("sample").get("answers").asInt(), "the non-answer is out");
    WebServerTest.Answer again =
        post("/api/queues", Map.of("coder", "ben", "wave", "wave 1", "question", "1"));
    assertEquals(200, again.status(), "started before: kept");
    assertEquals("ana", again.json().get("queue").get("started_by").asText());

    JsonNode first = get("/api/queues/answers?wave=Wave%201&question=1&limit=4").json();
    assertEquals(11, first.get("total").asInt());
    assertEquals(0, first.get("coded").asInt());
    assertEquals(0, first.get("offset").asInt());
    assertEquals(4, first.get("answers").size());
    JsonNode a = first.get("answers").get(0);
    assertEquals(1, a.get("position").asInt());
    assertFalse(a.get("read").asBoolean());
    assertTrue(a.has("assignments") && a.has("text") && a.has("question_number"), a.toString());
    assertFalse(a.get("text").asText().contains("@example.com"), "masked text only");

    JsonNode whole = get("/api/queues/answers?wave=Wave%201&question=1&offset=0&limit=50").json();
    List<Long> order = ids(whole);
    assertEquals(11, order.size());
    assertEquals(order.subList(0, 4), ids(first));

    WebServerTest.Answer made = post("/api/codes", Map.of("coder", "ana", "name", "Doubts"));
    assertEquals(201, made.status(), made.raw().body());
    long code = made.json().get("code").get("id").asLong();
    for (int i = 0; i < 2; i++) {
      WebServerTest.Answer given =
          post("/api/assignments", Map.of("coder", "ana", "answer", order.get(i), "code", code));
      assertEquals(200, given.status(), given.raw().body());
    }
    JsonNode status = get("/api/queues/status?wave=Wave%201&question=1").json();
    assertTrue(status.get("sample").get("random").asBoolean());
    assertEquals(2, status.get("sample").get("sample").asInt());
    assertTrue(status.get("summary").asText().contains("the first 2 of 11"), status.toString());
    JsonNode resumed = get("/api/queues/answers?wave=Wave%201&question=1&limit=3").json();
    assertEquals(2, resumed.get("offset").asInt(), "the page starts at the first unread answer");
    assertEquals(order.get(2), ids(resumed).get(0));
    assertEquals(2, resumed.get("coded").asInt());

    // Coding an answer far down the order makes the reading no sample, and the page is told.
    post("/api/assignments", Map.of("coder", "ana", "answer", order.get(8), "code", code));
    JsonNode broken = get("/api/queues/status?wave=Wave%201&question=1").json();
    assertFalse(broken.get("sample").get("random").asBoolean());
    assertEquals(1, broken.get("sample").get("outside").asInt());
    assertTrue(broken.get("summary").asText().contains("not a random sample"));
    JsonNode listed = get("/api/queues").json().get("queues");
    assertEquals(1, listed.size());
  }

  @Test
  void badRequestsAreRefusedByNameAndStoreNothing() throws Exception {
    WebServerTest.Answer noCoder = post("/api/queues", Map.of("wave", "Wave 1", "question", "1"));
    assertEquals(400, noCoder.status());
    assertEquals("coder", noCoder.json().get("where").get("field").asText());
    WebServerTest.Answer noWave = post("/api/queues", Map.of("coder", "ana", "question", "1"));
    assertEquals("wave", noWave.json().get("where").get("field").asText());
    WebServerTest.Answer badSegment =
        post(
            "/api/queues",
            Map.of("coder", "ana", "wave", "Wave 1", "question", "1", "segment", "device"));
    assertEquals(400, badSegment.status());
    assertEquals("segment", badSegment.json().get("where").get("field").asText());
    WebServerTest.Answer unknownColumn =
        post(
            "/api/queues",
            Map.of("coder", "ana", "wave", "Wave 1", "question", "1", "segment", "plan=basic"));
    assertEquals(400, unknownColumn.status());
    assertTrue(unknownColumn.json().get("error").asText().contains("device"));
    WebServerTest.Answer badSeed =
        post("/api/queues", Map.of("coder", "ana", "wave", "Wave 1", "question", "1", "seed", -1));
    assertEquals(400, badSeed.status());
    WebServerTest.Answer unknownField =
        post("/api/queues", Map.of("coder", "ana", "wave", "Wave 1", "question", "1", "order", 2));
    assertEquals(400, unknownField.status());
    WebServerTest.Answer noQuestion = get("/api/queues/answers?wave=Wave%201");
    assertEquals("question", noQuestion.json().get("where").get("parameter").asText());
    WebServerTest.Answer badLimit = get("/api/queues/answers?wave=Wave%201&question=1&limit=0");
    assertEquals(400, badLimit.status());
    assertEquals(0, get("/api/queues").json().get("queues").size(), "nothing was started");

    WebServerTest.Answer mobile =
        post(
            "/api/queues",
            Map.of("coder", "ana", "wave", "Wave 1", "question", "1", "segment", "device=Mobile"));
    assertEquals(201, mobile.status(), mobile.raw().body());
    JsonNode page =
        get("/api/queues/answers?wave=Wave%201&question=1&segment=device%3Dmobile").json();
    assertEquals(6, page.get("total").asInt(), "six mobile respondents");
    page.get("answers")
        .forEach(x -> assertEquals("mobile", x.get("segments").get("device").asText()));
  }
}
