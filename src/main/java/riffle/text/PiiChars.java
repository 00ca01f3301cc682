package riffle.text;

/** Character tests shared by the personal-data detectors; all locale-free. */
final class PiiChars {
  private PiiChars() {}

  /** A letter or a combining mark (so decomposed accents stay inside words). */
  static boolean isLetterOrMark(int cp) {
    if (Character.isLetter(cp)) {
      return true;
    }
    int t = Character.getType(cp);
    return t == Character.NON_SPACING_MARK
        || t == Character.COMBINING_SPACING_MARK
        || t == Character.ENCLOSING_MARK;
  }

  /** A letter, mark or decimal digit of any script. */
  static boolean isWordChar(int cp) {
    return isLetterOrMark(cp) || Character.isDigit(cp);
  }

  static boolean isWordCharBefore(String s, int i) {
    return i > 0 && isWordChar(s.codePointBefore(i));
  }

  static boolean isWordCharAt(String s, int i) {
    return i >= 0 && i < s.length() && isWordChar(s.codePointAt(i));
  }

  static boolean isLetterAt(String s, int i) {
    return i >= 0 && i < s.length() && Character.isLetter(s.codePointAt(i));
  }

  /** A decimal digit of any script within the Basic Multilingual Plane. */
  static boolean isDigit(char c) {
    return (c >= '0' && c <= '9') || (c > 0x7f && Character.isDigit(c));
  }

  static boolean isDigitAt(String s, int i) {
    return i >= 0 && i < s.length() && isDigit(s.charAt(i));
  }

  /** A space that may sit inside a written number: ASCII, no-break, thin or figure space. */
  static boolean isInlineSpace(char c) {
    return c == ' ' || c == '\u00a0' || c == '\u202f' || c == '\u2009' || c == '\u2007';
  }

  /** Whether {@code text} contains {@code needle} (lower-case ASCII), ignoring ASCII case. */
  static boolean containsIgnoreCase(String text, String needle) {
    return indexOfIgnoreCase(text, needle, 0, text.length()) >= 0;
  }

  /** Where {@code needle} (lower-case ASCII) starts within {@code text[from, to)}, or -1. */
  static int indexOfIgnoreCase(String text, String needle, int from, int to) {
    int m = needle.length();
    char first = needle.charAt(0);
    for (int i = Math.max(0, from); i + m <= to; i++) {
      if (lowerAscii(text.charAt(i)) == first && text.regionMatches(true, i, needle, 0, m)) {
        return i;
      }
    }
    return -1;
  }

  /**
   * Whether one of {@code words} (lower-case ASCII) stands as a whole word, or the start of one,
   * within {@code text[from, to)}.
   */
  static boolean hasWordStartingWith(String text, int from, int to, String... words) {
    for (String w : words) {
      int i = Math.max(0, from);
      while ((i = indexOfIgnoreCase(text, w, i, to)) >= 0) {
        if (!isWordCharBefore(text, i)) {
          return true;
        }
        i++;
      }
    }
    return false;
  }

  static char lowerAscii(char c) {
    return c >= 'A' && c <= 'Z' ? (char) (c + ('a' - 'A')) : c;
  }
}
