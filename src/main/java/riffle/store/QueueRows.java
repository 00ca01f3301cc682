package riffle.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import riffle.model.InputException;
import riffle.model.ReviewQueue;

/**
 * Reads and starts review queues, and reads what a queue orders: the substantive answers of a wave
 * and question (of one segment value, when the queue has one) and which of them a person has read.
 * A segment is stored as '' and '' when the queue has none; columns and values match regardless of
 * case, values also regardless of surrounding space.
 */
final class QueueRows {
  private QueueRows() {}

  private static final String SELECT =
      "SELECT q.id, w.name, k.text, q.segment_key, q.segment_value, q.seed, q.started_by,"
          + " q.started_at FROM review_queue q JOIN wave w ON w.id = q.wave_id"
          + " JOIN question k ON k.id = q.question_id";

  private static final String ANSWERS_OF =
      " FROM answer a JOIN respondent r ON r.id = a.respondent_id"
          + " JOIN wave w ON w.id = r.wave_id JOIN question k ON k.id = a.question_id"
          + " WHERE w.name = ? AND k.text = ?";

  private static final String IN_SEGMENT =
      " AND EXISTS (SELECT 1 FROM respondent_meta m WHERE m.respondent_id = r.id"
          + " AND m.key = ? COLLATE NOCASE AND lower(trim(m.value)) = lower(trim(?)))";

  static List<ReviewQueue> all(Connection c) throws SQLException {
    List<ReviewQueue> out = new ArrayList<>();
    try (PreparedStatement ps =
            c.prepareStatement(
                SELECT + " ORDER BY w.position, k.position, q.segment_key, q.segment_value, q.id");
        ResultSet rs = ps.executeQuery()) {
      while (rs.next()) {
        out.add(queue(rs));
      }
    }
    return out;
  }

  static Optional<ReviewQueue> find(
      Connection c, String wave, String question, String column, String value) throws SQLException {
    try (PreparedStatement ps =
        c.prepareStatement(
            SELECT
                + " WHERE w.name = ? AND k.text = ? AND q.segment_key = ?"
                + " AND q.segment_value = ?")) {
      ps.setString(1, wave);
      ps.setString(2, question);
      ps.setString(3, column);
      ps.setString(4, value.strip());
      try (ResultSet rs = ps.executeQuery()) {
        return rs.next() ? Optional.of(queue(rs)) : Optional.empty();
      }
    }
  }

  /** Starts a queue, or returns the one already started for the same wave, question and segment. */
  static ProjectStore.QueueStart start(
      Connection c,
      String wave,
      String question,
      String column,
      String value,
      long seed,
      String coder)
      throws SQLException {
    Optional<ReviewQueue> existing = find(c, wave, question, column, value);
    if (existing.isPresent()) {
      return new ProjectStore.QueueStart(existing.get(), false);
    }
    int added;
    try (PreparedStatement ps =
        c.prepareStatement(
            "INSERT INTO review_queue (wave_id, question_id, segment_key, segment_value, seed,"
                + " started_by, started_at) SELECT w.id, k.id, ?, ?, ?, ?, ? FROM wave w, question"
                + " k WHERE w.name = ? AND k.text = ?")) {
      ps.setString(1, column);
      ps.setString(2, value.strip());
      ps.setLong(3, seed);
      ps.setString(4, coder);
      ps.setString(5, Instant.now().toString());
      ps.setString(6, wave);
      ps.setString(7, question);
      added = ps.executeUpdate();
    }
    if (added == 0) {
      throw new InputException(
          "there is no wave \"" + wave + "\" with the question \"" + question + "\"");
    }
    ReviewQueue made = find(c, wave, question, column, value).orElseThrow();
    Map<String, Object> detail = new LinkedHashMap<>();
    detail.put("wave", made.wave());
    detail.put("question", made.question());
    made.segment().ifPresent(s -> detail.put("segment", s));
    detail.put("seed", made.seed());
    Audit.record(c, coder, "start-queue", detail);
    return new ProjectStore.QueueStart(made, true);
  }

  /** The substantive answers of a wave and question (and segment, unless ''), by id. */
  static List<Long> answers(Connection c, String wave, String question, String column, String value)
      throws SQLException {
    boolean segment = !column.isEmpty();
    List<Long> out = new ArrayList<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT a.id"
                + ANSWERS_OF
                + " AND a.substantive = 1"
                + (segment ? IN_SEGMENT : "")
                + " ORDER BY a.id")) {
      ps.setString(1, wave);
      ps.setString(2, question);
      if (segment) {
        ps.setString(3, column);
        ps.setString(4, value);
      }
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          out.add(rs.getLong(1));
        }
      }
    }
    return out;
  }

  /**
   * The answers of a wave and question that a person has read: those with a mark of {@link
   * CodingRows#reads} (a code a person gave or took off, or the "read, no code applies" mark).
   */
  static Set<Long> read(Connection c, String wave, String question) throws SQLException {
    Set<Long> out = new LinkedHashSet<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT a.id"
                + ANSWERS_OF
                + " AND a.id IN ("
                + CodingRows.READ_IDS
                + ") ORDER BY a.id")) {
      ps.setString(1, wave);
      ps.setString(2, question);
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          out.add(rs.getLong(1));
        }
      }
    }
    return out;
  }

  /** The segment columns the respondents of a wave have, in name order. */
  static List<String> segmentColumns(Connection c, String wave) throws SQLException {
    List<String> out = new ArrayList<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT DISTINCT m.key FROM respondent_meta m JOIN respondent r"
                + " ON r.id = m.respondent_id JOIN wave w ON w.id = r.wave_id WHERE w.name = ?"
                + " ORDER BY m.key")) {
      ps.setString(1, wave);
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          out.add(rs.getString(1));
        }
      }
    }
    return out;
  }

  private static ReviewQueue queue(ResultSet rs) throws SQLException {
    String column = rs.getString(4);
    String value = rs.getString(5);
    return new ReviewQueue(
        rs.getLong(1),
        rs.getString(2),
        rs.getString(3),
        column.isEmpty() ? Optional.empty() : Optional.of(column),
        column.isEmpty() ? Optional.empty() : Optional.of(value),
        rs.getLong(6),
        rs.getString(7),
        Instant.parse(rs.getString(8)));
  }
}
