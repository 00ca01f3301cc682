package riffle.ingest;

/**
 * Tells a second header row that holds each question's wording under a first row of short names, as
 * many survey tools export them ({@code Q2} above {@code What made you choose us?}).
 *
 * <p>The row below the header is a wording row when every filled cell of the header is a short name
 * (one token, or two of at most 16 characters in all, none worded as a question), at least one cell
 * of the row below is worded as a question ({@link HeaderWords#isQuestion}) where the header holds
 * a name, no cell of it repeats the name above it, and none reads as data: no date, no number. A
 * one-row header whose first answers are questions is therefore not taken for one.
 */
final class WordingRow {
  private static final int MAX_NAME = 32;
  private static final int MAX_TWO_WORD_NAME = 16;

  private WordingRow() {}

  /** True when {@code next}, the record below the header {@code header}, words its questions. */
  static boolean follows(String[] header, String[] next) {
    boolean asks = false;
    boolean anyName = false;
    boolean variable = false;
    for (int i = 0; i < header.length; i++) {
      String name = HeaderNames.collapse(header[i]);
      String below = i < next.length ? HeaderNames.collapse(next[i]) : "";
      if (!name.isEmpty()) {
        if (!isName(name)) {
          return false;
        }
        anyName = true;
        variable |= name.chars().anyMatch(c -> Character.isDigit(c) || c == '_' || c == '.');
      }
      if (below.isEmpty()) {
        continue;
      }
      boolean token = below.indexOf(' ') < 0;
      if (DateShapes.looksLikeDate(below)
          || below.chars().allMatch(c -> Character.isDigit(c) || c == '.' || c == ',' || c == '-')
          || token && below.chars().anyMatch(Character::isDigit)) {
        return false;
      }
      asks |= !name.isEmpty() && new HeaderWords(below).isQuestion();
    }
    for (int i = header.length; i < next.length; i++) {
      if (!HeaderNames.collapse(next[i]).isEmpty()) {
        return false;
      }
    }
    return anyName && variable && asks;
  }

  private static boolean isName(String name) {
    if (name.length() > MAX_NAME || name.endsWith("?") || new HeaderWords(name).isQuestion()) {
      return false;
    }
    int space = name.indexOf(' ');
    return space < 0 || (name.indexOf(' ', space + 1) < 0 && name.length() <= MAX_TWO_WORD_NAME);
  }
}
