package riffle.stats;

import java.util.Objects;

/**
 * Pearson's chi-square test of independence for an r×c table of counts, and its Yates-corrected
 * form for 2×2 tables.
 *
 * <p>Expected counts are E<sub>ij</sub> = R<sub>i</sub> C<sub>j</sub> / N; X² = Σ (O − E)² / E with
 * (r − 1)(c − 1) degrees of freedom (Agresti A (2002) Categorical Data Analysis, 2nd ed., §3.2).
 * Yates' correction (Yates F (1934) JRSS Suppl. 1:217–235) subtracts ½ from every |O − E| before
 * squaring, or |O − E| itself when that is smaller, as R's {@code chisq.test} does, so the
 * correction never reverses the sign of a deviation. The result keeps the expected counts so that a
 * caller can apply Cochran's rule ({@link Result#cochranAdequate()}) before trusting the p-value.
 */
public final class PearsonChiSquare {
  private PearsonChiSquare() {}

  /**
   * The outcome of a chi-square test.
   *
   * @param statistic X² (Yates-corrected when asked)
   * @param degreesOfFreedom (r − 1)(c − 1)
   * @param p the upper tail probability of X²
   * @param expected the expected counts under independence, rows then columns
   */
  public record Result(double statistic, int degreesOfFreedom, double p, double[][] expected) {
    /** Copies the expected counts. */
    public Result {
      expected = copy(Objects.requireNonNull(expected, "expected"));
    }

    /** The expected counts under independence (a copy). */
    @Override
    public double[][] expected() {
      return copy(expected);
    }

    /**
     * Whether the table passes Cochran's rule (Cochran WG (1954) Some methods for strengthening the
     * common χ² tests. Biometrics 10:417–451), common practice for trusting the chi-square
     * approximation: no expected count below 1 and at most 20% of them below 5. When it fails, use
     * an exact test ({@link FisherExact} for 2×2 tables).
     */
    public boolean cochranAdequate() {
      int cells = 0;
      int belowFive = 0;
      for (double[] row : expected) {
        for (double e : row) {
          cells++;
          if (e < 1) {
            return false;
          }
          if (e < 5) {
            belowFive++;
          }
        }
      }
      return belowFive <= 0.2 * cells;
    }

    private static double[][] copy(double[][] table) {
      double[][] out = new double[table.length][];
      for (int i = 0; i < table.length; i++) {
        out[i] = table[i].clone();
      }
      return out;
    }
  }

  /**
   * Pearson's X² for an r×c table, without continuity correction.
   *
   * @param table counts, at least 2×2, rectangular, none negative, no row or column all zero
   * @return the statistic, its degrees of freedom, p-value and expected counts
   * @throws IllegalArgumentException when the table breaks one of those conditions
   */
  public static Result test(long[][] table) {
    return compute(table, false);
  }

  /**
   * Pearson's X² with Yates' continuity correction for the 2×2 table {@code [[a, b], [c, d]]}.
   *
   * @param a count of the first row and first column
   * @param b count of the first row and second column
   * @param c count of the second row and first column
   * @param d count of the second row and second column
   * @return the corrected statistic, one degree of freedom, p-value and expected counts
   * @throws IllegalArgumentException when a count is negative or a row or column total is zero
   */
  public static Result yates(long a, long b, long c, long d) {
    return compute(new long[][] {{a, b}, {c, d}}, true);
  }

  /**
   * Pearson's X² for the 2×2 table {@code [[a, b], [c, d]]}, without continuity correction.
   *
   * @param a count of the first row and first column
   * @param b count of the first row and second column
   * @param c count of the second row and first column
   * @param d count of the second row and second column
   * @return the statistic, one degree of freedom, p-value and expected counts
   * @throws IllegalArgumentException when a count is negative or a row or column total is zero
   */
  public static Result test(long a, long b, long c, long d) {
    return compute(new long[][] {{a, b}, {c, d}}, false);
  }

  private static Result compute(long[][] table, boolean yates) {
    Objects.requireNonNull(table, "table");
    int rows = table.length;
    if (rows < 2 || table[0].length < 2) {
      throw new IllegalArgumentException("a chi-square test needs at least 2 rows and 2 columns");
    }
    int cols = table[0].length;
    double[] rowTotals = new double[rows];
    double[] colTotals = new double[cols];
    double total = 0;
    for (int i = 0; i < rows; i++) {
      if (table[i].length != cols) {
        throw new IllegalArgumentException("row " + (i + 1) + " has a different number of cells");
      }
      for (int j = 0; j < cols; j++) {
        if (table[i][j] < 0) {
          throw new IllegalArgumentException("counts must not be negative: " + table[i][j]);
        }
        rowTotals[i] += table[i][j];
        colTotals[j] += table[i][j];
        total += table[i][j];
      }
    }
    for (int i = 0; i < rows; i++) {
      if (rowTotals[i] == 0) {
        throw new IllegalArgumentException("row " + (i + 1) + " is all zero");
      }
    }
    for (int j = 0; j < cols; j++) {
      if (colTotals[j] == 0) {
        throw new IllegalArgumentException("column " + (j + 1) + " is all zero");
      }
    }
    double[][] expected = new double[rows][cols];
    double correction = yates ? 0.5 : 0;
    for (int i = 0; i < rows; i++) {
      for (int j = 0; j < cols; j++) {
        expected[i][j] = rowTotals[i] * colTotals[j] / total;
        correction = Math.min(correction, Math.abs(table[i][j] - expected[i][j]));
      }
    }
    double statistic = 0;
    for (int i = 0; i < rows; i++) {
      for (int j = 0; j < cols; j++) {
        double deviation = Math.abs(table[i][j] - expected[i][j]) - correction;
        statistic += deviation * deviation / expected[i][j];
      }
    }
    int df = (rows - 1) * (cols - 1);
    return new Result(statistic, df, ChiSquare.upperTail(statistic, df), expected);
  }
}
