package riffle.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import riffle.csv.SafeCsv;

/** A workbook sheet and a CSV file as the same shape of cells, to compare them. */
public final class WorkbookCells {
  private WorkbookCells() {}

  /**
   * A sheet's cells as text: whole numbers as digits (any other number fails), strings as written,
   * blanks as "", each row padded to the header's width. A formula cell fails.
   */
  public static List<List<String>> cells(Sheet sheet) {
    int width = sheet.getRow(0).getLastCellNum();
    List<List<String>> rows = new ArrayList<>();
    for (int r = 0; r <= sheet.getLastRowNum(); r++) {
      Row row = sheet.getRow(r);
      List<String> cells = new ArrayList<>();
      for (int c = 0; c < width; c++) {
        Cell cell = row == null ? null : row.getCell(c);
        if (cell == null || cell.getCellType() == CellType.BLANK) {
          cells.add("");
        } else if (cell.getCellType() == CellType.NUMERIC) {
          double v = cell.getNumericCellValue();
          assertEquals(Math.rint(v), v, "a whole number at " + cell.getAddress());
          cells.add(Long.toString((long) v));
        } else {
          assertEquals(CellType.STRING, cell.getCellType(), "at " + cell.getAddress());
          cells.add(cell.getStringCellValue());
        }
      }
      rows.add(cells);
    }
    return rows;
  }

  /** A CSV's records, the quote SafeCsv put before formula-like cells taken off again. */
  public static List<List<String>> csvCells(String csv) throws IOException {
    List<List<String>> rows = new ArrayList<>();
    for (CSVRecord r : CSVFormat.RFC4180.parse(new StringReader(csv.replace("\uFEFF", "")))) {
      rows.add(r.stream().map(SafeCsv::restore).toList());
    }
    return rows;
  }
}
