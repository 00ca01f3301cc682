package riffle.tools;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import riffle.app.ImportReport;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.app.Project;
import riffle.model.Progress;

/**
 * Bench command: imports a generated export (100,000 respondents by default, two open-text
 * questions, three segments) into a fresh project, several times, and prints the time spent
 * reading, analysing (masks, language, parse) and storing. Run with {@code mvn -q test-compile
 * exec:java -Dexec.mainClass=riffle.tools.ImportBench [-Dexec.args="ROWS RUNS"]}. Not a test:
 * timings belong in closing notes, not in assertions.
 */
public final class ImportBench {
  private ImportBench() {}

  public static void main(String[] args) throws IOException {
    int rows = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
    int runs = args.length > 1 ? Integer.parseInt(args[1]) : 5;
    Path dir = Files.createTempDirectory("riffle-bench");
    try {
      Path export = dir.resolve("large.csv");
      SampleResponses.writeLargeExport(export, rows, 42L);
      System.out.printf(
          Locale.ROOT,
          "export: %,d respondents, %.1f MB, %s cores, max heap %d MB%n",
          rows,
          Files.size(export) / 1e6,
          Runtime.getRuntime().availableProcessors(),
          Runtime.getRuntime().maxMemory() >> 20);
      Path warmup = dir.resolve("warmup.csv");
      SampleResponses.writeLargeExport(warmup, 20_000, 7L);
      once(dir.resolve("warmup.riffle"), warmup);
      List<double[]> results = new ArrayList<>();
      for (int run = 1; run <= runs; run++) {
        double[] t = once(dir.resolve("run" + run + ".riffle"), export);
        results.add(t);
        System.out.printf(
            Locale.ROOT,
            "run %d: read %.2f s, analyse %.2f s, store %.2f s, total %.2f s%n",
            run,
            t[0],
            t[1],
            t[2],
            t[0] + t[1] + t[2]);
      }
      results.sort(Comparator.comparingDouble(t -> t[0] + t[1] + t[2]));
      double[] median = results.get(results.size() / 2);
      System.out.printf(
          Locale.ROOT,
          "median of %d (%,d answers): read %.2f s, analyse %.2f s, store %.2f s, total %.2f s%n",
          runs,
          2 * rows,
          median[0],
          median[1],
          median[2],
          median[0] + median[1] + median[2]);
    } finally {
      try (Stream<Path> files = Files.walk(dir)) {
        for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
          Files.deleteIfExists(p);
        }
      }
    }
  }

  /** Imports {@code export} into a new project; returns seconds reading, analysing, storing. */
  private static double[] once(Path project, Path export) throws IOException {
    long[] analysingFrom = {0};
    long[] storingFrom = {0};
    Progress timing =
        (phase, done, total) -> {
          if (phase.equals("analysing") && analysingFrom[0] == 0) {
            analysingFrom[0] = System.nanoTime();
          }
          if (phase.equals("storing") && storingFrom[0] == 0) {
            storingFrom[0] = System.nanoTime();
          }
        };
    long start = System.nanoTime();
    ImportReport report =
        Project.importInto(
            project,
            ImportRequest.from(new ImportSource.File(export)).wave("Bench").actor("bench").get(),
            timing);
    long end = System.nanoTime();
    if (report.answers() != 2 * report.rows()) {
      throw new IllegalStateException("bench import lost answers: " + report);
    }
    return new double[] {
      (analysingFrom[0] - start) / 1e9,
      (storingFrom[0] - analysingFrom[0]) / 1e9,
      (end - storingFrom[0]) / 1e9
    };
  }
}
