package riffle.coding;

/**
 * Binary L2-regularised logistic regression over {@link SparseRows}, fitted by L-BFGS.
 *
 * <p>Minimises {@code λ/2 ‖w‖² + Σᵢ log(1 + exp(zᵢ)) − yᵢ zᵢ} with {@code zᵢ = b + w·xᵢ} and the
 * intercept {@code b} left unpenalised (the regularised maximum-likelihood estimate, Hastie,
 * Tibshirani and Friedman, <i>The Elements of Statistical Learning</i>, 2nd ed., §4.4.4). The
 * objective is strictly convex, so the fit does not depend on where it starts; L-BFGS with ten
 * correction pairs and a backtracking (Armijo) line search follows Nocedal and Wright, <i>Numerical
 * Optimization</i>, 2nd ed., Algorithms 7.4 and 7.5. Every sum runs in a fixed order on one thread,
 * so equal input gives bit-identical weights. Stateless; thread-safe.
 */
final class LogisticRegression {
  /**
   * The L2 penalty λ, chosen on the demo pilot among 0.02, 0.05, 0.1, 0.2, 0.5, 1 and 2 (best
   * micro-F1 at 300 and 1,000 coded answers; rows have unit length, so λ is small).
   */
  static final double PENALTY = 0.1;

  /** Iterations never exceed this; the fit usually stops well before. */
  static final int MAX_ITERATIONS = 100;

  /**
   * Stop when an iteration lowers the objective by less than this share of its value; tighter
   * tolerances (down to 1e-6) changed no micro-F1 figure of the bench in the third decimal and took
   * twice as long.
   */
  static final double TOLERANCE = 1e-4;

  private static final int MEMORY = 10;
  private static final double ARMIJO = 1e-4;

  private LogisticRegression() {}

  /**
   * Fits the weights.
   *
   * @param x the rows
   * @param y the label of each row
   * @return the weights, one per column, followed by the intercept
   */
  static double[] fit(SparseRows x, boolean[] y) {
    int n = x.height();
    int d = x.width + 1;
    double[] w = new double[d];
    double[] z = new double[n];
    double[] g = new double[d];
    double f = objective(x, y, w, z, g);
    double[][] s = new double[MEMORY][];
    double[][] t = new double[MEMORY][];
    double[] rho = new double[MEMORY];
    int stored = 0;
    double[] dir = new double[d];
    double[] xd = new double[n];
    double[] alpha = new double[MEMORY];
    double[] gNew = new double[d];
    for (int iter = 0; iter < MAX_ITERATIONS; iter++) {
      // Two-loop recursion: dir = −H·g.
      for (int j = 0; j < d; j++) {
        dir[j] = -g[j];
      }
      for (int k = stored - 1; k >= 0; k--) {
        alpha[k] = rho[k] * dot(s[k], dir);
        axpy(-alpha[k], t[k], dir);
      }
      double gamma = stored > 0 ? 1 / (rho[stored - 1] * dot(t[stored - 1], t[stored - 1])) : 1;
      if (stored == 0) {
        gamma = 1 / Math.max(1, Math.sqrt(dot(g, g)));
      }
      for (int j = 0; j < d; j++) {
        dir[j] *= gamma;
      }
      for (int k = 0; k < stored; k++) {
        double beta = rho[k] * dot(t[k], dir);
        axpy(alpha[k] - beta, s[k], dir);
      }
      double slope = dot(g, dir);
      if (!(slope < 0)) {
        break;
      }
      multiply(x, dir, xd);
      double ww = dot(w, w, d - 1);
      double wd = dot(w, dir, d - 1);
      double dd = dot(dir, dir, d - 1);
      double step = 1;
      double fNew = Double.NaN;
      for (int tries = 0; tries < 40; tries++) {
        fNew = loss(y, z, xd, step) + PENALTY / 2 * (ww + 2 * step * wd + step * step * dd);
        if (fNew <= f + ARMIJO * step * slope) {
          break;
        }
        step /= 2;
      }
      if (!(fNew <= f + ARMIJO * step * slope)) {
        break;
      }
      double[] sk = new double[d];
      for (int j = 0; j < d; j++) {
        sk[j] = step * dir[j];
        w[j] += sk[j];
      }
      for (int i = 0; i < n; i++) {
        z[i] += step * xd[i];
      }
      gradient(x, y, w, z, gNew);
      double[] tk = new double[d];
      for (int j = 0; j < d; j++) {
        tk[j] = gNew[j] - g[j];
      }
      System.arraycopy(gNew, 0, g, 0, d);
      double sy = dot(sk, tk);
      if (sy > 1e-12) {
        if (stored == MEMORY) {
          System.arraycopy(s, 1, s, 0, MEMORY - 1);
          System.arraycopy(t, 1, t, 0, MEMORY - 1);
          System.arraycopy(rho, 1, rho, 0, MEMORY - 1);
          stored--;
        }
        s[stored] = sk;
        t[stored] = tk;
        rho[stored] = 1 / sy;
        stored++;
      }
      boolean done = f - fNew <= TOLERANCE * Math.max(1, Math.abs(fNew));
      f = fNew;
      if (done) {
        break;
      }
    }
    return w;
  }

  /**
   * Returns the linear score {@code b + w·x} of one row.
   *
   * @param weights weights from {@link #fit}
   * @param x rows over the same columns
   * @param row the row
   */
  static double score(double[] weights, SparseRows x, int row) {
    double sum = 0;
    for (int k = x.offsets[row]; k < x.offsets[row + 1]; k++) {
      sum += weights[x.columns[k]];
    }
    return weights[weights.length - 1] + x.scale[row] * sum;
  }

  /** The logistic function, {@code 1 / (1 + e^−z)}. */
  static double sigmoid(double z) {
    return z >= 0 ? 1 / (1 + Math.exp(-z)) : Math.exp(z) / (1 + Math.exp(z));
  }

  /** Sets z to the scores of w and g to the gradient; returns the objective. */
  private static double objective(SparseRows x, boolean[] y, double[] w, double[] z, double[] g) {
    for (int i = 0; i < z.length; i++) {
      z[i] = score(w, x, i);
    }
    gradient(x, y, w, z, g);
    return loss(y, z, null, 0) + PENALTY / 2 * dot(w, w, w.length - 1);
  }

  /** The data term at scores {@code z + step·xd} (xd null for z itself). */
  private static double loss(boolean[] y, double[] z, double[] xd, double step) {
    double sum = 0;
    for (int i = 0; i < z.length; i++) {
      double zi = xd == null ? z[i] : z[i] + step * xd[i];
      // log(1 + e^z) − y·z, written to stay finite for large |z|.
      sum += Math.max(zi, 0) + Math.log1p(Math.exp(-Math.abs(zi))) - (y[i] ? zi : 0);
    }
    return sum;
  }

  private static void gradient(SparseRows x, boolean[] y, double[] w, double[] z, double[] g) {
    int d = w.length;
    for (int j = 0; j < d - 1; j++) {
      g[j] = PENALTY * w[j];
    }
    double bias = 0;
    for (int i = 0; i < z.length; i++) {
      double r = sigmoid(z[i]) - (y[i] ? 1 : 0);
      bias += r;
      double v = r * x.scale[i];
      for (int k = x.offsets[i]; k < x.offsets[i + 1]; k++) {
        g[x.columns[k]] += v;
      }
    }
    g[d - 1] = bias;
  }

  /** xd = X·dir, the intercept included. */
  private static void multiply(SparseRows x, double[] dir, double[] xd) {
    for (int i = 0; i < xd.length; i++) {
      xd[i] = score(dir, x, i);
    }
  }

  private static double dot(double[] a, double[] b) {
    return dot(a, b, a.length);
  }

  private static double dot(double[] a, double[] b, int length) {
    double sum = 0;
    for (int j = 0; j < length; j++) {
      sum += a[j] * b[j];
    }
    return sum;
  }

  private static void axpy(double a, double[] x, double[] y) {
    for (int j = 0; j < y.length; j++) {
      y[j] += a * x[j];
    }
  }
}
