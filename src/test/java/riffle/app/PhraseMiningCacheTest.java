package riffle.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.Progress;
import riffle.store.AnalysisCache;
import riffle.text.AnalysisCodec;
import riffle.tools.SampleResponses;
import riffle.tools.SampleResponses.GeneratedRespondent;
import riffle.tools.SampleResponses.GeneratedWave;

/**
 * Phrases read the parses of only the answers asked for from the derived cache, and entries that
 * are missing, damaged or written by an older analysis are analysed again, giving the same phrases.
 */
class PhraseMiningCacheTest {
  @TempDir Path dir;

  private Path project;
  private GeneratedWave wave;

  @BeforeEach
  void importAWave() throws Exception {
    wave = SampleResponses.generateWave(SampleResponses.WAVE_1, 160, 7L);
    Path file = dir.resolve("wave.csv");
    SampleResponses.writeWave(wave, file);
    project = dir.resolve("shop.riffle");
    Project.importInto(
        project,
        ImportRequest.from(new ImportSource.File(file)).wave("Wave 1").get(),
        Progress.NONE);
  }

  private PhraseFindings phrases(Map<String, String> segments) throws Exception {
    try (Project p = Project.openExisting(project)) {
      return p.phrases(
          new PhraseQuery(Optional.of("wave 1"), Optional.of("1"), segments, Optional.empty(), 30));
    }
  }

  private void damage(String sql) throws Exception {
    Path db = AnalysisCache.derivedFolder(project).resolve("analysis.db");
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db);
        Statement s = c.createStatement()) {
      s.executeUpdate(sql);
    }
  }

  @Test
  void missingDamagedAndStaleEntriesAreAnalysedAgainWithTheSamePhrases() throws Exception {
    PhraseFindings before = phrases(Map.of());
    assertFalse(before.phrases().isEmpty());
    damage("DELETE FROM analysis WHERE answer_id % 7 = 0");
    damage("UPDATE analysis SET data = x'01ffff' WHERE answer_id % 7 = 1");
    damage("UPDATE analysis SET version = 'text-0' WHERE answer_id % 7 = 2");
    damage("DELETE FROM result"); // the phrases kept from the first mining
    assertEquals(before, phrases(Map.of()));
    try (AnalysisCache cache = AnalysisCache.open(project)) {
      long stopped = wave.respondents().stream().filter(r -> !r.stopped().nonAnswer()).count();
      // every answer of the question mined has a current entry again; the other question's
      // damaged entries wait until something reads them
      assertEquals(true, cache.count(AnalysisCodec.VERSION) >= stopped);
    }
    assertEquals(before, phrases(Map.of()));
  }

  @Test
  void aSegmentFilterMinesOnlyThatSegment() throws Exception {
    int mobile = 0;
    for (GeneratedRespondent r : wave.respondents()) {
      mobile += r.device().equals("mobile") && !r.stopped().nonAnswer() ? 1 : 0;
    }
    assertEquals(mobile, phrases(Map.of("device", "mobile")).answers());
    assertEquals(0, phrases(Map.of("device", "fridge")).answers());
  }
}
