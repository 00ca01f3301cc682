package riffle.web;

import java.io.File;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.interactions.Actions;
import org.openqa.selenium.support.ui.WebDriverWait;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.app.Project;
import riffle.model.CodeDraft;
import riffle.model.Progress;
import riffle.tools.SampleResponses;

/**
 * Bench command: in a project of 50,000 respondents (100,000 answers), measures in headless
 * Chromium the time from navigation to the coding screen's first useful paint (the first answer and
 * its codes drawn: the page's {@code coding-first-answer} mark), the key-press-to-update latency (a
 * code key's keydown to the DOM showing the code, and to the next animation frame; median and p95
 * over 50 presses), and the API's round trip for one assignment (p50, p95 over 300 requests). Run
 * with {@code mvn -q test-compile exec:java -Dexec.classpathScope=test
 * -Dexec.mainClass=riffle.web.WorkbenchBench [-Dexec.args="RESPONDENTS"]}.
 */
public final class WorkbenchBench {
  private WorkbenchBench() {}

  public static void main(String[] args) throws Exception {
    int respondents = args.length > 0 ? Integer.parseInt(args[0]) : 50_000;
    Path dir = Files.createTempDirectory("riffle-workbench-bench");
    Path export = dir.resolve("large.csv");
    SampleResponses.writeLargeExport(export, respondents, 42L);
    Path file = dir.resolve("bench.riffle");
    long t = System.nanoTime();
    Project.importInto(
        file, ImportRequest.from(new ImportSource.File(export)).wave("Bench").get(), Progress.NONE);
    System.out.printf(Locale.ROOT, "import: %.1f s%n", (System.nanoTime() - t) / 1e9);
    long firstCode;
    int answers;
    try (Project p = Project.openExisting(file)) {
      answers = p.answerIds().size();
      firstCode =
          p.codebook()
              .create("bench", CodeDraft.named("Theme 0").toBuilder().key("a").build())
              .id();
      for (int i = 1; i < 40; i++) {
        CodeDraft d = CodeDraft.named("Theme " + i);
        p.codebook()
            .create(
                "bench", i < 8 ? d.toBuilder().key(Character.toString('b' + i - 1)).build() : d);
      }
    }
    Path profile = Files.createTempDirectory("riffle-bench-chromium-");
    try (WebServer server = WebServer.start(file, WebServer.Options.defaults())) {
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
          "--window-size=1280,1000",
          "--user-data-dir=" + profile);
      ChromeDriverService service =
          new ChromeDriverService.Builder()
              .usingDriverExecutable(new File("/usr/bin/chromedriver"))
              .usingAnyFreePort()
              .build();
      ChromeDriver driver = new ChromeDriver(service, options);
      try {
        JavascriptExecutor js = driver;
        WebDriverWait wait =
            (WebDriverWait)
                new WebDriverWait(driver, Duration.ofSeconds(60))
                    .pollingEvery(Duration.ofMillis(10));
        driver.get(server.url().toString());
        js.executeScript("localStorage.setItem('riffle.coder', 'bench')");
        List<Double> paints = new ArrayList<>();
        for (int i = 0; i < 6; i++) {
          driver.get("about:blank");
          driver.get(server.url().resolve("/#coding").toString());
          Object mark =
              wait.until(
                  d ->
                      js.executeScript(
                          "const m = performance.getEntriesByName('coding-first-answer');"
                              + " return m.length ? m[0].startTime : null;"));
          if (i > 0) {
            paints.add(((Number) mark).doubleValue()); // the first load warms the server
          }
        }
        js.executeScript(
            "window.__lat = []; window.__t0 = 0;"
                + " window.addEventListener('keydown', () => { window.__t0 = performance.now(); },"
                + " true);"
                + " new MutationObserver(() => {"
                + "   if (!window.__t0 || !document.querySelector('#coding-codes [data-code=\""
                + firstCode
                + "\"]')) return;"
                + "   const t0 = window.__t0; window.__t0 = 0; const dom = performance.now() - t0;"
                + "   requestAnimationFrame(() => window.__lat.push([dom, performance.now() - t0]));"
                + " }).observe(document.getElementById('coding-work'), {childList: true, subtree:"
                + " true});");
        for (int i = 0; i < 50; i++) {
          int n = i;
          new Actions(driver).sendKeys("a").perform();
          wait.until(d -> ((Number) js.executeScript("return window.__lat.length")).intValue() > n);
          new Actions(driver).sendKeys("j").perform();
          String title = "Answer " + (i + 2) + " of";
          wait.until(
              d ->
                  String.valueOf(
                          js.executeScript(
                              "return document.getElementById('coding-card-title').textContent"))
                      .startsWith(title));
        }
        wait.until(
            d ->
                String.valueOf(
                        js.executeScript(
                            "return document.getElementById('coding-saving').textContent"))
                    .startsWith("Saved"));
        @SuppressWarnings("unchecked")
        List<List<Number>> lat = (List<List<Number>>) js.executeScript("return window.__lat");
        List<Double> dom = new ArrayList<>();
        List<Double> frame = new ArrayList<>();
        for (List<Number> l : lat) {
          dom.add(l.get(0).doubleValue());
          frame.add(l.get(1).doubleValue());
        }
        System.out.printf(
            Locale.ROOT,
            "%,d answers; first useful paint of the coding screen: median %.0f ms, max %.0f ms"
                + " (%d loads)%n",
            answers,
            pct(paints, 0.5),
            pct(paints, 1.0),
            paints.size());
        System.out.printf(
            Locale.ROOT,
            "key press to code shown (%d presses): DOM median %.1f ms, p95 %.1f ms; next frame"
                + " median %.1f ms, p95 %.1f ms%n",
            dom.size(),
            pct(dom, 0.5),
            pct(dom, 0.95),
            pct(frame, 0.5),
            pct(frame, 0.95));
      } finally {
        driver.quit();
      }
      apiBench(server.url(), firstCode, answers);
    }
  }

  private static void apiBench(URI url, long code, int answers) throws Exception {
    HttpClient http = HttpClient.newHttpClient();
    String origin = url.toString().substring(0, url.toString().length() - 1);
    Random random = new Random(11);
    List<Double> took = new ArrayList<>();
    for (int i = 0; i < 350; i++) {
      long answer = 1 + random.nextInt(answers);
      String path = random.nextInt(4) == 0 ? "/api/assignments/remove" : "/api/assignments";
      String body =
          "{\"coder\":\"bench\",\"answer\":"
              + answer
              + ",\"code\":"
              + (code + random.nextInt(8))
              + "}";
      long t = System.nanoTime();
      HttpResponse<String> r =
          http.send(
              HttpRequest.newBuilder(url.resolve(path))
                  .header("Origin", origin)
                  .header("Content-Type", "application/json")
                  .POST(HttpRequest.BodyPublishers.ofString(body))
                  .build(),
              HttpResponse.BodyHandlers.ofString(StandardCharsets.UTF_8));
      double ms = (System.nanoTime() - t) / 1e6;
      if (r.statusCode() != 200) {
        throw new IllegalStateException("assignment answered " + r.statusCode() + ": " + r.body());
      }
      if (i >= 50) {
        took.add(ms); // the first 50 warm the JIT
      }
    }
    System.out.printf(
        Locale.ROOT,
        "API assignment round trip (%d requests): p50 %.1f ms, p95 %.1f ms, max %.1f ms%n",
        took.size(),
        pct(took, 0.5),
        pct(took, 0.95),
        pct(took, 1.0));
  }

  private static double pct(List<Double> values, double q) {
    List<Double> sorted = new ArrayList<>(values);
    Collections.sort(sorted);
    int i = (int) Math.ceil(q * sorted.size()) - 1;
    return sorted.get(Math.max(0, Math.min(sorted.size() - 1, i)));
  }
}
