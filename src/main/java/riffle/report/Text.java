package riffle.report;

import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import riffle.model.CodeFrequency;
import riffle.model.ConfidenceInterval;
import riffle.model.QuestionFindings;
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

  /** The share in a wave as "30% (25–35%)". */
  static String share(Share s) {
    return percent(s.share()) + " (" + range(s.ci()) + ")";
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
    return what
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
