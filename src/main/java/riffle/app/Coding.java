package riffle.app;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import riffle.coding.Codebook;
import riffle.coding.CodebookFile;
import riffle.coding.CodebookFile.Format;
import riffle.index.QuerySyntaxException;
import riffle.model.AnswerRead;
import riffle.model.Assignment;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.EditOutcome;
import riffle.model.HistoryEntry;
import riffle.model.InputException;
import riffle.model.InputProblem;
import riffle.model.Origin;
import riffle.model.Rule;
import riffle.model.RulePreview;
import riffle.model.SearchHit;
import riffle.model.SearchResult;
import riffle.model.ShownSuggestion;
import riffle.model.Span;
import riffle.store.CodingEdit;
import riffle.store.ProjectFileException;
import riffle.store.ProjectStore;

/**
 * The codebook and the coding of a project: every change is written at once, as one edit that its
 * coder can undo and redo, with a row in the audit log.
 *
 * <p>Concurrency rule: changes are intents on single rows ("give code C to answer A", "take C off
 * A"), never "set A's codes to this list"; each runs in its own write transaction (see
 * DEVELOPERS.md), so two tabs or two coders changing the same answer both land. Giving a code an
 * answer already has, or taking off one it lacks, changes nothing.
 */
public final class Coding {
  private final ProjectStore store;
  private final Project project;

  Coding(ProjectStore store, Project project) {
    this.store = store;
    this.project = project;
  }

  // ---- the codebook ----

  /** The codebook, in order. */
  public List<Code> codes() throws InputException {
    return store.codes();
  }

  /** The code with this name (any case). */
  public Code code(String name) throws InputException {
    return Codebook.named(store.codes(), name);
  }

  /**
   * Adds a code.
   *
   * @throws IllegalArgumentException when the draft breaks a rule of the codebook
   */
  public Code create(String coder, CodeDraft draft) throws InputException {
    long[] id = new long[1];
    store.edit(
        coder,
        "create-code",
        e -> {
          Code made = Codebook.create(e.codes(), draft, e.newCodeId());
          e.putCode(made);
          id[0] = made.id();
          e.note("code", made.name());
          return "Created code \"" + made.name() + "\".";
        });
    return Codebook.byId(store.codes(), id[0]);
  }

  /**
   * Changes a code's name, texts, colour, key, theme or direction.
   *
   * @throws IllegalArgumentException when the result breaks a rule of the codebook
   */
  public Code change(String coder, long codeId, CodeDraft changes) throws InputException {
    store.edit(
        coder,
        "change-code",
        e -> {
          List<Code> book = e.codes();
          Code before = Codebook.byId(book, codeId);
          if (changes.parent().filter(p -> !p.isBlank()).isPresent()
              && !Codebook.children(book, codeId).isEmpty()) {
            throw new IllegalArgumentException(
                "\""
                    + before.name()
                    + "\" is a theme with codes under it; themes are two levels deep, so move"
                    + " its codes first");
          }
          Code after = Codebook.change(book, before, changes);
          e.putCode(after);
          e.note("code", after.name());
          return before.name().equals(after.name())
              ? "Changed code \"" + after.name() + "\"."
              : "Renamed \"" + before.name() + "\" to \"" + after.name() + "\".";
        });
    return Codebook.byId(store.codes(), codeId);
  }

  /** Sets the answers that show a code well (shown beside its guidance). */
  public EditOutcome setExamples(String coder, long codeId, List<Long> answers)
      throws InputException {
    return store.edit(
        coder,
        "code-examples",
        e -> {
          Code c = Codebook.byId(e.codes(), codeId);
          for (long a : answers) {
            answerText(e, a);
          }
          e.putCode(c.withExamples(List.copyOf(new LinkedHashSet<>(answers))));
          return "\""
              + c.name()
              + "\" has "
              + new LinkedHashSet<>(answers).size()
              + " example answer(s).";
        });
  }

  /** Archives a code (kept with its assignments, offered no more) or brings it back. */
  public EditOutcome archive(String coder, long codeId, boolean archived) throws InputException {
    return store.edit(
        coder,
        archived ? "archive-code" : "restore-code",
        e -> {
          Code c = Codebook.byId(e.codes(), codeId);
          e.putCode(c.withArchived(archived));
          return (archived ? "Archived \"" : "Brought back \"") + c.name() + "\".";
        });
  }

  /**
   * Deletes a code nobody used; a code in use is archived instead, so no assignment is lost. Its
   * own codes move to the top level.
   */
  public EditOutcome remove(String coder, long codeId) throws InputException {
    return store.edit(
        coder,
        "remove-code",
        e -> {
          List<Code> book = e.codes();
          Code c = Codebook.byId(book, codeId);
          int uses = e.assignmentsOfCode(codeId).size();
          if (uses > 0) {
            e.putCode(c.withArchived(true));
            return "Archived \""
                + c.name()
                + "\" instead of deleting it: "
                + uses
                + " answer(s) carry it.";
          }
          for (Code child : Codebook.children(book, codeId)) {
            e.putCode(child.withParent(OptionalLong.empty()));
          }
          dropRulesAndRemovals(e, codeId);
          e.removeCode(codeId);
          return "Deleted \"" + c.name() + "\".";
        });
  }

  /** Moves a code to another place in the codebook's order (1 = first). */
  public EditOutcome reorder(String coder, long codeId, int place) throws InputException {
    return store.edit(
        coder,
        "reorder-code",
        e -> {
          List<Code> book = new ArrayList<>(e.codes());
          Code c = Codebook.byId(book, codeId);
          book.remove(c);
          book.add(Math.max(0, Math.min(book.size(), place - 1)), c);
          for (int i = 0; i < book.size(); i++) {
            if (book.get(i).position() != i + 1) {
              e.putCode(book.get(i).withPosition(i + 1));
            }
          }
          return "Moved \"" + c.name() + "\" to place " + (book.indexOf(c) + 1) + ".";
        });
  }

  /**
   * Merges codes into one: their assignments move to the target (an answer that carries both keeps
   * one), as do their rules, examples and child codes; the merged codes are deleted.
   */
  public EditOutcome merge(String coder, Collection<Long> sources, long targetId)
      throws InputException {
    return store.edit(
        coder,
        "merge-codes",
        e -> {
          List<Code> book = e.codes();
          Code target = Codebook.byId(book, targetId);
          List<String> names = new ArrayList<>();
          int moved = 0;
          int collapsed = 0;
          Set<Long> examples = new LinkedHashSet<>(target.examples());
          Set<String> targetQueries = new HashSet<>();
          for (Rule r : e.rules()) {
            if (r.codeId() == targetId) {
              targetQueries.add(r.query());
            }
          }
          for (long sourceId : new LinkedHashSet<>(sources)) {
            if (sourceId == targetId) {
              continue;
            }
            Code source = Codebook.byId(book, sourceId);
            if (target.parent().isPresent() && target.parent().getAsLong() == sourceId) {
              throw new IllegalArgumentException(
                  "\""
                      + target.name()
                      + "\" is under \""
                      + source.name()
                      + "\"; merge the theme's codes into the theme instead");
            }
            List<Code> children = Codebook.children(book, sourceId);
            if (!children.isEmpty() && target.parent().isPresent()) {
              throw new IllegalArgumentException(
                  "\""
                      + source.name()
                      + "\" has codes under it and \""
                      + target.name()
                      + "\" is not a theme; merge into a top-level code");
            }
            for (Code child : children) {
              e.putCode(child.withParent(OptionalLong.of(targetId)));
            }
            for (Assignment a : e.assignmentsOfCode(sourceId)) {
              if (e.assignment(a.answerId(), targetId).isPresent()) {
                collapsed++;
              } else {
                e.putAssignment(
                    new Assignment(
                        a.answerId(), targetId, a.span(), a.coder(), a.origin(), a.at()));
                moved++;
              }
              e.removeAssignment(a.answerId(), sourceId);
            }
            for (Rule r : e.rules()) {
              if (r.codeId() == sourceId) {
                e.removeRule(r.id());
                if (targetQueries.add(r.query())) {
                  e.putRule(new Rule(e.newRuleId(), targetId, r.query(), r.author(), r.at()));
                }
              }
            }
            examples.addAll(source.examples());
            dropRulesAndRemovals(e, sourceId);
            e.removeCode(sourceId);
            names.add("\"" + source.name() + "\"");
          }
          if (names.isEmpty()) {
            throw new IllegalArgumentException("name at least one code to merge into another");
          }
          e.putCode(Codebook.byId(e.codes(), targetId).withExamples(List.copyOf(examples)));
          e.note("into", target.name());
          e.note("moved", moved);
          e.note("collapsed", collapsed);
          return "Merged "
              + String.join(", ", names)
              + " into \""
              + target.name()
              + "\": "
              + moved
              + " assignment(s) moved, "
              + collapsed
              + " already there.";
        });
  }

  /**
   * Splits a code: the given answers among those carrying it move to a new code beside it (same
   * theme and direction unless the draft says otherwise).
   */
  public EditOutcome split(String coder, long sourceId, CodeDraft newCode, Collection<Long> answers)
      throws InputException {
    return store.edit(
        coder,
        "split-code",
        e -> {
          List<Code> book = e.codes();
          Code source = Codebook.byId(book, sourceId);
          CodeDraft draft =
              new CodeDraft(
                  newCode.name(),
                  newCode.description(),
                  newCode.include(),
                  newCode.exclude(),
                  newCode.colour(),
                  newCode.key(),
                  newCode.parent().isPresent()
                      ? newCode.parent()
                      : Optional.of(
                          source.parent().isPresent()
                              ? Codebook.byId(book, source.parent().getAsLong()).name()
                              : ""),
                  newCode.direction().isPresent()
                      ? newCode.direction()
                      : Optional.of(source.direction()));
          Code made = Codebook.create(book, draft, e.newCodeId());
          e.putCode(made);
          Set<Long> wanted = new HashSet<>(answers);
          int moved = 0;
          for (Assignment a : e.assignmentsOfCode(sourceId)) {
            if (wanted.contains(a.answerId())) {
              e.putAssignment(
                  new Assignment(a.answerId(), made.id(), a.span(), a.coder(), a.origin(), a.at()));
              e.removeAssignment(a.answerId(), sourceId);
              moved++;
            }
          }
          e.note("from", source.name());
          e.note("into", made.name());
          e.note("moved", moved);
          return "Split \""
              + made.name()
              + "\" off \""
              + source.name()
              + "\": "
              + moved
              + " answer(s) moved.";
        });
  }

  /**
   * Splits a code by a query: the answers carrying it that the query matches move to the new code.
   *
   * @throws InputException when the query cannot be read
   */
  public EditOutcome split(String coder, long sourceId, CodeDraft newCode, String query)
      throws InputException {
    List<Long> matches = new ArrayList<>();
    for (long id : matches(query)) {
      matches.add(id);
    }
    return split(coder, sourceId, newCode, matches);
  }

  private static void dropRulesAndRemovals(CodingEdit e, long codeId) throws ProjectFileException {
    for (Rule r : e.rules()) {
      if (r.codeId() == codeId) {
        e.removeRule(r.id());
      }
    }
    for (long answer : e.vetoes(codeId)) {
      e.removeVeto(answer, codeId);
    }
  }

  /**
   * Brings in a codebook file: codes it names are updated, new ones created, themes set after all
   * codes exist; codes it does not name are left as they are. All or nothing.
   *
   * @throws InputException naming the file and line of the first problem
   */
  public EditOutcome importCodebook(String coder, Path file) throws InputException {
    byte[] bytes;
    try {
      bytes = Files.readAllBytes(file);
    } catch (IOException e) {
      throw new InputException(
          new InputProblem(file.toString(), 0, 0, "cannot be read (" + e.getMessage() + ")"));
    }
    return importCodebook(coder, file.getFileName().toString(), bytes);
  }

  /**
   * Brings in a codebook file's contents; {@code source} is its file name (its extension says CSV
   * or JSON).
   *
   * @throws InputException naming the source and line of the first problem
   */
  public EditOutcome importCodebook(String coder, String source, byte[] bytes)
      throws InputException {
    List<CodebookFile.Row> rows = CodebookFile.read(source, bytes, Format.of(source));
    InputException[] failed = new InputException[1];
    try {
      return store.edit(
          coder,
          "import-codebook",
          e -> {
            int created = 0;
            int changed = 0;
            for (int pass = 0; pass < 2; pass++) {
              for (CodebookFile.Row r : rows) {
                CodeDraft d = r.draft();
                CodeDraft fields =
                    pass == 0
                        ? new CodeDraft(
                            d.name(),
                            d.description(),
                            d.include(),
                            d.exclude(),
                            d.colour(),
                            d.key(),
                            Optional.empty(),
                            d.direction())
                        : new CodeDraft(
                            Optional.empty(),
                            Optional.empty(),
                            Optional.empty(),
                            Optional.empty(),
                            Optional.empty(),
                            Optional.empty(),
                            d.parent(),
                            Optional.empty());
                try {
                  List<Code> book = e.codes();
                  Optional<Code> have = Codebook.find(book, d.name().orElseThrow());
                  if (have.isEmpty()) {
                    e.putCode(
                        Codebook.create(book, fields, e.newCodeId()).withArchived(r.archived()));
                    created++;
                  } else {
                    Code next = Codebook.change(book, have.get(), fields);
                    if (pass == 0) {
                      next = next.withArchived(r.archived());
                    }
                    if (!next.equals(have.get())) {
                      e.putCode(next);
                      changed += pass == 0 ? 1 : 0;
                    }
                  }
                } catch (IllegalArgumentException bad) {
                  failed[0] =
                      new InputException(new InputProblem(source, r.line(), 0, bad.getMessage()));
                  throw bad;
                }
              }
            }
            e.note("file", source);
            return "Brought in "
                + source
                + ": "
                + created
                + " code(s) created, "
                + changed
                + " changed.";
          });
    } catch (IllegalArgumentException bad) {
      if (failed[0] != null) {
        throw failed[0];
      }
      throw bad;
    }
  }

  /**
   * The codebook as the contents of a file named {@code fileName}: CSV or JSON, as its extension
   * says.
   */
  public String exportCodebook(String fileName) throws InputException {
    Format format = Format.of(fileName);
    List<Code> book = store.codes();
    return format == Format.CSV ? CodebookFile.csv(book) : CodebookFile.json(book);
  }

  // ---- coding answers ----

  /** The codes of the given answers. */
  public Map<Long, List<Assignment>> assignments(Collection<Long> answerIds) throws InputException {
    return store.assignments(answerIds);
  }

  /**
   * Gives a code to an answer by hand, optionally marking the words that carry it. A rule-made or
   * suggested assignment the person confirms becomes theirs.
   */
  public EditOutcome assign(String coder, long answerId, long codeId, Optional<Span> span)
      throws InputException {
    return give(coder, answerId, codeId, span, Origin.MANUAL, "assign");
  }

  /** Accepts a suggestion: the code is given, marked as an accepted suggestion. */
  public EditOutcome accept(String coder, long answerId, long codeId) throws InputException {
    return give(coder, answerId, codeId, Optional.empty(), Origin.SUGGESTION, "accept");
  }

  private EditOutcome give(
      String coder, long answerId, long codeId, Optional<Span> span, Origin origin, String action)
      throws InputException {
    return store.edit(
        coder,
        action,
        e -> {
          Code c = usable(e, codeId);
          String text = answerText(e, answerId);
          if (span.isPresent() && span.get().end() > text.length()) {
            throw new IllegalArgumentException(
                "span "
                    + span.get().start()
                    + ".."
                    + span.get().end()
                    + " runs past the end of answer "
                    + answerId
                    + " ("
                    + text.length()
                    + " characters)");
          }
          Optional<Assignment> had = e.assignment(answerId, codeId);
          if (had.isPresent()) {
            Origin was = had.get().origin();
            boolean confirms =
                origin == Origin.MANUAL && (was == Origin.RULE || was == Origin.SUGGESTION);
            boolean marks = span.isPresent() && !span.equals(had.get().span());
            if (!confirms && !marks) {
              return "Answer " + answerId + " already has \"" + c.name() + "\".";
            }
          }
          Origin kept =
              had.map(Assignment::origin).filter(o -> o == Origin.IMPORTED).orElse(origin);
          Optional<Span> keptSpan = span.isPresent() ? span : had.flatMap(Assignment::span);
          e.putAssignment(new Assignment(answerId, codeId, keptSpan, coder, kept, e.at()));
          e.removeVeto(answerId, codeId);
          e.note("answer", answerId);
          e.note("code", c.name());
          return "Gave \"" + c.name() + "\" to answer " + answerId + ".";
        });
  }

  /**
   * Accepts every suggestion at or above a confidence, in one edit marked with that confidence
   * (undo takes them all back). Answers that got the code since, or from which a person took it,
   * are left alone.
   */
  public EditOutcome acceptAbove(String coder, List<ShownSuggestion> suggestions, double above)
      throws InputException {
    if (!(above > 0 && above <= 1)) {
      throw new IllegalArgumentException(
          "accept suggestions above a confidence between 0 and 1, not " + above);
    }
    return store.edit(
        coder,
        "accept-above",
        e -> {
          int given = 0;
          for (ShownSuggestion s : suggestions) {
            if (s.confidence() < above
                || e.assignment(s.answerId(), s.codeId()).isPresent()
                || e.vetoed(s.answerId(), s.codeId())
                || Codebook.byId(e.codes(), s.codeId()).archived()) {
              continue;
            }
            e.putAssignment(
                new Assignment(
                    s.answerId(), s.codeId(), Optional.empty(), coder, Origin.SUGGESTION, e.at()));
            given++;
          }
          e.note("above", above);
          e.note("accepted", given);
          return String.format(
              java.util.Locale.ROOT,
              "Accepted %d suggestion(s) with a confidence of %.2f or more.",
              given,
              above);
        });
  }

  /**
   * Takes a code off an answer. The removal is remembered: no rule gives the code back to this
   * answer.
   */
  public EditOutcome unassign(String coder, long answerId, long codeId) throws InputException {
    return store.edit(
        coder,
        "unassign",
        e -> {
          Code c = Codebook.byId(e.codes(), codeId);
          answerText(e, answerId);
          if (e.assignment(answerId, codeId).isEmpty()) {
            return "Answer " + answerId + " does not have \"" + c.name() + "\".";
          }
          e.removeAssignment(answerId, codeId);
          e.putVeto(answerId, codeId);
          e.note("answer", answerId);
          e.note("code", c.name());
          return "Took \"" + c.name() + "\" off answer " + answerId + ".";
        });
  }

  /**
   * Marks an answer as read by the coder with no (further) code applying, so that it counts in the
   * bases of the findings as an answer without those codes. Its codes, if it has any, stay.
   */
  public EditOutcome markRead(String coder, long answerId) throws InputException {
    return store.edit(
        coder,
        "mark-read",
        e -> {
          answerText(e, answerId);
          if (e.markedRead(answerId)) {
            return "Answer " + answerId + " is marked as read already.";
          }
          e.putRead(answerId);
          e.note("answer", answerId);
          return "Marked answer " + answerId + " as read: no other code applies.";
        });
  }

  /**
   * Takes the "read, no code applies" mark off an answer. The answer stays read while it carries a
   * code a person gave or a person took a code off it.
   */
  public EditOutcome unmarkRead(String coder, long answerId) throws InputException {
    return store.edit(
        coder,
        "unmark-read",
        e -> {
          answerText(e, answerId);
          if (!e.markedRead(answerId)) {
            return "Answer " + answerId + " has no \"read, no code applies\" mark.";
          }
          e.removeRead(answerId);
          e.note("answer", answerId);
          return "Took the \"read, no code applies\" mark off answer " + answerId + ".";
        });
  }

  /**
   * Which of the given answers a person has read, by whom and when first (unread ones left out).
   */
  public Map<Long, AnswerRead> reads(Collection<Long> answerIds) throws InputException {
    return store.reads(answerIds);
  }

  /** Takes back the coder's newest change still in effect. */
  public EditOutcome undo(String coder) throws InputException {
    return store.undo(coder);
  }

  /** Makes again the change the coder took back most recently. */
  public EditOutcome redo(String coder) throws InputException {
    return store.redo(coder);
  }

  /** The newest rows of the audit trail, newest first. */
  public List<HistoryEntry> history(int limit) throws InputException {
    return store.history(limit);
  }

  private static Code usable(CodingEdit e, long codeId) throws ProjectFileException {
    Code c = Codebook.byId(e.codes(), codeId);
    if (c.archived()) {
      throw new IllegalArgumentException(
          "\"" + c.name() + "\" is archived; bring it back before coding with it");
    }
    return c;
  }

  private static String answerText(CodingEdit e, long answerId) throws ProjectFileException {
    return e.maskedText(answerId)
        .orElseThrow(() -> new IllegalArgumentException("no answer with id " + answerId));
  }

  // ---- rules ----

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
    matches(q);
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
                  .orElseThrow(() -> new IllegalArgumentException("no rule with id " + ruleId));
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
    long[] matches = matches(query);
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
    SearchResult top = project.search(query, Math.max(sampleSize * 4, 50));
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
      found.add(matches(r.query()));
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
      throw new IllegalArgumentException("write the query whose answers should get the code");
    }
    long[] found = matches(q);
    return store.edit(
        coder,
        "assign-all",
        e -> {
          Code c = usable(e, codeId);
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

  private long[] matches(String query) throws InputException {
    try {
      return project.index().matches(query, store.questions());
    } catch (QuerySyntaxException e) {
      throw e;
    } catch (IOException e) {
      throw new ProjectFileException("the search index cannot be read: " + e.getMessage());
    }
  }
}
