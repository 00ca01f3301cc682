package riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Collection;
import java.util.List;
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
import riffle.model.Coverage;
import riffle.model.Findings;
import riffle.model.InputException;
import riffle.model.NotCompared;
import riffle.model.QuestionFindings;
import riffle.model.Saturation;
import riffle.model.SegmentFindings;
import riffle.model.Share;
import riffle.model.WaveChange;

/** {@code riffle report}: the findings, in words first and numbers beside them. */
@Command(
    name = "report",
    mixinStandardHelpOptions = true,
    description = {
      "Shows the findings: what rose or fell between waves (and whether the change is "
          + "real), each theme's share with its 95%% interval, themes that come together, and "
          + "whether coding has found the themes there are.",
      "--html and --markdown write the full report."
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
        OutputFiles.write(html, r.html(findings, title));
      }
      if (markdown != null) {
        OutputFiles.write(markdown, r.markdown(findings, title));
      }
    }
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      JsonOutput.print(out, findings);
      return 0;
    }
    for (QuestionFindings q : findings.questions()) {
      print(out, findings.label(q), q);
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

  private static void print(PrintWriter out, String label, QuestionFindings q) {
    out.println(label);
    StringBuilder read = new StringBuilder("  Answers read by a person:");
    int nonAnswers = 0;
    for (Map.Entry<String, Coverage> w : q.coverage().entrySet()) {
      read.append(' ').append(w.getKey()).append(' ').append(coverage(w.getValue())).append(';');
      nonAnswers += w.getValue().nonAnswers();
    }
    out.println(
        read.substring(0, read.length() - 1)
            + (nonAnswers > 0 ? " (" + nonAnswers + " non-answers counted nowhere)" : ""));
    String caution = Coverage.caution(q.coverage().values());
    if (!caution.isEmpty()) {
      out.println("  " + caution.substring(2));
    }
    if (!q.notCoded().isEmpty()) {
      out.println(
          "  No answer read by a person yet in "
              + String.join(", ", q.notCoded())
              + ": codes given by hand have no share there");
    }
    if (!q.changes().isEmpty()) {
      out.println("  What changed");
      for (WaveChange c : q.changes()) {
        out.printf(
            Locale.ROOT,
            "    %-28s %-24s %s → %s: %+.1f points (95%% CI %+.1f to %+.1f; p %.3g, adjusted %.3g)%s%n",
            c.code(),
            c.verdict(),
            c.from(),
            c.to(),
            100 * c.diff(),
            100 * c.ci().lower(),
            100 * c.ci().upper(),
            c.p(),
            c.pAdjusted(),
            c.byRule() ? " by rule" : "");
      }
    }
    if (!q.notCompared().isEmpty()) {
      out.println("  Not compared");
      for (NotCompared n : q.notCompared()) {
        out.printf(Locale.ROOT, "    %-28s %s → %s: %s%n", n.code(), n.from(), n.to(), n.reason());
      }
    }
    out.println(
        "  Shares of the answers read (95% interval; * small base, ~ imprecise; by rule: over the"
            + " answers its rules ran on)");
    shares(out, q.codes(), q.bases().keySet(), "    ");
    for (SegmentFindings seg : q.segments()) {
      StringBuilder line =
          new StringBuilder("  " + seg.segment() + " = " + seg.value() + ": read by a person");
      seg.coverage()
          .forEach(
              (w, c) -> line.append(' ').append(w).append(' ').append(coverage(c)).append(';'));
      out.println(line.substring(0, line.length() - 1));
      shares(out, seg.codes(), seg.bases().keySet(), "      ");
    }
    Saturation s = q.saturation();
    if (s.coded() == 0) {
      out.println("  Saturation: no answer read by a person yet");
    } else if (s.observed() == 0) {
      out.printf(
          Locale.ROOT, "  Saturation: %d answers read by a person, no code given yet%n", s.coded());
    } else {
      out.printf(
          Locale.ROOT,
          "  Saturation: %d codes in %d answers read by a person; about %.1f exist (95%% CI"
              + " %.1f–%.1f); the last %d answers read brought %d new code(s)%n",
          s.observed(),
          s.coded(),
          s.chao1(),
          s.ci().lower(),
          s.ci().upper(),
          Math.min(s.window(), s.coded()),
          s.newInWindow());
    }
    out.println();
  }

  /** "read 112 of 580 (19%)". */
  static String coverage(Coverage c) {
    return String.format(
            Locale.ROOT, "read %d of %d (%.0f%%)", c.read(), c.answers(), 100 * c.share())
        + c.sampleNote();
  }

  private static void shares(
      PrintWriter out, List<CodeFrequency> codes, Collection<String> waves, String indent) {
    for (CodeFrequency f : codes) {
      StringBuilder line =
          new StringBuilder(
              String.format(
                  Locale.ROOT,
                  "%s%s%-28s",
                  indent,
                  f.parent().isPresent() ? "  " : "",
                  f.code() + (f.byRule() ? " (by rule)" : "")));
      for (String wave : waves) {
        Share s = f.waves().get(wave);
        if (s == null) {
          line.append("  ")
              .append(wave)
              .append(" no share (")
              .append(f.noShare().getOrDefault(wave, ""))
              .append(')');
          continue;
        }
        line.append(
            String.format(
                Locale.ROOT,
                "  %s %s (%s–%s) %d/%d%s%s",
                wave,
                pct(s.share()),
                pct(s.ci().lower()),
                pct(s.ci().upper()),
                s.count(),
                s.base(),
                (s.smallBase() ? "*" : "") + (s.imprecise() ? "~" : ""),
                s.byRule() && !f.byRule() ? " by rule" : ""));
        s.projected().ifPresent(p -> line.append(" → ").append(p.describe()));
      }
      out.println(line);
    }
  }
}
