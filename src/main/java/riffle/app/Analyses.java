package riffle.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.IntStream;
import riffle.model.Analysis;
import riffle.model.BatchOutcome;
import riffle.model.Progress;
import riffle.model.Sentence;
import riffle.store.AnalysisCache;
import riffle.store.ProjectFileException;
import riffle.store.ProjectStore;
import riffle.text.AnalysisCodec;
import riffle.text.PiiMasker;
import riffle.text.TextAnalyzer;

/**
 * Runs text analysis for the use cases: one shared analyser (its models load once per process), the
 * analysis columns in the project file, and the parses in the derived cache.
 */
public final class Analyses {
  private Analyses() {}

  /** Analyses one text as an answer would be: masks, language, sentences, tokens, chunks. */
  public static Analysis analyze(String text) {
    return analyzer().analyze(text);
  }

  /** The process's analyser, created on first use. */
  static TextAnalyzer analyzer() {
    return Holder.ANALYZER;
  }

  private static final class Holder {
    static final TextAnalyzer ANALYZER =
        TextAnalyzer.withModelFolders(
            List.of(
                Path.of("models"), Path.of(System.getProperty("user.home"), ".riffle", "models")),
            PiiMasker.standard());
  }

  /**
   * What an import keeps of an answer's analysis until it is stored: the analysis without its
   * sentences, for the project file, and the sentences encoded as the derived cache stores them —
   * about a tenth of the objects' memory.
   *
   * @param analysis the analysis, its sentences left out
   * @param parse the sentences, encoded by {@link AnalysisCodec#encode}
   */
  record Parsed(Analysis analysis, byte[] parse) {
    static Parsed of(Analysis a) {
      return new Parsed(
          new Analysis(a.language(), a.foreign(), a.masked(), a.pii(), List.of(), a.truncated()),
          AnalysisCodec.encode(a.sentences()));
    }
  }

  /** Analyses many texts on all cores, keeping each as a {@link Parsed}. */
  static List<Parsed> parseAll(List<String> texts, Progress progress) {
    return analyzer().analyzeAll(texts, Parsed::of, progress);
  }

  /** The analysis a duplicate answer gets: it is never stored, so nothing is worth computing. */
  static Analysis unanalysed(String text) {
    return new Analysis("und", false, text, List.of(), List.of(), false);
  }

  /**
   * An answer's sentences from the cache, analysed afresh and cached again when the entry is
   * missing, stale or damaged.
   */
  static List<Sentence> sentences(
      AnalysisCache cache, long answerId, String masked, String normalized)
      throws ProjectFileException {
    Optional<List<Sentence>> cached =
        cache
            .get(answerId, AnalysisCodec.VERSION)
            .flatMap(bytes -> AnalysisCodec.decode(masked, bytes));
    if (cached.isPresent()) {
      return cached.get();
    }
    List<Sentence> fresh = analyzer().analyze(normalized).sentences();
    cache.putAll(List.of(entry(answerId, fresh)), AnalysisCodec.VERSION);
    return fresh;
  }

  /**
   * The sentences of many answers, read from the cache in one pass; answers whose entry is missing,
   * stale or damaged are analysed afresh and cached again.
   */
  static Map<Long, List<Sentence>> sentences(AnalysisCache cache, List<ProjectStore.AnswerRow> rows)
      throws ProjectFileException {
    long[] ids = new long[rows.size()];
    List<String> masked = new ArrayList<>(rows.size());
    for (int i = 0; i < ids.length; i++) {
      ids[i] = rows.get(i).id();
      masked.add(rows.get(i).masked());
    }
    List<List<Sentence>> sentences = sentences(cache, ids, masked, i -> rows.get(i).normalized());
    Map<Long, List<Sentence>> out = new HashMap<>(rows.size() * 2);
    for (int i = 0; i < ids.length; i++) {
      out.put(ids[i], sentences.get(i));
    }
    return out;
  }

  /** The NFC text of the {@code index}-th answer asked for, read only when its parse is redone. */
  interface Normalized {
    String text(int index) throws ProjectFileException;
  }

  /** Fewest entries worth handing to another thread. */
  private static final int DECODE_BATCH = 4_096;

  /**
   * The sentences of the answers {@code ids} (ascending) with masked texts {@code masked}, aligned
   * with them: cached entries are read in one range scan and decoded on all cores; entries that are
   * missing, stale or damaged are analysed afresh in one batch and cached again.
   */
  static List<List<Sentence>> sentences(
      AnalysisCache cache, long[] ids, List<String> masked, Normalized normalized)
      throws ProjectFileException {
    byte[][] bytes = cache.getAll(ids, AnalysisCodec.VERSION);
    // Each task sets only its own slots; the stream's join publishes them to this thread.
    List<List<Sentence>> out = new ArrayList<>(Collections.nCopies(ids.length, null));
    // One contiguous part per core, each with its own decoder (a decoder shares equal strings).
    int parts =
        Math.max(
            1, Math.min(Runtime.getRuntime().availableProcessors(), ids.length / DECODE_BATCH));
    int size = (ids.length + parts - 1) / parts;
    IntStream.range(0, parts)
        .parallel()
        .forEach(
            b -> {
              AnalysisCodec.Decoder decoder = AnalysisCodec.decoder();
              for (int i = b * size; i < Math.min(ids.length, (b + 1) * size); i++) {
                if (bytes[i] != null) {
                  out.set(i, decoder.decode(masked.get(i), bytes[i]).orElse(null));
                }
              }
            });
    List<Integer> redo = new ArrayList<>();
    List<String> texts = new ArrayList<>();
    for (int i = 0; i < ids.length; i++) {
      if (out.get(i) == null) {
        redo.add(i);
        texts.add(normalized.text(i));
      }
    }
    if (!redo.isEmpty()) {
      List<Analysis> fresh = analyzer().analyzeAll(texts, Progress.NONE);
      List<AnalysisCache.Entry> entries = new ArrayList<>(redo.size());
      for (int k = 0; k < redo.size(); k++) {
        int i = redo.get(k);
        out.set(i, fresh.get(k).sentences());
        entries.add(entry(ids[i], out.get(i)));
      }
      cache.putAll(entries, AnalysisCodec.VERSION);
    }
    return out;
  }

  /**
   * Writes the parses of newly stored answers to the derived cache; {@code parsed} holds them by
   * NFC text. An answer missing from it is left out: its parse is made again when first read.
   */
  static void cache(Path project, List<BatchOutcome.Added> added, Map<String, Parsed> parsed)
      throws ProjectFileException {
    List<AnalysisCache.Entry> entries = new ArrayList<>(added.size());
    for (BatchOutcome.Added a : added) {
      Parsed p = parsed.get(a.answer().normalized());
      if (p != null) {
        entries.add(new AnalysisCache.Entry(a.id(), p.parse()));
      }
    }
    write(project, entries);
  }

  private static AnalysisCache.Entry entry(long answerId, List<Sentence> sentences) {
    return new AnalysisCache.Entry(answerId, AnalysisCodec.encode(sentences));
  }

  private static void write(Path project, List<AnalysisCache.Entry> entries)
      throws ProjectFileException {
    try (AnalysisCache cache = AnalysisCache.open(project)) {
      cache.putAll(entries, AnalysisCodec.VERSION);
    }
  }

  /**
   * Analyses again every answer that an older analysis version (or none) analysed, and caches the
   * parses. Returns how many answers it analysed.
   */
  static int refresh(ProjectStore store, Progress progress) throws ProjectFileException {
    List<ProjectStore.AnswerText> stale = store.staleAnalyses(AnalysisCodec.VERSION);
    if (stale.isEmpty()) {
      return 0;
    }
    List<Parsed> parsed =
        parseAll(stale.stream().map(ProjectStore.AnswerText::normalized).toList(), progress);
    List<ProjectStore.Analysed> rows = new ArrayList<>(stale.size());
    List<AnalysisCache.Entry> entries = new ArrayList<>(stale.size());
    for (int i = 0; i < stale.size(); i++) {
      long id = stale.get(i).id();
      rows.add(new ProjectStore.Analysed(id, parsed.get(i).analysis()));
      entries.add(new AnalysisCache.Entry(id, parsed.get(i).parse()));
    }
    store.storeAnalyses(rows, AnalysisCodec.VERSION);
    write(store.file(), entries);
    return stale.size();
  }
}
