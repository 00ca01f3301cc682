package riffle.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.net.http.HttpRequest;
import java.nio.file.Path;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The segment list the screens' picker shows, on a real server over the segment fixture. */
class SegmentApiTest {
  @TempDir Path dir;
  WebServer server;

  @BeforeEach
  void start() throws Exception {
    server = WebServer.start(SegmentProject.build(dir), WebServer.Options.defaults());
  }

  @AfterEach
  void stop() {
    server.close();
  }

  WebServerTest.Answer get(String path) throws Exception {
    return WebServerTest.send(HttpRequest.newBuilder(server.url().resolve(path)).GET());
  }

  static String line(JsonNode v) {
    return v.get("value").asText()
        + " "
        + v.get("answers").asInt()
        + "/"
        + v.get("substantive").asInt()
        + "/"
        + v.get("read").asInt()
        + (v.get("small_base").asBoolean() ? " small" : "")
        + (v.get("filterable").asBoolean() ? "" : " not filterable");
  }

  @Test
  void valuesSpeltApartAreOneValueWithTheirAnswersAndReadBases() throws Exception {
    WebServerTest.Answer list = get("/api/segments?question=1&wave=wave%201");
    assertEquals(200, list.status(), list.raw().body());
    JsonNode columns = list.json().get("columns");
    assertEquals(1, columns.size(), columns.toString());
    JsonNode device = columns.get(0);
    assertEquals("device", device.get("column").asText());
    JsonNode values = device.get("values");
    assertEquals(3, values.size(), values.toString());
    // mobile, Mobile and " MOBILE " are one value; the non-answer counts in answers only.
    assertEquals("desktop 10/10/8 small", line(values.get(0)));
    assertEquals("mobile 36/35/35", line(values.get(1)));
    assertEquals("(no value) 4/4/4 small not filterable", line(values.get(2)));

    // Every question and wave: the same counts (one question, one wave).
    assertEquals(columns, get("/api/segments").json().get("columns"));
  }

  @Test
  void anUnknownWaveOrQuestionIsRefusedByName() throws Exception {
    WebServerTest.Answer wave = get("/api/segments?question=1&wave=Wave%209");
    assertEquals(400, wave.status(), wave.raw().body());
    assertTrue(wave.json().get("error").asText().contains("Wave 9"), wave.raw().body());
    assertFalse(wave.raw().body().contains("Exception"));
    WebServerTest.Answer question = get("/api/segments?question=7");
    assertEquals(400, question.status(), question.raw().body());
  }
}
