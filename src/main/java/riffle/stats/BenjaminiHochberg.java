package riffle.stats;

import java.util.Arrays;
import java.util.Comparator;
import java.util.Objects;

/**
 * The Benjamini–Hochberg step-up procedure, which controls the false discovery rate across many
 * tests (Benjamini Y, Hochberg Y (1995) Controlling the false discovery rate. JRSS B 57:289–300).
 */
public final class BenjaminiHochberg {
  private BenjaminiHochberg() {}

  /**
   * Adjusted p-values: with the m p-values sorted ascending, p̃<sub>(i)</sub> = min over j ≥ i of m
   * p<sub>(j)</sub> / j, capped at 1 (the form of R's {@code p.adjust(method = "BH")}). A test is
   * rejected at false discovery rate q exactly when its adjusted p-value is at most q.
   *
   * @param p the p-values, each in [0, 1], in any order
   * @return the adjusted p-values in the same order as the input; monotone in the raw p-values
   * @throws IllegalArgumentException when a p-value is outside [0, 1] or NaN
   */
  public static double[] adjust(double[] p) {
    check(p);
    int m = p.length;
    Integer[] order = new Integer[m];
    for (int i = 0; i < m; i++) {
      order[i] = i;
    }
    Arrays.sort(order, Comparator.comparingDouble(i -> p[i]));
    double[] adjusted = new double[m];
    double running = 1;
    for (int rank = m; rank >= 1; rank--) {
      int i = order[rank - 1];
      running = Math.min(running, p[i] * m / rank);
      adjusted[i] = running;
    }
    return adjusted;
  }

  /**
   * How many hypotheses the procedure rejects at false discovery rate q: the largest k with
   * p<sub>(k)</sub> ≤ k q / m (0 when there is none).
   *
   * @param p the p-values, each in [0, 1], in any order
   * @param q the false discovery rate, in (0, 1]
   * @return the number of rejections; they are the k smallest p-values
   * @throws IllegalArgumentException when a p-value or q is out of range
   */
  public static int rejections(double[] p, double q) {
    if (!(q > 0 && q <= 1)) {
      throw new IllegalArgumentException("false discovery rate must lie in (0, 1], got " + q);
    }
    check(p);
    double[] sorted = p.clone();
    Arrays.sort(sorted);
    int m = sorted.length;
    for (int k = m; k >= 1; k--) {
      if (sorted[k - 1] <= k * q / m) {
        return k;
      }
    }
    return 0;
  }

  private static void check(double[] p) {
    Objects.requireNonNull(p, "p");
    for (int i = 0; i < p.length; i++) {
      if (!(p[i] >= 0 && p[i] <= 1)) {
        throw new IllegalArgumentException("p-value " + (i + 1) + " is not in [0, 1]: " + p[i]);
      }
    }
  }
}
