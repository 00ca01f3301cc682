package riffle.app;

import java.io.IOException;
import java.util.List;
import riffle.index.AnswerIndex;
import riffle.model.BatchOutcome;
import riffle.model.InputException;
import riffle.model.SearchResult;
import riffle.store.ProjectFileException;
import riffle.store.ProjectStore;

/**
 * The project's answer index, opened on first use and brought up to date with the project file
 * before every question put to it: what the coding, the rules and the answer pages search with. Not
 * thread-safe, like the project that owns it.
 */
final class AnswerSearch implements AutoCloseable {
  private final ProjectStore store;
  private AnswerIndex index;

  AnswerSearch(ProjectStore store) {
    this.store = store;
  }

  /**
   * The best matches of an analyst's query, at most {@code limit}.
   *
   * @throws InputException when the query cannot be read; its problem gives the column
   */
  SearchResult search(String query, int limit) throws InputException {
    try {
      return index().search(query, store.questions(), limit);
    } catch (IOException e) {
      throw unreadable(e);
    }
  }

  /** Answers like the given one, most alike first. */
  SearchResult similar(long answerId, int limit) throws InputException {
    try {
      return index().similar(answerId, limit);
    } catch (IOException e) {
      throw unreadable(e);
    }
  }

  /**
   * The ids of every answer the query matches, ascending.
   *
   * @throws InputException when the query cannot be read; its problem gives the column
   */
  long[] matches(String query) throws InputException {
    return matches(query, store.questions());
  }

  /** As {@link #matches(String)}, with the project's questions already at hand. */
  long[] matches(String query, List<String> questions) throws InputException {
    try {
      return index().matches(query, questions);
    } catch (IOException e) {
      throw unreadable(e);
    }
  }

  /**
   * Runs an import's writes holding the index's write lock, then brings the index up to date (see
   * {@link Indexes#whileStoring}).
   */
  BatchOutcome whileStoring(Indexes.Storing<BatchOutcome> work) throws InputException {
    return Indexes.whileStoring(store, index, work);
  }

  private AnswerIndex index() throws InputException {
    if (index == null) {
      index = Indexes.current(store);
    } else {
      Indexes.catchUp(store, index);
    }
    return index;
  }

  private static ProjectFileException unreadable(IOException e) {
    return new ProjectFileException("the search index cannot be read: " + e.getMessage());
  }

  @Override
  public void close() {
    if (index != null) {
      index.close();
      index = null;
    }
  }
}
