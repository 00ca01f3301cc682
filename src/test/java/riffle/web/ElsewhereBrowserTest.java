package riffle.web;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.support.ui.WebDriverWait;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.app.Project;
import riffle.model.CodeDraft;
import riffle.model.Progress;

/**
 * The page shows changes made elsewhere — here through a second connection to the project file, as
 * the command line makes them — without a reload: a code given to the answer on screen appears on
 * it, and a new wave shows in the counts, within a couple of seconds.
 */
@Tag("browser")
class ElsewhereBrowserTest {
  @TempDir static Path dir;
  static Path project;
  static WebServer server;
  static ChromeDriver driver;
  static Path profile;

  @BeforeAll
  static void start() throws Exception {
    project = WebServerTest.smallProject(dir);
    server = WebServer.start(project, WebServer.Options.defaults().webDir(Path.of("web")));
    profile = Chromium.profile();
    driver = Chromium.start(profile, "1280,1000");
  }

  @AfterAll
  static void stop() throws IOException {
    Chromium.stop(driver, profile);
    if (server != null) {
      server.close();
    }
  }

  static WebDriverWait within(int seconds) {
    return Chromium.waiting(driver, seconds);
  }

  @SuppressWarnings("unchecked")
  static List<String> chips() {
    return (List<String>)
        ((JavascriptExecutor) driver)
            .executeScript(
                "return [...document.querySelectorAll('#coding-codes .chip .chip-name')]"
                    + ".map(e => e.textContent)");
  }

  @Test
  void codingAndAWaveFromElsewhereShowWithoutAReload() throws Exception {
    driver.get(server.url().resolve("/#coding").toString());
    within(60)
        .until(
            d ->
                !d.findElement(By.id("project-counts")).getText().isEmpty()
                    && d.findElement(By.id("coding-card-title")).getText().startsWith("Answer 1"));
    String counts = driver.findElement(By.id("project-counts")).getText();
    assertTrue(counts.startsWith("1 wave"), counts);

    try (Project elsewhere = Project.openExisting(project)) {
      long code = elsewhere.codebook().create("cli", CodeDraft.named("Said elsewhere")).id();
      long first = elsewhere.answerIds().get(0);
      elsewhere.coding().assign("cli", first, code, Optional.empty());
    }
    long given = System.nanoTime();
    within(10).until(d -> chips().contains("Said elsewhere"));
    double seconds = (System.nanoTime() - given) / 1e9;
    assertTrue(seconds < 3, "shown after " + seconds + " s");

    Path wave = dir.resolve("wave-2.csv");
    Files.writeString(
        wave,
        "id,What almost stopped you from ordering?\nB1,No delivery date shown\n",
        StandardCharsets.UTF_8);
    Project.importInto(
        project,
        ImportRequest.from(new ImportSource.File(wave)).wave("Wave 2").get(),
        Progress.NONE);
    within(10).until(d -> d.findElement(By.id("project-counts")).getText().startsWith("2 waves"));
  }
}
