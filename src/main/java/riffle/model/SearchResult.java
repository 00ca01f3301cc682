package riffle.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What a query found.
 *
 * @param total how many answers match
 * @param waves how many match in each wave, in wave order of first appearance in the index
 * @param hits the best matches, most relevant first, at most the requested number
 */
public record SearchResult(int total, Map<String, Integer> waves, List<SearchHit> hits) {
  public SearchResult {
    waves = Collections.unmodifiableMap(new LinkedHashMap<>(waves));
    hits = List.copyOf(hits);
  }

  /** This result with every hit's text cut to at most {@code max} characters. */
  public SearchResult shortened(int max) {
    return new SearchResult(total, waves, hits.stream().map(h -> h.shortened(max)).toList());
  }
}
