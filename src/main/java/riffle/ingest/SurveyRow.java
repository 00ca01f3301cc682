package riffle.ingest;

import java.util.List;
import java.util.Objects;

/**
 * One respondent's record of a survey export.
 *
 * @param number the 1-based data row number: the record's position below the header, counting every
 *     record (skipped and blank ones too), so it is the row a spreadsheet shows minus one
 * @param line the 1-based physical line where the record starts in the input
 * @param cells the cell values exactly as they appear in the input (no trimming), one per column of
 *     the table; never null
 */
public record SurveyRow(int number, long line, List<String> cells) {
  public SurveyRow {
    if (number < 1) {
      throw new IllegalArgumentException("number must be >= 1, got " + number);
    }
    if (line < 1) {
      throw new IllegalArgumentException("line must be >= 1, got " + line);
    }
    cells = List.copyOf(Objects.requireNonNull(cells, "cells"));
  }

  /**
   * Returns this row's value in a column.
   *
   * @param c a column of the table this row belongs to
   * @return the verbatim cell value, possibly empty
   */
  public String cell(Column c) {
    return cells.get(c.index());
  }
}
