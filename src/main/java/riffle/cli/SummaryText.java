package riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import riffle.model.ProjectSummary;
import riffle.model.WaveSummary;

/** Prints a project summary for people. */
final class SummaryText {
  private SummaryText() {}

  static void print(PrintWriter out, Path project, ProjectSummary s) {
    out.printf(Locale.ROOT, "Project %s%n", project);
    out.printf(
        Locale.ROOT,
        "  %d waves, %d respondents, %d answers (%d substantive), %d codes, %d assignments%n",
        s.waves().size(),
        s.respondents(),
        s.answers(),
        s.substantive(),
        s.codes(),
        s.assignments());
    if (!s.waves().isEmpty()) {
      out.printf(
          Locale.ROOT,
          "  %-20s %-10s %11s %8s %12s%n",
          "wave",
          "fielded",
          "respondents",
          "answers",
          "substantive");
      for (WaveSummary w : s.waves()) {
        out.printf(
            Locale.ROOT,
            "  %-20s %-10s %11d %8d %12d%n",
            w.name(),
            w.fieldedOn(),
            w.respondents(),
            w.answers(),
            w.substantive());
      }
    }
    if (!s.questions().isEmpty()) {
      out.println("  questions:");
      for (String q : s.questions()) {
        String name = s.questionNames().get(q);
        out.println("    " + (name == null ? q : name + ": " + q));
      }
    }
  }
}
