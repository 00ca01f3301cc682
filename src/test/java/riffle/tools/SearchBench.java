package riffle.tools;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.stream.Stream;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.app.Project;
import riffle.model.Progress;

/**
 * Bench command: imports a generated export (50,000 respondents, 100,000 answers by default), then
 * times building the search index and a seeded mix of analyst queries (p50, p95, max). Run with
 * {@code mvn -q test-compile exec:java -Dexec.mainClass=riffle.tools.SearchBench
 * [-Dexec.args="RESPONDENTS QUERIES"]}.
 */
public final class SearchBench {
  private SearchBench() {}

  static final String[] QUERIES = {
    "delivery",
    "\"delivery date\"",
    "\"delivery date\" AND wave:\"wave 3\"",
    "warranty NOT pump",
    "\"not sure\"~2 fit",
    "price OR cost OR expensive",
    "refurb* AND device:mobile",
    "question:2 AND (review* OR recommend*)",
    "is:uncoded AND shipping",
    "(warranty OR guarantee) AND customer:new",
  };

  public static void main(String[] args) throws IOException {
    int rows = args.length > 0 ? Integer.parseInt(args[0]) : 50_000;
    int queries = args.length > 1 ? Integer.parseInt(args[1]) : 500;
    Path dir = Files.createTempDirectory("riffle-search-bench");
    Path export = dir.resolve("large.csv");
    SampleResponses.writeLargeExport(export, rows, 42L);
    Path file = dir.resolve("bench.riffle");
    long t0 = System.nanoTime();
    Project.importInto(
        file, ImportRequest.from(new ImportSource.File(export)).wave("Bench").get(), Progress.NONE);
    long t1 = System.nanoTime();
    try (Project p = Project.openExisting(file)) {
      p.search("delivery", 20);
      long t2 = System.nanoTime();
      System.out.printf(
          Locale.ROOT,
          "%,d answers: import %.1f s, first search (builds the index) %.2f s%n",
          2 * rows,
          (t1 - t0) / 1e9,
          (t2 - t1) / 1e9);
      Random random = new Random(5);
      List<Double> ms = new ArrayList<>();
      for (int i = 0; i < queries; i++) {
        String q = QUERIES[random.nextInt(QUERIES.length)];
        long s = System.nanoTime();
        p.search(q, 20);
        ms.add((System.nanoTime() - s) / 1e6);
      }
      Collections.sort(ms);
      System.out.printf(
          Locale.ROOT,
          "%d searches (20 hits, counts per wave, highlights): p50 %.1f ms, p95 %.1f ms, max %.1f"
              + " ms%n",
          queries,
          ms.get(ms.size() / 2),
          ms.get((int) (ms.size() * 0.95)),
          ms.get(ms.size() - 1));
    } finally {
      try (Stream<Path> files = Files.walk(dir)) {
        for (Path f : files.sorted(Comparator.reverseOrder()).toList()) {
          Files.deleteIfExists(f);
        }
      }
    }
  }
}
