package riffle.store;

import java.util.Objects;
import java.util.function.Consumer;

/**
 * Where a process says that it is waiting for another Riffle process (a write to the project file,
 * the search index). The command line prints it on stderr; by default it goes nowhere. Thread-safe.
 */
public final class Waits {
  private static volatile Consumer<String> sink = message -> {};

  private Waits() {}

  /** Sends every later announcement to {@code to}; returns where they went before. */
  public static Consumer<String> announceTo(Consumer<String> to) {
    Consumer<String> before = sink;
    sink = Objects.requireNonNull(to, "to");
    return before;
  }

  /** Says that this process waits, and for what ("waiting for … to finish …"). */
  public static void announce(String message) {
    sink.accept(message);
  }
}
