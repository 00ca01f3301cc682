package riffle.stats;

/**
 * Dunning's log-likelihood ratio statistic G² for a 2×2 contingency table.
 *
 * <p>Source: Dunning T (1993) Accurate methods for the statistics of surprise and coincidence.
 * Computational Linguistics 19(1):61–74. For the table
 *
 * <pre>
 *              B      not B
 *   A         k11     k12
 *   not A     k21     k22
 * </pre>
 *
 * G² = 2 Σ k<sub>ij</sub> ln(k<sub>ij</sub> N / (R<sub>i</sub> C<sub>j</sub>)), summed over the
 * four cells, where R and C are the row and column totals and N the grand total; a cell of zero
 * contributes nothing (the limit of k ln k as k → 0). Under independence G² follows a chi-square
 * distribution with one degree of freedom (see {@link ChiSquare#upperTailDf1(double)}).
 */
public final class LogLikelihood {
  private LogLikelihood() {}

  /**
   * G² of the 2×2 table {@code [[k11, k12], [k21, k22]]}.
   *
   * @param k11 count of A with B (for word pairs: how often the first word is followed by the
   *     second)
   * @param k12 count of A without B
   * @param k21 count of B without A
   * @param k22 count of neither
   * @return G², never negative; 0 when the table is empty or a row or column total is zero (the
   *     table then carries no evidence of association)
   * @throws IllegalArgumentException when a count is negative
   */
  public static double g2(long k11, long k12, long k21, long k22) {
    if (k11 < 0 || k12 < 0 || k21 < 0 || k22 < 0) {
      throw new IllegalArgumentException(
          "counts must not be negative: " + k11 + ", " + k12 + ", " + k21 + ", " + k22);
    }
    double r1 = (double) k11 + k12;
    double r2 = (double) k21 + k22;
    double c1 = (double) k11 + k21;
    double c2 = (double) k12 + k22;
    double n = r1 + r2;
    if (r1 == 0 || r2 == 0 || c1 == 0 || c2 == 0) {
      return 0;
    }
    double sum =
        cell(k11, r1 * c1 / n)
            + cell(k12, r1 * c2 / n)
            + cell(k21, r2 * c1 / n)
            + cell(k22, r2 * c2 / n);
    return Math.max(0, 2 * sum);
  }

  /** One cell's term O ln(O / E); zero for an empty cell. */
  private static double cell(long observed, double expected) {
    return observed == 0 ? 0 : observed * Math.log(observed / expected);
  }
}
