package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code riffle phrases} on the demo project, through the real command line. */
class PhrasesCommandTest {
  @TempDir static Path dir;
  static String project;

  @BeforeAll
  static void demo() {
    CliTest.Run run = CliTest.riffle("demo", "--dir", dir.toString(), "--no-serve", "--json");
    assertEquals(0, run.code(), run.err());
    project = dir.resolve("demo.riffle").toString();
  }

  @Test
  void givesPhrasesAndClustersWithTheFixedKeys() throws Exception {
    CliTest.Run run =
        CliTest.riffle(
            "phrases", "--project", project, "--question", "2", "--limit", "10", "--json");
    assertEquals(0, run.code(), run.err());
    JsonNode json = run.json();
    assertEquals(10, json.get("phrases").size());
    JsonNode first = json.get("phrases").get(0);
    for (String key : new String[] {"phrase", "answers", "score", "variants", "examples"}) {
      assertTrue(first.has(key), key);
    }
    assertTrue(first.get("answers").asInt() >= 3);
    String example = first.get("examples").get(0).get("text").asText();
    assertTrue(!example.contains("@example."), "examples are masked: " + example);
    assertTrue(json.get("clusters").size() > 0, "themes that travel together");
    JsonNode cluster = json.get("clusters").get(0);
    assertTrue(cluster.has("phrases") && cluster.has("answers") && cluster.has("query"));
  }

  @Test
  void aWaveTheProjectLacksIsBadInputNamingItsOption() {
    CliTest.Run run =
        CliTest.riffle("phrases", "--project", project, "--wave", "Wave 3", "--against", "Wave 9");
    assertEquals(2, run.code(), run.err());
    assertTrue(
        run.err()
            .startsWith("riffle: --against: no wave named \"Wave 9\"; the waves are Pilot, Wave 1"),
        run.err());
    CliTest.Run question = CliTest.riffle("phrases", "--project", project, "--question", "7");
    assertEquals(2, question.code(), question.err());
    assertTrue(question.err().startsWith("riffle: --question: no question \"7\""), question.err());
  }

  @Test
  void showsTheSiteChangeAsAFallInWaveThree() throws Exception {
    JsonNode keyness =
        CliTest.riffle(
                "phrases",
                "--project",
                project,
                "--question",
                "1",
                "--wave",
                "Wave 3",
                "--against",
                "Wave 2",
                "--json")
            .json()
            .get("keyness");
    boolean fell = false;
    for (JsonNode k : keyness) {
      if (k.get("phrase").asText().toLowerCase(java.util.Locale.ROOT).contains("arrive")
          && k.get("direction").asText().equals("less")
          && k.get("p").asDouble() < 0.01) {
        fell = true;
      }
    }
    assertTrue(fell, "a delivery-date phrase falls in Wave 3: " + keyness);
    for (JsonNode k : keyness) {
      boolean clear = k.get("p_adjusted").asDouble() < 0.05;
      assertEquals(
          clear, !k.get("verdict").asText().equals("no clear change"), "a direction is earned");
    }
    CliTest.Run text =
        CliTest.riffle(
            "phrases",
            "--project",
            project,
            "--question",
            "1",
            "--wave",
            "Wave 3",
            "--against",
            "Wave 2");
    assertTrue(text.out().contains("adjusted p="), text.out());
    assertTrue(text.out().contains("only where the adjusted p is under 0.05"), text.out());
  }

  @Test
  void anUnknownQuestionExitsTwoAndListsThem() {
    CliTest.Run run = CliTest.riffle("phrases", "--project", project, "--question", "7");
    assertEquals(2, run.code());
    assertTrue(run.err().contains("1 = What almost stopped you from ordering?"), run.err());
  }
}
