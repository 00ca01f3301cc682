package riffle.web;

import java.nio.file.Path;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import riffle.app.Project;
import riffle.model.InputException;

/**
 * The one way to the open project: every piece of work runs on a single thread that owns the {@link
 * Project}, in the order it was handed in. Requests wait at most {@link #WAIT_SECONDS} for their
 * turn (an import can hold the project for minutes) and are then answered "busy". Thread-safe.
 */
final class ProjectAccess implements AutoCloseable {
  static final long WAIT_SECONDS = 30;

  /** Work on the open project. */
  @FunctionalInterface
  interface Work<T> {
    T run(Project project) throws Exception;
  }

  private final ExecutorService thread;
  private final Project project;
  private final long waitMillis;

  private ProjectAccess(ExecutorService thread, Project project, long waitMillis) {
    this.thread = thread;
    this.project = project;
    this.waitMillis = waitMillis;
  }

  /** Opens (or creates) the project on its own thread. */
  static ProjectAccess open(Path file, long waitMillis) throws InputException {
    ExecutorService thread =
        Executors.newSingleThreadExecutor(
            r -> {
              Thread t = new Thread(r, "riffle-project");
              t.setDaemon(true);
              return t;
            });
    try {
      Project project = thread.submit(() -> Project.openOrCreate(file)).get();
      return new ProjectAccess(thread, project, waitMillis);
    } catch (ExecutionException e) {
      thread.shutdownNow();
      if (e.getCause() instanceof InputException input) {
        throw input;
      }
      throw new IllegalStateException("the project could not be opened", e.getCause());
    } catch (InterruptedException e) {
      thread.shutdownNow();
      Thread.currentThread().interrupt();
      throw new IllegalStateException("interrupted while opening the project", e);
    }
  }

  /** Runs {@code work} on the project's thread and returns its result, or throws what it threw. */
  <T> T call(Work<T> work) throws Exception {
    Future<T> result = submit(work);
    try {
      return result.get(waitMillis, TimeUnit.MILLISECONDS);
    } catch (TimeoutException e) {
      result.cancel(false);
      throw new ApiError(
          503,
          "the project is busy with earlier work (an import runs one at a time); try again when it"
              + " has finished");
    } catch (ExecutionException e) {
      if (e.getCause() instanceof Exception cause) {
        throw cause;
      }
      throw e;
    } catch (CancellationException e) {
      throw new ApiError(503, "the server is shutting down");
    }
  }

  /** Queues {@code work} on the project's thread, for long work that reports its own progress. */
  <T> Future<T> submit(Work<T> work) {
    return thread.submit(() -> work.run(project));
  }

  @Override
  public void close() {
    thread.submit(project::close);
    thread.shutdown();
    try {
      if (!thread.awaitTermination(60, TimeUnit.SECONDS)) {
        thread.shutdownNow();
      }
    } catch (InterruptedException e) {
      thread.shutdownNow();
      Thread.currentThread().interrupt();
    }
  }
}
