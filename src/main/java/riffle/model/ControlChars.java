package riffle.model;

import java.util.Locale;
import java.util.Optional;

/**
 * Characters that steer a terminal or the direction of text rather than being read, and the rule
 * that names are one line of ordinary characters. Answers keep such characters as text; what prints
 * them shows them as visible escapes ({@code \u001B}); a name (wave, code, theme, question, segment
 * column, coder) that holds one is refused.
 *
 * <p>The characters: C0 controls other than tab and line feed (ESC starts the CSI and OSC sequences
 * of ECMA-48), DEL, the C1 controls U+0080–U+009F (U+009B is a one-character CSI), and the
 * bidirectional embeddings, overrides and isolates U+202A–U+202E and U+2066–U+2069, which reorder
 * what is shown (Unicode Standard Annex #9; "Trojan Source", CVE-2021-42574). Tab, line feed and
 * carriage return are left to the caller: a name may hold none of them; the command line lets a CR
 * LF line end through and shows a lone carriage return (which would let text overwrite its own
 * line) as an escape. Stateless and thread-safe.
 */
public final class ControlChars {
  private ControlChars() {}

  /**
   * Whether {@code c} may not reach a terminal as it is (tab, line feed and carriage return are
   * left to the caller).
   */
  public static boolean isControl(int c) {
    return (c < 0x20 && c != '\t' && c != '\n' && c != '\r')
        || (c >= 0x7F && c <= 0x9F)
        || (c >= 0x202A && c <= 0x202E)
        || (c >= 0x2066 && c <= 0x2069);
  }

  /** Whether {@code c} may not appear in a name: a control character or any line break or tab. */
  public static boolean breaksName(int c) {
    return isControl(c) || c == '\t' || c == '\n' || c == '\r' || c == 0x2028 || c == 0x2029;
  }

  /** The escape shown for {@code c}, such as {@code \u001B}. */
  public static String escape(int c) {
    return String.format(Locale.ROOT, "\\u%04X", c);
  }

  /**
   * The text with every character {@link #breaksName} marks written as its escape, for messages
   * that quote a name.
   */
  public static String visible(String text) {
    StringBuilder sb = new StringBuilder(text.length() + 8);
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (breaksName(c)) {
        sb.append(escape(c));
      } else {
        sb.append(c);
      }
    }
    return sb.toString();
  }

  /**
   * What is wrong with a name, if anything: {@code what "NAME" holds the control character \u001B
   * at character 5}, with the name written visibly.
   *
   * @param what what the name names, for the message ("the wave name")
   * @param name the name
   * @return the problem, or empty when the name is one line of ordinary characters
   */
  public static Optional<String> problem(String what, String name) {
    for (int i = 0; i < name.length(); i++) {
      char c = name.charAt(i);
      if (breaksName(c)) {
        return Optional.of(
            what
                + " \""
                + visible(name)
                + "\" holds "
                + (c == '\n' || c == '\r' || c == 0x2028 || c == 0x2029
                    ? "a line break"
                    : c == '\t' ? "a tab" : "the control character " + escape(c))
                + " at character "
                + (i + 1));
      }
    }
    return Optional.empty();
  }

  /**
   * Checks that a name is one line of ordinary characters.
   *
   * @param what what the name names, for the message ("the wave name")
   * @param name the name
   * @return the name, unchanged
   * @throws IllegalArgumentException saying {@link #problem} and what to do
   */
  public static String checkName(String what, String name) {
    Optional<String> problem = problem(what, name);
    if (problem.isPresent()) {
      throw new InputException(
          problem.get() + "; a name is one line of ordinary characters: give it without that one");
    }
    return name;
  }
}
