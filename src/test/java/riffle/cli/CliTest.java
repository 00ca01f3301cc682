package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The command line as a user meets it: real fixture files, exit codes, text and JSON. */
class CliTest {
  @TempDir Path dir;

  /** What one run printed and returned. */
  record Run(int code, String out, String err) {
    JsonNode json() throws IOException {
      return JsonOutput.MAPPER.readTree(out);
    }
  }

  static Run riffleWithInput(String stdin, String... args) {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ByteArrayOutputStream err = new ByteArrayOutputStream();
    InputStream in = new ByteArrayInputStream(stdin.getBytes(StandardCharsets.UTF_8));
    int code =
        Main.run(
            args,
            in,
            new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8));
    return new Run(
        code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
  }

  static Run riffle(String... args) {
    return riffleWithInput("", args);
  }

  /** Runs a command that must succeed (exit 0); a failure shows what it printed. */
  static Run ok(String... args) {
    Run run = riffle(args);
    assertEquals(0, run.code(), run.out() + run.err());
    return run;
  }

  /** Imports a fixture of this folder as "Wave 1" into a new project in {@code dir}: its path. */
  static String projectWith(Path dir, String fixture) {
    String project = dir.resolve("shop.riffle").toString();
    ok("import", "--project", project, "--file", fixture(fixture).toString(), "--wave", "Wave 1");
    return project;
  }

  static Path fixture(String name) {
    try {
      return Path.of(CliTest.class.getResource("/riffle/cli/" + name).toURI());
    } catch (URISyntaxException e) {
      throw new IllegalStateException(e);
    }
  }

  String project() {
    return dir.resolve("shop.riffle").toString();
  }

  @Test
  void importsTwoQuestionsWithImportedCodes() throws IOException {
    Run run =
        riffle(
            "import",
            "--project",
            project(),
            "--file",
            fixture("two-questions.csv").toString(),
            "--wave",
            "Wave 1",
            "--date",
            "2026-03-15",
            "--json");
    assertEquals(0, run.code(), run.err());
    JsonNode json = run.json();
    assertEquals("Wave 1", json.get("wave").asText());
    assertEquals(8, json.get("rows").asInt());
    assertEquals(16, json.get("answers").asInt());
    assertEquals(0, json.get("skipped").asInt());
    assertEquals(0, json.get("duplicates").asInt());
    assertEquals(0, json.get("problems").size());
    assertEquals(6, json.get("codes_created").asInt());
    assertEquals(7, json.get("assignments").asInt());

    JsonNode info = riffle("info", "--project", project(), "--json").json();
    assertEquals(1, info.get("waves").size());
    JsonNode wave = info.get("waves").get(0);
    assertEquals("Wave 1", wave.get("name").asText());
    assertEquals(16, wave.get("answers").asInt());
    assertEquals(13, wave.get("substantive").asInt(), "n/a, nothing and - leave the base");
    assertEquals(16, info.get("answers").asInt());
    assertEquals(6, info.get("codes").asInt());
    assertEquals(7, info.get("assignments").asInt());
    assertEquals("2026-03-15", wave.get("fielded_on").asText());
  }

  @Test
  void reimportingTheSameFileAddsNothing() throws IOException {
    String file = fixture("two-questions.csv").toString();
    assertEquals(0, riffle("import", "--project", project(), "--file", file, "--wave", "W").code());
    JsonNode again =
        riffle("import", "--project", project(), "--file", file, "--wave", "W", "--json").json();
    assertEquals(8, again.get("duplicates").asInt());
    assertEquals(0, again.get("answers").asInt());
    assertEquals(0, again.get("assignments").asInt());
    assertEquals(
        16, riffle("info", "--project", project(), "--json").json().get("answers").asInt());
  }

  @Test
  void waveDefaultsToTheFileNameAndItsLatestAnswerDate() throws IOException {
    JsonNode json =
        riffle(
                "import",
                "--project",
                project(),
                "--file",
                fixture("two-questions.csv").toString(),
                "--json")
            .json();
    assertEquals("two-questions", json.get("wave").asText());
    assertEquals("2026-03-09", json.get("fielded_on").asText());
  }

  @Test
  void importsCellsPastedOnStandardInput() throws IOException {
    String paste =
        "id\tdevice\tWhat made you choose us?\n"
            + "P1\tmobile\t\"the warranty,\nand the tested parts\"\n"
            + "P2\tdesktop\tgood price for a machine that works like new\n"
            + "P3\tmobile\tn/a\n";
    Run run = riffleWithInput(paste, "import", "--project", project(), "--paste", "--json");
    assertEquals(0, run.code(), run.err());
    JsonNode json = run.json();
    assertEquals("Wave 1", json.get("wave").asText());
    assertEquals(3, json.get("rows").asInt());
    assertEquals(3, json.get("answers").asInt());
    assertEquals("tab", json.get("delimiter").asText());
    JsonNode info = riffle("info", "--project", project(), "--json").json();
    assertEquals(2, info.get("waves").get(0).get("substantive").asInt());
  }

  @Test
  void raggedRowIsSkippedAndReportedWithItsLine() throws IOException {
    Run run =
        riffle(
            "import",
            "--project",
            project(),
            "--file",
            fixture("ragged-row.csv").toString(),
            "--json");
    assertEquals(0, run.code(), run.err());
    JsonNode json = run.json();
    assertEquals(3, json.get("rows").asInt());
    assertEquals(2, json.get("answers").asInt());
    assertEquals(1, json.get("skipped").asInt());
    assertEquals(3, json.get("problems").get(0).get("line").asInt());
  }

  @ParameterizedTest(name = "{0} {1}")
  @CsvSource(
      delimiter = '|',
      value = {
        "unclosed-quote.csv||unclosed-quote.csv:3:3",
        "empty.csv||empty",
        "no-text.csv||--text-column",
        "binary.csv||binary",
        "two-questions.csv|--encoding klingon-8|unknown encoding 'klingon-8'",
        "two-questions.csv|--text-column Missing|two-questions.csv:1",
      })
  void unusableExportExitsTwoAndChangesNothing(String name, String extra, String expected)
      throws IOException {
    String file = fixture("two-questions.csv").toString();
    assertEquals(0, riffle("import", "--project", project(), "--file", file).code());
    byte[] before = Files.readAllBytes(Path.of(project()));

    List<String> args =
        new ArrayList<>(
            List.of("import", "--project", project(), "--file", fixture(name).toString()));
    if (extra != null) {
      args.addAll(List.of(extra.split(" ")));
    }
    Run run = riffle(args.toArray(String[]::new));
    assertEquals(2, run.code(), run.out() + run.err());
    assertTrue(run.err().contains(expected), run.err());
    assertFalse(run.err().contains("Exception"), "no stack trace or exception name: " + run.err());
    assertArrayEquals(before, Files.readAllBytes(Path.of(project())));
    assertEquals(
        16, riffle("info", "--project", project(), "--json").json().get("answers").asInt());
  }

  @Test
  void exportOverTheSizeLimitIsRefusedUnread() throws IOException {
    Path big = dir.resolve("big-export.csv");
    StringBuilder sb = new StringBuilder("id,What made you choose us?\n");
    for (int i = 0; sb.length() < 1_200_000; i++) {
      sb.append(i).append(",\"the warranty and the tested parts, answer ").append(i).append("\"\n");
    }
    Files.writeString(big, sb, StandardCharsets.UTF_8);
    Run run = riffle("import", "--project", project(), "--file", big.toString(), "--max-mb", "1");
    assertEquals(2, run.code(), run.err());
    assertTrue(run.err().contains("big-export.csv"), run.err());
    assertTrue(run.err().contains("--max-mb"), "says how to raise the limit: " + run.err());
    assertFalse(Files.exists(Path.of(project())));
    assertEquals(0, riffle("import", "--project", project(), "--file", big.toString()).code());
  }

  @Test
  void projectFromANewerRiffleIsRefused() throws Exception {
    riffle("import", "--project", project(), "--file", fixture("two-questions.csv").toString());
    try (java.sql.Connection c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + project());
        java.sql.Statement s = c.createStatement()) {
      s.executeUpdate("PRAGMA user_version = 99");
    }
    byte[] before = Files.readAllBytes(Path.of(project()));
    Run info = riffle("info", "--project", project());
    assertEquals(2, info.code());
    assertTrue(info.err().contains("newer Riffle"), info.err());
    Run load =
        riffle("import", "--project", project(), "--file", fixture("ragged-row.csv").toString());
    assertEquals(2, load.code());
    assertArrayEquals(before, Files.readAllBytes(Path.of(project())));
  }

  @Test
  void unusableExportDoesNotCreateAProject() {
    Run run = riffle("import", "--project", project(), "--file", fixture("empty.csv").toString());
    assertEquals(2, run.code());
    assertFalse(Files.exists(Path.of(project())), "no empty project is left behind");
  }

  @Test
  void errorsComeAsJsonWithTheirPositionWhenAsked() throws IOException {
    Run run =
        riffle(
            "import",
            "--project",
            project(),
            "--file",
            fixture("unclosed-quote.csv").toString(),
            "--json");
    assertEquals(2, run.code());
    JsonNode error = run.json().get("error");
    assertEquals("unclosed-quote.csv", error.get("file").asText());
    assertEquals(3, error.get("line").asInt());
    assertEquals(3, error.get("column").asInt());
  }

  @ParameterizedTest(name = "{0}")
  @CsvSource(
      delimiter = '|',
      value = {
        "--delimiter colon|unknown delimiter 'colon'",
        "--date 15/03/2026|YYYY-MM-DD",
        "--max-mb 0|",
      })
  void badOptionsExitTwoWithAMessage(String option, String expected) {
    List<String> args =
        new ArrayList<>(
            List.of(
                "import",
                "--project",
                project(),
                "--file",
                fixture("two-questions.csv").toString()));
    args.addAll(List.of(option.split(" ")));
    Run run = riffle(args.toArray(String[]::new));
    assertEquals(2, run.code(), run.err());
    if (expected != null) {
      assertTrue(run.err().contains(expected), run.err());
    }
    assertFalse(Files.exists(Path.of(project())));
  }

  @Test
  void aWaveKeepsItsDate() {
    String file = fixture("two-questions.csv").toString();
    riffle("import", "--project", project(), "--file", file, "--wave", "W", "--date", "2026-03-15");
    Run run =
        riffle(
            "import",
            "--project",
            project(),
            "--file",
            file,
            "--wave",
            "W",
            "--date",
            "2026-04-01");
    assertEquals(2, run.code());
    assertTrue(run.err().contains("is dated 2026-03-15"), run.err());
  }

  @Test
  void infoOnAMissingProjectSaysHowToCreateOne() {
    Run run = riffle("info", "--project", project());
    assertEquals(2, run.code());
    assertTrue(run.err().contains("riffle import"), run.err());
  }

  @Test
  void everyCommandHasHelp() {
    for (String command : List.of("import", "info", "demo", "serve")) {
      Run run = riffle(command, "--help");
      assertEquals(0, run.code(), command);
      assertTrue(run.out().contains("Usage: riffle " + command), run.out());
    }
    Run root = riffle("--help");
    assertEquals(0, root.code());
    assertTrue(root.out().contains("import"));
  }

  @Test
  void everyCommandIsListedHelpedAndSuggestedThoughOnlyTheOneNamedIsBuilt() {
    Run root = riffle("--help");
    for (Class<?> c : Main.COMMANDS) {
      String name = c.getAnnotation(picocli.CommandLine.Command.class).name();
      assertTrue(
          root.out().lines().anyMatch(l -> l.strip().startsWith(name + " ")), name + ":\n" + root);
    }
    Run help = riffle("help", "info");
    assertEquals(0, help.code(), help.err());
    assertTrue(help.out().startsWith("Usage: riffle info"), help.out());
    Run typo = riffle("infoo");
    assertEquals(2, typo.code());
    assertTrue(typo.err().contains("Did you mean: riffle info?"), typo.err());
  }

  @Test
  void helpFormatsEveryDescriptionWithoutWarnings() {
    java.io.PrintStream realErr = System.err;
    ByteArrayOutputStream traced = new ByteArrayOutputStream();
    System.setErr(new java.io.PrintStream(traced, true, StandardCharsets.UTF_8));
    Run report;
    try {
      for (String command :
          List.of(
              "import", "info", "analyze", "search", "phrases", "codes", "code", "undo", "redo",
              "rules", "queue", "history", "suggest", "report", "quotes", "board", "export",
              "serve", "demo")) {
        Run run = riffle(command, "--help");
        assertEquals(0, run.code(), command);
        assertTrue(!run.err().contains("WARN"), command + ": " + run.err());
      }
      report = riffle("report", "--help");
    } finally {
      System.setErr(realErr);
    }
    String warnings = traced.toString(StandardCharsets.UTF_8);
    assertTrue(!warnings.contains("Could not format"), warnings);
    assertTrue(report.out().contains("95% interval"), report.out());
    Run root = riffle("--help");
    assertTrue(
        root.out().lines().anyMatch(l -> l.strip().startsWith("report") && l.contains("Shows")),
        root.out());
  }

  @Test
  void analyzePrintsTheFixedJsonKeys() throws IOException {
    Run run =
        riffle("analyze", "--text", "Did NOT arrive on time. Call 07700 900123 please", "--json");
    assertEquals(0, run.code(), run.err());
    JsonNode json = run.json();
    assertEquals("eng", json.get("language").asText());
    assertEquals("Did NOT arrive on time. Call [phone] please", json.get("masked").asText());
    JsonNode pii = json.get("pii").get(0);
    assertEquals("phone", pii.get("type").asText());
    assertEquals(29, pii.get("start").asInt());
    assertEquals(41, pii.get("end").asInt());
    JsonNode sentence = json.get("sentences").get(0);
    assertEquals("Did NOT arrive on time.", sentence.get("text").asText());
    JsonNode arrive = sentence.get("tokens").get(2);
    assertEquals("arrive", arrive.get("text").asText());
    assertEquals(8, arrive.get("start").asInt());
    assertEquals(14, arrive.get("end").asInt());
    assertEquals("VB", arrive.get("pos").asText());
    assertEquals("arriv", arrive.get("stem").asText());
    assertTrue(arrive.get("negated").asBoolean());
    JsonNode chunk = sentence.get("chunks").get(0);
    for (String key : List.of("type", "text", "start", "end")) {
      assertTrue(chunk.has(key), key);
    }
  }

  @Test
  void analyzePrintsChunksAndTagsForPeople() {
    Run run = riffle("analyze", "--text", "wasnt sure it would fit");
    assertEquals(0, run.code(), run.err());
    assertTrue(run.out().contains("[VP"), run.out());
    assertTrue(run.out().contains("negated"), run.out());
  }

  @Test
  void unknownCommandIsAUsageError() {
    Run run = riffle("serve-coffee");
    assertEquals(2, run.code());
  }

  @Test
  void infoPrintsWavesForPeople() {
    riffle(
        "import",
        "--project",
        project(),
        "--file",
        fixture("two-questions.csv").toString(),
        "--wave",
        "Wave 1");
    Run run = riffle("info", "--project", project());
    assertEquals(0, run.code());
    assertTrue(run.out().contains("Wave 1"), run.out());
    assertTrue(run.out().contains("What made you choose us?"), run.out());
  }
}
