package riffle.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Waiting for another process's write: it is said after a second, and what the other process is
 * making is waited for, never taken for damage.
 */
class WaitsTest {
  @TempDir Path dir;

  final List<String> said = new CopyOnWriteArrayList<>();
  Consumer<String> before;

  @BeforeEach
  void listen() {
    before = Waits.announceTo(said::add);
  }

  @AfterEach
  void stopListening() {
    Waits.announceTo(before);
  }

  @Test
  void aWriterThatWaitsForAnotherSaysSoAfterASecondAndThenWrites() throws Exception {
    Path project = dir.resolve("shop.riffle");
    ProjectStore.openOrCreate(project).close();
    try (Connection other = DriverManager.getConnection("jdbc:sqlite:" + project);
        Statement s = other.createStatement();
        ProjectStore store = ProjectStore.openExisting(project)) {
      s.execute("PRAGMA busy_timeout = 5000");
      s.executeUpdate("BEGIN IMMEDIATE");
      CompletableFuture<Void> write =
          CompletableFuture.runAsync(
              () -> {
                try {
                  store.storeAnalyses(List.of(), "v");
                } catch (ProjectFileException e) {
                  throw new IllegalStateException(e);
                }
              });
      Thread.sleep(400);
      assertEquals(List.of(), said, "a short wait goes unsaid");
      Thread.sleep(1_000);
      assertEquals(
          List.of("waiting for another Riffle process to finish writing shop.riffle …"), said);
      s.executeUpdate("COMMIT");
      write.get(10, TimeUnit.SECONDS);
      assertEquals(1, said.size(), "said once per wait");
    }
  }

  @Test
  void aCacheAnotherProcessIsMakingIsWaitedForNotWiped() throws Exception {
    Path project = dir.resolve("shop.riffle");
    Path db = AnalysisCache.derivedFolder(project).resolve("analysis.db");
    java.nio.file.Files.createDirectories(db.getParent());
    try (Connection other = DriverManager.getConnection("jdbc:sqlite:" + db);
        Statement s = other.createStatement()) {
      s.execute("PRAGMA journal_mode = WAL");
      s.executeUpdate("BEGIN IMMEDIATE");
      s.executeUpdate(
          "CREATE TABLE analysis (answer_id INTEGER PRIMARY KEY, version TEXT NOT NULL,"
              + " data BLOB NOT NULL)");
      s.executeUpdate("INSERT INTO analysis VALUES (1, 'v', x'00')");
      s.executeUpdate("PRAGMA application_id = " + AnalysisCache.APPLICATION_ID);
      CompletableFuture<Integer> opened =
          CompletableFuture.supplyAsync(
              () -> {
                try (AnalysisCache cache = AnalysisCache.open(project)) {
                  return cache.count("v");
                } catch (ProjectFileException e) {
                  throw new IllegalStateException(e);
                }
              });
      Thread.sleep(300);
      s.executeUpdate("COMMIT");
      assertEquals(1, opened.get(20, TimeUnit.SECONDS), "the other process's entry is kept");
    }
    assertTrue(said.isEmpty(), said.toString());
  }
}
