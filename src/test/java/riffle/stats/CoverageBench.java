package riffle.stats;

import java.util.Locale;
import java.util.Random;

/**
 * Bench command: how often the two candidate intervals for a share read from a random sample of a
 * finite wave cover the true share — Wilson with the finite-population correction and the exact
 * hypergeometric interval. Prints, for N answers with n read, the coverage summed exactly over the
 * hypergeometric distribution for every population count M from 1% to 99% of N (mean, least, most),
 * and the coverage in simulated waves (seeded) at a few true shares.
 *
 * <p>Run: {@code mvn -q test-compile exec:java -Dexec.mainClass=riffle.stats.CoverageBench}
 * (arguments: N, n, waves; defaults 2000 200 2000).
 */
public final class CoverageBench {
  private CoverageBench() {}

  public static void main(String[] args) {
    int population = args.length > 0 ? Integer.parseInt(args[0]) : 2_000;
    int n = args.length > 1 ? Integer.parseInt(args[1]) : 200;
    int waves = args.length > 2 ? Integer.parseInt(args[2]) : 2_000;
    Interval[] wilson = new Interval[n + 1];
    Interval[] exact = new Interval[n + 1];
    for (int r = 0; r <= n; r++) {
      wilson[r] = FinitePopulation.wilson(r, n, population, 0.95);
      exact[r] = FinitePopulation.exact(r, n, population, 0.95);
    }
    System.out.printf(Locale.ROOT, "N = %d, n = %d, 95%% intervals%n", population, n);
    double[][] stats = {{0, 1, 0, 0, 0}, {0, 1, 0, 0, 0}};
    int counted = 0;
    for (int m = population / 100; m <= population - population / 100; m++) {
      Hypergeometric h = new Hypergeometric(population, m, n);
      double truth = (double) m / population;
      double[] cover = new double[2];
      double[] width = new double[2];
      for (int r = Math.max(0, n - (population - m)); r <= Math.min(n, m); r++) {
        double pr = h.pmf(r);
        cover[0] += wilson[r].contains(truth) ? pr : 0;
        cover[1] += exact[r].contains(truth) ? pr : 0;
        width[0] += pr * wilson[r].width();
        width[1] += pr * exact[r].width();
      }
      for (int k = 0; k < 2; k++) {
        stats[k][0] += cover[k];
        stats[k][1] = Math.min(stats[k][1], cover[k]);
        stats[k][2] = Math.max(stats[k][2], cover[k]);
        stats[k][3] += cover[k] >= 0.935 && cover[k] <= 0.965 ? 1 : 0;
        stats[k][4] += width[k];
      }
      counted++;
    }
    String[] names = {"Wilson + FPC", "exact"};
    for (int k = 0; k < 2; k++) {
      System.out.printf(
          Locale.ROOT,
          "%-13s coverage over M = 1%%..99%% of N: mean %.4f, least %.4f, most %.4f;"
              + " inside 93.5-96.5%% for %.1f%% of M; mean width %.4f%n",
          names[k],
          stats[k][0] / counted,
          stats[k][1],
          stats[k][2],
          100 * stats[k][3] / counted,
          stats[k][4] / counted);
    }
    for (double share : new double[] {0.01, 0.05, 0.1, 0.2, 0.5}) {
      int carrying = (int) Math.round(share * population);
      double truth = (double) carrying / population;
      Hypergeometric h = new Hypergeometric(population, carrying, n);
      double[] expected = new double[2];
      for (int r = 0; r <= n; r++) {
        expected[0] += wilson[r].contains(truth) ? h.pmf(r) : 0;
        expected[1] += exact[r].contains(truth) ? h.pmf(r) : 0;
      }
      Random random = new Random(13L + carrying);
      int[] answers = new int[population];
      int[] covered = new int[2];
      for (int wave = 0; wave < waves; wave++) {
        for (int i = 0; i < population; i++) {
          answers[i] = i < carrying ? 1 : 0;
        }
        int r = 0;
        for (int i = 0; i < n; i++) {
          int j = i + random.nextInt(population - i);
          int t = answers[i];
          answers[i] = answers[j];
          answers[j] = t;
          r += answers[i];
        }
        covered[0] += wilson[r].contains(truth) ? 1 : 0;
        covered[1] += exact[r].contains(truth) ? 1 : 0;
      }
      System.out.printf(
          Locale.ROOT,
          "share %.2f: Wilson + FPC %.4f simulated (%.4f exact sum), exact %.4f simulated (%.4f)%n",
          share,
          (double) covered[0] / waves,
          expected[0],
          (double) covered[1] / waves,
          expected[1]);
    }
  }
}
