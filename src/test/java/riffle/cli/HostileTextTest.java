package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Answers and names that try to steer the terminal: escape sequences (CSI, OSC), a one-byte C1 CSI,
 * bidirectional overrides and a bare carriage return. Answers keep them as text; nothing the
 * command line prints holds them raw; names holding them are refused and change nothing.
 */
class HostileTextTest {
  @TempDir Path dir;
  String project;

  @BeforeEach
  void importTheFixture() {
    project = CliTest.projectWith(dir, "control-characters.csv");
  }

  /** The characters of the fixture's answers, read from the file itself. */
  static Map<String, String> answersInTheFile() throws IOException {
    Map<String, String> out = new TreeMap<>();
    List<String> rows = new ArrayList<>();
    String text =
        Files.readString(CliTest.fixture("control-characters.csv"), StandardCharsets.UTF_8);
    // Each data row is one physical line except R-5, whose CR stays inside its quotes.
    for (String line : text.split("\n")) {
      rows.add(line);
    }
    for (String row : rows.subList(1, rows.size())) {
      String[] cells = row.substring(1, row.length() - 1).split("\",\"");
      out.put(cells[0], cells[2]);
    }
    return out;
  }

  static void assertNothingRaw(String printed) {
    for (int i = 0; i < printed.length(); i++) {
      char c = printed.charAt(i);
      boolean crlf = c == '\r' && i + 1 < printed.length() && printed.charAt(i + 1) == '\n';
      assertFalse(
          (c < 0x20 && c != '\n' && c != '\t' && !crlf)
              || (c >= 0x7f && c <= 0x9f)
              || (c >= 0x202a && c <= 0x202e)
              || (c >= 0x2066 && c <= 0x2069),
          "raw U+" + Integer.toHexString(c) + " at " + i + " in: " + printed);
    }
  }

  @Test
  void answersAreStoredAsTheyCameAndPrintedAsVisibleEscapes() throws IOException {
    CliTest.Run text =
        CliTest.riffle(
            "search",
            "--project",
            project,
            "--query",
            "delivery OR grinder OR price OR title OR carriage");
    assertEquals(0, text.code(), text.err());
    assertNothingRaw(text.out());
    assertTrue(text.out().contains("arrived \\u001B[31mred hot\\u001B[0m"), text.out());
    assertTrue(text.out().contains("\\u202Ecod.exe\\u202C"), text.out());
    assertTrue(text.out().contains("CSI \\u009B2J"), text.out());
    assertTrue(text.out().contains("fake line\\u000Doverwritten"), text.out());

    CliTest.Run json =
        CliTest.riffle(
            "search",
            "--project",
            project,
            "--query",
            "delivery OR grinder OR price OR title OR carriage OR steam",
            "--json");
    assertEquals(0, json.code(), json.err());
    assertNothingRaw(json.out());
    Map<String, String> file = answersInTheFile();
    JsonNode hits = json.json().get("hits");
    assertEquals(file.size(), hits.size(), json.out());
    for (JsonNode hit : hits) {
      assertEquals(
          file.get(hit.get("respondent").asText()),
          hit.get("text").asText(),
          "the JSON reads back as the very characters of the file");
    }
  }

  @Test
  void namesWithControlCharactersOrLineBreaksAreRefusedAndChangeNothing() {
    String before = CliTest.riffle("info", "--project", project, "--json").out();
    String codesBefore = CliTest.riffle("codes", "--project", project, "--json").out();
    for (String name : List.of("Price\u001B[2J", "two\nlines", "over\u202Eride", "tab\there")) {
      CliTest.Run run = CliTest.riffle("codes", "add", "--project", project, name);
      assertEquals(2, run.code(), name + ": " + run.out());
      assertTrue(run.err().contains("the code name"), run.err());
      assertNothingRaw(run.err());
      CliTest.Run theme =
          CliTest.riffle("codes", "add", "--project", project, "Fine", "--theme", name);
      assertEquals(2, theme.code(), name + ": " + theme.out());
      assertNothingRaw(theme.err());
    }
    CliTest.Run wave =
        CliTest.riffle(
            "import",
            "--project",
            project,
            "--file",
            CliTest.fixture("two-questions.csv").toString(),
            "--wave",
            "Wave\u001B]0;x\u0007 2");
    assertEquals(2, wave.code());
    assertTrue(wave.err().contains("the wave name \"Wave\\u001B]0;x\\u0007 2\" holds"), wave.err());
    assertNothingRaw(wave.err());
    CliTest.Run coder = CliTest.riffle("undo", "--project", project, "--coder", "ana\u001B[8m");
    assertEquals(2, coder.code(), coder.err());
    assertNothingRaw(coder.err());
    CliTest.Run segment =
        CliTest.riffle("phrases", "--project", project, "--segment", "dev\u009Bice=mobile");
    assertEquals(2, segment.code(), segment.err());
    assertTrue(segment.err().contains("the segment column"), segment.err());
    assertEquals(before, CliTest.riffle("info", "--project", project, "--json").out());
    assertEquals(codesBefore, CliTest.riffle("codes", "--project", project, "--json").out());
  }

  @Test
  void anExportWhoseNamesHoldControlCharactersIsRefusedWithItsPosition() throws Exception {
    String before = CliTest.riffle("info", "--project", project, "--json").out();
    CliTest.Run header =
        CliTest.riffle(
            "import", "--project", project, "--file", ingestFixture("control-header.csv"));
    assertEquals(2, header.code());
    assertTrue(header.err().contains("control-header.csv:1:2:"), header.err());
    assertNothingRaw(header.err());
    CliTest.Run codes =
        CliTest.riffle(
            "import", "--project", project, "--file", ingestFixture("control-codes.csv"));
    assertEquals(2, codes.code());
    assertTrue(codes.err().contains("control-codes.csv:3:3:"), codes.err());
    assertEquals(before, CliTest.riffle("info", "--project", project, "--json").out());
  }

  private static String ingestFixture(String name) throws URISyntaxException {
    return Path.of(HostileTextTest.class.getResource("/riffle/ingest/" + name).toURI()).toString();
  }
}
