package riffle.ingest;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.LocalDateTime;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * Test helpers: workbooks written with POI's XSSFWorkbook, cells given as Java values (a {@link
 * String}, a {@link Number}, a {@link Boolean}, a {@link LocalDateTime} written as a date cell, or
 * null for no cell).
 */
public final class Workbooks {
  private Workbooks() {}

  /** Adds a sheet with one row per array, from row 1. */
  public static Sheet sheet(XSSFWorkbook wb, String name, Object[]... rows) {
    Sheet sheet = wb.createSheet(name);
    CellStyle date = wb.createCellStyle();
    date.setDataFormat(wb.createDataFormat().getFormat("yyyy-mm-dd"));
    CellStyle dateTime = wb.createCellStyle();
    dateTime.setDataFormat(wb.createDataFormat().getFormat("d/m/yyyy h:mm"));
    for (int r = 0; r < rows.length; r++) {
      Row row = sheet.createRow(r);
      for (int c = 0; c < rows[r].length; c++) {
        Object v = rows[r][c];
        if (v == null) {
          continue;
        }
        Cell cell = row.createCell(c);
        if (v instanceof String s) {
          cell.setCellValue(s);
        } else if (v instanceof Number n) {
          cell.setCellValue(n.doubleValue());
        } else if (v instanceof Boolean b) {
          cell.setCellValue(b);
        } else if (v instanceof LocalDateTime t) {
          cell.setCellValue(t);
          cell.setCellStyle(t.toLocalTime().toSecondOfDay() == 0 ? date : dateTime);
        } else {
          throw new IllegalArgumentException("no cell for " + v);
        }
      }
    }
    return sheet;
  }

  /** The workbook's .xlsx bytes; closes it. */
  public static byte[] bytes(XSSFWorkbook wb) {
    try (wb;
        ByteArrayOutputStream out = new ByteArrayOutputStream()) {
      wb.write(out);
      return out.toByteArray();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /** A one-sheet workbook. */
  public static byte[] of(String sheetName, Object[]... rows) {
    XSSFWorkbook wb = new XSSFWorkbook();
    sheet(wb, sheetName, rows);
    return bytes(wb);
  }
}
