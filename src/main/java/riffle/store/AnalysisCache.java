package riffle.store;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;
import java.util.Optional;
import java.util.Properties;
import org.sqlite.SQLiteErrorCode;
import org.sqlite.SQLiteException;

/**
 * The derived analysis cache beside a project ({@code NAME.riffle.d/analysis.db}): each answer's
 * parsed sentences, keyed by answer id and stamped with the analysis version, and the last results
 * of costly read-only computations (phrases), keyed by what was asked and stamped with the state of
 * the project they were computed from. Derived, never the source of truth: a missing, damaged or
 * foreign cache is deleted and rebuilt, and losing it loses no work. Not thread-safe: one instance
 * per thread.
 */
public final class AnalysisCache implements AutoCloseable {
  static final int APPLICATION_ID = 0x52664331;

  private final Connection connection;

  private AnalysisCache(Connection connection) {
    this.connection = connection;
  }

  /** The folder of derived files for a project file: {@code NAME.riffle.d}. */
  public static Path derivedFolder(Path projectFile) {
    return projectFile.resolveSibling(projectFile.getFileName() + ".d");
  }

  /**
   * Opens the cache of {@code projectFile}, creating it as needed. A cache file that SQLite finds
   * damaged or not a database is deleted and made anew; one that another process is writing is
   * waited for (SQLite lets one connection write at a time), never taken for damaged.
   */
  public static AnalysisCache open(Path projectFile) throws ProjectFileException {
    Path folder = derivedFolder(projectFile);
    Path file = folder.resolve("analysis.db");
    String name = "the analysis cache of " + projectFile.getFileName();
    try {
      Files.createDirectories(folder);
      try {
        return connect(file, name);
      } catch (SQLException e) {
        if (!damaged(e)) {
          throw e;
        }
        for (String suffix : List.of("", "-wal", "-shm")) {
          Files.deleteIfExists(folder.resolve("analysis.db" + suffix));
        }
        return connect(file, name);
      }
    } catch (IOException | SQLException e) {
      throw new ProjectFileException(
          "cannot write the analysis cache in " + folder + ": " + e.getMessage(), e);
    }
  }

  private static boolean damaged(SQLException e) {
    if (e instanceof SQLiteException se) {
      int code = se.getResultCode().code & 0xff; // primary code, without the extended bits
      return code == SQLiteErrorCode.SQLITE_CORRUPT.code
          || code == SQLiteErrorCode.SQLITE_NOTADB.code;
    }
    return false;
  }

  private static AnalysisCache connect(Path file, String name) throws SQLException {
    Properties p = new Properties();
    p.setProperty("journal_mode", "WAL");
    p.setProperty("synchronous", "OFF");
    p.setProperty("busy_timeout", Integer.toString(ProjectStore.BUSY_TIMEOUT_MS));
    SqliteLibrary.prepare();
    Connection c = DriverManager.getConnection("jdbc:sqlite:" + file, p);
    try (Statement s = c.createStatement()) {
      BusyWait.install(c, name);
      if (ProjectStore.pragmaInt(c, "application_id") != APPLICATION_ID) {
        // One process makes the table; another one starting at once waits, then finds it made.
        s.executeUpdate("BEGIN IMMEDIATE");
        boolean done = false;
        try {
          if (ProjectStore.pragmaInt(c, "application_id") != APPLICATION_ID) {
            s.executeUpdate("DROP TABLE IF EXISTS analysis");
            s.executeUpdate(
                "CREATE TABLE analysis (answer_id INTEGER PRIMARY KEY, version TEXT NOT NULL,"
                    + " data BLOB NOT NULL)");
            s.executeUpdate("PRAGMA application_id = " + APPLICATION_ID);
          }
          s.executeUpdate("COMMIT");
          done = true;
        } finally {
          if (!done) {
            s.executeUpdate("ROLLBACK");
          }
        }
      }
      try (ResultSet rs = s.executeQuery("SELECT count(*) FROM analysis")) {
        rs.next();
      }
      if (!hasTable(c, "result")) {
        s.executeUpdate(
            "CREATE TABLE IF NOT EXISTS result (key TEXT PRIMARY KEY, stamp TEXT NOT NULL,"
                + " used INTEGER NOT NULL, data BLOB NOT NULL)");
      }
    } catch (SQLException e) {
      c.close();
      throw e;
    }
    return new AnalysisCache(c);
  }

  private static boolean hasTable(Connection c, String name) throws SQLException {
    try (PreparedStatement ps =
        c.prepareStatement("SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = ?")) {
      ps.setString(1, name);
      try (ResultSet rs = ps.executeQuery()) {
        return rs.next();
      }
    }
  }

  /** Results kept; the least recently used goes first. */
  static final int RESULTS_KEPT = 64;

  /**
   * The result kept under {@code key}, when it was computed from the project as {@code stamp}
   * describes it; a result from another state is dropped.
   */
  public Optional<byte[]> result(String key, String stamp) throws ProjectFileException {
    try (PreparedStatement ps =
        connection.prepareStatement("SELECT stamp, data FROM result WHERE key = ?")) {
      ps.setString(1, key);
      try (ResultSet rs = ps.executeQuery()) {
        if (!rs.next()) {
          return Optional.empty();
        }
        if (rs.getString(1).equals(stamp)) {
          return Optional.of(rs.getBytes(2));
        }
      }
      try (PreparedStatement drop =
          connection.prepareStatement("DELETE FROM result WHERE key = ?")) {
        drop.setString(1, key);
        drop.executeUpdate();
      }
      return Optional.empty();
    } catch (SQLException e) {
      throw new ProjectFileException("cannot read the analysis cache: " + e.getMessage(), e);
    }
  }

  /**
   * Keeps a result under {@code key}, computed from the project as {@code stamp} describes it;
   * results made from another state, and the least recently stored beyond {@link #RESULTS_KEPT},
   * are dropped.
   */
  public void putResult(String key, String stamp, byte[] data) throws ProjectFileException {
    try {
      connection.setAutoCommit(false);
      try (PreparedStatement stale =
              connection.prepareStatement("DELETE FROM result WHERE stamp <> ?");
          PreparedStatement put =
              connection.prepareStatement(
                  "INSERT OR REPLACE INTO result (key, stamp, used, data) VALUES (?, ?,"
                      + " (SELECT coalesce(max(used), 0) + 1 FROM result), ?)");
          PreparedStatement trim =
              connection.prepareStatement(
                  "DELETE FROM result WHERE key NOT IN"
                      + " (SELECT key FROM result ORDER BY used DESC LIMIT ?)")) {
        stale.setString(1, stamp);
        stale.executeUpdate();
        put.setString(1, key);
        put.setString(2, stamp);
        put.setBytes(3, data);
        put.executeUpdate();
        trim.setInt(1, RESULTS_KEPT);
        trim.executeUpdate();
      }
      connection.commit();
    } catch (SQLException e) {
      throw new ProjectFileException("cannot write the analysis cache: " + e.getMessage(), e);
    } finally {
      try {
        connection.setAutoCommit(true);
      } catch (SQLException e) {
        // The connection is unusable; the next open rebuilds the cache.
      }
    }
  }

  /** One answer's cached parse. */
  public record Entry(long answerId, byte[] data) {}

  /** Stores entries in one transaction, replacing older ones. */
  public void putAll(List<Entry> entries, String version) throws ProjectFileException {
    try {
      connection.setAutoCommit(false);
      try (PreparedStatement ps =
          connection.prepareStatement(
              "INSERT OR REPLACE INTO analysis (answer_id, version, data) VALUES (?, ?, ?)")) {
        for (Entry e : entries) {
          ps.setLong(1, e.answerId());
          ps.setString(2, version);
          ps.setBytes(3, e.data());
          ps.addBatch();
        }
        ps.executeBatch();
      }
      connection.commit();
    } catch (SQLException e) {
      throw new ProjectFileException("cannot write the analysis cache: " + e.getMessage(), e);
    } finally {
      try {
        connection.setAutoCommit(true);
      } catch (SQLException e) {
        // The connection is unusable; the next open rebuilds the cache.
      }
    }
  }

  /** The cached parse of an answer, when present and written by {@code version}. */
  public Optional<byte[]> get(long answerId, String version) throws ProjectFileException {
    try (PreparedStatement ps =
        connection.prepareStatement("SELECT version, data FROM analysis WHERE answer_id = ?")) {
      ps.setLong(1, answerId);
      try (ResultSet rs = ps.executeQuery()) {
        if (rs.next() && rs.getString(1).equals(version)) {
          return Optional.of(rs.getBytes(2));
        }
        return Optional.empty();
      }
    } catch (SQLException e) {
      throw new ProjectFileException("cannot read the analysis cache: " + e.getMessage(), e);
    }
  }

  /**
   * The cached parses of many answers at once, aligned with {@code answerIds} (which must be in
   * ascending order); an answer without a parse from {@code version} gets null. One range scan of
   * the cache's primary key, merged with the ids, so reading one question of a project touches only
   * the entries between its first and last answer.
   */
  public byte[][] getAll(long[] answerIds, String version) throws ProjectFileException {
    byte[][] out = new byte[answerIds.length][];
    if (answerIds.length == 0) {
      return out;
    }
    for (int i = 1; i < answerIds.length; i++) {
      if (answerIds[i] <= answerIds[i - 1]) {
        throw new IllegalArgumentException("answer ids must ascend: " + answerIds[i]);
      }
    }
    try (PreparedStatement ps =
        connection.prepareStatement(
            "SELECT answer_id, data FROM analysis WHERE answer_id BETWEEN ? AND ?"
                + " AND version = ? ORDER BY answer_id")) {
      ps.setLong(1, answerIds[0]);
      ps.setLong(2, answerIds[answerIds.length - 1]);
      ps.setString(3, version);
      try (ResultSet rs = ps.executeQuery()) {
        int at = 0;
        while (rs.next()) {
          long id = rs.getLong(1);
          while (answerIds[at] < id) {
            at++;
          }
          if (answerIds[at] == id) {
            out[at] = rs.getBytes(2);
          }
        }
      }
    } catch (SQLException e) {
      throw new ProjectFileException("cannot read the analysis cache: " + e.getMessage(), e);
    }
    return out;
  }

  /** How many answers have a parse from {@code version}. */
  public int count(String version) throws ProjectFileException {
    try (PreparedStatement ps =
        connection.prepareStatement("SELECT count(*) FROM analysis WHERE version = ?")) {
      ps.setString(1, version);
      try (ResultSet rs = ps.executeQuery()) {
        return rs.next() ? rs.getInt(1) : 0;
      }
    } catch (SQLException e) {
      throw new ProjectFileException("cannot read the analysis cache: " + e.getMessage(), e);
    }
  }

  @Override
  public void close() {
    try {
      connection.close();
    } catch (SQLException e) {
      // Nothing to keep: the cache is derived.
    }
  }
}
