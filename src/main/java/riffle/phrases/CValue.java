package riffle.phrases;

import java.util.Arrays;
import java.util.Comparator;
import java.util.function.IntFunction;
import java.util.function.IntToDoubleFunction;

/**
 * Termhood by the C-value of Frantzi K, Ananiadou S, Mima H (2000) Automatic recognition of
 * multi-word terms: the C-value/NC-value method. International Journal on Digital Libraries
 * 3(2):115–130, §2.3.
 *
 * <p>For a candidate a of |a| words with frequency f(a):
 *
 * <pre>
 *   C-value(a) = log2|a| · f(a)                          if a is nested in no longer candidate
 *   C-value(a) = log2|a| · (f(a) − t(a) / c(a))          otherwise
 * </pre>
 *
 * where c(a) is the number of longer candidates that contain a and t(a) the frequency of a inside
 * them. As in the paper's algorithm, candidates are processed from the longest down, and each
 * processed candidate b adds f(b) − t(b) to t(a), and one to c(a), of every shorter candidate a it
 * contains, so a term is only charged for the occurrences of a longer term that are not already
 * charged to an even longer one.
 *
 * <p>The paper's weight log2|a| is zero for a single word: C-value ranks multi-word terms. Riffle
 * also lists frequent single nouns and adjectives, so the caller supplies the weight of each length
 * (see {@link PhraseSettings#SINGLE_WORD_WEIGHT}).
 */
final class CValue {
  private CValue() {}

  /** The paper's length weight, log2 of the number of words. */
  static double log2(int words) {
    return Math.log(words) / Math.log(2);
  }

  /**
   * The C-value of every candidate.
   *
   * @param length number of words of each candidate
   * @param frequency frequency of each candidate
   * @param nested for a candidate, the indices of the shorter candidates it contains (each once)
   * @param weight the length weight for a number of words (the paper: {@link #log2})
   * @return the C-value of each candidate, in input order
   */
  static double[] compute(
      int[] length, int[] frequency, IntFunction<int[]> nested, IntToDoubleFunction weight) {
    int n = length.length;
    Integer[] order = new Integer[n];
    for (int i = 0; i < n; i++) {
      order[i] = i;
    }
    Arrays.sort(order, Comparator.comparingInt((Integer i) -> -length[i]).thenComparing(i -> i));
    double[] t = new double[n];
    int[] c = new int[n];
    double[] value = new double[n];
    for (int a : order) {
      double f = frequency[a];
      double w = weight.applyAsDouble(length[a]);
      value[a] = c[a] == 0 ? w * f : w * (f - t[a] / c[a]);
      double unclaimed = f - t[a];
      for (int b : nested.apply(a)) {
        t[b] += unclaimed;
        c[b]++;
      }
    }
    return value;
  }
}
