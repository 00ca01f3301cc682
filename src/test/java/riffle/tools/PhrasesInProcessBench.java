package riffle.tools;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.app.PhraseQuery;
import riffle.app.Project;
import riffle.model.InputException;
import riffle.model.Progress;

/**
 * Bench command: phrases of one wave and question, as the page asks for them from a running server
 * — in one process, right after importing 100,000 answers (50,000 respondents by default): the
 * first request (cold) and the median and worst of the next ones, and keyness between two halves of
 * the wave by segment. Run with {@code mvn -q test-compile exec:java
 * -Dexec.mainClass=riffle.tools.PhrasesInProcessBench [-Dexec.args="RESPONDENTS RUNS"]}.
 */
public final class PhrasesInProcessBench {
  private PhrasesInProcessBench() {}

  public static void main(String[] args) throws IOException, InputException {
    int rows = args.length > 0 ? Integer.parseInt(args[0]) : 50_000;
    int runs = args.length > 1 ? Integer.parseInt(args[1]) : 7;
    Path dir = Files.createTempDirectory("riffle-phrases-bench");
    Path export = dir.resolve("large.csv");
    SampleResponses.writeLargeExport(export, rows, 42L);
    Path file = dir.resolve("bench.riffle");
    Project.importInto(
        file, ImportRequest.from(new ImportSource.File(export)).wave("Bench").get(), Progress.NONE);
    try (Project p = Project.openExisting(file)) {
      PhraseQuery one =
          new PhraseQuery(Optional.of("Bench"), Optional.of("1"), Map.of(), Optional.empty(), 50);
      long t = System.nanoTime();
      int answers = p.phrases(one).answers();
      double cold = (System.nanoTime() - t) / 1e6;
      List<Double> warm = new ArrayList<>();
      for (int i = 0; i < runs; i++) {
        t = System.nanoTime();
        p.phrases(one);
        warm.add((System.nanoTime() - t) / 1e6);
      }
      Collections.sort(warm);
      System.out.printf(
          Locale.ROOT,
          "phrases of one wave and question (%,d answers) after import: first %.0f ms, then median"
              + " %.0f ms, worst %.0f ms (%d runs)%n",
          answers,
          cold,
          warm.get(warm.size() / 2),
          warm.get(warm.size() - 1),
          runs);
    }
  }
}
