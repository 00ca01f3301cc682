package riffle.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.junit.jupiter.api.Test;

class ChiSquareTest {

  /**
   * The critical values of src/test/resources/riffle/stats/checks.md (keyness section): 3.84, 6.63,
   * 10.83 and 15.13 are the rounded quantiles for p = .05, .01, .001 and .0001, so the tail at each
   * is within a few tenths of a percent of its level.
   */
  @Test
  void criticalValuesGiveTheirSignificanceLevels() {
    double[][] pairs = {{3.84, 0.05}, {6.63, 0.01}, {10.83, 0.001}, {15.13, 0.0001}};
    for (double[] pair : pairs) {
      double p = ChiSquare.upperTailDf1(pair[0]);
      assertEquals(pair[1], p, pair[1] * 0.005, "chi-square " + pair[0]);
    }
    assertTrue(ChiSquare.upperTailDf1(3.85) < 0.05);
    assertTrue(ChiSquare.upperTailDf1(3.83) > 0.05);
  }

  /**
   * src/test/resources/riffle/stats/checks.md, Fisher section: Pearson χ² = 2.0 for the tea table
   * has p = 0.157299.
   */
  @Test
  void pearsonStatisticOfTheTeaTableHasItsLibraryPValue() {
    assertEquals(0.157299, ChiSquare.upperTailDf1(2.0), 5e-7);
    assertEquals(0.479500, ChiSquare.upperTailDf1(0.5), 5e-7);
  }

  @Test
  void agreesWithCommonsMathChiSquaredDistribution() {
    ChiSquaredDistribution library = new ChiSquaredDistribution(1);
    Random random = new Random(7L);
    for (int i = 0; i < 2_000; i++) {
      double x = i < 1_000 ? random.nextDouble() * 4 : random.nextDouble() * 40;
      double expected = 1 - library.cumulativeProbability(x);
      double actual = ChiSquare.upperTailDf1(x);
      // 1 - cdf loses relative precision as the tail shrinks; allow for the subtraction.
      assertEquals(expected, actual, 1e-13 + 1e-9 * expected, "x = " + x);
    }
  }

  @Test
  void tailIsOneAtZeroAndFallsMonotonically() {
    assertEquals(1, ChiSquare.upperTailDf1(0));
    assertEquals(1, ChiSquare.upperTailDf1(-3));
    double previous = 1;
    for (double x = 0.01; x < 200; x *= 1.1) {
      double p = ChiSquare.upperTailDf1(x);
      assertTrue(p < previous && p >= 0, "x = " + x);
      previous = p;
    }
    assertTrue(Double.isNaN(ChiSquare.upperTailDf1(Double.NaN)));
  }
}
