package riffle.report;

import java.util.List;
import java.util.Locale;
import org.apache.poi.ss.SpreadsheetVersion;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xssf.streaming.SXSSFCell;
import org.apache.poi.xssf.streaming.SXSSFRow;
import org.apache.poi.xssf.streaming.SXSSFSheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import riffle.model.InputException;

/**
 * One sheet of a streamed workbook, written row by row: a bold header row that stays in view
 * (frozen) and carries an autofilter, then cells each written as a number or as text, never as a
 * formula. Column widths follow the longest cell written in each column, capped at {@link
 * #MAX_WIDTH} characters: the streaming writer keeps only a few rows in memory, so it cannot size
 * columns from the whole sheet afterwards.
 *
 * <p>Text needs no leading quote here, unlike CSV ({@code riffle.csv.SafeCsv}): a CSV cell is bare
 * text whose type a spreadsheet program guesses, so "=SUM(A1:A3)" would run; a workbook cell
 * carries its type in the file (ECMA-376 Part 1, §18.3.1.4: {@code t="inlineStr"} with the text in
 * an {@code <is>} element), and a formula is a separate {@code <f>} element this writer never
 * writes. A text cell starting with =, +, - or @ is therefore shown and read back as that text; a
 * quote would only become part of the value.
 */
final class WorkbookSheet {
  /** The widest a column is made, in characters. */
  static final int MAX_WIDTH = 60;

  /** The styles the sheets of one workbook share (a workbook holds a limited number). */
  record Styles(CellStyle header, CellStyle percent) {
    static Styles of(SXSSFWorkbook book) {
      Font bold = book.createFont();
      bold.setBold(true);
      CellStyle header = book.createCellStyle();
      header.setFont(bold);
      CellStyle percent = book.createCellStyle();
      percent.setDataFormat(book.createDataFormat().getFormat("0%"));
      return new Styles(header, percent);
    }
  }

  private static final int MAX_TEXT = SpreadsheetVersion.EXCEL2007.getMaxTextLength();
  private static final int LAST_ROW = SpreadsheetVersion.EXCEL2007.getLastRowIndex();

  private final SXSSFSheet sheet;
  private final Styles styles;
  private final List<String> header;
  private final int[] widths;
  private SXSSFRow row;
  private int rows = 1;
  private int column;

  WorkbookSheet(SXSSFWorkbook book, Styles styles, String name, List<String> header)
      throws InputException {
    this.sheet = book.createSheet(name);
    this.styles = styles;
    this.header = List.copyOf(header);
    this.widths = new int[header.size()];
    SXSSFRow top = sheet.createRow(0);
    for (int i = 0; i < header.size(); i++) {
      SXSSFCell c = top.createCell(i);
      c.setCellValue(checked(header.get(i), 0, i));
      c.setCellStyle(styles.header);
      // Room for the autofilter's button beside the name.
      track(i, header.get(i).length() + 2);
    }
    sheet.createFreezePane(0, 1);
  }

  /** Starts the next row. */
  WorkbookSheet row() throws InputException {
    if (rows > LAST_ROW) {
      throw new InputException(
          "sheet \""
              + sheet.getSheetName()
              + "\" would need more than "
              + String.format(Locale.ROOT, "%,d", LAST_ROW + 1)
              + " rows, the most a workbook sheet holds; export as csv instead");
    }
    row = sheet.createRow(rows++);
    column = 0;
    return this;
  }

  /** The next cell as text; an empty text leaves the cell blank. */
  WorkbookSheet text(String value) throws InputException {
    if (!value.isEmpty()) {
      row.createCell(column).setCellValue(checked(value, row.getRowNum(), column));
      track(column, value.length());
    }
    column++;
    return this;
  }

  /** The next cell as a number. */
  WorkbookSheet number(double value) {
    row.createCell(column).setCellValue(value);
    double whole = Math.rint(value);
    track(column, whole == value ? Long.toString((long) whole).length() : 8);
    column++;
    return this;
  }

  /** The next cell as a share, a number shown as a percentage. */
  WorkbookSheet percent(double share) {
    SXSSFCell c = row.createCell(column);
    c.setCellValue(share);
    c.setCellStyle(styles.percent);
    track(column, 5);
    column++;
    return this;
  }

  /** Leaves the next cell blank. */
  WorkbookSheet blank() {
    column++;
    return this;
  }

  /** Sets the column widths and the autofilter over every row written. */
  void finish() {
    for (int i = 0; i < widths.length; i++) {
      sheet.setColumnWidth(i, (Math.min(widths[i], MAX_WIDTH) + 1) * 256);
    }
    if (!header.isEmpty()) {
      sheet.setAutoFilter(new CellRangeAddress(0, rows - 1, 0, header.size() - 1));
    }
  }

  private void track(int i, int chars) {
    widths[i] = Math.max(widths[i], chars);
  }

  private String checked(String value, int rowIndex, int col) throws InputException {
    if (value.length() > MAX_TEXT) {
      throw new InputException(
          "sheet \""
              + sheet.getSheetName()
              + "\", row "
              + (rowIndex + 1)
              + ", column "
              + header.get(col)
              + ": "
              + String.format(Locale.ROOT, "%,d", value.length())
              + " characters, more than a workbook cell holds ("
              + String.format(Locale.ROOT, "%,d", MAX_TEXT)
              + "); export as csv instead");
    }
    return value;
  }
}
