package riffle.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import riffle.model.HistoryEntry;

/** The audit log: one row per change, with who, when, what, and a JSON object of details. */
final class Audit {
  private Audit() {}

  static void record(Connection c, String actor, String action, Map<String, Object> detail)
      throws SQLException {
    try (PreparedStatement ps =
        c.prepareStatement("INSERT INTO audit (at, actor, action, detail) VALUES (?, ?, ?, ?)")) {
      ps.setString(1, Instant.now().toString());
      ps.setString(2, actor);
      ps.setString(3, action);
      ps.setString(4, json(detail));
      ps.executeUpdate();
    }
  }

  /** Writes a flat JSON object of strings and numbers (RFC 8259 escaping). */
  static String json(Map<String, Object> detail) {
    StringBuilder sb = new StringBuilder("{");
    for (Map.Entry<String, Object> e : detail.entrySet()) {
      if (sb.length() > 1) {
        sb.append(',');
      }
      quote(sb, e.getKey()).append(':');
      Object v = e.getValue();
      if (v instanceof Number || v instanceof Boolean) {
        sb.append(v);
      } else {
        quote(sb, String.valueOf(v));
      }
    }
    return sb.append('}').toString();
  }

  private static StringBuilder quote(StringBuilder sb, String s) {
    sb.append('"');
    for (int i = 0; i < s.length(); i++) {
      char ch = s.charAt(i);
      switch (ch) {
        case '"' -> sb.append("\\\"");
        case '\\' -> sb.append("\\\\");
        case '\n' -> sb.append("\\n");
        case '\r' -> sb.append("\\r");
        case '\t' -> sb.append("\\t");
        default -> {
          if (ch < 0x20) {
            sb.append(String.format(Locale.ROOT, "\\u%04x", (int) ch));
          } else {
            sb.append(ch);
          }
        }
      }
    }
    return sb.append('"');
  }

  /** The newest rows, newest first. */
  static List<HistoryEntry> newest(Connection c, int limit) throws SQLException {
    List<HistoryEntry> out = new ArrayList<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT id, at, actor, action, detail FROM audit ORDER BY id DESC LIMIT ?")) {
      ps.setInt(1, limit);
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          Map<String, Object> detail = new LinkedHashMap<>();
          RowImages.image(rs.getString(5))
              .ifPresent(m -> m.forEach((k, v) -> detail.put(k, v == null ? "" : v)));
          out.add(
              new HistoryEntry(
                  rs.getLong(1),
                  Instant.parse(rs.getString(2)),
                  rs.getString(3),
                  rs.getString(4),
                  detail));
        }
      }
    }
    return out;
  }
}
