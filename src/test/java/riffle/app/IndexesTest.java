package riffle.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.index.AnswerIndex;
import riffle.model.CodeDraft;
import riffle.model.Progress;
import riffle.store.ProjectFileException;
import riffle.store.ProjectStore;

/**
 * The index in step with a project that several processes change: each catches up from the newest
 * commit, whoever wrote it, and one that cannot get the index's lock says so and gives up cleanly.
 */
class IndexesTest {
  @TempDir Path dir;

  Path project() throws Exception {
    Path file = dir.resolve("wave.csv");
    Files.writeString(
        file,
        "id,What almost stopped you from ordering?\n"
            + "A1,The delivery date was not shown anywhere\n"
            + "A2,Shipping was expensive for a small order\n"
            + "A3,I could not find the delivery date before paying\n",
        StandardCharsets.UTF_8);
    Path project = dir.resolve("shop.riffle");
    Project.importInto(
        project, ImportRequest.from(new ImportSource.File(file)).wave("W1").get(), Progress.NONE);
    return project;
  }

  @Test
  void twoProjectsOnOneFileSeeEachOthersCodingAndImports() throws Exception {
    Path project = project();
    try (Project a = Project.openExisting(project);
        Project b = Project.openExisting(project)) {
      assertEquals(2, a.search("delivery", 10).total());
      assertEquals(2, b.search("delivery", 10).total());
      long late = a.codebook().create("ana", CodeDraft.named("late")).id();
      a.coding().assign("ana", a.answerIds().get(1), late, Optional.empty());
      assertEquals(1, b.search("code:late", 10).total(), "b catches up with a's coding");
      assertEquals(1, a.search("code:late", 10).total(), "and a reads b's commit");
      Path more = dir.resolve("more.csv");
      Files.writeString(
          more,
          "id,What almost stopped you from ordering?\nB1,No delivery date shown\n",
          StandardCharsets.UTF_8);
      b.importWave(ImportRequest.from(new ImportSource.File(more)).wave("W2").get(), Progress.NONE);
      assertEquals(3, a.search("delivery", 10).total(), "a sees b's new wave");
      b.coding().undo("ana");
      assertEquals(0, a.search("code:late", 10).total(), "and b's undo of a's edit");
    }
  }

  @Test
  void aProcessThatCannotGetTheIndexSaysSoAndGivesUpChangingNothing() throws Exception {
    Path project = project();
    List<String> said = new CopyOnWriteArrayList<>();
    Consumer<String> before = Project.announceWaitsTo(said::add);
    try (ProjectStore store = ProjectStore.openExisting(project);
        AnswerIndex mine = AnswerIndex.open(Indexes.folder(project));
        AnswerIndex other = AnswerIndex.open(Indexes.folder(project))) {
      AnswerIndex.Writer held = other.tryWrite().orElseThrow();
      ProjectFileException e;
      try {
        e = assertThrows(ProjectFileException.class, () -> Indexes.catchUp(store, mine, 1_500));
      } finally {
        held.close();
      }
      assertEquals(
          "another Riffle process has been updating the search index of "
              + project
              + " for over 1 s; try again when it has finished (nothing was changed)",
          e.getMessage());
      assertEquals(
          List.of(
              "waiting for another Riffle process to finish updating the search index of"
                  + " shop.riffle …"),
          said);
      assertEquals(Optional.empty(), mine.stamp(), "nothing was written");
      Indexes.catchUp(store, mine, 1_500);
      assertEquals(Optional.of(Indexes.stamp(store)), mine.stamp());
      assertEquals(3, mine.size());
    } finally {
      Project.announceWaitsTo(before);
    }
  }
}
