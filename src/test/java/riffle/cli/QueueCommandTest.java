package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.coding.ReviewOrder;

/** The random review queue from the command line, on the two-question fixture wave. */
class QueueCommandTest {
  @TempDir Path dir;
  String project;

  @BeforeEach
  void importWave() {
    project = CliTest.projectWith(dir, "two-questions.csv");
  }

  CliTest.Run refused(String... args) {
    CliTest.Run run = CliTest.riffle(args);
    assertEquals(2, run.code(), run.out() + run.err());
    assertFalse(run.err().contains("Exception"), run.err());
    return run;
  }

  List<Long> secondQuestion() throws Exception {
    List<Long> ids = new ArrayList<>();
    JsonNode hits =
        CliTest.ok(
                "search", "--project", project, "--query", "question:2", "--limit", "50", "--json")
            .json()
            .get("hits");
    hits.forEach(h -> ids.add(h.get("answer_id").asLong()));
    return ids;
  }

  static List<Long> served(JsonNode page) {
    List<Long> out = new ArrayList<>();
    page.get("answers").forEach(a -> out.add(a.get("answer").get("id").asLong()));
    return out;
  }

  @Test
  void aQueueIsStartedReadInItsOrderAndTellsWhenTheReadingIsARandomSample() throws Exception {
    String started =
        CliTest.ok(
                "queue",
                "start",
                "--project",
                project,
                "--wave",
                "wave 1",
                "--question",
                "2",
                "--seed",
                "42",
                "--coder",
                "ana")
            .out();
    assertTrue(started.contains("Started the random order"), started);
    assertTrue(started.contains("(seed 42)"), started);
    assertTrue(started.contains("riffle queue next"), started);

    long[] order = ReviewOrder.order(42, secondQuestion());
    JsonNode next =
        CliTest.ok(
                "queue",
                "next",
                "--project",
                project,
                "--wave",
                "Wave 1",
                "--question",
                "2",
                "--limit",
                "3",
                "--json")
            .json();
    assertEquals(List.of(order[0], order[1], order[2]), served(next));
    assertEquals(8, next.get("status").get("sample").get("answers").asInt());
    assertEquals(0, next.get("status").get("sample").get("read").asInt());
    assertEquals(42, next.get("status").get("queue").get("seed").asLong());
    assertEquals("ana", next.get("status").get("queue").get("started_by").asText());
    assertEquals(1, next.get("answers").get(0).get("position").asInt());

    CliTest.ok("codes", "add", "--project", project, "Value", "--coder", "ana");
    CliTest.ok(
        "code",
        "--project",
        project,
        "--answer",
        Long.toString(order[0]),
        "--add",
        "Value",
        "--coder",
        "ana");
    String text =
        CliTest.ok("queue", "next", "--project", project, "--wave", "Wave 1", "--question", "2")
            .out();
    assertTrue(text.contains("Read the first 1 of 8 answers"), text);
    assertTrue(text.contains("a random sample"), text);
    assertTrue(text.contains("#2 "), text);
    assertTrue(text.contains(Long.toString(order[1])), text);
    assertFalse(
        text.contains(" " + order[0] + " "), "the read answer is not served again: " + text);

    // Coding the fifth answer out of order: no longer a sample, and the page says so.
    CliTest.ok(
        "code",
        "--project",
        project,
        "--answer",
        Long.toString(order[4]),
        "--add",
        "Value",
        "--coder",
        "ana");
    JsonNode list = CliTest.ok("queue", "--project", project, "--json").json().get("queues");
    assertEquals(1, list.size());
    JsonNode sample = list.get(0).get("sample");
    assertFalse(sample.get("random").asBoolean());
    assertEquals(1, sample.get("outside").asInt());
    assertEquals(3, sample.get("skipped").asInt());
    String listed = CliTest.ok("queue", "--project", project).out();
    assertTrue(listed.contains("not a random sample"), listed);
    assertTrue(listed.contains("Wave 1 · What made you choose us? · seed 42"), listed);
  }

  @Test
  void startingAgainKeepsTheOrderAndBadRequestsChangeNothing() throws Exception {
    CliTest.ok("queue", "start", "--project", project, "--wave", "Wave 1", "--question", "2");
    String again =
        CliTest.ok("queue", "start", "--project", project, "--wave", "Wave 1", "--question", "2")
            .out();
    assertTrue(again.contains("it goes on"), again);
    long seed =
        CliTest.ok("queue", "--project", project, "--json")
            .json()
            .get("queues")
            .get(0)
            .get("queue")
            .get("seed")
            .asLong();
    byte[] before = Files.readAllBytes(Path.of(project));

    CliTest.Run other =
        refused(
            "queue",
            "start",
            "--project",
            project,
            "--wave",
            "Wave 1",
            "--question",
            "2",
            "--seed",
            Long.toString(seed == 5 ? 6 : 5));
    assertTrue(other.err().contains("keeps that seed"), other.err());
    CliTest.Run notStarted =
        refused("queue", "next", "--project", project, "--wave", "Wave 1", "--question", "1");
    assertTrue(notStarted.err().contains("riffle queue start"), notStarted.err());
    CliTest.Run badSeed =
        refused(
            "queue",
            "start",
            "--project",
            project,
            "--wave",
            "Wave 1",
            "--question",
            "1",
            "--seed",
            "-3");
    assertTrue(badSeed.err().contains("0 to 9007199254740991"), badSeed.err());
    CliTest.Run badSegment =
        refused(
            "queue",
            "start",
            "--project",
            project,
            "--wave",
            "Wave 1",
            "--question",
            "1",
            "--segment",
            "device");
    assertTrue(badSegment.err().contains("COLUMN=VALUE"), badSegment.err());
    CliTest.Run noWave =
        refused("queue", "start", "--project", project, "--wave", "Wave 7", "--question", "1");
    assertTrue(noWave.err().contains("Wave 7"), noWave.err());
    CliTest.Run json =
        refused(
            "queue",
            "next",
            "--project",
            project,
            "--wave",
            "Wave 1",
            "--question",
            "2",
            "--limit",
            "0",
            "--json");
    assertTrue(json.json().get("error").get("message").asText().contains("limit"), json.out());
    assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(Path.of(project))));
  }

  @Test
  void aSegmentHasItsOwnQueue() throws Exception {
    JsonNode s =
        CliTest.ok(
                "queue",
                "start",
                "--project",
                project,
                "--wave",
                "Wave 1",
                "--question",
                "2",
                "--segment",
                "Device=MOBILE",
                "--seed",
                "3",
                "--json")
            .json();
    assertEquals("device", s.get("queue").get("segment_column").asText());
    assertEquals(4, s.get("sample").get("answers").asInt(), "four mobile respondents");
    JsonNode next =
        CliTest.ok(
                "queue",
                "next",
                "--project",
                project,
                "--wave",
                "Wave 1",
                "--question",
                "2",
                "--segment",
                "device=mobile",
                "--json")
            .json();
    for (JsonNode a : next.get("answers")) {
      assertEquals("mobile", a.get("answer").get("segments").get("device").asText());
    }
  }
}
