package riffle.app;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import riffle.index.AnswerIndex;
import riffle.index.IndexedAnswer;
import riffle.model.BatchOutcome;
import riffle.model.Chunk;
import riffle.model.InputException;
import riffle.model.Sentence;
import riffle.store.AnalysisCache;
import riffle.store.ProjectFileException;
import riffle.store.ProjectStore;
import riffle.store.Waits;
import riffle.text.AnalysisCodec;

/**
 * Keeps the derived answer index in step with the project file, which any number of processes may
 * change: before it answers, a process compares the index's stamp with the project's and, when they
 * differ, takes the index's write lock (waiting for another process that holds it, and saying so
 * after a second), adds or re-indexes what changed since the stamp, commits and lets the lock go.
 */
final class Indexes {
  private Indexes() {}

  /** How long a process waits for another one to finish writing the index. */
  static final long LOCK_WAIT_MS = 300_000;

  /** After how long a wait is announced. */
  static final long ANNOUNCE_AFTER_MS = 1_000;

  static Path folder(Path project) {
    return AnalysisCache.derivedFolder(project).resolve("index");
  }

  /** What an index built now would be stamped with. */
  static String stamp(ProjectStore store) throws ProjectFileException {
    return AnswerIndex.VERSION + "|" + AnalysisCodec.VERSION + "|" + store.contentStamp();
  }

  /** Opens the project's index, rebuilding it first when missing, stale or damaged. */
  static AnswerIndex current(ProjectStore store) throws ProjectFileException {
    AnswerIndex index = open(store);
    try {
      catchUp(store, index);
      return index;
    } catch (RuntimeException e) {
      index.close();
      throw e;
    }
  }

  /**
   * Brings an open index up to date with the project, whichever process changed it: reads the
   * newest commit and, when that is still behind, writes under the lock — the answers added and the
   * answers whose coding changed since the commit's stamp, or everything when the stamp is from
   * other versions or does not precede the project (a damaged or replaced index).
   */
  static void catchUp(ProjectStore store, AnswerIndex index) throws ProjectFileException {
    catchUp(store, index, LOCK_WAIT_MS);
  }

  static void catchUp(ProjectStore store, AnswerIndex index, long waitMillis)
      throws ProjectFileException {
    try {
      if (index.stamp().equals(Optional.of(stamp(store)))) {
        return;
      }
      index.refresh();
      if (index.stamp().equals(Optional.of(stamp(store)))) {
        return;
      }
      try (AnswerIndex.Writer writer = lock(store, index, waitMillis)) {
        write(store, writer);
      }
    } catch (IOException e) {
      throw cannot(store, e);
    }
  }

  /**
   * With the write lock held: adds the answers added and re-indexes those whose coding changed
   * since the newest commit's stamp, or rebuilds everything when the stamp is from other versions
   * or does not precede the project (a damaged or replaced index); nothing when it is current.
   */
  private static void write(ProjectStore store, AnswerIndex.Writer writer)
      throws IOException, ProjectFileException {
    // Read before the rows: whatever lands meanwhile is indexed now and again next time.
    String now = stamp(store);
    Optional<String> built = writer.stamp();
    if (built.equals(Optional.of(now))) {
      return; // another process caught up while this one waited
    }
    Optional<Since> since = built.flatMap(b -> Since.of(b, now));
    if (since.isPresent()) {
      Set<Long> ids = new TreeSet<>(store.answersTouchedSince(since.get().edit()));
      ids.removeIf(id -> id > since.get().answer());
      List<ProjectStore.AnswerRow> rows = new ArrayList<>(store.answerRows(ids));
      rows.addAll(store.answerRows(since.get().answer()));
      writer.add(answers(rows, store), now);
    } else {
      writer.rebuild(answers(store, 0), now);
    }
  }

  /** Work on the project file and the analysis cache, such as storing an import. */
  @FunctionalInterface
  interface Storing<T> {
    T run() throws InputException;
  }

  /** How work is wrapped; {@link #whileStoring} is the one wrapping of imports. */
  @FunctionalInterface
  interface Around {
    BatchOutcome around(Storing<BatchOutcome> work) throws InputException;
  }

  /**
   * Runs {@code work} (an import's writes) holding the index's write lock when the project has an
   * index, then brings the index up to date under the same hold. Other processes wait for the lock
   * meanwhile instead of indexing answers whose parses are not cached yet (which would analyse them
   * a second time). Holds no project write lock while waiting for the index: nothing waits for the
   * index inside a project transaction, so the two locks cannot deadlock.
   */
  static BatchOutcome whileStoring(ProjectStore store, AnswerIndex open, Storing<BatchOutcome> work)
      throws InputException {
    if (open == null && !Files.isDirectory(folder(store.file()))) {
      return work.run();
    }
    AnswerIndex index = open != null ? open : open(store);
    try (AnswerIndex.Writer writer = lock(store, index, LOCK_WAIT_MS)) {
      BatchOutcome outcome = work.run();
      write(store, writer);
      return outcome;
    } catch (IOException e) {
      throw cannot(store, e);
    } finally {
      if (open == null) {
        index.close();
      }
    }
  }

  /**
   * The index's write lock, waiting while another process (or another project in this one) holds
   * it: the wait is announced after a second, and after {@code waitMillis} the process gives up.
   */
  static AnswerIndex.Writer lock(ProjectStore store, AnswerIndex index, long waitMillis)
      throws IOException, ProjectFileException {
    long start = System.nanoTime();
    boolean told = false;
    long pause = 2;
    while (true) {
      Optional<AnswerIndex.Writer> writer = index.tryWrite();
      if (writer.isPresent()) {
        return writer.get();
      }
      long waited = (System.nanoTime() - start) / 1_000_000;
      if (waited >= waitMillis) {
        throw new ProjectFileException(
            "another Riffle process has been updating the search index of "
                + store.file()
                + " for over "
                + waitMillis / 1000
                + " s; try again when it has finished (nothing was changed)");
      }
      if (!told && waited >= ANNOUNCE_AFTER_MS) {
        Waits.announce(
            "waiting for another Riffle process to finish updating the search index of "
                + store.file().getFileName()
                + " …");
        told = true;
      }
      try {
        Thread.sleep(pause);
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
        throw new ProjectFileException("interrupted while waiting for the search index");
      }
      pause = Math.min(pause * 2, 50);
    }
  }

  /**
   * Where an index stamped {@code built} stands against the project now ({@code now}): the newest
   * answer and edit it saw, when it was built by the same versions from an older state of this
   * project, so that only later answers and edits need indexing.
   *
   * @param answer the newest answer id the index holds
   * @param edit the newest edit id the index saw
   */
  record Since(long answer, long edit) {
    private static final Pattern PARTS =
        Pattern.compile("^(.*)\\|last-answer=(\\d+);last-edit=(\\d+);last-change=(\\d+)$");

    static Optional<Since> of(String built, String now) {
      Matcher b = PARTS.matcher(built);
      Matcher n = PARTS.matcher(now);
      if (!b.matches() || !n.matches() || !b.group(1).equals(n.group(1))) {
        return Optional.empty();
      }
      for (int g = 2; g <= 4; g++) {
        if (Long.parseLong(b.group(g)) > Long.parseLong(n.group(g))) {
          return Optional.empty();
        }
      }
      return Optional.of(new Since(Long.parseLong(b.group(2)), Long.parseLong(b.group(3))));
    }
  }

  private static AnswerIndex open(ProjectStore store) throws ProjectFileException {
    try {
      return AnswerIndex.open(folder(store.file()));
    } catch (IOException e) {
      throw cannot(store, e);
    }
  }

  private static ProjectFileException cannot(ProjectStore store, IOException e) {
    return new ProjectFileException(
        "cannot build the search index in "
            + folder(store.file())
            + " ("
            + e.getMessage()
            + "); check free space and permissions, or delete that folder to rebuild it");
  }

  /** The answers with an id above {@code afterId}, with their chunk phrases from the cache. */
  static List<IndexedAnswer> answers(ProjectStore store, long afterId) throws ProjectFileException {
    return answers(store.answerRows(afterId), store);
  }

  private static List<IndexedAnswer> answers(List<ProjectStore.AnswerRow> rows, ProjectStore store)
      throws ProjectFileException {
    List<IndexedAnswer> out = new ArrayList<>(rows.size());
    try (AnalysisCache cache = AnalysisCache.open(store.file())) {
      Map<Long, List<Sentence>> sentences = Analyses.sentences(cache, rows);
      for (ProjectStore.AnswerRow r : rows) {
        List<String> chunks = new ArrayList<>();
        for (Sentence s : sentences.get(r.id())) {
          for (Chunk c : s.chunks()) {
            chunks.add(c.text());
          }
        }
        out.add(
            new IndexedAnswer(
                r.id(),
                r.respondent(),
                r.wave(),
                r.question(),
                r.masked(),
                r.codes(),
                r.segments(),
                chunks));
      }
    }
    return out;
  }
}
