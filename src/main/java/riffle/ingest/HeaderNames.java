package riffle.ingest;

import java.util.HashSet;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import riffle.model.ControlChars;

/**
 * Turns the header record into unique column names: whitespace is trimmed and runs of it (line
 * breaks in a quoted header too) become one space, a blank header becomes {@code Column N} (N the
 * 1-based position), and a name already used (ignoring case) gets {@code " (2)"}, {@code " (3)"} …
 * with a problem reported for it. A header holding a control character (ESC, C1, bidirectional
 * overrides) makes the input unusable.
 */
final class HeaderNames {
  private HeaderNames() {}

  /**
   * Names the columns.
   *
   * @throws BadInput when a header holds a control character (see {@link ControlChars}): a header
   *     names a question or a segment, and names are refused with one
   */
  static String[] of(String[] raw, int width, long line, ProblemList problems) throws BadInput {
    String[] names = new String[width];
    Set<String> used = new HashSet<>();
    for (int i = 0; i < width; i++) {
      String name = i < raw.length ? collapse(raw[i]) : "";
      Optional<String> unsafe = ControlChars.problem("the header of column " + (i + 1), name);
      if (unsafe.isPresent()) {
        throw new BadInput(
            line,
            i + 1,
            unsafe.get()
                + "; a header names a question or a segment: rename the column in the file");
      }
      if (name.isEmpty()) {
        name = "Column " + (i + 1);
      }
      String unique = name;
      for (int k = 2; !used.add(unique.toLowerCase(Locale.ROOT)); k++) {
        unique = name + " (" + k + ")";
      }
      if (!unique.equals(name)) {
        problems.add(
            line,
            i + 1,
            "the header '"
                + name
                + "' appears more than once; this column is called '"
                + unique
                + "' (rename it in the file to tell the columns apart)");
      }
      names[i] = unique;
    }
    return names;
  }

  /** Trims and collapses runs of whitespace to one space. */
  static String collapse(String s) {
    StringBuilder sb = new StringBuilder(s.length());
    boolean space = false;
    for (int i = 0; i < s.length(); i++) {
      char c = s.charAt(i);
      if (Character.isWhitespace(c) || Character.isSpaceChar(c) || c == '\uFEFF') {
        space = sb.length() > 0;
      } else {
        if (space) {
          sb.append(' ');
          space = false;
        }
        sb.append(c);
      }
    }
    return sb.toString();
  }
}
