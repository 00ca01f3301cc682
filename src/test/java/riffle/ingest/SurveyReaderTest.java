package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.ColumnRole;
import riffle.model.InputProblem;

class SurveyReaderTest {
  private static final String HEADER = "id,date,What almost stopped you from buying?,device";

  @TempDir Path dir;

  private static String answer(int i) {
    return "Answer " + i + " about the refurbished grinder and its warranty";
  }

  @Test
  void readsAFileNamedAfterItself() throws IOException {
    Path file = dir.resolve("wave-1.csv");
    Files.writeString(
        file, Csv.lines(HEADER, "R1,2024-03-02," + answer(1) + ",mobile"), StandardCharsets.UTF_8);
    SurveyTable t = SurveyReader.readFile(file, ImportSettings.builder().get());
    assertEquals("wave-1.csv", t.source());
    assertEquals(1, t.rows().size());
    assertEquals(answer(1), t.rows().get(0).cell(t.columnsWith(ColumnRole.TEXT).get(0)));
  }

  @Test
  void refusesAFileOverTheLimitBeforeReadingIt() throws IOException {
    Path file = dir.resolve("huge.csv");
    try (RandomAccessFile f = new RandomAccessFile(file.toFile(), "rw")) {
      f.setLength(3L * 1024 * 1024 * 1024); // sparse: reading it would take long and need 3 GB
    }
    long start = System.nanoTime();
    UnreadableInputException e =
        assertThrows(
            UnreadableInputException.class,
            () -> SurveyReader.readFile(file, ImportSettings.builder().get()));
    assertTrue(System.nanoTime() - start < 2_000_000_000L, "the size check must not read the file");
    assertEquals(
        "huge.csv: file is 3072 MB, over the limit of 100 MB; raise the max size to 3072 MiB or"
            + " split the export",
        e.getMessage());
    assertEquals(java.util.Optional.of("max size"), e.problem().setting());
  }

  @Test
  void namesSizeAndLimitInBytesForSmallLimits() {
    byte[] bytes = new byte[2500];
    UnreadableInputException e =
        assertThrows(
            UnreadableInputException.class,
            () ->
                SurveyReader.readBytes(
                    "x.csv", bytes, ImportSettings.builder().maxBytes(1000).get()));
    assertEquals(
        "x.csv: file is 2,500 bytes, over the limit of 1,000 bytes; raise the max size to 1 MiB or"
            + " split the export",
        e.getMessage());
  }

  @Test
  void reportsMissingFilesAndFolders() throws IOException {
    UnreadableInputException missing =
        assertThrows(
            UnreadableInputException.class,
            () -> SurveyReader.readFile(dir.resolve("nope.csv"), ImportSettings.builder().get()));
    assertTrue(missing.getMessage().startsWith("nope.csv: file not found"), missing.getMessage());
    Path folder = Files.createDirectory(dir.resolve("exports"));
    UnreadableInputException isDir =
        assertThrows(
            UnreadableInputException.class,
            () -> SurveyReader.readFile(folder, ImportSettings.builder().get()));
    assertTrue(isDir.getMessage().contains("is a folder"), isDir.getMessage());
  }

  @Test
  void messageIsTheProblemRendered() {
    UnreadableInputException e =
        assertThrows(UnreadableInputException.class, () -> Csv.read(HEADER + "\n"));
    assertEquals(new InputProblem("test.csv", 1, 0, "no answers below the header"), e.problem());
    assertEquals("test.csv:1: no answers below the header", e.getMessage());
  }

  @Test
  void lineEndingsLfCrLfAndCrGiveTheSameRowsAndLines() throws IOException {
    String lf =
        Csv.lines(
            HEADER,
            "R1,2024-03-02,\"" + answer(1) + "\nsecond line\",mobile",
            "R2,2024-03-03," + answer(2) + ",desktop");
    SurveyTable expected = Csv.read(lf);
    for (String eol : new String[] {"\r\n", "\r"}) {
      SurveyTable t = Csv.read(lf.replace("\n", eol));
      assertEquals(expected.rows().size(), t.rows().size());
      assertEquals(2, t.rows().get(0).line());
      assertEquals(4, t.rows().get(1).line());
      assertEquals(answer(1) + eol + "second line", t.rows().get(0).cells().get(2));
      assertEquals(expected.columns(), t.columns());
    }
  }

  @Test
  void keepsCellsVerbatimAndTrimsHeaders() throws IOException {
    SurveyTable t =
        Csv.read(
            Csv.lines(
                "  id  ,\"  What almost\nstopped you?  \",device ",
                "R1,  " + answer(1) + "  ,mobile",
                "R2,\"" + answer(2) + "\"\"quoted\"\"\",desktop"));
    assertEquals("id", t.columns().get(0).header());
    assertEquals("What almost stopped you?", t.columns().get(1).header());
    assertEquals("device", t.columns().get(2).header());
    assertEquals("  " + answer(1) + "  ", t.rows().get(0).cells().get(1));
    assertEquals(answer(2) + "\"quoted\"", t.rows().get(1).cells().get(1));
  }

  @Test
  void numbersRowsByTheirPlaceBelowTheHeaderAndLinesByWhereTheyStart() throws IOException {
    SurveyTable t =
        Csv.read(
            Csv.lines(
                HEADER,
                "R1,2024-03-02,\"" + answer(1) + "\nand\nmore\",mobile",
                "",
                "R2,2024-03-03," + answer(2) + ",desktop",
                "",
                ""));
    assertEquals(List.of(1, 3), t.rows().stream().map(SurveyRow::number).toList());
    assertEquals(List.of(2L, 6L), t.rows().stream().map(SurveyRow::line).toList());
    assertEquals(
        1, t.skippedRows(), "one blank row between answers; trailing blank lines are not rows");
    assertTrue(t.problems().isEmpty());
  }

  @Test
  void skipsLeadingBlankLinesBeforeTheHeader() throws IOException {
    SurveyTable t = Csv.read(Csv.lines("", "  ", HEADER, "R1,2024-03-02," + answer(1) + ",mobile"));
    assertEquals("id", t.columns().get(0).header());
    assertEquals(4, t.rows().get(0).line());
    assertEquals(1, t.rows().get(0).number());
  }

  @Test
  void skipsAndReportsRaggedRowsButAcceptsTrailingEmptyFields() throws IOException {
    SurveyTable t =
        Csv.read(
            Csv.lines(
                HEADER,
                "R1,2024-03-02," + answer(1) + ",mobile,,",
                "R2,2024-03-02,I was not sure about",
                "the warranty,mobile",
                "R3,2024-03-03," + answer(3) + ",desktop",
                "R4,2024-03-03," + answer(4) + ",desktop,tablet",
                "R5,2024-03-04," + answer(5) + ",mobile",
                "R6,2024-03-04," + answer(6) + ",mobile"));
    assertEquals(
        List.of("R1", "R3", "R5", "R6"), t.rows().stream().map(r -> r.cells().get(0)).toList());
    assertEquals(4, t.rows().get(0).cells().size());
    assertEquals(3, t.skippedRows());
    assertEquals(
        List.of(
            new InputProblem(
                "test.csv",
                3,
                0,
                "row has 3 fields, the header has 4; the row was skipped — usually a line break"
                    + " inside an answer that is not in quotes"),
            new InputProblem(
                "test.csv",
                4,
                0,
                "row has 2 fields, the header has 4; the row was skipped — usually a line break"
                    + " inside an answer that is not in quotes"),
            new InputProblem(
                "test.csv",
                6,
                0,
                "row has 5 fields, the header has 4; the row was skipped — usually a line break"
                    + " inside an answer that is not in quotes")),
        t.problems());
  }

  @Test
  void raggedRowSpanningLinesSaysWhichLinesItCovers() throws IOException {
    SurveyTable t =
        Csv.read(
            Csv.lines(
                HEADER,
                "R1,2024-03-02," + answer(1) + ",mobile",
                "R2,2024-03-02,\"" + answer(2) + "\nand more\",mobile,extra",
                "R3,2024-03-03," + answer(3) + ",desktop"));
    assertEquals(1, t.problems().size());
    InputProblem p = t.problems().get(0);
    assertEquals(3, p.line());
    assertTrue(p.message().startsWith("row has 5 fields, the header has 4;"), p.message());
    assertTrue(
        p.message().endsWith("(this row runs over lines 3–4, so a quote in it may be misplaced)"),
        p.message());
  }

  @Test
  void warnsWhenAQuotedAnswerMayHaveSwallowedTheNextRow() throws IOException {
    SurveyTable t =
        Csv.read(
            Csv.lines(
                HEADER,
                "R1,2024-03-02,\"" + answer(1) + "\",mobile",
                "R2,2024-03-02,\"" + answer(2) + ",mobile",
                "R3,2024-03-03,\"" + answer(3) + "\",desktop",
                "R4,2024-03-03," + answer(4) + ",desktop"));
    assertEquals(List.of("R1", "R2", "R4"), t.rows().stream().map(r -> r.cells().get(0)).toList());
    assertEquals(
        List.of(
            new InputProblem(
                "test.csv",
                3,
                3,
                "the quote that opens this answer closes on line 4 but more text follows it; if the"
                    + " answer took in the rows after it, put the quotes right in the file or"
                    + " re-export")),
        t.problems());
  }

  @Test
  void halfTheRowsRaggedIsStillReadableButMoreIsNot() throws IOException {
    String good = "R1,2024-03-02," + answer(1) + ",mobile";
    String bad = "R2,2024-03-02,short";
    assertEquals(1, Csv.read(Csv.lines(HEADER, good, bad)).rows().size());
    UnreadableInputException e =
        assertThrows(
            UnreadableInputException.class, () -> Csv.read(Csv.lines(HEADER, good, bad, bad)));
    assertEquals(
        "test.csv: 2 of 3 rows have a different number of fields than the header, which has 4 with"
            + " the delimiter comma (detected); the delimiter is probably wrong: set it (comma,"
            + " semicolon, tab or pipe)",
        e.getMessage());
  }

  @Test
  void listsAtMostMaxProblemsThenCountsTheRest() throws IOException {
    StringBuilder sb = new StringBuilder(HEADER).append('\n');
    for (int i = 1; i <= 30; i++) {
      sb.append("R").append(i).append(",2024-03-02,").append(answer(i)).append(",mobile\n");
      if (i % 3 == 0) {
        sb.append("ragged line ").append(i).append('\n');
      }
    }
    SurveyTable t = Csv.read(sb.toString(), ImportSettings.builder().maxProblems(4).get());
    assertEquals(30, t.rows().size());
    assertEquals(10, t.skippedRows());
    assertEquals(5, t.problems().size());
    assertEquals("6 more problems not listed", t.problems().get(4).message());
    assertEquals(0, t.problems().get(4).line());
    assertEquals(5, t.problems().get(0).line());
  }

  @Test
  void unclosedQuoteNamesLineAndFieldWhereItOpened() {
    String text =
        "id;date;What almost stopped you from buying?;device\r\n"
            + "R1;2024-03-02;\""
            + answer(1)
            + "\r\nover two lines\";mobile\r\n"
            + "R2;2024-03-03;"
            + answer(2)
            + ";desktop\r\n"
            + "R3;2024-03-03;\""
            + answer(3)
            + ";desktop\r\n"
            + "R4;2024-03-04;"
            + answer(4)
            + ";mobile\r\n";
    UnreadableInputException e = assertThrows(UnreadableInputException.class, () -> Csv.read(text));
    assertEquals(
        new InputProblem(
            "test.csv",
            5,
            3,
            "a quote opened here is never closed; check this answer in the file or re-export"),
        e.problem());
  }

  @Test
  void refusesEmptyHeaderOnlyAndBinaryInputs() {
    assertEquals(
        "x.csv: file is empty",
        assertThrows(
                UnreadableInputException.class,
                () -> SurveyReader.readBytes("x.csv", new byte[0], ImportSettings.builder().get()))
            .getMessage());
    assertEquals(
        "test.csv:1: no answers below the header",
        assertThrows(UnreadableInputException.class, () -> Csv.read(HEADER + "\r\n,,,\r\n\r\n"))
            .getMessage());
    byte[] binary = {'P', 'K', 3, 4, 0, 0, 8, 0, 1, 2, 3};
    assertTrue(
        assertThrows(
                UnreadableInputException.class,
                () ->
                    SurveyReader.readBytes("answers.xlsx", binary, ImportSettings.builder().get()))
            .getMessage()
            .startsWith(
                "answers.xlsx: looks like a binary file, not a CSV/TSV export; export the survey"
                    + " as CSV"));
  }

  @Test
  void refusesANamedColumnThatIsNotInTheHeaderListingTheHeaders() {
    ImportSettings s = ImportSettings.builder().textColumn("Q9").get();
    UnreadableInputException e =
        assertThrows(
            UnreadableInputException.class,
            () -> Csv.read(Csv.lines(HEADER, "R1,2024-03-02," + answer(1) + ",mobile"), s));
    assertEquals(1, e.problem().line());
    assertEquals(
        "no column named 'Q9' (the text column); the header has: 'id', 'date', 'What almost"
            + " stopped you from buying?', 'device'; check the name, or the delimiter if this list"
            + " looks wrong",
        e.problem().message());
    assertEquals(java.util.Optional.of("text column"), e.problem().setting());
  }

  @Test
  void explicitDelimiterOverridesSniffing() throws IOException {
    String text =
        Csv.lines(
            HEADER,
            "R1,2024-03-02," + answer(1) + ",mobile",
            "R2,2024-03-03," + answer(2) + ",desktop");
    SurveyTable sniffed = Csv.read(text);
    assertEquals(Delimiter.COMMA, sniffed.delimiter());
    assertTrue(sniffed.delimiterDetected());
    assertEquals(4, sniffed.columns().size());

    SurveyTable asked =
        Csv.read(text, ImportSettings.builder().delimiter(Delimiter.SEMICOLON).get());
    assertEquals(Delimiter.SEMICOLON, asked.delimiter());
    assertFalse(asked.delimiterDetected());
    assertEquals(List.of(HEADER), asked.columns().stream().map(Column::header).toList());
    assertEquals("R1,2024-03-02," + answer(1) + ",mobile", asked.rows().get(0).cells().get(0));
  }

  @Test
  void honoursExcelSepLine() throws IOException {
    SurveyTable t = Csv.read(Csv.lines("sep=|", "id|answer", "1|" + answer(1) + ", really"));
    assertEquals(Delimiter.PIPE, t.delimiter());
    assertEquals("id", t.columns().get(0).header());
    assertEquals(3, t.rows().get(0).line());
  }

  @Test
  void readsPastedCellsWithAQuotedMultiLineCell() throws IOException {
    String paste =
        "id\tWhat almost stopped you from buying?\tdevice\r\n"
            + "K1\t\"Two things:\r\nthe \"\"as new\"\" label, and the price\"\tmobile\r\n"
            + "K2\t"
            + answer(2)
            + "\tdesktop\r\n";
    SurveyTable t = SurveyReader.readPaste(paste, ImportSettings.builder().get());
    assertEquals("paste", t.source());
    assertEquals(Delimiter.TAB, t.delimiter());
    assertEquals(2, t.rows().size());
    assertEquals(
        "Two things:\r\nthe \"as new\" label, and the price", t.rows().get(0).cells().get(1));
    assertEquals(4, t.rows().get(1).line());
    assertEquals(ColumnRole.TEXT, t.columns().get(1).role());
  }

  @Test
  void sniffsPastedTextThatIsNotTabSeparated() throws IOException {
    SurveyTable t =
        SurveyReader.readPaste(
            "\uFEFFid;answer\n1;" + answer(1) + "\n2;" + answer(2), ImportSettings.builder().get());
    assertEquals(Delimiter.SEMICOLON, t.delimiter());
    assertEquals("id", t.columns().get(0).header());
  }

  @Test
  void refusesEmptyOrOversizedPaste() {
    UnreadableInputException empty =
        assertThrows(
            UnreadableInputException.class,
            () -> SurveyReader.readPaste(" \n ", ImportSettings.builder().get()));
    assertTrue(
        empty.getMessage().startsWith("paste: the pasted text is empty"), empty.getMessage());
    UnreadableInputException big =
        assertThrows(
            UnreadableInputException.class,
            () ->
                SurveyReader.readPaste(
                    "é".repeat(600), ImportSettings.builder().maxBytes(1000).get()));
    assertTrue(big.getMessage().startsWith("paste: pasted text is 1,200 bytes"), big.getMessage());
  }

  @Test
  void renamesBlankAndRepeatedHeaders() throws IOException {
    SurveyTable t =
        Csv.read(
            Csv.lines(
                "id,Answer,,answer,ANSWER",
                "1," + answer(1) + ",x," + answer(2) + "," + answer(3)));
    assertEquals(
        List.of("id", "Answer", "Column 3", "answer (2)", "ANSWER (3)"),
        t.columns().stream().map(Column::header).toList());
    assertEquals(List.of(4, 5), t.problems().stream().map(InputProblem::column).toList());
  }
}
