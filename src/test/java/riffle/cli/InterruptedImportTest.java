package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.tools.SampleResponses;

/**
 * A first import stopped while it analyses — SIGTERM, as a closed terminal or a service manager
 * sends, or kill -9 — leaves no project behind: the new project appears whole or not at all, and
 * the next import into that name works.
 */
class InterruptedImportTest {
  @TempDir Path dir;

  private List<String> names() throws Exception {
    try (Stream<Path> files = Files.list(dir)) {
      return files
          .map(f -> f.getFileName().toString())
          .filter(n -> n.startsWith("shop.riffle"))
          .sorted()
          .toList();
    }
  }

  /** Starts a first import and returns once it has begun analysing (its project file exists). */
  private ChildRiffle.Started importUntilAnalysing(Path export) throws Exception {
    ChildRiffle.Started started =
        ChildRiffle.fromClassPath(dir.resolve("home"))
            .start(
                "import",
                "--project",
                dir.resolve("shop.riffle").toString(),
                "--file",
                export.toString(),
                "--wave",
                "Wave 1");
    Path building =
        dir.resolve("shop.riffle.partial-" + started.process().pid()).resolve("shop.riffle");
    long until = System.nanoTime() + 60_000_000_000L;
    while (!Files.exists(building) && System.nanoTime() < until) {
      Thread.sleep(20);
    }
    assertTrue(Files.exists(building), "the import began: " + started.errSoFar());
    Thread.sleep(1_000); // loading the models and analysing
    assertTrue(started.process().isAlive(), "still analysing: " + started.errSoFar());
    return started;
  }

  @Test
  void sigtermDuringTheFirstImportLeavesNoProject() throws Exception {
    Path export = dir.resolve("large.csv");
    SampleResponses.writeLargeExport(export, 3_000, 42L);
    ChildRiffle.Started started = importUntilAnalysing(export);
    started.process().destroy(); // SIGTERM
    started.process().waitFor();
    assertEquals(List.of(), names(), "no project file, log, derived folder or working folder");

    CliTest.Run again =
        CliTest.riffle(
            "import",
            "--project",
            dir.resolve("shop.riffle").toString(),
            "--file",
            CliTest.fixture("two-questions.csv").toString(),
            "--wave",
            "Wave 1");
    assertEquals(0, again.code(), again.err());
    assertEquals(List.of("shop.riffle", "shop.riffle.d"), names());
  }

  @Test
  void killDuringTheFirstImportLeavesOnlyAWorkingFolderThatTheNextImportRemoves() throws Exception {
    Path export = dir.resolve("large.csv");
    SampleResponses.writeLargeExport(export, 3_000, 42L);
    ChildRiffle.Started started = importUntilAnalysing(export);
    started.process().destroyForcibly(); // SIGKILL: nothing of the process runs any more
    started.process().waitFor();
    assertTrue(
        names().stream().noneMatch(n -> n.equals("shop.riffle") || n.equals("shop.riffle.d")),
        names().toString());

    CliTest.Run again =
        CliTest.riffle(
            "import",
            "--project",
            dir.resolve("shop.riffle").toString(),
            "--file",
            CliTest.fixture("two-questions.csv").toString(),
            "--wave",
            "Wave 1",
            "--json");
    assertEquals(0, again.code(), again.err());
    assertEquals(List.of("shop.riffle", "shop.riffle.d"), names(), "the leftover is gone");
    assertEquals(
        again.json().get("answers").asInt(),
        CliTest.riffle("info", "--project", dir.resolve("shop.riffle").toString(), "--json")
            .json()
            .get("answers")
            .asInt());
  }
}
