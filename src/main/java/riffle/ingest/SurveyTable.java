package riffle.ingest;

import java.util.List;
import java.util.Objects;
import riffle.model.ColumnRole;
import riffle.model.InputProblem;

/**
 * A survey export read into rows, with the role of every column and the problems found. Immutable.
 *
 * @param source the file name, or {@code "paste"}; for a workbook the file and sheet names, {@code
 *     "wave.xlsx:Answers"}
 * @param encoding how the bytes were decoded, e.g. {@code "UTF-8"}, {@code "UTF-8 (BOM)"}, {@code
 *     "UTF-16LE (BOM)"}, {@code "windows-1252"}; {@code "pasted text"} for a paste; {@code "Excel
 *     workbook (sheet 'Answers')"} for a workbook (whose delimiter is then comma, not detected)
 * @param delimiter the field separator used
 * @param delimiterDetected true when the delimiter was sniffed rather than given
 * @param encodingDetected true when the encoding was sniffed rather than given
 * @param columns every column of the export, in order; {@code columns().get(i).index() == i}
 * @param rows the rows kept, in input order
 * @param problems what was wrong in rows or headers, with lines; at most {@link
 *     ImportSettings#maxProblems()} plus one final "N more problems not listed"
 * @param skippedRows records below the header that were not kept: ragged rows (each also a problem)
 *     and fully blank rows (skipped silently)
 */
public record SurveyTable(
    String source,
    String encoding,
    Delimiter delimiter,
    boolean delimiterDetected,
    boolean encodingDetected,
    List<Column> columns,
    List<SurveyRow> rows,
    List<InputProblem> problems,
    int skippedRows) {
  /** How {@link #encoding()} begins for a table read from a workbook's sheet. */
  public static final String WORKBOOK = WorkbookReader.LABEL;

  public SurveyTable {
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(encoding, "encoding");
    Objects.requireNonNull(delimiter, "delimiter");
    columns = List.copyOf(Objects.requireNonNull(columns, "columns"));
    rows = List.copyOf(Objects.requireNonNull(rows, "rows"));
    problems = List.copyOf(Objects.requireNonNull(problems, "problems"));
    if (skippedRows < 0) {
      throw new IllegalArgumentException("skippedRows must be >= 0, got " + skippedRows);
    }
  }

  /**
   * Returns the columns with one role, in column order.
   *
   * @param role the role wanted
   * @return the matching columns, possibly none
   */
  public List<Column> columnsWith(ColumnRole role) {
    Objects.requireNonNull(role, "role");
    return columns.stream().filter(c -> c.role() == role).toList();
  }
}
