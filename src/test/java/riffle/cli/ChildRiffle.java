package riffle.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Riffle's command line in a child JVM — a second process, as a person's terminal would be — with a
 * home folder of its own and its output in files. Started from the tests' class path, or from the
 * built jar (for bench commands run through Maven, whose class path is Maven's own).
 */
final class ChildRiffle {
  private static final AtomicInteger RUNS = new AtomicInteger();

  private final List<String> launcher;
  private final Path home;

  private ChildRiffle(List<String> launcher, Path home) {
    this.launcher = launcher;
    this.home = home;
  }

  /** Runs {@code riffle.cli.Main} from this JVM's class path (the tests' own). */
  static ChildRiffle fromClassPath(Path home) {
    return new ChildRiffle(
        List.of("-cp", System.getProperty("java.class.path"), Main.class.getName()), home);
  }

  /** Runs {@code java -jar jar}. */
  static ChildRiffle fromJar(Path jar, Path home) {
    return new ChildRiffle(List.of("-jar", jar.toString()), home);
  }

  /** A started command; its stdout and stderr go to files. */
  record Started(Process process, Path out, Path err) {
    /** Waits for the command to end and returns what it printed and its exit code. */
    CliTest.Run finish(long seconds) throws IOException, InterruptedException {
      if (!process.waitFor(seconds, TimeUnit.SECONDS)) {
        process.destroyForcibly();
        throw new IllegalStateException(
            "the command did not end within " + seconds + " s: " + read(err));
      }
      return new CliTest.Run(process.exitValue(), read(out), read(err));
    }

    String errSoFar() throws IOException {
      return read(err);
    }

    private static String read(Path file) throws IOException {
      return Files.exists(file) ? Files.readString(file, StandardCharsets.UTF_8) : "";
    }
  }

  /** Starts {@code riffle ARGS} in a new JVM. */
  Started start(String... args) throws IOException {
    List<String> command = new ArrayList<>();
    command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
    command.add("-Duser.home=" + home);
    command.add("-Xmx512m");
    command.addAll(launcher);
    command.addAll(List.of(args));
    int n = RUNS.incrementAndGet();
    Files.createDirectories(home);
    Path out = home.resolve("child-" + n + ".out");
    Path err = home.resolve("child-" + n + ".err");
    Process p =
        new ProcessBuilder(command)
            .redirectOutput(out.toFile())
            .redirectError(err.toFile())
            .redirectInput(ProcessBuilder.Redirect.from(nullInput(home)))
            .start();
    return new Started(p, out, err);
  }

  /** Runs {@code riffle ARGS} in a new JVM to its end (at most two minutes). */
  CliTest.Run run(String... args) throws IOException, InterruptedException {
    return start(args).finish(120);
  }

  private static java.io.File nullInput(Path home) throws IOException {
    Path empty = home.resolve("empty-stdin");
    if (!Files.exists(empty)) {
      Files.write(empty, new byte[0]);
    }
    return empty.toFile();
  }
}
