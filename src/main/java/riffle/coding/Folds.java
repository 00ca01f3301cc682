package riffle.coding;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeSet;

/** Cross-validation folds grouped by respondent. Stateless; thread-safe. */
final class Folds {
  private Folds() {}

  /**
   * Assigns every example to a fold so that all answers of a respondent share one fold.
   *
   * <p>The distinct respondent keys are sorted, shuffled with a {@link Random} seeded by {@code
   * seed}, and dealt to the folds in turn; so the folds depend only on the set of respondents and
   * the seed, not on the order of the examples, and their numbers of respondents differ by at most
   * one.
   *
   * @param respondents each example's respondent key
   * @param folds the number of folds wanted; fewer are used when there are fewer respondents
   * @param seed the shuffle's seed
   * @return each example's fold, from 0 to {@link #count} − 1
   */
  static int[] assign(List<String> respondents, int folds, long seed) {
    List<String> keys = new ArrayList<>(new TreeSet<>(respondents));
    Collections.shuffle(keys, new Random(seed));
    int k = count(keys.size(), folds);
    Map<String, Integer> fold = new HashMap<>();
    for (int i = 0; i < keys.size(); i++) {
      fold.put(keys.get(i), i % Math.max(1, k));
    }
    int[] out = new int[respondents.size()];
    for (int i = 0; i < out.length; i++) {
      out[i] = fold.get(respondents.get(i));
    }
    return out;
  }

  /** Returns how many folds {@link #assign} uses for this many respondents. */
  static int count(int respondents, int folds) {
    return Math.min(respondents, folds);
  }
}
