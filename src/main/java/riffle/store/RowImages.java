package riffle.store;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Rows of the coding tables as plain images (column → value), read and written by key. Edits record
 * the image before and after each change, so that undo and redo can put a row back exactly and tell
 * when someone else changed it since. Values are {@code Long}, {@code String} or null.
 */
final class RowImages {
  private static final ObjectMapper JSON = new ObjectMapper();
  private static final TypeReference<LinkedHashMap<String, Object>> MAP = new TypeReference<>() {};

  /** A table whose rows edits may change: its key columns and the columns kept in images. */
  enum Table {
    ASSIGNMENT(
        "assignment",
        List.of("answer_id", "code_id"),
        List.of("span_start", "span_end", "coder", "origin", "created_at")),
    VETO("assignment_veto", List.of("answer_id", "code_id"), List.of("coder", "created_at")),
    READ("answer_read", List.of("answer_id"), List.of("coder", "created_at")),
    CODE(
        "code",
        List.of("id"),
        List.of(
            "name",
            "description",
            "include_guidance",
            "exclude_guidance",
            "colour",
            "shortcut",
            "parent_id",
            "direction",
            "archived",
            "position",
            "origin",
            "created_at")),
    RULE("code_rule", List.of("id"), List.of("code_id", "query", "author", "created_at")),
    EXAMPLE("code_example", List.of("code_id", "answer_id"), List.of()),
    BOARD(
        "board_item",
        List.of("id"),
        List.of("slot", "position", "answer_id", "code", "text", "working_line"));

    final String sql;
    final List<String> keys;
    final List<String> values;

    Table(String sql, List<String> keys, List<String> values) {
      this.sql = sql;
      this.keys = keys;
      this.values = values;
    }

    static Table named(String sql) {
      for (Table t : values()) {
        if (t.sql.equals(sql)) {
          return t;
        }
      }
      throw new IllegalStateException("edit step names an unknown table " + sql);
    }

    private String where() {
      return String.join(" = ? AND ", keys) + " = ?";
    }
  }

  private RowImages() {}

  /** The row's current image, or empty when there is no such row. */
  static Optional<Map<String, Object>> read(Connection c, Table t, Map<String, Object> key)
      throws SQLException {
    String columns = t.values.isEmpty() ? "1" : String.join(", ", t.values);
    try (PreparedStatement ps =
        c.prepareStatement("SELECT " + columns + " FROM " + t.sql + " WHERE " + t.where())) {
      bindKey(ps, t, key, 1);
      try (ResultSet rs = ps.executeQuery()) {
        if (!rs.next()) {
          return Optional.empty();
        }
        Map<String, Object> image = new LinkedHashMap<>();
        for (int i = 0; i < t.values.size(); i++) {
          image.put(t.values.get(i), normal(rs.getObject(i + 1)));
        }
        return Optional.of(image);
      }
    }
  }

  /**
   * Makes the row match {@code target} (empty: no row), knowing it is {@code current} now. Inserts,
   * updates or deletes as needed; a row that changes keeps its place (and its references) because
   * it is updated, not replaced.
   */
  static void write(
      Connection c,
      Table t,
      Map<String, Object> key,
      Optional<Map<String, Object>> current,
      Optional<Map<String, Object>> target)
      throws SQLException {
    if (target.isEmpty()) {
      if (current.isPresent()) {
        try (PreparedStatement ps =
            c.prepareStatement("DELETE FROM " + t.sql + " WHERE " + t.where())) {
          bindKey(ps, t, key, 1);
          ps.executeUpdate();
        }
      }
      return;
    }
    Map<String, Object> image = target.get();
    if (current.isEmpty()) {
      List<String> columns = new ArrayList<>(t.keys);
      columns.addAll(t.values);
      String marks = String.join(", ", java.util.Collections.nCopies(columns.size(), "?"));
      try (PreparedStatement ps =
          c.prepareStatement(
              "INSERT INTO "
                  + t.sql
                  + " ("
                  + String.join(", ", columns)
                  + ") VALUES ("
                  + marks
                  + ")")) {
        int i = bindKey(ps, t, key, 1);
        for (String v : t.values) {
          ps.setObject(i++, image.get(v));
        }
        ps.executeUpdate();
      }
      return;
    }
    if (t.values.isEmpty()) {
      return;
    }
    try (PreparedStatement ps =
        c.prepareStatement(
            "UPDATE "
                + t.sql
                + " SET "
                + String.join(" = ?, ", t.values)
                + " = ? WHERE "
                + t.where())) {
      int i = 1;
      for (String v : t.values) {
        ps.setObject(i++, image.get(v));
      }
      bindKey(ps, t, key, i);
      ps.executeUpdate();
    }
  }

  private static int bindKey(PreparedStatement ps, Table t, Map<String, Object> key, int from)
      throws SQLException {
    int i = from;
    for (String k : t.keys) {
      Object v = key.get(k);
      if (v == null) {
        throw new IllegalStateException("row key of " + t.sql + " lacks " + k);
      }
      ps.setObject(i++, v);
    }
    return i;
  }

  /** A key image from its values, in the table's key order. */
  static Map<String, Object> key(Table t, Object... values) {
    if (values.length != t.keys.size()) {
      throw new IllegalArgumentException(t.sql + " has " + t.keys.size() + " key columns");
    }
    Map<String, Object> key = new LinkedHashMap<>();
    for (int i = 0; i < values.length; i++) {
      key.put(t.keys.get(i), normal(values[i]));
    }
    return key;
  }

  static String json(Optional<Map<String, Object>> image) {
    return image.map(RowImages::json).orElse(null);
  }

  static String json(Map<String, Object> image) {
    try {
      return JSON.writeValueAsString(image);
    } catch (JsonProcessingException e) {
      throw new IllegalStateException("row image cannot be written as JSON", e);
    }
  }

  static Optional<Map<String, Object>> image(String json) {
    if (json == null) {
      return Optional.empty();
    }
    try {
      Map<String, Object> raw = JSON.readValue(json, MAP);
      Map<String, Object> out = new LinkedHashMap<>();
      raw.forEach((k, v) -> out.put(k, normal(v)));
      return Optional.of(out);
    } catch (JsonProcessingException e) {
      throw new IllegalStateException("edit log holds a damaged row image: " + json, e);
    }
  }

  /** Integral numbers as {@code Long}, so images compare equal however they were read. */
  private static Object normal(Object v) {
    if (v instanceof Integer || v instanceof Short || v instanceof Byte) {
      return ((Number) v).longValue();
    }
    return v;
  }
}
