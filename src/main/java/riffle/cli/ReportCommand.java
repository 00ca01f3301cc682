package riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import riffle.app.FindingsQuery;
import riffle.app.Project;
import riffle.app.Reporting;
import riffle.model.CodeFrequency;
import riffle.model.Findings;
import riffle.model.InputException;
import riffle.model.QuestionFindings;
import riffle.model.Saturation;
import riffle.model.Share;
import riffle.model.WaveChange;

/** {@code riffle report}: the findings, in words first and numbers beside them. */
@Command(
    name = "report",
    mixinStandardHelpOptions = true,
    description = {
      "Shows the findings: what rose or fell between waves (and whether the change is real),",
      "each theme's share with its 95% interval, themes that come together, and whether coding",
      "has found the themes there are. --html and --markdown write the full report."
    })
final class ReportCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--project", required = true, paramLabel = "P", description = "Project file.")
  Path project;

  @Option(
      names = "--question",
      paramLabel = "Q",
      description = "Only this question: its number or text.")
  String question;

  @Option(
      names = "--segment",
      paramLabel = "COLUMN",
      description = "Also split shares by this column.")
  String segment;

  @Option(names = "--from", paramLabel = "WAVE", description = "Compare only this wave ...")
  String from;

  @Option(names = "--to", paramLabel = "WAVE", description = "... with this one.")
  String to;

  @Option(names = "--html", paramLabel = "FILE", description = "Write the report as one HTML page.")
  Path html;

  @Option(names = "--markdown", paramLabel = "FILE", description = "Write the report as Markdown.")
  Path markdown;

  @Mixin JsonOption json;

  @Override
  public Integer call() throws InputException {
    FindingsQuery query =
        new FindingsQuery(
            Optional.ofNullable(question),
            Optional.ofNullable(segment),
            Optional.ofNullable(from),
            Optional.ofNullable(to));
    Findings findings;
    String title = "Findings — " + project.getFileName();
    try (Project p = Project.openExisting(project)) {
      Reporting r = p.reporting();
      findings = r.findings(query);
      if (html != null) {
        Files.write(html, r.html(findings, title));
      }
      if (markdown != null) {
        Files.write(markdown, r.markdown(findings, title));
      }
    }
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      Json.print(out, findings);
      return 0;
    }
    for (QuestionFindings q : findings.questions()) {
      print(out, q);
    }
    if (html != null) {
      out.println("Wrote " + html);
    }
    if (markdown != null) {
      out.println("Wrote " + markdown);
    }
    return 0;
  }

  static String pct(double share) {
    return String.format(Locale.ROOT, "%.1f%%", 100 * share);
  }

  private static void print(PrintWriter out, QuestionFindings q) {
    out.println(q.question());
    StringBuilder bases = new StringBuilder("  Answers counted:");
    q.bases().forEach((w, n) -> bases.append(' ').append(w).append(' ').append(n).append(';'));
    out.println(bases.substring(0, bases.length() - 1));
    if (!q.notCoded().isEmpty()) {
      out.println("  Not coded yet, so left out: " + String.join(", ", q.notCoded()));
    }
    if (!q.changes().isEmpty()) {
      out.println("  What changed");
      for (WaveChange c : q.changes()) {
        out.printf(
            Locale.ROOT,
            "    %-28s %-24s %s → %s: %+.1f points (95%% CI %+.1f to %+.1f; p %.3g, adjusted %.3g)%n",
            c.code(),
            c.verdict(),
            c.from(),
            c.to(),
            100 * c.diff(),
            100 * c.ci().lower(),
            100 * c.ci().upper(),
            c.p(),
            c.pAdjusted());
      }
    }
    out.println("  Shares (95% interval; * small base, ~ imprecise)");
    for (CodeFrequency f : q.codes()) {
      StringBuilder line =
          new StringBuilder(
              String.format(
                  Locale.ROOT, "    %s%-28s", f.parent().isPresent() ? "  " : "", f.code()));
      for (Map.Entry<String, Share> w : f.waves().entrySet()) {
        Share s = w.getValue();
        line.append(
            String.format(
                Locale.ROOT,
                "  %s %s (%s–%s)%s",
                w.getKey(),
                pct(s.share()),
                pct(s.ci().lower()),
                pct(s.ci().upper()),
                (s.smallBase() ? "*" : "") + (s.imprecise() ? "~" : "")));
      }
      out.println(line);
    }
    Saturation s = q.saturation();
    if (s != null && s.coded() > 0) {
      out.printf(
          Locale.ROOT,
          "  Saturation: %d codes in %d coded answers; about %.1f exist (95%% CI %.1f–%.1f); the"
              + " last %d coded answers brought %d new code(s)%n",
          s.observed(),
          s.coded(),
          s.chao1(),
          s.ci().lower(),
          s.ci().upper(),
          s.window(),
          s.newInWindow());
    }
    out.println();
  }
}
