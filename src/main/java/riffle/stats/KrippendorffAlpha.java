package riffle.stats;

import java.util.Arrays;
import java.util.Objects;

/**
 * Krippendorff's alpha, the agreement of any number of coders on any number of units, with missing
 * values, for nominal, ordinal, interval and ratio data.
 *
 * <p>Source: Krippendorff K (2011) Computing Krippendorff's alpha-reliability. Annenberg School for
 * Communication, University of Pennsylvania. Only units with at least two values are pairable. The
 * coincidence matrix sums, over those units, o<sub>ck</sub> += (number of c–k pairs of values from
 * different coders) / (m<sub>u</sub> − 1); n<sub>c</sub> = Σ<sub>k</sub> o<sub>ck</sub> and n = Σ
 * n<sub>c</sub>, the number of pairable values. Then α = 1 − (n − 1) Σ o<sub>ck</sub> δ²<sub>ck
 * </sub> / Σ n<sub>c</sub> n<sub>k</sub> δ²<sub>ck</sub>, with the difference function δ² of the
 * {@link Level}. Krippendorff (2004) relies on data with α ≥ .800 and draws tentative conclusions
 * only from α ≥ .667.
 */
public final class KrippendorffAlpha {
  private KrippendorffAlpha() {}

  /** The level of measurement, which fixes the squared difference δ² between two values. */
  public enum Level {
    /** δ² = 0 for equal values, 1 otherwise. */
    NOMINAL,
    /**
     * δ²<sub>ck</sub> = (Σ<sub>g=c..k</sub> n<sub>g</sub> − (n<sub>c</sub> + n<sub>k</sub>)/2)²,
     * over the values in rank order.
     */
    ORDINAL,
    /** δ² = (c − k)². */
    INTERVAL,
    /** δ² = ((c − k)/(c + k))². */
    RATIO
  }

  /**
   * Krippendorff's alpha of a reliability data matrix.
   *
   * @param ratings one row per coder, one column per unit; {@link Double#NaN} marks a missing
   *     value. Rows must have the same length.
   * @param level the level of measurement
   * @return α, 1 for perfect agreement, 0 for agreement at chance level; NaN when the pairable
   *     values show no variation at all (every pairable value equal), where α is undefined
   * @throws IllegalArgumentException when rows differ in length, no unit has two values, or ratio
   *     data holds a negative value
   */
  public static double alpha(double[][] ratings, Level level) {
    Objects.requireNonNull(ratings, "ratings");
    Objects.requireNonNull(level, "level");
    if (ratings.length == 0) {
      throw new IllegalArgumentException("alpha needs at least one coder");
    }
    int units = ratings[0].length;
    for (double[] row : ratings) {
      if (row.length != units) {
        throw new IllegalArgumentException(
            "every coder needs a value (or NaN) for each of the " + units + " units");
      }
    }
    double[] values =
        Arrays.stream(ratings)
            .flatMapToDouble(Arrays::stream)
            .filter(v -> !Double.isNaN(v))
            .distinct()
            .sorted()
            .toArray();
    if (level == Level.RATIO && values.length > 0 && values[0] < 0) {
      throw new IllegalArgumentException("ratio data cannot hold negative values: " + values[0]);
    }
    int v = values.length;
    double[][] o = new double[v][v];
    int[] counts = new int[v];
    boolean pairable = false;
    for (int u = 0; u < units; u++) {
      Arrays.fill(counts, 0);
      int m = 0;
      for (double[] row : ratings) {
        if (!Double.isNaN(row[u])) {
          counts[Arrays.binarySearch(values, row[u])]++;
          m++;
        }
      }
      if (m < 2) {
        continue;
      }
      pairable = true;
      for (int c = 0; c < v; c++) {
        if (counts[c] == 0) {
          continue;
        }
        for (int k = 0; k < v; k++) {
          if (counts[k] == 0) {
            continue;
          }
          double pairs = c == k ? counts[c] * (counts[c] - 1.0) : (double) counts[c] * counts[k];
          o[c][k] += pairs / (m - 1);
        }
      }
    }
    if (!pairable) {
      throw new IllegalArgumentException("alpha needs at least one unit with two or more values");
    }
    double[] nc = new double[v];
    double n = 0;
    for (int c = 0; c < v; c++) {
      for (int k = 0; k < v; k++) {
        nc[c] += o[c][k];
      }
      n += nc[c];
    }
    double observed = 0;
    double expected = 0;
    for (int c = 0; c < v; c++) {
      for (int k = 0; k < v; k++) {
        if (c == k) {
          continue;
        }
        double d = delta2(level, values, nc, c, k);
        observed += o[c][k] * d;
        expected += nc[c] * nc[k] * d;
      }
    }
    if (expected == 0) {
      return Double.NaN;
    }
    return 1 - (n - 1) * observed / expected;
  }

  private static double delta2(Level level, double[] values, double[] nc, int c, int k) {
    switch (level) {
      case NOMINAL:
        return 1;
      case ORDINAL:
        {
          int from = Math.min(c, k);
          int to = Math.max(c, k);
          double sum = 0;
          for (int g = from; g <= to; g++) {
            sum += nc[g];
          }
          double d = sum - (nc[c] + nc[k]) / 2;
          return d * d;
        }
      case INTERVAL:
        {
          double d = values[c] - values[k];
          return d * d;
        }
      default:
        {
          double s = values[c] + values[k];
          if (s == 0) {
            return 0;
          }
          double d = (values[c] - values[k]) / s;
          return d * d;
        }
    }
  }
}
