package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The codebook, coding, rules, undo and history from the command line. */
class CodingCommandsTest {
  @TempDir Path dir;
  String project;

  @BeforeEach
  void importWave() {
    project = CliTest.projectWith(dir, "two-questions.csv");
  }

  JsonNode codes() throws Exception {
    return CliTest.ok("codes", "--project", project, "--json").json().get("codes");
  }

  JsonNode codeNamed(String name) throws Exception {
    for (JsonNode c : codes()) {
      if (c.get("code").get("name").asText().equals(name)) {
        return c;
      }
    }
    throw new AssertionError("no code " + name + " in " + codes());
  }

  long firstAnswer(String query) throws Exception {
    JsonNode hits =
        CliTest.ok("search", "--project", project, "--query", query, "--json").json().get("hits");
    return hits.get(0).get("answer_id").asLong();
  }

  @Test
  void aCodebookIsBuiltChangedAndUndoneFromTheCommandLine() throws Exception {
    CliTest.ok(
        "codes",
        "add",
        "--project",
        project,
        "Fit",
        "--key",
        "f",
        "--direction",
        "friction",
        "--coder",
        "ana");
    long fit = firstAnswer("cabinets");
    String gave =
        CliTest.ok(
                "code",
                "--project",
                project,
                "--answer",
                Long.toString(fit),
                "--add",
                "fit",
                "--span",
                "0:14",
                "--coder",
                "ana")
            .out();
    assertTrue(gave.contains("Gave \"Fit\""), gave);
    assertEquals(1, codeNamed("Fit").get("answers").asInt());
    assertEquals(1, codeNamed("fit on the counter").get("answers").asInt(), "imported code");

    CliTest.ok(
        "codes",
        "merge",
        "--project",
        project,
        "fit on the counter",
        "--into",
        "Fit",
        "--coder",
        "ana");
    assertEquals(1, codeNamed("Fit").get("answers").asInt(), "the same answer: collapsed");
    CliTest.ok("undo", "--project", project, "--coder", "ana");
    assertEquals(1, codeNamed("fit on the counter").get("answers").asInt(), "merge undone");
    String redo = CliTest.ok("redo", "--project", project, "--coder", "ana").out();
    assertTrue(redo.startsWith("Redid: Merged"), redo);

    JsonNode history = CliTest.ok("history", "--project", project, "--json").json().get("history");
    assertEquals("redo", history.get(0).get("action").asText());
    assertEquals("ana", history.get(0).get("actor").asText());
  }

  @Test
  void aRuleIsPreviewedAppliedAndKeepsOffWhereAPersonSaidNo() throws Exception {
    CliTest.ok("codes", "add", "--project", project, "Price");
    JsonNode preview =
        CliTest.ok(
                "rules",
                "preview",
                "--project",
                project,
                "Price",
                "--query",
                "price OR steep",
                "--json")
            .json();
    assertEquals(2, preview.get("would_code").asInt(), preview.toString());
    CliTest.ok("rules", "add", "--project", project, "Price", "--query", "price OR steep");
    String applied = CliTest.ok("rules", "apply", "--project", project).out();
    assertTrue(applied.contains("2 answer(s) coded, 2 code(s) given"), applied);
    assertEquals(2, codeNamed("Price").get("answers").asInt());
    long steep = firstAnswer("steep");
    CliTest.ok("code", "--project", project, "--answer", Long.toString(steep), "--remove", "Price");
    String again = CliTest.ok("rules", "apply", "--project", project).out();
    assertTrue(again.contains("0 answer(s) coded, 0 code(s) given; 1 left alone"), again);
    assertEquals(1, codeNamed("Price").get("answers").asInt());
  }

  int readInQuestionTwo() throws Exception {
    return CliTest.ok("report", "--project", project, "--question", "2", "--json")
        .json()
        .get("questions")
        .get(0)
        .get("coverage")
        .get("Wave 1")
        .get("read")
        .asInt();
  }

  @Test
  void anAnswerIsMarkedReadWithNoCodeAndTheMarkIsTakenBack() throws Exception {
    assertEquals(0, readInQuestionTwo(), "no codes column for this question: nothing read");
    String answer = Long.toString(firstAnswer("grinders"));
    String marked =
        CliTest.ok("code", "--project", project, "--answer", answer, "--none", "--coder", "ana")
            .out();
    assertTrue(marked.contains("as read: no other code applies"), marked);
    assertEquals(1, readInQuestionTwo());
    CliTest.ok("undo", "--project", project, "--coder", "ana");
    assertEquals(0, readInQuestionTwo(), "undone");
    CliTest.ok("code", "--project", project, "--answer", answer, "--none", "--coder", "ana");
    CliTest.ok("code", "--project", project, "--answer", answer, "--none-off", "--coder", "eli");
    assertEquals(0, readInQuestionTwo(), "the mark taken off");
    CliTest.Run both =
        CliTest.riffle("code", "--project", project, "--answer", answer, "--none", "--add", "X");
    assertEquals(2, both.code(), "one change at a time");
  }

  @Test
  void badRequestsExitTwoWithAMessageAndChangeNothing() throws Exception {
    CliTest.ok("codes", "add", "--project", project, "Price", "--key", "p");
    CliTest.Run dup = CliTest.riffle("codes", "add", "--project", project, "PRICE");
    assertEquals(2, dup.code());
    assertTrue(dup.err().contains("already a code named \"Price\""), dup.err());
    CliTest.Run key = CliTest.riffle("codes", "add", "--project", project, "Cost", "--key", "j");
    assertEquals(2, key.code());
    CliTest.Run query =
        CliTest.riffle("rules", "add", "--project", project, "Price", "--query", "price AND (");
    assertEquals(2, query.code());
    assertTrue(query.err().contains("query:1:12:"), query.err());
    CliTest.Run span =
        CliTest.riffle(
            "code", "--project", project, "--answer", "1", "--add", "Price", "--span", "x");
    assertEquals(2, span.code());
    assertTrue(span.err().contains("START:END"), span.err());
    assertTrue(CliTest.ok("rules", "--project", project).out().contains("No rules yet"));
  }

  @Test
  void theCodebookTravelsAsCsvAndJson() throws Exception {
    CliTest.ok("codes", "add", "--project", project, "Delivery", "--direction", "friction");
    CliTest.ok(
        "codes", "add", "--project", project, "=Date unclear", "--theme", "Delivery", "--key", "d");
    Path csv = dir.resolve("book.csv");
    CliTest.ok("codes", "save", "--project", project, "--out", csv.toString());
    String text = Files.readString(csv, StandardCharsets.UTF_8);
    assertTrue(text.contains("'=Date unclear,Delivery,friction,d"), text);

    Path json = dir.resolve("book.json");
    CliTest.ok("codes", "save", "--project", project, "--out", json.toString());
    String other = dir.resolve("other.riffle").toString();
    CliTest.ok(
        "import", "--project", other, "--file", CliTest.fixture("two-questions.csv").toString());
    CliTest.ok("codes", "load", "--project", other, "--file", json.toString());
    JsonNode loaded = CliTest.ok("codes", "--project", other, "--json").json().get("codes");
    boolean found = false;
    for (JsonNode c : loaded) {
      if (c.get("code").get("name").asText().equals("=Date unclear")) {
        found = true;
        assertEquals("Delivery", c.get("theme").asText());
        assertEquals("d", c.get("code").get("key").asText());
      }
    }
    assertTrue(found, loaded.toString());

    Path bad = dir.resolve("bad.csv");
    Files.writeString(
        bad, "name,direction\nPrice,friction\nCost,sideways\n", StandardCharsets.UTF_8);
    CliTest.Run run = CliTest.riffle("codes", "load", "--project", other, "--file", bad.toString());
    assertEquals(2, run.code());
    assertTrue(run.err().contains("bad.csv:3:2:"), run.err());
    assertTrue(
        CliTest.riffle("codes", "--project", other).out().indexOf("Price") < 0,
        "nothing of the bad file was brought in");
  }
}
