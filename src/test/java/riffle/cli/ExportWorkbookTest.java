package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.DataFormatter;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.report.WorkbookCells;

/** {@code riffle export --what coded --format xlsx} on a small invented wave, read back by POI. */
class ExportWorkbookTest {
  static final String QUESTION = "What almost stopped you from ordering?";
  static final String EMAIL = "jo.baker@example.com";
  static final String FORMULA = "=SUM(A1:A3)";

  @TempDir Path dir;
  String project;

  /** An invented wave of a small coffee-gear shop: codes given elsewhere, one e-mail, a formula. */
  static String wave(String extraAnswer) {
    List<String> lines = new ArrayList<>();
    lines.add("response_id,device,customer," + QUESTION + ",stopped codes");
    lines.add(
        "S-01,mobile,new,\"No delivery date anywhere, so I nearly left\",delivery date unclear");
    lines.add("S-02,desktop,returning,\"Write to me at " + EMAIL + " about the grinder\",");
    lines.add("S-03,mobile,new,\"" + FORMULA + "\",");
    lines.add(
        "S-04,tablet,new,\"Not sure a refurbished kettle would last a year\",warranty doubts");
    lines.add(
        "S-05,desktop,returning,\"The delivery fee was higher than the kettle\",delivery cost");
    lines.add(
        "S-06,mobile,returning,\"Shipping cost and no date for delivery\","
            + "delivery cost; delivery date unclear");
    lines.add("S-07,desktop,new,\"- nothing really, it was fine\",");
    lines.add("S-08,mobile,new,\"Warranty terms were hard to find\",warranty doubts");
    lines.add("S-09,tablet,returning,\"@ the checkout the coupon failed\",");
    lines.add("S-10,mobile,new,\"" + extraAnswer + "\",delivery cost");
    return String.join("\n", lines) + "\n";
  }

  @BeforeEach
  void importWave() throws IOException {
    Path file = dir.resolve("wave.csv");
    Files.writeString(file, wave("Price of delivery put me off at first"), StandardCharsets.UTF_8);
    project = dir.resolve("shop.riffle").toString();
    CliTest.ok("import", "--project", project, "--file", file.toString(), "--wave", "Wave 1");
  }

  private CliTest.Run export(String what, String format, Path out, String... more) {
    List<String> args =
        new ArrayList<>(
            List.of(
                "export",
                "--project",
                project,
                "--what",
                what,
                "--format",
                format,
                "--out",
                out.toString()));
    args.addAll(List.of(more));
    return CliTest.riffle(args.toArray(String[]::new));
  }

  private String csv(String what, String... more) throws IOException {
    Path out = dir.resolve(what + more.length + ".csv");
    CliTest.Run run = export(what, "csv", out, more);
    assertEquals(0, run.code(), run.err());
    return Files.readString(out, StandardCharsets.UTF_8);
  }

  private XSSFWorkbook workbook() throws IOException {
    Path out = dir.resolve("coded.xlsx");
    CliTest.Run run = export("coded", "xlsx", out);
    assertEquals(0, run.code(), run.err());
    assertTrue(run.out().contains("Wrote " + out), run.out());
    try (InputStream in = Files.newInputStream(out)) {
      return new XSSFWorkbook(in);
    }
  }

  @Test
  void theWorkbookHoldsTheCsvExportsCellForCell() throws Exception {
    try (XSSFWorkbook book = workbook()) {
      assertEquals(
          List.of("Coded answers", "Codes given", "Codebook", "Findings", "Changes"),
          List.of(
              book.getSheetName(0),
              book.getSheetName(1),
              book.getSheetName(2),
              book.getSheetName(3),
              book.getSheetName(4)));
      List<List<String>> wide = WorkbookCells.cells(book.getSheet("Coded answers"));
      assertEquals(WorkbookCells.csvCells(csv("coded")), wide);
      assertEquals(
          WorkbookCells.csvCells(csv("coded", "--long")),
          WorkbookCells.cells(book.getSheet("Codes given")));
      List<List<String>> codebook = WorkbookCells.csvCells(csv("codebook"));
      assertEquals(codebook, WorkbookCells.cells(book.getSheet("Codebook")));
      List<String> names = new ArrayList<>();
      WorkbookCells.cells(book.getSheet("Codebook")).forEach(r -> names.add(r.get(0)));
      assertTrue(
          names.containsAll(List.of("delivery date unclear", "warranty doubts", "delivery cost")),
          names.toString());
      assertEquals(11, wide.size(), "a header and ten answers");

      Sheet coded = book.getSheet("Coded answers");
      List<String> header = wide.get(0);
      assertTrue(coded.getPaneInformation().isFreezePane());
      assertEquals(1, coded.getPaneInformation().getHorizontalSplitPosition());
      Row first = coded.getRow(1);
      Cell flag = first.getCell(header.indexOf("delivery date unclear"));
      assertEquals(CellType.NUMERIC, flag.getCellType());
      assertEquals(1.0, flag.getNumericCellValue());
      assertEquals(
          CellType.NUMERIC, first.getCell(header.indexOf("warranty doubts")).getCellType());
      assertEquals(0.0, first.getCell(header.indexOf("warranty doubts")).getNumericCellValue());
    }
  }

  @Test
  void answersStayMaskedAndFormulaTextStaysText() throws Exception {
    try (XSSFWorkbook book = workbook()) {
      DataFormatter shown = new DataFormatter();
      for (Sheet sheet : book) {
        for (Row row : sheet) {
          for (Cell cell : row) {
            String value = shown.formatCellValue(cell);
            assertFalse(value.contains(EMAIL), sheet.getSheetName() + ": " + value);
          }
        }
      }
      Sheet coded = book.getSheet("Coded answers");
      int text = WorkbookCells.cells(coded).get(0).indexOf("text");
      List<String> texts = new ArrayList<>();
      for (int r = 1; r <= coded.getLastRowNum(); r++) {
        Cell cell = coded.getRow(r).getCell(text);
        assertEquals(CellType.STRING, cell.getCellType(), "row " + r);
        texts.add(cell.getStringCellValue());
      }
      assertTrue(texts.contains("Write to me at [email] about the grinder"), texts.toString());
      // Written as text, read back as text: no formula, no apostrophe put before it.
      assertTrue(texts.contains(FORMULA), texts.toString());
      assertTrue(texts.contains("@ the checkout the coupon failed"), texts.toString());
    }
  }

  @Test
  void formatsThatDoNotFitSayWhichDo() throws IOException {
    Path out = dir.resolve("x.xlsx");
    CliTest.Run quotes = export("quotes", "xlsx", out);
    assertEquals(2, quotes.code());
    assertTrue(
        quotes.err().contains("copy board is written as md, txt, csv or json"), quotes.err());
    CliTest.Run findings = export("findings", "xlsx", out);
    assertEquals(2, findings.code());
    assertTrue(findings.err().contains("--what coded --format xlsx"), findings.err());
    CliTest.Run coded = export("coded", "md", out);
    assertEquals(2, coded.code());
    assertTrue(coded.err().contains("written as csv or xlsx"), coded.err());
    CliTest.Run both = export("coded", "xlsx", out, "--long");
    assertEquals(2, both.code());
    assertTrue(both.err().contains("leave out --long"), both.err());
    assertFalse(Files.exists(out), "nothing written");
    Path folder = Files.createDirectories(dir.resolve("exports"));
    CliTest.Run intoFolder = export("coded", "xlsx", folder);
    assertEquals(2, intoFolder.code());
    assertTrue(intoFolder.err().contains("is a folder"), intoFolder.err());
    assertTrue(Files.isDirectory(folder), "the folder stays a folder");
  }

  @Test
  void aWorkbookThatCannotBeWrittenLeavesTheOldFileAndNoPartBehind() throws IOException {
    // A second wave with an answer longer than a workbook cell holds (32,767 characters).
    Path file = dir.resolve("wave2.csv");
    String huge = "the delivery date was never clear to me ".repeat(900).strip();
    Files.writeString(file, wave(huge).replace("S-", "T-"), StandardCharsets.UTF_8);
    CliTest.ok("import", "--project", project, "--file", file.toString(), "--wave", "Wave 2");
    Path out = dir.resolve("coded.xlsx");
    Files.writeString(out, "the previous export", StandardCharsets.UTF_8);
    CliTest.Run run = export("coded", "xlsx", out);
    assertEquals(2, run.code(), run.out() + run.err());
    assertTrue(run.err().contains("sheet \"Coded answers\", row "), run.err());
    assertTrue(run.err().contains("column text"), run.err());
    assertTrue(run.err().contains("export as csv instead"), run.err());
    assertFalse(run.err().contains("\tat "), "no stack trace");
    assertEquals("the previous export", Files.readString(out, StandardCharsets.UTF_8));
    try (Stream<Path> files = Files.list(dir)) {
      assertEquals(
          List.of(), files.filter(f -> f.getFileName().toString().endsWith(".part")).toList());
    }
  }

  /** LibreOffice, where installed, reads the workbook back as the same rows as the CSV. */
  @Test
  void libreOfficeReadsTheCodedSheetAsTheCsv() throws Exception {
    Path soffice = onPath("soffice");
    Assumptions.assumeTrue(soffice != null, "soffice is not installed");
    try (XSSFWorkbook book = workbook()) {
      assertEquals("Coded answers", book.getSheetName(0));
    }
    Path converted = Files.createDirectories(dir.resolve("converted"));
    Process p =
        new ProcessBuilder(
                soffice.toString(),
                "--headless",
                "-env:UserInstallation=file://" + dir.resolve("lo-profile").toAbsolutePath(),
                "--convert-to",
                "csv:Text - txt - csv (StarCalc):44,34,76",
                "--outdir",
                converted.toString(),
                dir.resolve("coded.xlsx").toString())
            .redirectErrorStream(true)
            .start();
    assertTrue(p.waitFor(120, TimeUnit.SECONDS), "soffice finished");
    String csv = Files.readString(converted.resolve("coded.csv"), StandardCharsets.UTF_8);
    assertEquals(WorkbookCells.csvCells(csv("coded")).size(), WorkbookCells.csvCells(csv).size());
    assertTrue(csv.contains(FORMULA), "the formula text arrives as text");
  }

  private static Path onPath(String name) {
    for (String d : System.getenv().getOrDefault("PATH", "").split(java.io.File.pathSeparator)) {
      Path p = Path.of(d, name);
      if (Files.isExecutable(p)) {
        return p;
      }
    }
    return null;
  }
}
