package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.net.URISyntaxException;
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
}
