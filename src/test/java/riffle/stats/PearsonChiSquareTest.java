package riffle.stats;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.stat.inference.ChiSquareTest;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class PearsonChiSquareTest {

  @Test
  @DisplayName(
      "Tea table: χ² 2.0 (p 0.157299), Yates 0.5 (p 0.479500) — src/test/resources/riffle/stats/checks.md, library")
  void teaTable() {
    PearsonChiSquare.Result plain = PearsonChiSquare.test(3, 1, 1, 3);
    assertEquals(2.0, plain.statistic(), 1e-12);
    assertEquals(1, plain.degreesOfFreedom());
    assertEquals(0.157299, plain.p(), 5e-7);
    PearsonChiSquare.Result yates = PearsonChiSquare.yates(3, 1, 1, 3);
    assertEquals(0.5, yates.statistic(), 1e-12);
    assertEquals(0.479500, yates.p(), 5e-7);
    assertArrayEquals(new double[] {2, 2}, plain.expected()[0], 1e-12);
  }

  /**
   * Cochran (1954) as quoted in src/test/resources/riffle/stats/checks.md "Small bases": the tea
   * table fails it.
   */
  @Test
  void cochransRuleNeedsExpectedCountsOfFive() {
    assertFalse(PearsonChiSquare.test(3, 1, 1, 3).cochranAdequate());
    assertTrue(PearsonChiSquare.test(30, 10, 10, 30).cochranAdequate());
    // 2×5 with two expected counts of 4 among ten (20%): adequate; with one below 1: not.
    long[] row = {4, 20, 20, 20, 20};
    assertTrue(PearsonChiSquare.test(new long[][] {row, row}).cochranAdequate());
    long[] sparse = {1, 20, 20, 20, 20};
    long[] empty = {0, 20, 20, 20, 20};
    assertFalse(PearsonChiSquare.test(new long[][] {sparse, empty}).cochranAdequate());
  }

  @Test
  void agreesWithCommonsMathChiSquareTestOnSeededTables() {
    ChiSquareTest library = new ChiSquareTest();
    Random random = new Random(1954L);
    for (int i = 0; i < 500; i++) {
      int rows = 2 + random.nextInt(4);
      int cols = 2 + random.nextInt(5);
      long[][] table = new long[rows][cols];
      for (long[] row : table) {
        for (int j = 0; j < cols; j++) {
          row[j] = 1 + random.nextInt(i % 2 == 0 ? 30 : 3_000);
        }
      }
      PearsonChiSquare.Result ours = PearsonChiSquare.test(table);
      double statistic = library.chiSquare(table);
      double p = library.chiSquareTest(table);
      assertEquals(statistic, ours.statistic(), 1e-9 * Math.max(1, statistic), "table " + i);
      assertEquals(p, ours.p(), 1e-10, "table " + i);
      assertEquals((rows - 1) * (cols - 1), ours.degreesOfFreedom());
    }
  }

  @Test
  void upperTailAgreesWithCommonsMathForManyDegreesOfFreedom() {
    Random random = new Random(6L);
    for (int i = 0; i < 3_000; i++) {
      int df = 1 + random.nextInt(60);
      double x = random.nextDouble() * 3 * df;
      double expected = 1 - new ChiSquaredDistribution(null, df).cumulativeProbability(x);
      assertEquals(expected, ChiSquare.upperTail(x, df), 1e-12 + 1e-9 * expected, df + ", " + x);
    }
    assertEquals(1, ChiSquare.upperTail(0, 4));
    assertThrows(IllegalArgumentException.class, () -> ChiSquare.upperTail(1, 0));
  }

  @Test
  void logGammaAndIncompleteGammaAgreeWithCommonsMath() {
    Random random = new Random(1964L);
    for (int i = 0; i < 3_000; i++) {
      double x = i % 2 == 0 ? random.nextDouble() * 20 + 1e-3 : random.nextDouble() * 1e6;
      double expected = org.apache.commons.math3.special.Gamma.logGamma(x);
      assertEquals(expected, Gamma.logGamma(x), 1e-13 * Math.max(1, Math.abs(expected)), "" + x);
      double a = random.nextDouble() * 50 + 0.1;
      double y = random.nextDouble() * 100;
      double q = org.apache.commons.math3.special.Gamma.regularizedGammaQ(a, y);
      assertEquals(q, Gamma.regularizedUpper(a, y), 1e-12, a + ", " + y);
    }
    assertEquals(Math.log(3_628_800), Gamma.logFactorial(10), 1e-13);
    assertEquals(Gamma.logGamma(1001), Gamma.logFactorial(1000), 1e-9);
    assertThrows(IllegalArgumentException.class, () -> Gamma.logGamma(0));
    assertThrows(IllegalArgumentException.class, () -> Gamma.logFactorial(-1));
  }

  @Test
  void rejectsTablesWithoutInformation() {
    assertThrows(IllegalArgumentException.class, () -> PearsonChiSquare.test(0, 0, 3, 4));
    assertThrows(IllegalArgumentException.class, () -> PearsonChiSquare.test(0, 2, 0, 4));
    assertThrows(IllegalArgumentException.class, () -> PearsonChiSquare.test(-1, 2, 3, 4));
    assertThrows(
        IllegalArgumentException.class, () -> PearsonChiSquare.test(new long[][] {{1, 2}, {3}}));
  }
}
