package riffle.stats;

/**
 * Tail probabilities of the chi-square distribution.
 *
 * <p>With one degree of freedom a chi-square variable is the square of a standard normal Z, so
 * P(χ²₁ &gt; x) = P(|Z| &gt; √x) = erfc(√(x/2)) (Abramowitz M, Stegun IA (1964) Handbook of
 * Mathematical Functions, 26.4.4 with 7.1.2); erfc comes from {@link Erf#erfc(double)} (Cody 1969).
 * The usual critical values 3.84, 6.63, 10.83 and 15.13 mark p = .05, .01, .001 and .0001.
 */
public final class ChiSquare {
  private ChiSquare() {}

  /**
   * The p-value of a statistic under the chi-square distribution with one degree of freedom, P(χ²₁
   * &gt; x), as used for G² and Pearson's X² of a 2×2 table.
   *
   * @param x the statistic
   * @return the upper tail probability: 1 for x ≤ 0, approaching 0 as x grows; NaN for NaN
   */
  public static double upperTailDf1(double x) {
    if (Double.isNaN(x)) {
      return Double.NaN;
    }
    if (x <= 0) {
      return 1;
    }
    return Erf.erfc(Math.sqrt(x / 2));
  }

  /**
   * The p-value of a statistic under the chi-square distribution with {@code df} degrees of
   * freedom, P(χ²<sub>df</sub> &gt; x) = Q(df/2, x/2), the regularized upper incomplete gamma
   * function ({@link Gamma#regularizedUpper}); one degree of freedom goes through {@link
   * #upperTailDf1(double)}.
   *
   * @param x the statistic
   * @param df the degrees of freedom, at least 1
   * @return the upper tail probability: 1 for x ≤ 0; NaN for NaN
   * @throws IllegalArgumentException when df is below 1
   */
  public static double upperTail(double x, int df) {
    if (df < 1) {
      throw new IllegalArgumentException("degrees of freedom must be at least 1, got " + df);
    }
    if (df == 1 || Double.isNaN(x) || x <= 0) {
      return upperTailDf1(x);
    }
    return Gamma.regularizedUpper(df / 2.0, x / 2);
  }
}
