package riffle.coding;

import java.util.Collection;

/**
 * The counts of a binary decision against the human codes, and the measures built on them.
 *
 * <p>Definitions as in Manning, Raghavan and Schütze, <i>Introduction to Information Retrieval</i>,
 * §8.3 and §13.6: precision {@code TP / (TP + FP)}, recall {@code TP / (TP + FN)}, F1 their
 * harmonic mean {@code 2TP / (2TP + FP + FN)}; micro-averaging pools the counts of every code
 * before dividing. A measure whose denominator is 0 is undefined: {@code NaN} here, {@code null} in
 * {@link riffle.model.CodeMetrics}.
 *
 * @param truePositives suggested and coded
 * @param falsePositives suggested, not coded
 * @param falseNegatives coded, not suggested
 */
record ConfusionCounts(int truePositives, int falsePositives, int falseNegatives) {
  static final ConfusionCounts ZERO = new ConfusionCounts(0, 0, 0);

  ConfusionCounts {
    if (truePositives < 0 || falsePositives < 0 || falseNegatives < 0) {
      throw new IllegalArgumentException(
          "counts must be >= 0, got "
              + truePositives
              + ", "
              + falsePositives
              + ", "
              + falseNegatives);
    }
  }

  /** Returns these counts plus another's. */
  ConfusionCounts plus(ConfusionCounts o) {
    return new ConfusionCounts(
        truePositives + o.truePositives,
        falsePositives + o.falsePositives,
        falseNegatives + o.falseNegatives);
  }

  /** Returns these counts with one more decision added. */
  ConfusionCounts plus(boolean predicted, boolean actual) {
    return new ConfusionCounts(
        truePositives + (predicted && actual ? 1 : 0),
        falsePositives + (predicted && !actual ? 1 : 0),
        falseNegatives + (!predicted && actual ? 1 : 0));
  }

  /** Returns TP / (TP + FP), or NaN when nothing was predicted. */
  double precision() {
    return ratio(truePositives, truePositives + falsePositives);
  }

  /** Returns TP / (TP + FN), or NaN when nothing was coded. */
  double recall() {
    return ratio(truePositives, truePositives + falseNegatives);
  }

  /** Returns 2TP / (2TP + FP + FN), or NaN when nothing was predicted or coded. */
  double f1() {
    return ratio(2L * truePositives, 2L * truePositives + falsePositives + falseNegatives);
  }

  /** Returns the F1 of the pooled counts of several codes (micro-averaged F1). */
  static double microF1(Collection<ConfusionCounts> perCode) {
    ConfusionCounts sum = ZERO;
    for (ConfusionCounts c : perCode) {
      sum = sum.plus(c);
    }
    return sum.f1();
  }

  private static double ratio(long num, long den) {
    return den == 0 ? Double.NaN : (double) num / den;
  }
}
