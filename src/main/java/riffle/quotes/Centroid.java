package riffle.quotes;

import java.util.Arrays;

/**
 * A code's centroid: each content word weighted by the share of the code's answers that hold it
 * times its idf, as in Rocchio's class centroid over tf-idf vectors (Manning, Raghavan & Schütze,
 * Introduction to Information Retrieval, 2008, section 14.2). Sparse: word ids ascending.
 *
 * @param ids the words, ascending
 * @param weights their weights
 * @param norm the Euclidean norm of the weights
 */
record Centroid(int[] ids, double[] weights, double norm) {
  static final Centroid EMPTY = new Centroid(new int[0], new double[0], 0);

  /** The centroid from per-word answer counts over {@code answers} answers. */
  static Centroid of(int[] ids, int[] counts, int answers, double[] idf) {
    double[] w = new double[ids.length];
    double norm = 0;
    for (int i = 0; i < ids.length; i++) {
      w[i] = counts[i] / (double) answers * idf[ids[i]];
      norm += w[i] * w[i];
    }
    return new Centroid(ids, w, Math.sqrt(norm));
  }

  /** The weights as a dense array over {@code size} word ids. */
  double[] dense(int size) {
    double[] out = new double[size];
    for (int i = 0; i < ids.length; i++) {
      out[ids[i]] = weights[i];
    }
    return out;
  }

  /** Cosine of an idf-weighted set of words (ascending ids) with this centroid. */
  double cosine(int[] words, double[] idf) {
    if (norm == 0 || words.length == 0) {
      return 0;
    }
    double dot = 0;
    double own = 0;
    for (int t : words) {
      own += idf[t] * idf[t];
      int k = Arrays.binarySearch(ids, t);
      if (k >= 0) {
        dot += idf[t] * weights[k];
      }
    }
    return own == 0 ? 0 : dot / (Math.sqrt(own) * norm);
  }
}
