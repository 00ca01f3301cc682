package riffle.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** Reads answers with everything the index and the miners need, in a few set queries. */
final class AnswerRows {
  private AnswerRows() {}

  /** Every answer after {@code afterId}, in id order, with its codes and segments. */
  static List<ProjectStore.AnswerRow> all(Connection c, long afterId) throws SQLException {
    return select(c, afterId, List.of(), null);
  }

  /** The given answers, in id order (in groups, to keep each statement small). */
  static List<ProjectStore.AnswerRow> byIds(Connection c, Collection<Long> ids)
      throws SQLException {
    List<Long> sorted = new ArrayList<>(new java.util.TreeSet<>(ids));
    List<ProjectStore.AnswerRow> out = new ArrayList<>();
    for (int from = 0; from < sorted.size(); from += 500) {
      out.addAll(
          select(c, 0, List.of(), null, sorted.subList(from, Math.min(sorted.size(), from + 500))));
    }
    return out;
  }

  /**
   * Answers after {@code afterId}, only of {@code waves} (all when empty) and of {@code question}
   * (all when null).
   */
  static List<ProjectStore.AnswerRow> select(
      Connection c, long afterId, List<String> waves, String question) throws SQLException {
    return select(c, afterId, waves, question, List.of());
  }

  private static List<ProjectStore.AnswerRow> select(
      Connection c, long afterId, List<String> waves, String question, List<Long> ids)
      throws SQLException {
    String idFilter =
        ids.isEmpty()
            ? ""
            : " IN ("
                + ids.stream()
                    .map(String::valueOf)
                    .collect(java.util.stream.Collectors.joining(","))
                + ")";
    String waveFilter =
        waves.isEmpty() ? "" : " AND w.name IN (" + "?,".repeat(waves.size() - 1) + "?)";
    Map<Long, List<String>> codes = new HashMap<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT s.answer_id, k.name FROM assignment s JOIN code k ON k.id = s.code_id"
                + " WHERE s.answer_id > ?"
                + (ids.isEmpty() ? "" : " AND s.answer_id" + idFilter)
                + " ORDER BY s.answer_id, k.position")) {
      ps.setLong(1, afterId);
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          codes.computeIfAbsent(rs.getLong(1), k -> new ArrayList<>()).add(rs.getString(2));
        }
      }
    }
    Map<Long, Map<String, String>> meta = new HashMap<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT m.respondent_id, m.key, m.value FROM respondent_meta m"
                + " JOIN respondent r ON r.id = m.respondent_id JOIN wave w ON w.id = r.wave_id"
                + " WHERE 1 = 1"
                + (ids.isEmpty()
                    ? ""
                    : " AND m.respondent_id IN (SELECT respondent_id FROM answer WHERE id"
                        + idFilter
                        + ")")
                + waveFilter
                + " ORDER BY 1")) {
      for (int i = 0; i < waves.size(); i++) {
        ps.setString(i + 1, waves.get(i));
      }
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          meta.computeIfAbsent(rs.getLong(1), k -> new LinkedHashMap<>())
              .put(rs.getString(2), rs.getString(3));
        }
      }
    }
    List<ProjectStore.AnswerRow> out = new ArrayList<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT a.id, r.id, r.external_id, w.name, q.text, coalesce(a.masked, a.normalized),"
                + " a.substantive, a.normalized, a.foreign_language FROM answer a"
                + " JOIN respondent r ON r.id = a.respondent_id"
                + " JOIN wave w ON w.id = r.wave_id"
                + " JOIN question q ON q.id = a.question_id"
                + " WHERE a.id > ?"
                + (ids.isEmpty() ? "" : " AND a.id" + idFilter)
                + waveFilter
                + (question == null ? "" : " AND q.text = ?")
                + " ORDER BY a.id")) {
      int at = 1;
      ps.setLong(at++, afterId);
      for (String w : waves) {
        ps.setString(at++, w);
      }
      if (question != null) {
        ps.setString(at, question);
      }
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          long id = rs.getLong(1);
          out.add(
              new ProjectStore.AnswerRow(
                  id,
                  rs.getString(3),
                  rs.getString(4),
                  rs.getString(5),
                  rs.getString(6),
                  rs.getString(8),
                  rs.getInt(7) == 1,
                  rs.getInt(9) == 1,
                  codes.getOrDefault(id, List.of()),
                  meta.getOrDefault(rs.getLong(2), Map.of())));
        }
      }
    }
    return out;
  }

  /**
   * The substantive answers of {@code waves} (all when empty) and {@code question} (all when null),
   * in id order, with only what mining needs: wave and question names are read once and shared, the
   * NFC text is left out, and segments are read only for {@code segmentKeys}.
   */
  static List<ProjectStore.MinedAnswer> mined(
      Connection c, List<String> waves, String question, Set<String> segmentKeys)
      throws SQLException {
    Map<Long, String> waveNames = names(c, "SELECT id, name FROM wave");
    Map<Long, String> questionTexts = names(c, "SELECT id, text FROM question");
    String waveFilter =
        waves.isEmpty() ? "" : " AND w.name IN (" + "?,".repeat(waves.size() - 1) + "?)";
    Map<Long, Map<String, String>> meta = new HashMap<>();
    if (!segmentKeys.isEmpty()) {
      try (PreparedStatement ps =
          c.prepareStatement(
              "SELECT m.respondent_id, m.key, m.value FROM respondent_meta m"
                  + " JOIN respondent r ON r.id = m.respondent_id JOIN wave w ON w.id = r.wave_id"
                  + " WHERE m.key IN ("
                  + "?,".repeat(segmentKeys.size() - 1)
                  + "?)"
                  + waveFilter)) {
        int at = 1;
        for (String k : segmentKeys) {
          ps.setString(at++, k);
        }
        for (String w : waves) {
          ps.setString(at++, w);
        }
        try (ResultSet rs = ps.executeQuery()) {
          while (rs.next()) {
            meta.computeIfAbsent(rs.getLong(1), k -> new HashMap<>())
                .put(rs.getString(2), rs.getString(3));
          }
        }
      }
    }
    List<ProjectStore.MinedAnswer> out = new ArrayList<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT a.id, r.id, r.external_id, r.wave_id, a.question_id,"
                + " coalesce(a.masked, a.normalized), a.foreign_language FROM answer a"
                + " JOIN respondent r ON r.id = a.respondent_id"
                + (waves.isEmpty() ? "" : " JOIN wave w ON w.id = r.wave_id")
                + " WHERE a.substantive = 1"
                + waveFilter
                + (question == null
                    ? ""
                    : " AND a.question_id = (SELECT id FROM question WHERE text = ?)")
                + " ORDER BY a.id")) {
      int at = 1;
      for (String w : waves) {
        ps.setString(at++, w);
      }
      if (question != null) {
        ps.setString(at, question);
      }
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          out.add(
              new ProjectStore.MinedAnswer(
                  rs.getLong(1),
                  rs.getString(3),
                  waveNames.get(rs.getLong(4)),
                  questionTexts.get(rs.getLong(5)),
                  rs.getString(6),
                  rs.getInt(7) == 1,
                  meta.getOrDefault(rs.getLong(2), Map.of())));
        }
      }
    }
    return out;
  }

  private static Map<Long, String> names(Connection c, String sql) throws SQLException {
    Map<Long, String> out = new HashMap<>();
    try (Statement s = c.createStatement();
        ResultSet rs = s.executeQuery(sql)) {
      while (rs.next()) {
        out.put(rs.getLong(1), rs.getString(2));
      }
    }
    return out;
  }

  /**
   * A fingerprint of what derived indexes are built from. Every change to answers, codes and
   * assignments writes the audit log, so the newest answer and audit ids tell whether anything
   * changed; both are primary-key maxima, read in constant time.
   */
  static String stamp(Connection c) throws SQLException {
    try (Statement s = c.createStatement();
        ResultSet rs =
            s.executeQuery(
                "SELECT (SELECT coalesce(max(id), 0) FROM answer),"
                    + " (SELECT coalesce(max(id), 0) FROM audit),"
                    + " (SELECT coalesce(max(id), 0) FROM edit)")) {
      rs.next();
      return "last-answer="
          + rs.getLong(1)
          + ";last-edit="
          + rs.getLong(3)
          + ";last-change="
          + rs.getLong(2);
    }
  }
}
