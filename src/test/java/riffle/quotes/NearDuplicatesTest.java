package riffle.quotes;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;

class NearDuplicatesTest {
  /** The plain greedy grouping: every set compared with every earlier representative. */
  static int[] pairwise(List<int[]> sets, double t) {
    int[] group = new int[sets.size()];
    List<int[]> reps = new ArrayList<>();
    for (int i = 0; i < sets.size(); i++) {
      int g = -1;
      for (int r = 0; r < reps.size() && g < 0; r++) {
        if (NearDuplicates.jaccard(sets.get(i), reps.get(r)) >= t) {
          g = r;
        }
      }
      if (g < 0) {
        g = reps.size();
        reps.add(sets.get(i));
      }
      group[i] = g;
    }
    return group;
  }

  @Test
  void thePrefixFilterGroupsExactlyLikeThePairwiseComparison() {
    Random random = new Random(42);
    for (int round = 0; round < 200; round++) {
      List<int[]> sets = new ArrayList<>();
      int n = 1 + random.nextInt(60);
      for (int i = 0; i < n; i++) {
        TreeSet<Integer> s = new TreeSet<>();
        int size = 1 + random.nextInt(8);
        while (s.size() < size) {
          s.add(random.nextInt(14));
        }
        sets.add(s.stream().mapToInt(Integer::intValue).toArray());
      }
      double t = new double[] {0.3, 0.5, 0.6, 0.75, 1.0}[round % 5];
      assertArrayEquals(pairwise(sets, t), NearDuplicates.groups(sets, t), "round " + round);
    }
  }

  @Test
  void jaccardIsSharedOverAll() {
    assertEquals(
        3 / 6.0, NearDuplicates.jaccard(new int[] {1, 2, 3, 4}, new int[] {2, 3, 4, 5, 6}), 1e-12);
    assertEquals(1.0, NearDuplicates.jaccard(new int[0], new int[0]));
    assertEquals(0.0, NearDuplicates.jaccard(new int[] {1}, new int[] {2}));
    assertEquals(0, NearDuplicates.prefixLength(0, 0.6));
    assertEquals(3, NearDuplicates.prefixLength(5, 0.6));
  }
}
