package riffle.stats;

import java.util.Objects;

/**
 * Cohen's kappa for two raters who sorted the same items into the same k categories, with its
 * asymptotic standard error and Landis and Koch's words for its size.
 *
 * <p>κ = (p<sub>o</sub> − p<sub>e</sub>) / (1 − p<sub>e</sub>), with p<sub>o</sub> the share of
 * items on the diagonal and p<sub>e</sub> = Σ p<sub>i·</sub> p<sub>·i</sub> the agreement expected
 * by chance (Cohen J (1960) Educational and Psychological Measurement 20:37–46). The standard error
 * is the asymptotic one of Fleiss JL, Cohen J, Everitt BS (1969) Psychological Bulletin 72:323–327,
 * as SAS PROC FREQ reports it:
 *
 * <pre>
 * ASE = √((A + B − C) / ((1 − pe)² n))
 * A = Σ_i p_ii (1 − (p_i· + p_·i)(1 − κ))²
 * B = (1 − κ)² Σ_{i≠j} p_ij (p_·i + p_j·)²
 * C = (κ − pe (1 − κ))²
 * </pre>
 *
 * and the interval is κ ± z ASE.
 */
public final class CohenKappa {
  private CohenKappa() {}

  /**
   * Cohen's kappa with what goes with it.
   *
   * @param kappa κ
   * @param standardError the asymptotic standard error
   * @param interval κ ± z × standard error
   * @param observedAgreement p<sub>o</sub>, the share of items on which the raters agree
   * @param expectedAgreement p<sub>e</sub>, the agreement expected from the raters' margins
   * @param items the number of items rated
   */
  public record Kappa(
      double kappa,
      double standardError,
      Interval interval,
      double observedAgreement,
      double expectedAgreement,
      long items) {
    /** Checks the interval is present. */
    public Kappa {
      Objects.requireNonNull(interval, "interval");
    }

    /** Landis and Koch's word for this kappa ({@link CohenKappa#band(double)}). */
    public String band() {
      return CohenKappa.band(kappa);
    }
  }

  /** The 95% kappa of a k×k table whose rows are the first rater's categories. */
  public static Kappa of(long[][] table) {
    return of(table, 0.95);
  }

  /**
   * Cohen's kappa of a k×k agreement table.
   *
   * @param table counts, rows the first rater's categories and columns the second's, in the same
   *     order; square, at least 2×2, none negative
   * @param confidence the level of the interval, strictly between 0 and 1
   * @return κ, its standard error, interval and the two agreements
   * @throws IllegalArgumentException when the table is not square, is empty, holds a negative
   *     count, or the raters' margins make chance agreement certain (κ undefined)
   */
  public static Kappa of(long[][] table, double confidence) {
    Objects.requireNonNull(table, "table");
    int k = table.length;
    if (k < 2) {
      throw new IllegalArgumentException("kappa needs at least two categories");
    }
    double n = 0;
    for (long[] row : table) {
      if (row.length != k) {
        throw new IllegalArgumentException(
            "kappa needs a square table, got a row of " + row.length);
      }
      for (long x : row) {
        if (x < 0) {
          throw new IllegalArgumentException("counts must not be negative: " + x);
        }
        n += x;
      }
    }
    if (n == 0) {
      throw new IllegalArgumentException("kappa needs at least one rated item");
    }
    double[] rows = new double[k];
    double[] cols = new double[k];
    double po = 0;
    for (int i = 0; i < k; i++) {
      for (int j = 0; j < k; j++) {
        double p = table[i][j] / n;
        rows[i] += p;
        cols[j] += p;
        if (i == j) {
          po += p;
        }
      }
    }
    double pe = 0;
    for (int i = 0; i < k; i++) {
      pe += rows[i] * cols[i];
    }
    if (pe >= 1) {
      throw new IllegalArgumentException(
          "kappa is undefined: both raters used a single category, so chance agreement is 1");
    }
    double kappa = (po - pe) / (1 - pe);
    double a = 0;
    double b = 0;
    for (int i = 0; i < k; i++) {
      for (int j = 0; j < k; j++) {
        double p = table[i][j] / n;
        if (i == j) {
          double t = 1 - (rows[i] + cols[i]) * (1 - kappa);
          a += p * t * t;
        } else {
          double t = cols[i] + rows[j];
          b += p * t * t;
        }
      }
    }
    b *= (1 - kappa) * (1 - kappa);
    double c = kappa - pe * (1 - kappa);
    c *= c;
    double se = Math.sqrt(Math.max(0, a + b - c) / ((1 - pe) * (1 - pe) * n));
    double z = Normal.criticalValue(confidence);
    return new Kappa(kappa, se, new Interval(kappa - z * se, kappa + z * se), po, pe, (long) n);
  }

  /**
   * Landis and Koch's word for the strength of agreement a kappa shows (Landis JR, Koch GG (1977)
   * The measurement of observer agreement for categorical data. Biometrics 33:159–174), a
   * convention rather than a test: up to 0 "poor", up to 0.20 "slight", 0.40 "fair", 0.60
   * "moderate", 0.80 "substantial", above that "almost perfect".
   *
   * @param kappa a kappa value
   * @return the band's word, lower case
   * @throws IllegalArgumentException for NaN
   */
  public static String band(double kappa) {
    if (Double.isNaN(kappa)) {
      throw new IllegalArgumentException("kappa is not a number");
    }
    // Round to two decimals first, as the published bands are written (0.205 reads as 0.21).
    double k = Math.round(kappa * 100) / 100.0;
    String word;
    if (k <= 0) {
      word = "poor";
    } else if (k <= 0.20) {
      word = "slight";
    } else if (k <= 0.40) {
      word = "fair";
    } else if (k <= 0.60) {
      word = "moderate";
    } else if (k <= 0.80) {
      word = "substantial";
    } else {
      word = "almost perfect";
    }
    return word;
  }
}
