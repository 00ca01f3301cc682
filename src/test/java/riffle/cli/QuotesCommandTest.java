package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code riffle quotes}, {@code riffle board} and the board's export, on the coded pilot. */
class QuotesCommandTest {
  @TempDir static Path dir;
  static String project;

  @BeforeAll
  static void importPilot() {
    project = dir.resolve("pilot.riffle").toString();
    CliTest.Run run =
        CliTest.riffle(
            "import",
            "--project",
            project,
            "--file",
            "sample-responses/precoded-pilot.tsv",
            "--wave",
            "Pilot");
    assertEquals(0, run.code(), run.err());
    run =
        CliTest.riffle(
            "codes", "load", "--project", project, "--file", "sample-responses/codebook.csv");
    assertEquals(0, run.code(), run.err());
  }

  @Test
  void quotesArePinnedAnnotatedExportedAndUndone() throws Exception {
    JsonNode quotes = CliTest.ok("quotes", "--project", project, "--json").json().get("quotes");
    assertTrue(quotes.size() > 10, quotes.toString());
    JsonNode headline = null;
    JsonNode objection = null;
    for (JsonNode q : quotes) {
      for (String key : new String[] {"code", "respondent", "question", "text", "score", "slot"}) {
        assertTrue(q.has(key), key + " in " + q);
      }
      if (headline == null && q.get("slot").asText().equals("headline")) {
        headline = q;
      }
      if (objection == null && q.get("slot").asText().equals("objection")) {
        objection = q;
      }
    }
    assertTrue(headline != null && objection != null, quotes.toString());
    assertTrue(
        CliTest.ok("quotes", "--project", project)
            .out()
            .startsWith("Quotes come from survey answers"),
        "the consent notice comes first");

    CliTest.ok(
        "board",
        "pin",
        "--project",
        project,
        "--slot",
        "headline",
        "--answer",
        headline.get("answer_id").asText(),
        "--text",
        headline.get("text").asText(),
        "--code",
        headline.get("code").asText(),
        "--coder",
        "ana");
    CliTest.ok(
        "board",
        "pin",
        "--project",
        project,
        "--slot",
        "objection",
        "--answer",
        objection.get("answer_id").asText(),
        "--text",
        objection.get("text").asText(),
        "--coder",
        "ana");
    CliTest.ok(
        "board",
        "line",
        "--project",
        project,
        "--slot",
        "headline",
        "--number",
        "1",
        "--text",
        "Our working headline",
        "--coder",
        "ana");
    JsonNode board = CliTest.ok("board", "--project", project, "--json").json();
    JsonNode pinned = board.get("slots").get(0).get("items").get(0);
    assertEquals(headline.get("text").asText(), pinned.get("text").asText());
    assertEquals("Our working headline", pinned.get("working_line").asText());

    Path md = dir.resolve("board.md");
    CliTest.ok(
        "export",
        "--project",
        project,
        "--what",
        "quotes",
        "--format",
        "md",
        "--out",
        md.toString());
    String text = Files.readString(md, StandardCharsets.UTF_8);
    assertTrue(text.contains("consent"), text);
    assertTrue(text.contains(headline.get("answer_id").asText()), text);

    CliTest.Run bad =
        CliTest.riffle(
            "board",
            "pin",
            "--project",
            project,
            "--slot",
            "proof",
            "--answer",
            headline.get("answer_id").asText(),
            "--text",
            "words nobody wrote");
    assertEquals(2, bad.code());
    assertTrue(bad.err().contains("own words as written"), bad.err());

    CliTest.ok("undo", "--project", project, "--coder", "ana");
    CliTest.ok("undo", "--project", project, "--coder", "ana");
    JsonNode after = CliTest.ok("board", "--project", project, "--json").json();
    assertEquals(1, after.get("slots").get(0).get("items").size());
    assertFalse(
        after.get("slots").get(0).get("items").get(0).has("working_line")
            && !after.get("slots").get(0).get("items").get(0).get("working_line").isNull());
    assertEquals(0, after.get("slots").get(3).get("items").size(), "the objection pin undone");

    CliTest.ok(
        "board",
        "move",
        "--project",
        project,
        "--slot",
        "headline",
        "--number",
        "1",
        "--to",
        "benefit",
        "--place",
        "1",
        "--coder",
        "ana");
    JsonNode moved = CliTest.ok("board", "--project", project, "--json").json();
    assertEquals(0, moved.get("slots").get(0).get("items").size(), "gone from the headlines");
    assertEquals(1, moved.get("slots").get(2).get("items").size(), "now a benefit line");
    CliTest.ok(
        "board",
        "unpin",
        "--project",
        project,
        "--slot",
        "benefit",
        "--number",
        "1",
        "--coder",
        "ana");
    JsonNode unpinned = CliTest.ok("board", "--project", project, "--json").json();
    assertEquals(0, unpinned.get("slots").get(2).get("items").size(), "unpinned");
  }
}
