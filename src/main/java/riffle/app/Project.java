package riffle.app;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;
import riffle.ingest.SurveyTable;
import riffle.model.Analysis;
import riffle.model.InputException;
import riffle.model.Progress;
import riffle.model.ProjectSummary;
import riffle.model.SearchResult;
import riffle.model.Sentence;
import riffle.model.SuggestionReport;
import riffle.store.AnalysisCache;
import riffle.store.ProjectFileException;
import riffle.store.ProjectStore;
import riffle.store.Waits;
import riffle.text.AnalysisCodec;
import riffle.text.TextAnalyzer;

/** An open project and the use cases on it. Not thread-safe: one instance per thread. */
public final class Project implements AutoCloseable {
  private final ProjectStore store;
  private final AnswerSearch search;
  private List<String> notices = List.of();

  private Project(ProjectStore store) {
    this.store = store;
    this.search = new AnswerSearch(store);
  }

  /**
   * Opens the project at {@code file}, creating an empty one when there is none, and brings it up
   * to date (see {@link #notices()}).
   */
  public static Project openOrCreate(Path file) throws InputException {
    return upToDate(new Project(ProjectStore.openOrCreate(file)));
  }

  /** Opens an existing project, refusing a missing file, and brings it up to date. */
  public static Project openExisting(Path file) throws InputException {
    return upToDate(new Project(ProjectStore.openExisting(file)));
  }

  /**
   * Answers analysed by an older analysis version are analysed (and masked) again, so that an older
   * project gains the new masks; then quotes on the copy board that masking now covers are taken
   * off.
   */
  private static Project upToDate(Project p) throws InputException {
    try {
      Analyses.refresh(p.store, Progress.NONE);
      p.notices = List.copyOf(p.quotes().recheckBoard());
      return p;
    } catch (RuntimeException e) {
      p.close();
      throw e;
    }
  }

  /**
   * What opening the project changed, one message each: quotes taken off the copy board because
   * their answers are now masked where they were (also in the audit log and on the board).
   */
  public List<String> notices() {
    return notices;
  }

  /**
   * Sends this process's announcements of waits for another Riffle process (a write to the project
   * file or its search index, after a second of waiting) to {@code to}; returns the previous
   * receiver. By default they go nowhere.
   */
  public static Consumer<String> announceWaitsTo(Consumer<String> to) {
    return Waits.announceTo(to);
  }

  /** The project file. */
  public Path file() {
    return store.file();
  }

  /**
   * Imports an export as (part of) a wave. Either everything is stored or, when the input is
   * unusable or the project cannot be written, nothing is.
   *
   * @throws InputException when the export cannot be used (its problem names the file, line and
   *     column) or the project cannot be written
   * @throws IllegalArgumentException when the request contradicts the project (a wave's date)
   */
  public ImportReport importWave(ImportRequest request, Progress progress) throws InputException {
    SurveyTable table = WaveImporter.read(request, progress);
    return importTable(request, table, progress, new HashMap<>());
  }

  private ImportReport importTable(
      ImportRequest request,
      SurveyTable table,
      Progress progress,
      Map<String, Analyses.Parsed> analysed)
      throws InputException {
    long lastBefore = store.lastAnswerId();
    ImportReport report =
        new WaveImporter(store, search::whileStoring, analysed).store(request, table, progress);
    if (!store.rules().isEmpty() && store.lastAnswerId() > lastBefore) {
      rules().applyRules(request.actor(), java.util.OptionalLong.empty(), lastBefore);
    }
    return report;
  }

  /**
   * Imports into the project at {@code file}, creating it when missing. The export is read in full
   * first: an unusable export leaves no trace, not even a new empty project. A new project appears
   * only once whole: an import stopped on the way (SIGTERM, a crash) leaves no project file.
   *
   * @see #importWave
   */
  public static ImportReport importInto(Path file, ImportRequest request, Progress progress)
      throws InputException {
    SurveyTable table = WaveImporter.read(request, progress);
    // Shared by both attempts: a second one (into a project made meanwhile) analyses nothing again.
    Map<String, Analyses.Parsed> analysed = new HashMap<>();
    if (!Files.exists(file)) {
      Optional<ImportReport> created =
          NewProject.create(file, p -> p.importTable(request, table, progress, analysed));
      if (created.isPresent()) {
        return created.get();
      }
      // Another process created the project meanwhile: the wave goes into it as into any other.
    }
    try (Project project = openOrCreate(file)) {
      return project.importTable(request, table, progress, analysed);
    }
  }

  /** Folds the project into its one file, as before moving it (see {@link NewProject}). */
  void foldIntoOneFile() throws ProjectFileException {
    search.close();
    store.foldIntoOneFile();
  }

  /**
   * An answer's analysis: masks and language from the project file, sentences from the derived
   * cache — analysed afresh (and cached again) when the cache lacks it, is stale or damaged.
   */
  public Optional<Analysis> analysis(long answerId) throws InputException {
    Optional<ProjectStore.StoredAnalysis> stored = store.storedAnalysis(answerId);
    if (stored.isEmpty()) {
      return Optional.empty();
    }
    if (stored.get().masked() == null
        || !AnalysisCodec.VERSION.equals(stored.get().analysedWith())) {
      Analyses.refresh(store, Progress.NONE);
      stored = store.storedAnalysis(answerId);
    }
    ProjectStore.StoredAnalysis s = stored.orElseThrow();
    try (AnalysisCache cache = AnalysisCache.open(store.file())) {
      List<Sentence> sentences = Analyses.sentences(cache, answerId, s.masked(), s.normalized());
      return Optional.of(
          new Analysis(
              s.language(),
              s.foreign(),
              s.masked(),
              s.pii(),
              sentences,
              !s.foreign() && TextAnalyzer.truncates(s.masked())));
    }
  }

  /**
   * Runs an analyst's query over every answer (see the README for the query language).
   *
   * @throws InputException when the query cannot be read; its problem gives the column
   */
  public SearchResult search(String query, int limit) throws InputException {
    return search.search(query, limit);
  }

  /**
   * Recurring phrases, the themes that travel together and, with {@link PhraseQuery#against}, the
   * phrases that rose or fell between two waves.
   *
   * @throws IllegalArgumentException when the query names a wave or question the project lacks
   */
  public PhraseFindings phrases(PhraseQuery query) throws InputException {
    return PhraseMining.run(store, query);
  }

  /** Answers like the given one, most alike first. */
  public SearchResult similar(long answerId, int limit) throws InputException {
    return search.similar(answerId, limit);
  }

  /** Every answer's id, in the order stored. */
  public List<Long> answerIds() throws InputException {
    return store.answerIds();
  }

  /**
   * A value that moves whenever the project's answers, codebook, coding, rules or board change, in
   * this process or any other; cheap to read, for noticing changes made elsewhere.
   */
  public String changes() throws InputException {
    return store.contentStamp();
  }

  /** Counts of waves, answers, codes and assignments. */
  public ProjectSummary summary() throws InputException {
    return store.summary();
  }

  /**
   * Trains the suggestion engines now and returns what they would show for the answers of a wave
   * (or of every wave), with their cross-validated metrics.
   *
   * @throws IllegalArgumentException when the wave is not in the project
   */
  public SuggestionReport suggest(Optional<String> wave) throws InputException {
    List<String> waves = new java.util.ArrayList<>();
    if (wave.isPresent()) {
      waves.add(Lookups.wave(wave.get(), store.waveNames(), "wave"));
    }
    Suggestions.Trained trained =
        Suggestions.train(store, riffle.coding.SuggestSettings.defaults());
    return Suggestions.suggest(store, trained, store.answerRows(waves, Optional.empty()));
  }

  /**
   * What the newest engines of {@code trainer} would show for these answers, without waiting for
   * any training: empty until the first training has finished. Starts a retraining when the coding
   * changed since.
   */
  public Optional<SuggestionReport> suggestFor(List<Long> answerIds, SuggestionTrainer trainer)
      throws InputException {
    Optional<Suggestions.Trained> trained = trainer.latest(store.contentStamp());
    if (trained.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(Suggestions.suggest(store, trained.get(), store.answerRows(answerIds)));
  }

  /** Buyer quotes and the copy board. */
  public Quotes quotes() {
    return new Quotes(store);
  }

  /** Findings and exports. */
  public Reporting reporting() {
    return new Reporting(store);
  }

  /** The codebook and the files it is brought in from and written to. */
  public CodebookEditor codebook() {
    return new CodebookEditor(store, search);
  }

  /** The coding of the answers, and the undo and history of every edit. */
  public Coding coding() {
    return new Coding(store);
  }

  /** The rules that code the answers a query matches. */
  public CodingRules rules() {
    return new CodingRules(store, search);
  }

  /** Random review queues, and whether the answers read are a random sample. */
  public ReviewQueues queues() {
    return new ReviewQueues(store);
  }

  /** Pages through the answers for coding. */
  public AnswerBrowser answers() {
    return new AnswerBrowser(store, search);
  }

  @Override
  public void close() {
    search.close();
    store.close();
  }
}
