package riffle.stats;

/**
 * The logarithm of the gamma function, log-factorials and the regularized upper incomplete gamma
 * function.
 *
 * <p>ln Γ(x) uses Stirling's series (Abramowitz M, Stegun IA (1964) Handbook of Mathematical
 * Functions, 6.1.40) with terms up to x<sup>−9</sup>, after raising x to at least 15 with the
 * recurrence Γ(x + 1) = x Γ(x) (6.1.15); the truncation error is below 10<sup>−16</sup> there.
 * Log-factorials below 256 come from a table of summed logarithms.
 */
public final class Gamma {
  private Gamma() {}

  private static final double HALF_LOG_TWO_PI = 0.91893853320467274178;
  private static final int TABLE = 256;
  private static final double[] LOG_FACTORIAL = new double[TABLE];

  static {
    for (int i = 1; i < TABLE; i++) {
      LOG_FACTORIAL[i] = LOG_FACTORIAL[i - 1] + Math.log(i);
    }
  }

  /**
   * ln Γ(x) for x &gt; 0.
   *
   * @param x a positive argument
   * @return ln Γ(x)
   * @throws IllegalArgumentException when x is not positive or is NaN
   */
  public static double logGamma(double x) {
    if (!(x > 0)) {
      throw new IllegalArgumentException("logGamma needs a positive argument, got " + x);
    }
    double shift = 0;
    double y = x;
    if (y < 15) {
      double product = 1;
      while (y < 15) {
        product *= y;
        y += 1;
      }
      shift = Math.log(product);
    }
    double inv = 1 / y;
    double inv2 = inv * inv;
    double series =
        inv
            * (1.0 / 12
                - inv2
                    * (1.0 / 360
                        - inv2 * (1.0 / 1260 - inv2 * (1.0 / 1680 - inv2 * (1.0 / 1188)))));
    return (y - 0.5) * Math.log(y) - y + HALF_LOG_TWO_PI + series - shift;
  }

  /**
   * ln n!.
   *
   * @param n a count, not negative
   * @return ln n!, 0 for 0 and 1
   * @throws IllegalArgumentException when n is negative
   */
  public static double logFactorial(long n) {
    if (n < 0) {
      throw new IllegalArgumentException("logFactorial needs n >= 0, got " + n);
    }
    return n < TABLE ? LOG_FACTORIAL[(int) n] : logGamma(n + 1.0);
  }

  /**
   * The regularized upper incomplete gamma function Q(a, x) = Γ(a, x) / Γ(a), the upper tail of a
   * gamma variable with shape a. Computed as in Press WH et al. (2007) Numerical Recipes, 3rd ed.,
   * §6.2: by the series for P(a, x) = 1 − Q(a, x) when x &lt; a + 1 and by the continued fraction
   * for Q(a, x) (modified Lentz) otherwise, each to double precision.
   *
   * @param a the shape, above zero
   * @param x the argument; Q is 1 for x ≤ 0
   * @return Q(a, x), between 0 and 1
   * @throws IllegalArgumentException when a is not positive or an argument is NaN
   */
  public static double regularizedUpper(double a, double x) {
    if (!(a > 0) || Double.isNaN(x)) {
      throw new IllegalArgumentException("need a > 0 and a number x, got a=" + a + ", x=" + x);
    }
    if (x <= 0) {
      return 1;
    }
    if (x == Double.POSITIVE_INFINITY) {
      return 0;
    }
    double logPrefix = a * Math.log(x) - x - logGamma(a);
    if (x < a + 1) {
      double term = 1 / a;
      double sum = term;
      for (int n = 1; n < 10_000; n++) {
        term *= x / (a + n);
        sum += term;
        if (Math.abs(term) < Math.abs(sum) * 1e-17) {
          break;
        }
      }
      return Math.max(0, 1 - sum * Math.exp(logPrefix));
    }
    final double tiny = 1e-300;
    double b = x + 1 - a;
    double c = 1 / tiny;
    double d = 1 / b;
    double h = d;
    for (int i = 1; i < 10_000; i++) {
      double an = -i * (i - a);
      b += 2;
      d = an * d + b;
      if (Math.abs(d) < tiny) {
        d = tiny;
      }
      c = b + an / c;
      if (Math.abs(c) < tiny) {
        c = tiny;
      }
      d = 1 / d;
      double delta = d * c;
      h *= delta;
      if (Math.abs(delta - 1) < 1e-16) {
        break;
      }
    }
    return Math.min(1, Math.exp(logPrefix) * h);
  }
}
