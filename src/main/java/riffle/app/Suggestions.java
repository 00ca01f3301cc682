package riffle.app;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import riffle.coding.SuggestSettings;
import riffle.coding.SuggestionEngine;
import riffle.model.Analysis;
import riffle.model.Assignment;
import riffle.model.Code;
import riffle.model.CodeMetrics;
import riffle.model.CodedExample;
import riffle.model.InputException;
import riffle.model.Sentence;
import riffle.model.ShownSuggestion;
import riffle.model.Suggestion;
import riffle.model.SuggestionQuality;
import riffle.model.SuggestionReport;
import riffle.store.AnalysisCache;
import riffle.store.ProjectFileException;
import riffle.store.ProjectStore;

/**
 * Learned suggestions for a project: one engine per question (the same words carry different codes
 * under different questions), trained on the answers people coded — by hand or imported, never
 * accepted suggestions or rule assignments.
 */
final class Suggestions {
  /** Engines per question, with what they were trained from. */
  record Trained(String stamp, Map<String, SuggestionEngine> engines, int examples) {}

  private Suggestions() {}

  /** Trains an engine for every question that has human-coded answers. */
  static Trained train(ProjectStore store, SuggestSettings settings) throws InputException {
    String stamp = store.contentStamp();
    List<ProjectStore.AnswerRow> rows = store.answerRows(List.of(), Optional.empty());
    List<Long> ids = new ArrayList<>(rows.size());
    rows.forEach(r -> ids.add(r.id()));
    Map<Long, List<Assignment>> assigned = store.assignments(ids);
    List<Long> codeIds = new ArrayList<>();
    for (Code c : store.codes()) {
      if (!c.archived()) {
        codeIds.add(c.id());
      }
    }
    // A wave and question brought in coded elsewhere was coded in full: its answers without codes
    // are examples too (of no code), not only the answers that carry one.
    Set<String> codedInFull = new HashSet<>();
    for (ProjectStore.AnswerRow r : rows) {
      for (Assignment a : assigned.getOrDefault(r.id(), List.of())) {
        if (a.origin() == riffle.model.Origin.IMPORTED) {
          codedInFull.add(r.wave() + "\u0000" + r.question());
        }
      }
    }
    Map<String, List<ProjectStore.AnswerRow>> coded = new LinkedHashMap<>();
    for (ProjectStore.AnswerRow r : rows) {
      if (r.substantive()
          && (human(assigned.get(r.id())).size() > 0
              || codedInFull.contains(r.wave() + "\u0000" + r.question()))) {
        coded.computeIfAbsent(r.question(), q -> new ArrayList<>()).add(r);
      }
    }
    Map<String, SuggestionEngine> engines = new LinkedHashMap<>();
    int examples = 0;
    try (AnalysisCache cache = AnalysisCache.open(store.file())) {
      for (Map.Entry<String, List<ProjectStore.AnswerRow>> q : coded.entrySet()) {
        Map<Long, List<Sentence>> sentences = Analyses.sentences(cache, q.getValue());
        List<CodedExample> training = new ArrayList<>();
        for (ProjectStore.AnswerRow r : q.getValue()) {
          training.add(
              new CodedExample(
                  r.id(),
                  r.wave() + "\u0000" + r.respondent(),
                  analysis(r, sentences.get(r.id())),
                  human(assigned.get(r.id()))));
        }
        examples += training.size();
        engines.put(q.getKey(), SuggestionEngine.train(training, codeIds, settings));
      }
    }
    return new Trained(stamp, engines, examples);
  }

  /**
   * What the trained engines would show for the given answers: codes each answer lacks and that no
   * person took off it, above the code's threshold.
   */
  static SuggestionReport suggest(
      ProjectStore store, Trained trained, List<ProjectStore.AnswerRow> rows)
      throws InputException {
    // The codebook now, which may have changed since the engines were trained (in this process or
    // another): a code removed or archived since is neither suggested nor measured.
    Map<Long, String> names = new HashMap<>();
    for (Code c : store.codes()) {
      if (!c.archived()) {
        names.put(c.id(), c.name());
      }
    }
    List<Long> ids = new ArrayList<>(rows.size());
    rows.forEach(r -> ids.add(r.id()));
    Map<Long, List<Assignment>> assigned = store.assignments(ids);
    Map<Long, Set<Long>> removed = new HashMap<>();
    for (long code : names.keySet()) {
      for (long answer : store.vetoes(code)) {
        removed.computeIfAbsent(answer, k -> new HashSet<>()).add(code);
      }
    }
    List<ShownSuggestion> shown = new ArrayList<>();
    List<ProjectStore.AnswerRow> wanted = new ArrayList<>();
    for (ProjectStore.AnswerRow r : rows) {
      if (r.substantive() && !r.foreign() && trained.engines().containsKey(r.question())) {
        wanted.add(r);
      }
    }
    try (AnalysisCache cache = AnalysisCache.open(store.file())) {
      Map<Long, List<Sentence>> sentences = Analyses.sentences(cache, wanted);
      for (ProjectStore.AnswerRow r : wanted) {
        Set<Long> skip = new HashSet<>(removed.getOrDefault(r.id(), Set.of()));
        for (Assignment a : assigned.getOrDefault(r.id(), List.of())) {
          skip.add(a.codeId());
        }
        SuggestionEngine engine = trained.engines().get(r.question());
        for (Suggestion s : engine.suggest(r.id(), analysis(r, sentences.get(r.id())), skip)) {
          if (!names.containsKey(s.codeId())) {
            continue;
          }
          shown.add(
              new ShownSuggestion(
                  r.id(),
                  r.respondent(),
                  r.wave(),
                  r.question(),
                  s.codeId(),
                  names.get(s.codeId()),
                  s.confidence()));
        }
      }
    }
    shown.sort(
        Comparator.comparingDouble(ShownSuggestion::confidence)
            .reversed()
            .thenComparingLong(ShownSuggestion::answerId)
            .thenComparingLong(ShownSuggestion::codeId));
    List<SuggestionQuality> metrics = new ArrayList<>();
    for (Map.Entry<String, SuggestionEngine> e : trained.engines().entrySet()) {
      for (CodeMetrics m : e.getValue().metrics()) {
        if (!names.containsKey(m.codeId())) {
          continue;
        }
        metrics.add(
            new SuggestionQuality(
                e.getKey(),
                names.get(m.codeId()),
                m.codeId(),
                m.examples(),
                m.support(),
                m.precision(),
                m.recall(),
                m.f1(),
                m.threshold(),
                m.ready()));
      }
    }
    return new SuggestionReport(shown, metrics, trained.examples());
  }

  private static Set<Long> human(List<Assignment> as) {
    Set<Long> out = new HashSet<>();
    if (as != null) {
      for (Assignment a : as) {
        if (a.origin().human()) {
          out.add(a.codeId());
        }
      }
    }
    return out;
  }

  private static Analysis analysis(ProjectStore.AnswerRow r, List<Sentence> sentences)
      throws ProjectFileException {
    return new Analysis("und", r.foreign(), r.masked(), List.of(), sentences, false);
  }
}
