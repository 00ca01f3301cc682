package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Exports that are not what they seem, through the real command line: encodings mixed line by line,
 * and files too wide or with a cell too large. Each is either read right and reported with its
 * lines, or refused with exit 2 and a positioned message, leaving the project as it was.
 */
class HostileFilesTest {
  @TempDir Path dir;

  String project() {
    return dir.resolve("shop.riffle").toString();
  }

  static String ingestFixture(String name) {
    try {
      return Path.of(HostileFilesTest.class.getResource("/riffle/ingest/" + name).toURI())
          .toString();
    } catch (URISyntaxException e) {
      throw new IllegalStateException(e);
    }
  }

  @Test
  void aFileMixingUtf8AndWindows1252IsStoredWithoutMojibakeAndNamesTheLines() throws Exception {
    CliTest.Run run =
        CliTest.riffle(
            "import",
            "--project",
            project(),
            "--file",
            ingestFixture("mixed-utf8-windows-1252.csv"),
            "--wave",
            "W");
    assertEquals(0, run.code(), run.err());
    assertTrue(run.out().contains("mixed-utf8-windows-1252.csv:5: this line is not valid UTF-8"));
    assertTrue(run.out().contains("mixed-utf8-windows-1252.csv:6:"), run.out());
    assertTrue(run.out().contains("the file mixes encodings"), run.out());

    JsonNode hits =
        CliTest.riffle("search", "--project", project(), "--query", "wave:W", "--json").json();
    Map<String, String> texts = new HashMap<>();
    for (JsonNode h : hits.get("hits")) {
      texts.put(h.get("respondent").asText(), h.get("text").asText());
    }
    assertEquals("The café in the photos looked nothing like my kitchen", texts.get("M1"));
    assertEquals("Shipping to Köln took nine days", texts.get("M3"));
    assertEquals(
        "Le délai de livraison était trop long pour une machine déjà révisée", texts.get("M4"));
    for (String t : texts.values()) {
      assertFalse(t.contains("Ã") || t.contains("\uFFFD"), t);
    }
  }

  @Test
  void aFileOfFiveThousandColumnsIsRefusedAtItsHeaderAndChangesNothing() throws Exception {
    assertEquals(
        0,
        CliTest.riffle(
                "import",
                "--project",
                project(),
                "--file",
                CliTest.fixture("two-questions.csv").toString(),
                "--wave",
                "W")
            .code());
    Path wide = dir.resolve("wide.csv");
    StringBuilder sb = new StringBuilder("id");
    for (int c = 1; c < 5_000; c++) {
      sb.append(",Q").append(c).append(" what did you think?");
    }
    sb.append('\n');
    for (int r = 0; r < 30; r++) {
      sb.append(r);
      for (int c = 1; c < 5_000; c++) {
        sb.append(",the grinder was fine");
      }
      sb.append('\n');
    }
    Files.writeString(wide, sb, StandardCharsets.UTF_8);
    byte[] before = Files.readAllBytes(Path.of(project()));
    String info = CliTest.riffle("info", "--project", project(), "--json").out();

    CliTest.Run run =
        CliTest.riffle("import", "--project", project(), "--file", wide.toString(), "--json");
    assertEquals(2, run.code(), run.err());
    assertTrue(
        run.err()
            .contains("wide.csv:1:1001: the header has 5,000 columns, over the limit of 1,000"),
        run.err());
    assertTrue(run.err().contains("raise the column limit to 5000 (--max-columns)"), run.err());
    assertEquals(1001, run.json().get("error").get("column").asInt());
    assertArrayEquals(before, Files.readAllBytes(Path.of(project())), "not a byte changed");
    assertEquals(info, CliTest.riffle("info", "--project", project(), "--json").out());
  }

  @Test
  void aCellOfAMegabyteIsStoredWholeAndSaysOnlyItsStartIsAnalysed() throws Exception {
    StringBuilder cell = new StringBuilder("The grinder was late");
    while (cell.length() < (1 << 20)) {
      cell.append(" and the burrs were fine");
    }
    Path file = dir.resolve("long.csv");
    Files.writeString(
        file,
        "id,What almost stopped you?\nL1,\""
            + cell
            + "\"\nS1,The grinder arrived early and well packed\n",
        StandardCharsets.UTF_8);
    CliTest.Run run =
        CliTest.riffle("import", "--project", project(), "--file", file.toString(), "--wave", "W");
    assertEquals(0, run.code(), run.err());
    assertTrue(
        run.out()
            .contains(
                String.format(
                    java.util.Locale.ROOT,
                    "long.csv:2:2: this answer is %,d characters long; it is stored, searched and"
                        + " shown whole, but only its first 5,000 characters are analysed",
                    cell.length())),
        run.out());
    JsonNode hit =
        CliTest.riffle("search", "--project", project(), "--query", "late", "--json")
            .json()
            .get("hits")
            .get(0);
    assertEquals(cell.toString(), hit.get("text").asText(), "stored whole");
  }
}
