package riffle.phrases;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import riffle.model.Analysis;
import riffle.model.Progress;
import riffle.text.TextAnalyzer;
import riffle.tools.SampleResponses;
import riffle.tools.SampleResponses.GeneratedAnswer;
import riffle.tools.SampleResponses.GeneratedRespondent;
import riffle.tools.SampleResponses.GeneratedWave;

/**
 * Bench command: builds a project-sized set of analysed answers from the demo generator (the demo
 * waves for seeds 1, 2, 3 … until about 100,000 answers; wave names repeat across seeds, so each
 * wave and question holds a few thousand answers per seed), then times {@link PhraseMiner#mine} for
 * one wave and question, for one question across all waves, and {@link PhraseMiner#keyness} between
 * two waves, each after a warm-up run. Run with {@code mvn -q test-compile exec:java
 * -Dexec.mainClass=riffle.phrases.PhraseBench [-Dexec.args="ANSWERS RUNS"]}.
 */
public final class PhraseBench {
  private PhraseBench() {}

  public static void main(String[] args) {
    int target = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
    int runs = args.length > 1 ? Integer.parseInt(args[1]) : 5;
    List<String> texts = new ArrayList<>();
    List<String[]> meta = new ArrayList<>();
    for (long seed = 1; texts.size() < target; seed++) {
      for (GeneratedWave w : SampleResponses.generateDemoWaves(seed)) {
        for (GeneratedRespondent r : w.respondents()) {
          for (GeneratedAnswer a : List.of(r.stopped(), r.chose())) {
            texts.add(a.text());
            meta.add(new String[] {seed + "-" + r.id(), w.name(), a.question().text(), r.device()});
          }
        }
      }
    }
    long t0 = System.nanoTime();
    List<Analysis> analyses = TextAnalyzer.english().analyzeAll(texts, Progress.NONE);
    double analysing = (System.nanoTime() - t0) / 1e9;
    List<PhraseDoc> docs = new ArrayList<>(texts.size());
    for (int i = 0; i < texts.size(); i++) {
      String[] m = meta.get(i);
      docs.add(new PhraseDoc(i, m[0], m[1], m[2], Map.of("device", m[3]), analyses.get(i)));
    }
    System.out.printf(
        Locale.ROOT,
        "corpus: %,d answers analysed in %.1f s, %d cores, max heap %,d MB%n",
        docs.size(),
        analysing,
        Runtime.getRuntime().availableProcessors(),
        Runtime.getRuntime().maxMemory() >> 20);

    PhraseMiner miner = PhraseMiner.create(PhraseSettings.defaults());
    String stopped = SampleResponses.STOPPED_QUESTION;
    PhraseFilter pilot = PhraseFilter.all().withQuestion(stopped).withWave("Pilot");
    PhraseFilter wave2 = PhraseFilter.all().withQuestion(stopped).withWave("Wave 2");
    PhraseFilter wave3 = PhraseFilter.all().withQuestion(stopped).withWave("Wave 3");
    PhraseFilter question = PhraseFilter.all().withQuestion(stopped);
    time("mine: Pilot, one question", count(docs, pilot), runs, () -> miner.mine(docs, pilot));
    time("mine: Wave 2, one question", count(docs, wave2), runs, () -> miner.mine(docs, wave2));
    time(
        "mine: all waves, one question",
        count(docs, question),
        runs,
        () -> miner.mine(docs, question));
    time(
        "keyness: Wave 3 vs Wave 2, one question",
        count(docs, wave3) + count(docs, wave2),
        runs,
        () -> miner.keyness(docs, wave3, wave2));
    time(
        "keyness: Wave 3 vs all other waves, one question",
        count(docs, question),
        runs,
        () -> miner.keyness(docs, wave3, question));
  }

  private static int count(List<PhraseDoc> docs, PhraseFilter filter) {
    int n = 0;
    for (PhraseDoc d : docs) {
      n += filter.accepts(d) ? 1 : 0;
    }
    return n;
  }

  private interface Work {
    Object run();
  }

  private static void time(String label, int size, int runs, Work work) {
    long t0 = System.nanoTime();
    work.run();
    double first = (System.nanoTime() - t0) / 1e6;
    double best = Double.MAX_VALUE;
    double sum = 0;
    for (int i = 0; i < runs; i++) {
      long t = System.nanoTime();
      work.run();
      double ms = (System.nanoTime() - t) / 1e6;
      best = Math.min(best, ms);
      sum += ms;
    }
    System.out.printf(
        Locale.ROOT,
        "%-50s %,7d answers: first %5.0f ms, best %5.0f ms, mean %5.0f ms of %d%n",
        label,
        size,
        first,
        best,
        sum / runs,
        runs);
  }
}
