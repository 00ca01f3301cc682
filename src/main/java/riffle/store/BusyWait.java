package riffle.store;

import java.sql.Connection;
import java.sql.SQLException;
import org.sqlite.BusyHandler;

/**
 * SQLite's wait for another connection's lock, in place of its plain busy timeout: the same retries
 * for up to {@link ProjectStore#BUSY_TIMEOUT_MS}, and after a second of waiting one announcement
 * through {@link Waits}, so that a person knows why nothing happens. One per connection.
 */
final class BusyWait extends BusyHandler {
  static final long ANNOUNCE_AFTER_MS = 1_000;

  private final String what;
  private long start;
  private boolean told;

  private BusyWait(String what) {
    this.what = what;
  }

  /** Installs the wait on {@code connection}; {@code what} names the file that is waited for. */
  static void install(Connection connection, String what) throws SQLException {
    BusyHandler.setHandler(connection, new BusyWait(what));
  }

  @Override
  protected int callback(int attempts) {
    long now = System.nanoTime();
    if (attempts == 0) {
      start = now;
      told = false;
    }
    long waited = (now - start) / 1_000_000;
    if (waited >= ProjectStore.BUSY_TIMEOUT_MS) {
      return 0;
    }
    if (!told && waited >= ANNOUNCE_AFTER_MS) {
      Waits.announce("waiting for another Riffle process to finish writing " + what + " …");
      told = true;
    }
    try {
      Thread.sleep(Math.min(1L << Math.min(attempts, 6), 50));
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      return 0;
    }
    return 1;
  }
}
