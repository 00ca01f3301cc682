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
import riffle.app.HandThenRule;

/** {@code riffle report} and {@code riffle export} on a small coded project. */
class ReportCommandTest {
  @TempDir Path dir;
  String project;

  @BeforeEach
  void importCodedWave() {
    project = CliTest.projectWith(dir, "two-questions.csv");
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

  @Test
  void aWaveOnlyRulesTouchedGetsNoVerdictForHandCodesAndTheTextSaysWhy() throws Exception {
    Path file = HandThenRule.build(dir);
    CliTest.Run run = CliTest.riffle("report", "--project", file.toString(), "--segment", "device");
    assertEquals(0, run.code(), run.err());
    String out = run.out();
    assertTrue(
        out.contains("Answers read by a person: Wave 1 read 80 of 80 (100%); Wave 2 read 0 of 80"),
        out);
    assertTrue(out.contains("Wave 2 no share (no answer of Wave 2 read by a person yet)"), out);
    assertTrue(out.contains("Price (by rule)"), out);
    for (String line : out.lines().toList()) {
      if (line.contains(HandThenRule.UNSURE) || line.contains(HandThenRule.DELIVERY)) {
        assertFalse(line.contains(" fell ") || line.contains(" rose "), line);
      }
    }
    assertTrue(out.contains("  Not compared"), out);
    // The segment split is in the text too, values told apart only by case merged.
    assertTrue(out.contains("device = Mobile: read by a person Wave 1 read"), out);
    assertTrue(out.contains("device = (no value)"), out);
    assertFalse(out.contains("device = mobile"), out);
    assertTrue(out.contains("Saturation: 2 codes in 80 answers read by a person"), out);

    JsonNode q =
        CliTest.riffle("report", "--project", file.toString(), "--json")
            .json()
            .get("questions")
            .get(0);
    assertEquals(80, q.get("bases").get("Wave 1").asInt(), "the existing keys stay");
    assertEquals(0, q.get("coverage").get("Wave 2").get("read").asInt());
    assertEquals(80, q.get("coverage").get("Wave 2").get("answers").asInt());
    assertEquals("Wave 2", q.get("not_coded").get(0).asText());
    JsonNode unsure = q.get("codes").get(0);
    assertEquals(HandThenRule.UNSURE, unsure.get("code").asText());
    assertFalse(unsure.get("waves").has("Wave 2"));
    assertTrue(unsure.get("no_share").get("Wave 2").asText().contains("read by a person"));
    assertTrue(q.get("codes").get(2).get("by_rule").asBoolean());
    assertTrue(q.get("codes").get(2).get("waves").get("Wave 2").get("by_rule").asBoolean());
    assertEquals(2, q.get("not_compared").size());
    assertTrue(q.get("changes").get(0).get("by_rule").asBoolean());
  }

  @Test
  void anEmptyProjectsSaturationSaysNobodyReadAnything() {
    CliTest.Run text = CliTest.riffle("report", "--project", project, "--question", "2");
    assertEquals(0, text.code(), text.err());
    assertTrue(text.out().contains("Saturation: no answer read by a person yet"), text.out());
    assertFalse(text.out().contains("Chao1 0.0"), text.out());
  }
}
