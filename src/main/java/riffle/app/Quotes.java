package riffle.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import riffle.coding.Codebook;
import riffle.model.Analysis;
import riffle.model.Assignment;
import riffle.model.BoardItem;
import riffle.model.BoardSlot;
import riffle.model.Code;
import riffle.model.CopyBoard;
import riffle.model.EditOutcome;
import riffle.model.InputException;
import riffle.model.QuoteFindings;
import riffle.model.QuoteSlot;
import riffle.model.Sentence;
import riffle.quotes.BoardExport;
import riffle.quotes.QuoteRanker;
import riffle.quotes.QuoteSettings;
import riffle.quotes.QuoteSource;
import riffle.store.AnalysisCache;
import riffle.store.BoardRow;
import riffle.store.ProjectStore;

/**
 * Buyer wording for page copy: quotes ranked per code, candidates per use, and the copy board
 * (stored in the project file; every change is an undoable edit).
 */
public final class Quotes {
  private final ProjectStore store;

  Quotes(ProjectStore store) {
    this.store = store;
  }

  /**
   * Ranks the quotable wording of every code (or one), from the masked answers.
   *
   * @throws IllegalArgumentException when the query names a code or wave the project lacks
   */
  public QuoteFindings rank(QuoteQuery query) throws InputException {
    List<Code> book = store.codes();
    List<String> waves = store.waveNames();
    QuoteSettings.Builder settings = QuoteSettings.builder();
    if (!waves.isEmpty()) {
      settings.latestWave(waves.get(waves.size() - 1));
    }
    if (query.wave().isPresent()) {
      settings.waves(Set.of(Lookups.wave(query.wave().get(), waves, "wave")));
    }
    if (!query.segments().isEmpty()) {
      settings.segments(query.segments());
    }
    if (query.code().isPresent()) {
      settings.codes(Set.of(Codebook.named(book, query.code().get()).id()));
    }
    // Every answer goes in: typicality, near-duplicates and "new wording" are judged against all
    // of them, while the settings choose what is quoted.
    List<ProjectStore.AnswerRow> rows = store.answerRows(List.of(), Optional.empty());
    List<Long> ids = new ArrayList<>(rows.size());
    rows.forEach(r -> ids.add(r.id()));
    Map<Long, List<Assignment>> assigned = store.assignments(ids);
    List<QuoteSource> sources = new ArrayList<>(rows.size());
    try (AnalysisCache cache = AnalysisCache.open(store.file())) {
      List<ProjectStore.AnswerRow> parsed = new ArrayList<>();
      for (ProjectStore.AnswerRow r : rows) {
        if (r.substantive() && !r.foreign()) {
          parsed.add(r);
        }
      }
      Map<Long, List<Sentence>> sentences = Analyses.sentences(cache, parsed);
      for (ProjectStore.AnswerRow r : parsed) {
        Analysis analysis =
            new Analysis("eng", false, r.masked(), List.of(), sentences.get(r.id()), false);
        sources.add(
            QuoteSource.of(
                r.id(),
                r.respondent(),
                r.wave(),
                r.question(),
                r.segments(),
                analysis,
                assigned.getOrDefault(r.id(), List.of())));
      }
    }
    return QuoteRanker.rank(book, sources, settings.get());
  }

  // ---- the copy board ----

  /** The audit action of a quote taken off the board because masking now covers part of it. */
  static final String TAKEN_OFF = "unpin-masked";

  /** Who takes such quotes off, in the audit log. */
  static final String ACTOR = "riffle";

  /** A person's board edits: the notices of quotes taken off are shown until the next of these. */
  private static final Set<String> BOARD_EDITS =
      Set.of("pin-quote", "unpin-quote", "move-quote", "working-line");

  /**
   * Takes off the board every quote that is no longer words of its answer's masked text (its answer
   * was masked again, by a newer analysis, and a new mask covers part of the quote), with one
   * audit-log row each; the rest of each slot keeps its order. Returns one message per quote taken
   * off. A quote is never shown with personal data that masking now hides.
   */
  List<String> recheckBoard() throws InputException {
    List<BoardRow> gone = new ArrayList<>();
    List<Map<String, Object>> details = new ArrayList<>();
    List<String> messages = new ArrayList<>();
    for (ProjectStore.PinnedQuote p : store.pinnedQuotes()) {
      BoardRow r = p.item();
      if (p.masked().isEmpty() || p.masked().get().contains(r.text())) {
        continue;
      }
      String message =
          "Took quote "
              + r.position()
              + " of "
              + BoardExport.heading(slotOf(r))
              + " (answer "
              + r.answerId()
              + (r.code().isEmpty() ? "" : ", code \"" + r.code() + "\"")
              + ") off the copy board: the answer is now masked where the quote was, because it"
              + " held personal data. Pick another quote.";
      gone.add(r);
      messages.add(message);
      Map<String, Object> d = new java.util.LinkedHashMap<>();
      d.put("slot", r.slot());
      d.put("answer_id", r.answerId());
      d.put("code", r.code());
      d.put("message", message);
      details.add(d);
    }
    store.takeOffBoard(ACTOR, TAKEN_OFF, gone, details);
    return messages;
  }

  /**
   * The messages of the quotes taken off the board because masking now covers them, oldest first,
   * since the last time a person changed the board.
   */
  public List<String> takenOff() throws InputException {
    List<String> out = new ArrayList<>();
    for (riffle.model.HistoryEntry e : store.history(500)) {
      if (e.action().equals(TAKEN_OFF)) {
        out.add(0, String.valueOf(e.detail().get("message")));
      } else if (BOARD_EDITS.contains(e.action())) {
        break;
      }
    }
    return out;
  }

  private static QuoteSlot slotOf(BoardRow r) {
    return QuoteSlot.valueOf(r.slot().toUpperCase(java.util.Locale.ROOT));
  }

  /**
   * The copy board as stored, after {@link #recheckBoard}: a quote that is no longer its answer's
   * masked words (an undo may bring back an item pinned before its answer was masked again) is
   * taken off first.
   */
  public CopyBoard board() throws InputException {
    recheckBoard();
    List<BoardSlot> slots = new ArrayList<>();
    List<BoardRow> rows = store.board();
    for (QuoteSlot s : QuoteSlot.values()) {
      List<BoardItem> items = new ArrayList<>();
      for (BoardRow r : rows) {
        if (r.slot().equals(name(s))) {
          items.add(item(r));
        }
      }
      slots.add(new BoardSlot(s, items));
    }
    return new CopyBoard("Copy board — " + store.file().getFileName(), slots);
  }

  /**
   * Pins a quote to a slot. The text must be words of the answer's masked text, exactly as written:
   * the board never holds rewritten or unmasked wording.
   */
  public EditOutcome pin(String coder, QuoteSlot slot, long answerId, String text, String code)
      throws InputException {
    return store.edit(
        coder,
        "pin-quote",
        e -> {
          String masked =
              e.maskedText(answerId)
                  .orElseThrow(() -> new InputException("no answer with id " + answerId));
          String quote = text.strip();
          if (quote.isEmpty() || !masked.contains(quote)) {
            throw new InputException(
                "a quote must be the answer's own words as written (masked); answer "
                    + answerId
                    + " does not contain \""
                    + quote
                    + "\"");
          }
          List<BoardRow> items = e.boardSlot(name(slot));
          for (BoardRow r : items) {
            if (r.answerId() == answerId && r.text().equals(quote)) {
              return "Already on the board under " + BoardExport.heading(slot) + ".";
            }
          }
          e.putBoardItem(
              new BoardRow(
                  e.newBoardItemId(),
                  name(slot),
                  items.size() + 1,
                  answerId,
                  code,
                  quote,
                  Optional.empty(),
                  "",
                  "",
                  ""));
          return "Pinned to " + BoardExport.heading(slot) + ".";
        });
  }

  /** Takes the item at {@code index} (from 0) off a slot. */
  public EditOutcome unpin(String coder, QuoteSlot slot, int index) throws InputException {
    return store.edit(
        coder,
        "unpin-quote",
        e -> {
          List<BoardRow> items = new ArrayList<>(e.boardSlot(name(slot)));
          BoardRow gone = items.remove(check(items, index, slot));
          e.removeBoardItem(gone.id());
          renumber(e, slot, items);
          return "Took a quote off " + BoardExport.heading(slot) + ".";
        });
  }

  /** Moves an item within its slot, or to another slot's end. */
  public EditOutcome move(String coder, QuoteSlot slot, int from, QuoteSlot to, int place)
      throws InputException {
    return store.edit(
        coder,
        "move-quote",
        e -> {
          List<BoardRow> items = new ArrayList<>(e.boardSlot(name(slot)));
          BoardRow item = items.remove(check(items, from, slot));
          List<BoardRow> target = slot == to ? items : new ArrayList<>(e.boardSlot(name(to)));
          int at = Math.max(0, Math.min(target.size(), place));
          target.add(at, item.at(name(to), 0));
          renumber(e, slot, items);
          if (slot != to) {
            renumber(e, to, target);
          }
          return "Moved a quote to " + BoardExport.heading(to) + ", place " + (at + 1) + ".";
        });
  }

  /** Writes (or clears) the copywriter's working line beside a quote; the quote stays as it is. */
  public EditOutcome workingLine(String coder, QuoteSlot slot, int index, Optional<String> line)
      throws InputException {
    return store.edit(
        coder,
        "working-line",
        e -> {
          List<BoardRow> items = e.boardSlot(name(slot));
          BoardRow item = items.get(check(items, index, slot));
          e.putBoardItem(item.withWorkingLine(line.map(String::strip)));
          return "Saved the working line.";
        });
  }

  /** The board as Markdown, plain text or CSV (with answer ids), opening with the consent note. */
  public String exportBoard(String format) throws InputException {
    CopyBoard board = board();
    return switch (format) {
      case "md" -> BoardExport.markdown(board);
      case "txt" -> BoardExport.plainText(board);
      case "csv" -> BoardExport.csv(board);
      default ->
          throw new InputException("the copy board is written as md, txt or csv, not " + format);
    };
  }

  private static void renumber(riffle.store.CodingEdit e, QuoteSlot slot, List<BoardRow> items)
      throws riffle.store.ProjectFileException {
    for (int i = 0; i < items.size(); i++) {
      BoardRow r = items.get(i);
      if (r.position() != i + 1 || !r.slot().equals(name(slot))) {
        e.putBoardItem(r.at(name(slot), i + 1));
      }
    }
  }

  private static int check(List<BoardRow> items, int index, QuoteSlot slot) {
    if (index < 0 || index >= items.size()) {
      throw new InputException(
          BoardExport.heading(slot)
              + " has "
              + items.size()
              + " quote(s); there is no number "
              + (index + 1));
    }
    return index;
  }

  private static BoardItem item(BoardRow r) {
    return new BoardItem(
        r.text(), r.answerId(), r.respondent(), r.wave(), r.question(), r.code(), r.workingLine());
  }

  static String name(QuoteSlot slot) {
    return slot.name().toLowerCase(java.util.Locale.ROOT);
  }
}
