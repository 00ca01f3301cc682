package riffle.model;

/**
 * How many of a wave's answers to a question a person has read: the base of every share of a code
 * given by hand ("read 112 of 580 (19%)").
 *
 * @param read substantive answers a person has read (coded, marked as read with no code applying,
 *     or imported as coded elsewhere)
 * @param answers substantive answers
 * @param nonAnswers non-answers ("n/a", "-" …), kept apart: they count in no base
 * @param share read / answers (0 when there are no answers)
 */
public record Coverage(int read, int answers, int nonAnswers, double share) {
  /** Checks the components. */
  public Coverage {
    if (read < 0 || answers < read || nonAnswers < 0) {
      throw new IllegalArgumentException(
          "need 0 <= read <= answers and non-answers >= 0, got " + read + "/" + answers);
    }
  }

  /** The coverage of {@code read} out of {@code answers}, with its share. */
  public static Coverage of(int read, int answers, int nonAnswers) {
    return new Coverage(read, answers, nonAnswers, answers == 0 ? 0 : (double) read / answers);
  }
}
