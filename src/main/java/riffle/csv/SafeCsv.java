package riffle.csv;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Objects;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * CSV records for spreadsheets: written by Commons CSV's {@link CSVPrinter} as RFC 4180 describes
 * (comma, CRLF at the end of each record, a cell quoted when it needs it, quotes doubled), every
 * cell neutralised first. Not thread-safe; one instance builds one file.
 *
 * <p>The cell rule follows OWASP's guidance on CSV injection: a cell beginning with {@code =},
 * {@code +}, {@code -}, {@code @}, a tab or a carriage return gets a leading single quote, so that
 * a spreadsheet shows it as text instead of running it. A cell that already begins with single
 * quotes followed by one of those characters gets one more, so that {@link #restore} gives back
 * exactly what was written. The rule applies to every cell, numbers included: a negative number
 * reads {@code '-3}; Riffle's CSV files carry counts, flags and ids, never negative numbers.
 */
public final class SafeCsv {
  /** The mark that makes spreadsheet programs read UTF-8 (U+FEFF, bytes EF BB BF in UTF-8). */
  public static final char BOM = '\uFEFF';

  private static final CSVFormat FORMAT = CSVFormat.RFC4180;
  private static final String RISKY = "=+-@\t\r";

  private final StringBuilder out = new StringBuilder();
  private final CSVPrinter printer;

  private SafeCsv(boolean withBom) {
    if (withBom) {
      out.append(BOM);
    }
    try {
      printer = FORMAT.print(out);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /** An empty file, opening with {@link #BOM} when {@code withBom}. */
  public static SafeCsv create(boolean withBom) {
    return new SafeCsv(withBom);
  }

  /** Appends one record, each cell neutralised. */
  public SafeCsv row(List<String> cells) {
    Objects.requireNonNull(cells, "cells");
    try {
      printer.printRecord(cells.stream().map(SafeCsv::neutralise));
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return this;
  }

  /** The file so far. */
  @Override
  public String toString() {
    return out.toString();
  }

  /** One cell as it is written after a comma: neutralised, then quoted where it needs it. */
  public static String cell(String value) {
    StringBuilder one = new StringBuilder();
    try {
      FORMAT.print(neutralise(value), one, false);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return one.substring(FORMAT.getDelimiterString().length());
  }

  /** The cell rule: a value that a spreadsheet could run as a formula gets a leading quote. */
  public static String neutralise(String value) {
    Objects.requireNonNull(value, "value");
    return risky(value, 0) ? "'" + value : value;
  }

  /**
   * Undoes {@link #neutralise} on a cell read from a file Riffle wrote: one leading single quote
   * comes off where {@code neutralise} put it; any other cell is returned as read.
   */
  public static String restore(String value) {
    Objects.requireNonNull(value, "value");
    return value.startsWith("'") && risky(value, 1) ? value.substring(1) : value;
  }

  /** Whether the value, from {@code from} on, is single quotes followed by a risky character. */
  private static boolean risky(String value, int from) {
    int i = from;
    while (i < value.length() && value.charAt(i) == '\'') {
      i++;
    }
    return i < value.length() && RISKY.indexOf(value.charAt(i)) >= 0;
  }
}
