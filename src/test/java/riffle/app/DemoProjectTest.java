package riffle.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.Progress;
import riffle.model.WaveSummary;

class DemoProjectTest {
  @TempDir Path dir;

  @Test
  void buildsEveryBundledWaveThenReusesTheProject() throws Exception {
    DemoProject.Result first = DemoProject.prepare(dir, Progress.NONE);
    assertFalse(first.reused());
    List<DemoProject.Entry> manifest = DemoProject.manifest();
    assertEquals(manifest.size(), first.imports().size());
    assertEquals(
        manifest.stream().map(DemoProject.Entry::wave).toList(),
        first.summary().waves().stream().map(WaveSummary::name).toList());
    for (ImportReport r : first.imports()) {
      assertEquals(0, r.skipped(), r.source() + " " + r.problems());
      assertEquals(2 * r.rows(), r.answers(), "two questions per respondent in " + r.source());
    }
    for (WaveSummary w : first.summary().waves()) {
      assertTrue(w.substantive() < w.answers(), "non-answers are marked in " + w.name());
      assertTrue(w.substantive() > 0.85 * w.answers(), "most answers count in " + w.name());
    }
    assertTrue(first.summary().assignments() > 1000, "the pilot wave arrives coded");
    assertEquals(2, first.summary().questions().size());

    DemoProject.Result second = DemoProject.prepare(dir, Progress.NONE);
    assertTrue(second.reused());
    assertEquals(first.summary(), second.summary());
  }

  @Test
  void rebuildsWhenTheProjectWasBuiltFromOtherFiles() throws Exception {
    DemoProject.prepare(dir, Progress.NONE);
    Files.writeString(dir.resolve(DemoProject.FINGERPRINT), "stale\n", StandardCharsets.UTF_8);
    DemoProject.Result again = DemoProject.prepare(dir, Progress.NONE);
    assertFalse(again.reused());
    assertEquals(DemoProject.manifest().size(), again.summary().waves().size());
    try (var left = Files.list(dir)) {
      assertEquals(
          List.of(),
          left.map(f -> f.getFileName().toString())
              .filter(n -> n.startsWith(DemoProject.PROJECT + ".partial"))
              .toList(),
          "no working folder is left behind");
    }
  }
}
