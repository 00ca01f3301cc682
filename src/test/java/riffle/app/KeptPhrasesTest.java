package riffle.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.Progress;
import riffle.store.AnalysisCache;
import riffle.tools.SampleResponses;

/**
 * A command that asks for the same phrases of an unchanged project reads what the last one mined
 * (the cold `phrases` of a large project then takes the time of reading, not of mining), and any
 * change to the project, or a kept result that cannot be read, makes the phrases mined afresh.
 */
class KeptPhrasesTest {
  @TempDir Path dir;

  private Path project;

  @BeforeEach
  void importAWave() throws Exception {
    project = dir.resolve("shop.riffle");
    importWave(SampleResponses.WAVE_1, "Wave 1");
  }

  private void importWave(int index, String name) throws Exception {
    Path file = dir.resolve(name + ".csv");
    SampleResponses.writeWave(SampleResponses.generateWave(index, 160, 7L + index), file);
    Project.importInto(
        project, ImportRequest.from(new ImportSource.File(file)).wave(name).get(), Progress.NONE);
  }

  private PhraseFindings phrases(Optional<String> wave, Optional<String> against) throws Exception {
    try (Project p = Project.openExisting(project)) {
      return p.phrases(new PhraseQuery(wave, Optional.of("1"), Map.of(), against, 30));
    }
  }

  private int sql(String update) throws Exception {
    Path db = AnalysisCache.derivedFolder(project).resolve("analysis.db");
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db);
        Statement s = c.createStatement()) {
      if (update.startsWith("SELECT")) {
        try (ResultSet rs = s.executeQuery(update)) {
          rs.next();
          return rs.getInt(1);
        }
      }
      return s.executeUpdate(update);
    }
  }

  @Test
  void theSameQueryOfAnUnchangedProjectReadsTheKeptPhrases() throws Exception {
    PhraseFindings mined = phrases(Optional.empty(), Optional.empty());
    assertFalse(mined.phrases().isEmpty());
    assertEquals(1, sql("SELECT count(*) FROM result"));
    // With every parse gone, phrases could only be mined again by analysing every answer again.
    sql("DELETE FROM analysis");
    assertEquals(mined, phrases(Optional.empty(), Optional.empty()));
    assertEquals(0, sql("SELECT count(*) FROM analysis"));
  }

  @Test
  void aChangedProjectIsMinedAfresh() throws Exception {
    PhraseFindings one = phrases(Optional.empty(), Optional.empty());
    importWave(SampleResponses.WAVE_2, "Wave 2");
    PhraseFindings two = phrases(Optional.empty(), Optional.empty());
    assertTrue(two.answers() > one.answers(), one.answers() + " then " + two.answers());
    // The result from before the import is gone with the state it was made from.
    assertEquals(1, sql("SELECT count(*) FROM result"));
  }

  @Test
  void aComparisonReadBackEqualsTheOneMined() throws Exception {
    importWave(SampleResponses.WAVE_2, "Wave 2");
    PhraseFindings mined = phrases(Optional.of("Wave 2"), Optional.of("Wave 1"));
    assertFalse(mined.keyness().isEmpty());
    assertEquals(mined, phrases(Optional.of("Wave 2"), Optional.of("Wave 1")));
    assertEquals(1, sql("SELECT count(*) FROM result"));
  }

  @Test
  void aKeptResultThatCannotBeReadIsMinedAgain() throws Exception {
    PhraseFindings mined = phrases(Optional.empty(), Optional.empty());
    assertEquals(1, sql("UPDATE result SET data = x'7b2270'"));
    assertEquals(mined, phrases(Optional.empty(), Optional.empty()));
  }
}
