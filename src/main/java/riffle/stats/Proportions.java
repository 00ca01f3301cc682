package riffle.stats;

/**
 * Confidence intervals for a proportion r/n and for the difference of two independent proportions,
 * by the score methods that keep their coverage on small bases and near 0 or 1.
 */
public final class Proportions {
  private Proportions() {}

  /** The 95% Wilson score interval for r/n, without continuity correction. */
  public static Interval wilson(long r, long n) {
    return wilson(r, n, 0.95, false);
  }

  /**
   * The Wilson score interval for the proportion r/n (Wilson EB (1927) JASA 22:209–212), as methods
   * 3 (without) and 4 (with continuity correction) of Newcombe RG (1998) Two-sided confidence
   * intervals for the single proportion: comparison of seven methods. Statistics in Medicine
   * 17:857–872. Without correction the limits are (2r + z² ± z √(z² + 4r(1 − p))) / (2(n + z²));
   * with it, (2r + z² − 1 − z √(z² − 2 − 1/n + 4p(n(1 − p) + 1))) / (2(n + z²)) below and (2r + z²
   * + 1 + z √(z² + 2 − 1/n + 4p(n(1 − p) − 1))) / (2(n + z²)) above, the lower limit being 0 when r
   * = 0 and the upper 1 when r = n.
   *
   * @param r the number of successes, 0 ≤ r ≤ n
   * @param n the number of trials; 0 gives the uninformative interval [0, 1]
   * @param confidence the confidence level, strictly between 0 and 1
   * @param continuityCorrection whether to apply the continuity correction
   * @return the interval, inside [0, 1]
   * @throws IllegalArgumentException when r or n is out of range
   */
  public static Interval wilson(long r, long n, double confidence, boolean continuityCorrection) {
    check(r, n);
    double z = Normal.criticalValue(confidence);
    if (n == 0) {
      return new Interval(0, 1);
    }
    double p = (double) r / n;
    double z2 = z * z;
    double denominator = 2 * (n + z2);
    double lower;
    double upper;
    if (continuityCorrection) {
      lower =
          r == 0
              ? 0
              : (2 * r + z2 - 1 - z * Math.sqrt(z2 - 2 - 1.0 / n + 4 * p * (n * (1 - p) + 1)))
                  / denominator;
      upper =
          r == n
              ? 1
              : (2 * r + z2 + 1 + z * Math.sqrt(z2 + 2 - 1.0 / n + 4 * p * (n * (1 - p) - 1)))
                  / denominator;
    } else {
      double centre = 2 * r + z2;
      double half = z * Math.sqrt(z2 + 4 * r * (1 - p));
      lower = r == 0 ? 0 : (centre - half) / denominator;
      upper = r == n ? 1 : (centre + half) / denominator;
    }
    return new Interval(Math.max(0, Math.min(lower, p)), Math.min(1, Math.max(upper, p)));
  }

  /** The 95% Newcombe hybrid-score interval for r1/n1 − r2/n2. */
  public static Interval newcombe(long r1, long n1, long r2, long n2) {
    return newcombe(r1, n1, r2, n2, 0.95);
  }

  /**
   * Newcombe's hybrid-score interval for the difference p1 − p2 of two independent proportions,
   * method 10 of Newcombe RG (1998) Interval estimation for the difference between independent
   * proportions: comparison of eleven methods. Statistics in Medicine 17:873–890. With the Wilson
   * intervals (l1, u1) and (l2, u2) of the two proportions (no continuity correction), the limits
   * are D − √((p1 − l1)² + (u2 − p2)²) and D + √((u1 − p1)² + (p2 − l2)²), where D = p1 − p2.
   *
   * @param r1 successes in the first sample
   * @param n1 size of the first sample, above zero
   * @param r2 successes in the second sample
   * @param n2 size of the second sample, above zero
   * @param confidence the confidence level, strictly between 0 and 1
   * @return the interval, inside [−1, 1]
   * @throws IllegalArgumentException when a count is out of range or a sample is empty
   */
  public static Interval newcombe(long r1, long n1, long r2, long n2, double confidence) {
    check(r1, n1);
    check(r2, n2);
    if (n1 == 0 || n2 == 0) {
      throw new IllegalArgumentException("both samples need at least one trial");
    }
    double p1 = (double) r1 / n1;
    double p2 = (double) r2 / n2;
    Interval w1 = wilson(r1, n1, confidence, false);
    Interval w2 = wilson(r2, n2, confidence, false);
    double d = p1 - p2;
    double lower = d - Math.hypot(p1 - w1.lower(), w2.upper() - p2);
    double upper = d + Math.hypot(w1.upper() - p1, p2 - w2.lower());
    return new Interval(Math.max(-1, lower), Math.min(1, upper));
  }

  private static void check(long r, long n) {
    if (n < 0 || r < 0 || r > n) {
      throw new IllegalArgumentException("need 0 <= r <= n, got r=" + r + ", n=" + n);
    }
  }
}
