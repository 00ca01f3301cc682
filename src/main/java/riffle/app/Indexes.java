package riffle.app;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import riffle.index.AnswerIndex;
import riffle.index.IndexedAnswer;
import riffle.model.Chunk;
import riffle.model.Sentence;
import riffle.store.AnalysisCache;
import riffle.store.ProjectFileException;
import riffle.store.ProjectStore;
import riffle.text.AnalysisCodec;

/**
 * Keeps the derived answer index in step with the project file: stamped with what it was built
 * from, added to after an import, and rebuilt whenever its stamp no longer matches.
 */
final class Indexes {
  private Indexes() {}

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
    } catch (ProjectFileException | RuntimeException e) {
      index.close();
      throw e;
    }
  }

  /**
   * Brings an open index up to date: when only the coding changed since it was built, the answers
   * whose codes changed are indexed again; after any other change the index is rebuilt.
   */
  static void catchUp(ProjectStore store, AnswerIndex index) throws ProjectFileException {
    String stamp = stamp(store);
    Optional<String> built = index.stamp();
    if (built.equals(Optional.of(stamp))) {
      return;
    }
    try {
      long since = built.map(b -> codingOnlySince(b, stamp)).orElse(-1L);
      if (since >= 0) {
        index.update(answers(store.answerRows(store.answersTouchedSince(since)), store), stamp);
      } else {
        index.rebuild(answers(store, 0), stamp);
      }
    } catch (IOException e) {
      throw cannot(store, e);
    }
  }

  private static final Pattern EDIT = Pattern.compile(";last-edit=(\\d+);");

  /**
   * The newest edit the index saw when {@code built} differs from {@code now} only by later edits
   * (the same versions and answers); otherwise -1.
   */
  static long codingOnlySince(String built, String now) {
    Matcher b = EDIT.matcher(built);
    Matcher n = EDIT.matcher(now);
    if (!b.find()
        || !n.find()
        || !built.substring(0, b.start()).equals(now.substring(0, n.start()))) {
      return -1;
    }
    long seen = Long.parseLong(b.group(1));
    return seen <= Long.parseLong(n.group(1)) ? seen : -1;
  }

  /**
   * After an import: when the index was current before it, adds the new answers; otherwise it is
   * left to be rebuilt on its next use.
   */
  static void afterImport(ProjectStore store, String stampBefore, long lastIdBefore)
      throws ProjectFileException {
    if (!Files.isDirectory(folder(store.file()))) {
      return;
    }
    try (AnswerIndex index = open(store)) {
      if (index.stamp().equals(Optional.of(stampBefore))) {
        index.add(answers(store, lastIdBefore), stamp(store));
      }
    } catch (IOException e) {
      throw cannot(store, e);
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
