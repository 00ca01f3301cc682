package riffle.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import riffle.model.Analysis;
import riffle.model.PiiMask;
import riffle.model.PiiType;

/** Reads and rewrites the analysis columns of answers (masked text, language, masks). */
final class AnalysisWriter {
  private AnalysisWriter() {}

  /** Answers analysed by another version than {@code version}, or not at all. */
  static List<ProjectStore.AnswerText> stale(Connection c, String version) throws SQLException {
    List<ProjectStore.AnswerText> out = new ArrayList<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT id, normalized FROM answer"
                + " WHERE analysed_with IS NULL OR analysed_with <> ? ORDER BY id")) {
      ps.setString(1, version);
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          out.add(new ProjectStore.AnswerText(rs.getLong(1), rs.getString(2)));
        }
      }
    }
    return out;
  }

  static void update(Connection c, List<ProjectStore.Analysed> analysed, String version)
      throws SQLException {
    try (PreparedStatement answer =
            c.prepareStatement(
                "UPDATE answer SET masked = ?, language = ?, foreign_language = ?,"
                    + " analysed_with = ? WHERE id = ?");
        PreparedStatement clear = c.prepareStatement("DELETE FROM answer_pii WHERE answer_id = ?");
        PreparedStatement pii =
            c.prepareStatement(
                "INSERT INTO answer_pii (answer_id, type, start, end, masked_start, masked_end)"
                    + " VALUES (?, ?, ?, ?, ?, ?)")) {
      for (ProjectStore.Analysed a : analysed) {
        Analysis an = a.analysis();
        answer.setString(1, an.masked());
        answer.setString(2, an.language());
        answer.setInt(3, an.foreign() ? 1 : 0);
        answer.setString(4, version);
        answer.setLong(5, a.answerId());
        answer.addBatch();
        clear.setLong(1, a.answerId());
        clear.addBatch();
        for (PiiMask m : an.pii()) {
          insertMask(pii, a.answerId(), m);
        }
      }
      answer.executeBatch();
      clear.executeBatch();
      pii.executeBatch();
    }
  }

  static Optional<ProjectStore.StoredAnalysis> load(Connection c, long answerId)
      throws SQLException {
    List<PiiMask> masks = new ArrayList<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT type, start, end, masked_start, masked_end FROM answer_pii"
                + " WHERE answer_id = ? ORDER BY start")) {
      ps.setLong(1, answerId);
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          masks.add(
              new PiiMask(
                  PiiType.valueOf(rs.getString(1).toUpperCase(Locale.ROOT)),
                  rs.getInt(2),
                  rs.getInt(3),
                  rs.getInt(4),
                  rs.getInt(5)));
        }
      }
    }
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT normalized, masked, language, foreign_language, analysed_with FROM answer"
                + " WHERE id = ?")) {
      ps.setLong(1, answerId);
      try (ResultSet rs = ps.executeQuery()) {
        if (!rs.next()) {
          return Optional.empty();
        }
        return Optional.of(
            new ProjectStore.StoredAnalysis(
                answerId,
                rs.getString(1),
                rs.getString(2),
                rs.getString(3),
                rs.getInt(4) == 1,
                rs.getString(5),
                masks));
      }
    }
  }

  static void insertMask(PreparedStatement pii, long answerId, PiiMask m) throws SQLException {
    pii.setLong(1, answerId);
    pii.setString(2, m.type().name().toLowerCase(Locale.ROOT));
    pii.setInt(3, m.start());
    pii.setInt(4, m.end());
    pii.setInt(5, m.maskedStart());
    pii.setInt(6, m.maskedEnd());
    pii.addBatch();
  }
}
