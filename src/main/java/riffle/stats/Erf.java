package riffle.stats;

/**
 * The complementary error function, to about 16 significant digits in IEEE double precision.
 *
 * <p>Source: Cody WJ (1969) Rational Chebyshev approximations for the error function. Mathematics
 * of Computation 23(107):631–637; the coefficients are those of Cody's near-minimax rational
 * approximations as published in his SPECFUN package (netlib, routine CALERF), which approximate
 * erf and erfc to at least 18 significant decimal digits. Three intervals: for |x| ≤ 0.46875, erf x
 * = x R(x²); for 0.46875 < |x| ≤ 4, erfc x = e<sup>−x²</sup> R(|x|); beyond 4, erfc x =
 * e<sup>−x²</sup>/|x| (1/√π + x<sup>−2</sup> R(x<sup>−2</sup>)). The factor e<sup>−x²</sup> is
 * computed as e<sup>−s²</sup> e<sup>−(x−s)(x+s)</sup> with s = x rounded down to a multiple of
 * 1/16, as Cody does, so that no precision is lost in x².
 */
public final class Erf {
  private Erf() {}

  private static final double THRESHOLD = 0.46875;

  /** erfc(x) underflows to zero past this argument (Cody's XBIG for IEEE double). */
  private static final double BIG = 26.543;

  private static final double ONE_OVER_SQRT_PI = 0.56418958354775628695;

  private static final double[] A = {
    3.16112374387056560e00,
    1.13864154151050156e02,
    3.77485237685302021e02,
    3.20937758913846947e03,
    1.85777706184603153e-1
  };
  private static final double[] B = {
    2.36012909523441209e01, 2.44024637934444173e02, 1.28261652607737228e03, 2.84423683343917062e03
  };
  private static final double[] C = {
    5.64188496988670089e-1,
    8.88314979438837594e00,
    6.61191906371416295e01,
    2.98635138197400131e02,
    8.81952221241769090e02,
    1.71204761263407058e03,
    2.05107837782607147e03,
    1.23033935479799725e03,
    2.15311535474403846e-8
  };
  private static final double[] D = {
    1.57449261107098347e01,
    1.17693950891312499e02,
    5.37181101862009858e02,
    1.62138957456669019e03,
    3.29079923573345963e03,
    4.36261909014324716e03,
    3.43936767414372164e03,
    1.23033935480374942e03
  };
  private static final double[] P = {
    3.05326634961232344e-1,
    3.60344899949804439e-1,
    1.25781726111229246e-1,
    1.60837851487422766e-2,
    6.58749161529837803e-4,
    1.63153871373020978e-2
  };
  private static final double[] Q = {
    2.56852019228982242e00,
    1.87295284992346047e00,
    5.27905102951428412e-1,
    6.05183413124413191e-2,
    2.33520497626869185e-3
  };

  /**
   * The complementary error function erfc(x) = 1 − erf(x) = (2/√π) ∫<sub>x</sub><sup>∞</sup>
   * e<sup>−t²</sup> dt.
   *
   * @param x any argument
   * @return erfc(x), between 0 and 2; NaN for NaN
   */
  public static double erfc(double x) {
    if (Double.isNaN(x)) {
      return Double.NaN;
    }
    double y = Math.abs(x);
    double result;
    if (y <= THRESHOLD) {
      double ysq = y * y;
      double num = A[4] * ysq;
      double den = ysq;
      for (int i = 0; i < 3; i++) {
        num = (num + A[i]) * ysq;
        den = (den + B[i]) * ysq;
      }
      return 1 - x * (num + A[3]) / (den + B[3]);
    } else if (y <= 4) {
      double num = C[8] * y;
      double den = y;
      for (int i = 0; i < 7; i++) {
        num = (num + C[i]) * y;
        den = (den + D[i]) * y;
      }
      result = gaussian(y) * (num + C[7]) / (den + D[7]);
    } else if (y >= BIG) {
      result = 0;
    } else {
      double ysq = 1 / (y * y);
      double num = P[5] * ysq;
      double den = ysq;
      for (int i = 0; i < 4; i++) {
        num = (num + P[i]) * ysq;
        den = (den + Q[i]) * ysq;
      }
      double r = ysq * (num + P[4]) / (den + Q[4]);
      result = gaussian(y) * (ONE_OVER_SQRT_PI - r) / y;
    }
    return x < 0 ? 2 - result : result;
  }

  /** e^(−y²), split as Cody does so that the rounding of y² does not cost digits. */
  private static double gaussian(double y) {
    double s = Math.floor(y * 16) / 16;
    double del = (y - s) * (y + s);
    return Math.exp(-s * s) * Math.exp(-del);
  }
}
