package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.app.Project;
import riffle.index.AnswerIndex;
import riffle.model.Progress;
import riffle.store.AnalysisCache;
import riffle.tools.SampleResponses;
import riffle.web.WebServer;

/**
 * A server and the command line on one project, as an analyst runs them: the page open while
 * commands in a terminal (a second process) code, import a new wave and apply the page's rule.
 * Every request of the page keeps answering 2xx and shows the other process's changes at once, and
 * the other process sees the page's.
 */
class ServerAndCommandLineTest {
  static final String CODE = "delivery date unclear";

  @TempDir Path dir;
  Path project;
  WebServer server;
  ServerClient page;
  ChildRiffle terminal;

  @BeforeEach
  void serveAWave() throws Exception {
    project = dir.resolve("shop.riffle");
    Path wave1 = dir.resolve("wave-1.csv");
    SampleResponses.writeWave(SampleResponses.generateWave(SampleResponses.WAVE_1, 120, 7L), wave1);
    Project.importInto(
        project,
        ImportRequest.from(new ImportSource.File(wave1)).wave("Wave 1").get(),
        Progress.NONE);
    server = WebServer.start(project, WebServer.Options.defaults());
    page = new ServerClient(server.url());
    terminal = ChildRiffle.fromClassPath(dir.resolve("home"));
  }

  @AfterEach
  void stop() {
    server.close();
  }

  private JsonNode ok(ServerClient.Answer a) {
    assertTrue(a.ok(), a.status() + " " + a.body());
    return a.json();
  }

  private CliTest.Run command(String... args) throws Exception {
    CliTest.Run run = terminal.run(args);
    assertEquals(0, run.code(), String.join(" ", args) + ": " + run.err());
    assertFalse(run.err().contains("Exception"), run.err());
    return run;
  }

  private int searchTotal(String query) throws Exception {
    return ok(page.get("/api/search?limit=500&q=" + ServerClient.q(query))).get("total").asInt();
  }

  @Test
  void thePageShowsEveryCommandLineChangeAndTheCommandLineThePages() throws Exception {
    assertEquals(0, searchTotal("code:\"" + CODE + "\""), "the page's index is open and current");
    long code =
        ok(page.post("/api/codes", Map.of("coder", "ana", "name", CODE)))
            .get("code")
            .get("id")
            .asLong();
    long first = ok(page.get("/api/answers?limit=1")).get("answers").get(0).get("id").asLong();

    String version = ok(page.get("/api/changes")).get("version").asText();
    command("code", "--project", project.toString(), "--answer", "" + first, "--add", CODE);
    assertFalse(
        version.equals(ok(page.get("/api/changes")).get("version").asText()),
        "the page's change watch moved");
    assertEquals(1, searchTotal("code:\"" + CODE + "\""), "the command line's code is found");
    JsonNode coded = ok(page.get("/api/answers?code=" + code));
    assertEquals(1, coded.get("total").asInt());
    assertEquals(first, coded.get("answers").get(0).get("id").asLong());

    Path wave2 = dir.resolve("wave-2.csv");
    SampleResponses.writeWave(SampleResponses.generateWave(SampleResponses.WAVE_2, 100, 8L), wave2);
    int added =
        command(
                "import",
                "--project",
                project.toString(),
                "--file",
                wave2.toString(),
                "--wave",
                "Wave 2",
                "--json")
            .json()
            .get("answers")
            .asInt();
    assertTrue(added > 100, "both questions of the new wave were stored: " + added);
    assertEquals(added, searchTotal("wave:\"Wave 2\""), "the new wave is searchable at once");
    assertEquals(
        added,
        ok(page.get("/api/answers?limit=1&wave=" + ServerClient.q("Wave 2"))).get("total").asInt());

    ok(page.post("/api/rules", Map.of("coder", "ana", "code", code, "query", "\"delivery date\"")));
    int given =
        command("rules", "apply", "--project", project.toString(), "--json")
            .json()
            .get("changed")
            .asInt();
    assertTrue(given > 0, "the rule coded answers of both waves");
    assertEquals(1 + given, searchTotal("code:\"" + CODE + "\""));
    assertEquals(1 + given, ok(page.get("/api/answers?limit=1&code=" + code)).get("total").asInt());

    JsonNode uncoded =
        ok(page.get("/api/answers?limit=1&coded=no&wave=" + ServerClient.q("Wave 2")))
            .get("answers")
            .get(0);
    long answer = uncoded.get("id").asLong();
    JsonNode gave =
        ok(page.post("/api/assignments", Map.of("coder", "ana", "answer", answer, "code", code)));
    assertEquals(code, gave.get("assignments").get(0).get("code_id").asLong());
    assertEquals(2 + given, searchTotal("code:\"" + CODE + "\""));

    JsonNode seen =
        command(
                "search",
                "--project",
                project.toString(),
                "--query",
                "code:\"" + CODE + "\"",
                "--json")
            .json();
    assertEquals(2 + given, seen.get("total").asInt(), "the command line sees the page's code");
  }

  @Test
  void aCommandThatMustWaitForTheIndexSaysSoAndThenAnswers() throws Exception {
    assertEquals(0, searchTotal("code:\"" + CODE + "\""));
    ok(page.post("/api/codes", Map.of("coder", "ana", "name", CODE)));
    // The page changed the project; the index catches up on its next use, here the command's.
    Path folder = AnalysisCache.derivedFolder(project).resolve("index");
    try (AnswerIndex other = AnswerIndex.open(folder)) {
      ChildRiffle.Started search;
      AnswerIndex.Writer held = other.tryWrite().orElseThrow();
      try {
        search =
            terminal.start(
                "search", "--project", project.toString(), "--query", "delivery", "--json");
        long until = System.nanoTime() + 30_000_000_000L;
        while (!search.errSoFar().contains("waiting for another Riffle process")
            && System.nanoTime() < until) {
          Thread.sleep(100);
        }
        assertTrue(search.process().isAlive(), "the command waits: " + search.errSoFar());
        assertTrue(
            search
                .errSoFar()
                .contains(
                    "riffle: waiting for another Riffle process to finish updating the search"
                        + " index of shop.riffle"),
            search.errSoFar());
      } finally {
        held.close();
      }
      CliTest.Run done = search.finish(60);
      assertEquals(0, done.code(), done.err());
      assertEquals(searchTotal("delivery"), done.json().get("total").asInt());
    }
  }

  @Test
  void aCommandLineImportWhileEightCodersWorkLosesNothing() throws Exception {
    List<Long> codes = new ArrayList<>();
    for (String name : List.of("price", "warranty", "delivery", "trust")) {
      codes.add(
          ok(page.post("/api/codes", Map.of("coder", "ana", "name", name)))
              .get("code")
              .get("id")
              .asLong());
    }
    List<Long> answers = new ArrayList<>();
    ok(page.get("/api/answers?limit=500"))
        .get("answers")
        .forEach(a -> answers.add(a.get("id").asLong()));
    Path wave2 = dir.resolve("wave-2.csv");
    SampleResponses.writeWave(SampleResponses.generateWave(SampleResponses.WAVE_2, 150, 9L), wave2);

    ChildRiffle.Started importing =
        terminal.start(
            "import",
            "--project",
            project.toString(),
            "--file",
            wave2.toString(),
            "--wave",
            "Wave 2",
            "--json");
    CodingLoad.Result load =
        CodingLoad.run(page, answers, codes, 8, 30, 400, importing.process()::isAlive, 11L);
    CliTest.Run imported = importing.finish(120);
    System.out.println("server and command line at once: " + load.summary());

    assertEquals(0, imported.code(), imported.err());
    assertEquals(0, load.refused(), "every request was answered 2xx");
    assertEquals(0, load.lost(), "no acknowledged change was lost");
    assertEquals(0, load.extra(), "nothing the coders did not leave");
    assertEquals(0, load.undoWrong(), "each undo took back that coder's own last change");
    int added = imported.json().get("answers").asInt();
    assertEquals(added, searchTotal("wave:\"Wave 2\""), "the new wave is searchable");
    int given = 0;
    for (long code : codes) {
      given += ok(page.get("/api/answers?limit=1&code=" + code)).get("total").asInt();
    }
    int held = 0;
    for (var set : CodingLoad.assignments(page, answers, new java.util.HashSet<>(codes)).values()) {
      held += set.size();
    }
    assertEquals(held, given, "the answer list's code filters agree with the assignments");
  }
}
