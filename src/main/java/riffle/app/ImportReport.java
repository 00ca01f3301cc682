package riffle.app;

import java.time.LocalDate;
import java.util.List;
import riffle.ingest.Column;
import riffle.ingest.SurveyTable;
import riffle.model.ColumnRole;
import riffle.model.InputProblem;

/**
 * What an import did.
 *
 * @param wave the wave imported into
 * @param fieldedOn the wave's fielding date
 * @param dated where that date comes from, in words ("the latest date in column 'Submitted', read
 *     day-first")
 * @param source the file name, or "paste"
 * @param encoding the encoding the export was read with
 * @param delimiter the delimiter's label
 * @param columns each column with its role
 * @param rows data rows read, skipped ones included
 * @param answers answers added
 * @param skipped rows left out (ragged or blank)
 * @param duplicates rows already in the wave with the same answers, which added nothing
 * @param codesCreated codes added to the codebook from codes columns
 * @param assignments imported code assignments added
 * @param problems problems found, with file, line and column
 */
public record ImportReport(
    String wave,
    LocalDate fieldedOn,
    String dated,
    String source,
    String encoding,
    String delimiter,
    List<ColumnReport> columns,
    int rows,
    int answers,
    int skipped,
    int duplicates,
    int codesCreated,
    int assignments,
    List<InputProblem> problems) {
  public ImportReport {
    columns = List.copyOf(columns);
    problems = List.copyOf(problems);
  }

  /** True when the export was a sheet of an Excel workbook rather than text. */
  public boolean readFromWorkbook() {
    return encoding.startsWith(SurveyTable.WORKBOOK);
  }

  /**
   * A column of the export and what it was taken for.
   *
   * @param header the column's header
   * @param role what it holds
   * @param detected true when the role was detected rather than named
   * @param reason why it has that role, in words
   */
  public record ColumnReport(String header, ColumnRole role, boolean detected, String reason) {
    static ColumnReport of(Column c) {
      return new ColumnReport(c.header(), c.role(), c.detected(), c.reason());
    }
  }
}
