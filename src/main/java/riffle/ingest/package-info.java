/**
 * Ingest: turns the bytes of a survey export (a CSV/TSV file, one sheet of an Excel .xlsx workbook,
 * or cells pasted from a spreadsheet) into a table of rows with column roles and a bounded list of
 * positioned problems. Depends on {@code riffle.model}, Apache Commons CSV and Apache POI
 * (workbooks only, in {@code WorkbookReader}).
 *
 * <p>The front door is {@link riffle.ingest.SurveyReader}, configured by {@link
 * riffle.ingest.ImportSettings} and returning a {@link riffle.ingest.SurveyTable}. Behind it, in
 * order: the encoding is sniffed (byte-order mark, UTF-16 NUL pattern, strict UTF-8, else
 * windows-1252, or line by line when the file mixes UTF-8 and windows-1252 lines) and binary files
 * are refused; the delimiter is sniffed quote-aware over the first records (comma, semicolon, tab,
 * pipe; Excel's {@code sep=;} first line is honoured); Commons CSV splits the records, and an
 * unclosed quote is located by line and field; the first non-blank record is the header; the other
 * records become rows; each column gets a role, named or detected. Cell values are kept verbatim;
 * header names are trimmed.
 *
 * <h2>Ragged rows</h2>
 *
 * <p>A record whose number of fields differs from the header's is ragged, except that extra fields
 * that are all empty (trailing delimiters) are dropped, and fields under trailing blank headers may
 * be missing. A ragged row is skipped, reported as a problem with its line ("row has N fields, the
 * header has M; the row was skipped — usually a line break inside an answer that is not in quotes")
 * and counted in {@link riffle.ingest.SurveyTable#skippedRows()}. Fully blank records are skipped
 * silently and counted too, except blank lines after the last row. When more than half of the
 * non-blank records below the header are ragged, the delimiter is almost certainly wrong and the
 * whole input is refused with a message pointing at {@code --delimiter}. At most {@link
 * riffle.ingest.ImportSettings#maxProblems()} problems are listed, then one final "N more problems
 * not listed".
 *
 * <p>Every type is immutable or stateless and safe to share between threads; nothing here returns
 * null.
 */
package riffle.ingest;
