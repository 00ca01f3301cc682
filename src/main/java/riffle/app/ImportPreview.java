package riffle.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import riffle.ingest.DateColumn;
import riffle.ingest.SurveyRow;
import riffle.ingest.SurveyTable;
import riffle.model.InputException;
import riffle.model.InputProblem;
import riffle.model.Progress;
import riffle.text.PiiMasker;

/**
 * What an import would read, before anything is stored: how the export was decoded and split, the
 * role of every column, its first rows and the problems found. The cells shown are masked, as every
 * screen shows answers.
 *
 * @param source the file name, or "paste"
 * @param encoding how the bytes were decoded
 * @param encodingDetected true when the encoding was sniffed rather than given
 * @param delimiter the delimiter's label ({@code comma}, {@code semicolon}, {@code tab}, {@code
 *     pipe})
 * @param delimiterDetected true when the delimiter was sniffed rather than given
 * @param columns each column with its role
 * @param rows the first rows, cells masked, one cell per column
 * @param totalRows data rows that would be imported
 * @param skippedRows rows that would be left out (ragged or blank)
 * @param problems problems found, with file, line and column
 */
public record ImportPreview(
    String source,
    String encoding,
    boolean encodingDetected,
    String delimiter,
    boolean delimiterDetected,
    List<ImportReport.ColumnReport> columns,
    List<Row> rows,
    int totalRows,
    int skippedRows,
    List<InputProblem> problems) {
  public ImportPreview {
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(encoding, "encoding");
    Objects.requireNonNull(delimiter, "delimiter");
    columns = List.copyOf(columns);
    rows = List.copyOf(rows);
    problems = List.copyOf(problems);
  }

  /**
   * One row of the export as it would be read.
   *
   * @param number the 1-based data row number
   * @param line the physical line where the row starts
   * @param cells the cells, personal data masked
   */
  public record Row(int number, long line, List<String> cells) {
    public Row {
      cells = List.copyOf(cells);
    }
  }

  /**
   * Reads the request's export as an import would, without opening any project.
   *
   * @param request what to read and how (its wave and date are not used)
   * @param maxRows how many rows to return, at least 1
   * @throws InputException when the export cannot be used; its problem names the line and column
   * @throws IllegalArgumentException when {@code maxRows} is out of range
   */
  public static ImportPreview of(ImportRequest request, int maxRows) throws InputException {
    if (maxRows < 1 || maxRows > 1_000) {
      throw new InputException("rows must be between 1 and 1000, not " + maxRows);
    }
    SurveyTable table = WaveImporter.read(request, Progress.NONE);
    PiiMasker masker = PiiMasker.standard();
    DateColumn.Reading dates =
        DateColumn.read(table, request.settings().dateOrder(), request.settings().maxProblems());
    List<InputProblem> problems = new ArrayList<>(table.problems());
    dates
        .unsettled()
        .ifPresent(
            m ->
                problems.add(new InputProblem(table.source(), 0, 0, m, Optional.of("date order"))));
    problems.addAll(dates.problems());
    List<Row> rows =
        table.rows().stream()
            .limit(maxRows)
            .map(r -> new Row(r.number(), r.line(), masked(masker, r)))
            .toList();
    return new ImportPreview(
        table.source(),
        table.encoding(),
        table.encodingDetected(),
        table.delimiter().label(),
        table.delimiterDetected(),
        table.columns().stream().map(ImportReport.ColumnReport::of).toList(),
        rows,
        table.rows().size(),
        table.skippedRows(),
        problems);
  }

  private static List<String> masked(PiiMasker masker, SurveyRow row) {
    return row.cells().stream().map(c -> masker.mask(c).text()).toList();
  }
}
