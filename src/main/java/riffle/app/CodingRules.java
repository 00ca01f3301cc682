package riffle.app;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import riffle.coding.Codebook;
import riffle.model.Assignment;
import riffle.model.Code;
import riffle.model.EditOutcome;
import riffle.model.InputException;
import riffle.model.Origin;
import riffle.model.Rule;
import riffle.model.RulePreview;
import riffle.model.SearchHit;
import riffle.model.SearchResult;
import riffle.store.ProjectStore;

/**
 * Rules: saved queries that give a code to every answer they match, previewed before they are
 * applied, applied to each new wave, and never giving a code back to an answer a person took it
 * off. Each change is one edit its coder can undo (see {@link Coding}).
 */
public final class CodingRules {
  private final ProjectStore store;
  private final AnswerSearch search;

  CodingRules(ProjectStore store, AnswerSearch search) {
    this.store = store;
    this.search = search;
  }

  /** Every saved rule. */
  public List<Rule> rules() throws InputException {
    return store.rules();
  }

  /**
   * Saves a query as a rule of a code (it codes nothing until applied).
   *
   * @throws InputException when the query cannot be read; its problem gives the column
   */
  public Rule addRule(String coder, long codeId, String query) throws InputException {
    String q = query.strip();
    search.matches(q);
    long[] id = new long[1];
    store.edit(
        coder,
        "add-rule",
        e -> {
          Code c = Codebook.byId(e.codes(), codeId);
          for (Rule r : e.rules()) {
            if (r.codeId() == codeId && r.query().equals(q)) {
              id[0] = r.id();
              return "\"" + c.name() + "\" has this rule already.";
            }
          }
          id[0] = e.newRuleId();
          e.putRule(new Rule(id[0], codeId, q, coder, e.at()));
          e.note("code", c.name());
          e.note("query", q);
          return "Saved the rule " + q + " for \"" + c.name() + "\".";
        });
    return store.rules().stream().filter(r -> r.id() == id[0]).findFirst().orElseThrow();
  }

  /** Deletes a rule; what it coded stays coded. */
  public EditOutcome removeRule(String coder, long ruleId) throws InputException {
    return store.edit(
        coder,
        "remove-rule",
        e -> {
          Rule r =
              e.rules().stream()
                  .filter(x -> x.id() == ruleId)
                  .findFirst()
                  .orElseThrow(() -> new InputException("no rule with id " + ruleId));
          e.removeRule(ruleId);
          return "Deleted the rule " + r.query() + ".";
        });
  }

  /**
   * What a query would code for a code if applied now, with a sample of those answers.
   *
   * @throws InputException when the query cannot be read
   */
  public RulePreview preview(long codeId, String query, int sampleSize) throws InputException {
    Code c = Codebook.byId(store.codes(), codeId);
    long[] matches = search.matches(query);
    Set<Long> has = new HashSet<>();
    for (Assignment a : store.assignmentsOfCode(codeId)) {
      has.add(a.answerId());
    }
    Set<Long> kept = new HashSet<>(store.vetoes(codeId));
    int already = 0;
    int off = 0;
    for (long id : matches) {
      if (has.contains(id)) {
        already++;
      } else if (kept.contains(id)) {
        off++;
      }
    }
    List<SearchHit> sample = new ArrayList<>();
    SearchResult top = search.search(query, Math.max(sampleSize * 4, 50));
    for (SearchHit h : top.hits()) {
      if (sample.size() < sampleSize
          && !has.contains(h.answerId())
          && !kept.contains(h.answerId())) {
        sample.add(h);
      }
    }
    return new RulePreview(
        c.name(),
        query.strip(),
        matches.length,
        matches.length - already - off,
        already,
        off,
        sample);
  }

  /**
   * Applies the saved rules (all, or one code's): every matching answer without the code gets it,
   * marked as made by rule — except answers from which a person removed that code.
   */
  public EditOutcome applyRules(String coder, OptionalLong codeId) throws InputException {
    return applyRules(coder, codeId, 0);
  }

  /** Applies every rule to the answers with an id above {@code afterId} (a new wave). */
  EditOutcome applyRules(String coder, OptionalLong codeId, long afterId) throws InputException {
    List<Rule> rules = new ArrayList<>();
    for (Rule r : store.rules()) {
      if (codeId.isEmpty() || r.codeId() == codeId.getAsLong()) {
        rules.add(r);
      }
    }
    List<long[]> found = new ArrayList<>();
    for (Rule r : rules) {
      found.add(search.matches(r.query()));
    }
    return store.edit(
        coder,
        "apply-rules",
        e -> {
          int given = 0;
          int keptOff = 0;
          Set<Long> coded = new HashSet<>();
          for (int i = 0; i < rules.size(); i++) {
            Rule r = rules.get(i);
            Code c = Codebook.byId(e.codes(), r.codeId());
            if (c.archived()) {
              continue;
            }
            Set<Long> has = new HashSet<>();
            for (Assignment a : e.assignmentsOfCode(r.codeId())) {
              has.add(a.answerId());
            }
            Set<Long> vetoed = new HashSet<>(e.vetoes(r.codeId()));
            for (long answer : found.get(i)) {
              if (answer <= afterId || has.contains(answer)) {
                continue;
              }
              if (vetoed.contains(answer)) {
                keptOff++;
                continue;
              }
              e.putAssignment(
                  new Assignment(answer, r.codeId(), Optional.empty(), coder, Origin.RULE, e.at()));
              has.add(answer);
              coded.add(answer);
              given++;
            }
          }
          e.note("rules", rules.size());
          e.note("coded", coded.size());
          e.note("given", given);
          e.note("kept_off", keptOff);
          return "Applied "
              + rules.size()
              + " rule(s): "
              + coded.size()
              + " answer(s) coded, "
              + given
              + " code(s) given"
              + (keptOff > 0 ? "; " + keptOff + " left alone where a person removed the code" : "")
              + ".";
        });
  }

  /**
   * Gives a code to every answer a query matches that lacks it, in one edit (one undo takes it all
   * back), except answers from which a person took that code off. The assignments are marked as
   * made by rule: nobody read each answer, so they do not teach the suggestions.
   *
   * @throws InputException when the query cannot be read; its problem gives the column
   */
  public EditOutcome assignAll(String coder, long codeId, String query) throws InputException {
    String q = query.strip();
    if (q.isEmpty()) {
      throw new InputException("write the query whose answers should get the code");
    }
    long[] found = search.matches(q);
    return store.edit(
        coder,
        "assign-all",
        e -> {
          Code c = Coding.usable(e, codeId);
          Set<Long> has = new HashSet<>();
          for (Assignment a : e.assignmentsOfCode(codeId)) {
            has.add(a.answerId());
          }
          Set<Long> vetoed = new HashSet<>(e.vetoes(codeId));
          int given = 0;
          int keptOff = 0;
          for (long answer : found) {
            if (has.contains(answer)) {
              continue;
            }
            if (vetoed.contains(answer)) {
              keptOff++;
              continue;
            }
            e.putAssignment(
                new Assignment(answer, codeId, Optional.empty(), coder, Origin.RULE, e.at()));
            given++;
          }
          e.note("code", c.name());
          e.note("query", q);
          e.note("coded", given);
          e.note("kept_off", keptOff);
          return "Gave \""
              + c.name()
              + "\" to "
              + given
              + " answer(s) matching "
              + q
              + (keptOff > 0 ? "; " + keptOff + " left alone where a person removed it" : "")
              + ".";
        });
  }
}
