package riffle.report;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import riffle.model.CodeFrequency;
import riffle.model.Cooccurrence;
import riffle.model.Findings;
import riffle.model.NotCompared;
import riffle.model.QuestionFindings;
import riffle.model.Saturation;
import riffle.model.SaturationPoint;
import riffle.model.SegmentFindings;
import riffle.model.Share;
import riffle.model.WaveChange;

/**
 * The findings as one self-contained HTML page: inline CSS and SVG, no scripts, no fetches. Every
 * piece of text from the project (questions, waves, code names) is escaped, never inserted as
 * markup.
 *
 * <p>Size: one class because the page is one document written top to bottom; most of its lines are
 * markup and inline CSS for the sections it writes in order.
 */
final class HtmlReport {
  private HtmlReport() {}

  private static final String CSS =
      """
      body{font:15px/1.45 system-ui,-apple-system,"Segoe UI",sans-serif;color:#1f2328;margin:2rem auto;max-width:62rem;padding:0 1rem}
      h1{font-size:1.6rem;margin-bottom:.2rem}h2{font-size:1.25rem;margin-top:2.5rem;border-top:2px solid #2f5d62;padding-top:.6rem}
      h3{font-size:1.05rem;margin-top:1.6rem}
      table{border-collapse:collapse;margin:.4rem 0 1rem;font-size:.9rem}
      th,td{border-bottom:1px solid #d5d9dd;padding:.25rem .6rem;text-align:left;vertical-align:top}
      td.n{text-align:right;font-variant-numeric:tabular-nums}
      .flag{color:#8a4b0f;font-size:.8rem}.muted{color:#5b6570}
      .verdict-rose,.verdict-fell{font-weight:600}.verdict-rose{color:#1c6b3a}.verdict-fell{color:#a23b2a}
      .charts{display:flex;flex-wrap:wrap;gap:.6rem}.chart{border:1px solid #e1e4e8;padding:.3rem}
      svg text{font:11px system-ui,sans-serif;fill:#3a434c}
      @media print{body{margin:0;max-width:none;font-size:11pt}section{break-inside:avoid-page}
      h2{break-before:page}h2:first-of-type{break-before:auto}.chart{break-inside:avoid}}
      """;

  static String write(Findings findings, String title) {
    StringBuilder h = new StringBuilder(64 * 1024);
    h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
        .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
        .append("<title>")
        .append(esc(title))
        .append("</title>\n<style>\n")
        .append(CSS)
        .append("</style>\n</head>\n<body>\n<h1>")
        .append(esc(title))
        .append("</h1>\n<p class=\"muted\">Shares are of the substantive answers a person has ")
        .append("read, with 95% Wilson intervals; a code only rules give is counted over the ")
        .append("answers its rules ran on and marked “by rule”. “Small base”: under 30 answers; ")
        .append("“imprecise”: interval wider than 20 points (common practice, after the NCHS 2017 ")
        .append("standards for proportions).</p>\n");
    for (QuestionFindings q : findings.questions()) {
      question(h, findings.label(q), q);
    }
    h.append("</body>\n</html>\n");
    return h.toString();
  }

  private static void question(StringBuilder h, String label, QuestionFindings q) {
    h.append("<section>\n<h2>")
        .append(esc(label))
        .append("</h2>\n<p class=\"coverage\">Answers read by a person: ")
        .append(Text.coverageLine(q, " · ", HtmlReport::esc))
        .append("</p>\n");
    if (!q.notCoded().isEmpty()) {
      List<String> names = new ArrayList<>();
      q.notCoded().forEach(w -> names.add(esc(w)));
      h.append("<p>No answer read by a person yet in ")
          .append(String.join(", ", names))
          .append(": codes given by hand have no share there.</p>\n");
    }

    if (!q.changes().isEmpty()) {
      h.append("<h3>What changed</h3>\n<ul>\n");
      for (WaveChange c : Text.readingOrder(q)) {
        CodeFrequency row = Text.row(q, c.codeId());
        h.append("<li><span class=\"verdict-")
            .append(
                c.verdict().equals(WaveChange.ROSE)
                    ? "rose"
                    : c.verdict().equals(WaveChange.FELL) ? "fell" : "other")
            .append("\">")
            .append(esc(c.code()))
            .append("</span> ")
            .append(esc(Text.sentence(c, row)))
            .append("</li>\n");
      }
      h.append("</ul>\n");
    }
    if (!q.notCompared().isEmpty()) {
      h.append("<h3>Not compared</h3>\n<ul class=\"not-compared\">\n");
      for (NotCompared n : q.notCompared()) {
        h.append("<li><span class=\"verdict-other\">")
            .append(esc(n.code()))
            .append("</span> ")
            .append(esc(Text.notCompared(n)))
            .append("</li>\n");
      }
      h.append("</ul>\n");
    }

    h.append("<h3>Shares by wave</h3>\n<table>\n<thead><tr><th>Code</th><th>Theme</th>");
    for (String wave : q.bases().keySet()) {
      h.append("<th>").append(esc(wave)).append("</th>");
    }
    h.append("</tr></thead>\n<tbody>\n");
    shareRows(h, q.codes(), q.bases().keySet(), true);
    h.append("</tbody>\n</table>\n<div class=\"charts\">\n");
    List<String> waves = List.copyOf(q.bases().keySet());
    for (CodeFrequency row : q.codes()) {
      shareChart(h, row, waves);
    }
    h.append("</div>\n");
    segments(h, q);

    cooccurrence(h, q);
    saturation(h, q.saturation());
    h.append("</section>\n");
  }

  /** The table rows of shares: one per code, one cell per wave (a missing share says why). */
  private static void shareRows(
      StringBuilder h, List<CodeFrequency> rows, Collection<String> waves, boolean withTheme) {
    for (CodeFrequency row : rows) {
      h.append("<tr><td>")
          .append(row.theme() ? "<strong>" + esc(row.code()) + "</strong>" : esc(row.code()))
          .append(row.byRule() ? " <span class=\"flag\">by rule</span>" : "")
          .append("</td>");
      if (withTheme) {
        h.append("<td>").append(esc(row.parent().orElse(""))).append("</td>");
      }
      for (String wave : waves) {
        Share s = row.waves().get(wave);
        if (s == null) {
          h.append("<td class=\"n muted\">no share<br><span class=\"flag\">")
              .append(esc(row.noShare().getOrDefault(wave, "")))
              .append("</span></td>");
          continue;
        }
        h.append("<td class=\"n\">")
            .append(esc(Text.share(s)))
            .append("<br><span class=\"muted\">")
            .append(esc(Text.counts(s)))
            .append("</span>");
        String flags = Text.flags(s);
        if (!flags.isEmpty()) {
          h.append(" <span class=\"flag\">").append(esc(flags)).append("</span>");
        }
        h.append("</td>");
      }
      h.append("</tr>\n");
    }
  }

  /** Shares per segment value: coverage, then one table per value. */
  private static void segments(StringBuilder h, QuestionFindings q) {
    for (SegmentFindings seg : q.segments()) {
      h.append("<h3>").append(esc(seg.segment() + ": " + seg.value())).append("</h3>\n");
      List<String> parts = new ArrayList<>();
      seg.coverage().forEach((w, c) -> parts.add(esc(w) + " " + esc(Text.coverage(c))));
      h.append("<p class=\"coverage\">Read by a person: ")
          .append(String.join(" · ", parts))
          .append("</p>\n<table>\n<thead><tr><th>Code</th>");
      for (String wave : seg.bases().keySet()) {
        h.append("<th>").append(esc(wave)).append("</th>");
      }
      h.append("</tr></thead>\n<tbody>\n");
      shareRows(h, seg.codes(), seg.bases().keySet(), false);
      h.append("</tbody>\n</table>\n");
    }
  }

  /** One code's share per wave: a dot for the share and a bar for its interval. */
  private static void shareChart(StringBuilder h, CodeFrequency row, List<String> waves) {
    int width = 220;
    int height = 130;
    int left = 34;
    int top = 22;
    int bottom = 28;
    double max = 0.1;
    for (Share s : row.waves().values()) {
      max = Math.max(max, s.ci().upper());
    }
    max = Math.min(1, Math.ceil(max * 10) / 10);
    int n = waves.size();
    double plot = height - top - bottom;
    h.append("<svg class=\"chart\" width=\"")
        .append(width)
        .append("\" height=\"")
        .append(height)
        .append("\" viewBox=\"0 0 ")
        .append(width)
        .append(' ')
        .append(height)
        .append("\" role=\"img\" aria-label=\"")
        .append(esc(row.code() + ": share by wave"))
        .append("\"><text x=\"4\" y=\"14\" font-weight=\"600\">")
        .append(esc(shorten(row.code(), 34)))
        .append("</text>");
    double y0 = top + plot;
    h.append(line(left, y0, width - 6, y0, "#9aa3ab"));
    h.append(text(4, top + 4, Text.percent(max))).append(text(4, y0 + 4, "0%"));
    h.append(line(left, top, width - 6, top, "#e6e8eb"));
    StringBuilder path = new StringBuilder();
    int points = 0;
    for (int i = 0; i < n; i++) {
      String wave = waves.get(i);
      double x = left + 22 + (n == 1 ? 0 : i * (width - left - 52.0) / (n - 1));
      h.append(
              String.format(
                  Locale.ROOT, "<text x=\"%.1f\" y=\"%d\" text-anchor=\"middle\">", x, height - 10))
          .append(esc(shorten(wave, 10)))
          .append("</text>");
      Share s = row.waves().get(wave);
      if (s == null) {
        continue; // no share: nothing drawn, the table says why
      }
      double y = y0 - s.share() / max * plot;
      double yl = y0 - s.ci().lower() / max * plot;
      double yu = y0 - s.ci().upper() / max * plot;
      String colour = s.smallBase() ? "#c9a27a" : "#2f5d62";
      h.append(line(x, yl, x, yu, colour));
      h.append(
              String.format(
                  Locale.ROOT,
                  "<circle cx=\"%.1f\" cy=\"%.1f\" r=\"3.5\" fill=\"%s\" stroke=\"%s\">",
                  x,
                  y,
                  s.byRule() ? "#ffffff" : colour,
                  colour))
          .append("<title>")
          .append(esc(wave + ": " + Text.share(s) + ", " + Text.counts(s)))
          .append("</title></circle>");
      path.append(points == 0 ? "M" : "L").append(String.format(Locale.ROOT, "%.1f %.1f ", x, y));
      points++;
    }
    if (points > 1) {
      h.append("<path d=\"")
          .append(path.toString().trim())
          .append("\" fill=\"none\" stroke=\"#2f5d62\" stroke-opacity=\".45\"/>");
    }
    h.append("</svg>\n");
  }

  private static void cooccurrence(StringBuilder h, QuestionFindings q) {
    if (q.cooccurrence().isEmpty()) {
      return;
    }
    h.append("<h3>Codes that come together</h3>\n");
    Map<Optional<String>, List<Cooccurrence>> scopes = new LinkedHashMap<>();
    for (Cooccurrence c : q.cooccurrence()) {
      scopes.computeIfAbsent(c.wave(), k -> new ArrayList<>()).add(c);
    }
    for (Map.Entry<Optional<String>, List<Cooccurrence>> scope : scopes.entrySet()) {
      if (scope.getKey().isPresent()) {
        h.append("<p><strong>").append(esc(scope.getKey().get())).append("</strong></p>\n");
      }
      heatmap(h, scope.getValue(), q.codes());
      List<Cooccurrence> top =
          scope.getValue().stream()
              .filter(c -> c.count() > 0)
              .sorted((x, y) -> Double.compare(x.p(), y.p()))
              .limit(15)
              .toList();
      h.append("<table>\n<thead><tr><th>Code</th><th>With</th><th>Answers</th><th>Jaccard</th>")
          .append("<th>Lift</th><th>p</th></tr></thead>\n<tbody>\n");
      for (Cooccurrence c : top) {
        h.append("<tr><td>")
            .append(esc(c.a()))
            .append("</td><td>")
            .append(esc(c.b()))
            .append("</td><td class=\"n\">")
            .append(c.count())
            .append("</td><td class=\"n\">")
            .append(Text.number(c.jaccard()))
            .append("</td><td class=\"n\">")
            .append(Text.number(c.lift()))
            .append("</td><td class=\"n\">")
            .append(esc(Text.p(c.p())))
            .append("</td></tr>\n");
      }
      h.append("</tbody>\n</table>\n");
    }
  }

  /** A matrix of lift: warm above 1 (together more often than chance), cool below. */
  private static void heatmap(StringBuilder h, List<Cooccurrence> pairs, List<CodeFrequency> rows) {
    LinkedHashSet<String> names = new LinkedHashSet<>();
    for (Cooccurrence c : pairs) {
      names.add(c.a());
      names.add(c.b());
    }
    // Codebook order, so that a theme's codes sit together.
    List<String> codes = new ArrayList<>();
    for (CodeFrequency row : rows) {
      if (names.remove(row.code())) {
        codes.add(row.code());
      }
    }
    codes.addAll(names);
    int cell = codes.size() > 25 ? 12 : 18;
    int label = 150;
    int size = label + cell * codes.size() + 4;
    h.append("<svg class=\"chart\" width=\"")
        .append(size)
        .append("\" height=\"")
        .append(size)
        .append("\" viewBox=\"0 0 ")
        .append(size)
        .append(' ')
        .append(size)
        .append("\" role=\"img\" aria-label=\"co-occurrence heatmap\">");
    for (int i = 0; i < codes.size(); i++) {
      double y = label + i * cell + cell * 0.75;
      h.append(
              String.format(
                  Locale.ROOT, "<text x=\"%d\" y=\"%.1f\" text-anchor=\"end\">", label - 4, y))
          .append(esc(shorten(codes.get(i), 22)))
          .append("</text>");
      double x = label + i * cell + cell * 0.75;
      h.append(
              String.format(
                  Locale.ROOT, "<text transform=\"translate(%.1f %d) rotate(-90)\">", x, label - 4))
          .append(esc(shorten(codes.get(i), 22)))
          .append("</text>");
    }
    Map<String, Integer> at = new LinkedHashMap<>();
    for (int i = 0; i < codes.size(); i++) {
      at.put(codes.get(i), i);
    }
    for (Cooccurrence c : pairs) {
      int i = at.get(c.a());
      int j = at.get(c.b());
      String colour = colour(c.lift(), c.count());
      String tip =
          c.a()
              + " + "
              + c.b()
              + ": "
              + c.count()
              + " answers, lift "
              + Text.number(c.lift())
              + ", p "
              + Text.p(c.p());
      for (int[] rc : new int[][] {{i, j}, {j, i}}) {
        h.append(
                String.format(
                    Locale.ROOT,
                    "<rect x=\"%d\" y=\"%d\" width=\"%d\" height=\"%d\" fill=\"%s\">",
                    label + rc[1] * cell,
                    label + rc[0] * cell,
                    cell - 1,
                    cell - 1,
                    colour))
            .append("<title>")
            .append(esc(tip))
            .append("</title></rect>");
      }
    }
    h.append("</svg>\n");
  }

  private static String colour(double lift, int count) {
    if (count == 0) {
      return "#f3f4f6";
    }
    double t = Math.max(-1, Math.min(1, Math.log(lift) / Math.log(4)));
    // Warm (#c0632b) above lift 1, cool (#2f6f8f) below, white at 1.
    int[] to = t >= 0 ? new int[] {0xc0, 0x63, 0x2b} : new int[] {0x2f, 0x6f, 0x8f};
    double a = Math.abs(t);
    int r = (int) Math.round(255 + (to[0] - 255) * a);
    int g = (int) Math.round(255 + (to[1] - 255) * a);
    int b = (int) Math.round(255 + (to[2] - 255) * a);
    return String.format(Locale.ROOT, "#%02x%02x%02x", r, g, b);
  }

  private static void saturation(StringBuilder h, Saturation s) {
    h.append("<h3>Saturation</h3>\n<p>").append(esc(Text.saturation(s))).append("</p>\n");
    if (s.curve().isEmpty() || s.observed() == 0) {
      return;
    }
    int width = 480;
    int height = 210;
    int left = 40;
    int top = 12;
    int bottom = 30;
    double maxX = s.curve().get(s.curve().size() - 1).answers();
    double maxY = Math.max(1, Math.max(s.observed(), s.ci().upper()));
    maxY = Math.ceil(maxY * 1.05);
    double pw = width - left - 10;
    double ph = height - top - bottom;
    h.append("<svg class=\"chart\" width=\"")
        .append(width)
        .append("\" height=\"")
        .append(height)
        .append("\" viewBox=\"0 0 ")
        .append(width)
        .append(' ')
        .append(height)
        .append("\" role=\"img\" aria-label=\"distinct codes against answers coded\">");
    double y0 = top + ph;
    h.append(line(left, y0, width - 10, y0, "#9aa3ab"))
        .append(line(left, top, left, y0, "#9aa3ab"));
    double bandTop = y0 - s.ci().upper() / maxY * ph;
    double bandBottom = y0 - s.ci().lower() / maxY * ph;
    h.append(
        String.format(
            Locale.ROOT,
            "<rect x=\"%d\" y=\"%.1f\" width=\"%.1f\" height=\"%.1f\" fill=\"#c0632b\" fill-opacity=\".12\"/>",
            left,
            bandTop,
            pw,
            Math.max(0.5, bandBottom - bandTop)));
    double yc = y0 - s.chao1() / maxY * ph;
    h.append(
        String.format(
            Locale.ROOT,
            "<line x1=\"%d\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"#c0632b\" stroke-dasharray=\"4 3\"/>",
            left,
            yc,
            left + pw,
            yc));
    StringBuilder path = new StringBuilder(String.format(Locale.ROOT, "M%d %.1f", left, y0));
    int last = 0;
    for (SaturationPoint p : s.curve()) {
      double x = left + p.answers() / maxX * pw;
      double yPrev = y0 - last / maxY * ph;
      double y = y0 - p.codes() / maxY * ph;
      path.append(String.format(Locale.ROOT, " L%.1f %.1f L%.1f %.1f", x, yPrev, x, y));
      last = p.codes();
    }
    h.append("<path d=\"")
        .append(path)
        .append("\" fill=\"none\" stroke=\"#2f5d62\" stroke-width=\"1.8\"/>");
    h.append(text(4, top + 8, String.format(Locale.ROOT, "%.0f", maxY)))
        .append(text(4, y0 + 4, "0"))
        .append(
            String.format(
                Locale.ROOT,
                "<text x=\"%.1f\" y=\"%d\" text-anchor=\"end\">",
                left + pw,
                height - 8))
        .append(esc(String.format(Locale.ROOT, "%.0f answers read", maxX)))
        .append("</text>")
        .append(
            String.format(Locale.ROOT, "<text x=\"%d\" y=\"%d\">codes</text>", left + 4, top + 10))
        .append("</svg>\n");
  }

  private static String line(double x1, double y1, double x2, double y2, String colour) {
    return String.format(
        Locale.ROOT,
        "<line x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"%s\"/>",
        x1,
        y1,
        x2,
        y2,
        colour);
  }

  private static String text(double x, double y, String s) {
    return String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%.1f\">", x, y) + esc(s) + "</text>";
  }

  static String shorten(String s, int max) {
    if (s.length() <= max) {
      return s;
    }
    int end = max - 1;
    if (Character.isHighSurrogate(s.charAt(end - 1))) {
      end--; // never split a character outside the Basic Multilingual Plane
    }
    return s.substring(0, end) + "…";
  }

  /** Escapes text for HTML element content and quoted attribute values. */
  static String esc(String s) {
    StringBuilder out = new StringBuilder(s.length() + 16);
    for (int i = 0; i < s.length(); i++) {
      char c = s.charAt(i);
      switch (c) {
        case '&' -> out.append("&amp;");
        case '<' -> out.append("&lt;");
        case '>' -> out.append("&gt;");
        case '"' -> out.append("&quot;");
        case '\'' -> out.append("&#39;");
        default -> out.append(c);
      }
    }
    return out.toString();
  }
}
