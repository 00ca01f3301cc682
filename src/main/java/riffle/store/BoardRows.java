package riffle.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Reads the copy board. */
final class BoardRows {
  private BoardRows() {}

  private static final String SELECT =
      "SELECT b.id, b.slot, b.position, b.answer_id, b.code, b.text, b.working_line,"
          + " r.external_id, w.name, q.text FROM board_item b"
          + " JOIN answer a ON a.id = b.answer_id JOIN respondent r ON r.id = a.respondent_id"
          + " JOIN wave w ON w.id = r.wave_id JOIN question q ON q.id = a.question_id";

  static List<BoardRow> all(Connection c) throws SQLException {
    return query(c, SELECT + " ORDER BY b.slot, b.position, b.id", null);
  }

  /** Every board item with its answer's masked text as now stored. */
  static List<ProjectStore.PinnedQuote> withMasked(Connection c) throws SQLException {
    List<BoardRow> rows = all(c);
    java.util.Map<Long, String> masked = new java.util.HashMap<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT b.id, a.masked FROM board_item b JOIN answer a ON a.id = b.answer_id")) {
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          masked.put(rs.getLong(1), rs.getString(2));
        }
      }
    }
    List<ProjectStore.PinnedQuote> out = new ArrayList<>(rows.size());
    for (BoardRow r : rows) {
      out.add(new ProjectStore.PinnedQuote(r, Optional.ofNullable(masked.get(r.id()))));
    }
    return out;
  }

  /** Deletes items and numbers the rest of their slots from 1 again, in their order. */
  static void remove(Connection c, List<BoardRow> items) throws SQLException {
    java.util.Set<String> slots = new java.util.TreeSet<>();
    try (PreparedStatement ps = c.prepareStatement("DELETE FROM board_item WHERE id = ?")) {
      for (BoardRow r : items) {
        ps.setLong(1, r.id());
        ps.addBatch();
        slots.add(r.slot());
      }
      ps.executeBatch();
    }
    try (PreparedStatement ps =
        c.prepareStatement("UPDATE board_item SET position = ? WHERE id = ?")) {
      for (String slot : slots) {
        List<BoardRow> left = slot(c, slot);
        for (int i = 0; i < left.size(); i++) {
          ps.setInt(1, i + 1);
          ps.setLong(2, left.get(i).id());
          ps.addBatch();
        }
      }
      ps.executeBatch();
    }
  }

  static List<BoardRow> slot(Connection c, String slot) throws SQLException {
    return query(c, SELECT + " WHERE b.slot = ? ORDER BY b.position, b.id", slot);
  }

  private static List<BoardRow> query(Connection c, String sql, String slot) throws SQLException {
    List<BoardRow> out = new ArrayList<>();
    try (PreparedStatement ps = c.prepareStatement(sql)) {
      if (slot != null) {
        ps.setString(1, slot);
      }
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          out.add(
              new BoardRow(
                  rs.getLong(1),
                  rs.getString(2),
                  rs.getInt(3),
                  rs.getLong(4),
                  rs.getString(5),
                  rs.getString(6),
                  Optional.ofNullable(rs.getString(7)),
                  rs.getString(8),
                  rs.getString(9),
                  rs.getString(10)));
        }
      }
    }
    return out;
  }
}
