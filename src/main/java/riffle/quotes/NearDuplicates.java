package riffle.quotes;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Groups wordings whose stem sets have a Jaccard similarity at or above a threshold, greedily: the
 * sets are taken in the given order (best quote first), and each joins the earliest group whose
 * first set (its representative) is similar enough, or starts a group of its own.
 *
 * <p>Candidate representatives are found with the prefix filter of Chaudhuri, Ganti and Kaushik
 * (2006) as used by Bayardo, Ma and Srikant ("Scaling up all pairs similarity search", WWW 2007):
 * with the tokens of every set ordered from rarest to most common, two sets x and y with J(x, y) ≥
 * t share a token among the first |x| − ⌈t·|x|⌉ + 1 of x and the first |y| − ⌈t·|y|⌉ + 1 of y. Only
 * representatives' prefixes are indexed, and every candidate is checked with the exact Jaccard
 * similarity, so the grouping equals the plain pairwise one.
 */
final class NearDuplicates {
  private NearDuplicates() {}

  /**
   * The group of each set, numbered 0, 1 … in order of first appearance.
   *
   * @param sets token ids of each wording, ascending and distinct
   * @param threshold the least Jaccard similarity of a member to its group's representative
   */
  static int[] groups(List<int[]> sets, double threshold) {
    Map<Integer, Integer> frequency = new HashMap<>();
    for (int[] s : sets) {
      for (int t : s) {
        frequency.merge(t, 1, Integer::sum);
      }
    }
    int[] group = new int[sets.size()];
    Map<Key, Integer> exact = new HashMap<>();
    List<int[]> reps = new ArrayList<>();
    Map<Integer, List<Integer>> index = new HashMap<>();
    int[] seen = new int[0];
    for (int i = 0; i < sets.size(); i++) {
      int[] s = sets.get(i);
      Key key = new Key(s);
      Integer known = exact.get(key);
      if (known != null) {
        group[i] = known;
        continue;
      }
      int[] ordered = byRarity(s, frequency);
      int prefix = prefixLength(s.length, threshold);
      int best = -1;
      for (int k = 0; k < prefix; k++) {
        List<Integer> holders = index.get(ordered[k]);
        if (holders == null) {
          continue;
        }
        for (int r : holders) {
          if (seen[r] == i + 1 || (best >= 0 && r >= best)) {
            continue;
          }
          seen[r] = i + 1;
          int[] rep = reps.get(r);
          if (rep.length >= threshold * s.length - 1e-9
              && s.length >= threshold * rep.length - 1e-9
              && jaccard(s, rep) >= threshold - 1e-12) {
            best = r;
          }
        }
      }
      if (best < 0) {
        best = reps.size();
        reps.add(s);
        if (seen.length <= best) {
          seen = Arrays.copyOf(seen, Math.max(16, seen.length * 2));
        }
        for (int k = 0; k < prefix; k++) {
          index.computeIfAbsent(ordered[k], t -> new ArrayList<>()).add(best);
        }
      }
      group[i] = best;
      exact.put(key, best);
    }
    return group;
  }

  /** How many of a set's rarest tokens must hold a shared one (at least 1). */
  static int prefixLength(int size, double threshold) {
    if (size == 0) {
      return 0;
    }
    return size - (int) Math.ceil(threshold * size - 1e-9) + 1;
  }

  /** |a ∩ b| / |a ∪ b| of two ascending, distinct arrays; 1 for two empty sets. */
  static double jaccard(int[] a, int[] b) {
    if (a.length == 0 && b.length == 0) {
      return 1;
    }
    int i = 0;
    int j = 0;
    int both = 0;
    while (i < a.length && j < b.length) {
      if (a[i] == b[j]) {
        both++;
        i++;
        j++;
      } else if (a[i] < b[j]) {
        i++;
      } else {
        j++;
      }
    }
    return both / (double) (a.length + b.length - both);
  }

  private static int[] byRarity(int[] s, Map<Integer, Integer> frequency) {
    Integer[] boxed = new Integer[s.length];
    for (int i = 0; i < s.length; i++) {
      boxed[i] = s[i];
    }
    Arrays.sort(
        boxed,
        (x, y) -> {
          int c = Integer.compare(frequency.get(x), frequency.get(y));
          return c != 0 ? c : Integer.compare(x, y);
        });
    int[] out = new int[s.length];
    for (int i = 0; i < s.length; i++) {
      out[i] = boxed[i];
    }
    return out;
  }

  /** An int array compared by content. */
  private record Key(int[] ids) {
    @Override
    public boolean equals(Object o) {
      return o instanceof Key k && Arrays.equals(ids, k.ids);
    }

    @Override
    public int hashCode() {
      return Arrays.hashCode(ids);
    }

    @Override
    public String toString() {
      return Arrays.toString(ids);
    }
  }
}
