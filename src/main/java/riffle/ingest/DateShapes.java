package riffle.ingest;

import java.time.DateTimeException;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Recognises and reads values written as a date or a date-time in the formats survey tools and
 * spreadsheets export: ISO 8601 ({@code 2024-03-02}, {@code 2024-03-02T14:05:09Z}, {@code
 * 2024-03-02 14:05}), {@code 2024/03/02}, day-month-year or month-day-year with {@code /}, {@code
 * .} or {@code -} and a two- or four-digit year ({@code 02/03/2024 14:05}, {@code 3/2/24 2:05 PM},
 * {@code 02.03.2024}), and English month names ({@code 2 Mar 2024}, {@code March 2, 2024}). A time
 * part is allowed and not read: a response's date is the day as written. Thread-safe.
 */
final class DateShapes {
  private static final String TIME =
      "(?:[T ]|,? +)\\d{1,2}:\\d{2}(?::\\d{2}(?:[.,]\\d{1,9})?)?"
          + "(?: ?[AaPp]\\.?[Mm]\\.?)?(?: ?(?:Z|UTC|GMT|[+-]\\d{2}:?\\d{2}))?";
  private static final String MONTH =
      "(jan|feb|mar|apr|may|jun|jul|aug|sep|sept|oct|nov|dec)[a-z]*\\.?";
  private static final Pattern YMD =
      Pattern.compile("(\\d{4})[-/](\\d{1,2})[-/](\\d{1,2})(?:" + TIME + ")?");
  private static final Pattern NUMERIC =
      Pattern.compile("(\\d{1,2})([./-])(\\d{1,2})\\2(\\d{4}|\\d{2})(?:" + TIME + ")?");
  private static final Pattern DAY_MONTH =
      Pattern.compile(
          "(\\d{1,2})(?:st|nd|rd|th)? +" + MONTH + ",? +(\\d{4})(?:" + TIME + ")?",
          Pattern.CASE_INSENSITIVE);
  private static final Pattern MONTH_DAY =
      Pattern.compile(
          MONTH + " +(\\d{1,2})(?:st|nd|rd|th)?,? +(\\d{4})(?:" + TIME + ")?",
          Pattern.CASE_INSENSITIVE);
  private static final List<String> MONTHS =
      List.of("jan", "feb", "mar", "apr", "may", "jun", "jul", "aug", "sep", "oct", "nov", "dec");

  private DateShapes() {}

  /**
   * A value written as a date: either whole ({@code 2024-03-02}, {@code 2 Mar 2024}) or as two
   * numbers and a year, whose order the column decides.
   */
  sealed interface Written permits Whole, Numbers {}

  /** A date whose fields need no order to read; empty when no such day exists (31 Feb). */
  record Whole(Optional<LocalDate> date) implements Written {}

  /**
   * Two numbers then the year: {@code first.second.year}.
   *
   * @param first the first number
   * @param second the second number
   * @param year the year, four digits (a two-digit year already widened)
   * @param separator {@code /}, {@code .} or {@code -}
   */
  record Numbers(int first, int second, int year, char separator) implements Written {
    /** The date read in {@code order}; empty when no such day exists. */
    Optional<LocalDate> in(DateOrder order) {
      return order == DateOrder.DMY ? date(year, second, first) : date(year, first, second);
    }

    /** True when only day-first reads it (the first number cannot be a month). */
    boolean onlyDayFirst() {
      return first > 12 && second <= 12;
    }

    /** True when only month-first reads it (the second number cannot be a month). */
    boolean onlyMonthFirst() {
      return second > 12 && first <= 12;
    }
  }

  /** True when the value has the shape of a date, with plausible day and month numbers. */
  static boolean looksLikeDate(String value) {
    Optional<Written> w = read(value);
    if (w.isEmpty()) {
      return false;
    }
    if (w.get() instanceof Numbers n) {
      return n.first() >= 1
          && n.second() >= 1
          && n.first() <= 31
          && n.second() <= 31
          && (n.first() <= 12 || n.second() <= 12);
    }
    return ((Whole) w.get()).date().isPresent();
  }

  /** Reads a value's date fields; empty when it is not written as a date. */
  static Optional<Written> read(String value) {
    String v = value.strip();
    if (v.length() < 6
        || v.length() > 40
        || !Character.isDigit(v.charAt(0)) && !Character.isLetter(v.charAt(0))) {
      return Optional.empty();
    }
    Matcher m = YMD.matcher(v);
    if (m.matches()) {
      return Optional.of(new Whole(date(number(m, 1), number(m, 2), number(m, 3))));
    }
    m = NUMERIC.matcher(v);
    if (m.matches()) {
      return Optional.of(
          new Numbers(number(m, 1), number(m, 3), year(m.group(4)), m.group(2).charAt(0)));
    }
    m = DAY_MONTH.matcher(v);
    if (m.matches()) {
      return Optional.of(new Whole(date(number(m, 3), month(m.group(2)), number(m, 1))));
    }
    m = MONTH_DAY.matcher(v);
    if (m.matches()) {
      return Optional.of(new Whole(date(number(m, 3), month(m.group(1)), number(m, 2))));
    }
    return Optional.empty();
  }

  /**
   * A two-digit year widened as POSIX {@code strptime}'s {@code %y} does (The Open Group Base
   * Specifications, Issue 7): 69 to 99 are 1969 to 1999, 00 to 68 are 2000 to 2068.
   */
  static int year(String digits) {
    int y = Integer.parseInt(digits);
    if (digits.length() == 4) {
      return y;
    }
    return y >= 69 ? 1900 + y : 2000 + y;
  }

  private static int number(Matcher m, int group) {
    return Integer.parseInt(m.group(group));
  }

  private static int month(String name) {
    return MONTHS.indexOf(name.substring(0, 3).toLowerCase(Locale.ROOT)) + 1;
  }

  private static Optional<LocalDate> date(int year, int month, int day) {
    try {
      return Optional.of(LocalDate.of(year, month, day));
    } catch (DateTimeException e) {
      return Optional.empty();
    }
  }
}
