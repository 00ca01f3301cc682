package riffle.ingest;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;
import riffle.model.ColumnRole;
import riffle.model.InputProblem;

/**
 * Reads a table's date column whole: decides whether its numeric dates are day-first or
 * month-first, finds the latest date (the wave's date when none is given) and names every value it
 * cannot read.
 *
 * <p>The order comes from the setting when given; else from the column: a value whose first number
 * is above 12 can only be day-first, one whose second number is above 12 only month-first. When
 * both kinds occur the larger group decides and each value of the other is a problem. When no value
 * settles it, dates written with dots are read day-first, as every locale that writes them so does
 * (common practice, not a standard); with slashes or dashes the order is asked for — unless both
 * orders give the same latest date, the only figure taken from the column.
 *
 * <p>A column of whole numbers from 20,000 to 80,000 (1954 to 2119) is read as spreadsheet serial
 * dates when at least 90% of its values are such numbers: ECMA-376 Part 1, §18.17.4.1, 1900 date
 * system, where serial 1 is 1 January 1900 and serial 60 the fictitious 29 February 1900, so that
 * from serial 61 on the day is 30 December 1899 plus the serial.
 */
public final class DateColumn {
  private static final Pattern SERIAL = Pattern.compile("\\d{5}(?:\\.\\d+)?");
  private static final int FIRST_SERIAL = 20_000;
  private static final int LAST_SERIAL = 80_000;
  private static final LocalDate SERIAL_EPOCH = LocalDate.of(1899, 12, 30);

  private DateColumn() {}

  /**
   * What the date column gave.
   *
   * @param column the date column's header, when the table has one
   * @param latest the latest date read, when any was read
   * @param read how the dates were read, in words ("day-first, as 31.12.2026"), empty without a
   *     date column
   * @param problems values that could not be read, with line and column
   * @param unsettled when the order cannot be told and matters, the message asking for it
   */
  public record Reading(
      Optional<String> column,
      Optional<LocalDate> latest,
      String read,
      List<InputProblem> problems,
      Optional<String> unsettled) {
    public Reading {
      problems = List.copyOf(problems);
    }
  }

  /** Reads the date column of {@code table}, in {@code order} when given. */
  public static Reading read(SurveyTable table, Optional<DateOrder> order, int maxProblems) {
    Optional<Column> found = table.columnsWith(ColumnRole.DATE).stream().findFirst();
    if (found.isEmpty()) {
      return new Reading(Optional.empty(), Optional.empty(), "", List.of(), Optional.empty());
    }
    Column column = found.get();
    ProblemList problems = new ProblemList(table.source(), maxProblems);
    List<SurveyRow> rows = table.rows();
    String[] values = new String[rows.size()];
    int filled = 0;
    int serials = 0;
    for (int r = 0; r < values.length; r++) {
      values[r] = rows.get(r).cell(column).strip();
      if (!values[r].isEmpty()) {
        filled++;
        if (isSerial(values[r])) {
          serials++;
        }
      }
    }
    if (filled > 0 && serials >= 0.9 * filled) {
      return serials(table, column, values, problems);
    }
    List<DateShapes.Written> written = new ArrayList<>(values.length);
    int dayFirst = 0;
    int monthFirst = 0;
    boolean dots = false;
    for (String v : values) {
      DateShapes.Written w = v.isEmpty() ? null : DateShapes.read(v).orElse(null);
      written.add(w);
      if (w instanceof DateShapes.Numbers n) {
        dayFirst += n.onlyDayFirst() ? 1 : 0;
        monthFirst += n.onlyMonthFirst() ? 1 : 0;
        dots |= n.separator() == '.';
      }
    }
    DateOrder use;
    String how;
    Optional<String> unsettled = Optional.empty();
    if (order.isPresent()) {
      use = order.get();
      how = use.label() + ", as set";
    } else if (dayFirst > 0 || monthFirst > 0) {
      use = dayFirst >= monthFirst ? DateOrder.DMY : DateOrder.MDY;
      how = use.label() + ", as " + settling(values, written, use) + " shows";
    } else {
      use = DateOrder.DMY;
      how = dots ? "day-first, as dates with dots are written" : "day-first";
      if (!dots && !latest(written, DateOrder.DMY).equals(latest(written, DateOrder.MDY))) {
        Optional<LocalDate> a = latest(written, DateOrder.DMY);
        Optional<LocalDate> b = latest(written, DateOrder.MDY);
        unsettled =
            Optional.of(
                "the dates in column '"
                    + column.header()
                    + "' read as day-first or as month-first (every day and month is 12 or less),"
                    + " and the wave's date depends on it: "
                    + a.map(LocalDate::toString).orElse("none")
                    + " day-first, "
                    + b.map(LocalDate::toString).orElse("none")
                    + " month-first; set the date order (dmy or mdy), or the wave's date");
      }
    }
    LocalDate latest = null;
    for (int r = 0; r < values.length; r++) {
      if (values[r].isEmpty()) {
        continue;
      }
      DateShapes.Written w = written.get(r);
      Optional<LocalDate> d =
          w instanceof DateShapes.Numbers n
              ? n.in(use)
              : w instanceof DateShapes.Whole whole ? whole.date() : Optional.empty();
      if (d.isEmpty()) {
        problems.add(
            rows.get(r).line(),
            column.index() + 1,
            cannotRead(values[r], column, w == null ? "" : " " + use.label()));
      } else if (latest == null || d.get().isAfter(latest)) {
        latest = d.get();
      }
    }
    if (latest == null) {
      problems.add(
          0,
          column.index() + 1,
          "no date in column '"
              + column.header()
              + "' could be read, so the wave is dated today; give the wave's date");
    }
    return new Reading(
        Optional.of(column.header()),
        Optional.ofNullable(latest),
        how,
        problems.list(),
        latest == null ? Optional.empty() : unsettled);
  }

  private static String cannotRead(String value, Column column, String order) {
    return "cannot read '"
        + value
        + "' as a"
        + order
        + " date; the wave's date comes from the other rows of '"
        + column.header()
        + "'";
  }

  /** The first value that only {@code order} can read, for the summary. */
  private static String settling(
      String[] values, List<DateShapes.Written> written, DateOrder order) {
    for (int i = 0; i < values.length; i++) {
      if (written.get(i) instanceof DateShapes.Numbers n
          && (order == DateOrder.DMY ? n.onlyDayFirst() : n.onlyMonthFirst())) {
        return values[i];
      }
    }
    return "the column";
  }

  private static Optional<LocalDate> latest(List<DateShapes.Written> written, DateOrder order) {
    LocalDate latest = null;
    for (DateShapes.Written w : written) {
      Optional<LocalDate> d =
          w instanceof DateShapes.Numbers n
              ? n.in(order)
              : w instanceof DateShapes.Whole whole ? whole.date() : Optional.empty();
      if (d.isPresent() && (latest == null || d.get().isAfter(latest))) {
        latest = d.get();
      }
    }
    return Optional.ofNullable(latest);
  }

  /** A whole number (or a day with a time fraction) from 20,000 to 80,000. */
  static boolean isSerial(String v) {
    if (!SERIAL.matcher(v).matches()) {
      return false;
    }
    double d = Double.parseDouble(v);
    return d >= FIRST_SERIAL && d < LAST_SERIAL;
  }

  /** The day of a serial date of the 1900 date system, from serial 61 (1 March 1900) on. */
  static LocalDate serialDay(double serial) {
    return SERIAL_EPOCH.plusDays((long) Math.floor(serial));
  }

  private static Reading serials(
      SurveyTable table, Column column, String[] values, ProblemList problems) {
    LocalDate latest = null;
    for (int r = 0; r < values.length; r++) {
      if (values[r].isEmpty()) {
        continue;
      }
      if (!isSerial(values[r])) {
        problems.add(
            table.rows().get(r).line(),
            column.index() + 1,
            cannotRead(values[r], column, " spreadsheet serial"));
        continue;
      }
      LocalDate d = serialDay(Double.parseDouble(values[r]));
      if (latest == null || d.isAfter(latest)) {
        latest = d;
      }
    }
    return new Reading(
        Optional.of(column.header()),
        Optional.ofNullable(latest),
        "spreadsheet serial numbers (1900 date system)",
        problems.list(),
        Optional.empty());
  }
}
