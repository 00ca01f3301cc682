package riffle.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.CodeDraft;
import riffle.model.Progress;
import riffle.store.AnalysisCache;

/** A new project appears whole or not at all, and never takes an earlier project's leftovers. */
class NewProjectTest {
  @TempDir Path dir;

  static final String WAVE =
      "id,What almost stopped you from ordering?\n"
          + "A1,The delivery date was not shown anywhere\n"
          + "A2,Shipping was expensive for a small order\n";

  private ImportRequest request() throws Exception {
    Path file = dir.resolve("wave.csv");
    Files.writeString(file, WAVE, StandardCharsets.UTF_8);
    return ImportRequest.from(new ImportSource.File(file)).wave("Wave 1").get();
  }

  private List<String> names() throws Exception {
    try (Stream<Path> files = Files.list(dir)) {
      return files.map(f -> f.getFileName().toString()).sorted().toList();
    }
  }

  @Test
  void aFirstImportLeavesTheProjectAsOneFileWithItsCacheBesideIt() throws Exception {
    Path project = dir.resolve("shop.riffle");
    ImportReport report = Project.importInto(project, request(), Progress.NONE);
    assertEquals(2, report.answers());
    assertEquals(List.of("shop.riffle", "shop.riffle.d", "wave.csv"), names());
    try (AnalysisCache cache = AnalysisCache.open(project)) {
      assertEquals(2, cache.count(riffle.text.AnalysisCodec.VERSION), "the parses came along");
    }
    try (Project p = Project.openExisting(project)) {
      assertEquals(2, p.summary().answers());
      assertEquals(2, p.search("delivery OR shipping", 10).total());
    }
  }

  @Test
  void workThatFailsLeavesNothing() throws Exception {
    Path project = dir.resolve("shop.riffle");
    assertThrows(
        IllegalArgumentException.class,
        () ->
            NewProject.create(
                project,
                p -> {
                  p.codebook().create("ana", CodeDraft.named("late"));
                  throw new IllegalArgumentException("stopped half way");
                }));
    assertEquals(List.of(), names());
  }

  @Test
  void aNameTakenMeanwhileIsLeftToItsOwner() throws Exception {
    Path project = dir.resolve("shop.riffle");
    Optional<Long> made =
        NewProject.create(
            project,
            p -> {
              try (Project other = Project.openOrCreate(project)) {
                other.codebook().create("bo", CodeDraft.named("theirs"));
              }
              return p.codebook().create("ana", CodeDraft.named("mine")).id();
            });
    assertTrue(made.isEmpty(), "the other process's project stays");
    try (Project p = Project.openExisting(project)) {
      assertEquals(List.of("theirs"), p.codebook().codes().stream().map(c -> c.name()).toList());
    }
    assertFalse(names().stream().anyMatch(n -> n.contains(".partial")), names().toString());
  }

  @Test
  void anEarlierProjectsLeftoversAreNotTakenForTheNewOnes() throws Exception {
    Path project = dir.resolve("shop.riffle");
    Project.importInto(project, request(), Progress.NONE);
    try (Project p = Project.openExisting(project)) {
      p.search("delivery", 10); // builds the index
    }
    // The project file is deleted by hand; its derived folder and a write-ahead log stay.
    Files.delete(project);
    Files.writeString(dir.resolve("shop.riffle-wal"), "not this project's", StandardCharsets.UTF_8);
    Path other = dir.resolve("other.csv");
    Files.writeString(
        other,
        "id,What almost stopped you from ordering?\nB1,The warranty was unclear\nB2,No reviews\n",
        StandardCharsets.UTF_8);
    Project.importInto(
        project,
        ImportRequest.from(new ImportSource.File(other)).wave("Wave 1").get(),
        Progress.NONE);
    assertEquals(List.of("other.csv", "shop.riffle", "shop.riffle.d", "wave.csv"), names());
    try (Project p = Project.openExisting(project)) {
      assertEquals(2, p.summary().answers());
      // Both projects' stamps read "2 answers, no edits": only a fresh folder tells them apart.
      assertEquals(0, p.search("delivery", 10).total(), "not the earlier project's index");
      assertEquals(1, p.search("warranty", 10).total());
    }
  }

  @Test
  void aWorkingFolderOfAProcessThatIsGoneIsRemoved() throws Exception {
    Process gone = new ProcessBuilder("true").start();
    gone.waitFor();
    Path left = dir.resolve("shop.riffle.partial-" + gone.pid());
    Files.createDirectories(left.resolve("shop.riffle.d"));
    Files.writeString(left.resolve("shop.riffle"), "half", StandardCharsets.UTF_8);
    Path alive = dir.resolve("shop.riffle.partial-" + ProcessHandle.current().parent().get().pid());
    Files.createDirectories(alive);
    Project.importInto(dir.resolve("shop.riffle"), request(), Progress.NONE);
    assertFalse(Files.exists(left), "the dead process's folder went");
    assertTrue(Files.exists(alive), "a living process's folder stays");
  }
}
