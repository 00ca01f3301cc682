package riffle.ingest;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Splits a codes cell ("price; shipping | trust") into its codes.
 *
 * <p>Codes are separated by {@code ;}, {@code |} or line breaks. Only when none of these occurs in
 * the cell is a comma taken as the separator ("price, shipping"); so a code label may contain a
 * comma as long as the cell uses one of the other separators. Each code is trimmed, empty ones are
 * dropped and repeats (compared ignoring case) are collapsed to the first spelling; the order is
 * kept. Thread-safe.
 */
public final class CodeList {
  private CodeList() {}

  /**
   * Splits a codes cell.
   *
   * @param cell the verbatim cell; null counts as empty
   * @return the codes in order of first appearance, possibly none
   */
  public static List<String> split(String cell) {
    if (cell == null || cell.isBlank()) {
      return List.of();
    }
    boolean primary = false;
    for (int i = 0; i < cell.length() && !primary; i++) {
      primary = isPrimary(cell.charAt(i));
    }
    List<String> codes = new ArrayList<>();
    Set<String> seen = new HashSet<>();
    int start = 0;
    for (int i = 0; i <= cell.length(); i++) {
      boolean cut =
          i == cell.length() || (primary ? isPrimary(cell.charAt(i)) : cell.charAt(i) == ',');
      if (cut) {
        String code = cell.substring(start, i).strip();
        if (!code.isEmpty() && seen.add(code.toLowerCase(Locale.ROOT))) {
          codes.add(code);
        }
        start = i + 1;
      }
    }
    return List.copyOf(codes);
  }

  private static boolean isPrimary(char c) {
    return c == ';' || c == '|' || c == '\n' || c == '\r';
  }
}
