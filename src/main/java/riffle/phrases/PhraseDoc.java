package riffle.phrases;

import java.util.Map;
import java.util.Objects;
import riffle.model.Analysis;

/**
 * One answer as the miner sees it.
 *
 * @param answerId the answer's id in the project
 * @param respondent the respondent's id
 * @param wave the wave's name
 * @param question the question, as in the export header
 * @param segments the respondent's metadata (column → value), for filters such as device or
 *     customer type
 * @param analysis the answer's analysis; its masked text is what examples show
 */
public record PhraseDoc(
    long answerId,
    String respondent,
    String wave,
    String question,
    Map<String, String> segments,
    Analysis analysis) {
  /** Checks the components and copies the segments. */
  public PhraseDoc {
    Objects.requireNonNull(respondent, "respondent");
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(analysis, "analysis");
    segments = Map.copyOf(segments);
  }
}
