package riffle.phrases;

import java.util.Arrays;

/**
 * Word sequences interned as a trie of stem ids: each sequence is a node whose id extends its
 * prefix by one word, so a sequence of up to {@code maxWords} words costs one map lookup per word
 * and no string is built while counting. Two roots separate plain sequences from negated ones (see
 * {@link Candidates}). Each node also carries the counters of one mining run: in how many answers
 * it was found, on each of two sides (a focus and a reference for keyness). Not thread-safe; one
 * instance per mining run.
 */
final class Grams {
  static final int PLAIN = 0;
  static final int NEGATED = 1;

  private final LongIntMap children = new LongIntMap(1 << 16);
  private int size = 2;
  private int[] parent = new int[1 << 12];
  private int[] word = new int[1 << 12];
  private int[] length = new int[1 << 12];
  private int[][] answers = {new int[1 << 12], new int[1 << 12]};
  private int[] alone = new int[1 << 12];
  private int[] lastDoc = new int[1 << 12];

  Grams() {
    parent[PLAIN] = -1;
    parent[NEGATED] = -1;
    Arrays.fill(lastDoc, -1);
  }

  int size() {
    return size;
  }

  /** The node extending {@code node} by {@code stem}, created when new. */
  int child(int node, int stem) {
    long key = ((long) node << 32) | stem;
    int id = children.get(key);
    if (id != LongIntMap.MISSING) {
      return id;
    }
    if (size == parent.length) {
      grow();
    }
    id = size++;
    parent[id] = node;
    word[id] = stem;
    length[id] = node <= NEGATED ? 1 : length[node] + 1;
    children.put(key, id);
    return id;
  }

  /** The node extending {@code node} by {@code stem}, or -1 when no such sequence was seen. */
  int find(int node, int stem) {
    if (node < 0) {
      return -1;
    }
    return children.get(((long) node << 32) | stem);
  }

  /**
   * Counts answer {@code doc} (numbered from 0 in visiting order) once for {@code node}.
   *
   * @param single whether the answer is a single sentence
   */
  void count(int node, int doc, int side, boolean single) {
    if (lastDoc[node] != doc) {
      lastDoc[node] = doc;
      answers[side][node]++;
      if (single) {
        alone[node]++;
      }
    }
  }

  /** In how many single-sentence answers (of both sides) the node was counted. */
  int alone(int node) {
    return alone[node];
  }

  /** In how many answers of {@code side} the node was counted. */
  int answers(int node, int side) {
    return answers[side][node];
  }

  int length(int node) {
    return length[node];
  }

  boolean negated(int node) {
    int n = node;
    while (parent[n] >= 0) {
      n = parent[n];
    }
    return n == NEGATED;
  }

  /** The stem ids of the sequence, in order. */
  int[] words(int node) {
    int[] out = new int[length[node]];
    int n = node;
    for (int i = out.length - 1; i >= 0; i--) {
      out[i] = word[n];
      n = parent[n];
    }
    return out;
  }

  /** The node of {@code words[from, to)} under {@code root}, or -1 when never seen. */
  int lookup(int root, int[] words, int from, int to) {
    int n = root;
    for (int i = from; i < to && n >= 0; i++) {
      n = find(n, words[i]);
    }
    return n;
  }

  private void grow() {
    int capacity = parent.length * 2;
    parent = Arrays.copyOf(parent, capacity);
    word = Arrays.copyOf(word, capacity);
    length = Arrays.copyOf(length, capacity);
    answers[0] = Arrays.copyOf(answers[0], capacity);
    answers[1] = Arrays.copyOf(answers[1], capacity);
    alone = Arrays.copyOf(alone, capacity);
    int old = lastDoc.length;
    lastDoc = Arrays.copyOf(lastDoc, capacity);
    Arrays.fill(lastDoc, old, capacity, -1);
  }
}
