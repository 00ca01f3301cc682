package riffle.coding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

class ConfusionCountsTest {
  /**
   * A hand-checked table: ten answers, three codes (1 price, 2 delivery, 3 warranty).
   *
   * <pre>
   * answer  human codes  suggested   price   delivery  warranty
   *   1     1            1           TP      .         .
   *   2     1, 2         1           TP      FN        .
   *   3     2            2, 3        .       TP        FP
   *   4     3            3           .       .         TP
   *   5     (none)       1           FP      .         .
   *   6     1            (none)      FN      .         .
   *   7     2, 3         2, 3        .       TP        TP
   *   8     (none)       (none)      .       .         .
   *   9     1, 3         1, 2        TP      FP        FN
   *  10     2            2           .       TP        .
   *
   * price:    TP 3, FP 1, FN 1 → P 3/4 = 0.75,  R 3/4 = 0.75, F1 6/8 = 0.75
   * delivery: TP 3, FP 1, FN 1 → P 0.75, R 0.75, F1 0.75
   * warranty: TP 2, FP 1, FN 1 → P 2/3, R 2/3, F1 4/6 = 2/3
   * pooled:   TP 8, FP 3, FN 3 → micro P 8/11, micro R 8/11, micro F1 16/22 = 8/11 = 0.727273
   * (macro F1 would be (0.75 + 0.75 + 0.6667) / 3 = 0.722222: not what is computed here)
   * </pre>
   */
  static final List<Set<Long>> HUMAN =
      List.of(
          Set.of(1L),
          Set.of(1L, 2L),
          Set.of(2L),
          Set.of(3L),
          Set.of(),
          Set.of(1L),
          Set.of(2L, 3L),
          Set.of(),
          Set.of(1L, 3L),
          Set.of(2L));

  static final List<Set<Long>> SUGGESTED =
      List.of(
          Set.of(1L),
          Set.of(1L),
          Set.of(2L, 3L),
          Set.of(3L),
          Set.of(1L),
          Set.of(),
          Set.of(2L, 3L),
          Set.of(),
          Set.of(1L, 2L),
          Set.of(2L));

  private static ConfusionCounts count(long code) {
    ConfusionCounts c = ConfusionCounts.ZERO;
    for (int i = 0; i < HUMAN.size(); i++) {
      c = c.plus(SUGGESTED.get(i).contains(code), HUMAN.get(i).contains(code));
    }
    return c;
  }

  @Test
  void perCodeMeasuresMatchTheHandComputation() {
    assertEquals(new ConfusionCounts(3, 1, 1), count(1));
    assertEquals(new ConfusionCounts(3, 1, 1), count(2));
    assertEquals(new ConfusionCounts(2, 1, 1), count(3));
    assertEquals(0.75, count(1).precision(), 1e-12);
    assertEquals(0.75, count(1).recall(), 1e-12);
    assertEquals(0.75, count(1).f1(), 1e-12);
    assertEquals(2.0 / 3, count(3).precision(), 1e-12);
    assertEquals(2.0 / 3, count(3).recall(), 1e-12);
    assertEquals(2.0 / 3, count(3).f1(), 1e-12);
  }

  @Test
  void microF1PoolsTheCountsOfEveryCode() {
    double micro = ConfusionCounts.microF1(List.of(count(1), count(2), count(3)));
    assertEquals(8.0 / 11, micro, 1e-12);
    assertTrue(Math.abs(micro - 0.722222) > 0.004, "micro-F1 is not the macro average");
  }

  /** Brute force: count every (answer, code) decision of the table directly, pooled. */
  @Test
  void microF1AgreesWithABruteForceCount() {
    int tp = 0;
    int fp = 0;
    int fn = 0;
    for (int i = 0; i < HUMAN.size(); i++) {
      for (long code = 1; code <= 3; code++) {
        boolean h = HUMAN.get(i).contains(code);
        boolean s = SUGGESTED.get(i).contains(code);
        tp += h && s ? 1 : 0;
        fp += !h && s ? 1 : 0;
        fn += h && !s ? 1 : 0;
      }
    }
    double precision = (double) tp / (tp + fp);
    double recall = (double) tp / (tp + fn);
    double harmonic = 2 * precision * recall / (precision + recall);
    List<ConfusionCounts> perCode = new ArrayList<>();
    for (long code = 1; code <= 3; code++) {
      perCode.add(count(code));
    }
    assertEquals(harmonic, ConfusionCounts.microF1(perCode), 1e-12);
  }

  /**
   * Manning, Raghavan and Schütze, Introduction to Information Retrieval (2008), §13.6, Table 13.8
   * — recalled from memory: class 1 has TP 10, FP 10; class 2 has TP 90, FP 10; the pooled table TP
   * 100, FP 20 gives a microaveraged precision of 0.83 against a macroaveraged 0.7.
   */
  @Test
  void microAveragingFollowsTheTextbookExample() {
    ConfusionCounts one = new ConfusionCounts(10, 10, 10);
    ConfusionCounts two = new ConfusionCounts(90, 10, 10);
    assertEquals(0.5, one.precision(), 1e-12);
    assertEquals(0.9, two.precision(), 1e-12);
    assertEquals(0.7, (one.precision() + two.precision()) / 2, 1e-12);
    assertEquals(0.83, one.plus(two).precision(), 0.005);
  }

  @Test
  void undefinedMeasuresAreNaN() {
    ConfusionCounts nothingPredicted = new ConfusionCounts(0, 0, 4);
    assertTrue(Double.isNaN(nothingPredicted.precision()));
    assertEquals(0, nothingPredicted.recall());
    assertEquals(0, nothingPredicted.f1());
    assertTrue(Double.isNaN(ConfusionCounts.ZERO.f1()));
    assertTrue(Double.isNaN(ConfusionCounts.ZERO.recall()));
    assertThrows(IllegalArgumentException.class, () -> new ConfusionCounts(-1, 0, 0));
  }
}
