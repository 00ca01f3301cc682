package riffle.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.net.http.HttpRequest;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.interactions.Actions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;
import riffle.app.Project;
import riffle.model.CodeDraft;

/**
 * The coding screen's "Random order (sample)" in Debian's Chromium, headless, over the small
 * fixture wave: the answers come in the queue's order, and the sentence under the progress turns
 * from "Random order" to "Random sample" once the first answer is coded by key.
 */
@Tag("browser")
class QueueBrowserTest {
  @TempDir static Path dir;
  static WebServer server;
  static ChromeDriver driver;
  static Path profile;

  @BeforeAll
  static void start() throws Exception {
    Path project = WebServerTest.smallProject(dir);
    try (Project p = Project.openExisting(project)) {
      p.codebook()
          .create(
              "ana",
              new CodeDraft(
                  java.util.Optional.of("Doubts"),
                  java.util.Optional.empty(),
                  java.util.Optional.empty(),
                  java.util.Optional.empty(),
                  java.util.Optional.empty(),
                  java.util.Optional.of("d"),
                  java.util.Optional.empty(),
                  java.util.Optional.empty()));
    }
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

  /** The masked texts of the queue's order, as the API serves them. */
  static JsonNode order() throws Exception {
    return WebServerTest.send(
            HttpRequest.newBuilder(
                    server.url().resolve("/api/queues/answers?wave=Wave%201&question=1&offset=0"))
                .GET())
        .json()
        .get("answers");
  }

  @Test
  void theCodingScreenServesTheRandomOrderAndSaysTheReadingIsARandomSample() throws Exception {
    driver.get(server.url().resolve("/#coding").toString());
    ((JavascriptExecutor) driver).executeScript("localStorage.setItem('riffle.coder', 'ana');");
    driver.get("about:blank");
    driver.get(server.url().resolve("/#coding").toString());
    waiting().until(d -> text("#coding-card-title").contains("Wave 1"));
    new Select(driver.findElement(By.id("coding-wave"))).selectByVisibleText("Wave 1");
    new Select(driver.findElement(By.id("coding-question"))).selectByValue("1");
    new Select(driver.findElement(By.id("coding-order"))).selectByValue("random");
    waiting().until(d -> text("#coding-sample").startsWith("Random order."));
    assertTrue(text("#coding-card-title").startsWith("Answer 1 of 11"), text("#coding-card-title"));
    JsonNode order = order();
    assertEquals(order.get(0).get("text").asText(), text("#coding-text"));

    driver.findElement(By.id("coding-work")).click();
    new Actions(driver).sendKeys("d").perform();
    waiting().until(d -> text("#coding-sample").startsWith("Random sample."));
    assertTrue(text("#coding-sample").contains("the first 1 of 11"), text("#coding-sample"));

    new Actions(driver).sendKeys("j").perform();
    waiting().until(d -> text("#coding-card-title").startsWith("Answer 2 of 11"));
    assertEquals(order.get(1).get("text").asText(), text("#coding-text"));
    Path shots = Path.of("target", "screenshots");
    Files.createDirectories(shots);
    Path png = ((TakesScreenshot) driver).getScreenshotAs(OutputType.FILE).toPath();
    Files.copy(png, shots.resolve("coding-random-order.png"), StandardCopyOption.REPLACE_EXISTING);

    // Back to the stored order: the sentence goes.
    new Select(driver.findElement(By.id("coding-order"))).selectByValue("");
    waiting().until(d -> !driver.findElement(By.id("coding-sample")).isDisplayed());
  }
}
