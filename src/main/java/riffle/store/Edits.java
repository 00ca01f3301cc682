package riffle.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import riffle.model.EditOutcome;
import riffle.store.RowImages.Table;

/**
 * The edit log: each change a person makes is an edit of recorded steps; undo and redo replay a
 * coder's own edits backwards or forwards, and are edits themselves.
 *
 * <p>Undo takes back the coder's newest edit that is still in effect. Redo makes again the edit the
 * coder took back most recently, as long as the coder has made no new edit since that undo (a new
 * edit ends the redo chain, as in any editor). A step whose row someone else changed since is left
 * alone and counted as skipped: undo never overwrites another coder's work.
 */
final class Edits {
  private Edits() {}

  static long begin(Connection c, String coder, String action, Instant at) throws SQLException {
    try (PreparedStatement ps =
        c.prepareStatement(
            "INSERT INTO edit (coder, action, summary, at) VALUES (?, ?, '', ?) RETURNING id")) {
      ps.setString(1, coder);
      ps.setString(2, action);
      ps.setString(3, at.toString());
      try (ResultSet rs = ps.executeQuery()) {
        rs.next();
        return rs.getLong(1);
      }
    }
  }

  /** Closes an edit: its summary, and one audit-log row. */
  static EditOutcome finish(Connection c, CodingEdit edit, String action, String summary)
      throws SQLException {
    if (edit.editId() == 0) {
      return new EditOutcome(0, action, 0, edit.skipped(), summary);
    }
    try (PreparedStatement ps = c.prepareStatement("UPDATE edit SET summary = ? WHERE id = ?")) {
      ps.setString(1, summary);
      ps.setLong(2, edit.editId());
      ps.executeUpdate();
    }
    Map<String, Object> detail = new LinkedHashMap<>();
    detail.put("edit", edit.editId());
    detail.put("changes", edit.changes());
    detail.put("summary", summary);
    detail.putAll(edit.detail());
    Audit.record(c, edit.coder(), action, detail);
    return new EditOutcome(edit.editId(), action, edit.changes(), edit.skipped(), summary);
  }

  /** The coder's newest edit still in effect, or 0. */
  static long undoable(Connection c, String coder) throws SQLException {
    return single(
        c,
        "SELECT id FROM edit WHERE coder = ? AND reverts IS NULL AND restores IS NULL"
            + " AND state = 'done' ORDER BY id DESC LIMIT 1",
        coder);
  }

  /** The edit the coder took back most recently with no new edit since, or 0. */
  static long redoable(Connection c, String coder) throws SQLException {
    return single(
        c,
        "SELECT u.reverts FROM edit u JOIN edit e ON e.id = u.reverts"
            + " WHERE u.coder = ?1 AND e.state = 'undone' AND u.id > coalesce((SELECT max(id)"
            + " FROM edit WHERE coder = ?1 AND reverts IS NULL AND restores IS NULL), 0)"
            + " ORDER BY u.id DESC LIMIT 1",
        coder);
  }

  /** Replays edit {@code target} backwards (undo) or forwards (redo) as the new edit {@code e}. */
  static String replay(Connection c, CodingEdit e, long target, boolean backwards)
      throws SQLException {
    record Step(Table table, Map<String, Object> key, String before, String after, Long answer) {}
    List<Step> steps = new ArrayList<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT tbl, row_key, before, after, answer_id FROM edit_step WHERE edit_id = ?"
                + " ORDER BY seq "
                + (backwards ? "DESC" : "ASC"))) {
      ps.setLong(1, target);
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          long answer = rs.getLong(5);
          // wasNull speaks of the column read last: ask before reading the others.
          Long answerId = rs.wasNull() ? null : answer;
          steps.add(
              new Step(
                  Table.named(rs.getString(1)),
                  RowImages.image(rs.getString(2)).orElseThrow(),
                  rs.getString(3),
                  rs.getString(4),
                  answerId));
        }
      }
    }
    for (Step s : steps) {
      Optional<Map<String, Object>> before = RowImages.image(s.before);
      Optional<Map<String, Object>> after = RowImages.image(s.after);
      if (backwards) {
        e.replay(s.table, s.key, after, before, s.answer);
      } else {
        e.replay(s.table, s.key, before, after, s.answer);
      }
    }
    String summary;
    try (PreparedStatement ps =
        c.prepareStatement("UPDATE edit SET state = ? WHERE id = ? RETURNING summary")) {
      ps.setString(1, backwards ? "undone" : "done");
      ps.setLong(2, target);
      try (ResultSet rs = ps.executeQuery()) {
        rs.next();
        summary = rs.getString(1);
      }
    }
    return summary;
  }

  /** Marks the new edit as the undo or redo of {@code target}. */
  static void link(Connection c, long edit, long target, boolean backwards) throws SQLException {
    if (edit == 0) {
      return;
    }
    try (PreparedStatement ps =
        c.prepareStatement(
            "UPDATE edit SET " + (backwards ? "reverts" : "restores") + " = ? WHERE id = ?")) {
      ps.setLong(1, target);
      ps.setLong(2, edit);
      ps.executeUpdate();
    }
  }

  private static long single(Connection c, String sql, String coder) throws SQLException {
    try (PreparedStatement ps = c.prepareStatement(sql)) {
      ps.setString(1, coder);
      try (ResultSet rs = ps.executeQuery()) {
        return rs.next() ? rs.getLong(1) : 0;
      }
    }
  }
}
