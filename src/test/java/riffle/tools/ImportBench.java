package riffle.tools;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

/**
 * Bench command: imports a generated export (100,000 respondents by default, two open-text
 * questions, three segments) with {@code riffle import}, each run in a fresh JVM into a fresh
 * project — as an analyst runs it, model loading and cold caches included — and prints the wall
 * time of each run and their median. Run with {@code mvn -q test-compile exec:java
 * -Dexec.mainClass=riffle.tools.ImportBench [-Dexec.args="RESPONDENTS RUNS"]} after {@code mvn -q
 * -DskipTests package}: each run is {@code java -jar target/riffle.jar import}.
 */
public final class ImportBench {
  static final Path JAR = Path.of("target", "riffle.jar");

  private ImportBench() {}

  public static void main(String[] args) throws IOException, InterruptedException {
    int rows = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
    int runs = args.length > 1 ? Integer.parseInt(args[1]) : 3;
    if (!Files.isRegularFile(JAR)) {
      throw new IllegalStateException("build the jar first: mvn -q -DskipTests package");
    }
    Path dir = Files.createTempDirectory("riffle-bench");
    try {
      Path export = dir.resolve("large.csv");
      SampleResponses.writeLargeExport(export, rows, 42L);
      System.out.printf(
          Locale.ROOT,
          "export: %,d respondents (%,d answers), %.1f MB, %d cores%n",
          rows,
          2 * rows,
          Files.size(export) / 1e6,
          Runtime.getRuntime().availableProcessors());
      List<Double> seconds = new ArrayList<>();
      for (int run = 1; run <= runs; run++) {
        Path project = dir.resolve("run" + run + ".riffle");
        Path log = dir.resolve("run" + run + ".log");
        Process p =
            new ProcessBuilder(
                    Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    "-jar",
                    JAR.toString(),
                    "import",
                    "--project",
                    project.toString(),
                    "--file",
                    export.toString(),
                    "--wave",
                    "Bench")
                .redirectErrorStream(true)
                .redirectOutput(log.toFile())
                .start();
        long start = System.nanoTime();
        int code = p.waitFor();
        double s = (System.nanoTime() - start) / 1e9;
        if (code != 0) {
          throw new IllegalStateException("import failed: " + Files.readString(log));
        }
        seconds.add(s);
        System.out.printf(Locale.ROOT, "run %d: %.2f s%n", run, s);
      }
      seconds.sort(Comparator.naturalOrder());
      System.out.printf(
          Locale.ROOT,
          "median of %d: %.2f s for %,d answers, read, analysed and stored%n",
          runs,
          seconds.get(seconds.size() / 2),
          2 * rows);
    } finally {
      try (Stream<Path> files = Files.walk(dir)) {
        for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
          Files.deleteIfExists(p);
        }
      }
    }
  }
}
