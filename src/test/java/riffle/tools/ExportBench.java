package riffle.tools;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * Bench command: the coded-answers export as CSV against the Excel workbook, each run as an analyst
 * would run it (a fresh JVM through the launcher), on one imported project.
 *
 * <p>It writes a seeded export of ANSWERS (default 20,000) unique invented answers ({@link
 * ImportBench#answers}), each with a device and zero to three of {@link #CODES} given elsewhere (a
 * codes column, so every answer is read and the code columns hold 0 and 1), imports it with {@code
 * target/riffle import}, then alternates RUNS times (default 3) {@code riffle export --what coded
 * --format csv} and {@code --format xlsx} into fresh files. Each run goes through GNU time for wall
 * time and peak resident memory; the bench prints each run and a markdown table of the medians with
 * the output sizes.
 *
 * <p>Run from the repository's top folder with {@code mvn -q -o -DskipTests package && mvn -q -o
 * test-compile exec:java -Dexec.mainClass=riffle.tools.ExportBench -Dexec.args="ANSWERS RUNS"}.
 */
public final class ExportBench {
  /** The codes given elsewhere, chosen at random per answer. */
  static final List<String> CODES =
      List.of(
          "fair price",
          "fast delivery",
          "good advice",
          "warranty",
          "refurbished quality",
          "easy returns",
          "friendly support",
          "clear product pages",
          "payment options",
          "packaging",
          "recommended by a friend",
          "came back");

  private ExportBench() {}

  public static void main(String[] args) throws IOException, InterruptedException {
    int answers = args.length > 0 ? Integer.parseInt(args[0]) : 20_000;
    int runs = args.length > 1 ? Integer.parseInt(args[1]) : 3;
    if (!Files.isExecutable(ImportBench.LAUNCHER) || !Files.isExecutable(ImportBench.TIME)) {
      throw new IllegalStateException(
          "build first (mvn -q -o -DskipTests package); GNU time is needed at " + ImportBench.TIME);
    }
    Path dir = Files.createTempDirectory("riffle-export-bench");
    try {
      Path export = dir.resolve("answers.csv");
      write(export, ImportBench.answers(answers, 42L), new Random(7L));
      Path project = dir.resolve("bench.riffle");
      String launcher = ImportBench.LAUNCHER.toString();
      ImportBench.Measured imported =
          ImportBench.measure(
              dir.resolve("import.log"),
              launcher,
              "import",
              "--project",
              project.toString(),
              "--file",
              export.toString());
      System.out.printf(
          Locale.ROOT,
          "%,d answers imported (%s); %s %s, nproc %s%n",
          answers,
          imported,
          System.getProperty("java.vm.name"),
          System.getProperty("java.runtime.version"),
          ImportBench.nproc());
      List<String> formats = List.of("csv", "xlsx");
      List<List<ImportBench.Measured>> times = List.of(new ArrayList<>(), new ArrayList<>());
      long[] sizes = new long[formats.size()];
      for (int run = 1; run <= runs; run++) {
        for (int f = 0; f < formats.size(); f++) {
          Path out = dir.resolve("coded-" + run + "." + formats.get(f));
          ImportBench.Measured m =
              ImportBench.measure(
                  dir.resolve("export.log"),
                  launcher,
                  "export",
                  "--project",
                  project.toString(),
                  "--what",
                  "coded",
                  "--format",
                  formats.get(f),
                  "--out",
                  out.toString());
          times.get(f).add(m);
          sizes[f] = Files.size(out);
          System.out.printf(Locale.ROOT, "run %d %s: %s%n", run, formats.get(f), m);
        }
      }
      StringBuilder table =
          new StringBuilder(
              String.format(
                  Locale.ROOT,
                  "%nMedians of %d runs, fresh JVMs, %,d answers:%n%n"
                      + "| format | wall | CPU | peak RSS | file |%n|---|---|---|---|---|%n",
                  runs,
                  answers));
      for (int f = 0; f < formats.size(); f++) {
        List<ImportBench.Measured> m = times.get(f);
        table.append(
            String.format(
                Locale.ROOT,
                "| %s | %.2f s | %.2f s | %s | %.1f MB |%n",
                formats.get(f),
                ImportBench.median(m, ImportBench.Measured::wallSeconds),
                ImportBench.median(m, ImportBench.Measured::cpuSeconds),
                ImportBench.mib(ImportBench.median(m, ImportBench.Measured::peakKb)),
                sizes[f] / 1e6));
      }
      System.out.print(table);
    } finally {
      try (Stream<Path> files = Files.walk(dir)) {
        for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
          Files.deleteIfExists(p);
        }
      }
    }
  }

  /** The answers as CSV: id, device, the answer and its codes ("; " between them). */
  private static void write(Path out, List<String> answers, Random random) throws IOException {
    List<String> devices = List.of("mobile", "desktop", "tablet");
    try (Writer w = Files.newBufferedWriter(out, StandardCharsets.UTF_8);
        CSVPrinter csv = new CSVPrinter(w, CSVFormat.DEFAULT)) {
      csv.printRecord("response_id", "device", ImportBench.QUESTION, "chose codes");
      for (int i = 0; i < answers.size(); i++) {
        List<String> codes = new ArrayList<>();
        for (int k = random.nextInt(4); k > 0; k--) {
          String c = CODES.get(random.nextInt(CODES.size()));
          if (!codes.contains(c)) {
            codes.add(c);
          }
        }
        csv.printRecord(
            String.format(Locale.ROOT, "B-%06d", i + 1),
            devices.get(random.nextInt(devices.size())),
            answers.get(i),
            String.join("; ", codes));
      }
    }
  }
}
