package riffle.store;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Properties;
import java.util.Set;
import org.sqlite.SQLiteErrorCode;
import org.sqlite.SQLiteException;
import riffle.model.Analysis;
import riffle.model.AnswerRead;
import riffle.model.Assignment;
import riffle.model.BatchOutcome;
import riffle.model.Code;
import riffle.model.EditOutcome;
import riffle.model.HistoryEntry;
import riffle.model.PiiMask;
import riffle.model.Progress;
import riffle.model.ProjectSummary;
import riffle.model.ReviewQueue;
import riffle.model.Rule;
import riffle.model.WaveBatch;

/**
 * An open project file. Not thread-safe: one instance per thread (each holds its own connection);
 * several instances, in one process or many, may share a file.
 *
 * <p>Size: the store package's one public door, so that callers hold one handle to one connection;
 * nearly every method is a few lines handing one read or write to the row class of its tables
 * ({@code AnswerRows}, {@code CodingRows}, {@code QueueRows} …) inside its own transaction.
 */
public final class ProjectStore implements AutoCloseable {
  /** Marks a SQLite file as a Riffle project ({@code PRAGMA application_id}). */
  static final int APPLICATION_ID = 0x52664c31;

  /** How long a writer waits for another process's write to finish. */
  static final int BUSY_TIMEOUT_MS = 15_000;

  private final Path file;
  private final Connection connection;

  private ProjectStore(Path file, Connection connection) {
    this.file = file;
    this.connection = connection;
  }

  /** Opens the project at {@code file}, creating it when there is none. */
  public static ProjectStore openOrCreate(Path file) throws ProjectFileException {
    Path parent = file.toAbsolutePath().getParent();
    if (parent != null && !Files.isDirectory(parent)) {
      throw new ProjectFileException(
          "cannot create project " + file + ": folder " + parent + " does not exist");
    }
    return open(file);
  }

  /** Opens an existing project; refuses a missing file. */
  public static ProjectStore openExisting(Path file) throws ProjectFileException {
    if (!Files.isRegularFile(file)) {
      throw new ProjectFileException(
          "no project at "
              + file
              + "; create one with: riffle import --project "
              + file
              + " --file EXPORT.csv");
    }
    return open(file);
  }

  private static ProjectStore open(Path file) throws ProjectFileException {
    Connection connection;
    try {
      SqliteLibrary.prepare();
      connection = DriverManager.getConnection("jdbc:sqlite:" + file, settings());
    } catch (SQLException e) {
      throw translate(file, e);
    }
    try {
      BusyWait.install(connection, file.getFileName().toString());
    } catch (SQLException e) {
      try {
        connection.close();
      } catch (SQLException ignored) {
        // the connection was never used
      }
      throw translate(file, e);
    }
    ProjectStore store = new ProjectStore(file, connection);
    try {
      store.prepareSchema();
      return store;
    } catch (RuntimeException e) {
      store.close();
      throw e;
    }
  }

  private static Properties settings() {
    Properties p = new Properties();
    p.setProperty("journal_mode", "WAL");
    p.setProperty("foreign_keys", "true");
    p.setProperty("synchronous", "NORMAL");
    // While the connection is set up; then BusyWait takes over, announcing long waits.
    p.setProperty("busy_timeout", Integer.toString(BUSY_TIMEOUT_MS));
    return p;
  }

  /** The project file's path. */
  public Path file() {
    return file;
  }

  /** Checks what the file holds and migrates it forward when it is older than this program. */
  private void prepareSchema() throws ProjectFileException {
    write(
        c -> {
          int appId = pragmaInt(c, "application_id");
          int version = pragmaInt(c, "user_version");
          if (appId != APPLICATION_ID && (appId != 0 || version != 0 || hasTables(c))) {
            throw new ProjectFileException(
                file
                    + " is not a Riffle project (it is another kind of database); pick a new name");
          }
          if (version > Migrations.latest()) {
            throw new ProjectFileException(
                file
                    + " was written by a newer Riffle (project schema "
                    + version
                    + "; this Riffle reads schemas up to "
                    + Migrations.latest()
                    + "). Open it with a newer Riffle; the file was not changed.");
          }
          if (version < Migrations.latest()) {
            try (Statement s = c.createStatement()) {
              s.executeUpdate("PRAGMA application_id = " + APPLICATION_ID);
            }
            Migrations.apply(c, version);
          }
          return null;
        });
  }

  private static boolean hasTables(Connection c) throws SQLException {
    try (Statement s = c.createStatement();
        ResultSet rs = s.executeQuery("SELECT count(*) FROM sqlite_schema")) {
      return rs.next() && rs.getInt(1) > 0;
    }
  }

  static int pragmaInt(Connection c, String pragma) throws SQLException {
    return SummaryQueries.count(c, "PRAGMA " + pragma);
  }

  /** The schema version of the open file. */
  public int schemaVersion() throws ProjectFileException {
    return read(c -> pragmaInt(c, "user_version"));
  }

  /** The newest schema version this program reads and writes. */
  public static int latestSchemaVersion() {
    return Migrations.latest();
  }

  /** The fielding date of a wave, when the wave exists. */
  public Optional<LocalDate> waveDate(String wave) throws ProjectFileException {
    return read(
        c -> {
          try (PreparedStatement ps =
              c.prepareStatement("SELECT fielded_on FROM wave WHERE name = ?")) {
            ps.setString(1, wave);
            try (ResultSet rs = ps.executeQuery()) {
              return rs.next() ? Optional.of(LocalDate.parse(rs.getString(1))) : Optional.empty();
            }
          }
        });
  }

  /** How many waves the project holds. */
  public int waveCount() throws ProjectFileException {
    return read(c -> SummaryQueries.count(c, "SELECT count(*) FROM wave"));
  }

  /** Stores one import in a single transaction: all of it, or (on any failure) nothing. */
  public BatchOutcome store(WaveBatch batch, Progress progress) throws ProjectFileException {
    return write(c -> new BatchWriter(c, progress).write(batch));
  }

  /**
   * An answer's id and analysis text.
   *
   * @param id the answer's id
   * @param normalized its NFC text
   */
  public record AnswerText(long id, String normalized) {}

  /**
   * An analysis to store for an answer.
   *
   * @param answerId the answer
   * @param analysis its analysis
   */
  public record Analysed(long answerId, Analysis analysis) {}

  /** Answers not yet analysed by {@code version} (new schema, new analysis rules). */
  public List<AnswerText> staleAnalyses(String version) throws ProjectFileException {
    return read(c -> AnalysisWriter.stale(c, version));
  }

  /** Rewrites the masked text, language and masks of answers, in one transaction. */
  public void storeAnalyses(List<Analysed> analysed, String version) throws ProjectFileException {
    write(
        c -> {
          AnalysisWriter.update(c, analysed, version);
          return null;
        });
  }

  /**
   * Texts already stored in a wave, by respondent id and question, so that an import analyses only
   * what is new.
   */
  public Map<String, String> storedTexts(String wave) throws ProjectFileException {
    return read(
        c -> {
          Map<String, String> out = new HashMap<>();
          try (PreparedStatement ps =
              c.prepareStatement(
                  "SELECT r.external_id, q.text, a.original FROM answer a"
                      + " JOIN respondent r ON r.id = a.respondent_id"
                      + " JOIN wave w ON w.id = r.wave_id"
                      + " JOIN question q ON q.id = a.question_id WHERE w.name = ?")) {
            ps.setString(1, wave);
            try (ResultSet rs = ps.executeQuery()) {
              while (rs.next()) {
                out.put(answerKey(rs.getString(1), rs.getString(2)), rs.getString(3));
              }
            }
          }
          return out;
        });
  }

  /** The key of {@link #storedTexts}: respondent id and question. */
  public static String answerKey(String respondent, String question) {
    return respondent + '\u0000' + question;
  }

  /**
   * What the project file keeps of an answer's analysis.
   *
   * @param id the answer
   * @param normalized its NFC text
   * @param masked its masked text, or null before its first analysis
   * @param language its language, or null before its first analysis
   * @param foreign whether it is not in the analysis language
   * @param analysedWith the analysis version that wrote these, or null
   * @param pii its masks
   */
  public record StoredAnalysis(
      long id,
      String normalized,
      String masked,
      String language,
      boolean foreign,
      String analysedWith,
      List<PiiMask> pii) {}

  /** The stored analysis columns of one answer. */
  public Optional<StoredAnalysis> storedAnalysis(long answerId) throws ProjectFileException {
    return read(c -> AnalysisWriter.load(c, answerId));
  }

  /** Every answer's id, in the order stored. */
  public List<Long> answerIds() throws ProjectFileException {
    return read(
        c -> {
          List<Long> ids = new ArrayList<>();
          try (Statement s = c.createStatement();
              ResultSet rs = s.executeQuery("SELECT id FROM answer ORDER BY id")) {
            while (rs.next()) {
              ids.add(rs.getLong(1));
            }
          }
          return ids;
        });
  }

  /**
   * An answer with its place in the project, as derived indexes need it.
   *
   * @param id the answer's id
   * @param respondent the respondent's id from the export
   * @param wave the wave's name
   * @param question the question's text
   * @param masked the masked text (the NFC text before its first analysis)
   * @param normalized the NFC text
   * @param substantive false for non-answers
   * @param foreign true when it is not in the analysis language
   * @param codes names of its codes, in codebook order
   * @param segments the respondent's segment values
   */
  public record AnswerRow(
      long id,
      String respondent,
      String wave,
      String question,
      String masked,
      String normalized,
      boolean substantive,
      boolean foreign,
      List<String> codes,
      Map<String, String> segments) {}

  /** Every answer with an id above {@code afterId}, in id order (0 for all). */
  public List<AnswerRow> answerRows(long afterId) throws ProjectFileException {
    return read(c -> AnswerRows.all(c, afterId));
  }

  /** Answers of some waves (all when empty) and one question (all when empty), in id order. */
  public List<AnswerRow> answerRows(List<String> waves, Optional<String> question)
      throws ProjectFileException {
    return read(c -> AnswerRows.select(c, 0, waves, question.orElse(null)));
  }

  /** The given answers, in id order. */
  public List<AnswerRow> answerRows(Collection<Long> ids) throws ProjectFileException {
    return read(c -> AnswerRows.byIds(c, ids));
  }

  /** The newest answer's id, or 0 in an empty project. */
  public long lastAnswerId() throws ProjectFileException {
    return read(c -> SummaryQueries.number(c, "SELECT coalesce(max(id), 0) FROM answer"));
  }

  /** The questions, in the order first seen. */
  public List<String> questions() throws ProjectFileException {
    return read(SummaryQueries::questions);
  }

  /** The questions' short names from two-row headers, by question, in question order. */
  public Map<String, String> questionNames() throws ProjectFileException {
    return read(SummaryQueries::questionNames);
  }

  /**
   * A substantive answer as phrase mining reads it.
   *
   * @param id the answer's id
   * @param respondent the respondent's id from the export
   * @param wave the wave's name
   * @param question the question's text
   * @param masked the masked text (the NFC text before its first analysis)
   * @param foreign true when it is not in the analysis language
   * @param segments the respondent's values of the segment columns asked for
   */
  public record MinedAnswer(
      long id,
      String respondent,
      String wave,
      String question,
      String masked,
      boolean foreign,
      Map<String, String> segments) {}

  /**
   * The substantive answers of some waves (all when empty) and one question (all when empty), in id
   * order, with the values of {@code segmentKeys} only.
   */
  public List<MinedAnswer> minedAnswers(
      List<String> waves, Optional<String> question, Set<String> segmentKeys)
      throws ProjectFileException {
    return read(c -> AnswerRows.mined(c, waves, question.orElse(null), segmentKeys));
  }

  /** The waves' names, in import order. */
  public List<String> waveNames() throws ProjectFileException {
    return read(
        c -> {
          List<String> names = new ArrayList<>();
          try (Statement s = c.createStatement();
              ResultSet rs = s.executeQuery("SELECT name FROM wave ORDER BY position")) {
            while (rs.next()) {
              names.add(rs.getString(1));
            }
          }
          return names;
        });
  }

  /** A fingerprint that changes whenever answers, assignments or the audit log change. */
  public String contentStamp() throws ProjectFileException {
    return read(AnswerRows::stamp);
  }

  /** Counts for the whole project. */
  public ProjectSummary summary() throws ProjectFileException {
    return read(SummaryQueries::summary);
  }

  /**
   * Folds the write-ahead log into the file (a full checkpoint, the log emptied), so that the file
   * alone holds the whole project, as before it is moved into place. The file stays in WAL mode
   * (its header unchanged), so the next connection changes nothing in it merely by opening it.
   * Needs to be the file's only connection.
   */
  public void foldIntoOneFile() throws ProjectFileException {
    int busy =
        read(
            c -> {
              try (Statement s = c.createStatement();
                  ResultSet rs = s.executeQuery("PRAGMA wal_checkpoint(TRUNCATE)")) {
                return rs.next() ? rs.getInt(1) : 1;
              }
            });
    if (busy != 0) {
      throw new ProjectFileException(
          file + " is open in another connection; it cannot be moved into place yet");
    }
  }

  /** Runs SQLite's integrity check; returns "ok" for a sound file. */
  public String integrityCheck() throws ProjectFileException {
    return read(
        c -> {
          try (Statement s = c.createStatement();
              ResultSet rs = s.executeQuery("PRAGMA integrity_check")) {
            return rs.next() ? rs.getString(1) : "no answer";
          }
        });
  }

  // ---- coding ----

  /** A change to the codebook, the coding or the rules; returns its summary sentence. */
  @FunctionalInterface
  public interface EditWork {
    String run(CodingEdit edit) throws ProjectFileException;
  }

  /**
   * Makes one change in a write transaction: everything {@code work} writes lands together and is
   * logged as one edit (undoable by {@code coder}) with one audit-log row, or nothing lands. An
   * exception from {@code work} rolls everything back.
   */
  public EditOutcome edit(String coder, String action, EditWork work) throws ProjectFileException {
    return write(
        c -> {
          CodingEdit edit = new CodingEdit(file, c, coder, action);
          String summary = work.run(edit);
          return Edits.finish(c, edit, action, summary);
        });
  }

  /** Takes back {@code coder}'s newest change still in effect. */
  public EditOutcome undo(String coder) throws ProjectFileException {
    return replay(coder, true);
  }

  /** Makes again the change {@code coder} took back most recently. */
  public EditOutcome redo(String coder) throws ProjectFileException {
    return replay(coder, false);
  }

  private EditOutcome replay(String coder, boolean backwards) throws ProjectFileException {
    String action = backwards ? "undo" : "redo";
    return write(
        c -> {
          long target = backwards ? Edits.undoable(c, coder) : Edits.redoable(c, coder);
          if (target == 0) {
            return new EditOutcome(
                0, action, 0, 0, backwards ? "Nothing of yours to undo." : "Nothing to redo.");
          }
          CodingEdit edit = new CodingEdit(file, c, coder, action);
          String summary = Edits.replay(c, edit, target, backwards);
          Edits.link(c, edit.editId(), target, backwards);
          edit.note("target", target);
          String words = (backwards ? "Undid: " : "Redid: ") + summary;
          if (edit.skipped() > 0) {
            words +=
                " (" + edit.skipped() + " change(s) left as they are: someone changed them since)";
          }
          return Edits.finish(c, edit, action, words);
        });
  }

  /** Every item of the copy board, by slot and position. */
  public List<BoardRow> board() throws ProjectFileException {
    return read(BoardRows::all);
  }

  /**
   * A pinned quote and its answer's masked text as now stored.
   *
   * @param item the board item
   * @param masked the answer's masked text, empty while the answer is not analysed
   */
  public record PinnedQuote(BoardRow item, Optional<String> masked) {
    public PinnedQuote {
      Objects.requireNonNull(item, "item");
      Objects.requireNonNull(masked, "masked");
    }
  }

  /** Every item of the copy board with its answer's masked text. */
  public List<PinnedQuote> pinnedQuotes() throws ProjectFileException {
    return read(BoardRows::withMasked);
  }

  /**
   * Takes items off the copy board outside the edit log, so that no undo puts them back, numbers
   * the rest of their slots again, and writes one audit row per item ({@code action} by {@code
   * actor}, with that item's {@code details}), all in one transaction.
   */
  public void takeOffBoard(
      String actor, String action, List<BoardRow> items, List<Map<String, Object>> details)
      throws ProjectFileException {
    if (items.size() != details.size()) {
      throw new IllegalArgumentException("one detail per item");
    }
    if (items.isEmpty()) {
      return;
    }
    write(
        c -> {
          BoardRows.remove(c, items);
          for (Map<String, Object> d : details) {
            Audit.record(c, actor, action, d);
          }
          return null;
        });
  }

  /** The codebook, in order. */
  public List<Code> codes() throws ProjectFileException {
    return read(CodingRows::codes);
  }

  /** The assignments of the given answers, by answer. */
  public Map<Long, List<Assignment>> assignments(Collection<Long> answerIds)
      throws ProjectFileException {
    return read(c -> CodingRows.assignmentsOf(c, answerIds));
  }

  /** Every assignment of a code. */
  public List<Assignment> assignmentsOfCode(long codeId) throws ProjectFileException {
    return read(c -> CodingRows.assignments(c, "code_id = ?", codeId));
  }

  /** The answers from which a person removed the code. */
  public List<Long> vetoes(long codeId) throws ProjectFileException {
    return read(c -> CodingRows.vetoes(c, codeId));
  }

  /** Every saved rule. */
  public List<Rule> rules() throws ProjectFileException {
    return read(CodingRows::rules);
  }

  /** Every read answer of the project, by answer id (unread answers are not in the map). */
  public Map<Long, AnswerRead> reads() throws ProjectFileException {
    return read(c -> CodingRows.reads(c, null));
  }

  /** The ids of every read answer, ascending (cheaper than {@link #reads()} for counting). */
  public long[] readAnswerIds() throws ProjectFileException {
    return read(CodingRows::readIds);
  }

  /** The ids of every non-answer ("n/a", "-" …), ascending. */
  public long[] nonAnswerIds() throws ProjectFileException {
    return read(
        c -> CodingRows.longs(c, "SELECT id FROM answer WHERE substantive = 0 ORDER BY id"));
  }

  /** The read answers among the given ones, by answer id (unread answers are not in the map). */
  public Map<Long, AnswerRead> reads(Collection<Long> answerIds) throws ProjectFileException {
    return read(c -> CodingRows.reads(c, answerIds));
  }

  /** The newest audit-log rows, newest first. */
  public List<HistoryEntry> history(int limit) throws ProjectFileException {
    return read(c -> Audit.newest(c, limit));
  }

  /** The newest edit's id, or 0. */
  public long lastEditId() throws ProjectFileException {
    return read(c -> SummaryQueries.number(c, "SELECT coalesce(max(id), 0) FROM edit"));
  }

  /**
   * The answers whose coding changed in edits after {@code editId}: those an edit's steps name, and
   * those carrying a code whose row changed (a rename shows in every answer of the code).
   */
  public Set<Long> answersTouchedSince(long editId) throws ProjectFileException {
    return read(
        c ->
            SummaryQueries.ids(
                c,
                "SELECT answer_id FROM edit_step WHERE edit_id > ?1 AND answer_id IS NOT NULL"
                    + " UNION SELECT a.answer_id FROM assignment a WHERE a.code_id IN (SELECT"
                    + " json_extract(row_key, '$.id') FROM edit_step WHERE edit_id > ?1 AND tbl = 'code')",
                editId));
  }

  // ---- review queues ----

  /**
   * A review queue and whether this call started it.
   *
   * @param queue the queue
   * @param created false when it had been started before (its seed and starter are kept)
   */
  public record QueueStart(ReviewQueue queue, boolean created) {}

  /**
   * Starts the review queue of a wave and question (and segment; '' and '' for none) with {@code
   * seed}, or returns the one already started for them, in one write transaction with an audit row.
   *
   * @throws IllegalArgumentException when the wave or question does not exist
   */
  public QueueStart startQueue(
      String wave, String question, String column, String value, long seed, String coder)
      throws ProjectFileException {
    return write(c -> QueueRows.start(c, wave, question, column, value, seed, coder));
  }

  /** The review queue of a wave and question (and segment; '' and '' for none), when started. */
  public Optional<ReviewQueue> queue(String wave, String question, String column, String value)
      throws ProjectFileException {
    return read(c -> QueueRows.find(c, wave, question, column, value));
  }

  /** Every review queue, by wave, question and segment. */
  public List<ReviewQueue> queues() throws ProjectFileException {
    return read(QueueRows::all);
  }

  /**
   * The answers a review queue orders: the substantive answers of the wave and question, of
   * respondents with the segment value when a column is given ('' for none), by id.
   */
  public List<Long> queueAnswers(String wave, String question, String column, String value)
      throws ProjectFileException {
    return read(c -> QueueRows.answers(c, wave, question, column, value));
  }

  /**
   * The answers of a wave and question that a person has read, by the marks of {@link #reads()}
   * (rule assignments do not count).
   */
  public Set<Long> readAnswers(String wave, String question) throws ProjectFileException {
    return read(c -> QueueRows.read(c, wave, question));
  }

  /** The segment columns of a wave's respondents. */
  public List<String> segmentColumns(String wave) throws ProjectFileException {
    return read(c -> QueueRows.segmentColumns(c, wave));
  }

  /** Work done on a connection. */
  @FunctionalInterface
  interface Work<T> {
    T run(Connection connection) throws SQLException, ProjectFileException;
  }

  <T> T read(Work<T> work) throws ProjectFileException {
    try {
      return work.run(connection);
    } catch (SQLException e) {
      throw translate(file, e);
    }
  }

  /** Runs {@code work} in a write transaction that holds SQLite's write lock from the start. */
  <T> T write(Work<T> work) throws ProjectFileException {
    try {
      try (Statement s = connection.createStatement()) {
        s.executeUpdate("BEGIN IMMEDIATE");
      }
      boolean committed = false;
      try {
        T result = work.run(connection);
        try (Statement s = connection.createStatement()) {
          s.executeUpdate("COMMIT");
        }
        committed = true;
        return result;
      } finally {
        if (!committed) {
          try (Statement s = connection.createStatement()) {
            s.executeUpdate("ROLLBACK");
          }
        }
      }
    } catch (SQLException e) {
      throw translate(file, e);
    }
  }

  static ProjectFileException translate(Path file, SQLException e) {
    if (e instanceof SQLiteException se) {
      int code = se.getResultCode().code & 0xff; // primary code, without the extended bits
      if (code == SQLiteErrorCode.SQLITE_BUSY.code || code == SQLiteErrorCode.SQLITE_LOCKED.code) {
        return new ProjectFileException(
            file
                + " is busy: another Riffle process has been writing it for over "
                + BUSY_TIMEOUT_MS / 1000
                + " s. Try again when it has finished; nothing was changed.",
            e);
      }
      if (code == SQLiteErrorCode.SQLITE_NOTADB.code) {
        return new ProjectFileException(
            file + " is not a Riffle project (not a database file); pick another name", e);
      }
      if (code == SQLiteErrorCode.SQLITE_READONLY.code
          || code == SQLiteErrorCode.SQLITE_CANTOPEN.code) {
        return new ProjectFileException(
            "cannot write project " + file + ": check the file's permissions and free space", e);
      }
    }
    return new ProjectFileException(
        "project " + file + " could not be read or written: " + e.getMessage(), e);
  }

  @Override
  public void close() {
    try {
      connection.close();
    } catch (SQLException e) {
      // Closing a connection that failed leaves nothing to clean up: SQLite keeps the file sound.
    }
  }
}
