package riffle.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import riffle.model.ProjectSummary;
import riffle.model.WaveSummary;

/** Read-only counts over a project. */
final class SummaryQueries {
  private SummaryQueries() {}

  static ProjectSummary summary(Connection c) throws SQLException {
    List<WaveSummary> waves = new ArrayList<>();
    try (Statement s = c.createStatement();
        ResultSet rs =
            s.executeQuery(
                """
                SELECT w.name, w.fielded_on,
                       (SELECT count(*) FROM respondent r WHERE r.wave_id = w.id),
                       count(a.id), coalesce(sum(a.substantive), 0)
                FROM wave w
                LEFT JOIN respondent r ON r.wave_id = w.id
                LEFT JOIN answer a ON a.respondent_id = r.id
                GROUP BY w.id
                ORDER BY w.position
                """)) {
      while (rs.next()) {
        waves.add(
            new WaveSummary(
                rs.getString(1),
                LocalDate.parse(rs.getString(2)),
                rs.getInt(3),
                rs.getInt(4),
                rs.getInt(5)));
      }
    }
    return new ProjectSummary(
        waves,
        questions(c),
        questionNames(c),
        count(c, "SELECT count(*) FROM respondent"),
        count(c, "SELECT count(*) FROM answer"),
        count(c, "SELECT count(*) FROM answer WHERE substantive = 1"),
        count(c, "SELECT count(*) FROM code"),
        count(c, "SELECT count(*) FROM assignment"));
  }

  /** The questions, in the order first seen. */
  static List<String> questions(Connection c) throws SQLException {
    List<String> questions = new ArrayList<>();
    try (Statement s = c.createStatement();
        ResultSet rs = s.executeQuery("SELECT text FROM question ORDER BY position")) {
      while (rs.next()) {
        questions.add(rs.getString(1));
      }
    }
    return questions;
  }

  /** The questions' short names, by question text, for the questions that have one. */
  static Map<String, String> questionNames(Connection c) throws SQLException {
    Map<String, String> names = new LinkedHashMap<>();
    try (Statement s = c.createStatement();
        ResultSet rs =
            s.executeQuery(
                "SELECT text, name FROM question WHERE name IS NOT NULL ORDER BY position")) {
      while (rs.next()) {
        names.put(rs.getString(1), rs.getString(2));
      }
    }
    return names;
  }

  static int count(Connection c, String sql) throws SQLException {
    return Math.toIntExact(number(c, sql));
  }

  /** The single number a query returns, or 0 when it returns no row. */
  static long number(Connection c, String sql) throws SQLException {
    try (Statement s = c.createStatement();
        ResultSet rs = s.executeQuery(sql)) {
      return rs.next() ? rs.getLong(1) : 0;
    }
  }

  /** The ids a query with one long parameter ({@code ?1}) returns. */
  static Set<Long> ids(Connection c, String sql, long parameter) throws SQLException {
    Set<Long> out = new LinkedHashSet<>();
    try (PreparedStatement ps = c.prepareStatement(sql)) {
      ps.setLong(1, parameter);
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          out.add(rs.getLong(1));
        }
      }
    }
    return out;
  }
}
