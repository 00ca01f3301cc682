package riffle.text;

import java.nio.file.Path;
import java.text.Normalizer;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;
import opennlp.tools.langdetect.LanguageDetectorModel;
import opennlp.tools.util.Span;
import riffle.model.Analysis;
import riffle.model.Chunk;
import riffle.model.PiiMask;
import riffle.model.PiiType;
import riffle.model.Progress;
import riffle.model.Sentence;
import riffle.model.Token;

/**
 * Analyses answers: masks personal data, checks the language, then splits, tokenizes, tags, chunks,
 * stems and marks negation on the masked text. Thread-safe: each thread gets its own OpenNLP tools
 * over shared models, and identical sentences are parsed once.
 *
 * <p>Identical sentences are parsed once (the cache holds up to {@value #CACHE_LIMIT} sentences and
 * is then cleared: the frequent ones come back at once); parses are immutable, so sharing them
 * changes nothing. Whole answers are not remembered: callers that meet one text many times (an
 * import) analyse it once themselves, and keep what they need of it.
 *
 * <p>Steps, in order: Unicode NFC; masking ({@link PiiMasker}) of the whole answer; the language
 * check of the first {@link #MAX_ANALYSED_CHARS} characters; then, for answers in the analysis
 * language, those characters are split into lines and sentences and each sentence is parsed. A
 * placeholder such as {@code [email]} is one token, tagged as a proper noun.
 */
public final class TextAnalyzer {
  /** The language the English-only steps are for (ISO 639-3). */
  public static final String ANALYSIS_LANGUAGE = "eng";

  /**
   * Answers longer than this are analysed up to here (cut at a space) and flagged truncated:
   * language check and parse read only this prefix; masking always covers the whole answer. 5,000
   * characters is about 900 words, far past any survey answer worth quoting; the cap keeps one
   * pasted essay from stalling an import.
   */
  public static final int MAX_ANALYSED_CHARS = 5_000;

  /**
   * Identical sentences kept in the cache before it is cleared and refilled: about 20 MB. Short
   * sentences that many buyers write ("Fast delivery.") are met again within a few hundred answers,
   * so a larger cache saves little and holds the heap of a large import.
   */
  static final int CACHE_LIMIT = 20_000;

  private final Map<String, Models> models;
  private final List<String> modelProblems;
  private final PiiMasker masker;
  private final ThreadLocal<Map<String, Pipeline>> pipelines;
  private final ThreadLocal<LanguageCheck> languages;
  private final ConcurrentHashMap<String, SentenceParse> cache = new ConcurrentHashMap<>();

  private TextAnalyzer(Map<String, Models> models, List<String> problems, PiiMasker masker) {
    this.models = models;
    this.modelProblems = List.copyOf(problems);
    this.masker = masker;
    this.pipelines = ThreadLocal.withInitial(HashMap::new);
    LanguageDetectorModel detector = LanguageCheck.loadModel();
    this.languages = ThreadLocal.withInitial(() -> new LanguageCheck(detector, ANALYSIS_LANGUAGE));
  }

  /** The English pipeline with the standard masks. Loading the models takes about a second. */
  public static TextAnalyzer english() {
    return withModelFolders(List.of(), PiiMasker.standard());
  }

  /**
   * English plus the languages whose models sit in {@code folders} (see {@code models/README.md}),
   * with the given masker.
   */
  public static TextAnalyzer withModelFolders(List<Path> folders, PiiMasker masker) {
    List<String> problems = new ArrayList<>();
    Map<String, Models> models = new LinkedHashMap<>();
    models.put(ANALYSIS_LANGUAGE, Models.english());
    models.putAll(Models.others(folders, problems));
    return new TextAnalyzer(models, problems, masker);
  }

  /** The language detector's model, loaded once per process (it is thread-safe). */
  private static final class Detector {
    static final LanguageDetectorModel MODEL = LanguageCheck.loadModel();
  }

  /** The languages analysed in full, English first. */
  public List<String> languages() {
    return List.copyOf(models.keySet());
  }

  /** Language folders that could not be used, each with the reason. */
  public List<String> modelProblems() {
    return modelProblems;
  }

  /** Analyses one answer. Never throws for any string. */
  public Analysis analyze(String answer) {
    String text = Normalizer.normalize(answer, Normalizer.Form.NFC);
    PiiMasker.Masked masked = masker.mask(text);
    String m = masked.text();
    int limit = analysedLength(m);
    LanguageCheck.Verdict verdict =
        languages.get().judge(limit < m.length() ? m.substring(0, limit) : m);
    String language = verdict.foreign() ? verdict.language() : ANALYSIS_LANGUAGE;
    Models set = models.get(language);
    if (set == null) {
      return new Analysis(verdict.language(), true, m, masked.masks(), List.of(), false);
    }
    Pipeline pipeline = pipelines.get().computeIfAbsent(language, l -> new Pipeline(set));
    String parseable = substitutePlaceholders(m, masked.masks(), limit);
    List<Sentence> sentences = new ArrayList<>();
    int lineStart = 0;
    while (lineStart < limit) {
      int lineEnd = lineStart;
      while (lineEnd < limit && !isLineBreak(parseable.charAt(lineEnd))) {
        lineEnd++;
      }
      if (lineEnd > lineStart) {
        sentencesOfLine(pipeline, m, parseable, lineStart, lineEnd, sentences);
      }
      lineStart = lineEnd + 1;
    }
    return new Analysis(
        verdict.language(), false, m, masked.masks(), sentences, limit < m.length());
  }

  /**
   * Analyses many answers on all cores, in order. Reports progress as "analysing".
   *
   * @return one analysis per answer, in the same order
   */
  public List<Analysis> analyzeAll(List<String> answers, Progress progress) {
    return analyzeAll(answers, a -> a, progress);
  }

  /**
   * Analyses many answers on all cores, in order, and keeps of each only what {@code keep} makes of
   * its analysis (on the thread that analysed it): a large import keeps the parses encoded, not as
   * objects. Reports progress as "analysing".
   *
   * @return one kept value per answer, in the same order
   */
  public <T> List<T> analyzeAll(
      List<String> answers, Function<Analysis, T> keep, Progress progress) {
    int n = answers.size();
    List<T> out = new ArrayList<>(Collections.nCopies(n, null));
    int threads = Math.max(1, Math.min(Runtime.getRuntime().availableProcessors(), n / 64));
    if (threads == 1) {
      for (int i = 0; i < n; i++) {
        out.set(i, keep.apply(analyze(answers.get(i))));
        if (i % 500 == 0) {
          progress.update("analysing", i, n);
        }
      }
      progress.update("analysing", n, n);
      return out;
    }
    AtomicInteger next = new AtomicInteger();
    AtomicInteger done = new AtomicInteger();
    int block = 128;
    ExecutorService pool = Executors.newFixedThreadPool(threads, TextAnalyzer::worker);
    try {
      List<Future<?>> work = new ArrayList<>();
      for (int t = 0; t < threads; t++) {
        work.add(
            pool.submit(
                () -> {
                  // Each task sets only its own slots; Future.get publishes them to this thread.
                  for (int from = next.getAndAdd(block); from < n; from = next.getAndAdd(block)) {
                    int to = Math.min(n, from + block);
                    for (int i = from; i < to; i++) {
                      out.set(i, keep.apply(analyze(answers.get(i))));
                    }
                    done.addAndGet(to - from);
                  }
                }));
      }
      for (Future<?> f : work) {
        while (true) {
          try {
            f.get(100, TimeUnit.MILLISECONDS);
            break;
          } catch (java.util.concurrent.TimeoutException e) {
            progress.update("analysing", done.get(), n);
          }
        }
      }
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IllegalStateException("analysis was interrupted", e);
    } catch (ExecutionException e) {
      throw new IllegalStateException("analysis failed: " + e.getCause(), e.getCause());
    } finally {
      pool.shutdownNow();
    }
    progress.update("analysing", n, n);
    return out;
  }

  private static Thread worker(Runnable r) {
    Thread t = new Thread(r, "riffle-analysis");
    t.setDaemon(true);
    return t;
  }

  private void sentencesOfLine(
      Pipeline pipeline,
      String masked,
      String parseable,
      int lineStart,
      int lineEnd,
      List<Sentence> out) {
    String line = parseable.substring(lineStart, lineEnd);
    if (line.isBlank()) {
      return;
    }
    for (Span s : pipeline.sentences(line)) {
      int start = lineStart + s.getStart();
      int end = lineStart + s.getEnd();
      String sentence = parseable.substring(start, end);
      String key = pipeline.language() + '\u0000' + sentence;
      SentenceParse parse = cache.get(key);
      if (parse == null) {
        parse = pipeline.parse(sentence);
        if (cache.size() >= CACHE_LIMIT) {
          cache.clear();
        }
        cache.put(key, parse);
      }
      out.add(sentence(masked, start, end, parse));
    }
  }

  private static Sentence sentence(String masked, int start, int end, SentenceParse p) {
    List<Token> tokens = new ArrayList<>(p.starts().length);
    for (int i = 0; i < p.starts().length; i++) {
      int ts = start + p.starts()[i];
      int te = start + p.ends()[i];
      String text = masked.substring(ts, te);
      // A placeholder's stem is the placeholder itself, not that of its stand-in word.
      String stem = isPlaceholder(text) ? text : p.stems()[i];
      tokens.add(new Token(text, ts, te, p.tags()[i], stem, p.negated()[i]));
    }
    List<Chunk> chunks = new ArrayList<>(p.chunks().size());
    for (SentenceParse.ChunkSpan c : p.chunks()) {
      int cs = tokens.get(c.first()).start();
      int ce = tokens.get(c.end() - 1).end();
      chunks.add(new Chunk(c.type(), masked.substring(cs, ce), cs, ce));
    }
    return new Sentence(masked.substring(start, end), start, end, tokens, chunks);
  }

  /** Whether analysis of {@code masked} stops before its end. */
  public static boolean truncates(String masked) {
    return analysedLength(masked) < masked.length();
  }

  /** Where analysis of {@code text} stops: the cap, moved back to a space when there is one. */
  static int analysedLength(String text) {
    if (text.length() <= MAX_ANALYSED_CHARS) {
      return text.length();
    }
    int cut = MAX_ANALYSED_CHARS;
    int space = cut;
    while (space > MAX_ANALYSED_CHARS - 200 && !Character.isWhitespace(text.charAt(space))) {
      space--;
    }
    if (Character.isWhitespace(text.charAt(space))) {
      return space;
    }
    return Character.isLowSurrogate(text.charAt(cut)) ? cut - 1 : cut;
  }

  /**
   * Replaces each placeholder with a capitalised pseudo-word of the same length ({@code [email]} →
   * {@code Pxxxxxx}), so that the tokenizer keeps it whole and the tagger reads it as a name, while
   * every offset stays valid in the masked text.
   */
  private static String substitutePlaceholders(String masked, List<PiiMask> masks, int limit) {
    if (masks.isEmpty()) {
      return masked.substring(0, limit);
    }
    char[] chars = masked.substring(0, limit).toCharArray();
    for (PiiMask mask : masks) {
      if (mask.maskedStart() >= limit) {
        break;
      }
      int end = Math.min(limit, mask.maskedEnd());
      chars[mask.maskedStart()] = 'P';
      for (int i = mask.maskedStart() + 1; i < end; i++) {
        chars[i] = 'x';
      }
    }
    return new String(chars);
  }

  private static boolean isPlaceholder(String token) {
    for (PiiType type : PiiType.values()) {
      if (type.placeholder().equals(token)) {
        return true;
      }
    }
    return false;
  }

  private static boolean isLineBreak(char c) {
    return c == '\n' || c == '\r' || c == '\u2028' || c == '\u2029';
  }
}
