package riffle.stats;

/**
 * Fisher's exact test for the 2×2 table {@code [[a, b], [c, d]]}.
 *
 * <p>With the margins fixed, a follows the hypergeometric distribution with population n = a + b +
 * c + d, a + b successes and a + c draws (Fisher RA (1935) The logic of inductive inference. JRSS
 * 98:39–82; Agresti A (2002) Categorical Data Analysis, 2nd ed., §3.5). "Greater" is P(X ≥ a),
 * evidence that the first row holds more of the first column than independence predicts; "less" is
 * P(X ≤ a); "two-sided" sums the probabilities of all tables no more probable than the observed
 * one, counting as equal those within a relative 10<sup>−7</sup> of it (the rule of R's {@code
 * fisher.test}, which absorbs rounding in ties).
 *
 * <p>The observed table's probability comes from log-factorials ({@link Gamma#logFactorial}); tails
 * are summed outward from it with the ratio of neighbouring hypergeometric terms and stop once a
 * term no longer changes the sum, so the cost grows with the spread of the distribution (about √n),
 * not with n. The tail that contains the mode is taken as one minus the other.
 */
public final class FisherExact {
  private FisherExact() {}

  /** Relative tolerance under which two tables count as equally probable (as R's fisher.test). */
  public static final double RELATIVE_TOLERANCE = 1e-7;

  /**
   * One-sided p-value for a positive association, P(X ≥ a).
   *
   * @param a count of the first row and first column
   * @param b count of the first row and second column
   * @param c count of the second row and first column
   * @param d count of the second row and second column
   * @return the p-value, between 0 and 1
   * @throws IllegalArgumentException when a count is negative
   */
  public static double greater(long a, long b, long c, long d) {
    return new Table(a, b, c, d).upper(a);
  }

  /**
   * One-sided p-value for a negative association, P(X ≤ a).
   *
   * @param a count of the first row and first column
   * @param b count of the first row and second column
   * @param c count of the second row and first column
   * @param d count of the second row and second column
   * @return the p-value, between 0 and 1
   * @throws IllegalArgumentException when a count is negative
   */
  public static double less(long a, long b, long c, long d) {
    return new Table(a, b, c, d).lower(a);
  }

  /**
   * Two-sided p-value: the total probability of the tables with the same margins that are no more
   * probable than the observed one.
   *
   * @param a count of the first row and first column
   * @param b count of the first row and second column
   * @param c count of the second row and first column
   * @param d count of the second row and second column
   * @return the p-value, between 0 and 1 (1 when the observed table is the most probable)
   * @throws IllegalArgumentException when a count is negative
   */
  public static double twoSided(long a, long b, long c, long d) {
    return new Table(a, b, c, d).twoSided(a);
  }

  /** The hypergeometric distribution of the first cell given the margins. */
  private static final class Table {
    private final long m;
    private final long k;
    private final long n;
    private final long lo;
    private final long hi;
    private final long mode;
    private final double logConstant;

    Table(long a, long b, long c, long d) {
      if (a < 0 || b < 0 || c < 0 || d < 0) {
        throw new IllegalArgumentException(
            "counts must not be negative: " + a + ", " + b + ", " + c + ", " + d);
      }
      m = a + b;
      k = a + c;
      n = a + b + c + d;
      lo = Math.max(0, k - (n - m));
      hi = Math.min(k, m);
      long guess = (long) Math.floor((m + 1.0) * (k + 1.0) / (n + 2.0));
      mode = Math.max(lo, Math.min(hi, guess));
      logConstant =
          Gamma.logFactorial(m)
              + Gamma.logFactorial(n - m)
              + Gamma.logFactorial(k)
              + Gamma.logFactorial(n - k)
              - Gamma.logFactorial(n);
    }

    double logPmf(long x) {
      return logConstant
          - Gamma.logFactorial(x)
          - Gamma.logFactorial(m - x)
          - Gamma.logFactorial(k - x)
          - Gamma.logFactorial(n - m - k + x);
    }

    /** P(X ≥ x). */
    double upper(long x) {
      if (x <= lo) {
        return 1;
      }
      if (x > hi) {
        return 0;
      }
      if (x <= mode) {
        return clamp(1 - lower(x - 1));
      }
      double term = 1;
      double sum = 1;
      for (long y = x; y < hi; y++) {
        term *= (double) (m - y) * (k - y) / ((double) (y + 1) * (n - m - k + y + 1));
        sum += term;
        if (term < sum * 1e-17) {
          break;
        }
      }
      return clamp(sum * Math.exp(logPmf(x)));
    }

    /** P(X ≤ x). */
    double lower(long x) {
      if (x >= hi) {
        return 1;
      }
      if (x < lo) {
        return 0;
      }
      if (x >= mode) {
        return clamp(1 - upper(x + 1));
      }
      double term = 1;
      double sum = 1;
      for (long y = x; y > lo; y--) {
        term *= (double) y * (n - m - k + y) / ((double) (m - y + 1) * (k - y + 1));
        sum += term;
        if (term < sum * 1e-17) {
          break;
        }
      }
      return clamp(sum * Math.exp(logPmf(x)));
    }

    double twoSided(long x) {
      double threshold = logPmf(x) + Math.log1p(RELATIVE_TOLERANCE);
      if (logPmf(mode) <= threshold) {
        return 1;
      }
      long left;
      long right;
      if (x < mode) {
        left = x;
        while (left + 1 < mode && logPmf(left + 1) <= threshold) {
          left++;
        }
        // Smallest y above the mode as improbable as the observed table; the terms fall there.
        long from = mode + 1;
        long to = hi + 1;
        while (from < to) {
          long mid = (from + to) >>> 1;
          if (logPmf(mid) <= threshold) {
            to = mid;
          } else {
            from = mid + 1;
          }
        }
        right = from;
      } else {
        right = x;
        while (right - 1 > mode && logPmf(right - 1) <= threshold) {
          right--;
        }
        // Largest y below the mode as improbable as the observed table; the terms rise there.
        long from = lo - 1;
        long to = mode - 1;
        while (from < to) {
          long mid = (from + to + 1) >>> 1;
          if (logPmf(mid) <= threshold) {
            from = mid;
          } else {
            to = mid - 1;
          }
        }
        left = from;
      }
      return clamp(lower(left) + upper(right));
    }

    private static double clamp(double p) {
      return Math.max(0, Math.min(1, p));
    }
  }
}
