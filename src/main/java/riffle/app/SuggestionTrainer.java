package riffle.app;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import riffle.coding.SuggestSettings;
import riffle.store.ProjectStore;

/**
 * Retrains a project's suggestion engines in the background, so that coding never waits for it:
 * asking for the engines returns the newest finished ones at once and, when the coding changed
 * since they were trained, starts one retraining (never two at a time) on its own connection.
 * Thread-safe; one per open project in a server.
 */
public final class SuggestionTrainer implements AutoCloseable {
  private final Path file;
  private final SuggestSettings settings;
  private final ExecutorService worker =
      Executors.newSingleThreadExecutor(
          r -> {
            Thread t = new Thread(r, "riffle-suggestion-training");
            t.setDaemon(true);
            t.setPriority(Thread.MIN_PRIORITY);
            return t;
          });
  private final AtomicReference<Suggestions.Trained> latest = new AtomicReference<>();
  private final AtomicReference<Future<?>> running = new AtomicReference<>();
  private final AtomicReference<String> lastProblem = new AtomicReference<>();

  /** A trainer for the project at {@code file}, with the default settings. */
  public SuggestionTrainer(Path file) {
    this(file, SuggestSettings.defaults());
  }

  SuggestionTrainer(Path file, SuggestSettings settings) {
    this.file = file;
    this.settings = settings;
  }

  /**
   * The newest finished engines, if any; starts a retraining when they are older than {@code stamp}
   * (the project's content stamp now) and none is running.
   */
  Optional<Suggestions.Trained> latest(String stamp) {
    Suggestions.Trained t = latest.get();
    if (t == null || !t.stamp().equals(stamp)) {
      Future<?> f = running.get();
      if (f == null || f.isDone()) {
        running.set(worker.submit(this::retrain));
      }
    }
    return Optional.ofNullable(t);
  }

  /** Whether a retraining is under way. */
  public boolean training() {
    Future<?> f = running.get();
    return f != null && !f.isDone();
  }

  /** Why the last retraining failed, if it did. */
  public Optional<String> problem() {
    return Optional.ofNullable(lastProblem.get());
  }

  /** Waits for a running retraining to finish (for tests and shutdown). */
  public void await(long seconds) throws InterruptedException {
    Future<?> f = running.get();
    if (f != null) {
      try {
        f.get(seconds, TimeUnit.SECONDS);
      } catch (java.util.concurrent.ExecutionException | java.util.concurrent.TimeoutException e) {
        // reported through problem(), or still running
      }
    }
  }

  private void retrain() {
    try (ProjectStore store = ProjectStore.openExisting(file)) {
      latest.set(Suggestions.train(store, settings));
      lastProblem.set(null);
    } catch (RuntimeException e) {
      lastProblem.set("suggestions could not be trained: " + e.getMessage());
    }
  }

  @Override
  public void close() {
    worker.shutdownNow();
  }
}
