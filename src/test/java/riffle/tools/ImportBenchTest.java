package riffle.tools;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.tools.ImportBench.Measured;

/** The import bench's export generator and its reading of GNU time's report. */
class ImportBenchTest {

  @Test
  void answersAreSeededWithTenToFortyWordsAndNoSentenceTwiceAsTheStockDetectorSplitsThem()
      throws IOException {
    List<String> answers = ImportBench.answers(5_000, 42L);
    assertEquals(5_000, answers.size());
    assertEquals(answers, ImportBench.answers(5_000, 42L));
    assertNotEquals(answers, ImportBench.answers(5_000, 43L));
    AnalysisBench.Baseline stock = new AnalysisBench.Baseline();
    Set<String> sentences = new HashSet<>();
    long count = 0;
    for (String a : answers) {
      int words = a.split("\\s+").length;
      assertTrue(words >= 10 && words <= 40, words + " words: " + a);
      for (String s : stock.sentences.sentDetect(a)) {
        count++;
        assertTrue(sentences.add(s), "twice: " + s);
      }
    }
    assertTrue(count > answers.size(), "some answers have more than one sentence");
  }

  @Test
  void theExportHasAnIdAndOneOpenTextColumnAndReadsBackAsWritten(@TempDir Path dir)
      throws IOException {
    List<String> answers = ImportBench.answers(200, 7L);
    Path file = dir.resolve("answers.csv");
    ImportBench.writeExport(file, answers);
    CSVFormat csv = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get();
    try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
      List<CSVRecord> rows = csv.parse(in).getRecords();
      assertEquals(200, rows.size());
      assertEquals("B-000001", rows.get(0).get("response_id"));
      for (int i = 0; i < rows.size(); i++) {
        assertEquals(2, rows.get(i).size());
        assertEquals(answers.get(i), rows.get(i).get(ImportBench.QUESTION));
      }
    }
  }

  /**
   * A report in the layout GNU time 1.9 (Debian 12) prints for {@code /usr/bin/time -v} (lines
   * copied from its output on this machine, some left out; the figures are made up).
   */
  private static final String REPORT =
      """
      \tCommand being timed: "java -jar target/riffle.jar info --project p.riffle"
      \tUser time (seconds): 1.84
      \tSystem time (seconds): 0.21
      \tPercent of CPU this job got: 160%
      \tElapsed (wall clock) time (h:mm:ss or m:ss): %s
      \tAverage shared text size (kbytes): 0
      \tMaximum resident set size (kbytes): 187412
      \tAverage resident set size (kbytes): 0
      \tExit status: 0
      """;

  @Test
  void timeReportGivesWallCpuAndPeakResidentMemory() {
    Measured m = Measured.parse(REPORT.replace("%s", "0:01.28"));
    assertEquals(1.28, m.wallSeconds(), 1e-9);
    assertEquals(2.05, m.cpuSeconds(), 1e-9);
    assertEquals(187_412, m.peakKb());
    // Past an hour the label's other form, h:mm:ss.
    assertEquals(3_723, Measured.parse(REPORT.replace("%s", "1:02:03")).wallSeconds(), 1e-9);
    assertEquals(75.5, Measured.parse(REPORT.replace("%s", "1:15.50")).wallSeconds(), 1e-9);
  }

  @Test
  void medianOfAnEvenCountIsTheMeanOfTheMiddleTwo() {
    List<Measured> runs =
        List.of(new Measured(3, 0, 10), new Measured(1, 0, 30), new Measured(2, 0, 20));
    assertEquals(2, ImportBench.median(runs, Measured::wallSeconds));
    assertEquals(25, ImportBench.median(runs.subList(1, 3), Measured::peakKb));
  }
}
