package riffle.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.stat.inference.GTest;
import org.junit.jupiter.api.Test;

class LogLikelihoodTest {

  /**
   * Dunning (1993), Computational Linguistics 19(1):61–74, table of bigrams from a 31,777-word
   * text; values as listed in src/test/resources/riffle/stats/checks.md (two decimals, as
   * published).
   */
  @Test
  void reproducesDunningsBigramTable() {
    assertEquals(270.72, LogLikelihood.g2(110, 2442, 111, 29114), 0.005);
    assertEquals(263.90, LogLikelihood.g2(29, 13, 123, 31612), 0.005);
    assertEquals(256.84, LogLikelihood.g2(31, 23, 139, 31584), 0.005);
    assertEquals(167.23, LogLikelihood.g2(10, 0, 3, 31764), 0.005);
    assertEquals(48.94, LogLikelihood.g2(9, 12, 429, 31327), 0.005);
  }

  /** commons-math3's G-test of two data sets is G² of the 2×k table formed by them. */
  @Test
  void agreesWithCommonsMathOnSeededRandomTables() {
    GTest library = new GTest();
    Random random = new Random(20_260_101L);
    for (int i = 0; i < 500; i++) {
      long[] row1 = {random.nextInt(i % 3 == 0 ? 20 : 5_000), random.nextInt(50_000)};
      long[] row2 = {random.nextInt(i % 5 == 0 ? 3 : 2_000), 1 + random.nextInt(500_000)};
      if (row1[0] + row1[1] == 0) {
        row1[1] = 1;
      }
      double expected = library.gDataSetsComparison(row1, row2);
      double actual = LogLikelihood.g2(row1[0], row1[1], row2[0], row2[1]);
      assertEquals(expected, actual, 1e-9 * Math.max(1, expected), "table " + i);
    }
  }

  @Test
  void independentTableScoresZeroAndEmptyMarginsCarryNoEvidence() {
    assertEquals(0, LogLikelihood.g2(10, 20, 30, 60), 1e-12);
    assertEquals(0, LogLikelihood.g2(0, 0, 5, 7));
    assertEquals(0, LogLikelihood.g2(0, 4, 0, 9));
    assertEquals(0, LogLikelihood.g2(0, 0, 0, 0));
  }

  @Test
  void transposingOrSwappingRowsKeepsTheStatistic() {
    double g = LogLikelihood.g2(110, 2442, 111, 29114);
    assertEquals(g, LogLikelihood.g2(110, 111, 2442, 29114), 1e-9);
    assertEquals(g, LogLikelihood.g2(111, 29114, 110, 2442), 1e-9);
  }

  @Test
  void strongerAssociationScoresHigher() {
    assertTrue(LogLikelihood.g2(40, 10, 10, 940) > LogLikelihood.g2(20, 30, 30, 920));
  }

  @Test
  void rejectsNegativeCounts() {
    assertThrows(IllegalArgumentException.class, () -> LogLikelihood.g2(-1, 2, 3, 4));
  }
}
