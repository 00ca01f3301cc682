package riffle.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.net.http.HttpRequest;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.OptionalLong;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.Keys;
import org.openqa.selenium.NoAlertPresentException;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.support.ui.WebDriverWait;
import riffle.app.AnswerPage;
import riffle.app.AnswerQuery;
import riffle.app.Project;
import riffle.model.CopyBoard;
import riffle.model.QuoteSlot;

/**
 * The copy board in Debian's Chromium, headless, over the precoded pilot with its themes marked
 * praise or friction: a headline idea pinned by button and an objection by key, a working line, a
 * reorder by keyboard, everything still there after a reload, an export link that downloads the
 * board with its consent notice, and a hostile answer on the board shown as text.
 */
@Tag("browser")
class BoardBrowserTest {
  @TempDir static Path dir;
  static WebServer server;
  static ChromeDriver driver;
  static Path profile;
  static final Path SHOTS = Path.of("target", "screenshots");

  @BeforeAll
  static void start() throws Exception {
    Path project = BoardProject.build(dir);
    try (Project p = Project.openExisting(project)) {
      AnswerPage page =
          p.answers()
              .page(
                  new AnswerQuery(
                      Optional.of("Wave 2"),
                      OptionalInt.empty(),
                      Map.of(),
                      Optional.empty(),
                      OptionalLong.empty(),
                      "",
                      0,
                      50));
      long hostile =
          page.answers().stream()
              .filter(a -> a.text().contains(WebServerTest.HOSTILE))
              .findFirst()
              .orElseThrow()
              .id();
      p.quotes().pin("setup", QuoteSlot.PROOF, hostile, WebServerTest.HOSTILE, "fast delivery");
    }
    // a quote pinned while an older masker left an address in the answer: taken off on opening
    try (java.sql.Connection c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + project);
        java.sql.Statement s = c.createStatement()) {
      s.executeUpdate(
          "INSERT INTO board_item (id, slot, position, answer_id, code, text) SELECT 999,"
              + " 'headline', 1, max(answer_id), 'fast delivery', 'sent to 14 Larkmead Road'"
              + " FROM board_item");
    }
    server = WebServer.start(project, WebServer.Options.defaults().webDir(Path.of("web")));
    profile = Chromium.profile();
    driver = Chromium.start(profile, "1280,1100");
    Files.createDirectories(SHOTS);
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

  static Object js(String script, Object... args) {
    return ((JavascriptExecutor) driver).executeScript(script, args);
  }

  static String text(String css) {
    return String.valueOf(
        js("const e = document.querySelector(arguments[0]); return e ? e.textContent : '';", css));
  }

  static long count(String css) {
    return (Long) js("return document.querySelectorAll(arguments[0]).length;", css);
  }

  static void openBoard() {
    driver.get("about:blank");
    driver.get(server.url().resolve("/#board").toString());
    waiting()
        .until(
            d ->
                !d.findElement(By.id("project-counts")).getText().isEmpty()
                    && d.findElement(By.id("screen-board")).isDisplayed()
                    && count(".cand-group[data-slot='headline'] .cand") > 0
                    && count("#board-slots .slot") == 5);
  }

  static JsonNode board() throws Exception {
    WebServerTest.server = server;
    return WebServerTest.send(HttpRequest.newBuilder(server.url().resolve("/api/board")).GET())
        .json();
  }

  static String pinnedText(String slot, int n) {
    return text(
        "#board-slots .slot[data-slot='"
            + slot
            + "'] .pinned > li:nth-child("
            + n
            + ") .quote-text");
  }

  @Test
  void quotesArePinnedOrderedAnnotatedKeptAndExported() throws Exception {
    openBoard();
    driver.findElement(By.id("board-coder-name")).sendKeys("Mia");
    driver.findElement(By.id("board-coder-go")).click();
    assertEquals(CopyBoard.CONSENT_NOTICE, text("#board-consent"), "the notice is on the board");
    assertTrue(
        text("#board-taken-off").startsWith("Took quote 1 of Headline ideas"),
        "the page says which quote was taken off: " + text("#board-taken-off"));

    // the hostile answer pinned as proof shows as its characters, nothing runs
    waiting().until(d -> pinnedText("proof", 1).equals(WebServerTest.HOSTILE));
    assertEquals(0, count("img"), "no img element made from an answer");
    assertThrows(NoAlertPresentException.class, () -> driver.switchTo().alert());

    String headline = text(".cand-group[data-slot='headline'] .cand:nth-child(1) .quote-text");
    String second = text(".cand-group[data-slot='headline'] .cand:nth-child(2) .quote-text");
    String objection = text(".cand-group[data-slot='objection'] .cand:nth-child(1) .quote-text");
    driver
        .findElement(By.cssSelector(".cand-group[data-slot='headline'] .cand:nth-child(1) .pin"))
        .click();
    waiting().until(d -> pinnedText("headline", 1).equals(headline));
    WebElement cand =
        driver.findElement(By.cssSelector(".cand-group[data-slot='objection'] .cand:nth-child(1)"));
    js("arguments[0].focus();", cand);
    cand.sendKeys("p");
    waiting().until(d -> pinnedText("objection", 1).equals(objection));
    driver
        .findElement(By.cssSelector(".cand-group[data-slot='headline'] .cand:nth-child(2) .pin"))
        .click();
    waiting().until(d -> pinnedText("headline", 2).equals(second));

    // reorder by keyboard: the second headline idea goes up
    WebElement item =
        driver.findElement(By.cssSelector(".slot[data-slot='headline'] .pinned > li:nth-child(2)"));
    js("arguments[0].focus();", item);
    item.sendKeys(Keys.chord(Keys.ALT, Keys.ARROW_UP));
    waiting().until(d -> pinnedText("headline", 1).equals(second));
    assertEquals(pinnedText("headline", 2), headline);

    WebElement line = driver.findElement(By.id("board-line-headline-0"));
    line.sendKeys("Yours tomorrow, as good as new", Keys.ENTER);
    waiting()
        .until(
            d -> {
              try {
                JsonNode items = board().get("slots").get(0).get("items");
                return "Yours tomorrow, as good as new"
                    .equals(items.get(0).path("working_line").asText());
              } catch (Exception e) {
                return false;
              }
            });
    // after a reload everything is still there
    openBoard();
    waiting().until(d -> pinnedText("headline", 1).equals(second));
    assertEquals(headline, pinnedText("headline", 2));
    assertEquals(objection, pinnedText("objection", 1));
    assertEquals(
        "Yours tomorrow, as good as new",
        driver.findElement(By.id("board-line-headline-0")).getAttribute("value"));
    assertTrue(text("#board-coder").contains("Mia"), "the coder is remembered");
    js("window.scrollTo(0, 0);");
    Files.copy(
        ((TakesScreenshot) driver).getScreenshotAs(OutputType.FILE).toPath(),
        SHOTS.resolve("board.png"),
        StandardCopyOption.REPLACE_EXISTING);

    // the export link downloads the board, notice and answer ids included
    String href = driver.findElement(By.id("board-export-md")).getAttribute("href");
    Object got =
        ((JavascriptExecutor) driver)
            .executeAsyncScript(
                "const done = arguments[arguments.length - 1];"
                    + "fetch(arguments[0]).then(r => r.text().then(t => done(r.status + '\\n' + t)))"
                    + ".catch(e => done('failed ' + e));",
                href);
    String md = String.valueOf(got);
    assertTrue(md.startsWith("200\n"), md);
    assertTrue(md.contains("consent"), md);
    assertTrue(md.contains("Yours tomorrow, as good as new"), md);
    long answerId = board().get("slots").get(3).get("items").get(0).get("answer_id").asLong();
    assertTrue(md.contains(Long.toString(answerId)), "the objection's answer id is in the export");
  }
}
