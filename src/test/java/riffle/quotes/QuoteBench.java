package riffle.quotes;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import riffle.model.Code;
import riffle.model.QuoteFindings;

/**
 * Bench command: ranks quotes for every code of a 100,000-answer project. The demo waves' answers
 * (about 5,400, both questions) are analysed once and replicated with distinct ids and respondents
 * up to the target; each planted theme is split into two codes by replica (even and odd copies), so
 * the codebook has 34 codes under 8 themes (42 in all). Times {@link QuoteRanker#rank} over all of
 * them after warm-up runs and prints the median. Run with {@code mvn -q test-compile exec:java
 * -Dexec.mainClass=riffle.quotes.QuoteBench [-Dexec.args="ANSWERS RUNS"]}.
 */
public final class QuoteBench {
  private QuoteBench() {}

  public static void main(String[] args) {
    int target = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
    int runs = args.length > 1 ? Integer.parseInt(args[1]) : 7;
    long t0 = System.nanoTime();
    List<QuoteSource> distinct = DemoQuotes.answers();
    double analysing = (System.nanoTime() - t0) / 1e9;
    List<Code> demo = DemoQuotes.codebook();
    int themes = 17;
    List<Code> codebook = new ArrayList<>(demo);
    for (Code c : demo) {
      if (c.id() <= themes) {
        codebook.add(
            DemoQuotes.code(
                c.id() + themes,
                c.name() + " (second half)",
                c.parent(),
                c.direction(),
                100 + (int) c.id()));
      }
    }
    List<QuoteSource> answers = new ArrayList<>(target);
    for (int i = 0; answers.size() < target; i++) {
      QuoteSource s = distinct.get(i % distinct.size());
      int copy = i / distinct.size();
      Set<Long> codes = new TreeSet<>();
      for (long c : s.codes()) {
        codes.add(copy % 2 == 0 ? c : c + themes);
      }
      answers.add(
          new QuoteSource(
              i + 1L,
              s.respondent() + "-" + copy,
              s.wave(),
              s.question(),
              s.segments(),
              s.analysis(),
              codes,
              s.spans()));
    }
    long coded = answers.stream().filter(a -> !a.codes().isEmpty()).count();
    System.out.printf(
        Locale.ROOT,
        "project: %,d answers (%,d distinct, analysed in %.1f s), %,d coded, %d codes; %d cores,"
            + " max heap %,d MB%n",
        answers.size(),
        distinct.size(),
        analysing,
        coded,
        codebook.size(),
        Runtime.getRuntime().availableProcessors(),
        Runtime.getRuntime().maxMemory() >> 20);
    QuoteSettings settings = QuoteSettings.builder().latestWave("Wave 3").get();
    for (int i = 0; i < 2; i++) {
      QuoteRanker.rank(codebook, answers, settings);
    }
    double[] seconds = new double[runs];
    QuoteFindings last = null;
    for (int i = 0; i < runs; i++) {
      long start = System.nanoTime();
      last = QuoteRanker.rank(codebook, answers, settings);
      seconds[i] = (System.nanoTime() - start) / 1e9;
    }
    double[] sorted = seconds.clone();
    Arrays.sort(sorted);
    System.out.printf(
        Locale.ROOT,
        "rank all %d codes: median %.3f s over %d runs (min %.3f, max %.3f); %d quotes per code"
            + " listed, %d candidates%n",
        last.codes().size(),
        sorted[runs / 2],
        runs,
        sorted[0],
        sorted[runs - 1],
        last.codes().get(0).quotes().size(),
        last.quotes().size());
  }
}
