package riffle.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.Analysis;
import riffle.model.AnswerRead;
import riffle.model.BatchOutcome;
import riffle.model.NewAnswer;
import riffle.model.NewRespondent;
import riffle.model.Progress;
import riffle.model.ProjectSummary;
import riffle.model.WaveBatch;

class ProjectStoreTest {
  static final String Q1 = "What almost stopped you from ordering?";
  static final String Q2 = "What made you choose us?";

  @TempDir Path dir;

  static Analysis plain(String text) {
    return new Analysis("eng", false, text, List.of(), List.of(), false);
  }

  static WaveBatch batch(String wave, int from, int count, String suffix) {
    List<NewRespondent> respondents = new ArrayList<>();
    for (int i = from; i < from + count; i++) {
      respondents.add(
          new NewRespondent(
              "R" + i,
              i + 1,
              "2026-03-0" + (1 + i % 9),
              Map.of("device", i % 2 == 0 ? "mobile" : "desktop"),
              List.of(
                  new NewAnswer(
                      Q1,
                      "no delivery date shown " + i + suffix,
                      "x",
                      true,
                      i + 1,
                      2,
                      i % 3 == 0 ? List.of("Delivery date unclear") : List.of(),
                      "mk",
                      plain("x")),
                  new NewAnswer(
                      Q2,
                      i % 10 == 0 ? "n/a" : "good value " + i,
                      "y",
                      i % 10 != 0,
                      i + 1,
                      3,
                      List.of(),
                      "mk",
                      plain("x")))));
    }
    return new WaveBatch(
        wave,
        LocalDate.of(2026, 3, 15),
        "wave.csv",
        "00",
        "UTF-8",
        "comma",
        count,
        0,
        List.of(Q1, Q2),
        Map.of(),
        respondents,
        "tester",
        "test");
  }

  @Test
  void newProjectIsAtLatestSchemaWithWalAndForeignKeys() throws Exception {
    try (ProjectStore store = ProjectStore.openOrCreate(dir.resolve("p.riffle"))) {
      assertEquals(ProjectStore.latestSchemaVersion(), store.schemaVersion());
      assertEquals("wal", store.read(c -> pragmaText(c, "journal_mode")));
      int foreignKeys = store.read(c -> ProjectStore.pragmaInt(c, "foreign_keys"));
      assertEquals(1, foreignKeys);
      int applicationId = store.read(c -> ProjectStore.pragmaInt(c, "application_id"));
      assertEquals(ProjectStore.APPLICATION_ID, applicationId);
      assertEquals("ok", store.integrityCheck());
    }
  }

  private static String pragmaText(Connection c, String pragma) throws java.sql.SQLException {
    try (Statement s = c.createStatement();
        var rs = s.executeQuery("PRAGMA " + pragma)) {
      return rs.next() ? rs.getString(1) : "";
    }
  }

  @Test
  void storesAWaveAndCountsIt() throws Exception {
    try (ProjectStore store = ProjectStore.openOrCreate(dir.resolve("p.riffle"))) {
      BatchOutcome out = store.store(batch("Wave 1", 0, 30, ""), Progress.NONE);
      assertEquals(30, out.respondentsAdded());
      assertEquals(60, out.answersAdded());
      assertEquals(1, out.codesCreated());
      assertEquals(10, out.assignmentsAdded());
      ProjectSummary s = store.summary();
      assertEquals(1, s.waves().size());
      assertEquals("Wave 1", s.waves().get(0).name());
      assertEquals(60, s.answers());
      assertEquals(57, s.substantive(), "the three n/a answers stay out of the base");
      assertEquals(List.of(Q1, Q2), s.questions());
      assertEquals(1, s.codes());
      assertEquals(10, s.assignments());
    }
  }

  @Test
  void storingTheSameRowsAgainAddsNothing() throws Exception {
    try (ProjectStore store = ProjectStore.openOrCreate(dir.resolve("p.riffle"))) {
      store.store(batch("Wave 1", 0, 20, ""), Progress.NONE);
      BatchOutcome again = store.store(batch("Wave 1", 0, 20, ""), Progress.NONE);
      assertEquals(0, again.answersAdded());
      assertEquals(0, again.respondentsAdded());
      assertEquals(20, again.duplicateRows());
      assertEquals(0, again.assignmentsAdded());
      assertTrue(again.problems().isEmpty());
      assertEquals(40, store.summary().answers());
    }
  }

  @Test
  void aChangedAnswerForAStoredRespondentIsKeptAsStoredAndReported() throws Exception {
    try (ProjectStore store = ProjectStore.openOrCreate(dir.resolve("p.riffle"))) {
      store.store(batch("Wave 1", 0, 5, ""), Progress.NONE);
      BatchOutcome changed = store.store(batch("Wave 1", 0, 5, " (edited)"), Progress.NONE);
      assertEquals(0, changed.answersAdded());
      assertEquals(5, changed.problems().size());
      assertTrue(changed.problems().get(0).message().contains("already has a different answer"));
      assertEquals(2, changed.problems().get(0).column());
    }
  }

  @Test
  void sameRespondentIdInAnotherWaveIsAnotherRespondent() throws Exception {
    try (ProjectStore store = ProjectStore.openOrCreate(dir.resolve("p.riffle"))) {
      store.store(batch("Wave 1", 0, 5, ""), Progress.NONE);
      BatchOutcome w2 = store.store(batch("Wave 2", 0, 5, ""), Progress.NONE);
      assertEquals(10, w2.answersAdded());
      assertEquals(
          List.of("Wave 1", "Wave 2"),
          store.summary().waves().stream().map(w -> w.name()).toList());
    }
  }

  @Test
  void aFailureHalfwayLeavesNothingBehind() throws Exception {
    Path file = dir.resolve("p.riffle");
    try (ProjectStore store = ProjectStore.openOrCreate(file)) {
      store.store(batch("Wave 1", 0, 5, ""), Progress.NONE);
      WaveBatch good = batch("Wave 2", 0, 50, "");
      List<NewRespondent> rows = new ArrayList<>(good.respondents());
      // The last row answers a question the batch does not declare: storing it fails.
      rows.add(
          new NewRespondent(
              "R999",
              99,
              "",
              Map.of(),
              List.of(
                  new NewAnswer(
                      "Undeclared question",
                      "text",
                      "text",
                      true,
                      99,
                      2,
                      List.of(),
                      "mk",
                      plain("x")))));
      WaveBatch broken =
          new WaveBatch(
              "Wave 2",
              good.fieldedOn(),
              "w.csv",
              "00",
              "UTF-8",
              "comma",
              51,
              0,
              good.questions(),
              good.questionNames(),
              rows,
              "tester",
              "test");
      assertThrows(RuntimeException.class, () -> store.store(broken, Progress.NONE));
      ProjectSummary s = store.summary();
      assertEquals(1, s.waves().size(), "the failed wave was not created");
      assertEquals(10, s.answers());
      assertEquals("ok", store.integrityCheck());
    }
  }

  @Test
  void refusesAProjectFromANewerSchemaAndLeavesItUnchanged() throws Exception {
    Path file = dir.resolve("future.riffle");
    try (ProjectStore store = ProjectStore.openOrCreate(file)) {
      store.store(batch("Wave 1", 0, 3, ""), Progress.NONE);
    }
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement s = c.createStatement()) {
      s.executeUpdate("PRAGMA user_version = " + (ProjectStore.latestSchemaVersion() + 7));
    }
    byte[] before = Files.readAllBytes(file);
    ProjectFileException e =
        assertThrows(ProjectFileException.class, () -> ProjectStore.openExisting(file));
    assertTrue(e.getMessage().contains("newer Riffle"), e.getMessage());
    assertTrue(e.getMessage().contains("schema " + (ProjectStore.latestSchemaVersion() + 7)));
    assertArrayEquals(before, Files.readAllBytes(file));
  }

  @Test
  void refusesAnotherProgramsDatabase() throws Exception {
    Path file = dir.resolve("other.db");
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement s = c.createStatement()) {
      s.executeUpdate("CREATE TABLE recipes (name TEXT)");
    }
    ProjectFileException e =
        assertThrows(ProjectFileException.class, () -> ProjectStore.openExisting(file));
    assertTrue(e.getMessage().contains("not a Riffle project"), e.getMessage());
  }

  @Test
  void refusesAFileThatIsNotADatabase() throws Exception {
    Path file = dir.resolve("notes.riffle");
    Files.writeString(file, "id,answer\n1,too expensive\n".repeat(100), StandardCharsets.UTF_8);
    byte[] before = Files.readAllBytes(file);
    ProjectFileException e =
        assertThrows(ProjectFileException.class, () -> ProjectStore.openExisting(file));
    assertTrue(e.getMessage().contains("not a Riffle project"), e.getMessage());
    assertArrayEquals(before, Files.readAllBytes(file));
  }

  @Test
  void refusesAMissingProjectWhenOneIsExpected() {
    ProjectFileException e =
        assertThrows(
            ProjectFileException.class,
            () -> ProjectStore.openExisting(dir.resolve("nope.riffle")));
    assertTrue(e.getMessage().contains("riffle import --project"), e.getMessage());
    assertFalse(Files.exists(dir.resolve("nope.riffle")));
  }

  @Test
  void twoWritersOnOneFileAreSerialisedWithoutLoss() throws Exception {
    Path file = dir.resolve("shared.riffle");
    ProjectStore.openOrCreate(file).close();
    ExecutorService pool = Executors.newFixedThreadPool(2);
    try {
      List<Future<BatchOutcome>> results = new ArrayList<>();
      for (int w = 0; w < 2; w++) {
        int wave = w;
        results.add(
            pool.submit(
                () -> {
                  BatchOutcome last = null;
                  try (ProjectStore store = ProjectStore.openExisting(file)) {
                    for (int round = 0; round < 5; round++) {
                      last =
                          store.store(batch("Wave " + wave, round * 200, 200, ""), Progress.NONE);
                    }
                  }
                  return last;
                }));
      }
      for (Future<BatchOutcome> f : results) {
        assertEquals(400, f.get().answersAdded());
      }
    } finally {
      pool.shutdown();
    }
    try (ProjectStore store = ProjectStore.openExisting(file)) {
      assertEquals(2 * 5 * 200 * 2, store.summary().answers());
      assertEquals("ok", store.integrityCheck());
    }
  }

  @Test
  void migrationScriptsSplitIntoStatementsIgnoringComments() {
    assertEquals(
        List.of("CREATE TABLE a (x INTEGER)", "CREATE INDEX i ON a(x)"),
        Migrations.statements(
            "-- one; two\nCREATE TABLE a (x INTEGER); -- a; b\n" + "CREATE INDEX i ON a(x);\n"));
  }

  @Test
  void aSchemaFourProjectGainsTheReadMarkAndKeepsItsCoding() throws Exception {
    Path file = dir.resolve("old.riffle");
    try (ProjectStore store = ProjectStore.openOrCreate(file)) {
      store.store(batch("Wave 1", 0, 6, ""), Progress.NONE);
    }
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement s = c.createStatement()) {
      s.executeUpdate("DROP TABLE answer_read");
      s.executeUpdate("DROP INDEX assignment_by_origin");
      s.executeUpdate("DROP TABLE review_queue");
      s.executeUpdate("ALTER TABLE question DROP COLUMN name");
      s.executeUpdate("PRAGMA user_version = 4");
    }
    try (ProjectStore store = ProjectStore.openExisting(file)) {
      assertEquals(ProjectStore.latestSchemaVersion(), store.schemaVersion());
      assertEquals("ok", store.integrityCheck());
      // R0 and R3 carry an imported code: read by the coder of the export.
      Map<Long, AnswerRead> reads = store.reads();
      assertEquals(2, reads.size(), reads.toString());
      reads.values().forEach(r -> assertEquals(List.of("mk"), r.readers()));
      assertEquals(2, store.readAnswerIds().length);
    }
  }

  @Test
  void answersOfACodedColumnWithoutACodeAreReadToo() throws Exception {
    Analysis a = plain("x");
    List<NewRespondent> respondents = new ArrayList<>();
    for (int i = 0; i < 3; i++) {
      respondents.add(
          new NewRespondent(
              "C" + i,
              i + 2,
              "",
              Map.of(),
              List.of(
                  new NewAnswer(
                      Q1,
                      "answer " + i,
                      "answer " + i,
                      true,
                      i + 2,
                      2,
                      i == 0 ? List.of("Price") : List.of(),
                      "Ines",
                      a,
                      true),
                  new NewAnswer(
                      Q2, "other " + i, "other " + i, true, i + 2, 3, List.of(), "", a))));
    }
    WaveBatch coded =
        new WaveBatch(
            "Coded",
            LocalDate.of(2026, 3, 1),
            "c.csv",
            "00",
            "UTF-8",
            "comma",
            3,
            0,
            List.of(Q1, Q2),
            Map.of(),
            respondents,
            "tester",
            "test");
    try (ProjectStore store = ProjectStore.openOrCreate(dir.resolve("p.riffle"))) {
      store.store(coded, Progress.NONE);
      Map<Long, AnswerRead> reads = store.reads();
      assertEquals(3, reads.size(), "the coded column's three answers, not the other question's");
      assertEquals(1, reads.values().stream().filter(r -> !r.marked()).count());
      reads.values().forEach(r -> assertEquals(List.of("Ines"), r.readers()));
      assertThrows(
          IllegalArgumentException.class,
          () -> new NewAnswer(Q1, "x", "x", true, 1, 1, List.of("Price"), "Ines", a, false));
    }
  }
}
