/**
 * CSV that Riffle writes for spreadsheets, and the one rule that keeps its cells inert.
 *
 * <p>Front door: {@link riffle.csv.SafeCsv}. Records are written by Commons CSV's {@code
 * CSVPrinter} in RFC 4180 form (comma, CRLF, a cell quoted where it needs it, quotes doubled);
 * every cell passes through {@link riffle.csv.SafeCsv#neutralise} first (OWASP, "CSV Injection"),
 * and a reader of a file Riffle wrote undoes it with {@link riffle.csv.SafeCsv#restore}. Uses the
 * JDK and Commons CSV only, so that any stage may write CSV through it.
 */
package riffle.csv;
