package riffle.coding;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import opennlp.tools.doccat.DoccatFactory;
import opennlp.tools.doccat.DoccatModel;
import opennlp.tools.doccat.DocumentCategorizerME;
import opennlp.tools.doccat.DocumentSample;
import opennlp.tools.util.ObjectStreamUtils;
import opennlp.tools.util.TrainingParameters;
import riffle.ingest.CodeList;
import riffle.ingest.Column;
import riffle.ingest.ImportSettings;
import riffle.ingest.NonAnswers;
import riffle.ingest.SurveyReader;
import riffle.ingest.SurveyRow;
import riffle.ingest.SurveyTable;
import riffle.model.Analysis;
import riffle.model.CodeMetrics;
import riffle.model.CodedExample;
import riffle.model.ColumnRole;
import riffle.model.InputException;
import riffle.model.Progress;
import riffle.model.Sentence;
import riffle.model.Suggestion;
import riffle.model.Token;
import riffle.text.TextAnalyzer;
import riffle.tools.SampleResponses;
import riffle.tools.SampleResponses.GeneratedAnswer;
import riffle.tools.SampleResponses.GeneratedRespondent;
import riffle.tools.SampleResponses.GeneratedWave;

/**
 * Bench command: how good Riffle's learned suggestions are on the demo's pre-coded pilot wave, side
 * by side with OpenNLP's document categorizer, and how long retraining takes.
 *
 * <ol>
 *   <li><b>Quality.</b> The pilot ({@code sample-responses/precoded-pilot.tsv}, read with {@code
 *       SurveyReader}, analysed with {@code TextAnalyzer}) holds both questions' answers, coded by
 *       hand; non-answers are left out. For each seed, the respondents are shuffled; the first 400
 *       are held out, and the others' answers, in that order (a respondent's two answers together),
 *       are the coded answers a project would have after N are coded. For N = 100, 300 and 1,000,
 *       each question gets its own engine (and its own baseline models) trained on its share of the
 *       N answers over the codes its column uses; both are scored by micro-F1 over every code of
 *       both questions on the held-out answers. Baseline: {@code DocumentCategorizerME}, one yes/no
 *       model per code, trained with {@code TrainingParameters.defaultParams()} and the default
 *       {@code DoccatFactory} (bag of words over the pipeline's tokens as written), a code
 *       predicted when "yes" is the best category; a code without positive training answers is
 *       never predicted.
 *   <li><b>Readiness.</b> Engines trained on the first 40 to 300 answers with {@code minExamples}
 *       2: each code's held-out precision and F1 against its number of training positives.
 *   <li><b>Retraining.</b> 5,000 coded answers generated afresh by the demo generator ({@code
 *       SampleResponses.generateDemoWaves} with seeds 1, 2, …; substantive answers of all waves,
 *       their planted themes as the codes), one engine over all 17 codes, timed after a warm-up.
 * </ol>
 *
 * Run with {@code mvn -q test-compile exec:java -Dexec.mainClass=riffle.coding.SuggestBench
 * [-Dexec.args="SEEDS RUNS"]} (default 3 seeds, 3 timed runs).
 */
public final class SuggestBench {
  private static final int HELD_OUT = 400;
  private static final int[] SIZES = {100, 300, 1000};
  private static final int[] CURVE_SIZES = {40, 60, 80, 100, 150, 200, 300};
  private static final int RETRAIN = 5000;

  private SuggestBench() {}

  /** One coded pilot answer. */
  private record Item(
      long id, String respondent, int question, Analysis analysis, Set<Long> codes) {}

  public static void main(String[] args) throws IOException, InputException {
    System.setProperty("org.slf4j.simpleLogger.log.opennlp", "warn");
    int seeds = args.length > 0 ? Integer.parseInt(args[0]) : 3;
    int runs = args.length > 1 ? Integer.parseInt(args[1]) : 3;
    TextAnalyzer analyzer = TextAnalyzer.english();
    SurveyTable table =
        SurveyReader.readFile(
            Path.of("sample-responses/precoded-pilot.tsv"), ImportSettings.defaults());
    Column id = table.columnsWith(ColumnRole.ID).get(0);
    List<Column> codesColumns = table.columnsWith(ColumnRole.CODES);
    Map<String, Long> codeIds = new TreeMap<>();
    List<Set<Long>> questionCodes = new ArrayList<>();
    List<String> texts = new ArrayList<>();
    List<String[]> raw = new ArrayList<>();
    for (int q = 0; q < codesColumns.size(); q++) {
      questionCodes.add(new TreeSet<>());
    }
    for (SurveyRow row : table.rows()) {
      for (int q = 0; q < codesColumns.size(); q++) {
        Column codes = codesColumns.get(q);
        String text = row.cells().get(codes.answersColumn());
        if (NonAnswers.isNonAnswer(text)) {
          continue;
        }
        texts.add(text);
        raw.add(new String[] {row.cell(id), Integer.toString(q), row.cell(codes)});
        for (String c : CodeList.split(row.cell(codes))) {
          codeIds.putIfAbsent(c.toLowerCase(Locale.ROOT), (long) codeIds.size() + 1);
        }
      }
    }
    List<Analysis> analyses = analyzer.analyzeAll(texts, Progress.NONE);
    List<Item> items = new ArrayList<>();
    for (int i = 0; i < texts.size(); i++) {
      String[] r = raw.get(i);
      Set<Long> codes = new TreeSet<>();
      for (String c : CodeList.split(r[2])) {
        codes.add(codeIds.get(c.toLowerCase(Locale.ROOT)));
      }
      int q = Integer.parseInt(r[1]);
      questionCodes.get(q).addAll(codes);
      items.add(new Item(i + 1, "Pilot/" + r[0], q, analyses.get(i), codes));
    }
    System.out.printf(
        Locale.ROOT,
        "pilot: %d respondents, %d coded answers (%s), %d codes; %d cores%n",
        table.rows().size(),
        items.size(),
        perQuestion(items, codesColumns.size()),
        codeIds.size(),
        Runtime.getRuntime().availableProcessors());

    quality(items, questionCodes, seeds);
    readiness(items, questionCodes, seeds);
    retraining(analyzer, runs);
  }

  private static String perQuestion(List<Item> items, int questions) {
    int[] n = new int[questions];
    for (Item it : items) {
      n[it.question]++;
    }
    List<String> parts = new ArrayList<>();
    for (int q = 0; q < questions; q++) {
      parts.add(n[q] + " to question " + (q + 1));
    }
    return String.join(", ", parts);
  }

  /** Splits the pilot for one seed: held-out answers first, then the training order. */
  private static List<List<Item>> split(List<Item> items, long seed) {
    List<String> respondents =
        new ArrayList<>(new TreeSet<>(items.stream().map(Item::respondent).toList()));
    Collections.shuffle(respondents, new Random(seed));
    Map<String, Integer> rank = new HashMap<>();
    for (int i = 0; i < respondents.size(); i++) {
      rank.put(respondents.get(i), i);
    }
    List<Item> ordered = new ArrayList<>(items);
    ordered.sort(
        (a, b) ->
            rank.get(a.respondent) != rank.get(b.respondent).intValue()
                ? Integer.compare(rank.get(a.respondent), rank.get(b.respondent))
                : Integer.compare(a.question, b.question));
    List<Item> heldOut = new ArrayList<>();
    List<Item> pool = new ArrayList<>();
    for (Item it : ordered) {
      (rank.get(it.respondent) < HELD_OUT ? heldOut : pool).add(it);
    }
    return List.of(heldOut, pool);
  }

  private static void quality(List<Item> items, List<Set<Long>> questionCodes, int seeds) {
    System.out.printf(
        Locale.ROOT,
        "%nmicro-F1 on held-out answers of %d respondents (per seed; both questions, every code)%n",
        HELD_OUT);
    System.out.printf(
        Locale.ROOT,
        "%-6s %-6s %8s %8s %10s %10s%n",
        "seed",
        "N",
        "riffle",
        "doccat",
        "riffle P/R",
        "doccat P/R");
    double[][] sums = new double[SIZES.length][2];
    for (long seed = 1; seed <= seeds; seed++) {
      List<List<Item>> parts = split(items, seed);
      List<Item> heldOut = parts.get(0);
      List<Item> pool = parts.get(1);
      for (int s = 0; s < SIZES.length; s++) {
        List<Item> train = pool.subList(0, Math.min(SIZES[s], pool.size()));
        ConfusionCounts riffle = ConfusionCounts.ZERO;
        ConfusionCounts doccat = ConfusionCounts.ZERO;
        for (int q = 0; q < questionCodes.size(); q++) {
          List<Item> tq = ofQuestion(train, q);
          List<Item> hq = ofQuestion(heldOut, q);
          riffle =
              riffle.plus(riffle(tq, hq, questionCodes.get(q), SuggestSettings.defaults()).total);
          doccat = doccat.plus(doccat(tq, hq, questionCodes.get(q)));
        }
        sums[s][0] += riffle.f1();
        sums[s][1] += doccat.f1();
        System.out.printf(
            Locale.ROOT,
            "%-6d %-6d %8.3f %8.3f %5.2f/%4.2f %5.2f/%4.2f%n",
            seed,
            train.size(),
            riffle.f1(),
            doccat.f1(),
            riffle.precision(),
            riffle.recall(),
            doccat.precision(),
            doccat.recall());
      }
    }
    for (int s = 0; s < SIZES.length; s++) {
      System.out.printf(
          Locale.ROOT,
          "%-6s %-6d %8.3f %8.3f%n",
          "mean",
          SIZES[s],
          sums[s][0] / seeds,
          sums[s][1] / seeds);
    }
  }

  private static List<Item> ofQuestion(List<Item> items, int q) {
    return items.stream().filter(it -> it.question == q).toList();
  }

  /** What one engine did on held-out answers. */
  private record Outcome(
      ConfusionCounts total, Map<Long, ConfusionCounts> perCode, List<CodeMetrics> metrics) {}

  private static Outcome riffle(
      List<Item> train, List<Item> heldOut, Set<Long> codes, SuggestSettings settings) {
    List<CodedExample> examples = new ArrayList<>();
    for (Item it : train) {
      examples.add(new CodedExample(it.id, it.respondent, it.analysis, it.codes));
    }
    SuggestionEngine engine = SuggestionEngine.train(examples, codes, settings);
    Map<Long, ConfusionCounts> perCode = new TreeMap<>();
    for (long c : codes) {
      perCode.put(c, ConfusionCounts.ZERO);
    }
    for (Item it : heldOut) {
      Set<Long> suggested = new LinkedHashSet<>();
      for (Suggestion s : engine.suggest(it.id, it.analysis, Set.of())) {
        suggested.add(s.codeId());
      }
      for (long c : codes) {
        perCode.put(c, perCode.get(c).plus(suggested.contains(c), it.codes.contains(c)));
      }
    }
    ConfusionCounts total = ConfusionCounts.ZERO;
    for (ConfusionCounts cc : perCode.values()) {
      total = total.plus(cc);
    }
    return new Outcome(total, perCode, engine.metrics());
  }

  private static ConfusionCounts doccat(List<Item> train, List<Item> heldOut, Set<Long> codes) {
    ConfusionCounts total = ConfusionCounts.ZERO;
    for (long c : codes) {
      List<DocumentSample> samples = new ArrayList<>();
      boolean any = false;
      for (Item it : train) {
        boolean yes = it.codes.contains(c);
        any |= yes;
        samples.add(new DocumentSample(yes ? "yes" : "no", tokens(it.analysis)));
      }
      DocumentCategorizerME model = null;
      if (any) {
        try {
          DoccatModel m =
              DocumentCategorizerME.train(
                  "eng",
                  ObjectStreamUtils.createObjectStream(samples),
                  TrainingParameters.defaultParams(),
                  new DoccatFactory());
          model = new DocumentCategorizerME(m);
        } catch (IOException e) {
          throw new IllegalStateException(e);
        }
      }
      for (Item it : heldOut) {
        boolean predicted =
            model != null
                && model.getBestCategory(model.categorize(tokens(it.analysis))).equals("yes");
        total = total.plus(predicted, it.codes.contains(c));
      }
    }
    return total;
  }

  private static String[] tokens(Analysis a) {
    List<String> out = new ArrayList<>();
    for (Sentence s : a.sentences()) {
      for (Token t : s.tokens()) {
        out.add(t.text());
      }
    }
    return out.toArray(String[]::new);
  }

  private static void readiness(List<Item> items, List<Set<Long>> questionCodes, int seeds) {
    int[] edges = {2, 4, 6, 8, 12, 20, 40, Integer.MAX_VALUE};
    int buckets = edges.length - 1;
    double[] f1 = new double[buckets];
    double[] precision = new double[buckets];
    double[] cvPrecision = new double[buckets];
    int[] models = new int[buckets];
    int[] predicted = new int[buckets];
    int[] cvDefined = new int[buckets];
    SuggestSettings settings = SuggestSettings.builder().minExamples(2).get();
    for (long seed = 1; seed <= seeds; seed++) {
      List<List<Item>> parts = split(items, seed);
      for (int size : CURVE_SIZES) {
        List<Item> train = parts.get(1).subList(0, size);
        for (int q = 0; q < questionCodes.size(); q++) {
          Outcome o =
              riffle(
                  ofQuestion(train, q),
                  ofQuestion(parts.get(0), q),
                  questionCodes.get(q),
                  settings);
          for (CodeMetrics m : o.metrics) {
            if (!m.ready()) {
              continue;
            }
            int b = 0;
            while (m.support() >= edges[b + 1]) {
              b++;
            }
            ConfusionCounts cc = o.perCode.get(m.codeId());
            models[b]++;
            f1[b] += cc.f1();
            if (!Double.isNaN(cc.precision())) {
              precision[b] += cc.precision();
              predicted[b]++;
            }
            if (m.precision() != null && !Double.isNaN(cc.precision())) {
              cvPrecision[b] += Math.abs(m.precision() - cc.precision());
              cvDefined[b]++;
            }
          }
        }
      }
    }
    System.out.printf(
        Locale.ROOT,
        "%nreadiness: per code, held-out figures by training positives (N = 40..300, %d seeds)%n",
        seeds);
    System.out.printf(
        Locale.ROOT,
        "%-10s %7s %9s %14s %20s%n",
        "positives",
        "models",
        "mean F1",
        "mean precision",
        "|CV P - held-out P|");
    for (int b = 0; b < buckets; b++) {
      String label =
          edges[b + 1] == Integer.MAX_VALUE ? edges[b] + "+" : edges[b] + "-" + (edges[b + 1] - 1);
      System.out.printf(
          Locale.ROOT,
          "%-10s %7d %9.3f %14.3f %20.3f%n",
          label,
          models[b],
          f1[b] / Math.max(1, models[b]),
          precision[b] / Math.max(1, predicted[b]),
          cvPrecision[b] / Math.max(1, cvDefined[b]));
    }
  }

  private static void retraining(TextAnalyzer analyzer, int runs) {
    List<String> texts = new ArrayList<>();
    List<List<String>> themes = new ArrayList<>();
    List<String> respondents = new ArrayList<>();
    for (long seed = 1; texts.size() < RETRAIN; seed++) {
      for (GeneratedWave w : SampleResponses.generateDemoWaves(seed)) {
        for (GeneratedRespondent r : w.respondents()) {
          for (GeneratedAnswer a : List.of(r.stopped(), r.chose())) {
            if (!a.nonAnswer() && texts.size() < RETRAIN) {
              texts.add(a.text());
              themes.add(a.themes());
              respondents.add(seed + "/" + w.name() + "/" + r.id());
            }
          }
        }
      }
    }
    List<Analysis> analyses = analyzer.analyzeAll(texts, Progress.NONE);
    Map<String, Long> ids = new TreeMap<>();
    List<CodedExample> examples = new ArrayList<>();
    for (int i = 0; i < texts.size(); i++) {
      Set<Long> codes = new TreeSet<>();
      for (String t : themes.get(i)) {
        codes.add(ids.computeIfAbsent(t, k -> (long) ids.size() + 1));
      }
      examples.add(new CodedExample(i + 1, respondents.get(i), analyses.get(i), codes));
    }
    List<Long> codes = new ArrayList<>(ids.values());
    SuggestSettings settings = SuggestSettings.defaults();
    long t0 = System.nanoTime();
    SuggestionEngine.train(examples, codes, settings);
    double first = (System.nanoTime() - t0) / 1e9;
    double best = Double.MAX_VALUE;
    double sum = 0;
    double cpu = 0;
    for (int r = 0; r < runs; r++) {
      long c = cpuNanos();
      long t = System.nanoTime();
      SuggestionEngine.train(examples, codes, settings);
      double sec = (System.nanoTime() - t) / 1e9;
      cpu += (cpuNanos() - c) / 1e9;
      best = Math.min(best, sec);
      sum += sec;
    }
    System.out.printf(
        Locale.ROOT,
        "%nretraining: %,d coded answers, %d codes, %d folds: first %.2f s, best %.2f s, mean %.2f s"
            + " of %d, mean CPU time %.2f s (%d cores, load average %.1f)%n",
        examples.size(),
        codes.size(),
        settings.folds(),
        first,
        best,
        sum / runs,
        runs,
        cpu / runs,
        Runtime.getRuntime().availableProcessors(),
        ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
  }

  /** CPU time of every live thread (the fork-join workers outlive one training run). */
  private static long cpuNanos() {
    ThreadMXBean threads = ManagementFactory.getThreadMXBean();
    long sum = 0;
    for (long id : threads.getAllThreadIds()) {
      sum += Math.max(0, threads.getThreadCpuTime(id));
    }
    return sum;
  }
}
