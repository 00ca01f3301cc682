package riffle.stats;

/**
 * The standard normal distribution: its quantile function and the two-sided critical value for a
 * confidence level.
 *
 * <p>The quantile is Wichura MJ (1988) Algorithm AS 241: The percentage points of the normal
 * distribution. Applied Statistics 37(3):477–484, routine PPND16, accurate to about 1 part in
 * 10<sup>16</sup>: a rational function in (p − ½)² near the centre and two rational functions in
 * √(−ln min(p, 1 − p)) in the tails.
 */
public final class Normal {
  private Normal() {}

  /** The two-sided critical value for 95% confidence, the quantile at 0.975. */
  public static final double Z95 = 1.959963984540054;

  private static final double[] A = {
    3.3871328727963666080e0,
    1.3314166789178437745e+2,
    1.9715909503065514427e+3,
    1.3731693765509461125e+4,
    4.5921953931549871457e+4,
    6.7265770927008700853e+4,
    3.3430575583588128105e+4,
    2.5090809287301226727e+3
  };
  private static final double[] B = {
    1.0,
    4.2313330701600911252e+1,
    6.8718700749205790830e+2,
    5.3941960214247511077e+3,
    2.1213794301586595867e+4,
    3.9307895800092710610e+4,
    2.8729085735721942674e+4,
    5.2264952788528545610e+3
  };
  private static final double[] C = {
    1.42343711074968357734e0,
    4.63033784615654529590e0,
    5.76949722146069140550e0,
    3.64784832476320460504e0,
    1.27045825245236838258e0,
    2.41780725177450611770e-1,
    2.27238449892691845833e-2,
    7.74545014278341407640e-4
  };
  private static final double[] D = {
    1.0,
    2.05319162663775882187e0,
    1.67638483018380384940e0,
    6.89767334985100004550e-1,
    1.48103976427480074590e-1,
    1.51986665636164571966e-2,
    5.47593808499534494600e-4,
    1.05075007164441684324e-9
  };
  private static final double[] E = {
    6.65790464350110377720e0,
    5.46378491116411436990e0,
    1.78482653991729133580e0,
    2.96560571828504891230e-1,
    2.65321895265761230930e-2,
    1.24266094738807843860e-3,
    2.71155556874348757815e-5,
    2.01033439929228813265e-7
  };
  private static final double[] F = {
    1.0,
    5.99832206555887937690e-1,
    1.36929880922735805310e-1,
    1.48753612908506148525e-2,
    7.86869131145613259100e-4,
    1.84631831751005468180e-5,
    1.42151175831644588870e-7,
    2.04426310338993978564e-15
  };

  /**
   * The quantile of the standard normal distribution: the z with P(Z ≤ z) = p.
   *
   * @param p a probability
   * @return z; −∞ for p = 0 and +∞ for p = 1
   * @throws IllegalArgumentException when p is outside [0, 1] or NaN
   */
  public static double quantile(double p) {
    if (!(p >= 0 && p <= 1)) {
      throw new IllegalArgumentException("probability must lie in [0, 1], got " + p);
    }
    if (p == 0) {
      return Double.NEGATIVE_INFINITY;
    }
    if (p == 1) {
      return Double.POSITIVE_INFINITY;
    }
    double q = p - 0.5;
    if (Math.abs(q) <= 0.425) {
      double r = 0.180625 - q * q;
      return q * poly(A, r) / poly(B, r);
    }
    double r = Math.sqrt(-Math.log(q < 0 ? p : 1 - p));
    double value = r <= 5 ? poly(C, r - 1.6) / poly(D, r - 1.6) : poly(E, r - 5) / poly(F, r - 5);
    return q < 0 ? -value : value;
  }

  /**
   * The two-sided critical value for a confidence level: the quantile at 1 − (1 − level)/2.
   *
   * @param confidence the confidence level, strictly between 0 and 1 (0.95 for 95%)
   * @return z, e.g. {@link #Z95} for 0.95
   * @throws IllegalArgumentException when the level is not strictly between 0 and 1
   */
  public static double criticalValue(double confidence) {
    if (!(confidence > 0 && confidence < 1)) {
      throw new IllegalArgumentException(
          "confidence level must lie strictly between 0 and 1, got " + confidence);
    }
    if (confidence == 0.95) {
      return Z95;
    }
    return quantile(1 - (1 - confidence) / 2);
  }

  /** Horner's rule with the coefficients in ascending order of power. */
  private static double poly(double[] c, double x) {
    double value = c[c.length - 1];
    for (int i = c.length - 2; i >= 0; i--) {
      value = value * x + c[i];
    }
    return value;
  }
}
