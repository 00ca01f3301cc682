package riffle.report;

import java.util.Arrays;
import riffle.model.Coverage;

/**
 * Counts per wave and code: substantive answers and those a person read, answers carrying each code
 * (among the read ones, and among all), which codes a person gave, and pairs of codes on read
 * answers.
 */
final class Tally {
  final CodeBits codebook;
  final int[] answers;
  final int[] nonAnswers;
  final int[] read;

  /** Read answers carrying code i (or a code below it), per wave. */
  final int[][] count;

  /** Answers carrying code i (or a code below it), read or not, per wave. */
  final int[][] all;

  /** Whether a person gave code i (or a code below it) to some answer. */
  final boolean[] human;

  final int[] pooled;
  int pooledRead;

  /** Pair counts on read answers per scope (one pooled, or one per wave), i × codes + j. */
  final int[][] both;

  private final long[] bits;
  private final long[] personBits;
  private final int[] present;

  Tally(CodeBits codebook, int waves, int pairScopes) {
    this.codebook = codebook;
    int codes = codebook.size();
    answers = new int[waves];
    nonAnswers = new int[waves];
    read = new int[waves];
    count = new int[waves][codes];
    all = new int[waves][codes];
    human = new boolean[codes];
    pooled = new int[codes];
    both = new int[pairScopes][pairScopes == 0 ? 0 : codes * codes];
    bits = new long[codebook.words];
    personBits = new long[codebook.words];
    present = new int[codes];
  }

  boolean anyCode(int wave) {
    for (int c : all[wave]) {
      if (c > 0) {
        return true;
      }
    }
    return false;
  }

  Coverage coverage(int wave, boolean random) {
    return Coverage.of(read[wave], answers[wave], nonAnswers[wave], random);
  }

  void add(ReportAnswer a, int wave, boolean perWave) {
    Arrays.fill(bits, 0);
    codebook.mark(a, bits, true);
    if (!a.substantive()) {
      nonAnswers[wave]++;
      return;
    }
    answers[wave]++;
    int[] carried = all[wave];
    for (int w = 0; w < bits.length; w++) {
      for (long word = bits[w]; word != 0; word &= word - 1) {
        carried[w * 64 + Long.numberOfTrailingZeros(word)]++;
      }
    }
    if (!a.read()) {
      return; // an unread answer carries no code a person gave (ReportAnswer checks it)
    }
    // What a person gave (or saw): every code but those only a rule gave.
    long[] person = bits;
    if (!a.byRule().isEmpty()) {
      Arrays.fill(personBits, 0);
      codebook.mark(a.id(), a.codes(), a.byRule(), personBits, true);
      person = personBits;
    }
    read[wave]++;
    pooledRead++;
    int k = 0;
    int[] counted = count[wave];
    for (int w = 0; w < person.length; w++) {
      for (long word = person[w]; word != 0; word &= word - 1) {
        int i = w * 64 + Long.numberOfTrailingZeros(word);
        human[i] = true;
        counted[i]++;
        pooled[i]++;
        present[k++] = i;
      }
    }
    if (both.length == 0) {
      return;
    }
    int[] pairs = both[perWave ? wave : 0];
    int codes = counted.length;
    for (int x = 0; x < k; x++) {
      for (int y = x + 1; y < k; y++) {
        pairs[present[x] * codes + present[y]]++;
      }
    }
  }
}
