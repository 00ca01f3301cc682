package riffle.phrases;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import riffle.stats.ChiSquare;
import riffle.stats.LogLikelihood;

/**
 * Groups phrases that travel together.
 *
 * <p>Two phrases co-occur in an answer when it contains both at places that do not overlap (so a
 * phrase and a longer one containing it do not co-occur by construction). Over the N analysed
 * answers, a pair is <em>associated</em> when it co-occurs in at least {@code minAnswers} answers,
 * more often than chance (lift above 1), and Dunning's G² of its 2×2 table has p below {@link
 * PhraseSettings#ASSOCIATION_P}, and its Jaccard similarity (answers with both / answers with
 * either) is at least {@link PhraseSettings#JACCARD_FLOOR}. The similarity of an associated pair is
 * its Jaccard value; of any other pair 0.
 *
 * <p>Clusters are formed by complete-linkage agglomeration: starting from single phrases, the two
 * clusters whose least similar pair across them is the most similar merge, as long as that pair is
 * still associated (similarity at least the floor). So every two phrases of a cluster travel
 * together; a frequent phrase that goes with two unrelated ones cannot chain them into one cluster,
 * and a phrase never joins a longer one containing it (they never co-occur). Ties go to the
 * clusters whose best-ranked phrases rank highest, so the result depends on the input alone. Only
 * clusters of two or more phrases are reported.
 */
final class Clusters {
  private Clusters() {}

  /** Clusters are formed over at most this many of the best phrases. */
  static final int MAX_PHRASES = 200;

  /** A cluster as phrase indices (in report order) with its cohesion. */
  record Group(List<Integer> members, double cohesion) {}

  /**
   * @param spans per phrase, its occurrences as {doc, sentence, start, end} quadruples in answer
   *     order
   * @param answers per phrase, the number of answers containing it
   * @param total the number of analysed answers
   * @param minAnswers least number of answers a pair must share
   */
  static List<Group> group(List<int[]> spans, int[] answers, int total, int minAnswers) {
    int k = Math.min(spans.size(), MAX_PHRASES);
    double[][] similarity = similarity(spans, answers, total, minAnswers, k);
    List<List<Integer>> clusters = new ArrayList<>();
    for (int i = 0; i < k; i++) {
      List<Integer> one = new ArrayList<>();
      one.add(i);
      clusters.add(one);
    }
    while (true) {
      int bestA = -1;
      int bestB = -1;
      double best = PhraseSettings.JACCARD_FLOOR;
      // Complete linkage: two clusters merge only when every pair across them is associated.
      for (int a = 0; a < clusters.size(); a++) {
        for (int b = a + 1; b < clusters.size(); b++) {
          double s = weakest(clusters.get(a), clusters.get(b), similarity);
          if (s > best || (s == best && bestA < 0)) {
            best = s;
            bestA = a;
            bestB = b;
          }
        }
      }
      if (bestA < 0) {
        break;
      }
      clusters.get(bestA).addAll(clusters.get(bestB));
      clusters.get(bestA).sort(null);
      clusters.remove(bestB);
    }
    List<Group> out = new ArrayList<>();
    for (List<Integer> c : clusters) {
      if (c.size() >= 2) {
        out.add(new Group(List.copyOf(c), linkage(c, c, similarity)));
      }
    }
    return out;
  }

  /** The least similarity between a phrase of one cluster and a phrase of the other. */
  private static double weakest(List<Integer> a, List<Integer> b, double[][] similarity) {
    double min = Double.MAX_VALUE;
    for (int x : a) {
      for (int y : b) {
        min = Math.min(min, similarity[x][y]);
      }
    }
    return min;
  }

  /** Mean similarity over the pairs between two clusters (or within one, when a == b). */
  private static double linkage(List<Integer> a, List<Integer> b, double[][] similarity) {
    double sum = 0;
    int pairs = 0;
    for (int x : a) {
      for (int y : b) {
        if (a == b && y <= x) {
          continue;
        }
        sum += similarity[x][y];
        pairs++;
      }
    }
    return pairs == 0 ? 0 : sum / pairs;
  }

  private static double[][] similarity(
      List<int[]> spans, int[] answers, int total, int minAnswers, int k) {
    Map<Integer, List<int[]>> byDoc = new HashMap<>();
    for (int p = 0; p < k; p++) {
      int[] s = spans.get(p);
      for (int i = 0; i < s.length; i += 4) {
        byDoc
            .computeIfAbsent(s[i], d -> new ArrayList<>())
            .add(new int[] {p, s[i + 1], s[i + 2], s[i + 3]});
      }
    }
    int[][] together = new int[k][k];
    for (List<int[]> occ : byDoc.values()) {
      if (occ.size() < 2) {
        continue;
      }
      boolean[][] seen = new boolean[k][];
      for (int i = 0; i < occ.size(); i++) {
        for (int j = 0; j < occ.size(); j++) {
          int[] x = occ.get(i);
          int[] y = occ.get(j);
          if (x[0] >= y[0] || overlap(x, y)) {
            continue;
          }
          if (seen[x[0]] == null) {
            seen[x[0]] = new boolean[k];
          }
          if (!seen[x[0]][y[0]]) {
            seen[x[0]][y[0]] = true;
            together[x[0]][y[0]]++;
          }
        }
      }
    }
    double[][] similarity = new double[k][k];
    for (int a = 0; a < k; a++) {
      for (int b = a + 1; b < k; b++) {
        double s = associated(together[a][b], answers[a], answers[b], total, minAnswers);
        similarity[a][b] = s;
        similarity[b][a] = s;
      }
    }
    return similarity;
  }

  private static boolean overlap(int[] x, int[] y) {
    return x[1] == y[1] && x[2] < y[3] && y[2] < x[3];
  }

  /** The pair's Jaccard similarity when it is associated, else 0. */
  static double associated(int both, int a, int b, int total, int minAnswers) {
    if (both < minAnswers || (double) both * total <= (double) a * b) {
      return 0;
    }
    double g2 = LogLikelihood.g2(both, a - both, b - both, (long) total - a - b + both);
    if (ChiSquare.upperTailDf1(g2) >= PhraseSettings.ASSOCIATION_P) {
      return 0;
    }
    double jaccard = both / (double) (a + b - both);
    return jaccard >= PhraseSettings.JACCARD_FLOOR ? jaccard : 0;
  }
}
