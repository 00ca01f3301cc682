package riffle.quotes;

import java.util.List;
import java.util.Objects;
import riffle.model.Code;
import riffle.model.QuoteFindings;

/**
 * Ranks buyer quotes per code and picks candidates for page copy (headline and sub-headline ideas,
 * benefit lines, objections to answer, proof quotes); the rules are in the package documentation.
 * Stateless and thread-safe; the result depends only on the inputs, not on their order.
 */
public final class QuoteRanker {
  private QuoteRanker() {}

  /**
   * Ranks quotes for every code of the codebook that is not archived (or those the settings name).
   *
   * @param codebook every code of the project, archived ones included (answers may carry them)
   * @param answers every answer of the question or project, in any order, in all waves and
   *     segments: typicality, near-duplicate counts over time and new wording are judged against
   *     all of them, while the settings' wave and segment filters choose which may be quoted
   * @param settings lengths, limits, filters and the latest wave
   * @throws IllegalArgumentException when an answer id repeats or an answer carries a code that is
   *     not in the codebook
   */
  public static QuoteFindings rank(
      List<Code> codebook, List<QuoteSource> answers, QuoteSettings settings) {
    Objects.requireNonNull(codebook, "codebook");
    Objects.requireNonNull(answers, "answers");
    Objects.requireNonNull(settings, "settings");
    return new Ranking(codebook, answers, settings).run();
  }
}
