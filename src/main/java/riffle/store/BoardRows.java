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
