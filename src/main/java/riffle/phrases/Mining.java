package riffle.phrases;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import riffle.stats.ChiSquare;
import riffle.stats.LogLikelihood;

/**
 * One mining run over a list of answers, each on one of two sides (0: the mined answers or the
 * focus; 1: the reference of a keyness comparison): counts every candidate in one pass, keeps those
 * with enough support that pass the pair test, and scores them (C-value times the standalone
 * ratio).
 */
final class Mining {
  final PhraseSettings settings;
  final PhraseWords words = new PhraseWords();
  final Grams grams = new Grams();
  final List<PhraseDoc> docs;

  /** Answers with at least one analysed sentence, per side. */
  final int[] analysed = new int[2];

  /** Answers of exactly one sentence, both sides together. */
  int single;

  private final Candidates counter;

  /** A scored candidate. */
  record Scored(int node, int support, double score, String stems) {}

  Mining(PhraseSettings settings, List<PhraseDoc> docs, int[] sides) {
    this.settings = settings;
    this.docs = docs;
    this.counter = new Candidates(words, grams, settings.maxWords(), true);
    for (int d = 0; d < docs.size(); d++) {
      PhraseDoc doc = docs.get(d);
      if (doc.analysis().sentences().isEmpty()) {
        continue;
      }
      analysed[sides[d]]++;
      int docIndex = d;
      int side = sides[d];
      boolean one = doc.analysis().sentences().size() == 1;
      if (one) {
        single++;
      }
      counter.visit(
          doc.analysis(),
          (node, sentence, start, end, labelStart) -> grams.count(node, docIndex, side, one));
    }
  }

  /** Answers containing the node on both sides together. */
  int support(int node) {
    return grams.answers(node, 0) + grams.answers(node, 1);
  }

  /**
   * The candidates with at least {@code minSupport} answers (single words: {@link
   * PhraseSettings#SINGLE_WORD_SUPPORT} times the minimum support), two-word candidates passing
   * Dunning's test, and a positive C-value; in no particular order. The score is the C-value times
   * the standalone ratio min(1, (s + 1) / (r f + 1)): s of the f answers containing the candidate
   * are a single sentence, r is the share of single-sentence answers (see the package overview).
   */
  List<Scored> scored(int minSupport) {
    int size = grams.size();
    int[] index = new int[size];
    Arrays.fill(index, -1);
    List<Integer> kept = new ArrayList<>();
    for (int node = 2; node < size; node++) {
      int f = support(node);
      int len = grams.length(node);
      if (f < (len == 1 ? minSupport * PhraseSettings.SINGLE_WORD_SUPPORT : minSupport)) {
        continue;
      }
      if (len == 2 && !pairBelongsTogether(node)) {
        continue;
      }
      index[node] = kept.size();
      kept.add(node);
    }
    int n = kept.size();
    int[] length = new int[n];
    int[] frequency = new int[n];
    for (int i = 0; i < n; i++) {
      length[i] = grams.length(kept.get(i));
      frequency[i] = support(kept.get(i));
    }
    double[] value =
        CValue.compute(
            length,
            frequency,
            i -> nested(kept.get(i), index),
            len -> len == 1 ? PhraseSettings.SINGLE_WORD_WEIGHT : CValue.log2(len));
    double rate = single / (double) Math.max(1, analysed[0] + analysed[1]);
    List<Scored> out = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      if (value[i] > 0) {
        int node = kept.get(i);
        double alone = Math.min(1, (grams.alone(node) + 1) / (rate * frequency[i] + 1));
        out.add(new Scored(node, frequency[i], value[i] * alone, stems(node)));
      }
    }
    return out;
  }

  /**
   * Whether the two words of a two-word candidate belong together: G² of their adjacency table
   * (Dunning 1993) with p below {@link PhraseSettings#PAIR_P}, the pair more frequent than chance.
   */
  private boolean pairBelongsTogether(int node) {
    int[] w = grams.words(node);
    long[] k = counter.pairTable(w[0], w[1]);
    double total = (double) k[0] + k[1] + k[2] + k[3];
    double expected = ((double) k[0] + k[1]) * ((double) k[0] + k[2]) / total;
    if (k[0] <= expected) {
      return false;
    }
    return ChiSquare.upperTailDf1(LogLikelihood.g2(k[0], k[1], k[2], k[3])) < PhraseSettings.PAIR_P;
  }

  /**
   * The kept candidates nested in {@code node}, each once: for a plain candidate every shorter
   * contiguous part; for a negated one its shorter beginnings (a negated candidate always starts
   * where its negation's scope does).
   */
  private int[] nested(int node, int[] index) {
    int[] w = grams.words(node);
    int len = w.length;
    boolean negated = grams.negated(node);
    int root = negated ? Grams.NEGATED : Grams.PLAIN;
    int[] out = new int[len * (len + 1) / 2];
    int n = 0;
    for (int from = 0; from < (negated ? 1 : len); from++) {
      for (int to = from + 1; to <= len; to++) {
        if (to - from == len) {
          continue;
        }
        int sub = grams.lookup(root, w, from, to);
        if (sub >= 0 && index[sub] >= 0) {
          int k = index[sub];
          boolean seen = false;
          for (int j = 0; j < n && !seen; j++) {
            seen = out[j] == k;
          }
          if (!seen) {
            out[n++] = k;
          }
        }
      }
    }
    return Arrays.copyOf(out, n);
  }

  /** The node's stems, space-separated. */
  String stems(int node) {
    int[] w = grams.words(node);
    StringBuilder b = new StringBuilder();
    for (int i = 0; i < w.length; i++) {
      if (i > 0) {
        b.append(' ');
      }
      b.append(words.stemText(w[i]));
    }
    return b.toString();
  }

  /** Second pass: the occurrences of {@code nodes}. */
  Occurrences occurrences(int[] nodes) {
    return new Occurrences(words, grams, settings.maxWords(), docs, nodes, grams.size());
  }
}
