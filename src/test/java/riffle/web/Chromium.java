package riffle.web;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Comparator;
import java.util.stream.Stream;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.StaleElementReferenceException;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * Debian's Chromium, headless, with its own fresh profile, for the browser tests (the settings in
 * STACK.md: no downloads, no background networking).
 */
final class Chromium {
  private Chromium() {}

  /** A fresh profile folder for one browser. */
  static Path profile() throws IOException {
    return Files.createTempDirectory("riffle-chromium-");
  }

  /** Starts the browser with a window of {@code size} ("WIDTH,HEIGHT"). */
  static ChromeDriver start(Path profile, String size) {
    ChromeOptions options = new ChromeOptions();
    options.setBinary("/usr/bin/chromium");
    options.addArguments(
        "--headless=new",
        "--no-sandbox",
        "--disable-dev-shm-usage",
        "--disable-gpu",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        "--no-first-run",
        "--window-size=" + size,
        "--user-data-dir=" + profile);
    ChromeDriverService service =
        new ChromeDriverService.Builder()
            .usingDriverExecutable(new File("/usr/bin/chromedriver"))
            .usingAnyFreePort()
            .build();
    return new ChromeDriver(service, options);
  }

  /** Quits the browser (when started) and deletes its profile (when made). */
  static void stop(WebDriver driver, Path profile) throws IOException {
    if (driver != null) {
      driver.quit();
    }
    if (profile != null) {
      try (Stream<Path> files = Files.walk(profile)) {
        files.sorted(Comparator.reverseOrder()).map(Path::toFile).forEach(File::delete);
      }
    }
  }

  /** A wait of up to a minute that polls every 50 ms (the default 500 ms slows every step). */
  static WebDriverWait waiting(WebDriver driver) {
    return waiting(driver, 60);
  }

  /**
   * A wait of up to {@code seconds} polling every 50 ms. An element the page redrew between being
   * found and being read is looked for again on the next poll, not a failure: the coding screen
   * redraws its card whenever suggestions or changes made elsewhere arrive.
   */
  static WebDriverWait waiting(WebDriver driver, int seconds) {
    return (WebDriverWait)
        new WebDriverWait(driver, Duration.ofSeconds(seconds))
            .pollingEvery(Duration.ofMillis(50))
            .ignoring(StaleElementReferenceException.class);
  }

  /** The text of the first element matching {@code css}, or "" when there is none. */
  static String text(WebDriver driver, String css) {
    Object t =
        ((JavascriptExecutor) driver)
            .executeScript(
                "const e = document.querySelector(arguments[0]); return e ? e.textContent : '';",
                css);
    return String.valueOf(t);
  }
}
