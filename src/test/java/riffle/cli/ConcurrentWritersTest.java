package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.store.ProjectStore;

/** Two processes importing into one project at the same time: both land whole, nothing breaks. */
class ConcurrentWritersTest {
  @TempDir Path dir;

  static Path export(Path file, String prefix, int rows) throws IOException {
    try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
      w.write("response_id,device,What almost stopped you from ordering?\n");
      for (int i = 0; i < rows; i++) {
        w.write(
            prefix
                + i
                + ","
                + (i % 3 == 0 ? "mobile" : "desktop")
                + ",\"not sure when it would arrive, answer number "
                + i
                + "\"\n");
      }
    }
    return file;
  }

  @Test
  void importsFromTwoProcessesAreSerialisedWithoutLoss() throws Exception {
    Path project = dir.resolve("shared.riffle");
    Path a = export(dir.resolve("a.csv"), "A", 30_000);
    Path b = export(dir.resolve("b.csv"), "B", 30_000);
    Path java = Path.of(System.getProperty("java.home"), "bin", "java");
    Process child =
        new ProcessBuilder(
                List.of(
                    java.toString(),
                    "-cp",
                    System.getProperty("java.class.path"),
                    Main.class.getName(),
                    "import",
                    "--project",
                    project.toString(),
                    "--file",
                    a.toString(),
                    "--wave",
                    "A",
                    "--json"))
            .redirectErrorStream(true)
            .redirectOutput(dir.resolve("child.log").toFile())
            .start();
    CliTest.Run here =
        CliTest.riffle(
            "import",
            "--project",
            project.toString(),
            "--file",
            b.toString(),
            "--wave",
            "B",
            "--json");
    assertEquals(true, child.waitFor(120, TimeUnit.SECONDS), "the other process finished");
    assertEquals(0, child.exitValue(), Files.readString(dir.resolve("child.log")));
    assertEquals(0, here.code(), here.err());

    JsonNode info = CliTest.riffle("info", "--project", project.toString(), "--json").json();
    assertEquals(60_000, info.get("answers").asInt());
    assertEquals(2, info.get("waves").size());
    try (ProjectStore store = ProjectStore.openExisting(project)) {
      assertEquals("ok", store.integrityCheck());
    }
  }
}
