package riffle.tools;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import opennlp.tools.chunker.ChunkerME;
import opennlp.tools.chunker.ChunkerModel;
import opennlp.tools.postag.POSModel;
import opennlp.tools.postag.POSTagFormat;
import opennlp.tools.postag.POSTaggerME;
import opennlp.tools.sentdetect.SentenceDetectorME;
import opennlp.tools.sentdetect.SentenceModel;
import opennlp.tools.tokenize.TokenizerME;
import opennlp.tools.tokenize.TokenizerModel;
import riffle.model.Analysis;
import riffle.model.Progress;
import riffle.model.Sentence;
import riffle.model.Token;
import riffle.text.TextAnalyzer;

/**
 * Bench command: on a seeded corpus of 20,000 survey-like answers (the demo generator with other
 * seeds), times (a) a naive baseline — one thread, stock OpenNLP sentence detector, tokenizer,
 * tagger and chunker called in sequence per answer — and (b) Riffle's pipeline, in one run, and
 * reports how far their tags agree. Run with {@code mvn -q test-compile exec:java
 * -Dexec.mainClass=riffle.tools.AnalysisBench [-Dexec.args=ANSWERS]}.
 */
public final class AnalysisBench {
  private AnalysisBench() {}

  public static void main(String[] args) throws IOException {
    int size = args.length > 0 ? Integer.parseInt(args[0]) : 20_000;
    List<String> corpus = corpus(size, 1L);
    List<String> warmup = corpus(2_000, 99L);
    Baseline baseline = new Baseline();
    baseline.run(warmup);
    TextAnalyzer.english().analyzeAll(warmup, Progress.NONE);

    long t0 = System.nanoTime();
    List<List<String[]>> base = baseline.run(corpus);
    long t1 = System.nanoTime();
    List<Analysis> ours = TextAnalyzer.english().analyzeAll(corpus, Progress.NONE);
    long t2 = System.nanoTime();

    double baseSeconds = (t1 - t0) / 1e9;
    double oursSeconds = (t2 - t1) / 1e9;
    long tokens = base.stream().flatMap(List::stream).mapToLong(s -> s.length).sum();
    System.out.printf(
        Locale.ROOT,
        "corpus: %,d answers, %,d tokens (baseline tokenization), %d cores%n",
        corpus.size(),
        tokens,
        Runtime.getRuntime().availableProcessors());
    System.out.printf(
        Locale.ROOT,
        "baseline (1 thread, stock OpenNLP in sequence): %.2f s, %,.0f answers/s%n",
        baseSeconds,
        corpus.size() / baseSeconds);
    System.out.printf(
        Locale.ROOT,
        "riffle (masks, language, all cores, sentence cache): %.2f s, %,.0f answers/s%n",
        oursSeconds,
        corpus.size() / oursSeconds);
    System.out.printf(Locale.ROOT, "speed-up: %.1fx%n", baseSeconds / oursSeconds);
    agreement(base, ours);
  }

  /** Survey-like answers from the demo generator, with seeds other than the demo's. */
  static List<String> corpus(int size, long firstSeed) {
    List<String> out = new ArrayList<>(size);
    for (long seed = firstSeed; out.size() < size; seed++) {
      for (SampleResponses.GeneratedWave w : SampleResponses.generateDemoWaves(seed)) {
        for (SampleResponses.GeneratedRespondent r : w.respondents()) {
          for (SampleResponses.GeneratedAnswer a : List.of(r.stopped(), r.chose())) {
            if (out.size() < size) {
              out.add(a.text());
            }
          }
        }
      }
    }
    return out;
  }

  /** Where both tokenize a sentence the same way, the share of tokens given the same tag. */
  private static void agreement(List<List<String[]>> baseTags, List<Analysis> ours)
      throws IOException {
    // The baseline keeps tags only; re-run it with tokens for comparison.
    long same = 0;
    long compared = 0;
    long sentencesCompared = 0;
    Baseline b = new Baseline();
    for (int i = 0; i < ours.size(); i++) {
      Analysis a = ours.get(i);
      if (a.foreign() || !a.pii().isEmpty()) {
        continue;
      }
      for (Sentence s : a.sentences()) {
        String[] tokens = s.tokens().stream().map(Token::text).toArray(String[]::new);
        String[] tags = b.tagger.tag(tokens);
        sentencesCompared++;
        for (int t = 0; t < tokens.length; t++) {
          compared++;
          if (tags[t].equals(s.tokens().get(t).pos())) {
            same++;
          }
        }
      }
    }
    System.out.printf(
        Locale.ROOT,
        "tags equal to the stock tagger's on the same tokens: %.2f%% of %,d tokens in %,d"
            + " sentences (differences come from tagging shouted words in lower case)%n",
        100.0 * same / Math.max(1, compared),
        compared,
        sentencesCompared);
  }

  /** The naive pipeline: stock OpenNLP tools, one thread, in sequence, per answer. */
  static final class Baseline {
    final SentenceDetectorME sentences;
    final TokenizerME tokenizer;
    final POSTaggerME tagger;
    final ChunkerME chunker;

    Baseline() throws IOException {
      try (InputStream s = open("/en-sent.bin");
          InputStream t = open("/en-token.bin");
          InputStream p = open("/en-pos-maxent.bin");
          InputStream c = open("/en-chunker.bin")) {
        SentenceModel sm = new SentenceModel(s);
        TokenizerModel tm = new TokenizerModel(t);
        POSModel pm = new POSModel(p);
        ChunkerModel cm = new ChunkerModel(c);
        sentences = new SentenceDetectorME(sm);
        tokenizer = new TokenizerME(tm);
        tagger = new POSTaggerME(pm, POSTagFormat.PENN);
        chunker = new ChunkerME(cm);
      }
    }

    List<List<String[]>> run(List<String> answers) {
      List<List<String[]>> out = new ArrayList<>(answers.size());
      for (String answer : answers) {
        out.add(tags(answer));
      }
      return out;
    }

    /** One answer through the four tools: its sentences' tags (the chunks are computed too). */
    List<String[]> tags(String answer) {
      List<String[]> tags = new ArrayList<>();
      for (String sentence : sentences.sentDetect(answer)) {
        String[] tokens = tokenizer.tokenize(sentence);
        String[] t = tagger.tag(tokens);
        chunker.chunk(tokens, t);
        tags.add(t);
      }
      return tags;
    }

    private static InputStream open(String resource) {
      return AnalysisBench.class.getResourceAsStream(resource);
    }
  }
}
