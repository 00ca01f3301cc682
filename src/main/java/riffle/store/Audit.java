package riffle.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.time.Instant;
import java.util.Locale;
import java.util.Map;

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
}
