package riffle.coding;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.SplittableRandom;
import org.apache.commons.math3.stat.inference.ChiSquareTest;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import riffle.model.ReadSample;
import riffle.model.ReviewQueue;

class ReviewOrderTest {

  static List<Long> ids(long from, long to) {
    List<Long> out = new ArrayList<>();
    for (long id = from; id <= to; id++) {
      out.add(id);
    }
    return out;
  }

  static Set<Long> readAt(long[] order, int... positions) {
    Set<Long> out = new HashSet<>();
    for (int p : positions) {
      out.add(order[p]);
    }
    return out;
  }

  @Test
  @DisplayName("The key is SplitMix64's id-th output: the JDK's SplittableRandom, same seed")
  void theKeyIsSplitMix64AsTheJdkImplementsIt() {
    for (long seed : new long[] {0, 1, 42, ReviewQueue.MAX_SEED, -7}) {
      SplittableRandom reference = new SplittableRandom(seed);
      for (long id = 1; id <= 1_000; id++) {
        assertEquals(
            reference.nextLong(), ReviewOrder.key(seed, id), "seed " + seed + ", id " + id);
      }
    }
  }

  @Test
  void theSameSeedGivesTheSameOrderHoweverTheAnswersAreListed() {
    List<Long> answers = ids(1, 200);
    long[] first = ReviewOrder.order(7, answers);
    List<Long> shuffled = new ArrayList<>(answers);
    Collections.shuffle(shuffled, new Random(3L));
    assertArrayEquals(first, ReviewOrder.order(7, shuffled));
    long[] sorted = first.clone();
    Arrays.sort(sorted);
    assertArrayEquals(answers.stream().mapToLong(Long::longValue).toArray(), sorted, "each once");
    assertFalse(Arrays.equals(first, sorted), "not the stored order");
    assertFalse(Arrays.equals(first, ReviewOrder.order(8, answers)), "another seed, another order");
  }

  @Test
  void answersAddedLaterFallIntoRandomPlacesAndTheOthersKeepTheirOrder() {
    long[] before = ReviewOrder.order(2026, ids(1, 100));
    long[] after = ReviewOrder.order(2026, ids(1, 150));
    List<Long> kept = new ArrayList<>();
    int firstNew = -1;
    int lastNew = -1;
    for (int i = 0; i < after.length; i++) {
      if (after[i] <= 100) {
        kept.add(after[i]);
      } else {
        firstNew = firstNew < 0 ? i : firstNew;
        lastNew = i;
      }
    }
    assertEquals(Arrays.stream(before).boxed().toList(), kept);
    assertTrue(firstNew < 20 && lastNew > 130, "new answers spread: " + firstNew + ".." + lastNew);
  }

  /**
   * The first 10 of 60 answers, over 3,000 seeds: each answer should be among them equally often
   * (500 times); commons-math3's chi-square test of the counts against the uniform expectation.
   */
  @Test
  void theStartOfTheOrderIsAUniformRandomPick() {
    List<Long> answers = ids(1_001, 1_060);
    long[] counts = new long[answers.size()];
    for (long seed = 0; seed < 3_000; seed++) {
      long[] order = ReviewOrder.order(ReviewOrder.seed(seed), answers);
      for (int i = 0; i < 10; i++) {
        counts[(int) (order[i] - 1_001)]++;
      }
    }
    double[] expected = new double[counts.length];
    Arrays.fill(expected, 3_000 * 10.0 / counts.length);
    double p = new ChiSquareTest().chiSquareTest(expected, counts);
    assertTrue(p > 0.001, "uniform pick, p = " + p + " for " + Arrays.toString(counts));
  }

  @Test
  void newSeedsStayInTheRangeEveryJsonReaderKeepsExact() {
    Set<Long> seen = new HashSet<>();
    for (long entropy = 0; entropy < 1_000; entropy++) {
      long seed = ReviewOrder.seed(entropy);
      assertTrue(seed >= 0 && seed <= ReviewQueue.MAX_SEED, Long.toString(seed));
      seen.add(seed);
    }
    assertEquals(1_000, seen.size());
    assertNotEquals(ReviewOrder.seed(1), ReviewOrder.seed(2));
  }

  @Test
  void theFirstKReadAreARandomSample() {
    long[] order = ReviewOrder.order(5, ids(1, 40));
    ReadSample s = ReviewOrder.sample(order, readAt(order, 0, 1, 2, 3, 4, 5, 6));
    assertEquals(new ReadSample(40, 7, 7, 0, 0, true), s);
    assertFalse(s.complete());
    Set<Long> all = new HashSet<>(ids(1, 40));
    ReadSample census = ReviewOrder.sample(order, all);
    assertTrue(census.random() && census.complete());
    assertEquals(40, census.sample());
  }

  @Test
  void aGapMakesTheReadAnswersNoSampleAndSaysWhatToReadToMendIt() {
    long[] order = ReviewOrder.order(5, ids(1, 40));
    // Read 1st, 2nd, 4th and 9th: two read outside the order, five skipped before them.
    ReadSample gap = ReviewOrder.sample(order, readAt(order, 0, 1, 3, 8));
    assertEquals(new ReadSample(40, 4, 2, 2, 5, false), gap);
    // Reading the skipped ones mends it: a sample of 9.
    ReadSample mended = ReviewOrder.sample(order, readAt(order, 0, 1, 2, 3, 4, 5, 6, 7, 8));
    assertEquals(new ReadSample(40, 9, 9, 0, 0, true), mended);
  }

  @Test
  void answersPickedBySearchAreReadOutsideTheOrder() {
    long[] order = ReviewOrder.order(11, ids(1, 40));
    ReadSample picked = ReviewOrder.sample(order, readAt(order, 17, 30));
    assertEquals(new ReadSample(40, 2, 0, 2, 29, false), picked);
    ReadSample none = ReviewOrder.sample(order, Set.of());
    assertEquals(new ReadSample(40, 0, 0, 0, 0, false), none);
    // Answers read that the queue does not hold (a non-answer, another segment) do not count.
    ReadSample other = ReviewOrder.sample(order, Set.of(order[0], 999L));
    assertEquals(new ReadSample(40, 1, 1, 0, 0, true), other);
  }

  @Test
  void anAnswerAddedAmongTheReadOnesOpensAGapUntilItIsRead() {
    long[] before = ReviewOrder.order(99, ids(1, 30));
    Set<Long> read = new HashSet<>();
    for (int i = 0; i < 20; i++) {
      read.add(before[i]);
    }
    assertTrue(ReviewOrder.sample(before, read).random());
    long[] after = ReviewOrder.order(99, ids(1, 60));
    ReadSample grown = ReviewOrder.sample(after, read);
    assertFalse(grown.random(), "new answers fell among the first twenty: " + grown);
    assertTrue(grown.skipped() > 0);
  }
}
