package riffle.stats;

import java.util.Objects;

/**
 * The Chao1 estimate of how many classes (species, themes) exist, from how often each observed
 * class was seen, with its variance and a 95% interval, following the formulas of Colwell RK
 * EstimateS user's guide (appendix B) and Chao A (1984, 1987).
 *
 * <p>With S<sub>obs</sub> classes observed, f<sub>1</sub> seen once and f<sub>2</sub> seen twice:
 *
 * <ul>
 *   <li>classic: S<sub>obs</sub> + f<sub>1</sub>² / (2 f<sub>2</sub>), variance f<sub>2</sub> (r²/2
 *       + r³ + r⁴/4) with r = f<sub>1</sub>/f<sub>2</sub>. It is undefined for f<sub>2</sub> = 0,
 *       where EstimateS (and this class) falls back to the bias-corrected form;
 *   <li>bias-corrected: S<sub>obs</sub> + f<sub>1</sub>(f<sub>1</sub> − 1) / (2(f<sub>2</sub> +
 *       1)), variance f<sub>1</sub>(f<sub>1</sub>−1)/(2(f<sub>2</sub>+1)) +
 *       f<sub>1</sub>(2f<sub>1</sub>−1)²/(4(f<sub>2</sub>+1)²) +
 *       f<sub>1</sub>²f<sub>2</sub>(f<sub>1</sub>−1)²/(4(f<sub>2</sub>+1)⁴); with f<sub>2</sub> = 0
 *       EstimateS uses f<sub>1</sub>(f<sub>1</sub>−1)/2 + f<sub>1</sub>(2f<sub>1</sub>−1)²/4 −
 *       f<sub>1</sub>⁴/(4 Ŝ) instead;
 *   <li>with no singletons (f<sub>1</sub> = 0) the estimate is S<sub>obs</sub> and the variance is
 *       EstimateS's Σ<sub>k</sub> f<sub>k</sub>(e<sup>−k</sup> − e<sup>−2k</sup>) − (Σ<sub>k</sub>
 *       k e<sup>−k</sup> f<sub>k</sub>)² / N, N the total count.
 * </ul>
 *
 * <p>The interval is log-linear (Chao 1987): with T = Ŝ − S<sub>obs</sub> &gt; 0 and K = exp(z
 * √(ln(1 + var/T²))), it runs from S<sub>obs</sub> + T/K to S<sub>obs</sub> + T K, so it never
 * falls below what was observed. When T = 0 (no singletons, or a single singleton under the
 * bias-corrected form) EstimateS's alternative applies: with P = Σ<sub>k</sub> f<sub>k</sub>
 * e<sup>−k</sup> / S<sub>obs</sub>, the limits are S<sub>obs</sub>/(1 − P) ∓ z √var / (1 − P), the
 * lower one raised to S<sub>obs</sub>.
 *
 * @param observed S<sub>obs</sub>, the number of classes seen at least once
 * @param singletons f<sub>1</sub>
 * @param doubletons f<sub>2</sub>
 * @param estimate Ŝ, the estimated number of classes
 * @param variance the variance of Ŝ
 * @param interval the interval for the number of classes
 * @param biasCorrected whether the bias-corrected formula was used (always so when f<sub>2</sub> =
 *     0)
 */
public record Chao1(
    int observed,
    long singletons,
    long doubletons,
    double estimate,
    double variance,
    Interval interval,
    boolean biasCorrected) {
  /** Checks the interval is present. */
  public Chao1 {
    Objects.requireNonNull(interval, "interval");
  }

  /** The standard deviation of the estimate, √variance. */
  public double standardDeviation() {
    return Math.sqrt(variance);
  }

  /** The bias-corrected Chao1 of the class counts, with a 95% interval. */
  public static Chao1 biasCorrected(long[] counts) {
    return estimate(counts, true, 0.95);
  }

  /**
   * The classic Chao1 of the class counts, with a 95% interval; bias-corrected when no class was
   * seen exactly twice.
   */
  public static Chao1 classic(long[] counts) {
    return estimate(counts, false, 0.95);
  }

  /**
   * The Chao1 estimate of the number of classes.
   *
   * @param counts how often each class was seen; zeros (classes not seen) are ignored
   * @param biasCorrected whether to use the bias-corrected form (recommended; the classic form is
   *     used only when asked and f<sub>2</sub> &gt; 0)
   * @param confidence the level of the interval, strictly between 0 and 1
   * @return the estimate, its variance and interval
   * @throws IllegalArgumentException when a count is negative or no class was seen
   */
  public static Chao1 estimate(long[] counts, boolean biasCorrected, double confidence) {
    Objects.requireNonNull(counts, "counts");
    int s = 0;
    long f1 = 0;
    long f2 = 0;
    double total = 0;
    for (long c : counts) {
      if (c < 0) {
        throw new IllegalArgumentException("counts must not be negative: " + c);
      }
      if (c > 0) {
        s++;
        total += c;
      }
      if (c == 1) {
        f1++;
      } else if (c == 2) {
        f2++;
      }
    }
    if (s == 0) {
      throw new IllegalArgumentException("Chao1 needs at least one class seen");
    }
    double z = Normal.criticalValue(confidence);
    boolean corrected = biasCorrected || f2 == 0;
    double a = f1;
    double b = f2;
    double estimate;
    double variance;
    if (f1 == 0) {
      estimate = s;
      double part1 = 0;
      double part2 = 0;
      for (long c : counts) {
        if (c > 0) {
          part1 += Math.exp(-c) - Math.exp(-2.0 * c);
          part2 += c * Math.exp(-c);
        }
      }
      variance = part1 - part2 * part2 / total;
    } else if (!corrected) {
      estimate = s + a * a / (2 * b);
      double r = a / b;
      variance = b * (r * r / 2 + r * r * r + r * r * r * r / 4);
    } else if (f2 > 0) {
      estimate = s + a * (a - 1) / (2 * (b + 1));
      variance =
          a * (a - 1) / (2 * (b + 1))
              + a * Math.pow(2 * a - 1, 2) / (4 * Math.pow(b + 1, 2))
              + a * a * b * Math.pow(a - 1, 2) / (4 * Math.pow(b + 1, 4));
    } else {
      estimate = s + a * (a - 1) / 2;
      variance = a * (a - 1) / 2 + a * Math.pow(2 * a - 1, 2) / 4 - Math.pow(a, 4) / (4 * estimate);
    }
    variance = Math.max(0, variance);
    double t = estimate - s;
    Interval interval;
    if (t > 0) {
      double k = Math.exp(z * Math.sqrt(Math.log(1 + variance / (t * t))));
      interval = new Interval(s + t / k, s + t * k);
    } else {
      double p = 0;
      for (long c : counts) {
        if (c > 0) {
          p += Math.exp(-c);
        }
      }
      p /= s;
      double centre = s / (1 - p);
      double half = z * Math.sqrt(variance) / (1 - p);
      interval = new Interval(Math.max(s, centre - half), Math.max(s, centre + half));
    }
    return new Chao1(s, f1, f2, estimate, variance, interval, corrected);
  }
}
