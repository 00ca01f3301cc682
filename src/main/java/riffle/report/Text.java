package riffle.report;

import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import riffle.model.CodeFrequency;
import riffle.model.ConfidenceInterval;
import riffle.model.Coverage;
import riffle.model.NotCompared;
import riffle.model.QuestionFindings;
import riffle.model.Saturation;
import riffle.model.Share;
import riffle.model.WaveChange;

/** Number formats and sentences shared by the HTML and Markdown reports. */
final class Text {
  private Text() {}

  static String percent(double share) {
    return String.format(Locale.ROOT, "%.0f%%", share * 100);
  }

  static String points(double diff) {
    return String.format(Locale.ROOT, "%+.0f", diff * 100);
  }

  static String range(ConfidenceInterval ci) {
    return String.format(Locale.ROOT, "%.0f–%.0f%%", ci.lower() * 100, ci.upper() * 100);
  }

  static String pointsRange(ConfidenceInterval ci) {
    return String.format(Locale.ROOT, "%+.0f to %+.0f points", ci.lower() * 100, ci.upper() * 100);
  }

  static String p(double p) {
    if (p < 0.001) {
      return "< 0.001";
    }
    return String.format(Locale.ROOT, "%.3f", p);
  }

  static String number(double x) {
    return String.format(Locale.ROOT, "%.2f", x);
  }

  static String flags(Share s) {
    if (s.smallBase() && s.imprecise()) {
      return "small base, imprecise";
    }
    return s.smallBase() ? "small base" : s.imprecise() ? "imprecise" : "";
  }

  /** The share in a wave as "30% (25–35%)", and "by rule" when rules gave it. */
  static String share(Share s) {
    return percent(s.share()) + " (" + range(s.ci()) + ")" + (s.byRule() ? " by rule" : "");
  }

  /**
   * A share's count and base: "12 of 112 read", or "12 of 580 by rule"; from a random sample, with
   * the count it projects: "12 of 112 read; about 536 of 5000 in the wave (300–850)".
   */
  static String counts(Share s) {
    return s.count()
        + " of "
        + s.base()
        + (s.byRule() ? " by rule" : " read")
        + s.projected().map(p -> "; " + p.describe()).orElse("");
  }

  /**
   * How much of a wave a person read and what it stands for: "read 112 of 580 (19%), a random
   * sample" or "read 112 of 580 (19%), not a random sample".
   */
  static String coverage(Coverage c) {
    String pct = c.read() > 0 && c.share() < 0.005 ? "<1%" : percent(c.share());
    return "read " + c.read() + " of " + c.answers() + " (" + pct + ")" + c.sampleNote();
  }

  /** Coverage per wave on one line: "Spring read 112 of 580 (19%) · Summer read 0 of 600 (0%)". */
  static String coverageLine(QuestionFindings q, String join, Escape esc) {
    List<String> parts = new java.util.ArrayList<>();
    int nonAnswers = 0;
    for (var e : q.coverage().entrySet()) {
      parts.add(esc.apply(e.getKey()) + " " + coverage(e.getValue()));
      nonAnswers += e.getValue().nonAnswers();
    }
    String line = String.join(join, parts);
    if (nonAnswers > 0) {
      line +=
          " (" + nonAnswers + " non-answer" + (nonAnswers == 1 ? "" : "s") + " counted nowhere)";
    }
    return line + Coverage.caution(q.coverage().values());
  }

  /** Escapes project text for one output format. */
  @FunctionalInterface
  interface Escape {
    String apply(String text);
  }

  /** Why a code has no verdict between two waves: "Unsure it fits, Wave 1 → Wave 2: …". */
  static String notCompared(NotCompared n) {
    return n.from() + " → " + n.to() + ": " + n.reason();
  }

  /** The saturation in one sentence, or what is missing for one. */
  static String saturation(Saturation s) {
    if (s.coded() == 0) {
      return "No answer read by a person yet.";
    }
    if (s.observed() == 0) {
      return s.coded() + " answers read by a person; no code given to them yet.";
    }
    return String.format(
        Locale.ROOT,
        "%d answers read by a person; %d distinct codes given; Chao1 estimates %.1f codes"
            + " (95%% interval %.1f–%.1f); %d new code(s) in the last %d answers read.",
        s.coded(),
        s.observed(),
        s.chao1(),
        s.ci().lower(),
        s.ci().upper(),
        s.newInWindow(),
        Math.min(s.window(), s.coded()));
  }

  /** The sentence an analyst reads first: the verdict, then the numbers behind it. */
  static String sentence(WaveChange c, CodeFrequency row) {
    Share from = row.waves().get(c.from());
    Share to = row.waves().get(c.to());
    String shares = percent(from.share()) + " → " + percent(to.share());
    String what =
        switch (c.verdict()) {
          case WaveChange.ROSE -> "rose";
          case WaveChange.FELL -> "fell";
          case WaveChange.NO_CLEAR_CHANGE -> "shows no clear change";
          default -> "has too few answers to tell";
        };
    return (c.byRule() ? "(by rule) " : "")
        + what
        + " from "
        + c.from()
        + " to "
        + c.to()
        + ": "
        + shares
        + " (difference "
        + points(c.diff())
        + " points, 95% interval "
        + pointsRange(c.ci())
        + ", adjusted p "
        + p(c.pAdjusted())
        + "; bases "
        + from.base()
        + " and "
        + to.base()
        + (c.byRule() ? " answers its rules ran on" : " answers read")
        + ")";
  }

  /** Changes in reading order: rises and falls first, biggest first; then the rest. */
  static List<WaveChange> readingOrder(QuestionFindings q) {
    return q.changes().stream()
        .sorted(
            Comparator.comparingInt((WaveChange c) -> rank(c.verdict()))
                .thenComparing(c -> -Math.abs(c.diff())))
        .toList();
  }

  private static int rank(String verdict) {
    return switch (verdict) {
      case WaveChange.ROSE, WaveChange.FELL -> 0;
      case WaveChange.NO_CLEAR_CHANGE -> 1;
      default -> 2;
    };
  }

  static CodeFrequency row(QuestionFindings q, String codeId) {
    for (CodeFrequency f : q.codes()) {
      if (f.codeId().equals(codeId)) {
        return f;
      }
    }
    throw new IllegalArgumentException("the findings have no row for code " + codeId);
  }
}
