package riffle.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.app.Project;
import riffle.model.Progress;
import riffle.tools.SampleResponses;
import riffle.web.WebServer;

/**
 * Bench command: eight coders code through a server on loopback (give, take off, undo, read the
 * answer list and the search), first alone, then while {@code riffle import} of a new wave runs in
 * another process (the built jar); prints requests per second, latency p50/p99 and what was lost.
 * Run with {@code mvn -q -DskipTests package && mvn -q test-compile exec:java
 * -Dexec.mainClass=riffle.cli.ServerAndCliBench -Dexec.classpathScope=test
 * [-Dexec.args="RESPONDENTS IMPORTED STEPS"]}.
 */
public final class ServerAndCliBench {
  static final Path JAR = Path.of("target", "riffle.jar");

  private ServerAndCliBench() {}

  public static void main(String[] args) throws Exception {
    int respondents = args.length > 0 ? Integer.parseInt(args[0]) : 1_000;
    int imported = args.length > 1 ? Integer.parseInt(args[1]) : 500;
    int steps = args.length > 2 ? Integer.parseInt(args[2]) : 200;
    if (!Files.isRegularFile(JAR)) {
      throw new IllegalStateException("build the jar first: mvn -q -DskipTests package");
    }
    Path dir = Files.createTempDirectory("riffle-server-cli-bench");
    Path project = dir.resolve("bench.riffle");
    Path wave1 = dir.resolve("wave-1.csv");
    SampleResponses.writeWave(
        SampleResponses.generateWave(SampleResponses.WAVE_1, respondents, 7L), wave1);
    Project.importInto(
        project,
        ImportRequest.from(new ImportSource.File(wave1)).wave("Wave 1").get(),
        Progress.NONE);
    Path wave2 = dir.resolve("wave-2.csv");
    SampleResponses.writeWave(
        SampleResponses.generateWave(SampleResponses.WAVE_2, imported, 8L), wave2);

    try (WebServer server = WebServer.start(project, WebServer.Options.defaults())) {
      ServerClient api = new ServerClient(server.url());
      api.get("/api/search?q=delivery");
      List<Long> answers = new ArrayList<>();
      for (int offset = 0; ; offset += 500) {
        var page = api.get("/api/answers?limit=500&offset=" + offset).json().get("answers");
        page.forEach(a -> answers.add(a.get("id").asLong()));
        if (page.size() < 500) {
          break;
        }
      }
      System.out.printf(
          Locale.ROOT,
          "%,d answers served on loopback, 8 coders, %d cores%n",
          answers.size(),
          Runtime.getRuntime().availableProcessors());

      CodingLoad.Result alone =
          CodingLoad.run(api, answers, codes(api, "a"), 8, steps, steps, () -> false, 1L);
      System.out.println("server alone:                " + alone.summary());

      ChildRiffle.Started importing =
          ChildRiffle.fromJar(JAR, dir.resolve("home"))
              .start(
                  "import",
                  "--project",
                  project.toString(),
                  "--file",
                  wave2.toString(),
                  "--wave",
                  "Wave 2",
                  "--json");
      long start = System.nanoTime();
      CodingLoad.Result during =
          CodingLoad.run(
              api,
              answers,
              codes(api, "b"),
              8,
              steps,
              steps * 10,
              importing.process()::isAlive,
              2L);
      CliTest.Run run = importing.finish(600);
      System.out.println("while riffle import runs:    " + during.summary());
      System.out.printf(
          Locale.ROOT,
          "the import (another process): exit %d, %s answers, %.1f s from its start to the end of"
              + " the coding%n",
          run.code(),
          run.code() == 0 ? run.json().get("answers").asText() : run.err(),
          (System.nanoTime() - start) / 1e9);
    }
  }

  /** Four new codes for one run, so that runs are counted apart. */
  private static List<Long> codes(ServerClient api, String run) throws Exception {
    List<Long> codes = new ArrayList<>();
    for (String name : List.of("price", "warranty", "delivery", "trust")) {
      codes.add(
          api.post("/api/codes", Map.of("coder", "bench", "name", name + " " + run))
              .json()
              .get("code")
              .get("id")
              .asLong());
    }
    return codes;
  }
}
