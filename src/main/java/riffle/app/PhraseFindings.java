package riffle.app;

import java.util.List;
import java.util.Optional;
import riffle.model.KeyPhrase;
import riffle.model.Phrase;
import riffle.model.PhraseCluster;

/**
 * Recurring phrases, the themes that travel together, and what changed.
 *
 * @param answers answers mined
 * @param wave the wave mined, when one was chosen
 * @param question the question mined, when one was chosen
 * @param against the wave compared with, when one was chosen
 * @param phrases recurring phrases, best first
 * @param clusters phrases that travel together, as candidate themes with a ready query
 * @param keyness phrases that rose or fell against {@code against}, strongest first
 */
public record PhraseFindings(
    int answers,
    Optional<String> wave,
    Optional<String> question,
    Optional<String> against,
    List<Phrase> phrases,
    List<PhraseCluster> clusters,
    List<KeyPhrase> keyness) {
  public PhraseFindings {
    phrases = List.copyOf(phrases);
    clusters = List.copyOf(clusters);
    keyness = List.copyOf(keyness);
  }
}
