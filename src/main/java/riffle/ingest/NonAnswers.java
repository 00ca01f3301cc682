package riffle.ingest;

import java.util.List;
import java.util.Locale;
import java.util.Set;
import riffle.words.WordList;

/**
 * Recognises answers that say nothing ("n/a", "-", "nothing"), which are kept but left out of the
 * bases of shares.
 *
 * <p>An answer is compared after normalising it: leading and trailing characters that are neither
 * letters nor digits (spaces, punctuation, symbols, emoji) are stripped, the rest is lower-cased,
 * curly apostrophes become straight ones and runs of whitespace become one space. An answer is a
 * non-answer when nothing is left (so {@code ""}, blanks, {@code "-"}, {@code "--"}, {@code "."},
 * {@code "?"}, {@code "..."}, {@code "…"}, {@code "!!!"}) or when what is left is one of the forms
 * listed, one a line, in {@code riffle/words/en/non-answers.txt}: "n/a", "none", "nothing", "no
 * comment", "idk", "i don't know", "not sure", "nothing to add" and the like.
 *
 * <p>The whole answer must match: "no warranty info" and "nothing about delivery" are answers.
 * Thread-safe.
 */
public final class NonAnswers {
  private static final List<String> FORMS = WordList.entries("en", "non-answers");

  private static final Set<String> FORM_SET = Set.copyOf(FORMS);

  /** Longest form plus slack: longer answers are never compared in full. */
  private static final int LONGEST = 40;

  private NonAnswers() {}

  /**
   * Tells whether an answer says nothing.
   *
   * @param answer the verbatim answer; null counts as empty
   * @return true for empty, blank or punctuation-only answers and for the documented forms
   */
  public static boolean isNonAnswer(String answer) {
    if (answer == null) {
      return true;
    }
    int start = 0;
    int end = answer.length();
    while (start < end && !Character.isLetterOrDigit(answer.codePointAt(start))) {
      start += Character.charCount(answer.codePointAt(start));
    }
    while (end > start && !Character.isLetterOrDigit(answer.codePointBefore(end))) {
      end -= Character.charCount(answer.codePointBefore(end));
    }
    if (start == end) {
      return true;
    }
    if (end - start > LONGEST) {
      return false;
    }
    return FORM_SET.contains(normalise(answer.substring(start, end)));
  }

  /**
   * Returns the documented forms, normalised as described above; answers that are empty once
   * stripped are non-answers besides these.
   */
  public static List<String> forms() {
    return FORMS;
  }

  private static String normalise(String core) {
    StringBuilder sb = new StringBuilder(core.length());
    boolean space = false;
    for (int i = 0; i < core.length(); i++) {
      char c = core.charAt(i);
      if (Character.isWhitespace(c) || Character.isSpaceChar(c)) {
        space = true;
        continue;
      }
      if (space) {
        sb.append(' ');
        space = false;
      }
      sb.append(c == '\u2019' || c == '\u2018' ? '\'' : c);
    }
    return sb.toString().toLowerCase(Locale.ROOT);
  }
}
