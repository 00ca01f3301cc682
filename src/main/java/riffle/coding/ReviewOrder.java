package riffle.coding;

import java.util.Arrays;
import java.util.Collection;
import java.util.Comparator;
import java.util.Set;
import riffle.model.ReadSample;
import riffle.model.ReviewQueue;

/**
 * The seeded random order of a review queue, and whether the answers read so far are a random
 * sample of it.
 *
 * <p>The order sorts a queue's answers by a key that mixes the seed with each answer's id: the
 * id-th output of SplitMix64 started from the seed, mix(seed + id · γ) with γ = 0x9E3779B97F4A7C15
 * and Stafford's "variant 13" finaliser (Steele GL, Lea D, Flood CH (2014) Fast splittable
 * pseudorandom number generators. OOPSLA '14, 453–472), compared as unsigned numbers. Because the
 * key of an answer depends on its own id only, the order needs no storage, answers added to a wave
 * later fall into random places among the others, and the answers already there keep their order.
 * For one seed the key is a bijection of the id (γ is odd, the finaliser is invertible), so two
 * answers never tie; ties would be broken by id.
 *
 * <p>Pure functions, safe from any thread.
 */
public final class ReviewOrder {
  private static final long GAMMA = 0x9E3779B97F4A7C15L;

  private ReviewOrder() {}

  /** The key of an answer in the order of {@code seed}. */
  static long key(long seed, long answerId) {
    return mix(seed + answerId * GAMMA);
  }

  /** SplitMix64's finaliser (Stafford's variant 13 of MurmurHash3's). */
  static long mix(long z) {
    z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
    z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
    return z ^ (z >>> 31);
  }

  /**
   * A seed for a new queue from some entropy (such as the clock), mixed and cut to the range a
   * queue stores (0 to {@link ReviewQueue#MAX_SEED}).
   */
  public static long seed(long entropy) {
    return mix(entropy + GAMMA) & ReviewQueue.MAX_SEED;
  }

  /**
   * The answers in the queue's random order.
   *
   * @param seed the queue's seed
   * @param answerIds the queue's answers, in any order, each once
   * @return the ids, first to read first
   */
  public static long[] order(long seed, Collection<Long> answerIds) {
    int n = answerIds.size();
    long[] ids = new long[n];
    long[] keys = new long[n];
    Integer[] at = new Integer[n];
    int i = 0;
    for (long id : answerIds) {
      ids[i] = id;
      keys[i] = key(seed, id);
      at[i] = i;
      i++;
    }
    Comparator<Integer> byKey = (x, y) -> Long.compareUnsigned(keys[x], keys[y]);
    Arrays.sort(at, byKey.thenComparingLong(x -> ids[x]));
    long[] out = new long[n];
    for (int k = 0; k < n; k++) {
      out[k] = ids[at[k]];
    }
    return out;
  }

  /**
   * Whether the read answers are a random sample of the queue: exactly its first k answers, k ≥ 1.
   * Read answers that are not in the order (non-answers, other segments) do not count.
   *
   * @param order the queue's answers in its order ({@link #order})
   * @param read the answers a person has read (of the queue's wave and question)
   * @return the sample's size k, or how many were read outside the order and how many it skipped
   */
  public static ReadSample sample(long[] order, Set<Long> read) {
    int prefix = 0;
    while (prefix < order.length && read.contains(order[prefix])) {
      prefix++;
    }
    int total = prefix;
    int last = prefix - 1;
    for (int k = prefix; k < order.length; k++) {
      if (read.contains(order[k])) {
        total++;
        last = k;
      }
    }
    int outside = total - prefix;
    int skipped = last + 1 - total;
    return new ReadSample(
        order.length, total, prefix, outside, skipped, prefix >= 1 && outside == 0);
  }
}
