package riffle.model;

import java.util.Locale;
import java.util.Optional;

/**
 * The pace of a long phase (analysing, storing) and the time it has left, from the updates it
 * reports: units done over the time since the phase's first update, and the units left at that
 * pace. Nothing is estimated in a phase's first {@value #SETTLE_MILLIS} ms, before a unit is done,
 * or without a known total: an estimate from a few units would be a guess shown as a figure. Not
 * thread-safe: one clock per progress listener.
 */
public final class PhaseClock {
  /** How long a phase runs before its pace is shown. */
  static final long SETTLE_MILLIS = 1_500;

  private String phase;
  private long started;

  /**
   * A phase's pace and time left.
   *
   * @param perSecond units done per second so far
   * @param secondsLeft seconds until the phase's last unit at that pace, rounded up
   */
  public record Estimate(double perSecond, long secondsLeft) {
    /** In words, as the terminal and the page show it: "1,420/s, about 9 s left". */
    public String words() {
      return String.format(Locale.ROOT, "%,.0f/s, about %s left", perSecond, duration(secondsLeft));
    }
  }

  /** Records an update at {@code nanos} (System.nanoTime) and estimates from it when it can. */
  public Optional<Estimate> update(String phase, long done, long total, long nanos) {
    if (!phase.equals(this.phase)) {
      this.phase = phase;
      this.started = nanos;
    }
    long elapsed = nanos - started;
    if (total <= 0 || done <= 0 || done >= total || elapsed < SETTLE_MILLIS * 1_000_000) {
      return Optional.empty();
    }
    double perSecond = done / (elapsed / 1e9);
    long left = (long) Math.ceil((total - done) / perSecond);
    return Optional.of(new Estimate(perSecond, left));
  }

  /** "9 s", "3 min 5 s", "1 h 2 min". */
  static String duration(long seconds) {
    if (seconds < 60) {
      return seconds + " s";
    }
    if (seconds < 3600) {
      return (seconds / 60) + " min " + (seconds % 60) + " s";
    }
    return (seconds / 3600) + " h " + (seconds % 3600 / 60) + " min";
  }
}
