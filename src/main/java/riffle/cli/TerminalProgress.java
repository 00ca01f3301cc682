package riffle.cli;

import java.io.PrintStream;
import java.util.Locale;
import riffle.model.PhaseClock;
import riffle.model.Progress;

/**
 * A one-line progress bar on stderr, shown only when the user is at a terminal, with the phase's
 * pace and time left once it can tell them ({@link PhaseClock}).
 */
final class TerminalProgress implements Progress {
  private static final int WIDTH = 30;
  private static final long INTERVAL_NANOS = 100_000_000L;

  private final PrintStream err;
  private final PhaseClock clock = new PhaseClock();
  private long lastDraw;
  private boolean drawn;

  private TerminalProgress(PrintStream err) {
    this.err = err;
  }

  /** A bar on stderr when there is a terminal, otherwise silence. */
  static Progress forStderr() {
    return System.console() == null ? Progress.NONE : new TerminalProgress(System.err);
  }

  @Override
  public void update(String phase, long done, long total) {
    long now = System.nanoTime();
    String pace = clock.update(phase, done, total, now).map(e -> " · " + e.words()).orElse("");
    boolean finished = total >= 0 && done >= total;
    if (!finished && drawn && now - lastDraw < INTERVAL_NANOS) {
      return;
    }
    lastDraw = now;
    drawn = true;
    String line;
    if (total <= 0) {
      line = String.format(Locale.ROOT, "%-8s …", phase);
    } else {
      int filled = (int) (WIDTH * Math.min(done, total) / total);
      line =
          String.format(
              Locale.ROOT,
              "%-8s [%s%s] %3d%% %,d/%,d%s",
              phase,
              "#".repeat(filled),
              " ".repeat(WIDTH - filled),
              100 * Math.min(done, total) / total,
              done,
              total,
              pace);
    }
    err.print("\r" + line + "\033[K");
    if (finished) {
      err.print("\r\033[K");
    }
    err.flush();
  }
}
