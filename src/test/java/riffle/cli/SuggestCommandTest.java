package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code riffle suggest} on the demo's pilot (coded elsewhere) and its first wave (not coded):
 * suggestions carry honest metrics, are never applied without being asked, and accepted ones are
 * marked and never learned from.
 */
class SuggestCommandTest {
  @TempDir static Path dir;
  static String project;

  @BeforeAll
  static void importPilotAndWave() {
    project = dir.resolve("demo.riffle").toString();
    for (String[] w : new String[][] {{"precoded-pilot.tsv", "Pilot"}, {"wave-1.csv", "Wave 1"}}) {
      CliTest.Run run =
          CliTest.riffle(
              "import", "--project", project, "--file", "sample-responses/" + w[0], "--wave", w[1]);
      assertEquals(0, run.code(), run.err());
    }
  }

  static JsonNode ok(String... args) throws Exception {
    CliTest.Run run = CliTest.riffle(args);
    assertEquals(0, run.code(), run.err());
    return run.json();
  }

  @Test
  void suggestionsComeWithMetricsAndAreAppliedOnlyWhenAsked() throws Exception {
    int before = ok("info", "--project", project, "--json").get("assignments").asInt();
    JsonNode report = ok("suggest", "--project", project, "--wave", "Wave 1", "--json");
    JsonNode suggestions = report.get("suggestions");
    assertTrue(suggestions.size() > 100, "wave 1 gets suggestions: " + suggestions.size());
    Map<String, Double> thresholds = new HashMap<>();
    for (JsonNode m : report.get("metrics")) {
      for (String key : new String[] {"precision", "recall", "f1", "support"}) {
        assertTrue(m.has(key), key + " in " + m);
      }
      if (m.get("ready").asBoolean()) {
        thresholds.put(
            m.get("question").asText() + "|" + m.get("code").asText(),
            m.get("threshold").asDouble());
        assertTrue(m.get("precision").isNull() || m.get("precision").asDouble() <= 1.0);
      }
    }
    for (JsonNode s : suggestions) {
      assertEquals("Wave 1", s.get("wave").asText());
      Double t = thresholds.get(s.get("question").asText() + "|" + s.get("code").asText());
      assertTrue(t != null && s.get("confidence").asDouble() >= t, s.toString());
      for (String key : new String[] {"respondent", "question", "code", "confidence"}) {
        assertTrue(s.has(key), key);
      }
    }
    assertEquals(
        before,
        ok("info", "--project", project, "--json").get("assignments").asInt(),
        "showing suggestions codes nothing");

    int above = 0;
    for (JsonNode s : suggestions) {
      above += s.get("confidence").asDouble() >= 0.9 ? 1 : 0;
    }
    JsonNode accepted =
        ok(
            "suggest",
            "--project",
            project,
            "--wave",
            "Wave 1",
            "--accept-above",
            "0.9",
            "--coder",
            "ana",
            "--json");
    assertEquals(above, accepted.get("accepted").get("changed").asInt());
    assertEquals(
        before + above, ok("info", "--project", project, "--json").get("assignments").asInt());
    JsonNode again = ok("suggest", "--project", project, "--json");
    assertEquals(
        report.get("examples").asInt(),
        again.get("examples").asInt(),
        "accepted suggestions are not learned from");
    ok("undo", "--project", project, "--coder", "ana", "--json");
    assertEquals(before, ok("info", "--project", project, "--json").get("assignments").asInt());
  }
}
