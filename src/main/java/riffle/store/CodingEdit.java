package riffle.store;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import riffle.model.Assignment;
import riffle.model.Code;
import riffle.model.Rule;
import riffle.store.RowImages.Table;

/**
 * One change to the codebook, the coding or the rules, made inside a write transaction (see {@link
 * ProjectStore#edit}). Reads see the project as it is inside the transaction; every write is
 * recorded as a step (the row's image before and after) so that the change can be undone and
 * redone, and nothing is written for a step that changes nothing.
 *
 * <p>Size: one class because every read and write of an edit goes through the one transaction and
 * the one list of steps that undo replays; it is the only writer of the coding tables.
 */
public final class CodingEdit {
  private final Path file;
  private final Connection c;
  private final String coder;
  private final String action;
  private final Instant at = Instant.now();
  private long editId;
  private int steps;
  private int skipped;
  private final Set<Long> answers = new LinkedHashSet<>();
  private final Map<String, Object> detail = new LinkedHashMap<>();

  CodingEdit(Path file, Connection c, String coder, String action) {
    this.file = file;
    this.c = c;
    this.coder = coder;
    this.action = action;
  }

  /** Who makes the change. */
  public String coder() {
    return coder;
  }

  /** When the change is made. */
  public Instant at() {
    return at;
  }

  // ---- reads ----

  /** The codebook, in order. */
  public List<Code> codes() throws ProjectFileException {
    return read(() -> CodingRows.codes(c));
  }

  /** One code. */
  public Optional<Code> code(long id) throws ProjectFileException {
    return codes().stream().filter(k -> k.id() == id).findFirst();
  }

  /** The assignment of a code to an answer, when there is one. */
  public Optional<Assignment> assignment(long answerId, long codeId) throws ProjectFileException {
    return read(
        () -> {
          List<Assignment> found =
              CodingRows.assignments(c, "answer_id = " + answerId + " AND code_id = ?", codeId);
          return found.stream().findFirst();
        });
  }

  /** Every assignment of a code. */
  public List<Assignment> assignmentsOfCode(long codeId) throws ProjectFileException {
    return read(() -> CodingRows.assignments(c, "code_id = ?", codeId));
  }

  /** Every assignment of an answer. */
  public List<Assignment> assignmentsOfAnswer(long answerId) throws ProjectFileException {
    return read(() -> CodingRows.assignments(c, "answer_id = ?", answerId));
  }

  /** Whether a person removed this code from this answer (so rules leave it alone). */
  public boolean vetoed(long answerId, long codeId) throws ProjectFileException {
    return read(
        () ->
            RowImages.read(c, Table.VETO, RowImages.key(Table.VETO, answerId, codeId)).isPresent());
  }

  /** The answers from which a person removed the code. */
  public List<Long> vetoes(long codeId) throws ProjectFileException {
    return read(() -> CodingRows.vetoes(c, codeId));
  }

  /** Whether a person marked the answer as read with no (further) code applying. */
  public boolean markedRead(long answerId) throws ProjectFileException {
    return read(
        () -> RowImages.read(c, Table.READ, RowImages.key(Table.READ, answerId)).isPresent());
  }

  /** Every saved rule. */
  public List<Rule> rules() throws ProjectFileException {
    return read(() -> CodingRows.rules(c));
  }

  /** The masked text of an answer, or empty when there is no such answer. */
  public Optional<String> maskedText(long answerId) throws ProjectFileException {
    return read(
        () -> {
          try (PreparedStatement ps =
              c.prepareStatement("SELECT coalesce(masked, normalized) FROM answer WHERE id = ?")) {
            ps.setLong(1, answerId);
            try (ResultSet rs = ps.executeQuery()) {
              return rs.next() ? Optional.of(rs.getString(1)) : Optional.<String>empty();
            }
          }
        });
  }

  /** An id no code has. */
  public long newCodeId() throws ProjectFileException {
    return read(() -> SummaryQueries.number(c, "SELECT coalesce(max(id), 0) + 1 FROM code"));
  }

  /** An id no rule has. */
  public long newRuleId() throws ProjectFileException {
    return read(() -> SummaryQueries.number(c, "SELECT coalesce(max(id), 0) + 1 FROM code_rule"));
  }

  // ---- writes ----

  /** Creates or updates a code, with its example answers. */
  public void putCode(Code code) throws ProjectFileException {
    Map<String, Object> key = RowImages.key(Table.CODE, code.id());
    write(
        () -> {
          Optional<Map<String, Object>> before = RowImages.read(c, Table.CODE, key);
          Map<String, Object> image = new LinkedHashMap<>();
          image.put("name", code.name().strip());
          image.put("description", code.description());
          image.put("include_guidance", code.include());
          image.put("exclude_guidance", code.exclude());
          image.put("colour", code.colour().orElse(null));
          image.put("shortcut", code.key().orElse(null));
          image.put("parent_id", code.parent().isPresent() ? code.parent().getAsLong() : null);
          image.put("direction", code.direction().name().toLowerCase(Locale.ROOT));
          image.put("archived", code.archived() ? 1L : 0L);
          image.put("position", (long) code.position());
          image.put("origin", code.imported() ? "imported" : "manual");
          image.put(
              "created_at", before.map(b -> b.get("created_at")).orElse((Object) at.toString()));
          step(Table.CODE, key, before, Optional.of(image), null);
          Set<Long> wanted = new LinkedHashSet<>(code.examples());
          Set<Long> had = new LinkedHashSet<>(CodingRows.examples(c, code.id()));
          for (long answer : had) {
            if (!wanted.contains(answer)) {
              Map<String, Object> k = RowImages.key(Table.EXAMPLE, code.id(), answer);
              step(Table.EXAMPLE, k, RowImages.read(c, Table.EXAMPLE, k), Optional.empty(), null);
            }
          }
          for (long answer : wanted) {
            if (!had.contains(answer)) {
              Map<String, Object> k = RowImages.key(Table.EXAMPLE, code.id(), answer);
              step(Table.EXAMPLE, k, Optional.empty(), Optional.of(Map.of()), null);
            }
          }
        });
  }

  /**
   * Deletes a code with its example links. The caller first moves or removes its assignments,
   * rules, removals and child codes: deleting a code still referenced fails.
   */
  public void removeCode(long codeId) throws ProjectFileException {
    write(
        () -> {
          for (long answer : CodingRows.examples(c, codeId)) {
            Map<String, Object> k = RowImages.key(Table.EXAMPLE, codeId, answer);
            step(Table.EXAMPLE, k, RowImages.read(c, Table.EXAMPLE, k), Optional.empty(), null);
          }
          Map<String, Object> key = RowImages.key(Table.CODE, codeId);
          step(Table.CODE, key, RowImages.read(c, Table.CODE, key), Optional.empty(), null);
        });
  }

  /** Gives a code to an answer, or updates how it is given (span, coder, origin). */
  public void putAssignment(Assignment a) throws ProjectFileException {
    Map<String, Object> key = RowImages.key(Table.ASSIGNMENT, a.answerId(), a.codeId());
    Map<String, Object> image = new LinkedHashMap<>();
    image.put("span_start", a.span().map(s -> (Object) (long) s.start()).orElse(null));
    image.put("span_end", a.span().map(s -> (Object) (long) s.end()).orElse(null));
    image.put("coder", a.coder());
    image.put("origin", a.origin().name().toLowerCase(Locale.ROOT));
    image.put("created_at", a.at().toString());
    write(
        () ->
            step(
                Table.ASSIGNMENT,
                key,
                RowImages.read(c, Table.ASSIGNMENT, key),
                Optional.of(image),
                a.answerId()));
  }

  /** Takes a code off an answer; nothing happens when it was not there. */
  public void removeAssignment(long answerId, long codeId) throws ProjectFileException {
    Map<String, Object> key = RowImages.key(Table.ASSIGNMENT, answerId, codeId);
    write(
        () ->
            step(
                Table.ASSIGNMENT,
                key,
                RowImages.read(c, Table.ASSIGNMENT, key),
                Optional.empty(),
                answerId));
  }

  /** Records that a person removed the code from the answer, so that no rule gives it back. */
  public void putVeto(long answerId, long codeId) throws ProjectFileException {
    Map<String, Object> key = RowImages.key(Table.VETO, answerId, codeId);
    write(
        () -> {
          Optional<Map<String, Object>> before = RowImages.read(c, Table.VETO, key);
          if (before.isEmpty()) {
            Map<String, Object> image = new LinkedHashMap<>();
            image.put("coder", coder);
            image.put("created_at", at.toString());
            step(Table.VETO, key, before, Optional.of(image), null);
          }
        });
  }

  /** Lifts a removal's veto (a person gave the code back). */
  public void removeVeto(long answerId, long codeId) throws ProjectFileException {
    Map<String, Object> key = RowImages.key(Table.VETO, answerId, codeId);
    write(() -> step(Table.VETO, key, RowImages.read(c, Table.VETO, key), Optional.empty(), null));
  }

  /**
   * Marks the answer as read by this edit's coder, with no (further) code applying; nothing happens
   * when it is marked already.
   */
  public void putRead(long answerId) throws ProjectFileException {
    Map<String, Object> key = RowImages.key(Table.READ, answerId);
    write(
        () -> {
          Optional<Map<String, Object>> before = RowImages.read(c, Table.READ, key);
          if (before.isEmpty()) {
            Map<String, Object> image = new LinkedHashMap<>();
            image.put("coder", coder);
            image.put("created_at", at.toString());
            step(Table.READ, key, before, Optional.of(image), answerId);
          }
        });
  }

  /** Takes the "read, no code applies" mark off an answer (its codes, if any, still count). */
  public void removeRead(long answerId) throws ProjectFileException {
    Map<String, Object> key = RowImages.key(Table.READ, answerId);
    write(
        () ->
            step(Table.READ, key, RowImages.read(c, Table.READ, key), Optional.empty(), answerId));
  }

  /** Saves a rule (new, or with the same id). */
  public void putRule(Rule rule) throws ProjectFileException {
    Map<String, Object> key = RowImages.key(Table.RULE, rule.id());
    Map<String, Object> image = new LinkedHashMap<>();
    image.put("code_id", rule.codeId());
    image.put("query", rule.query());
    image.put("author", rule.author());
    image.put("created_at", rule.at().toString());
    write(
        () -> step(Table.RULE, key, RowImages.read(c, Table.RULE, key), Optional.of(image), null));
  }

  /** Deletes a saved rule; the assignments it made stay. */
  public void removeRule(long ruleId) throws ProjectFileException {
    Map<String, Object> key = RowImages.key(Table.RULE, ruleId);
    write(() -> step(Table.RULE, key, RowImages.read(c, Table.RULE, key), Optional.empty(), null));
  }

  /** The copy board's items of one slot, in order. */
  public List<BoardRow> boardSlot(String slot) throws ProjectFileException {
    return read(() -> BoardRows.slot(c, slot));
  }

  /** An id no board item has. */
  public long newBoardItemId() throws ProjectFileException {
    return read(() -> SummaryQueries.number(c, "SELECT coalesce(max(id), 0) + 1 FROM board_item"));
  }

  /** Pins or updates a board item. */
  public void putBoardItem(BoardRow item) throws ProjectFileException {
    Map<String, Object> key = RowImages.key(Table.BOARD, item.id());
    Map<String, Object> image = new LinkedHashMap<>();
    image.put("slot", item.slot());
    image.put("position", (long) item.position());
    image.put("answer_id", item.answerId());
    image.put("code", item.code());
    image.put("text", item.text());
    image.put("working_line", item.workingLine().orElse(null));
    write(
        () ->
            step(Table.BOARD, key, RowImages.read(c, Table.BOARD, key), Optional.of(image), null));
  }

  /** Takes an item off the board. */
  public void removeBoardItem(long id) throws ProjectFileException {
    Map<String, Object> key = RowImages.key(Table.BOARD, id);
    write(
        () -> step(Table.BOARD, key, RowImages.read(c, Table.BOARD, key), Optional.empty(), null));
  }

  /** Adds a particular of the change to its audit-log row. */
  public void note(String key, Object value) {
    detail.put(key, value);
  }

  /** How many rows this edit changed so far. */
  public int changes() {
    return steps;
  }

  // ---- the log ----

  /**
   * Writes one step: makes the row {@code after}, knowing it is {@code before}, and records both.
   * Does nothing when they are equal.
   */
  private void step(
      Table t,
      Map<String, Object> key,
      Optional<Map<String, Object>> before,
      Optional<Map<String, Object>> after,
      Long answerId)
      throws SQLException {
    if (before.equals(after)) {
      return;
    }
    RowImages.write(c, t, key, before, after);
    if (editId == 0) {
      editId = Edits.begin(c, coder, action, at);
    }
    steps++;
    try (PreparedStatement ps =
        c.prepareStatement(
            "INSERT INTO edit_step (edit_id, seq, tbl, row_key, before, after, answer_id)"
                + " VALUES (?, ?, ?, ?, ?, ?, ?)")) {
      ps.setLong(1, editId);
      ps.setInt(2, steps);
      ps.setString(3, t.sql);
      ps.setString(4, RowImages.json(key));
      ps.setString(5, RowImages.json(before));
      ps.setString(6, RowImages.json(after));
      ps.setObject(7, answerId);
      ps.executeUpdate();
    }
    if (answerId != null) {
      answers.add(answerId);
    }
  }

  /**
   * Replays a recorded step, undoing ({@code from} = after, {@code to} = before) or redoing it.
   * Returns false, changing nothing, when the row is no longer as the step left it (someone changed
   * it since) or the change would break the codebook's integrity.
   */
  boolean replay(
      Table t,
      Map<String, Object> key,
      Optional<Map<String, Object>> from,
      Optional<Map<String, Object>> to,
      Long answerId)
      throws SQLException {
    Optional<Map<String, Object>> now = RowImages.read(c, t, key);
    if (!now.equals(from)) {
      skipped++;
      return false;
    }
    try (Savepoint sp = new Savepoint(c)) {
      step(t, key, now, to, answerId);
      sp.release();
      return true;
    } catch (SQLException e) {
      // A constraint refused it (a code still in use, a name taken since): leave the row.
      skipped++;
      return false;
    }
  }

  long editId() {
    return editId;
  }

  int skipped() {
    return skipped;
  }

  Map<String, Object> detail() {
    return detail;
  }

  Set<Long> answers() {
    return answers;
  }

  /** Work on the connection that may fail with SQL's exception. */
  @FunctionalInterface
  private interface SqlRead<T> {
    T run() throws SQLException;
  }

  @FunctionalInterface
  private interface SqlWrite {
    void run() throws SQLException;
  }

  private <T> T read(SqlRead<T> work) throws ProjectFileException {
    try {
      return work.run();
    } catch (SQLException e) {
      throw ProjectStore.translate(file, e);
    }
  }

  private void write(SqlWrite work) throws ProjectFileException {
    try {
      work.run();
    } catch (SQLException e) {
      throw ProjectStore.translate(file, e);
    }
  }
}
