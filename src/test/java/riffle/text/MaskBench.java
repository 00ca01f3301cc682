package riffle.text;

import java.io.IOException;
import java.lang.invoke.MethodHandle;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.MethodType;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Bench command: the cost of masking one answer, this build against an older one in the same run.
 * The answers are every open-text answer of the demo waves and the pilot ({@code
 * sample-responses/}, about 4,800 realistic answers with a little personal data), and, as a worst
 * case, the planted fixture ({@code pii/planted.txt}: every answer full of personal data). The
 * older masker is loaded from a jar or class folder of that build (its {@code
 * riffle.text.PiiMasker} needs nothing else) in a class loader of its own. Each masker masks each
 * corpus in turn, after warm-up rounds; the median of the runs is printed per answer. Run with
 * {@code mvn -q test-compile exec:java -Dexec.mainClass=riffle.text.MaskBench -Dexec.args="OLD_JAR
 * [RUNS]"}, where OLD_JAR is, for example, {@code target/original-riffle.jar} of a worktree of the
 * older commit.
 */
public final class MaskBench {
  private MaskBench() {}

  /**
   * The time is this thread's CPU time, not the wall clock: on a shared machine the wall clock
   * counts the time other processes hold the cores.
   */
  private static final java.lang.management.ThreadMXBean CPU =
      java.lang.management.ManagementFactory.getThreadMXBean();

  /** Keeps the results alive so that the work is not optimised away. */
  private static volatile int sink;

  public static void main(String[] args) throws Throwable {
    if (args.length < 1) {
      throw new IllegalArgumentException("usage: MaskBench OLD_JAR_OR_CLASSES [RUNS]");
    }
    int runs = args.length > 1 ? Integer.parseInt(args[1]) : 21;
    List<String> demo = demoAnswers(Path.of("sample-responses"));
    List<String> planted = new ArrayList<>();
    for (PlantedFixture.Answer a : PlantedFixture.planted()) {
      planted.add(a.text());
    }
    List<String> ordinary = PlantedFixture.ordinary();
    MethodHandle old = oldMasker(Path.of(args[0]));
    PiiMasker current = PiiMasker.standard();
    System.out.printf(
        Locale.ROOT,
        "old masker from %s; %d runs after warm-up; %d cores%n",
        args[0],
        runs,
        Runtime.getRuntime().availableProcessors());
    for (Corpus c :
        List.of(
            new Corpus("demo answers", demo),
            new Corpus("ordinary fixture", ordinary),
            new Corpus("planted fixture", planted))) {
      for (int i = 0; i < 5; i++) {
        runOld(old, c.answers());
        runNew(current, c.answers());
      }
      double[] before = new double[runs];
      double[] after = new double[runs];
      for (int i = 0; i < runs; i++) {
        before[i] = runOld(old, c.answers()) / c.answers().size();
        after[i] = runNew(current, c.answers()) / c.answers().size();
      }
      double b = median(before);
      double a = median(after);
      System.out.printf(
          Locale.ROOT,
          "%-17s %,6d answers: before %,8.0f ns/answer, after %,8.0f ns/answer, %.2f×%n",
          c.name(),
          c.answers().size(),
          b,
          a,
          a / b);
    }
  }

  private record Corpus(String name, List<String> answers) {}

  private static double runOld(MethodHandle old, List<String> answers) throws Throwable {
    long t0 = CPU.getCurrentThreadCpuTime();
    int n = 0;
    for (String s : answers) {
      n += old.invoke(s).hashCode() & 1;
    }
    long t = CPU.getCurrentThreadCpuTime() - t0;
    sink += n;
    return t;
  }

  private static double runNew(PiiMasker masker, List<String> answers) {
    long t0 = CPU.getCurrentThreadCpuTime();
    int n = 0;
    for (String s : answers) {
      n += masker.mask(s).masks().size() & 1;
    }
    long t = CPU.getCurrentThreadCpuTime() - t0;
    sink += n;
    return t;
  }

  private static double median(double[] xs) {
    double[] s = xs.clone();
    Arrays.sort(s);
    return s[s.length / 2];
  }

  /** {@code PiiMasker.standard()::mask} of the build at {@code location}, in its own loader. */
  private static MethodHandle oldMasker(Path location) throws ReflectiveOperationException {
    if (!Files.exists(location)) {
      throw new IllegalArgumentException(
          location + " does not exist; build the older commit first");
    }
    try {
      URL url = location.toUri().toURL();
      URLClassLoader loader =
          new URLClassLoader(new URL[] {url}, ClassLoader.getPlatformClassLoader());
      Class<?> masker = Class.forName("riffle.text.PiiMasker", true, loader);
      Object standard = masker.getMethod("standard").invoke(null);
      Class<?> masked = masker.getMethod("mask", String.class).getReturnType();
      return MethodHandles.publicLookup()
          .findVirtual(masker, "mask", MethodType.methodType(masked, String.class))
          .bindTo(standard);
    } catch (java.net.MalformedURLException e) {
      throw new IllegalArgumentException(location + " is not a usable path", e);
    }
  }

  /** Every non-empty open-text answer (columns whose header ends in "?") of the demo files. */
  static List<String> demoAnswers(Path folder) throws IOException {
    List<String> out = new ArrayList<>();
    for (String name : List.of("wave-1.csv", "wave-2.csv", "wave-3.csv", "precoded-pilot.tsv")) {
      CSVFormat format =
          CSVFormat.DEFAULT
              .builder()
              .setDelimiter(name.endsWith(".tsv") ? '\t' : ',')
              .setHeader()
              .get();
      try (CSVParser p = CSVParser.parse(folder.resolve(name), StandardCharsets.UTF_8, format)) {
        List<String> questions = p.getHeaderNames().stream().filter(h -> h.endsWith("?")).toList();
        for (CSVRecord r : p) {
          for (String q : questions) {
            String v = r.get(q);
            if (!v.isBlank()) {
              out.add(v);
            }
          }
        }
      }
    }
    return out;
  }
}
