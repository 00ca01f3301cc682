package riffle.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.Assignment;
import riffle.model.InputException;
import riffle.model.Origin;
import riffle.model.Progress;
import riffle.model.ReviewQueue;

/** Review queues in the project file: schema 6, starting once, the answers ordered, "read". */
class QueueStoreTest {
  @TempDir Path dir;
  Path file;

  @BeforeEach
  void thirtyRespondents() throws Exception {
    file = dir.resolve("p.riffle");
    try (ProjectStore store = ProjectStore.openOrCreate(file)) {
      // Q1: 30 answers, every third carrying an imported code; Q2: 27 answers and 3 non-answers.
      store.store(ProjectStoreTest.batch("Wave 1", 0, 30, ""), Progress.NONE);
    }
  }

  @Test
  void theMigrationNumbersAreTheVersionsTheyWrite() {
    List<String> scripts = Migrations.scripts();
    for (int i = 1; i < scripts.size(); i++) {
      assertTrue(
          Migrations.version(scripts.get(i)) > Migrations.version(scripts.get(i - 1)),
          scripts.toString());
    }
    assertEquals(6, Migrations.version("V6__queue.sql"));
    assertEquals(Migrations.version(scripts.get(scripts.size() - 1)), Migrations.latest());
  }

  @Test
  void aProjectOfSchemaFourGainsTheQueueTable() throws Exception {
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement s = c.createStatement()) {
      s.executeUpdate("DROP TABLE review_queue");
      s.executeUpdate("DROP TABLE answer_read");
      s.executeUpdate("DROP INDEX assignment_by_origin");
      s.executeUpdate("ALTER TABLE question DROP COLUMN name");
      s.executeUpdate("PRAGMA user_version = 4");
    }
    try (ProjectStore store = ProjectStore.openExisting(file)) {
      assertEquals(ProjectStore.latestSchemaVersion(), store.schemaVersion());
      assertEquals(List.of(), store.queues());
      assertEquals("ok", store.integrityCheck());
    }
  }

  @Test
  void aQueueIsStartedOnceAndKeepsItsSeedAndStarter() throws Exception {
    try (ProjectStore store = ProjectStore.openExisting(file)) {
      ProjectStore.QueueStart first =
          store.startQueue("Wave 1", ProjectStoreTest.Q2, "", "", 42, "ana");
      assertTrue(first.created());
      ReviewQueue q = first.queue();
      assertEquals("Wave 1", q.wave());
      assertEquals(ProjectStoreTest.Q2, q.question());
      assertEquals(42, q.seed());
      assertEquals("ana", q.startedBy());
      assertEquals(Optional.empty(), q.segment());
      ProjectStore.QueueStart again =
          store.startQueue("wave 1", ProjectStoreTest.Q2, "", "", 7, "ben");
      assertFalse(again.created());
      assertEquals(q, again.queue());
      assertEquals(
          "start-queue", store.history(1).get(0).action(), "the audit log has the start only");
      assertEquals(
          1, store.history(10).stream().filter(h -> h.action().equals("start-queue")).count());

      ProjectStore.QueueStart mobile =
          store.startQueue("Wave 1", ProjectStoreTest.Q2, "device", " Mobile ", 9, "ana");
      assertTrue(mobile.created());
      assertEquals(Optional.of("device=Mobile"), mobile.queue().segment());
      assertEquals(
          Optional.of(mobile.queue()),
          store.queue("Wave 1", ProjectStoreTest.Q2, "DEVICE", "mobile"),
          "segments match regardless of case");
      assertEquals(2, store.queues().size());
      assertThrows(
          InputException.class,
          () -> store.startQueue("Wave 9", ProjectStoreTest.Q2, "", "", 1, "ana"));
      assertThrows(
          ProjectFileException.class,
          () -> store.startQueue("Wave 1", ProjectStoreTest.Q1, "", "", -1, "ana"),
          "a seed outside 0..2^53-1 is refused by the file itself");
    }
  }

  @Test
  void aQueueOrdersTheSubstantiveAnswersOfItsSegment() throws Exception {
    try (ProjectStore store = ProjectStore.openExisting(file)) {
      List<Long> all = store.queueAnswers("Wave 1", ProjectStoreTest.Q2, "", "");
      assertEquals(27, all.size(), "non-answers are left out");
      List<Long> mobile = store.queueAnswers("Wave 1", ProjectStoreTest.Q2, "Device", "MOBILE ");
      List<Long> desktop = store.queueAnswers("Wave 1", ProjectStoreTest.Q2, "device", "desktop");
      assertEquals(all.size(), mobile.size() + desktop.size());
      assertEquals(12, mobile.size(), "even respondents, less the three non-answers");
      assertEquals(List.of("device"), store.segmentColumns("Wave 1"));
      assertEquals(List.of(), store.queueAnswers("Wave 1", ProjectStoreTest.Q2, "device", "tv"));
    }
  }

  @Test
  void readMeansByHandImportedAcceptedOrTakenOffNeverByRule() throws Exception {
    try (ProjectStore store = ProjectStore.openExisting(file)) {
      List<Long> q1 = store.queueAnswers("Wave 1", ProjectStoreTest.Q1, "", "");
      Set<Long> imported = store.readAnswers("Wave 1", ProjectStoreTest.Q1);
      assertEquals(10, imported.size(), "every third answer came coded elsewhere");
      long code = store.codes().get(0).id();
      List<Long> q2 = store.queueAnswers("Wave 1", ProjectStoreTest.Q2, "", "");
      Instant now = Instant.parse("2026-12-04T10:00:00Z");
      store.edit(
          "ana",
          "test",
          e -> {
            e.putAssignment(
                new Assignment(q2.get(0), code, Optional.empty(), "rule", Origin.RULE, now));
            e.putAssignment(
                new Assignment(q2.get(1), code, Optional.empty(), "ana", Origin.MANUAL, now));
            e.putAssignment(
                new Assignment(q2.get(2), code, Optional.empty(), "ana", Origin.SUGGESTION, now));
            e.putVeto(q2.get(3), code);
            return "test coding";
          });
      assertEquals(
          Set.of(q2.get(1), q2.get(2), q2.get(3)),
          store.readAnswers("Wave 1", ProjectStoreTest.Q2));
      assertTrue(q1.containsAll(imported));
    }
  }
}
