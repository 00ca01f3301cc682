package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code riffle report} and {@code riffle export} on a small coded project. */
class ReportCommandTest {
  @TempDir Path dir;
  String project;

  @BeforeEach
  void importCodedWave() {
    project = dir.resolve("shop.riffle").toString();
    CliTest.Run run =
        CliTest.riffle(
            "import",
            "--project",
            project,
            "--file",
            CliTest.fixture("two-questions.csv").toString(),
            "--wave",
            "Wave 1");
    assertEquals(0, run.code(), run.err());
  }

  @Test
  void reportJsonHasTheContractKeysAndSaysTheBaseIsSmall() throws Exception {
    CliTest.Run run = CliTest.riffle("report", "--project", project, "--question", "1", "--json");
    assertEquals(0, run.code(), run.err());
    JsonNode q = run.json().get("questions").get(0);
    assertEquals("What almost stopped you from ordering?", q.get("question").asText());
    assertTrue(q.get("bases").get("Wave 1").asInt() > 0);
    JsonNode code = q.get("codes").get(0);
    for (String key : new String[] {"code", "parent", "waves"}) {
      assertTrue(code.has(key), key + " in " + code);
    }
    JsonNode share = code.get("waves").get("Wave 1");
    for (String key : new String[] {"count", "base", "share", "ci"}) {
      assertTrue(share.has(key), key + " in " + share);
    }
    assertTrue(share.get("small_base").asBoolean(), "a base under 30 is flagged");
    for (String key : new String[] {"changes", "cooccurrence", "saturation"}) {
      assertTrue(q.has(key), key);
    }
    CliTest.Run text = CliTest.riffle("report", "--project", project);
    assertTrue(text.out().contains("* small base"), text.out());
  }

  @Test
  void exportsWriteMaskedTextAndNeutraliseFormulas() throws Exception {
    Path html = dir.resolve("r.html");
    assertEquals(
        0, CliTest.riffle("report", "--project", project, "--html", html.toString()).code());
    assertTrue(Files.readString(html, StandardCharsets.UTF_8).contains("<svg"));
    Path csv = dir.resolve("coded.csv");
    CliTest.Run run =
        CliTest.riffle(
            "export",
            "--project",
            project,
            "--what",
            "coded",
            "--format",
            "csv",
            "--out",
            csv.toString(),
            "--bom");
    assertEquals(0, run.code(), run.err());
    byte[] bytes = Files.readAllBytes(csv);
    assertEquals((byte) 0xEF, bytes[0]);
    String text = new String(bytes, StandardCharsets.UTF_8);
    assertTrue(text.contains("delivery date unclear"), text);
    assertFalse(text.contains("\n-,"), "a cell starting with - is neutralised");
    CliTest.Run bad =
        CliTest.riffle(
            "export",
            "--project",
            project,
            "--what",
            "coded",
            "--format",
            "html",
            "--out",
            csv.toString());
    assertEquals(2, bad.code());
    assertTrue(bad.err().contains("written as csv"), bad.err());
    for (String f : new String[] {"csv", "json", "md"}) {
      Path out = dir.resolve("book." + f);
      assertEquals(
          0,
          CliTest.riffle(
                  "export",
                  "--project",
                  project,
                  "--what",
                  "codebook",
                  "--format",
                  f,
                  "--out",
                  out.toString())
              .code());
      assertTrue(Files.readString(out, StandardCharsets.UTF_8).contains("warranty doubts"));
    }
  }
}
