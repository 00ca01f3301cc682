package riffle.model;

import java.util.List;

/**
 * What {@link PhraseMiner#mine} found.
 *
 * @param answers the number of answers the filter accepted (foreign-language answers included,
 *     though they count in no phrase)
 * @param phrases the recurring phrases, best first
 * @param clusters groups of those phrases that travel together in answers, largest first
 */
public record PhraseReport(int answers, List<Phrase> phrases, List<PhraseCluster> clusters) {
  /** Copies the lists. */
  public PhraseReport {
    phrases = List.copyOf(phrases);
    clusters = List.copyOf(clusters);
  }
}
