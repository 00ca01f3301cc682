package riffle.app;

import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import riffle.coding.Codebook;
import riffle.model.AnswerRead;
import riffle.model.Assignment;
import riffle.model.Code;
import riffle.model.EditOutcome;
import riffle.model.HistoryEntry;
import riffle.model.InputException;
import riffle.model.Origin;
import riffle.model.ShownSuggestion;
import riffle.model.Span;
import riffle.store.CodingEdit;
import riffle.store.ProjectFileException;
import riffle.store.ProjectStore;

/**
 * The coding of a project's answers: codes given and taken off, suggestions accepted, answers
 * marked read; and the undo, redo and history of every edit, codebook and rules included. Every
 * change is written at once, as one edit that its coder can undo and redo, with a row in the audit
 * log.
 *
 * <p>Concurrency rule: changes are intents on single rows ("give code C to answer A", "take C off
 * A"), never "set A's codes to this list"; each runs in its own write transaction (see
 * DEVELOPERS.md), so two tabs or two coders changing the same answer both land. Giving a code an
 * answer already has, or taking off one it lacks, changes nothing.
 */
public final class Coding {
  private final ProjectStore store;

  Coding(ProjectStore store) {
    this.store = store;
  }

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
            throw new InputException(
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
      throw new InputException(
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

  static Code usable(CodingEdit e, long codeId) throws ProjectFileException {
    Code c = Codebook.byId(e.codes(), codeId);
    if (c.archived()) {
      throw new InputException(
          "\"" + c.name() + "\" is archived; bring it back before coding with it");
    }
    return c;
  }

  static String answerText(CodingEdit e, long answerId) throws ProjectFileException {
    return e.maskedText(answerId)
        .orElseThrow(() -> new InputException("no answer with id " + answerId));
  }
}
