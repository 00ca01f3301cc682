package riffle.coding;

/**
 * Answers as rows of binary features, in compressed sparse row form, each row scaled to unit
 * length. Immutable after construction; safe to share between threads.
 */
final class SparseRows {
  /** Where row i's columns start in {@link #columns}; row i ends where row i + 1 starts. */
  final int[] offsets;

  /** The columns of every row, ascending within a row. */
  final int[] columns;

  /** The value of every present feature of a row: 1 / sqrt(features in the row), or 0. */
  final double[] scale;

  /** The number of columns. */
  final int width;

  private SparseRows(int[] offsets, int[] columns, double[] scale, int width) {
    this.offsets = offsets;
    this.columns = columns;
    this.scale = scale;
    this.width = width;
  }

  /** Returns the number of rows. */
  int height() {
    return scale.length;
  }

  /**
   * Keeps the features that occur in at least {@code cutoff} of the chosen answers and numbers them
   * in ascending order of their global number.
   *
   * @param features every answer's global feature numbers, ascending and distinct
   * @param chosen the answers whose counts decide
   * @param featureCount how many global feature numbers there are
   * @param cutoff the least number of chosen answers a feature must occur in
   * @return for each global feature its column, or -1 when it is dropped
   */
  static int[] vocabulary(int[][] features, int[] chosen, int featureCount, int cutoff) {
    int[] counts = new int[featureCount];
    for (int i : chosen) {
      for (int f : features[i]) {
        counts[f]++;
      }
    }
    int[] column = new int[featureCount];
    int next = 0;
    for (int f = 0; f < featureCount; f++) {
      column[f] = counts[f] >= cutoff ? next++ : -1;
    }
    return column;
  }

  /** Returns the number of columns a vocabulary keeps. */
  static int width(int[] vocabulary) {
    int w = 0;
    for (int c : vocabulary) {
      w += c >= 0 ? 1 : 0;
    }
    return w;
  }

  /**
   * Builds the rows of some answers over a vocabulary.
   *
   * @param features every answer's global feature numbers, ascending and distinct
   * @param rows the answers to build rows for, in row order
   * @param vocabulary the columns from {@link #vocabulary}
   * @return the rows
   */
  static SparseRows of(int[][] features, int[] rows, int[] vocabulary) {
    int[] offsets = new int[rows.length + 1];
    int total = 0;
    for (int r = 0; r < rows.length; r++) {
      for (int f : features[rows[r]]) {
        total += vocabulary[f] >= 0 ? 1 : 0;
      }
      offsets[r + 1] = total;
    }
    int[] columns = new int[total];
    double[] scale = new double[rows.length];
    int k = 0;
    for (int r = 0; r < rows.length; r++) {
      for (int f : features[rows[r]]) {
        if (vocabulary[f] >= 0) {
          columns[k++] = vocabulary[f];
        }
      }
      int n = offsets[r + 1] - offsets[r];
      scale[r] = n == 0 ? 0 : 1 / Math.sqrt(n);
    }
    return new SparseRows(offsets, columns, scale, width(vocabulary));
  }
}
