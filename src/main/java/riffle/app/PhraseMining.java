package riffle.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import riffle.model.Analysis;
import riffle.model.KeyPhrase;
import riffle.model.PhraseReport;
import riffle.model.Sentence;
import riffle.phrases.PhraseDoc;
import riffle.phrases.PhraseFilter;
import riffle.phrases.PhraseMiner;
import riffle.phrases.PhraseSettings;
import riffle.store.AnalysisCache;
import riffle.store.ProjectFileException;
import riffle.store.ProjectStore;

/** Mines a project's answers for phrases: loads only the waves and question asked for. */
final class PhraseMining {
  private PhraseMining() {}

  /**
   * The phrases the query asks for; read from the derived cache when an earlier command mined the
   * same of the project as it stands.
   */
  static PhraseFindings run(ProjectStore store, PhraseQuery q) throws ProjectFileException {
    return KeptResults.get(store, "phrases", q, PhraseFindings.class, () -> mine(store, q));
  }

  private static PhraseFindings mine(ProjectStore store, PhraseQuery q)
      throws ProjectFileException {
    List<String> waves = store.waveNames();
    Optional<String> wave = q.wave().map(w -> Lookups.wave(w, waves, "wave"));
    Optional<String> against = q.against().map(w -> Lookups.wave(w, waves, "against"));
    List<String> questions = store.questions();
    Optional<String> question =
        q.question().map(x -> Lookups.question(x, questions, store.questionNames()));

    PhraseFilter focus = PhraseFilter.all();
    if (wave.isPresent()) {
      focus = focus.withWave(wave.get());
    }
    if (question.isPresent()) {
      focus = focus.withQuestion(question.get());
    }
    for (Map.Entry<String, String> s : q.segments().entrySet()) {
      focus = focus.withSegment(s.getKey(), s.getValue());
    }
    List<String> waveNames = new ArrayList<>();
    wave.ifPresent(waveNames::add);
    against.ifPresent(waveNames::add);
    List<ProjectStore.MinedAnswer> rows =
        store.minedAnswers(waveNames, question, q.segments().keySet());
    long[] ids = new long[rows.size()];
    List<String> masked = new ArrayList<>(rows.size());
    for (int i = 0; i < ids.length; i++) {
      ids[i] = rows.get(i).id();
      masked.add(rows.get(i).masked());
    }
    List<List<Sentence>> sentences;
    try (AnalysisCache cache = AnalysisCache.open(store.file())) {
      sentences = Analyses.sentences(cache, ids, masked, i -> normalized(store, ids[i]));
    }
    List<PhraseDoc> docs = new ArrayList<>(rows.size());
    for (int i = 0; i < ids.length; i++) {
      ProjectStore.MinedAnswer r = rows.get(i);
      Analysis analysis =
          new Analysis(
              r.foreign() ? "und" : "eng",
              r.foreign(),
              r.masked(),
              List.of(),
              r.foreign() ? List.of() : sentences.get(i),
              false);
      docs.add(
          new PhraseDoc(r.id(), r.respondent(), r.wave(), r.question(), r.segments(), analysis));
    }
    PhraseMiner miner = PhraseMiner.create(PhraseSettings.builder().limit(q.limit()).get());
    PhraseReport report = miner.mine(docs, focus);
    List<KeyPhrase> keyness =
        against.isPresent() ? miner.keyness(docs, focus, focus.withWave(against.get())) : List.of();
    return new PhraseFindings(
        report.answers(), wave, question, against, report.phrases(), report.clusters(), keyness);
  }

  /** The NFC text of an answer whose parse must be redone. */
  private static String normalized(ProjectStore store, long answerId) throws ProjectFileException {
    return store
        .storedAnalysis(answerId)
        .orElseThrow(() -> new IllegalStateException("answer " + answerId + " vanished"))
        .normalized();
  }
}
