package riffle.coding;

/**
 * Chooses a code's confidence threshold from held-out predictions. Stateless; thread-safe.
 *
 * <p>Every cut between two distinct held-out confidences is a candidate (a suggestion is made when
 * the confidence is at or above the threshold, which lies half-way between the two). Among the
 * candidates whose precision reaches the target, the one with the best recall wins (ties: the
 * better precision, then the higher threshold); when none reaches it, the best F1 wins (ties: the
 * higher threshold).
 */
final class Thresholds {
  private Thresholds() {}

  /**
   * Picks the threshold.
   *
   * @param scores held-out confidences, sorted in descending order
   * @param labels the human code of each, in the same order
   * @param targetPrecision the precision to reach
   * @return the threshold, or positive infinity (suggest nothing) when no example is positive
   */
  static double choose(double[] scores, boolean[] labels, double targetPrecision) {
    int positives = 0;
    for (boolean l : labels) {
      positives += l ? 1 : 0;
    }
    if (positives == 0) {
      return Double.POSITIVE_INFINITY;
    }
    int bestTarget = -1;
    double bestRecall = -1;
    double bestTargetPrecision = -1;
    int bestF1At = -1;
    double bestF1 = -1;
    int tp = 0;
    for (int j = 0; j < scores.length; j++) {
      tp += labels[j] ? 1 : 0;
      if (j + 1 < scores.length && scores[j + 1] == scores[j]) {
        continue;
      }
      double precision = (double) tp / (j + 1);
      double recall = (double) tp / positives;
      double f1 = 2.0 * tp / (j + 1 + positives);
      if (tp > 0 && precision >= targetPrecision) {
        if (recall > bestRecall || (recall == bestRecall && precision > bestTargetPrecision)) {
          bestTarget = j;
          bestRecall = recall;
          bestTargetPrecision = precision;
        }
      }
      if (f1 > bestF1) {
        bestF1 = f1;
        bestF1At = j;
      }
    }
    int cut = bestTarget >= 0 ? bestTarget : bestF1At;
    return cut + 1 < scores.length ? (scores[cut] + scores[cut + 1]) / 2 : scores[cut];
  }
}
