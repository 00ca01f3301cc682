package riffle.tools;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Random;
import riffle.app.Coding;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.app.Project;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.InputException;
import riffle.model.Progress;

/**
 * Bench command: in a project of 50,000 respondents (100,000 answers by default), times the round
 * trip of single assignments — from the call to the committed edit with its undo steps and audit
 * row — for a seeded mix of giving and taking off codes (p50, p95, max), then one search after a
 * burst of coding (the index catches up with the touched answers only). Run with {@code mvn -q
 * test-compile exec:java -Dexec.mainClass=riffle.tools.CodingBench [-Dexec.args="RESPONDENTS
 * CHANGES"]}.
 */
public final class CodingBench {
  private CodingBench() {}

  public static void main(String[] args) throws IOException, InputException {
    int rows = args.length > 0 ? Integer.parseInt(args[0]) : 50_000;
    int changes = args.length > 1 ? Integer.parseInt(args[1]) : 2_000;
    Path dir = Files.createTempDirectory("riffle-coding-bench");
    Path export = dir.resolve("large.csv");
    SampleResponses.writeLargeExport(export, rows, 42L);
    Path file = dir.resolve("bench.riffle");
    Project.importInto(
        file, ImportRequest.from(new ImportSource.File(export)).wave("Bench").get(), Progress.NONE);
    try (Project p = Project.openExisting(file)) {
      Coding coding = p.coding();
      List<Code> codes = new ArrayList<>();
      for (int i = 0; i < 40; i++) {
        codes.add(p.codebook().create("bench", CodeDraft.named("Theme " + i)));
      }
      List<Long> answers = p.answerIds();
      p.search("delivery", 10);
      Random random = new Random(7);
      for (int i = 0; i < 200; i++) {
        step(coding, random, answers, codes);
      }
      long[] took = new long[changes];
      for (int i = 0; i < changes; i++) {
        long t = System.nanoTime();
        step(coding, random, answers, codes);
        took[i] = System.nanoTime() - t;
      }
      long t = System.nanoTime();
      int found = p.search("code:\"theme 3\"", 10).total();
      long catchUp = System.nanoTime() - t;
      List<Long> sorted = new ArrayList<>();
      for (long x : took) {
        sorted.add(x);
      }
      Collections.sort(sorted);
      System.out.printf(
          Locale.ROOT,
          "%,d answers, %,d changes: p50 %.2f ms, p95 %.2f ms, max %.2f ms; search after the"
              + " burst (index catch-up) %.0f ms, %d hits%n",
          answers.size(),
          changes,
          sorted.get(changes / 2) / 1e6,
          sorted.get((int) Math.ceil(changes * 0.95) - 1) / 1e6,
          sorted.get(changes - 1) / 1e6,
          catchUp / 1e6,
          found);
    }
  }

  private static void step(Coding coding, Random random, List<Long> answers, List<Code> codes)
      throws InputException {
    long answer = answers.get(random.nextInt(answers.size()));
    Code code = codes.get(random.nextInt(codes.size()));
    if (random.nextInt(4) == 0) {
      coding.unassign("bench", answer, code.id());
    } else {
      coding.assign("bench", answer, code.id(), Optional.empty());
    }
  }
}
