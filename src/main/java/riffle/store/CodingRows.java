package riffle.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import riffle.model.AnswerRead;
import riffle.model.Assignment;
import riffle.model.Code;
import riffle.model.Direction;
import riffle.model.Origin;
import riffle.model.Rule;
import riffle.model.Span;

/** Reads the codebook, assignments and rules into records. */
final class CodingRows {
  private CodingRows() {}

  static final String ASSIGNMENT_COLUMNS =
      "answer_id, code_id, span_start, span_end, coder, origin, created_at";

  /** Every code, in codebook order, with its example answers. */
  static List<Code> codes(Connection c) throws SQLException {
    Map<Long, List<Long>> examples = new HashMap<>();
    try (Statement s = c.createStatement();
        ResultSet rs =
            s.executeQuery("SELECT code_id, answer_id FROM code_example ORDER BY answer_id")) {
      while (rs.next()) {
        examples.computeIfAbsent(rs.getLong(1), k -> new ArrayList<>()).add(rs.getLong(2));
      }
    }
    List<Code> out = new ArrayList<>();
    try (Statement s = c.createStatement();
        ResultSet rs =
            s.executeQuery(
                "SELECT id, name, description, include_guidance, exclude_guidance, colour,"
                    + " shortcut, parent_id, direction, archived, position, origin"
                    + " FROM code ORDER BY position, id")) {
      while (rs.next()) {
        long id = rs.getLong(1);
        long parent = rs.getLong(8);
        boolean hasParent = !rs.wasNull();
        out.add(
            new Code(
                id,
                rs.getString(2),
                rs.getString(3),
                rs.getString(4),
                rs.getString(5),
                Optional.ofNullable(rs.getString(6)),
                Optional.ofNullable(rs.getString(7)),
                hasParent ? OptionalLong.of(parent) : OptionalLong.empty(),
                Direction.valueOf(rs.getString(9).toUpperCase(Locale.ROOT)),
                rs.getInt(10) == 1,
                rs.getInt(11),
                examples.getOrDefault(id, List.of()),
                "imported".equals(rs.getString(12))));
      }
    }
    return out;
  }

  static Assignment assignment(ResultSet rs) throws SQLException {
    int start = rs.getInt(3);
    Optional<Span> span =
        rs.wasNull() ? Optional.empty() : Optional.of(new Span(start, rs.getInt(4)));
    return new Assignment(
        rs.getLong(1),
        rs.getLong(2),
        span,
        rs.getString(5),
        Origin.valueOf(rs.getString(6).toUpperCase(Locale.ROOT)),
        Instant.parse(rs.getString(7)));
  }

  /** Assignments selected by {@code where} (one long parameter), by answer then code. */
  static List<Assignment> assignments(Connection c, String where, long value) throws SQLException {
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT "
                + ASSIGNMENT_COLUMNS
                + " FROM assignment WHERE "
                + where
                + " ORDER BY answer_id, code_id")) {
      ps.setLong(1, value);
      List<Assignment> out = new ArrayList<>();
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          out.add(assignment(rs));
        }
      }
      return out;
    }
  }

  /** The assignments of the given answers, grouped by answer. */
  static Map<Long, List<Assignment>> assignmentsOf(Connection c, Collection<Long> answerIds)
      throws SQLException {
    Map<Long, List<Assignment>> out = new HashMap<>();
    List<Long> ids = new ArrayList<>(answerIds);
    for (int from = 0; from < ids.size(); from += 500) {
      List<Long> part = ids.subList(from, Math.min(ids.size(), from + 500));
      String marks = String.join(",", java.util.Collections.nCopies(part.size(), "?"));
      try (PreparedStatement ps =
          c.prepareStatement(
              "SELECT "
                  + ASSIGNMENT_COLUMNS
                  + " FROM assignment WHERE answer_id IN ("
                  + marks
                  + ") ORDER BY answer_id, code_id")) {
        for (int i = 0; i < part.size(); i++) {
          ps.setLong(i + 1, part.get(i));
        }
        try (ResultSet rs = ps.executeQuery()) {
          while (rs.next()) {
            Assignment a = assignment(rs);
            out.computeIfAbsent(a.answerId(), k -> new ArrayList<>()).add(a);
          }
        }
      }
    }
    return out;
  }

  /** Every saved rule, by code then id. */
  static List<Rule> rules(Connection c) throws SQLException {
    List<Rule> out = new ArrayList<>();
    try (Statement s = c.createStatement();
        ResultSet rs =
            s.executeQuery(
                "SELECT id, code_id, query, author, created_at FROM code_rule ORDER BY code_id, id")) {
      while (rs.next()) {
        out.add(
            new Rule(
                rs.getLong(1),
                rs.getLong(2),
                rs.getString(3),
                rs.getString(4),
                Instant.parse(rs.getString(5))));
      }
    }
    return out;
  }

  /** The answers from which a person removed the code. */
  static List<Long> vetoes(Connection c, long codeId) throws SQLException {
    List<Long> out = new ArrayList<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT answer_id FROM assignment_veto WHERE code_id = ? ORDER BY answer_id")) {
      ps.setLong(1, codeId);
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          out.add(rs.getLong(1));
        }
      }
    }
    return out;
  }

  /**
   * Who read each answer and when first, from the three marks of a person's reading: a code a
   * person gave (by hand, imported, or an accepted suggestion), a code a person took off, and the
   * "read, no code applies" mark. Rule-made codes are no mark. Only read answers are in the map.
   *
   * @param ids the answers to look at, or null for every answer of the project
   */
  static Map<Long, AnswerRead> reads(Connection c, Collection<Long> ids) throws SQLException {
    String marks =
        "SELECT answer_id, coder, created_at, 0 AS marked FROM assignment"
            + " WHERE origin IN ('manual', 'imported', 'suggestion')"
            + " UNION ALL SELECT answer_id, coder, created_at, 0 FROM assignment_veto"
            + " UNION ALL SELECT answer_id, coder, created_at, 1 FROM answer_read";
    Map<Long, List<Object[]>> rows = new HashMap<>();
    List<List<Long>> parts = new ArrayList<>();
    if (ids == null) {
      parts.add(null);
    } else {
      List<Long> all = new ArrayList<>(ids);
      for (int from = 0; from < all.size(); from += 500) {
        parts.add(all.subList(from, Math.min(all.size(), from + 500)));
      }
    }
    for (List<Long> part : parts) {
      String where =
          part == null
              ? ""
              : " WHERE answer_id IN ("
                  + String.join(",", java.util.Collections.nCopies(part.size(), "?"))
                  + ")";
      try (PreparedStatement ps =
          c.prepareStatement(
              "SELECT answer_id, coder, created_at, marked FROM (" + marks + ")" + where)) {
        if (part != null) {
          for (int i = 0; i < part.size(); i++) {
            ps.setLong(i + 1, part.get(i));
          }
        }
        try (ResultSet rs = ps.executeQuery()) {
          while (rs.next()) {
            rows.computeIfAbsent(rs.getLong(1), k -> new ArrayList<>())
                .add(new Object[] {rs.getString(2), Instant.parse(rs.getString(3)), rs.getInt(4)});
          }
        }
      }
    }
    Map<Long, AnswerRead> out = new HashMap<>();
    for (Map.Entry<Long, List<Object[]>> e : rows.entrySet()) {
      Map<String, Instant> firstBy = new HashMap<>();
      boolean marked = false;
      Instant last = Instant.MIN;
      for (Object[] r : e.getValue()) {
        Instant at = (Instant) r[1];
        firstBy.merge((String) r[0], at, (x, y) -> x.isBefore(y) ? x : y);
        marked |= (Integer) r[2] == 1;
        last = at.isAfter(last) ? at : last;
      }
      List<String> readers = new ArrayList<>(firstBy.keySet());
      readers.sort(
          java.util.Comparator.comparing((String who) -> firstBy.get(who))
              .thenComparing(who -> who));
      out.put(
          e.getKey(),
          new AnswerRead(e.getKey(), readers, firstBy.get(readers.get(0)), last, marked));
    }
    return out;
  }

  /** The ids of every read answer, ascending (no instant is parsed: for counting). */
  static long[] readIds(Connection c) throws SQLException {
    return longs(c, READ_IDS + " ORDER BY 1");
  }

  /** The ids of the read answers, as a subquery: the three marks of {@link #reads}. */
  static final String READ_IDS =
      "SELECT answer_id FROM assignment WHERE origin IN ('manual', 'imported', 'suggestion')"
          + " UNION SELECT answer_id FROM assignment_veto"
          + " UNION SELECT answer_id FROM answer_read";

  /** The ids a query returns, in its order. */
  static long[] longs(Connection c, String sql) throws SQLException {
    List<Long> out = new ArrayList<>();
    try (Statement s = c.createStatement();
        ResultSet rs = s.executeQuery(sql)) {
      while (rs.next()) {
        out.add(rs.getLong(1));
      }
    }
    return out.stream().mapToLong(Long::longValue).toArray();
  }

  /** The example answers of a code. */
  static List<Long> examples(Connection c, long codeId) throws SQLException {
    List<Long> out = new ArrayList<>();
    try (PreparedStatement ps =
        c.prepareStatement(
            "SELECT answer_id FROM code_example WHERE code_id = ? ORDER BY answer_id")) {
      ps.setLong(1, codeId);
      try (ResultSet rs = ps.executeQuery()) {
        while (rs.next()) {
          out.add(rs.getLong(1));
        }
      }
    }
    return out;
  }
}
