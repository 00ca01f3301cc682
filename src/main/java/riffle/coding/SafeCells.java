package riffle.coding;

/**
 * Spreadsheet-safe cells: a cell that begins with {@code = + - @}, a tab or a carriage return is
 * prefixed with a single quote, so that a spreadsheet shows it as text instead of running it as a
 * formula (OWASP, "CSV Injection").
 */
final class SafeCells {
  private SafeCells() {}

  static String neutral(String cell) {
    if (!cell.isEmpty() && "=+-@\t\r".indexOf(cell.charAt(0)) >= 0) {
      return "'" + cell;
    }
    return cell;
  }

  /** Appends one CSV record (RFC 4180: quoted when needed, CRLF at the end), cells neutralised. */
  static void line(StringBuilder out, java.util.List<String> cells) {
    for (int i = 0; i < cells.size(); i++) {
      if (i > 0) {
        out.append(',');
      }
      String cell = neutral(cells.get(i));
      if (cell.indexOf(',') >= 0
          || cell.indexOf('"') >= 0
          || cell.indexOf('\n') >= 0
          || cell.indexOf('\r') >= 0) {
        out.append('"').append(cell.replace("\"", "\"\"")).append('"');
      } else {
        out.append(cell);
      }
    }
    out.append("\r\n");
  }
}
