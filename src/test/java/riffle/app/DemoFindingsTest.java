package riffle.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.Direction;
import riffle.model.Findings;
import riffle.model.Progress;
import riffle.model.QuestionFindings;
import riffle.model.WaveChange;
import riffle.store.ProjectStore;
import riffle.tools.SampleResponses;
import riffle.tools.SampleResponses.GeneratedRespondent;
import riffle.tools.SampleResponses.GeneratedWave;
import riffle.tools.SampleResponses.Question;
import riffle.tools.SampleResponses.Theme;

/**
 * The demo waves coded with the generator's ground truth: the planted fall of the friction themes
 * tied to the site change (wave 2 to wave 3) is reported as a fall, and the themes planted flat are
 * not reported as rising or falling.
 */
class DemoFindingsTest {
  @TempDir Path dir;

  static final Set<String> SITE_CHANGE =
      Set.of(SampleResponses.DELIVERY_DATE_UNCLEAR.code(), SampleResponses.WARRANTY_DOUBTS.code());

  @Test
  void theSiteChangeFallIsReportedAndFlatThemesAreNot() throws Exception {
    Path file = dir.resolve("demo.riffle");
    List<GeneratedWave> waves = SampleResponses.demoWaves();
    for (int w = SampleResponses.WAVE_1; w <= SampleResponses.WAVE_3; w++) {
      Project.importInto(
          file,
          ImportRequest.from(
                  new ImportSource.File(
                      Path.of("sample-responses", SampleResponses.WAVE_FILES.get(w))))
              .wave(SampleResponses.WAVE_NAMES.get(w))
              .get(),
          Progress.NONE);
    }
    Map<String, Long> answerOf = new HashMap<>();
    try (ProjectStore store = ProjectStore.openExisting(file)) {
      for (ProjectStore.AnswerRow r :
          store.answerRows(List.of(), Optional.of(SampleResponses.STOPPED_QUESTION))) {
        answerOf.put(r.wave() + "|" + r.respondent(), r.id());
      }
    }
    try (Project p = Project.openExisting(file)) {
      Map<String, Code> codes = new HashMap<>();
      for (Theme t : SampleResponses.themes(Question.STOPPED)) {
        codes.put(
            t.code(),
            p.codebook()
                .create(
                    "truth",
                    CodeDraft.named(t.code()).toBuilder().direction(Direction.FRICTION).build()));
      }
      for (int w = SampleResponses.WAVE_1; w <= SampleResponses.WAVE_3; w++) {
        GeneratedWave wave = waves.get(w);
        for (GeneratedRespondent r : wave.respondents()) {
          Long answer = answerOf.get(wave.name() + "|" + r.id());
          for (String theme : r.stopped().themes()) {
            if (answer != null && codes.containsKey(theme)) {
              p.coding().assign("truth", answer, codes.get(theme).id(), Optional.empty());
            }
          }
        }
      }
      Findings findings =
          p.reporting()
              .findings(
                  new FindingsQuery(
                      Optional.of("1"), Optional.empty(), Optional.empty(), Optional.empty()));
      QuestionFindings q = findings.questions().get(0);
      int checked = 0;
      for (WaveChange c : q.changes()) {
        if (!c.from().equals("Wave 2") || !c.to().equals("Wave 3")) {
          continue;
        }
        checked++;
        if (SITE_CHANGE.contains(c.code())) {
          assertEquals(WaveChange.FELL, c.verdict(), c.toString());
          assertTrue(c.ci().upper() < 0, c.toString());
        } else {
          assertTrue(
              !c.verdict().equals(WaveChange.FELL) && !c.verdict().equals(WaveChange.ROSE),
              "a theme planted flat is not reported as changed: " + c);
        }
      }
      assertTrue(checked >= 5, "every friction theme was compared: " + checked);
    }
  }
}
