package riffle.ingest;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Recognises values written as a date or a date-time in the formats survey tools and spreadsheets
 * export: ISO 8601 ({@code 2024-03-02}, {@code 2024-03-02T14:05:09Z}, {@code 2024-03-02 14:05}),
 * {@code 2024/03/02}, day-month-year or month-day-year with {@code /}, {@code .} or {@code -} and a
 * two- or four-digit year ({@code 02/03/2024 14:05}, {@code 3/2/24 2:05 PM}, {@code 02.03.2024}),
 * and month names ({@code 2 Mar 2024}, {@code March 2, 2024}). Only the shape and plausible month
 * and day numbers are checked; the value itself is not needed here. Used on a sample of rows only.
 * Thread-safe.
 */
final class DateShapes {
  private static final String TIME =
      "(?:[T ]|,? +)\\d{1,2}:\\d{2}(?::\\d{2}(?:[.,]\\d{1,9})?)?"
          + "(?: ?[AaPp]\\.?[Mm]\\.?)?(?: ?(?:Z|UTC|GMT|[+-]\\d{2}:?\\d{2}))?";
  private static final String MONTH =
      "(?:jan|feb|mar|apr|may|jun|jul|aug|sep|sept|oct|nov|dec)[a-z]*\\.?";
  private static final Pattern YMD =
      Pattern.compile("(\\d{4})[-/](\\d{1,2})[-/](\\d{1,2})(?:" + TIME + ")?");
  private static final Pattern DMY =
      Pattern.compile("(\\d{1,2})([./-])(\\d{1,2})\\2(\\d{4}|\\d{2})(?:" + TIME + ")?");
  private static final Pattern NAMED =
      Pattern.compile(
          "(?:\\d{1,2}(?:st|nd|rd|th)? +"
              + MONTH
              + ",? +\\d{4}|"
              + MONTH
              + " +\\d{1,2}(?:st|nd|rd|th)?,? +\\d{4})(?:"
              + TIME
              + ")?",
          Pattern.CASE_INSENSITIVE);

  private DateShapes() {}

  static boolean looksLikeDate(String value) {
    String v = value.strip();
    if (v.length() < 6
        || v.length() > 40
        || !Character.isDigit(v.charAt(0)) && !Character.isLetter(v.charAt(0))) {
      return false;
    }
    Matcher m = YMD.matcher(v);
    if (m.matches()) {
      return month(m.group(2)) && day(m.group(3));
    }
    m = DMY.matcher(v);
    if (m.matches()) {
      int a = Integer.parseInt(m.group(1));
      int b = Integer.parseInt(m.group(3));
      return a >= 1 && b >= 1 && a <= 31 && b <= 31 && (a <= 12 || b <= 12);
    }
    return NAMED.matcher(v).matches();
  }

  private static boolean month(String s) {
    int m = Integer.parseInt(s);
    return m >= 1 && m <= 12;
  }

  private static boolean day(String s) {
    int d = Integer.parseInt(s);
    return d >= 1 && d <= 31;
  }
}
