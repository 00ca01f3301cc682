package riffle.web;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.app.Project;
import riffle.model.CodeDraft;
import riffle.model.Progress;

/**
 * The segment fixture wave read by a person: every substantive answer but two of desktop's, those
 * that mention delivery coded "Delivery" (18 of mobile's 35, 1 of desktop's 8), and the four
 * without a device coded "Delivery" too (4 of 4: the highest share, on a small base).
 */
final class SegmentProject {
  private SegmentProject() {}

  static Path build(Path folder) throws Exception {
    Path csv = WebServerTest.fixture("segment-wave.csv");
    Path project = folder.resolve("segments.riffle");
    Project.importInto(
        project,
        ImportRequest.from(new ImportSource.File(csv))
            .wave("Wave 1")
            .textColumn("What almost stopped you from ordering?")
            .metaColumn("device")
            .get(),
        Progress.NONE);
    List<String> lines = Files.readAllLines(csv, StandardCharsets.UTF_8);
    try (Project p = Project.openExisting(project)) {
      long code = p.codebook().create("setup", CodeDraft.named("Delivery")).id();
      List<Long> ids = p.answerIds();
      for (int i = 0; i < ids.size(); i++) {
        String line = lines.get(i + 1);
        boolean nonAnswer = line.endsWith(",nothing");
        boolean unreadDesktop = line.contains(",desktop,") && i >= 44;
        if (nonAnswer || unreadDesktop) {
          continue;
        }
        // The four without a device all get the code: a share of 100% on a base of 4.
        if (line.toLowerCase(Locale.ROOT).contains("deliver") || i >= 46) {
          p.coding().assign("setup", ids.get(i), code, Optional.empty());
        } else {
          p.coding().markRead("setup", ids.get(i));
        }
      }
    }
    return project;
  }
}
