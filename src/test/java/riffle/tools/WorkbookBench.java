package riffle.tools;

import java.io.IOException;
import java.io.OutputStream;
import java.io.Writer;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import riffle.ingest.ImportSettings;
import riffle.ingest.SurveyReader;
import riffle.ingest.SurveyTable;

/**
 * Bench command: reading a sheet of ROWS (default 100,000) rows against the same data as CSV. It
 * writes a seeded workbook (an id, a date cell, two open-text columns of about 20 words, text in
 * the shared strings table as spreadsheet programs write it) and its CSV twin to a temporary
 * folder, then alternates RUNS (default 3) reads of each, every one in a fresh JVM through GNU time
 * ({@code /usr/bin/time -v}): the child reads the file with {@link SurveyReader#readFile} and
 * prints its wall time and the peak of the heap pools; the parent adds the peak resident memory and
 * prints the medians and the ratio of workbook to CSV.
 *
 * <p>Run from the repository's top folder with {@code mvn -q -o -DskipTests package && mvn -q -o
 * test-compile exec:java -Dexec.mainClass=riffle.tools.WorkbookBench -Dexec.args="ROWS RUNS"}. The
 * folder is kept (its path is printed) so that {@code target/riffle import} can be timed on the
 * same two files.
 */
public final class WorkbookBench {
  private static final String[] WORDS =
      ("the grinder arrived late but well packed and the espresso machine works fine though"
              + " delivery fee was high warranty page hard to find checkout quick support answered"
              + " fast refurbished parts looked new price fair steam wand leaks a little tamper"
              + " missing box dented coffee tastes burnt descaling guide helpful courier lost it")
          .split(" ");

  private WorkbookBench() {}

  public static void main(String[] args) throws Exception {
    if (args.length == 2 && args[0].equals("read")) {
      read(Path.of(args[1]));
      return;
    }
    int rows = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
    int runs = args.length > 1 ? Integer.parseInt(args[1]) : 3;
    Path dir = Files.createTempDirectory("riffle-workbook-bench-");
    Path xlsx = dir.resolve("wave.xlsx");
    Path csv = dir.resolve("wave.csv");
    write(rows, xlsx, csv);
    System.out.printf(
        Locale.ROOT,
        "%s: %,d bytes; %s: %,d bytes%n",
        xlsx,
        Files.size(xlsx),
        csv,
        Files.size(csv));
    List<double[]> book = new ArrayList<>();
    List<double[]> text = new ArrayList<>();
    for (int r = 0; r < runs; r++) {
      text.add(child(csv));
      book.add(child(xlsx));
    }
    double[] c = median(text);
    double[] b = median(book);
    System.out.printf(
        Locale.ROOT,
        "median of %d: CSV %.2f s, peak heap %.0f MB, max RSS %.0f MB;"
            + " workbook %.2f s, peak heap %.0f MB, max RSS %.0f MB; workbook/CSV wall %.2fx%n",
        runs,
        c[0],
        c[1],
        c[2],
        b[0],
        b[1],
        b[2],
        b[0] / c[0]);
  }

  /** In the child JVM: reads the file and prints seconds and peak heap MB. */
  private static void read(Path file) throws Exception {
    long start = System.nanoTime();
    SurveyTable t = SurveyReader.readFile(file, ImportSettings.defaults());
    double seconds = (System.nanoTime() - start) / 1e9;
    long peak = 0;
    for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
      if (pool.getType() == MemoryType.HEAP) {
        peak += pool.getPeakUsage().getUsed();
      }
    }
    System.out.printf(
        Locale.ROOT, "RESULT %.3f %.1f %d%n", seconds, peak / 1048576.0, t.rows().size());
  }

  private static double[] child(Path file) throws IOException, InterruptedException {
    String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
    String cp = "target/riffle.jar:target/test-classes";
    Process p =
        new ProcessBuilder(
                "/usr/bin/time",
                "-v",
                java,
                "-cp",
                cp,
                WorkbookBench.class.getName(),
                "read",
                file.toString())
            .redirectErrorStream(true)
            .start();
    String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    p.waitFor();
    double seconds = 0;
    double heap = 0;
    double rss = 0;
    for (String line : out.split("\n")) {
      if (line.startsWith("RESULT ")) {
        String[] f = line.split(" ");
        seconds = Double.parseDouble(f[1]);
        heap = Double.parseDouble(f[2]);
      } else if (line.contains("Maximum resident set size")) {
        rss = Long.parseLong(line.substring(line.lastIndexOf(':') + 1).strip()) / 1024.0;
      } else if (line.contains("StatusLogger") || line.contains("Exception")) {
        System.out.println("  child said: " + line);
      }
    }
    System.out.printf(
        Locale.ROOT,
        "  %s: %.2f s, peak heap %.0f MB, max RSS %.0f MB%n",
        file.getFileName(),
        seconds,
        heap,
        rss);
    return new double[] {seconds, heap, rss};
  }

  private static double[] median(List<double[]> runs) {
    double[] m = new double[3];
    for (int i = 0; i < 3; i++) {
      final int k = i;
      double[] v = runs.stream().mapToDouble(r -> r[k]).sorted().toArray();
      m[i] = v[v.length / 2];
    }
    return m;
  }

  private static String words(Random random) {
    StringBuilder sb = new StringBuilder();
    int n = 16 + random.nextInt(9);
    for (int i = 0; i < n; i++) {
      sb.append(i == 0 ? "" : " ").append(WORDS[random.nextInt(WORDS.length)]);
    }
    return sb.toString();
  }

  private static void write(int rows, Path xlsx, Path csv) throws IOException {
    Random random = new Random(42);
    LocalDate first = LocalDate.of(2024, 3, 1);
    try (SXSSFWorkbook wb = new SXSSFWorkbook(null, 200, false, true);
        Writer w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8);
        CSVPrinter out = new CSVPrinter(w, CSVFormat.DEFAULT);
        OutputStream file = Files.newOutputStream(xlsx)) {
      Sheet sheet = wb.createSheet("Answers");
      CellStyle date = wb.createCellStyle();
      date.setDataFormat(wb.createDataFormat().getFormat("yyyy-mm-dd"));
      String[] header = {
        "id", "date", "What almost stopped you from ordering?", "What made you choose us?"
      };
      Row h = sheet.createRow(0);
      for (int c = 0; c < header.length; c++) {
        h.createCell(c).setCellValue(header[c]);
      }
      out.printRecord((Object[]) header);
      for (int r = 1; r <= rows; r++) {
        LocalDate d = first.plusDays(r % 30);
        String a = words(random);
        String b = words(random);
        Row row = sheet.createRow(r);
        row.createCell(0).setCellValue(r);
        row.createCell(1).setCellValue(d);
        row.getCell(1).setCellStyle(date);
        row.createCell(2).setCellValue(a);
        row.createCell(3).setCellValue(b);
        out.printRecord(r, d, a, b);
      }
      wb.write(file);
    }
  }
}
