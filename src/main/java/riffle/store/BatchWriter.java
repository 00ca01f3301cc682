package riffle.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import riffle.model.BatchOutcome;
import riffle.model.InputProblem;
import riffle.model.NewAnswer;
import riffle.model.NewRespondent;
import riffle.model.PiiMask;
import riffle.model.Progress;
import riffle.model.WaveBatch;

/**
 * Writes one {@link WaveBatch} inside the caller's transaction.
 *
 * <p>An answer is identified by (wave, respondent, question). One already stored with the same text
 * is a duplicate and adds nothing; one stored with a different text is kept as it was and reported,
 * since silently replacing coded text would orphan its codes.
 */
final class BatchWriter {
  private final Connection c;
  private final String now = Instant.now().toString();
  private final Map<String, Long> codeIds = new HashMap<>();
  private final Progress progress;
  private int codesCreated;

  BatchWriter(Connection c, Progress progress) {
    this.c = c;
    this.progress = progress;
  }

  BatchOutcome write(WaveBatch batch) throws SQLException {
    long waveId = waveId(batch);
    Map<String, Long> questionIds = new HashMap<>();
    for (String q : batch.questions()) {
      questionIds.put(q, questionId(q, batch.questionNames().get(q)));
    }
    long batchId = insertBatch(waveId, batch);
    int respondentsAdded = 0;
    int answersAdded = 0;
    int duplicateRows = 0;
    int assignmentsAdded = 0;
    int readWithoutCode = 0;
    List<InputProblem> problems = new ArrayList<>();
    List<BatchOutcome.Added> added = new ArrayList<>();
    try (PreparedStatement newRespondent =
            c.prepareStatement(
                "INSERT INTO respondent (wave_id, external_id, responded_at, batch_id, source_line)"
                    + " VALUES (?, ?, ?, ?, ?) ON CONFLICT (wave_id, external_id) DO NOTHING"
                    + " RETURNING id");
        PreparedStatement oldRespondent =
            c.prepareStatement("SELECT id FROM respondent WHERE wave_id = ? AND external_id = ?");
        PreparedStatement meta =
            c.prepareStatement(
                "INSERT OR IGNORE INTO respondent_meta (respondent_id, key, value) VALUES (?, ?, ?)");
        PreparedStatement newAnswer =
            c.prepareStatement(
                "INSERT INTO answer (respondent_id, question_id, original, normalized, substantive,"
                    + " source_line, source_column, masked, language, foreign_language,"
                    + " analysed_with) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)"
                    + " ON CONFLICT (respondent_id, question_id) DO NOTHING RETURNING id");
        PreparedStatement pii =
            c.prepareStatement(
                "INSERT INTO answer_pii (answer_id, type, start, end, masked_start, masked_end)"
                    + " VALUES (?, ?, ?, ?, ?, ?)");
        PreparedStatement oldAnswer =
            c.prepareStatement(
                "SELECT original FROM answer WHERE respondent_id = ? AND question_id = ?");
        PreparedStatement assign =
            c.prepareStatement(
                "INSERT OR IGNORE INTO assignment (answer_id, code_id, coder, origin, created_at)"
                    + " VALUES (?, ?, ?, 'imported', ?)");
        PreparedStatement readMark =
            c.prepareStatement(
                "INSERT OR IGNORE INTO answer_read (answer_id, coder, created_at) VALUES (?, ?, ?)")) {
      int total = batch.respondents().size();
      int done = 0;
      for (NewRespondent r : batch.respondents()) {
        if (done++ % 1000 == 0) {
          progress.update("storing", done - 1, total);
        }
        long respondentId;
        newRespondent.setLong(1, waveId);
        newRespondent.setString(2, r.externalId());
        newRespondent.setString(3, r.respondedAt().isEmpty() ? null : r.respondedAt());
        newRespondent.setLong(4, batchId);
        newRespondent.setLong(5, r.line());
        Long inserted = returnedId(newRespondent);
        if (inserted != null) {
          respondentId = inserted;
          respondentsAdded++;
        } else {
          oldRespondent.setLong(1, waveId);
          oldRespondent.setString(2, r.externalId());
          respondentId = singleLong(oldRespondent);
        }
        for (Map.Entry<String, String> m : r.meta().entrySet()) {
          meta.setLong(1, respondentId);
          meta.setString(2, m.getKey());
          meta.setString(3, m.getValue());
          meta.addBatch();
        }
        meta.executeBatch();
        int rowAdded = 0;
        int rowDuplicates = 0;
        for (NewAnswer a : r.answers()) {
          long questionId = questionIds.get(a.question());
          newAnswer.setLong(1, respondentId);
          newAnswer.setLong(2, questionId);
          newAnswer.setString(3, a.original());
          newAnswer.setString(4, a.normalized());
          newAnswer.setInt(5, a.substantive() ? 1 : 0);
          newAnswer.setLong(6, a.line());
          newAnswer.setInt(7, a.column());
          newAnswer.setString(8, a.analysis().masked());
          newAnswer.setString(9, a.analysis().language());
          newAnswer.setInt(10, a.analysis().foreign() ? 1 : 0);
          newAnswer.setString(11, batch.analysedWith());
          Long answerId = returnedId(newAnswer);
          if (answerId != null) {
            rowAdded++;
            added.add(new BatchOutcome.Added(answerId, a));
            for (PiiMask m : a.analysis().pii()) {
              AnalysisWriter.insertMask(pii, answerId, m);
            }
            if (!a.analysis().pii().isEmpty()) {
              pii.executeBatch();
            }
            for (String code : a.codes()) {
              assign.setLong(1, answerId);
              assign.setLong(2, codeId(code));
              assign.setString(3, a.coder());
              assign.setString(4, now);
              assignmentsAdded += assign.executeUpdate();
            }
            if (a.codedElsewhere() && a.codes().isEmpty()) {
              // Coded elsewhere with no code applying: read all the same.
              readMark.setLong(1, answerId);
              readMark.setString(2, a.coder());
              readMark.setString(3, now);
              readWithoutCode += readMark.executeUpdate();
            }
            continue;
          }
          oldAnswer.setLong(1, respondentId);
          oldAnswer.setLong(2, questionId);
          String stored;
          try (ResultSet rs = oldAnswer.executeQuery()) {
            rs.next();
            stored = rs.getString(1);
          }
          if (stored.equals(a.original())) {
            rowDuplicates++;
          } else {
            problems.add(
                new InputProblem(
                    batch.source(),
                    a.line(),
                    a.column(),
                    "respondent "
                        + r.externalId()
                        + " already has a different answer to \""
                        + a.question()
                        + "\" in wave "
                        + batch.wave()
                        + "; the stored answer was kept (import into a new wave to keep both)"));
          }
        }
        answersAdded += rowAdded;
        if (rowAdded == 0 && rowDuplicates == r.answers().size()) {
          duplicateRows++;
        }
      }
    }
    progress.update("storing", total(batch), total(batch));
    try (PreparedStatement ps =
        c.prepareStatement("UPDATE import_batch SET answers = ?, duplicates = ? WHERE id = ?")) {
      ps.setInt(1, answersAdded);
      ps.setInt(2, duplicateRows);
      ps.setLong(3, batchId);
      ps.executeUpdate();
    }
    Map<String, Object> detail = new LinkedHashMap<>();
    detail.put("wave", batch.wave());
    detail.put("source", batch.source());
    detail.put("sha256", batch.sha256());
    detail.put("rows", batch.rows());
    detail.put("answers", answersAdded);
    detail.put("duplicates", duplicateRows);
    detail.put("skipped", batch.skipped());
    detail.put("codes_created", codesCreated);
    detail.put("assignments", assignmentsAdded);
    detail.put("read_without_code", readWithoutCode);
    Audit.record(c, batch.actor(), "import", detail);
    return new BatchOutcome(
        respondentsAdded,
        answersAdded,
        duplicateRows,
        codesCreated,
        assignmentsAdded,
        problems,
        added);
  }

  private static long total(WaveBatch batch) {
    return batch.respondents().size();
  }

  private long waveId(WaveBatch batch) throws SQLException {
    long id = find("SELECT id FROM wave WHERE name = ?", batch.wave());
    return id >= 0
        ? id
        : insert(
            "INSERT INTO wave (name, fielded_on, position, created_at)"
                + " VALUES (?, ?, (SELECT coalesce(max(position), 0) + 1 FROM wave), ?)",
            batch.wave(),
            batch.fieldedOn().toString(),
            now);
  }

  /** A question's id, adding it when new; a name is kept when the question has none yet. */
  private long questionId(String text, String name) throws SQLException {
    long id = find("SELECT id FROM question WHERE text = ?", text);
    if (id < 0) {
      id =
          insert(
              "INSERT INTO question (text, position)"
                  + " VALUES (?, (SELECT coalesce(max(position), 0) + 1 FROM question))",
              text);
    }
    if (name != null) {
      try (PreparedStatement ps =
          c.prepareStatement("UPDATE question SET name = ? WHERE id = ? AND name IS NULL")) {
        ps.setString(1, name);
        ps.setLong(2, id);
        ps.executeUpdate();
      }
    }
    return id;
  }

  /** Finds a code by name, ignoring case, or adds it to the codebook marked as imported. */
  private long codeId(String name) throws SQLException {
    String key = name.toLowerCase(Locale.ROOT);
    Long known = codeIds.get(key);
    if (known != null) {
      return known;
    }
    long id = find("SELECT id FROM code WHERE name = ?", name);
    if (id < 0) {
      id =
          insert(
              "INSERT INTO code (name, position, origin, created_at)"
                  + " VALUES (?, (SELECT coalesce(max(position), 0) + 1 FROM code), 'imported', ?)",
              name,
              now);
      codesCreated++;
    }
    codeIds.put(key, id);
    return id;
  }

  /** The id a one-parameter query finds, or -1. */
  private long find(String sql, String value) throws SQLException {
    try (PreparedStatement ps = c.prepareStatement(sql)) {
      ps.setString(1, value);
      try (ResultSet rs = ps.executeQuery()) {
        return rs.next() ? rs.getLong(1) : -1;
      }
    }
  }

  /** Runs an INSERT of string values and returns the new row's id. */
  private long insert(String sql, String... values) throws SQLException {
    try (PreparedStatement ps = c.prepareStatement(sql + " RETURNING id")) {
      for (int i = 0; i < values.length; i++) {
        ps.setString(i + 1, values[i]);
      }
      return singleLong(ps);
    }
  }

  private long insertBatch(long waveId, WaveBatch batch) throws SQLException {
    try (PreparedStatement ps =
        c.prepareStatement(
            "INSERT INTO import_batch (wave_id, source, sha256, encoding, delimiter, rows, answers,"
                + " duplicates, skipped, imported_at, imported_by)"
                + " VALUES (?, ?, ?, ?, ?, ?, 0, 0, ?, ?, ?) RETURNING id")) {
      ps.setLong(1, waveId);
      ps.setString(2, batch.source());
      ps.setString(3, batch.sha256());
      ps.setString(4, batch.encoding());
      ps.setString(5, batch.delimiter());
      ps.setInt(6, batch.rows());
      ps.setInt(7, batch.skipped());
      ps.setString(8, now);
      ps.setString(9, batch.actor());
      return singleLong(ps);
    }
  }

  private static Long returnedId(PreparedStatement ps) throws SQLException {
    try (ResultSet rs = ps.executeQuery()) {
      return rs.next() ? rs.getLong(1) : null;
    }
  }

  private static long singleLong(PreparedStatement ps) throws SQLException {
    try (ResultSet rs = ps.executeQuery()) {
      if (!rs.next()) {
        throw new SQLException("expected one row");
      }
      return rs.getLong(1);
    }
  }
}
