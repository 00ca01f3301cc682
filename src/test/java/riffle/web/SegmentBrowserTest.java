package riffle.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
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
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * The segment picker in Debian's Chromium, headless, over the segment fixture: the coding screen
 * lists the device values with their read bases and limits its answers to the one picked, and the
 * findings screen split by device shows each value's share of "Delivery" with its base, flags the
 * small ones, and names the value where it is highest among bases of 30 or more (mobile, not the 4
 * of 4 without a device).
 */
@Tag("browser")
class SegmentBrowserTest {
  @TempDir static Path dir;
  static WebServer server;
  static ChromeDriver driver;
  static Path profile;

  @BeforeAll
  static void start() throws Exception {
    server =
        WebServer.start(
            SegmentProject.build(dir), WebServer.Options.defaults().webDir(Path.of("web")));
    profile = Chromium.profile();
    driver = Chromium.start(profile, "1280,1400");
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

  @Test
  void theCodingScreenListsEachValueWithItsReadBase() throws IOException {
    driver.get(server.url().resolve("/#coding").toString());
    waiting().until(d -> text("#coding-segment-column").contains("device"));
    new Select(driver.findElement(By.id("coding-segment-column"))).selectByValue("device");
    List<String> values =
        new Select(driver.findElement(By.id("coding-segment")))
            .getOptions().stream().map(WebElement::getText).toList();
    assertEquals(
        List.of(
            "every value",
            "desktop \u2014 10 answers, 8 read, small base",
            "mobile \u2014 36 answers, 35 read",
            "(no value) \u2014 4 answers, 4 read, small base (cannot be picked)"),
        values);

    // Picking mobile limits the answers to all three spellings of it.
    new Select(driver.findElement(By.id("coding-segment"))).selectByValue("mobile");
    driver.findElement(By.id("coding-go")).click();
    waiting().until(d -> text("#coding-progress").startsWith("Read 35 of 35 answers"));
    assertTrue(text("#coding-progress").contains("1 non-answer apart"), text("#coding-progress"));
    shot("coding-segment-picker.png");
  }

  static void shot(String name) throws IOException {
    Path shots = Path.of("target", "screenshots");
    Files.createDirectories(shots);
    Path png = ((TakesScreenshot) driver).getScreenshotAs(OutputType.FILE).toPath();
    Files.copy(png, shots.resolve(name), StandardCopyOption.REPLACE_EXISTING);
  }

  @Test
  void theFindingsSplitByASegmentShowSharesAndFlagSmallBases() throws Exception {
    driver.get(server.url().resolve("/#findings").toString());
    waiting().until(d -> text("#findings-segment-column").contains("device"));
    new Select(driver.findElement(By.id("findings-segment-column"))).selectByValue("device");
    waiting().until(d -> text("#findings-q1-segments").contains("By device"));
    String coverage = text("#findings-q1-segment-coverage");
    assertTrue(coverage.contains("read 35 of 35 (100%)"), coverage);
    assertTrue(coverage.contains("read 8 of 10 (80%)"), coverage);
    String delivery =
        String.valueOf(
            ((JavascriptExecutor) driver)
                .executeScript(
                    "return [...document.querySelectorAll('#findings-q1-segments .segment-code')]"
                        + ".find((f) => f.querySelector('strong').textContent === 'Delivery')"
                        + ".textContent;"));
    assertTrue(
        delivery.contains("highest in \u201cmobile\u201d in Wave 1: 51.4% (18 of 35)"), delivery);
    assertTrue(delivery.contains("12.5%"), delivery);
    assertTrue(delivery.contains("1 of 8small base"), delivery);
    assertTrue(delivery.contains("4 of 4small base"), delivery);
    Object dashed =
        ((JavascriptExecutor) driver)
            .executeScript(
                "return document.querySelectorAll('#findings-q1-segments .segment-share.small-base"
                    + " line.interval.weak').length;");
    assertTrue(((Number) dashed).intValue() >= 2, "small bases are drawn dashed: " + dashed);
    ((JavascriptExecutor) driver)
        .executeScript("document.getElementById('findings-q1-segments').scrollIntoView();");
    shot("findings-by-segment.png");
  }
}
