package riffle.ingest;

import java.util.ArrayList;
import java.util.List;

/**
 * Walks records quote-aware, counting fields and lines without building values.
 *
 * <p>It follows the rules Commons CSV applies with the format {@link CsvRecords} uses: a field that
 * starts with {@code "} is quoted up to the next lone {@code "} ({@code ""} is a quote inside it),
 * may span lines, and anything after its closing quote up to the delimiter is kept as plain text; a
 * quote anywhere else is an ordinary character. CR, LF and CRLF each end one physical line. Used to
 * sniff the delimiter on the first records and to find where an unclosed quote opened, which the
 * parser's own exception does not say precisely. Not thread-safe.
 */
final class QuoteScanner {
  private final CharSequence text;
  private final char delimiter;
  private final int limit;
  private int pos;
  private long line = 1;

  private long startLine;
  private int fields;
  private int lastFilled;
  private boolean cut;
  private boolean unclosed;
  private long quoteLine;
  private int quoteField;
  private boolean quotedFilled;
  private int stray;
  private long strayLine;
  private int strayField;
  private long strayCloseLine;

  /**
   * Creates a scanner over the start of a text.
   *
   * @param text the decoded input
   * @param delimiter the field separator
   * @param limit how many characters to look at; the rest is treated as if absent
   */
  QuoteScanner(CharSequence text, char delimiter, int limit) {
    this.text = text;
    this.delimiter = delimiter;
    this.limit = Math.min(limit, text.length());
  }

  /** Returns the line and field number where the first never-closed quote opened, or null. */
  static long[] unclosedQuote(CharSequence text, char delimiter) {
    QuoteScanner s = new QuoteScanner(text, delimiter, text.length());
    while (s.next()) {
      if (s.unclosed) {
        return new long[] {s.quoteLine, s.quoteField};
      }
    }
    return null;
  }

  /**
   * Finds quoted fields whose closing quote is followed by more text, as in {@code "Fast"
   * delivery}: the parser keeps such text, but it usually means a quote that should have opened an
   * answer closed one, so the field may have swallowed the lines up to the next quote.
   *
   * @return for each such field, up to {@code max}: the line and field number where its quote
   *     opened and the line where it closed
   */
  static List<long[]> strayQuotes(CharSequence text, char delimiter, int max) {
    List<long[]> found = new ArrayList<>();
    QuoteScanner s = new QuoteScanner(text, delimiter, text.length());
    int seen = 0;
    while (found.size() < max && s.next()) {
      if (s.stray > seen) {
        seen = s.stray;
        found.add(new long[] {s.strayLine, s.strayField, s.strayCloseLine});
      }
    }
    return found;
  }

  /** Tells whether non-blank text follows a closing quote before the field ends. */
  private boolean trailingText() {
    for (int i = pos; i < limit; i++) {
      char c = text.charAt(i);
      if (c == delimiter || c == '\n' || c == '\r') {
        return false;
      }
      if (!Character.isWhitespace(c)) {
        return true;
      }
    }
    return false;
  }

  /** Scans the next record; returns false when there is none. */
  boolean next() {
    if (pos >= limit) {
      return false;
    }
    startLine = line;
    fields = 0;
    lastFilled = 0;
    cut = false;
    unclosed = false;
    while (true) {
      boolean filled = false;
      if (pos < limit && text.charAt(pos) == '"') {
        quoteLine = line;
        quoteField = fields + 1;
        pos++;
        if (!quoted()) {
          fields++;
          unclosed = true;
          cut = true;
          return true;
        }
        filled = quotedFilled;
        if (trailingText()) {
          strayLine = quoteLine;
          strayField = quoteField;
          strayCloseLine = line;
          stray++;
        }
      }
      while (pos < limit) {
        char c = text.charAt(pos);
        if (c == delimiter || c == '\n' || c == '\r') {
          break;
        }
        if (!filled && !Character.isWhitespace(c)) {
          filled = true;
        }
        pos++;
      }
      fields++;
      if (filled) {
        lastFilled = fields;
      }
      if (pos >= limit) {
        cut = limit < text.length();
        return true;
      }
      char c = text.charAt(pos++);
      if (c != delimiter) {
        if (c == '\r' && pos < limit && text.charAt(pos) == '\n') {
          pos++;
        }
        line++;
        return true;
      }
    }
  }

  /** Consumes a quoted field after its opening quote; false when the input ends inside it. */
  private boolean quoted() {
    quotedFilled = false;
    while (pos < limit) {
      char c = text.charAt(pos++);
      if (c == '"') {
        if (pos < limit && text.charAt(pos) == '"') {
          pos++;
          quotedFilled = true;
          continue;
        }
        return true;
      }
      if (c == '\n') {
        line++;
      } else if (c == '\r') {
        if (pos < limit && text.charAt(pos) == '\n') {
          pos++;
        }
        line++;
      } else if (!quotedFilled && !Character.isWhitespace(c)) {
        quotedFilled = true;
      }
    }
    return false;
  }

  /** Returns the line the last record started on. */
  long startLine() {
    return startLine;
  }

  /** Returns the number of fields of the last record. */
  int fields() {
    return fields;
  }

  /** Returns the 1-based number of the last field with non-blank content, 0 for a blank record. */
  int lastFilled() {
    return lastFilled;
  }

  /** Tells whether the last record was cut short by the limit or by the end inside a quote. */
  boolean cut() {
    return cut;
  }
}
