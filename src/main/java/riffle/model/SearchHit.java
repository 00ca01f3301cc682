package riffle.model;

import java.util.List;

/**
 * One answer that matched a query.
 *
 * @param answerId the answer's id
 * @param respondent the respondent's id from the export
 * @param wave the wave's name
 * @param question the question's text
 * @param text the masked answer
 * @param highlight the matched stretches of {@code text}, as offsets, in order
 * @param score the relevance score (BM25)
 */
public record SearchHit(
    long answerId,
    String respondent,
    String wave,
    String question,
    String text,
    List<Stretch> highlight,
    double score) {
  public SearchHit {
    highlight = List.copyOf(highlight);
  }

  /**
   * A matched stretch of text.
   *
   * @param start first character
   * @param end one past the last character
   */
  public record Stretch(int start, int end) {}
}
