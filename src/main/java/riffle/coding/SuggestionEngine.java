package riffle.coding;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.IntPredicate;
import java.util.stream.IntStream;
import riffle.model.Analysis;
import riffle.model.CodeMetrics;
import riffle.model.CodedExample;
import riffle.model.Suggestion;

/**
 * Suggests codes for answers, learned from answers a human coded, and reports how often its
 * suggestions are right.
 *
 * <p>One binary logistic-regression model per code over the features of the text pipeline's
 * analysis; each ready code has a confidence threshold chosen by cross-validation grouped by
 * respondent, and metrics measured on held-out predictions only. The package overview describes the
 * features, the folds, the threshold rule and the readiness rule.
 *
 * <p>Immutable once trained and safe to query from any number of threads. Training the same
 * examples (in any order) with the same settings gives the same suggestions and metrics.
 */
public final class SuggestionEngine {
  private final long[] codes;
  private final double[][] weights;
  private final double[] thresholds;
  private final Map<String, Integer> columns;
  private final List<CodeMetrics> metrics;

  private SuggestionEngine(
      long[] codes,
      double[][] weights,
      double[] thresholds,
      Map<String, Integer> columns,
      List<CodeMetrics> metrics) {
    this.codes = codes;
    this.weights = weights;
    this.thresholds = thresholds;
    this.columns = columns;
    this.metrics = metrics;
  }

  /**
   * Trains one model per code and measures it.
   *
   * @param examples the answers humans coded (by hand or imported; never accepted suggestions or
   *     rule assignments); their order does not matter
   * @param codeIds the codes to learn; codes of the examples not listed here are ignored
   * @param settings folds, seed, target precision, readiness and feature cutoff
   * @return the trained engine
   * @throws IllegalArgumentException when an answer id appears twice
   */
  public static SuggestionEngine train(
      List<CodedExample> examples, Collection<Long> codeIds, SuggestSettings settings) {
    Objects.requireNonNull(examples, "examples");
    Objects.requireNonNull(codeIds, "codeIds");
    Objects.requireNonNull(settings, "settings");
    List<CodedExample> sorted = new ArrayList<>(examples);
    sorted.sort(Comparator.comparingLong(CodedExample::answerId));
    for (int i = 1; i < sorted.size(); i++) {
      if (sorted.get(i).answerId() == sorted.get(i - 1).answerId()) {
        throw new IllegalArgumentException(
            "answer " + sorted.get(i).answerId() + " appears twice among the coded examples");
      }
    }
    long[] codes = new TreeSet<>(codeIds).stream().mapToLong(Long::longValue).toArray();
    return new Training(sorted, codes, settings).run();
  }

  /**
   * Returns the metrics of every code, ready or not, in ascending order of code id.
   *
   * @return one row per code given to {@link #train}
   */
  public List<CodeMetrics> metrics() {
    return metrics;
  }

  /**
   * Suggests codes for one answer: ready codes whose confidence reaches their threshold, leaving
   * out codes the answer already carries, most confident first (ties: lower code id first).
   *
   * @param answerId the answer's id, copied into the suggestions
   * @param analysis the answer's analysis
   * @param alreadyAssigned the codes the answer already carries
   * @return the suggestions, possibly none (always none for an answer without known features)
   */
  public List<Suggestion> suggest(long answerId, Analysis analysis, Set<Long> alreadyAssigned) {
    Objects.requireNonNull(analysis, "analysis");
    Objects.requireNonNull(alreadyAssigned, "alreadyAssigned");
    Set<Integer> present = new HashSet<>();
    for (String f : Features.of(analysis)) {
      Integer c = columns.get(f);
      if (c != null) {
        present.add(c);
      }
    }
    if (present.isEmpty()) {
      return List.of();
    }
    int[] cols = present.stream().mapToInt(Integer::intValue).sorted().toArray();
    double scale = 1 / Math.sqrt(cols.length);
    List<Suggestion> out = new ArrayList<>();
    for (int c = 0; c < codes.length; c++) {
      if (weights[c] == null || alreadyAssigned.contains(codes[c])) {
        continue;
      }
      double[] w = weights[c];
      double sum = 0;
      for (int col : cols) {
        sum += w[col];
      }
      double p = LogisticRegression.sigmoid(w[w.length - 1] + scale * sum);
      if (p >= thresholds[c]) {
        out.add(new Suggestion(answerId, codes[c], p));
      }
    }
    out.sort(
        Comparator.comparingDouble(Suggestion::confidence)
            .reversed()
            .thenComparingLong(Suggestion::codeId));
    return List.copyOf(out);
  }

  /** One training run; kept apart so that the engine itself holds only what queries need. */
  private static final class Training {
    private final List<CodedExample> examples;
    private final long[] codes;
    private final SuggestSettings settings;
    private final int n;
    private final int[][] features;
    private final Map<String, Integer> ids = new HashMap<>();
    private final boolean[][] labels;

    Training(List<CodedExample> examples, long[] codes, SuggestSettings settings) {
      this.examples = examples;
      this.codes = codes;
      this.settings = settings;
      this.n = examples.size();
      this.features = new int[n][];
      for (int i = 0; i < n; i++) {
        List<String> names = Features.of(examples.get(i).analysis());
        int[] row = new int[names.size()];
        for (int k = 0; k < row.length; k++) {
          Integer id = ids.putIfAbsent(names.get(k), ids.size());
          row[k] = id == null ? ids.size() - 1 : id;
        }
        Arrays.sort(row);
        features[i] = row;
      }
      this.labels = new boolean[codes.length][n];
      for (int c = 0; c < codes.length; c++) {
        for (int i = 0; i < n; i++) {
          labels[c][i] = examples.get(i).codes().contains(codes[c]);
        }
      }
    }

    SuggestionEngine run() {
      List<String> respondents = examples.stream().map(CodedExample::respondent).toList();
      int[] fold = Folds.assign(respondents, settings.folds(), settings.seed());
      int k = Folds.count(new HashSet<>(respondents).size(), settings.folds());
      boolean[] ready = new boolean[codes.length];
      int[] support = new int[codes.length];
      for (int c = 0; c < codes.length; c++) {
        for (boolean l : labels[c]) {
          support[c] += l ? 1 : 0;
        }
        ready[c] =
            k >= 2
                && support[c] >= settings.minExamples()
                && n - support[c] >= settings.minExamples();
      }
      int[] readyCodes = IntStream.range(0, codes.length).filter(c -> ready[c]).toArray();

      // Held-out confidences: for each fold, models trained on the other folds score it.
      int[][] trainRows = new int[k][];
      int[][] testRows = new int[k][];
      for (int f = 0; f < k; f++) {
        int ff = f;
        trainRows[f] = IntStream.range(0, n).filter(i -> fold[i] != ff).toArray();
        testRows[f] = IntStream.range(0, n).filter(i -> fold[i] == ff).toArray();
      }
      SparseRows[] train = new SparseRows[k];
      SparseRows[] test = new SparseRows[k];
      IntStream.range(0, readyCodes.length == 0 ? 0 : k)
          .parallel()
          .forEach(
              f -> {
                int[] vocabulary =
                    SparseRows.vocabulary(features, trainRows[f], ids.size(), settings.cutoff());
                train[f] = SparseRows.of(features, trainRows[f], vocabulary);
                test[f] = SparseRows.of(features, testRows[f], vocabulary);
              });
      double[][] heldOut = new double[codes.length][];
      for (int c : readyCodes) {
        heldOut[c] = new double[n];
      }
      IntStream.range(0, readyCodes.length * k)
          .parallel()
          .forEach(
              task -> {
                int c = readyCodes[task / k];
                int f = task % k;
                boolean[] y = new boolean[trainRows[f].length];
                for (int r = 0; r < y.length; r++) {
                  y[r] = labels[c][trainRows[f][r]];
                }
                double[] w = LogisticRegression.fit(train[f], y);
                for (int r = 0; r < testRows[f].length; r++) {
                  heldOut[c][testRows[f][r]] =
                      LogisticRegression.sigmoid(LogisticRegression.score(w, test[f], r));
                }
              });

      // The final models learn from every example.
      int[] all = IntStream.range(0, n).toArray();
      int[] vocabulary = SparseRows.vocabulary(features, all, ids.size(), settings.cutoff());
      SparseRows rows = SparseRows.of(features, all, vocabulary);
      double[][] weights = new double[codes.length][];
      IntStream.of(readyCodes)
          .parallel()
          .forEach(c -> weights[c] = LogisticRegression.fit(rows, labels[c]));
      Map<String, Integer> columns = new HashMap<>();
      for (Map.Entry<String, Integer> e : ids.entrySet()) {
        int col = vocabulary[e.getValue()];
        if (col >= 0) {
          columns.put(e.getKey(), col);
        }
      }

      double[] thresholds = new double[codes.length];
      List<CodeMetrics> metrics = new ArrayList<>(codes.length);
      for (int c = 0; c < codes.length; c++) {
        if (!ready[c]) {
          thresholds[c] = Double.POSITIVE_INFINITY;
          metrics.add(new CodeMetrics(codes[c], n, support[c], null, null, null, null, false));
          continue;
        }
        int cc = c;
        thresholds[c] = threshold(heldOut[c], labels[c], i -> true);
        // Honest counts: each fold is judged by a threshold chosen on the other folds only.
        ConfusionCounts counts = ConfusionCounts.ZERO;
        for (int f = 0; f < k; f++) {
          int ff = f;
          double t = threshold(heldOut[c], labels[c], i -> fold[i] != ff);
          for (int i : testRows[f]) {
            counts = counts.plus(heldOut[cc][i] >= t, labels[cc][i]);
          }
        }
        metrics.add(
            new CodeMetrics(
                codes[c],
                n,
                support[c],
                orNull(counts.precision()),
                orNull(counts.recall()),
                orNull(counts.f1()),
                thresholds[c],
                true));
      }
      return new SuggestionEngine(
          codes, weights, thresholds, Map.copyOf(columns), List.copyOf(metrics));
    }

    private double threshold(double[] scores, boolean[] y, IntPredicate use) {
      Integer[] order = IntStream.range(0, n).filter(use).boxed().toArray(Integer[]::new);
      Arrays.sort(
          order, Comparator.<Integer>comparingDouble(i -> -scores[i]).thenComparingInt(i -> i));
      double[] s = new double[order.length];
      boolean[] l = new boolean[order.length];
      for (int j = 0; j < order.length; j++) {
        s[j] = scores[order[j]];
        l[j] = y[order[j]];
      }
      return Thresholds.choose(s, l, settings.targetPrecision());
    }
  }

  private static Double orNull(double v) {
    return Double.isNaN(v) ? null : v;
  }
}
