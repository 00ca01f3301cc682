package riffle.report;

import java.util.List;

/**
 * CSV rows as RFC 4180 writes them (comma, CRLF, double quotes doubled), with every cell that a
 * spreadsheet could read as a formula neutralised.
 *
 * <p>OWASP's guidance on CSV injection: a cell beginning with =, +, −, @, a tab or a carriage
 * return is prefixed with a single quote, so that spreadsheets show it as text instead of running
 * it. The rule applies to every cell, numbers included, so a negative number exported as text reads
 * '-3; Riffle's CSV exports carry counts, flags and ids, never negative numbers.
 */
final class Csv {
  private final StringBuilder out = new StringBuilder();

  /** The mark that makes spreadsheet programs read UTF-8 (U+FEFF, bytes EF BB BF in UTF-8). */
  static final char BOM = '\uFEFF';

  Csv(boolean withBom) {
    if (withBom) {
      out.append(BOM);
    }
  }

  Csv row(List<String> cells) {
    for (int i = 0; i < cells.size(); i++) {
      if (i > 0) {
        out.append(',');
      }
      out.append(cell(cells.get(i)));
    }
    out.append("\r\n");
    return this;
  }

  @Override
  public String toString() {
    return out.toString();
  }

  /** One cell, neutralised and quoted where needed. */
  static String cell(String value) {
    String v = neutralise(value);
    boolean quote = false;
    for (int i = 0; i < v.length() && !quote; i++) {
      char c = v.charAt(i);
      quote = c == ',' || c == '"' || c == '\n' || c == '\r';
    }
    return quote ? '"' + v.replace("\"", "\"\"") + '"' : v;
  }

  /** The OWASP rule: a cell that starts like a formula gets a leading single quote. */
  static String neutralise(String value) {
    if (value.isEmpty()) {
      return value;
    }
    char first = value.charAt(0);
    boolean risky =
        first == '='
            || first == '+'
            || first == '-'
            || first == '@'
            || first == '\t'
            || first == '\r';
    return risky ? "'" + value : value;
  }
}
