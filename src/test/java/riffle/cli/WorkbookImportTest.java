package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.util.Map;
import java.util.TreeMap;
import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.ingest.Workbooks;

/**
 * Excel workbooks through the real command line: a sheet imported as its CSV twin is, {@code
 * --sheet}, and workbooks that cannot be read refused with exit 2, a message and no stack trace.
 */
class WorkbookImportTest {
  private static final String QUESTION = "What almost stopped you from ordering?";

  @TempDir Path dir;

  private static final Object[][] ROWS = {
    {"respondent", "submitted", QUESTION, "device"},
    {"B1", LocalDateTime.of(2024, 5, 6, 0, 0), "The delivery fee for the grinder", "mobile"},
    {"B2", LocalDateTime.of(2024, 5, 7, 0, 0), "Not sure a refurbished machine lasts", "desktop"},
    {"B3", LocalDateTime.of(2024, 5, 8, 0, 0), "Nothing, the checkout was quick", "mobile"},
    {"B4", LocalDateTime.of(2024, 5, 9, 0, 0), "The warranty page was hard to find", "tablet"},
  };

  private Path workbook() throws Exception {
    XSSFWorkbook wb = new XSSFWorkbook();
    Workbooks.sheet(wb, "Answers", ROWS);
    Workbooks.sheet(wb, "Notes", new Object[] {"Fielded by the shop team"});
    Path file = dir.resolve("wave.xlsx");
    Files.write(file, Workbooks.bytes(wb));
    return file;
  }

  private Map<String, String> answers(String project) throws Exception {
    JsonNode hits =
        CliTest.riffle("search", "--project", project, "--query", "wave:W", "--json").json();
    Map<String, String> texts = new TreeMap<>();
    for (JsonNode h : hits.get("hits")) {
      texts.put(h.get("respondent").asText(), h.get("text").asText());
    }
    return texts;
  }

  @Test
  void aSheetImportsTheSameAnswersAsItsCsvTwin() throws Exception {
    String fromBook = dir.resolve("book.riffle").toString();
    CliTest.Run run =
        CliTest.riffle(
            "import", "--project", fromBook, "--file", workbook().toString(), "--wave", "W");
    assertEquals(0, run.code(), run.err());
    assertTrue(run.out().contains("read from the Excel workbook (sheet 'Answers')"), run.out());
    assertTrue(
        run.out().contains("(fielded 2024-05-09: the latest date in column"),
        "dated by its answers: " + run.out());
    assertTrue(
        run.out()
            .contains(
                "wave.xlsx:Answers: sheet 'Notes' (1 row) was not read; --sheet Notes reads it"),
        run.out());
    assertFalse(run.err().contains("StatusLogger"), run.err());

    Path csv = dir.resolve("wave.csv");
    Files.writeString(
        csv,
        "respondent,submitted,"
            + QUESTION
            + ",device\n"
            + "B1,2024-05-06,The delivery fee for the grinder,mobile\n"
            + "B2,2024-05-07,Not sure a refurbished machine lasts,desktop\n"
            + "B3,2024-05-08,\"Nothing, the checkout was quick\",mobile\n"
            + "B4,2024-05-09,The warranty page was hard to find,tablet\n",
        StandardCharsets.UTF_8);
    String fromCsv = dir.resolve("csv.riffle").toString();
    CliTest.ok("import", "--project", fromCsv, "--file", csv.toString(), "--wave", "W");
    assertEquals(4, answers(fromBook).size());
    assertEquals(answers(fromCsv), answers(fromBook));
  }

  @Test
  void theSheetOptionReadsAnotherSheetOrSaysWhichThereAre() throws Exception {
    String project = dir.resolve("shop.riffle").toString();
    Path file = workbook();
    CliTest.Run none =
        CliTest.riffle("import", "--project", project, "--file", file.toString(), "--sheet", "9");
    assertEquals(2, none.code(), none.err());
    assertEquals(
        "riffle: wave.xlsx: the workbook has no sheet '9'; its sheets are 1 'Answers', 2 'Notes':"
            + " give one of those names or numbers (--sheet)\n",
        none.err());
    CliTest.Run notes =
        CliTest.riffle(
            "import", "--project", project, "--file", file.toString(), "--sheet", "Notes");
    assertEquals(2, notes.code(), notes.err());
    assertTrue(notes.err().startsWith("riffle: wave.xlsx:Notes:1: no answers below the header"));
  }

  @Test
  void anOldXlsExitsTwoWithWhatToDoAndNoStackTrace() throws Exception {
    Path xls = dir.resolve("wave.xls");
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try (HSSFWorkbook wb = new HSSFWorkbook()) {
      wb.createSheet("Answers").createRow(0).createCell(0).setCellValue("respondent");
      wb.write(out);
    }
    Files.write(xls, out.toByteArray());
    String project = dir.resolve("shop.riffle").toString();
    CliTest.Run run =
        CliTest.riffle("import", "--project", project, "--file", xls.toString(), "--json");
    assertEquals(2, run.code(), run.err());
    assertEquals(
        "riffle: wave.xls: this is an old Excel 97-2003 workbook (.xls), which cannot be read here;"
            + " open it in the spreadsheet program, save it as .xlsx or CSV and import that\n",
        run.err());
    assertEquals("wave.xls", run.json().get("error").get("file").asText());
    assertFalse(Files.exists(Path.of(project)), "no project was created");
  }

  @Test
  void aDamagedWorkbookExitsTwoWithWhatToDo() throws Exception {
    byte[] whole = Files.readAllBytes(workbook());
    Path cut = dir.resolve("cut.xlsx");
    Files.write(cut, java.util.Arrays.copyOf(whole, whole.length / 3));
    CliTest.Run run =
        CliTest.riffle(
            "import", "--project", dir.resolve("shop.riffle").toString(), "--file", cut.toString());
    assertEquals(2, run.code(), run.err());
    assertTrue(
        run.err().startsWith("riffle: cut.xlsx: the workbook cannot be opened: it is damaged"),
        run.err());
    assertFalse(run.err().contains("\tat "), run.err());
  }

  @Test
  void aSeparateProcessPrintsOnlyRifflesOwnLinesOnStderr() throws Exception {
    byte[] whole = Files.readAllBytes(workbook());
    Path cut = dir.resolve("cut.xlsx");
    Files.write(cut, java.util.Arrays.copyOf(whole, whole.length / 3));
    ChildRiffle child = ChildRiffle.fromClassPath(dir.resolve("home"));
    String project = dir.resolve("shop.riffle").toString();
    CliTest.Run bad = child.run("import", "--project", project, "--file", cut.toString());
    assertEquals(2, bad.code(), bad.err());
    assertEquals(1, bad.err().lines().count(), "POI's own warnings stay off stderr: " + bad.err());
    CliTest.Run good =
        child.run("import", "--project", project, "--file", workbook().toString(), "--wave", "W");
    assertEquals(0, good.code(), good.err());
    assertFalse(good.err().contains("StatusLogger"), good.err());
    assertFalse(good.err().contains("WARN"), good.err());
  }
}
