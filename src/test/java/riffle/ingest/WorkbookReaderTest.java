package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.util.Arrays;
import java.util.List;
import java.util.zip.CRC32;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.apache.poi.poifs.crypt.EncryptionInfo;
import org.apache.poi.poifs.crypt.EncryptionMode;
import org.apache.poi.poifs.crypt.Encryptor;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.FormulaError;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xssf.usermodel.XSSFFont;
import org.apache.poi.xssf.usermodel.XSSFRichTextString;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.ColumnRole;
import riffle.model.InputProblem;

/** Excel workbooks read as the CSV path reads their CSV twin, and bad workbooks refused safely. */
class WorkbookReaderTest {
  @TempDir Path dir;

  private static final String QUESTION = "What almost stopped you from ordering?";

  private static final Object[] HEADER = {"id", "date", QUESTION, "device"};

  private static Object[][] answers() {
    return new Object[][] {
      HEADER.clone(),
      {1001, LocalDateTime.of(2024, 3, 2, 0, 0), "The delivery fee for the grinder", "mobile"},
      {
        1002,
        LocalDateTime.of(2024, 3, 3, 0, 0),
        "Not sure the refurbished machine works",
        "desktop"
      },
      {1003, LocalDateTime.of(2024, 3, 4, 0, 0), "Nothing, the checkout was quick", "mobile"},
      {1004, LocalDateTime.of(2024, 3, 5, 0, 0), "The warranty page was hard to find", "tablet"},
    };
  }

  private static SurveyTable read(byte[] bytes) throws UnreadableInputException {
    return read(bytes, ImportSettings.defaults());
  }

  private static SurveyTable read(byte[] bytes, ImportSettings settings)
      throws UnreadableInputException {
    return SurveyReader.readBytes("shop.xlsx", bytes, settings);
  }

  private static String refusal(byte[] bytes, ImportSettings settings) {
    return assertThrows(UnreadableInputException.class, () -> read(bytes, settings)).getMessage();
  }

  private static List<List<String>> cells(SurveyTable t) {
    return t.rows().stream().map(r -> r.cells()).toList();
  }

  @Test
  void readsTheSameTableAsItsCsvTwin() throws Exception {
    SurveyTable book = read(Workbooks.of("Answers", answers()));
    SurveyTable csv =
        Csv.read(
            Csv.lines(
                "id,date," + QUESTION + ",device",
                "1001,2024-03-02,The delivery fee for the grinder,mobile",
                "1002,2024-03-03,Not sure the refurbished machine works,desktop",
                "1003,2024-03-04,\"Nothing, the checkout was quick\",mobile",
                "1004,2024-03-05,The warranty page was hard to find,tablet"));
    assertEquals(csv.columns(), book.columns());
    assertEquals(cells(csv), cells(book));
    assertEquals(
        csv.rows().stream().map(SurveyRow::number).toList(),
        book.rows().stream().map(SurveyRow::number).toList());
    assertEquals(csv.rows().get(0).line(), book.rows().get(0).line(), "sheet row 2 is line 2");
    assertEquals(
        List.of(ColumnRole.ID, ColumnRole.DATE, ColumnRole.TEXT, ColumnRole.META),
        book.columns().stream().map(Column::role).toList());
    assertEquals("shop.xlsx:Answers", book.source());
    assertEquals("Excel workbook (sheet 'Answers')", book.encoding());
    assertEquals(List.of(), book.problems());
  }

  @Test
  void blankRowsAndCellsCountAsInTheCsvTwin() throws Exception {
    Object[][] rows = {
      HEADER.clone(),
      {1001, LocalDateTime.of(2024, 3, 2, 0, 0), "The delivery fee", null},
      {},
      {1002, null, "Not sure it works", "desktop"},
      {},
      {},
    };
    SurveyTable book = read(Workbooks.of("Answers", rows));
    SurveyTable csv =
        Csv.read(
            Csv.lines(
                "id,date," + QUESTION + ",device",
                "1001,2024-03-02,The delivery fee,",
                ",,,",
                "1002,,Not sure it works,desktop",
                "",
                ""));
    assertEquals(cells(csv), cells(book));
    assertEquals(List.of(1, 3), book.rows().stream().map(SurveyRow::number).toList());
    assertEquals(List.of(2L, 4L), book.rows().stream().map(SurveyRow::line).toList());
    assertEquals(csv.skippedRows(), book.skippedRows());
  }

  @Test
  void cellValuesReadAsTheSheetShowsThem() throws Exception {
    XSSFWorkbook wb = new XSSFWorkbook();
    Sheet s =
        Workbooks.sheet(
            wb,
            "Answers",
            new Object[] {"id", "score", "paid", "total", "check", QUESTION},
            new Object[] {7, 0.1 + 0.2, true, null, null, null},
            new Object[] {8, 12345.5, false, null, null, "The grinder was louder than shown"});
    XSSFRichTextString rich = new XSSFRichTextString("Arrived late but well packed");
    XSSFFont bold = wb.createFont();
    bold.setBold(true);
    rich.applyFont(0, 12, bold);
    s.getRow(1).createCell(5).setCellValue(rich);
    Cell sum = s.getRow(1).createCell(3);
    sum.setCellFormula("A2*10");
    sum.setCellValue(70); // the cached value, as Excel stores it
    s.getRow(2).createCell(3).setCellFormula("1/0");
    s.getRow(2).getCell(3).setCellErrorValue(FormulaError.DIV0.getCode());
    s.getRow(1).createCell(4).setCellErrorValue(FormulaError.NA.getCode());
    SurveyTable t = read(Workbooks.bytes(wb));
    assertEquals(
        List.of("7", "0.3", "TRUE", "70", "#N/A", "Arrived late but well packed"),
        t.rows().get(0).cells());
    assertEquals(
        List.of("8", "12345.5", "FALSE", "#DIV/0!", "", "The grinder was louder than shown"),
        t.rows().get(1).cells());
  }

  /** Values from ECMA-376 Part 1, §18.17.4 (date systems). */
  @Test
  void serialDatesFollowEcma376() {
    assertEquals("1900-01-01", WorkbookReader.isoDate(1, false));
    assertEquals("1900-02-28", WorkbookReader.isoDate(59, false));
    // Serial 60 is the fictitious 29 February 1900, kept for compatibility with Lotus 1-2-3.
    assertEquals("1900-02-29", WorkbookReader.isoDate(60, false));
    assertEquals("1900-03-01", WorkbookReader.isoDate(61, false));
    assertEquals("2024-03-02", WorkbookReader.isoDate(45353, false));
    assertEquals("2024-03-02T14:30", WorkbookReader.isoDate(45353 + 14.5 / 24, false));
    assertEquals("1904-01-01", WorkbookReader.isoDate(0, true));
    assertEquals("1904-01-02", WorkbookReader.isoDate(1, true));
    assertEquals("2024-03-02", WorkbookReader.isoDate(45353 - 1462, true));
    assertNull(WorkbookReader.isoDate(-1, false));
  }

  @Test
  void datesAreWrittenInIsoForTheDateColumnAndWaveDating() throws Exception {
    Object[][] rows = answers();
    rows[1][1] = LocalDateTime.of(2024, 3, 2, 14, 5);
    SurveyTable t = read(Workbooks.of("Answers", rows));
    assertEquals("2024-03-02T14:05", t.rows().get(0).cells().get(1));
    assertEquals("2024-03-03", t.rows().get(1).cells().get(1));
    assertEquals(ColumnRole.DATE, t.columns().get(1).role());
  }

  @Test
  void aWorkbookInThe1904DateSystemDatesFrom1904() throws Exception {
    XSSFWorkbook wb = new XSSFWorkbook();
    wb.getCTWorkbook().addNewWorkbookPr().setDate1904(true);
    Workbooks.sheet(wb, "Answers", answers());
    Cell c = wb.getSheet("Answers").getRow(1).getCell(1);
    c.setCellValue(0); // serial 0 of the 1904 system
    assertEquals("1904-01-01", read(Workbooks.bytes(wb)).rows().get(0).cells().get(1));
  }

  @Test
  void readsTheFirstVisibleSheetWithDataAndNamesTheOthers() throws Exception {
    XSSFWorkbook wb = new XSSFWorkbook();
    wb.createSheet("Cover");
    Workbooks.sheet(wb, "Answers", answers());
    Workbooks.sheet(wb, "Notes", new Object[] {"Fielded by the shop team"}, new Object[] {"v2"});
    Workbooks.sheet(wb, "Old answers", answers());
    wb.setSheetHidden(3, true);
    SurveyTable t = read(Workbooks.bytes(wb));
    assertEquals("shop.xlsx:Answers", t.source());
    assertEquals(
        List.of(
            "shop.xlsx:Answers: sheet 'Notes' (2 rows) was not read; --sheet Notes reads it",
            "shop.xlsx:Answers: hidden sheet 'Old answers' (5 rows) was not read; --sheet 4"
                + " reads it"),
        t.problems().stream().map(InputProblem::toString).toList());
  }

  @Test
  void theSheetSettingPicksASheetByNameOrNumber() throws Exception {
    XSSFWorkbook wb = new XSSFWorkbook();
    Workbooks.sheet(wb, "Answers", answers());
    Workbooks.sheet(wb, "Wave 2", HEADER, new Object[] {9, null, "Second wave answer", "mobile"});
    byte[] bytes = Workbooks.bytes(wb);
    SurveyTable byName = read(bytes, ImportSettings.builder().sheet("wave 2").get());
    assertEquals("shop.xlsx:Wave 2", byName.source());
    assertEquals("Second wave answer", byName.rows().get(0).cells().get(2));
    SurveyTable byNumber = read(bytes, ImportSettings.builder().sheet("2").get());
    assertEquals(cells(byName), cells(byNumber));
    assertEquals(
        "shop.xlsx: the workbook has no sheet 'Notes'; its sheets are 1 'Answers', 2 'Wave 2':"
            + " give one of those names or numbers",
        refusal(bytes, ImportSettings.builder().sheet("Notes").get()));
  }

  @Test
  void hiddenRowsAndColumnsAreReadAndReportedOnce() throws Exception {
    XSSFWorkbook wb = new XSSFWorkbook();
    Sheet s = Workbooks.sheet(wb, "Answers", answers());
    s.getRow(2).setZeroHeight(true);
    s.getRow(4).setZeroHeight(true);
    s.setColumnHidden(3, true);
    SurveyTable t = read(Workbooks.bytes(wb));
    assertEquals(4, t.rows().size());
    assertEquals(
        List.of(
            "shop.xlsx:Answers: rows 3, 5 and column D are hidden in the sheet; they were read"
                + " like the others (delete them in the workbook if they should be left out)"),
        t.problems().stream().map(InputProblem::toString).toList());
  }

  @Test
  void aMergedHeaderLeavesNoColumnUnnamed() throws Exception {
    XSSFWorkbook wb = new XSSFWorkbook();
    Sheet s =
        Workbooks.sheet(
            wb,
            "Answers",
            new Object[] {"id", "Feedback", null, "device"},
            new Object[] {1, "The grinder is great", "Delivery was slow", "mobile"},
            new Object[] {2, "Coffee tastes burnt", "Support answered fast", "desktop"});
    s.addMergedRegion(new CellRangeAddress(0, 0, 1, 2));
    SurveyTable t = read(Workbooks.bytes(wb));
    assertEquals(
        List.of("id", "Feedback", "Column 3", "device"),
        t.columns().stream().map(Column::header).toList());
  }

  @Test
  void problemsNameTheFileTheSheetTheRowAndTheColumn() throws Exception {
    Object[][] rows = answers();
    rows[0][3] = "ID";
    SurveyTable t = read(Workbooks.of("Answers", rows));
    assertEquals(
        "shop.xlsx:Answers:1:4: the header 'ID' appears more than once; this column is called"
            + " 'ID (2)' (rename it in the file to tell the columns apart)",
        t.problems().get(0).toString());
    rows[0][2] = "Why";
    assertTrue(
        refusal(Workbooks.of("Answers", rows), ImportSettings.builder().textColumn("Reason").get())
            .startsWith("shop.xlsx:Answers:1: "));
  }

  @Test
  void tooManyColumnsGetsTheCsvRefusal() {
    Object[] header = new Object[12];
    Object[] row = new Object[12];
    for (int i = 0; i < 12; i++) {
      header[i] = "Question " + (i + 1);
      row[i] = "Answer " + (i + 1);
    }
    ImportSettings ten = ImportSettings.builder().maxColumns(10).get();
    String csv =
        assertThrows(
                UnreadableInputException.class,
                () ->
                    Csv.read(
                        Csv.lines(
                            String.join(",", Arrays.stream(header).map(String::valueOf).toList()),
                            String.join(",", Arrays.stream(row).map(String::valueOf).toList())),
                        ten))
            .getMessage();
    assertEquals(
        csv.replace("test.csv:", "shop.xlsx:Answers:"),
        refusal(Workbooks.of("Answers", header, row), ten));
  }

  @Test
  void aWorkbookOverTheSizeLimitIsRefusedBeforeReading() {
    byte[] bytes = Workbooks.of("Answers", answers());
    String m = refusal(bytes, ImportSettings.builder().maxBytes(1000).get());
    assertTrue(m.startsWith("shop.xlsx: file is ") && m.contains("over the limit"), m);
  }

  @Test
  void anOldXlsIsRefusedWithWhatToDo() throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try (HSSFWorkbook wb = new HSSFWorkbook()) {
      wb.createSheet("Answers").createRow(0).createCell(0).setCellValue("id");
      wb.write(out);
    }
    assertEquals(
        "shop.xlsx: this is an old Excel 97-2003 workbook (.xls), which cannot be read here;"
            + " open it in the spreadsheet program, save it as .xlsx or CSV and import that",
        refusal(out.toByteArray(), ImportSettings.defaults()));
  }

  @Test
  void anOpenDocumentSpreadsheetIsRefusedWithWhatToDo() throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try (ZipOutputStream zip = new ZipOutputStream(out)) {
      // OpenDocument 1.2 Part 3 §3.3: the mimetype entry comes first, stored uncompressed.
      byte[] type =
          "application/vnd.oasis.opendocument.spreadsheet".getBytes(StandardCharsets.US_ASCII);
      ZipEntry mimetype = new ZipEntry("mimetype");
      mimetype.setMethod(ZipEntry.STORED);
      mimetype.setSize(type.length);
      CRC32 crc = new CRC32();
      crc.update(type);
      mimetype.setCrc(crc.getValue());
      zip.putNextEntry(mimetype);
      zip.write(type);
      zip.putNextEntry(new ZipEntry("content.xml"));
      zip.write("<office:document-content/>".getBytes(StandardCharsets.US_ASCII));
    }
    assertEquals(
        "shop.xlsx: this is an OpenDocument spreadsheet (.ods), which cannot be read here; save"
            + " it as .xlsx or CSV and import that",
        refusal(out.toByteArray(), ImportSettings.defaults()));
  }

  @Test
  void aPasswordProtectedWorkbookIsRefusedWithWhatToDo() throws Exception {
    byte[] plain = Workbooks.of("Answers", answers());
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try (POIFSFileSystem fs = new POIFSFileSystem()) {
      Encryptor enc = new EncryptionInfo(EncryptionMode.standard).getEncryptor();
      enc.confirmPassword("espresso");
      try (OutputStream os = enc.getDataStream(fs)) {
        os.write(plain);
      }
      fs.writeFilesystem(out);
    }
    assertEquals(
        "shop.xlsx: the workbook is protected with a password (encrypted), so it cannot be read;"
            + " open it in the spreadsheet program, remove the password (or save a copy without"
            + " one) as .xlsx or CSV and import that",
        refusal(out.toByteArray(), ImportSettings.defaults()));
  }

  @Test
  void aTruncatedWorkbookIsRefusedWithWhatToDo() {
    byte[] whole = Workbooks.of("Answers", answers());
    for (int tenths = 1; tenths <= 8; tenths++) {
      String m =
          refusal(Arrays.copyOf(whole, whole.length * tenths / 10), ImportSettings.defaults());
      assertTrue(
          m.startsWith("shop.xlsx: the workbook cannot be opened: it is damaged or cut short"),
          tenths + "/10: " + m);
      assertTrue(
          m.endsWith("open it in the spreadsheet program, save it as .xlsx or CSV and import that"),
          m);
    }
  }

  @Test
  void aZipBombIsRefusedByPoisZipLimits() throws IOException {
    // A real workbook whose sheet part is padded with 40 MiB of spaces: valid, and a bomb.
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try (ZipInputStream in =
            new ZipInputStream(new ByteArrayInputStream(Workbooks.of("Answers", answers())));
        ZipOutputStream zip = new ZipOutputStream(out)) {
      for (ZipEntry e = in.getNextEntry(); e != null; e = in.getNextEntry()) {
        zip.putNextEntry(new ZipEntry(e.getName()));
        byte[] part = in.readAllBytes();
        if (!e.getName().equals("xl/worksheets/sheet1.xml")) {
          zip.write(part);
          continue;
        }
        String xml = new String(part, StandardCharsets.UTF_8);
        int at = xml.indexOf("<sheetData>");
        zip.write(xml.substring(0, at).getBytes(StandardCharsets.UTF_8));
        byte[] spaces = new byte[1 << 20];
        Arrays.fill(spaces, (byte) ' ');
        for (int i = 0; i < 40; i++) {
          zip.write(spaces);
        }
        zip.write(xml.substring(at).getBytes(StandardCharsets.UTF_8));
      }
    }
    assertTrue(out.size() < 200_000, "40 MiB packed into " + out.size() + " bytes");
    assertEquals(
        "shop.xlsx: the workbook unpacks to far more data than its size suggests, which is"
            + " refused as a possible zip bomb; open it in the spreadsheet program, save it as"
            + " .xlsx or CSV and import that",
        refusal(out.toByteArray(), ImportSettings.defaults()));
    Path file = dir.resolve("bomb.xlsx");
    Files.write(file, out.toByteArray());
    UnreadableInputException fromDisk =
        assertThrows(
            UnreadableInputException.class,
            () -> SurveyReader.readFile(file, ImportSettings.defaults()));
    assertEquals(
        "bomb.xlsx: the workbook unpacks to far more data than its size suggests, which is"
            + " refused as a possible zip bomb; open it in the spreadsheet program, save it as"
            + " .xlsx or CSV and import that",
        fromDisk.getMessage());
  }
}
