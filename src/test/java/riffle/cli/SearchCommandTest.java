package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code riffle search} on a real project, its index kept in step with imports. */
class SearchCommandTest {
  @TempDir Path dir;
  String project;

  @BeforeEach
  void importWave() {
    project = CliTest.projectWith(dir, "two-questions.csv");
  }

  JsonNode search(String query) throws Exception {
    CliTest.Run run = CliTest.riffle("search", "--project", project, "--query", query, "--json");
    assertEquals(0, run.code(), run.err());
    return run.json();
  }

  @Test
  void findsMarksAndCountsAnswers() throws Exception {
    JsonNode json = search("\"delivery date\" OR warranty");
    assertEquals(2, json.get("total").asInt());
    assertEquals(2, json.get("waves").get("Wave 1").asInt());
    JsonNode hit = json.get("hits").get(0);
    for (String key : new String[] {"respondent", "question", "text", "highlight"}) {
      assertTrue(hit.has(key), key);
    }
    JsonNode mark = hit.get("highlight").get(0);
    String text = hit.get("text").asText();
    String marked = text.substring(mark.get("start").asInt(), mark.get("end").asInt());
    assertTrue(marked.matches("(?i)delivery date|warranty"), marked);
  }

  @Test
  void filtersBySegmentAndQuestion() throws Exception {
    assertEquals(3, search("device:desktop AND question:2").get("total").asInt());
    assertEquals(3, search("is:uncoded AND question:1").get("total").asInt(), "n/a, nothing, -");
  }

  @Test
  void seesTheNextWaveAndSurvivesLosingItsIndex() throws Exception {
    assertEquals(1, search("shipping").get("total").asInt());
    Path other = dir.resolve("wave-2.csv");
    Files.writeString(
        other,
        "response_id,device,What almost stopped you from ordering?\n"
            + "U-1,mobile,shipping cost to the islands was a surprise\n"
            + "U-2,desktop,\"not sure about shipping times, honestly\"\n",
        java.nio.charset.StandardCharsets.UTF_8);
    assertEquals(
        0,
        CliTest.riffle("import", "--project", project, "--file", other.toString(), "--wave", "W2")
            .code());
    JsonNode after = search("shipping");
    assertEquals(3, after.get("total").asInt());
    assertEquals(2, after.get("waves").get("W2").asInt());
    try (Stream<Path> files = Files.walk(Path.of(project + ".d", "index"))) {
      for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
        Files.delete(p);
      }
    }
    assertEquals(3, search("shipping").get("total").asInt(), "rebuilt from the project file");
  }

  @Test
  void aMalformedQuerySaysWhereAndExitsTwo() throws Exception {
    CliTest.Run run =
        CliTest.riffle("search", "--project", project, "--query", "price AND (fast", "--json");
    assertEquals(2, run.code());
    assertEquals("query", run.json().get("error").get("file").asText());
    assertEquals(16, run.json().get("error").get("column").asInt());
    assertFalse(run.err().contains("Exception"), run.err());
  }

  @Test
  void findsAnswersLikeAnother() throws Exception {
    long id = search("\"delivery date\"").get("hits").get(0).get("answer_id").asLong();
    CliTest.Run run =
        CliTest.riffle("search", "--project", project, "--like", Long.toString(id), "--json");
    assertEquals(0, run.code(), run.err());
    for (JsonNode hit : run.json().get("hits")) {
      assertTrue(hit.get("answer_id").asLong() != id);
    }
  }
}
