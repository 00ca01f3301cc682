package riffle.ingest;

import java.util.List;

/**
 * Picks the delimiter that splits the first records of an export most consistently.
 *
 * <p>Each candidate scans, quote-aware, up to the first {@value #RECORDS} non-blank records within
 * the first {@value #CHARS} characters. Let H be the number of fields of the first record up to its
 * last non-blank one. A candidate with H &lt; 2 does not split the header and scores 0; otherwise
 * its score is the share of the following records that agree with H (they have at least H fields
 * and nothing after the H-th; a record cut off by the sample end is not counted), or 1 when there
 * are none. The highest score wins; ties go to the larger H, then to the order comma, semicolon,
 * tab, pipe (tab, comma, semicolon, pipe for pasted cells). When no candidate splits the header the
 * export has one column and the first of that order is used.
 */
final class DelimiterSniffer {
  static final int RECORDS = 50;
  static final int CHARS = 65536;

  private static final List<Delimiter> FILE_ORDER =
      List.of(Delimiter.COMMA, Delimiter.SEMICOLON, Delimiter.TAB, Delimiter.PIPE);
  private static final List<Delimiter> PASTE_ORDER =
      List.of(Delimiter.TAB, Delimiter.COMMA, Delimiter.SEMICOLON, Delimiter.PIPE);

  private DelimiterSniffer() {}

  /**
   * Sniffs the delimiter.
   *
   * @param text the decoded input, starting with the header
   * @param paste true for cells pasted from a spreadsheet, which prefer tab on ties
   * @return the delimiter that explains the first records best
   */
  static Delimiter sniff(CharSequence text, boolean paste) {
    List<Delimiter> order = paste ? PASTE_ORDER : FILE_ORDER;
    Delimiter best = order.get(0);
    double bestScore = -1;
    int bestFields = 0;
    for (Delimiter d : order) {
      int[] header = new int[1];
      double score = score(text, d.character(), header);
      if (score > bestScore || (score == bestScore && header[0] > bestFields)) {
        best = d;
        bestScore = score;
        bestFields = header[0];
      }
    }
    return bestScore > 0 ? best : order.get(0);
  }

  /** Scores one candidate; stores the header's field count in {@code headerFields[0]}. */
  static double score(CharSequence text, char delimiter, int[] headerFields) {
    QuoteScanner s = new QuoteScanner(text, delimiter, CHARS);
    int h = -1;
    int records = 0;
    int agreeing = 0;
    while (records < RECORDS && s.next()) {
      if (s.lastFilled() == 0 || (s.cut() && h >= 0)) {
        continue;
      }
      if (h < 0) {
        h = s.lastFilled();
        headerFields[0] = h;
        if (h < 2) {
          return 0;
        }
        continue;
      }
      records++;
      if (s.fields() >= h && s.lastFilled() <= h) {
        agreeing++;
      }
    }
    if (h < 2) {
      return 0;
    }
    return records == 0 ? 1 : (double) agreeing / records;
  }
}
