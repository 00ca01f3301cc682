package riffle.model;

import java.util.List;
import java.util.Objects;

/**
 * Phrases that travel together: named in the same answers more often than chance allows.
 *
 * @param phrases the phrases' labels, in the report's order
 * @param answers how many answers contain at least one of them
 * @param cohesion the mean Jaccard similarity of the cluster's pairs of phrases (a pair without a
 *     significant association counts 0), between 0 and 1
 * @param query a search query that finds the cluster's answers: the phrases as double-quoted exact
 *     phrases joined by {@code OR}
 */
public record PhraseCluster(List<String> phrases, int answers, double cohesion, String query) {
  /** Checks the components and copies the list. */
  public PhraseCluster {
    phrases = List.copyOf(phrases);
    Objects.requireNonNull(query, "query");
  }
}
