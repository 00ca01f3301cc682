package riffle.store;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;

/** A nested transaction: rolled back on close unless released first. */
final class Savepoint implements AutoCloseable {
  private final Connection c;
  private boolean released;

  Savepoint(Connection c) throws SQLException {
    this.c = c;
    exec("SAVEPOINT replay");
  }

  void release() throws SQLException {
    exec("RELEASE replay");
    released = true;
  }

  @Override
  public void close() throws SQLException {
    if (!released) {
      exec("ROLLBACK TO replay");
      exec("RELEASE replay");
    }
  }

  private void exec(String sql) throws SQLException {
    try (Statement s = c.createStatement()) {
      s.executeUpdate(sql);
    }
  }
}
