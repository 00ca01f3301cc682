package riffle.tools;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.Set;
import java.util.function.ToDoubleFunction;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * Bench command: import at scale against a naive baseline, each as an analyst would run it — a
 * fresh JVM per run, model loading included — in one run on one machine.
 *
 * <p>It writes a seeded export of ANSWERS (default 100,000) unique answers of 10 to 40 words to a
 * temporary folder (an id column and one open-text column; invented text about the demo's shop, no
 * sentence twice, so no cache of repeated sentences helps), then alternates, RUNS times (default
 * 3): (a) {@link NaiveImport}, Commons CSV and the stock OpenNLP tools one thread in sequence, as
 * {@code java -cp target/riffle.jar:target/test-classes riffle.tools.NaiveImport FILE}, and (b)
 * {@code target/riffle import --project NEW --file FILE} (the launcher) into a fresh project. On
 * each run's project it then runs, from cold JVMs, {@code phrases --project P} twice (the first
 * mines, the second reads the phrases the first kept) and {@code info --project P}. Every run goes
 * through GNU time ({@code /usr/bin/time -v}) for its wall time, CPU time and peak resident memory;
 * the bench prints each run, the medians, the ratio of the median wall times (Riffle over naive)
 * and a markdown table, with the JVM and {@code nproc}.
 *
 * <p>Run from the repository's top folder with {@code mvn -q -o -DskipTests package && mvn -q -o
 * test-compile exec:java -Dexec.mainClass=riffle.tools.ImportBench -Dexec.args="ANSWERS RUNS"} (the
 * naive process needs the compiled test classes; exec:java runs the bench in Maven's JVM and starts
 * every measured run with the same {@code java}).
 */
public final class ImportBench {
  static final Path JAR = Path.of("target", "riffle.jar");

  /** Riffle runs as the README runs it: through the launcher the build writes. */
  static final Path LAUNCHER = Path.of("target", "riffle");

  static final Path TEST_CLASSES = Path.of("target", "test-classes");
  static final Path TIME = Path.of("/usr/bin/time");

  /** Fewest and most words in a generated answer. */
  static final int MIN_WORDS = 10;

  static final int MAX_WORDS = 40;

  private ImportBench() {}

  public static void main(String[] args) throws IOException, InterruptedException {
    int answers = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
    int runs = args.length > 1 ? Integer.parseInt(args[1]) : 3;
    Path naiveClass = TEST_CLASSES.resolve("riffle/tools/NaiveImport.class");
    if (!Files.isRegularFile(JAR)
        || !Files.isExecutable(LAUNCHER)
        || !Files.isRegularFile(naiveClass)) {
      throw new IllegalStateException(
          "build first: mvn -q -o -DskipTests package && mvn -q -o test-compile");
    }
    if (!Files.isExecutable(TIME)) {
      throw new IllegalStateException("GNU time is needed at " + TIME);
    }
    Path dir = Files.createTempDirectory("riffle-import-bench");
    try {
      Path export = dir.resolve("answers.csv");
      writeExport(export, answers(answers, 42L));
      System.out.printf(
          Locale.ROOT,
          "export: %,d unique answers of %d-%d words, %.1f MB; %s %s, nproc %s%n",
          answers,
          MIN_WORDS,
          MAX_WORDS,
          Files.size(export) / 1e6,
          System.getProperty("java.vm.name"),
          System.getProperty("java.runtime.version"),
          nproc());
      String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
      String classpath = JAR + ":" + TEST_CLASSES;
      List<Measured> naive = new ArrayList<>();
      List<Measured> imports = new ArrayList<>();
      Path project = null;
      for (int run = 1; run <= runs; run++) {
        Path log = dir.resolve("naive-" + run + ".log");
        naive.add(measure(log, java, "-cp", classpath, NaiveImport.class.getName(), str(export)));
        if (run == 1) {
          System.out.println("naive: " + Files.readString(log, StandardCharsets.UTF_8).strip());
        }
        project = dir.resolve("run" + run + ".riffle");
        imports.add(
            measure(
                dir.resolve("import-" + run + ".log"),
                str(LAUNCHER),
                "import",
                "--project",
                str(project),
                "--file",
                str(export)));
        System.out.printf(
            Locale.ROOT,
            "run %d: naive %s | import %s%n",
            run,
            naive.get(run - 1),
            imports.get(run - 1));
      }
      List<Measured> phrases = new ArrayList<>();
      List<Measured> kept = new ArrayList<>();
      List<Measured> info = new ArrayList<>();
      for (int run = 1; run <= runs; run++) {
        // Each run's project has not been mined yet: the first phrases mines, the second reads
        // what the first kept.
        String mined = str(dir.resolve("run" + run + ".riffle"));
        phrases.add(
            measure(dir.resolve("phrases.log"), str(LAUNCHER), "phrases", "--project", mined));
        kept.add(measure(dir.resolve("kept.log"), str(LAUNCHER), "phrases", "--project", mined));
        Path infoLog = dir.resolve("info.log");
        info.add(measure(infoLog, str(LAUNCHER), "info", "--project", mined));
        if (run == 1) {
          System.out.println("info:\n" + Files.readString(infoLog, StandardCharsets.UTF_8).strip());
        }
        System.out.printf(
            Locale.ROOT,
            "cold run %d: phrases %s | phrases again %s | info %s%n",
            run,
            phrases.get(run - 1),
            kept.get(run - 1),
            info.get(run - 1));
      }
      System.out.println();
      System.out.println(table(answers, runs, naive, imports, phrases, kept, info));
    } finally {
      try (Stream<Path> files = Files.walk(dir)) {
        for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
          Files.deleteIfExists(p);
        }
      }
    }
  }

  /** The closing table, in markdown: medians of every measured command. */
  static String table(
      int answers,
      int runs,
      List<Measured> naive,
      List<Measured> imports,
      List<Measured> phrases,
      List<Measured> kept,
      List<Measured> info) {
    double naiveWall = median(naive, Measured::wallSeconds);
    double importWall = median(imports, Measured::wallSeconds);
    return String.format(
        Locale.ROOT,
        "Medians of %d run%s each (wall time, peak RSS), fresh JVMs:%n%n"
            + "| answers | naive wall | naive RSS | import wall | import RSS | ratio"
            + " | cold phrases, mined | cold phrases, kept | cold info |%n"
            + "|---|---|---|---|---|---|---|---|---|%n"
            + "| %,d | %.2f s | %s | %.2f s | %s | %.2f | %.2f s, %s | %.2f s, %s | %.2f s, %s |",
        runs,
        runs == 1 ? "" : "s",
        answers,
        naiveWall,
        mib(median(naive, Measured::peakKb)),
        importWall,
        mib(median(imports, Measured::peakKb)),
        importWall / naiveWall,
        median(phrases, Measured::wallSeconds),
        mib(median(phrases, Measured::peakKb)),
        median(kept, Measured::wallSeconds),
        mib(median(kept, Measured::peakKb)),
        median(info, Measured::wallSeconds),
        mib(median(info, Measured::peakKb)));
  }

  static String mib(double kb) {
    return String.format(Locale.ROOT, "%,.0f MiB", kb / 1024);
  }

  static double median(List<Measured> runs, ToDoubleFunction<Measured> figure) {
    double[] sorted = runs.stream().mapToDouble(figure).sorted().toArray();
    int n = sorted.length;
    return n % 2 == 1 ? sorted[n / 2] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2;
  }

  /**
   * Runs a command under {@code /usr/bin/time -v}, its standard output in {@code log}; fails with
   * the command's error output when it exits with another code than 0.
   */
  static Measured measure(Path log, String... command) throws IOException, InterruptedException {
    Path times = log.resolveSibling(log.getFileName() + ".time");
    Path err = log.resolveSibling(log.getFileName() + ".err");
    List<String> timed = new ArrayList<>(List.of(str(TIME), "-v", "-o", str(times)));
    timed.addAll(List.of(command));
    Process p =
        new ProcessBuilder(timed).redirectOutput(log.toFile()).redirectError(err.toFile()).start();
    if (p.waitFor() != 0) {
      throw new IllegalStateException(
          String.join(" ", command) + " failed: " + Files.readString(err, StandardCharsets.UTF_8));
    }
    return Measured.parse(Files.readString(times, StandardCharsets.UTF_8));
  }

  static String nproc() throws IOException, InterruptedException {
    Process p = new ProcessBuilder("nproc").redirectErrorStream(true).start();
    String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
    return p.waitFor() == 0 ? out : "unknown";
  }

  private static String str(Path p) {
    return p.toString();
  }

  /**
   * What GNU time reports of one run.
   *
   * @param wallSeconds elapsed wall-clock time
   * @param cpuSeconds user plus system time
   * @param peakKb maximum resident set size, in KiB
   */
  record Measured(double wallSeconds, double cpuSeconds, long peakKb) {

    /** Reads the report of {@code time -v}; fails when a figure is missing. */
    static Measured parse(String report) {
      String wall = field(report, "Elapsed (wall clock) time (h:mm:ss or m:ss)");
      double seconds = 0;
      for (String part : wall.split(":")) {
        seconds = seconds * 60 + Double.parseDouble(part);
      }
      double cpu =
          Double.parseDouble(field(report, "User time (seconds)"))
              + Double.parseDouble(field(report, "System time (seconds)"));
      return new Measured(
          seconds, cpu, Long.parseLong(field(report, "Maximum resident set size (kbytes)")));
    }

    private static String field(String report, String name) {
      for (String line : report.split("\n")) {
        String l = line.strip();
        if (l.startsWith(name + ": ")) {
          return l.substring(name.length() + 2).strip();
        }
      }
      throw new IllegalStateException("no '" + name + "' in the output of time -v:\n" + report);
    }

    @Override
    public String toString() {
      return String.format(
          Locale.ROOT, "%.2f s wall, %.2f s CPU, %s", wallSeconds, cpuSeconds, mib(peakKb));
    }
  }

  // ---------------------------------------------------------------------------------------------
  // The export: unique invented answers
  // ---------------------------------------------------------------------------------------------

  /** The export's open-text column: the demo's second question. */
  static final String QUESTION = SampleResponses.CHOSE_QUESTION;

  /** Writes the answers as CSV: {@code response_id} and {@link #QUESTION}. */
  static void writeExport(Path out, List<String> answers) throws IOException {
    try (Writer w = Files.newBufferedWriter(out, StandardCharsets.UTF_8);
        CSVPrinter csv = new CSVPrinter(w, CSVFormat.DEFAULT)) {
      csv.printRecord("response_id", QUESTION);
      for (int i = 0; i < answers.size(); i++) {
        csv.printRecord(String.format(Locale.ROOT, "B-%06d", i + 1), answers.get(i));
      }
    }
  }

  /**
   * {@code count} answers of {@link #MIN_WORDS} to {@link #MAX_WORDS} words, one to three sentences
   * each, no sentence twice; a pure function of the seed.
   */
  static List<String> answers(int count, long seed) {
    Random r = new Random(seed);
    Set<String> seen = new HashSet<>();
    List<String> out = new ArrayList<>(count);
    while (out.size() < count) {
      List<String> sentences = new ArrayList<>();
      int words = 0;
      for (int k = 1 + r.nextInt(3); k > 0; k--) {
        String s = sentence(r);
        sentences.add(s);
        words += s.split(" ").length;
      }
      if (words >= MIN_WORDS
          && words <= MAX_WORDS
          && sentences.stream().distinct().count() == sentences.size()
          && sentences.stream().noneMatch(seen::contains)) {
        seen.addAll(sentences);
        out.add(String.join(" ", sentences));
      }
    }
    return out;
  }

  private static String sentence(Random r) {
    String s =
        switch (r.nextInt(3)) {
          case 0 -> String.join(" ", pick(r, WHO), pick(r, DID), thing(r), pick(r, WHY), when(r));
          case 1 ->
              String.join(
                  " ", thing(r), pick(r, FELT), pick(r, QUALITY), pick(r, COMPARED), when(r));
          default ->
              when(r)
                  + ", "
                  + String.join(" ", pick(r, WHO), pick(r, DID), thing(r), pick(r, OUTCOME));
        };
    return Character.toUpperCase(s.charAt(0)) + s.substring(1) + ".";
  }

  private static String pick(Random r, List<String> words) {
    return words.get(r.nextInt(words.size()));
  }

  private static String thing(Random r) {
    return switch (r.nextInt(3)) {
      case 0 -> "the " + pick(r, SampleResponses.MACHINES);
      case 1 -> "the " + pick(r, SampleResponses.GRINDERS) + " grinder";
      default -> pick(r, PARTS);
    };
  }

  private static String when(Random r) {
    return r.nextInt(3) == 0 ? (2 + r.nextInt(19)) + " days ago" : pick(r, WHEN);
  }

  private static final List<String> WHO =
      List.of(
          "I",
          "my partner",
          "my sister",
          "my brother",
          "we",
          "my flatmate",
          "my dad",
          "my neighbour",
          "a colleague of mine",
          "my aunt",
          "our office",
          "my grandmother");

  private static final List<String> DID =
      List.of(
          "ordered",
          "compared",
          "almost skipped",
          "finally picked",
          "read about",
          "asked about",
          "waited for",
          "unpacked",
          "tested",
          "cleaned",
          "set up",
          "returned",
          "recommended",
          "measured");

  private static final List<String> PARTS =
      List.of(
          "the steam wand",
          "the drip tray",
          "the descaling kit",
          "the milk jug",
          "the spare gaskets",
          "the tamper",
          "the water tank",
          "the portafilter",
          "the pressure gauge",
          "the cup warmer",
          "a refurbished lever machine",
          "a second-hand burr set");

  private static final List<String> WHY =
      List.of(
          "because the old one leaked",
          "since the price looked fair",
          "after reading the care guide",
          "because the delivery date was clear",
          "as the warranty covered the pump",
          "because a friend swore by it",
          "since the shop answered quickly",
          "because the photos showed every scratch",
          "after a long chat with support",
          "because pods felt wasteful",
          "since our kitchen is tiny",
          "because the box arrived early",
          "as the return window was generous",
          "because the test report was attached");

  private static final List<String> FELT =
      List.of("felt", "looked", "seemed", "turned out", "sounded");

  private static final List<String> QUALITY =
      List.of(
          "sturdy",
          "quieter than expected",
          "a bit fiddly",
          "easy to clean",
          "heavier than it looked",
          "almost new",
          "well packed",
          "solid",
          "surprisingly compact",
          "slightly worn",
          "spotless");

  private static final List<String> COMPARED =
      List.of(
          "compared with my old pod machine",
          "next to the one at work",
          "for the money",
          "for a second-hand part",
          "after the first descale",
          "once it warmed up",
          "in daylight",
          "on the kitchen counter",
          "by the second cup");

  private static final List<String> OUTCOME =
      List.of(
          "and it worked out fine",
          "and nobody regretted it",
          "which felt a bit risky",
          "and the coffee improved at once",
          "which took ten minutes",
          "and the milk foam got better",
          "although the manual was thin",
          "and it still runs every day",
          "which saved a trip to town",
          "though the box was huge");

  private static final List<String> WHEN =
      List.of(
          "last Tuesday",
          "before the holidays",
          "on a rainy weekend",
          "after work",
          "in the spring",
          "during a quiet week",
          "over lunch",
          "late at night",
          "on my birthday",
          "the week we moved",
          "before the first frost",
          "on a Sunday morning",
          "after the night shift");
}
