package riffle.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Random;
import java.util.Set;
import riffle.model.Findings;

/**
 * Bench command: the full findings (frequencies, changes, co-occurrence, saturation) for 100,000
 * answers to one question, 40 codes (8 themes of 4 codes each) and 3 waves. Goal: 300 ms or less
 * (issue 13). Runs the same answers twice: every coded answer read (the findings as they were
 * before review state), then 60% read with the other answers' codes given by rules.
 *
 * <p>Run: {@code mvn -q test-compile exec:java -Dexec.mainClass=riffle.report.ReportBench}
 * (arguments: answers, runs).
 */
public final class ReportBench {
  private ReportBench() {}

  public static void main(String[] args) {
    int answers = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
    int runs = args.length > 1 ? Integer.parseInt(args[1]) : 15;
    ReportInput input = input(answers, new Random(42L), false);
    run("every answer read", input, runs);
    // The same answers with review state: 60% read, the codes of the others given by rules.
    run("60% read, the rest by rule", input(answers, new Random(42L), true), runs);
  }

  private static void run(String what, ReportInput input, int runs) {
    int answers = input.answers().size();
    long checksum = 0;
    for (int i = 0; i < 5; i++) {
      checksum +=
          Report.compute(input, ReportSettings.DEFAULTS).questions().get(0).changes().size();
    }
    double[] ms = new double[runs];
    Findings findings = null;
    for (int i = 0; i < runs; i++) {
      long start = System.nanoTime();
      findings = Report.compute(input, ReportSettings.DEFAULTS);
      ms[i] = (System.nanoTime() - start) / 1e6;
    }
    Arrays.sort(ms);
    long htmlStart = System.nanoTime();
    String html = Exports.html(findings, "Bench");
    double htmlMs = (System.nanoTime() - htmlStart) / 1e6;
    var q = findings.questions().get(0);
    System.out.printf(
        Locale.ROOT,
        "%s: answers %d, codes %d, waves 3: findings median %.1f ms, best %.1f ms, worst %.1f ms"
            + " (%d runs after 5 warm-up); %d changes, %d pairs; HTML %d kB in %.1f ms [%d]%n",
        what,
        answers,
        q.codes().size(),
        ms[runs / 2],
        ms[0],
        ms[runs - 1],
        runs,
        q.changes().size(),
        q.cooccurrence().size(),
        html.length() / 1024,
        htmlMs,
        checksum);
  }

  static ReportInput input(int answers, Random random, boolean review) {
    List<ReportCode> codebook = new ArrayList<>();
    List<String> leaves = new ArrayList<>();
    for (int t = 0; t < 8; t++) {
      String theme = "t" + t;
      codebook.add(
          new ReportCode(
              theme, "Theme " + t, Optional.empty(), t % 2 == 0 ? "friction" : "praise", false));
      for (int c = 0; c < 4; c++) {
        String id = theme + "c" + c;
        codebook.add(
            new ReportCode(id, "Code " + t + "." + c, Optional.of(theme), "neutral", false));
        leaves.add(id);
      }
    }
    List<String> waves = List.of("W1", "W2", "W3");
    List<ReportAnswer> list = new ArrayList<>(answers);
    for (int i = 0; i < answers; i++) {
      int wave = i % 3;
      Set<String> codes = new HashSet<>();
      int k = 1 + random.nextInt(3);
      for (int j = 0; j < k; j++) {
        // Skewed popularity, with the first code falling in the last wave.
        int index = (int) Math.min(leaves.size() - 1, Math.abs(random.nextGaussian()) * 10);
        if (index == 0 && wave == 2 && random.nextBoolean()) {
          continue;
        }
        codes.add(leaves.get(index));
      }
      boolean substantive = random.nextInt(20) != 0;
      OptionalLong coded = random.nextInt(10) < 6 ? OptionalLong.of(i) : OptionalLong.empty();
      Map<String, String> segments = Map.of("buyer", random.nextBoolean() ? "new" : "returning");
      list.add(
          review
              ? new ReportAnswer(
                  "a" + i,
                  waves.get(wave),
                  "Why did you choose us?",
                  substantive,
                  codes,
                  segments,
                  coded,
                  coded.isPresent(),
                  coded.isPresent() ? Set.of() : codes)
              : new ReportAnswer(
                  "a" + i,
                  waves.get(wave),
                  "Why did you choose us?",
                  substantive,
                  codes,
                  segments,
                  coded));
    }
    return new ReportInput(List.of("Why did you choose us?"), waves, codebook, list);
  }
}
