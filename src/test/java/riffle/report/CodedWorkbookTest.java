package riffle.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.PaneInformation;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import riffle.model.CodeFrequency;
import riffle.model.Findings;
import riffle.model.InputException;
import riffle.model.QuestionFindings;
import riffle.model.Share;

/** The coded-answers workbook, read back with POI's full (non-streaming) reader. */
class CodedWorkbookTest {
  static final String FORMULA = "=SUM(A1:A3)";

  /** Invented answers: formula-like text and metadata, a passage, an unread and a rule's answer. */
  private static CodedExport export(String firstText) {
    return new CodedExport(
        Survey.CODEBOOK,
        List.of(
            new ExportAnswer(
                "a1",
                "r1",
                "Spring",
                Survey.MAIN,
                true,
                firstText,
                Map.of("country", "@SUM(A1)", "buyer", "-new"),
                List.of(
                    new ExportAssignment("cost", "Mila", "manual", 0, 5),
                    new ExportAssignment("old", "import", "imported", -1, -1)),
                List.of("Mila", "import")),
            new ExportAnswer(
                "a2", "r2", "Spring", Survey.MAIN, false, "n/a", Map.of(), List.of(), List.of()),
            new ExportAnswer(
                "a3",
                "r3",
                "Summer",
                Survey.MAIN,
                true,
                "+ all fine, thanks",
                Map.of("buyer", "returning"),
                List.of(),
                List.of("Mila")),
            new ExportAnswer(
                "a4",
                "r4",
                "Summer",
                Survey.MAIN,
                true,
                "Shipping was dear",
                Map.of(),
                List.of(new ExportAssignment("cost", "Mila", "rule", -1, -1)),
                List.of())));
  }

  private static final List<String> BOOK_COLUMNS = List.of("name", "theme", "archived");

  private static List<List<String>> bookRows() {
    List<List<String>> rows = new ArrayList<>();
    for (ReportCode c : Survey.CODEBOOK) {
      rows.add(List.of(c.name(), c.parentId().orElse(""), c.archived() ? "yes" : "no"));
    }
    return rows;
  }

  private static Findings findings() {
    return Report.compute(
        new ReportInput(
            List.of(Survey.MAIN, Survey.TINY),
            Survey.WAVES,
            Survey.CODEBOOK,
            new Survey(11L).answers),
        ReportSettings.DEFAULTS);
  }

  private static XSSFWorkbook workbook(CodedExport export) throws Exception {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    Exports.codedAnswersWorkbook(
        new CodedWorkbookInput(export, BOOK_COLUMNS, bookRows(), findings()), out);
    return new XSSFWorkbook(new ByteArrayInputStream(out.toByteArray()));
  }

  @Test
  void theCodedSheetsHoldTheCsvRowsWithFlagsAsNumbersAndFormulaTextAsText() throws Exception {
    CodedExport export = export(FORMULA);
    try (XSSFWorkbook book = workbook(export)) {
      XSSFSheet wide = book.getSheet(CodedWorkbook.CODED);
      assertEquals(
          WorkbookCells.csvCells(Exports.codedAnswersCsv(export, false)),
          WorkbookCells.cells(wide));
      assertEquals(
          WorkbookCells.csvCells(Exports.codedAnswersLongCsv(export, false)),
          WorkbookCells.cells(book.getSheet(CodedWorkbook.LONG)));

      List<String> header = WorkbookCells.cells(wide).get(0);
      Row first = wide.getRow(1);
      Cell text = first.getCell(header.indexOf("text"));
      // No formula and no leading apostrophe: the cell is a string holding exactly the text.
      assertEquals(CellType.STRING, text.getCellType());
      assertEquals(FORMULA, text.getStringCellValue());
      assertFalse(text.getCellStyle().getQuotePrefixed());
      assertEquals(CellType.STRING, first.getCell(header.indexOf("country")).getCellType());
      assertEquals("@SUM(A1)", first.getCell(header.indexOf("country")).getStringCellValue());
      for (String flag : List.of("substantive", "read", "Delivery cost", "Product quality")) {
        assertEquals(CellType.NUMERIC, first.getCell(header.indexOf(flag)).getCellType(), flag);
      }
      assertEquals(1.0, first.getCell(header.indexOf("Delivery cost")).getNumericCellValue());
      assertEquals(0.0, first.getCell(header.indexOf("Easy checkout")).getNumericCellValue());
      // a4 is unread: its code cells stay blank unless a rule gave the code.
      Row unread = wide.getRow(4);
      assertEquals(null, unread.getCell(header.indexOf("Easy checkout")));
      assertEquals(1.0, unread.getCell(header.indexOf("Delivery cost")).getNumericCellValue());

      for (Sheet sheet : book) {
        PaneInformation pane = sheet.getPaneInformation();
        assertNotNull(pane, sheet.getSheetName() + " has a frozen header");
        assertTrue(pane.isFreezePane(), sheet.getSheetName());
        assertEquals(1, pane.getHorizontalSplitPosition(), sheet.getSheetName());
        assertEquals(0, pane.getVerticalSplitPosition(), sheet.getSheetName());
        assertTrue(
            book.getFontAt(sheet.getRow(0).getCell(0).getCellStyle().getFontIndex()).getBold());
        assertTrue(((XSSFSheet) sheet).getCTWorksheet().isSetAutoFilter(), sheet.getSheetName());
        for (int c = 0; c < sheet.getRow(0).getLastCellNum(); c++) {
          assertTrue(
              sheet.getColumnWidth(c) <= (WorkbookSheet.MAX_WIDTH + 1) * 256,
              sheet.getSheetName() + " column " + c);
        }
      }
      int textWidth = wide.getColumnWidth(header.indexOf("text"));
      assertTrue(textWidth >= (FORMULA.length() + 1) * 256, "the text column fits its text");
    }
  }

  @Test
  void theCodebookSheetListsEveryCode() throws Exception {
    try (XSSFWorkbook book = workbook(export("fine"))) {
      List<List<String>> rows = WorkbookCells.cells(book.getSheet(CodedWorkbook.CODEBOOK));
      assertEquals(BOOK_COLUMNS, rows.get(0));
      assertEquals(bookRows(), rows.subList(1, rows.size()));
      assertEquals(Survey.CODEBOOK.size() + 1, rows.size());
    }
  }

  @Test
  void theFindingsSheetHasOneSortableRowPerCodeAndWaveWithSharesAsPercentNumbers()
      throws Exception {
    Findings findings = findings();
    try (XSSFWorkbook book = workbook(export("fine"))) {
      Sheet sheet = book.getSheet(CodedWorkbook.FINDINGS);
      List<String> header = new ArrayList<>();
      sheet.getRow(0).forEach(c -> header.add(c.getStringCellValue()));
      int expected = 0;
      int r = 1;
      for (QuestionFindings q : findings.questions()) {
        for (CodeFrequency code : q.codes()) {
          for (String wave : q.bases().keySet()) {
            Row row = sheet.getRow(r++);
            expected++;
            assertEquals(
                q.question(), row.getCell(header.indexOf("question")).getStringCellValue());
            assertEquals(code.code(), row.getCell(header.indexOf("code")).getStringCellValue());
            assertEquals(wave, row.getCell(header.indexOf("wave")).getStringCellValue());
            Share s = code.waves().get(wave);
            if (s == null) {
              assertEquals(null, row.getCell(header.indexOf("count")));
              assertFalse(
                  row.getCell(header.indexOf("no_share")).getStringCellValue().isEmpty(),
                  "a missing share says why");
              continue;
            }
            assertEquals(s.count(), row.getCell(header.indexOf("count")).getNumericCellValue());
            assertEquals(s.base(), row.getCell(header.indexOf("base")).getNumericCellValue());
            Cell share = row.getCell(header.indexOf("share"));
            assertEquals(s.share(), share.getNumericCellValue(), 1e-12);
            assertEquals("0%", share.getCellStyle().getDataFormatString());
            assertEquals(
                s.ci().lower(), row.getCell(header.indexOf("ci_lower")).getNumericCellValue());
            assertEquals(
                s.ci().upper(), row.getCell(header.indexOf("ci_upper")).getNumericCellValue());
            assertEquals(
                s.smallBase() ? 1.0 : 0.0,
                row.getCell(header.indexOf("small_base")).getNumericCellValue());
          }
        }
      }
      assertTrue(expected > 20, "the invented survey has findings");
      assertEquals(expected, sheet.getLastRowNum());
      int changes = findings.questions().stream().mapToInt(q -> q.changes().size()).sum();
      assertEquals(changes, book.getSheet(CodedWorkbook.CHANGES).getLastRowNum());
    }
  }

  @Test
  void textLongerThanAWorkbookCellHoldsIsRefusedNamingTheSheetRowAndColumn() throws IOException {
    Path poiFiles = Path.of(System.getProperty("java.io.tmpdir"), "poifiles");
    Files.createDirectories(poiFiles);
    List<Path> before = list(poiFiles);
    String huge = "slow delivery ".repeat(2400);
    InputException e =
        assertThrows(
            InputException.class,
            () ->
                Exports.codedAnswersWorkbook(
                    new CodedWorkbookInput(export(huge), BOOK_COLUMNS, bookRows(), findings()),
                    new ByteArrayOutputStream()));
    assertTrue(e.getMessage().contains("\"Coded answers\", row 2, column text"), e.getMessage());
    assertTrue(e.getMessage().contains("32,767"), e.getMessage());
    assertTrue(e.getMessage().contains("export as csv"), e.getMessage());
    assertEquals(before, list(poiFiles), "the sheets' temporary files are gone");
  }

  private static List<Path> list(Path dir) throws IOException {
    try (Stream<Path> files = Files.list(dir)) {
      return files.sorted().toList();
    }
  }
}
