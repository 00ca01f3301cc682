package riffle.report;

import java.util.ArrayList;
import java.util.List;
import riffle.model.CodeFrequency;
import riffle.model.Cooccurrence;
import riffle.model.Findings;
import riffle.model.NotCompared;
import riffle.model.QuestionFindings;
import riffle.model.SegmentFindings;
import riffle.model.Share;
import riffle.model.WaveChange;

/** The findings as Markdown (CommonMark with pipe tables); project text is escaped. */
final class MarkdownReport {
  private MarkdownReport() {}

  static String write(Findings findings, String title) {
    StringBuilder m = new StringBuilder(32 * 1024);
    m.append("# ").append(md(title)).append("\n\n");
    m.append("Shares are of the substantive answers a person has read, with 95% Wilson intervals; ")
        .append("a code only rules give is counted over the answers its rules ran on and marked ")
        .append("*by rule*. *Small base*: under 30 answers; *imprecise*: interval wider than 20 ")
        .append("points (common practice, after the NCHS 2017 standards for proportions).\n");
    for (QuestionFindings q : findings.questions()) {
      question(m, findings.label(q), q);
    }
    return m.toString();
  }

  private static void question(StringBuilder m, String label, QuestionFindings q) {
    m.append("\n## ").append(md(label)).append("\n\n");
    m.append("Answers read by a person: ")
        .append(Text.coverageLine(q, " · ", MarkdownReport::md))
        .append("\n");
    if (!q.notCoded().isEmpty()) {
      List<String> names = new ArrayList<>();
      q.notCoded().forEach(w -> names.add(md(w)));
      m.append("\nNo answer read by a person yet in ")
          .append(String.join(", ", names))
          .append(": codes given by hand have no share there.\n");
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
    if (!q.notCompared().isEmpty()) {
      m.append("\n### Not compared\n\n");
      for (NotCompared n : q.notCompared()) {
        m.append("- ")
            .append(md(n.code()))
            .append(", ")
            .append(md(Text.notCompared(n)))
            .append('\n');
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
          .append(row.byRule() ? " *(by rule)*" : "")
          .append(" | ")
          .append(md(row.parent().orElse("")))
          .append(" |");
      for (String wave : q.bases().keySet()) {
        Share s = row.waves().get(wave);
        if (s == null) {
          m.append(" no share: ").append(md(row.noShare().getOrDefault(wave, ""))).append(" |");
          continue;
        }
        m.append(' ').append(md(Text.share(s))).append(", ").append(md(Text.counts(s)));
        String flags = Text.flags(s);
        if (!flags.isEmpty()) {
          m.append(" *").append(flags).append('*');
        }
        m.append(" |");
      }
      m.append('\n');
    }
    segments(m, q);
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
    m.append("\n### Saturation\n\n").append(md(Text.saturation(q.saturation()))).append('\n');
  }

  /** Shares per segment value, one table per value. */
  private static void segments(StringBuilder m, QuestionFindings q) {
    for (SegmentFindings seg : q.segments()) {
      m.append("\n### ")
          .append(md(seg.segment()))
          .append(": ")
          .append(md(seg.value()))
          .append("\n\nRead by a person: ");
      List<String> parts = new ArrayList<>();
      seg.coverage().forEach((w, c) -> parts.add(md(w) + " " + Text.coverage(c)));
      m.append(String.join(" · ", parts)).append("\n\n| Code |");
      for (String wave : seg.bases().keySet()) {
        m.append(' ').append(md(wave)).append(" |");
      }
      m.append("\n|---|").append("---:|".repeat(seg.bases().size())).append('\n');
      for (CodeFrequency row : seg.codes()) {
        m.append("| ").append(md(row.code())).append(" |");
        for (String wave : seg.bases().keySet()) {
          Share s = row.waves().get(wave);
          m.append(' ')
              .append(s == null ? "no share" : md(Text.share(s)) + ", " + md(Text.counts(s)))
              .append(s != null && !Text.flags(s).isEmpty() ? " *" + Text.flags(s) + "*" : "")
              .append(" |");
        }
        m.append('\n');
      }
    }
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
