package riffle.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.Analysis;
import riffle.model.InputException;
import riffle.model.Progress;
import riffle.store.AnalysisCache;
import riffle.store.ProjectStore;
import riffle.text.AnalysisCodec;

/** Import stores an analysis for every answer; the derived cache can be lost without loss. */
class AnalysisStorageTest {
  @TempDir Path dir;

  static final String EXPORT =
      "id,device,What almost stopped you from ordering?\n"
          + "A1,mobile,\"The delivery date was NOT shown, so I almost left\"\n"
          + "A2,desktop,wasnt sure a refurbished grinder would last\n"
          + "A3,mobile,n/a\n"
          + "A4,desktop,\"Shipping was pricey. But the warranty helped!\"\n"
          + "A5,mobile,\"wasnt sure, email me at anna.k@example.com or call 07700 900123\"\n";

  Path project() {
    return dir.resolve("shop.riffle");
  }

  void importExport() throws Exception {
    Path file = dir.resolve("wave.csv");
    Files.writeString(file, EXPORT, StandardCharsets.UTF_8);
    Project.importInto(
        project(), ImportRequest.from(new ImportSource.File(file)).wave("W1").get(), Progress.NONE);
  }

  List<Analysis> analyses() throws InputException {
    List<Analysis> out = new ArrayList<>();
    try (Project p = Project.openExisting(project())) {
      for (long id : p.answerIds()) {
        out.add(p.analysis(id).orElseThrow());
      }
    }
    return out;
  }

  @Test
  void everyImportedAnswerHasItsAnalysisStored() throws Exception {
    importExport();
    try (AnalysisCache cache = AnalysisCache.open(project())) {
      assertEquals(5, cache.count(AnalysisCodec.VERSION));
    }
    List<Analysis> all = analyses();
    assertEquals(5, all.size());
    Analysis first = all.get(0);
    assertEquals("eng", first.language());
    assertEquals(1, first.sentences().size());
    assertTrue(
        first.sentences().get(0).tokens().stream()
            .anyMatch(t -> t.text().equals("shown") && t.negated()),
        "negation reaches 'shown'");
    assertEquals(2, all.get(3).sentences().size());
  }

  @Test
  void personalDataIsMaskedInTheProjectFileAndInEveryToken() throws Exception {
    importExport();
    Analysis pii = analyses().get(4);
    assertEquals("wasnt sure, email me at [email] or call [phone]", pii.masked());
    assertEquals(2, pii.pii().size());
    assertTrue(
        pii.sentences().stream()
            .flatMap(s -> s.tokens().stream())
            .anyMatch(t -> t.text().equals("[email]")),
        "a placeholder is one token");
    for (var s : pii.sentences()) {
      for (var t : s.tokens()) {
        assertFalse(t.text().contains("example.com") || t.text().contains("900123"));
      }
    }
  }

  @Test
  void losingTheDerivedFolderLosesNothing() throws Exception {
    importExport();
    List<Analysis> before = analyses();
    try (Stream<Path> files = Files.walk(AnalysisCache.derivedFolder(project()))) {
      for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
        Files.delete(p);
      }
    }
    assertEquals(before, analyses());
    try (AnalysisCache cache = AnalysisCache.open(project())) {
      assertEquals(5, cache.count(AnalysisCodec.VERSION), "rebuilt while reading");
    }
  }

  @Test
  void aDamagedCacheIsRebuilt() throws Exception {
    importExport();
    List<Analysis> before = analyses();
    Path db = AnalysisCache.derivedFolder(project()).resolve("analysis.db");
    for (String suffix : List.of("-wal", "-shm")) {
      Files.deleteIfExists(db.resolveSibling("analysis.db" + suffix));
    }
    Files.writeString(db, "not a database at all ".repeat(300), StandardCharsets.UTF_8);
    assertEquals(before, analyses());
  }

  @Test
  void answersFromAnOlderAnalysisAreAnalysedAgainOnTheNextImport() throws Exception {
    importExport();
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + project());
        Statement s = c.createStatement()) {
      s.executeUpdate("UPDATE answer SET masked = NULL, analysed_with = NULL");
    }
    importExport();
    try (ProjectStore store = ProjectStore.openExisting(project())) {
      assertEquals(List.of(), store.staleAnalyses(AnalysisCodec.VERSION));
      for (long id : store.answerIds()) {
        assertFalse(store.storedAnalysis(id).orElseThrow().masked() == null);
      }
    }
  }
}
