package riffle.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
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
import riffle.model.Progress;
import riffle.model.ShownText;

/**
 * A long answer in Debian's Chromium, headless: the coding screen and Find answers show its start
 * and fetch the rest on "Show all"; a bidirectional override in an export's value stays inside its
 * own element.
 */
@Tag("browser")
class LongAnswerBrowserTest {
  @TempDir static Path dir;
  static WebServer server;
  static ChromeDriver driver;
  static Path profile;
  static String longAnswer;

  @BeforeAll
  static void start() throws Exception {
    StringBuilder cell = new StringBuilder("The grinder was late");
    while (cell.length() < 20_000) {
      cell.append(" and the burrs were fine");
    }
    cell.append(" zanzibarish");
    longAnswer = cell.toString();
    Path file = dir.resolve("long.csv");
    Files.writeString(
        file,
        "id,device,What almost stopped you?\n"
            + "L1,mob\u202Eile,\""
            + longAnswer
            + "\"\nS1,desktop,The grinder arrived early and well packed\n",
        StandardCharsets.UTF_8);
    Path project = dir.resolve("long.riffle");
    Project.importInto(
        project, ImportRequest.from(new ImportSource.File(file)).wave("W").get(), Progress.NONE);
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

  static WebDriverWait waiting() {
    return Chromium.waiting(driver);
  }

  static String text(String css) {
    return Chromium.text(driver, css);
  }

  static void open(String screen) {
    driver.get("about:blank");
    driver.get(server.url().resolve("/#" + screen).toString());
    waiting()
        .until(
            d ->
                !d.findElement(By.id("project-counts")).getText().isEmpty()
                    && d.findElement(By.id("screen-" + screen)).isDisplayed());
  }

  @Test
  void theCodingScreenShowsTheStartAndFetchesTheRestOnShowAll() {
    open("coding");
    waiting().until(d -> text("#coding-text").length() == ShownText.MAX_CHARS);
    assertEquals(longAnswer.substring(0, ShownText.MAX_CHARS), text("#coding-text"));
    // the device value holds U+202E: it sits in its own <bdi>, isolated from the rest of the line
    Object isolated =
        ((JavascriptExecutor) driver)
            .executeScript(
                "return [...document.querySelectorAll('#coding-card-title bdi')]"
                    + ".some(b => b.textContent.includes('\\u202E')"
                    + " && getComputedStyle(b).unicodeBidi === 'isolate')");
    assertEquals(Boolean.TRUE, isolated);
    // Suggestions arriving redraw the card: click the button the card shows now.
    waiting()
        .until(
            d -> {
              d.findElement(By.cssSelector("#coding-card .show-all")).click();
              return true;
            });
    waiting().until(d -> text("#coding-text").length() == longAnswer.length());
    assertEquals(longAnswer, text("#coding-text"));
    assertTrue(driver.findElements(By.cssSelector("#coding-card .show-all")).isEmpty());
  }

  @Test
  void findAnswersShowsTheStartAndTheWholeOnRequest() {
    open("find");
    driver.findElement(By.id("find-query")).sendKeys("zanzibarish\n");
    waiting().until(d -> !d.findElements(By.cssSelector("#find-hits .hit .show-all")).isEmpty());
    assertEquals(ShownText.MAX_CHARS, text("#find-hits .hit .answer").length());
    driver.findElement(By.cssSelector("#find-hits .hit .show-all")).click();
    waiting().until(d -> text("#find-hits .hit .answer").endsWith("zanzibarish"));
    assertTrue(driver.findElements(By.cssSelector("#find-hits .hit .show-all")).isEmpty());
  }
}
