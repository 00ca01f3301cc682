package riffle.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import riffle.model.CodeFrequency;
import riffle.model.Cooccurrence;
import riffle.model.Findings;
import riffle.model.QuestionFindings;
import riffle.model.Saturation;
import riffle.model.Share;
import riffle.model.WaveChange;

/** The findings as Markdown (CommonMark with pipe tables); project text is escaped. */
final class MarkdownReport {
  private MarkdownReport() {}

  static String write(Findings findings, String title) {
    StringBuilder m = new StringBuilder(32 * 1024);
    m.append("# ").append(md(title)).append("\n\n");
    m.append(
            "Shares are of substantive answers, with 95% Wilson intervals. *Small base*: under 30 ")
        .append("answers; *imprecise*: interval wider than 20 points (common practice, after the ")
        .append("NCHS 2017 standards for proportions).\n");
    for (QuestionFindings q : findings.questions()) {
      question(m, q);
    }
    return m.toString();
  }

  private static void question(StringBuilder m, QuestionFindings q) {
    m.append("\n## ").append(md(q.question())).append("\n\n");
    List<String> bases = new ArrayList<>();
    q.bases().forEach((wave, base) -> bases.add(md(wave) + " " + base));
    m.append("Bases: ").append(String.join(" · ", bases)).append("\n");
    if (!q.notCoded().isEmpty()) {
      List<String> names = new ArrayList<>();
      q.notCoded().forEach(w -> names.add(md(w)));
      m.append("\nNot coded yet, so left out: ").append(String.join(", ", names)).append(".\n");
    }
    if (!q.changes().isEmpty()) {
      m.append("\n### What changed\n\n");
      for (WaveChange c : Text.readingOrder(q)) {
        boolean strong = c.verdict().equals(WaveChange.ROSE) || c.verdict().equals(WaveChange.FELL);
        String name = strong ? "**" + md(c.code()) + "**" : md(c.code());
        m.append("- ")
            .append(name)
            .append(' ')
            .append(md(Text.sentence(c, Text.row(q, c.codeId()))));
        m.append('\n');
      }
    }
    m.append("\n### Shares by wave\n\n| Code | Theme |");
    for (String wave : q.bases().keySet()) {
      m.append(' ').append(md(wave)).append(" |");
    }
    m.append("\n|---|---|");
    m.append("---:|".repeat(q.bases().size())).append('\n');
    for (CodeFrequency row : q.codes()) {
      m.append("| ")
          .append(row.theme() ? "**" + md(row.code()) + "**" : md(row.code()))
          .append(" | ")
          .append(md(row.parent().orElse("")))
          .append(" |");
      for (Share s : row.waves().values()) {
        m.append(' ')
            .append(md(Text.share(s)))
            .append(", ")
            .append(s.count())
            .append('/')
            .append(s.base());
        String flags = Text.flags(s);
        if (!flags.isEmpty()) {
          m.append(" *").append(flags).append('*');
        }
        m.append(" |");
      }
      m.append('\n');
    }
    List<Cooccurrence> top =
        q.cooccurrence().stream()
            .filter(c -> c.count() > 0)
            .sorted((x, y) -> Double.compare(x.p(), y.p()))
            .limit(15)
            .toList();
    if (!top.isEmpty()) {
      m.append(
              "\n### Codes that come together\n\n| Code | With | Wave | Answers | Jaccard | Lift | p |\n")
          .append("|---|---|---|---:|---:|---:|---:|\n");
      for (Cooccurrence c : top) {
        m.append("| ")
            .append(md(c.a()))
            .append(" | ")
            .append(md(c.b()))
            .append(" | ")
            .append(md(c.wave().orElse("all")))
            .append(" | ")
            .append(c.count())
            .append(" | ")
            .append(Text.number(c.jaccard()))
            .append(" | ")
            .append(Text.number(c.lift()))
            .append(" | ")
            .append(md(Text.p(c.p())))
            .append(" |\n");
      }
    }
    Saturation s = q.saturation();
    m.append("\n### Saturation\n\n")
        .append(
            String.format(
                Locale.ROOT,
                "%d answers coded by a person; %d distinct codes given; Chao1 estimates %.1f codes"
                    + " (95%% interval %.1f–%.1f); %d new code(s) in the last %d coded answers.\n",
                s.coded(),
                s.observed(),
                s.chao1(),
                s.ci().lower(),
                s.ci().upper(),
                s.newInWindow(),
                s.window()));
  }

  /** Escapes Markdown and HTML syntax so that project text shows as written, on one line. */
  static String md(String s) {
    StringBuilder out = new StringBuilder(s.length() + 8);
    for (int i = 0; i < s.length(); i++) {
      char c = s.charAt(i);
      switch (c) {
        case '\\', '`', '*', '_', '[', ']', '#', '|', '!', '~' -> out.append('\\').append(c);
        case '<' -> out.append("&lt;");
        case '>' -> out.append("&gt;");
        case '&' -> out.append("&amp;");
        case '\r', '\n', '\t' -> out.append(' ');
        default -> out.append(c);
      }
    }
    return out.toString();
  }
}
