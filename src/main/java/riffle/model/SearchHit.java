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
 * @param truncated true when {@code text} is only the start of the answer (see {@link ShownText})
 */
public record SearchHit(
    long answerId,
    String respondent,
    String wave,
    String question,
    String text,
    List<Stretch> highlight,
    double score,
    boolean truncated) {
  public SearchHit {
    highlight = List.copyOf(highlight);
  }

  /** A hit with the whole answer. */
  public SearchHit(
      long answerId,
      String respondent,
      String wave,
      String question,
      String text,
      List<Stretch> highlight,
      double score) {
    this(answerId, respondent, wave, question, text, highlight, score, false);
  }

  /**
   * This hit with its text cut to at most {@code max} characters (marked truncated) and the
   * highlights clipped to what is left; this very hit when it is short enough.
   */
  public SearchHit shortened(int max) {
    int cut = ShownText.cut(text, max);
    if (cut == text.length()) {
      return this;
    }
    List<Stretch> kept =
        highlight.stream()
            .filter(s -> s.start() < cut)
            .map(s -> new Stretch(s.start(), Math.min(s.end(), cut)))
            .toList();
    return new SearchHit(
        answerId, respondent, wave, question, text.substring(0, cut), kept, score, true);
  }

  /**
   * A matched stretch of text.
   *
   * @param start first character
   * @param end one past the last character
   */
  public record Stretch(int start, int end) {}
}
