package riffle.coding;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class ThresholdsTest {
  // Held-out confidences, descending, with the human code of each:
  //   0.95 Y, 0.90 Y, 0.80 N, 0.70 Y, 0.60 Y, 0.50 N, 0.40 N, 0.30 Y, 0.20 N, 0.10 N
  // cut after  1: P 1/1,  R 1/5     after 2: P 2/2, R 2/5      after 3: P 2/3, R 2/5
  // cut after  4: P 3/4,  R 3/5     after 5: P 4/5, R 4/5      after 8: P 5/8, R 5/5
  static final double[] SCORES = {0.95, 0.90, 0.80, 0.70, 0.60, 0.50, 0.40, 0.30, 0.20, 0.10};
  static final boolean[] CODED = {true, true, false, true, true, false, false, true, false, false};

  @Test
  void theBestRecallThatReachesTheTargetPrecisionWins() {
    // P ≥ 0.8 with the best recall: after 5 (P 0.8, R 0.8); threshold half-way to 0.50.
    assertEquals(0.55, Thresholds.choose(SCORES, CODED, 0.8), 1e-12);
    // P ≥ 0.9: only the top two qualify.
    assertEquals(0.85, Thresholds.choose(SCORES, CODED, 0.9), 1e-12);
  }

  @Test
  void withoutAnyCutReachingTheTargetTheBestF1Wins() {
    double[] scores = {0.9, 0.8, 0.7, 0.6};
    boolean[] coded = {false, true, false, true};
    // P: 0, 1/2, 1/3, 2/4; F1 = 2TP/(n + 2): 0, 2/4, 2/5, 4/6 → cut after all four.
    assertEquals(0.6, Thresholds.choose(scores, coded, 0.9), 1e-12);
  }

  @Test
  void tiedConfidencesAreNeverCutApart() {
    double[] scores = {0.9, 0.7, 0.7, 0.7, 0.2};
    boolean[] coded = {true, true, false, true, false};
    // After 1: P 1; after 4 (the tie taken whole): P 3/4 — 0.75 misses 0.8, so the cut is after 1.
    assertEquals(0.8, Thresholds.choose(scores, coded, 0.8), 1e-12);
    assertEquals(0.45, Thresholds.choose(scores, coded, 0.75), 1e-12);
  }

  @Test
  void noPositiveExampleMeansNoSuggestion() {
    assertEquals(
        Double.POSITIVE_INFINITY,
        Thresholds.choose(new double[] {0.5, 0.4}, new boolean[] {false, false}, 0.8));
  }
}
