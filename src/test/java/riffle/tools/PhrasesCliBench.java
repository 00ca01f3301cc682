package riffle.tools;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

/**
 * Bench command: phrase mining after import, end to end, as an analyst runs it. For each jar given
 * (default {@code target/riffle.jar}) it imports a generated export (50,000 respondents by default:
 * 100,000 answers in one wave, the most a single wave and question can hold) once with that jar,
 * then runs {@code java -jar JAR phrases --project P --question 1 --wave Bench --json} in fresh
 * JVMs — one untimed run first, so every timed run finds the file in the page cache — alternating
 * between the jars, and prints each run's wall time, the median, and whether every jar printed the
 * same phrases. Where GNU time is installed ({@code /usr/bin/time}) each run's CPU time (user and
 * system) is printed too: on a machine shared with other work it varies less than the wall time.
 *
 * <p>Run with {@code mvn -q test-compile exec:java -Dexec.mainClass=riffle.tools.PhrasesCliBench
 * -Dexec.args="[RESPONDENTS [RUNS [FOLDER [JAR...]]]]"} after {@code mvn -q -DskipTests package}.
 * Projects are built in {@code FOLDER} (default: a temporary folder, deleted afterwards); a project
 * already there is reused, so a second run skips the imports.
 */
public final class PhrasesCliBench {
  private PhrasesCliBench() {}

  public static void main(String[] args) throws IOException, InterruptedException {
    int respondents = args.length > 0 ? Integer.parseInt(args[0]) : 50_000;
    int runs = args.length > 1 ? Integer.parseInt(args[1]) : 5;
    boolean keep = args.length > 2;
    Path dir = keep ? Path.of(args[2]) : Files.createTempDirectory("riffle-phrases-bench");
    List<Path> jars = new ArrayList<>();
    for (int i = 3; i < args.length; i++) {
      jars.add(Path.of(args[i]));
    }
    if (jars.isEmpty()) {
      jars.add(ImportBench.JAR);
    }
    for (Path jar : jars) {
      if (!Files.isRegularFile(jar)) {
        throw new IllegalStateException(jar + " is missing; build it: mvn -q -DskipTests package");
      }
    }
    Files.createDirectories(dir);
    try {
      Path export = dir.resolve("large-" + respondents + ".csv");
      if (!Files.isRegularFile(export)) {
        SampleResponses.writeLargeExport(export, respondents, 42L);
      }
      List<Path> projects = new ArrayList<>();
      for (int j = 0; j < jars.size(); j++) {
        Path project = dir.resolve("bench-" + respondents + "-" + j + ".riffle");
        projects.add(project);
        if (!Files.isRegularFile(project)) {
          long t = System.nanoTime();
          run(
              jars.get(j),
              dir.resolve("import.log"),
              "import",
              "--project",
              project.toString(),
              "--file",
              export.toString(),
              "--wave",
              "Bench");
          System.out.printf(
              Locale.ROOT,
              "%s: imported %,d answers in %.0f s%n",
              jars.get(j),
              2 * respondents,
              (System.nanoTime() - t) / 1e9);
        }
      }
      System.out.printf(
          Locale.ROOT,
          "project: %,d answers in one wave, %d cores; phrases --question 1 --wave Bench --json%n",
          2 * respondents,
          Runtime.getRuntime().availableProcessors());
      List<List<Double>> wall = new ArrayList<>();
      List<List<Double>> cpu = new ArrayList<>();
      List<String> outputs = new ArrayList<>();
      for (int j = 0; j < jars.size(); j++) {
        wall.add(new ArrayList<>());
        cpu.add(new ArrayList<>());
        Path out = dir.resolve("phrases-" + j + ".json");
        run(jars.get(j), out, phrases(projects.get(j)));
        outputs.add(Files.readString(out, StandardCharsets.UTF_8));
      }
      for (int r = 0; r < runs; r++) {
        for (int j = 0; j < jars.size(); j++) {
          double[] t =
              run(jars.get(j), dir.resolve("phrases-" + j + ".json"), phrases(projects.get(j)));
          wall.get(j).add(t[0]);
          cpu.get(j).add(t[1]);
        }
      }
      for (int j = 0; j < jars.size(); j++) {
        StringBuilder each = new StringBuilder();
        for (double x : wall.get(j)) {
          each.append(String.format(Locale.ROOT, " %.2f", x));
        }
        System.out.printf(
            Locale.ROOT,
            "%s: median of %d runs %.2f s wall, %.2f s CPU (wall:%s)%n",
            jars.get(j),
            runs,
            median(wall.get(j)),
            median(cpu.get(j)),
            each);
      }
      boolean same = outputs.stream().distinct().count() == 1;
      System.out.println(
          jars.size() == 1
              ? "phrases: " + outputs.get(0).length() + " characters of JSON"
              : same ? "every jar printed the same phrases" : "the jars printed DIFFERENT phrases");
    } finally {
      if (!keep) {
        try (Stream<Path> files = Files.walk(dir)) {
          for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
            Files.deleteIfExists(p);
          }
        }
      }
    }
  }

  private static String[] phrases(Path project) {
    return new String[] {
      "phrases", "--project", project.toString(), "--question", "1", "--wave", "Bench", "--json"
    };
  }

  /** GNU time, when installed: it adds each run's CPU seconds, which shared machines blur less. */
  private static final Path TIME = Path.of("/usr/bin/time");

  /**
   * Runs the jar in a fresh JVM with its output in {@code out}; returns the wall time and the CPU
   * time in s (NaN without GNU time).
   */
  private static double[] run(Path jar, Path out, String... args)
      throws IOException, InterruptedException {
    List<String> command = new ArrayList<>();
    Path cpu = out.resolveSibling(out.getFileName() + ".cpu");
    boolean timed = Files.isExecutable(TIME);
    if (timed) {
      command.addAll(List.of(TIME.toString(), "-o", cpu.toString(), "-f", "%U %S"));
    }
    command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
    command.add("-jar");
    command.add(jar.toString());
    command.addAll(List.of(args));
    Path err = out.resolveSibling(out.getFileName() + ".err");
    long start = System.nanoTime();
    Process p =
        new ProcessBuilder(command)
            .redirectOutput(out.toFile())
            .redirectError(err.toFile())
            .start();
    int code = p.waitFor();
    double s = (System.nanoTime() - start) / 1e9;
    if (code != 0) {
      throw new IllegalStateException(
          String.join(" ", args) + " failed: " + Files.readString(err, StandardCharsets.UTF_8));
    }
    if (!timed) {
      return new double[] {s, Double.NaN};
    }
    String[] us = Files.readString(cpu, StandardCharsets.UTF_8).strip().split(" ");
    return new double[] {s, Double.parseDouble(us[0]) + Double.parseDouble(us[1])};
  }

  private static double median(List<Double> values) {
    List<Double> sorted = new ArrayList<>(values);
    sorted.sort(Comparator.naturalOrder());
    return sorted.get(sorted.size() / 2);
  }
}
