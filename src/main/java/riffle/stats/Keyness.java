package riffle.stats;

/**
 * Keyness of an item between a focus corpus and a reference corpus: how much more (or less) often
 * it occurs in the focus than expected, as a significance measure (log-likelihood) and an effect
 * size (Log Ratio). Arguments follow the convention of the corpus-linguistics literature: {@code a}
 * and {@code b} are the item's frequencies in the focus and the reference, {@code c} and {@code d}
 * the sizes of the two corpora.
 */
public final class Keyness {
  private Keyness() {}

  /** The frequency Log Ratio uses in place of a zero (Hardie 2014). */
  public static final double ZERO_FREQUENCY = 0.5;

  /**
   * Log-likelihood in the two-term form of Rayson P, Garside R (2000) Comparing corpora using
   * frequency profiling. Proceedings of the Workshop on Comparing Corpora (ACL 2000), 1–6: with the
   * expected frequencies E1 = c (a + b) / (c + d) and E2 = d (a + b) / (c + d), LL = 2 (a ln(a/E1)
   * + b ln(b/E2)), a zero frequency contributing nothing. This is the form of the UCREL
   * log-likelihood calculator; it leaves out the two cells of "everything else", which matter
   * little when the item is rare in both corpora.
   *
   * @param a frequency in the focus corpus
   * @param b frequency in the reference corpus
   * @param c size of the focus corpus (at least {@code a})
   * @param d size of the reference corpus (at least {@code b})
   * @return LL, never negative (it does not say which way the difference goes; compare a/c with
   *     b/d, or read the sign of {@link #logRatio})
   * @throws IllegalArgumentException when a count is negative, a size is zero or a frequency
   *     exceeds its corpus
   */
  public static double logLikelihood(long a, long b, long c, long d) {
    check(a, b, c, d);
    double total = (double) a + b;
    if (total == 0) {
      return 0;
    }
    double e1 = c * total / ((double) c + d);
    double e2 = d * total / ((double) c + d);
    double sum = (a == 0 ? 0 : a * Math.log(a / e1)) + (b == 0 ? 0 : b * Math.log(b / e2));
    return Math.max(0, 2 * sum);
  }

  /**
   * Log Ratio (Hardie A (2014) Log Ratio – an informal introduction. ESRC Centre for Corpus
   * Approaches to Social Science, Lancaster University): the binary logarithm of the ratio of
   * relative frequencies, log2((a/c) / (b/d)). 1 means twice as frequent in the focus, −1 half as
   * frequent, 0 equally frequent. A zero frequency is replaced by {@value #ZERO_FREQUENCY}, as
   * Hardie proposes, so an item absent from one corpus gets a finite value; an item absent from
   * both gets 0 (no difference to report).
   *
   * @param a frequency in the focus corpus
   * @param b frequency in the reference corpus
   * @param c size of the focus corpus (at least {@code a})
   * @param d size of the reference corpus (at least {@code b})
   * @return the Log Ratio, positive when relatively more frequent in the focus
   * @throws IllegalArgumentException when a count is negative, a size is zero or a frequency
   *     exceeds its corpus
   */
  public static double logRatio(long a, long b, long c, long d) {
    check(a, b, c, d);
    if (a == 0 && b == 0) {
      return 0;
    }
    double fa = a == 0 ? ZERO_FREQUENCY : a;
    double fb = b == 0 ? ZERO_FREQUENCY : b;
    return Math.log((fa / c) / (fb / d)) / Math.log(2);
  }

  private static void check(long a, long b, long c, long d) {
    if (a < 0 || b < 0 || c <= 0 || d <= 0 || a > c || b > d) {
      throw new IllegalArgumentException(
          "need 0 <= a <= c and 0 <= b <= d with both sizes above zero, got a="
              + a
              + ", b="
              + b
              + ", c="
              + c
              + ", d="
              + d);
    }
  }
}
