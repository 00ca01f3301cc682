package riffle.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
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
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.app.Project;
import riffle.model.Progress;

/**
 * The page in Debian's Chromium, headless: bringing in a pasted wave, a bad paste, a hostile answer
 * shown as text, and the phrases of a demo-like project. Screenshots go to target/screenshots/.
 */
@Tag("browser")
class WebBrowserTest {
  @TempDir static Path dir;
  static WebServer server;
  static ChromeDriver driver;
  static Path profile;
  static final Path SHOTS = Path.of("target", "screenshots");

  @BeforeAll
  static void start() throws Exception {
    Path project = dir.resolve("shop.riffle");
    for (String[] wave :
        List.of(
            new String[] {"sample-responses/wave-2.csv", "Wave 2"},
            new String[] {"sample-responses/wave-3.csv", "Wave 3"})) {
      Project.importInto(
          project,
          ImportRequest.from(new ImportSource.File(Path.of(wave[0]))).wave(wave[1]).get(),
          Progress.NONE);
    }
    Project.importInto(
        project,
        ImportRequest.from(new ImportSource.File(WebServerTest.fixture("small-wave.csv")))
            .wave("Wave 4")
            .get(),
        Progress.NONE);
    server = WebServer.start(project, WebServer.Options.defaults().webDir(Path.of("web")));
    profile = Chromium.profile();
    driver = Chromium.start(profile, "1280,1400");
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
    return Chromium.waiting(driver, 30);
  }

  static void open(String screen) {
    // A fresh page each time: a change of #fragment alone would keep the last test's page.
    driver.get("about:blank");
    driver.get(server.url().resolve("/#" + screen).toString());
    waiting()
        .until(
            d ->
                !d.findElement(By.id("project-counts")).getText().isEmpty()
                    && d.findElement(By.id("screen-" + screen)).isDisplayed());
  }

  static void shot(String name) throws IOException {
    Path png = ((TakesScreenshot) driver).getScreenshotAs(OutputType.FILE).toPath();
    Files.copy(png, SHOTS.resolve(name + ".png"), StandardCopyOption.REPLACE_EXISTING);
  }

  static void paste(String text) {
    WebElement area = driver.findElement(By.id("bring-paste"));
    ((JavascriptExecutor) driver)
        .executeScript(
            "arguments[0].value = arguments[1];"
                + " arguments[0].dispatchEvent(new Event('input', {bubbles: true}));",
            area,
            text);
  }

  @Test
  void aPastedWaveIsBroughtInWithAChangedColumnRole() throws Exception {
    open("bring");
    paste(
        "respondent\tplan\tWhat made you choose us?\n"
            + "B-1\tbasic\tHalf the price of a new grinder, and it looked new\n"
            + "B-2\tplus\tThe chat answered my question about the warranty in minutes\n"
            + "B-3\tbasic\tLess waste than buying new, which matters to me\n"
            + "B-4\tplus\tThe reviews said the refurbished machines last for years\n"
            + "B-5\tbasic\tFree returns for thirty days made it an easy yes\n");
    driver.findElement(By.id("bring-read")).click();
    waiting().until(ExpectedConditions.visibilityOfElementLocated(By.id("bring-table")));
    assertTrue(
        driver.findElement(By.id("bring-readas")).getText().contains("separated by tab"),
        driver.findElement(By.id("bring-readas")).getText());
    WebElement plan = driver.findElement(By.cssSelector("select.role[data-column='plan']"));
    assertEquals("meta", new Select(plan).getFirstSelectedOption().getDomProperty("value"));
    // Each column says why it has its role before anything is stored.
    assertEquals(
        "the header asks a question",
        driver.findElements(By.cssSelector("#bring-table th .why")).get(2).getText());
    shot("bring-reasons");
    new Select(plan).selectByValue("ignored");
    waiting().until(d -> !d.findElements(By.cssSelector("#bring-table td.left-out")).isEmpty());
    WebElement wave = driver.findElement(By.id("bring-wave-name"));
    wave.clear();
    wave.sendKeys("Wave 5");
    driver.findElement(By.id("bring-date")).sendKeys("11012026");
    shot("bring-preview");
    driver.findElement(By.id("bring-go")).click();
    waiting().until(ExpectedConditions.visibilityOfElementLocated(By.id("bring-done")));
    assertTrue(
        driver.findElement(By.id("bring-done")).getText().contains("5 answers added"),
        driver.findElement(By.id("bring-done")).getText());
    waiting().until(d -> d.findElement(By.id("project-counts")).getText().startsWith("4 waves"));
    shot("bring-done");
  }

  @Test
  void aWorkbookIsChosenAndPreviewedFromItsSheet() throws Exception {
    open("bring");
    WebElement file = driver.findElement(By.id("bring-file"));
    assertTrue(file.getDomAttribute("accept").contains(".xlsx"), file.getDomAttribute("accept"));
    Path book = Files.createTempFile("choose-", ".xlsx");
    Files.write(
        book,
        riffle.ingest.Workbooks.of(
            "Answers",
            new Object[] {"respondent", "What made you choose us?"},
            new Object[] {"B-1", "Half the price of a new grinder, and it looked new"},
            new Object[] {"B-2", "The chat answered my question about the warranty in minutes"},
            new Object[] {"B-3", "Free returns for thirty days made it an easy yes"}));
    file.sendKeys(book.toString());
    waiting().until(ExpectedConditions.visibilityOfElementLocated(By.id("bring-table")));
    String readAs = driver.findElement(By.id("bring-readas")).getText();
    assertTrue(readAs.contains("Read from the Excel workbook (sheet 'Answers')"), readAs);
    assertTrue(readAs.contains("3 rows"), readAs);
    assertTrue(
        driver.findElement(By.id("bring-table")).getText().contains("Free returns"),
        driver.findElement(By.id("bring-table")).getText());
    Files.delete(book);
  }

  @Test
  void aBadPasteShowsItsErrorWhereItHappened() throws Exception {
    open("bring");
    paste(Files.readString(WebServerTest.fixture("unclosed-quote.tsv"), StandardCharsets.UTF_8));
    driver.findElement(By.id("bring-read")).click();
    WebElement error =
        waiting().until(ExpectedConditions.visibilityOfElementLocated(By.id("bring-paste-error")));
    assertTrue(error.getText().contains("line 3"), error.getText());
    assertTrue(error.getText().contains("The warranty page never loaded"), error.getText());
    assertEquals("true", driver.findElement(By.id("bring-paste")).getDomAttribute("aria-invalid"));
    assertTrue(driver.findElement(By.id("bring-preview")).getDomAttribute("hidden") != null);
    shot("bring-error");
  }

  @Test
  void aHostileAnswerIsShownAsText() throws Exception {
    open("phrases");
    driver.findElement(By.tagName("body")).sendKeys("/");
    waiting().until(d -> "find-query".equals(d.switchTo().activeElement().getDomAttribute("id")));
    driver.switchTo().activeElement().sendKeys("onerror OR \"delivery date\"", Keys.ENTER);
    waiting().until(d -> !d.findElements(By.cssSelector("#find-hits .hit")).isEmpty());
    List<String> answers =
        driver.findElements(By.cssSelector("#find-hits .answer")).stream()
            .map(WebElement::getText)
            .toList();
    assertTrue(answers.contains(WebServerTest.HOSTILE), answers.toString());
    assertEquals(List.of(), driver.findElements(By.tagName("img")), "no image was created");
    assertEquals(
        List.of(), driver.findElements(By.cssSelector("#find-hits img")), "the answer stayed text");
    assertThrows(NoAlertPresentException.class, () -> driver.switchTo().alert());
    assertTrue(!driver.findElements(By.cssSelector("#find-hits mark")).isEmpty());
    assertTrue(driver.findElement(By.id("find-summary")).getText().contains("Wave 4"));
    shot("find");

    WebElement input = driver.findElement(By.id("find-query"));
    input.clear();
    input.sendKeys("(delivery OR price", Keys.ENTER);
    WebElement error =
        waiting().until(ExpectedConditions.visibilityOfElementLocated(By.id("find-error")));
    assertTrue(error.getText().contains("column 19"), error.getText());
    shot("find-error");
  }

  @Test
  void thePhrasesScreenListsPhrasesAndLeadsToTheirAnswers() throws Exception {
    open("phrases");
    new Select(driver.findElement(By.id("phrases-question"))).selectByValue("1");
    new Select(driver.findElement(By.id("phrases-wave"))).selectByVisibleText("Wave 3");
    new Select(driver.findElement(By.id("phrases-against"))).selectByVisibleText("Wave 2");
    driver.findElement(By.id("phrases-go")).click();
    waiting()
        .until(
            d ->
                d.findElement(By.id("phrases-status")).getText().contains("mined")
                    && d.findElements(By.cssSelector("#phrases-table tbody tr")).size() >= 5);
    assertTrue(!driver.findElements(By.id("h-phrases-keyness")).isEmpty());
    shot("phrases");
    WebElement first = driver.findElement(By.cssSelector("#phrases-table tbody button.link"));
    String phrase = first.getText();
    first.click();
    waiting().until(d -> !d.findElements(By.cssSelector("#find-hits .hit")).isEmpty());
    String query = driver.findElement(By.id("find-query")).getDomProperty("value");
    assertTrue(query.contains(phrase) && query.contains("wave:\"Wave 3\""), query);
    assertTrue(driver.findElement(By.id("find-total")).getText().contains("match"));
  }
}
