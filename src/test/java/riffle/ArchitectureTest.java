package riffle;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Keeps the package map of DESIGN.md section 3: dependencies point one way, no stage reaches the
 * store, the web layer or the command line, and {@code model} and {@code stats} use the JDK only.
 */
class ArchitectureTest {
  static final Path SOURCES = Path.of("src/main/java/riffle");

  /** Which Riffle packages each package may use (DESIGN.md section 3). */
  static final Map<String, Set<String>> ALLOWED =
      Map.ofEntries(
          Map.entry("model", Set.of()),
          Map.entry("stats", Set.of()),
          Map.entry("csv", Set.of()),
          Map.entry("words", Set.of()),
          Map.entry("ingest", Set.of("model", "words")),
          Map.entry("text", Set.of("model", "words")),
          Map.entry("store", Set.of("model")),
          Map.entry("index", Set.of("model", "text")),
          Map.entry("phrases", Set.of("model", "text", "index", "stats", "words")),
          Map.entry("coding", Set.of("model", "text", "index", "csv", "words")),
          Map.entry("report", Set.of("model", "stats", "index", "csv", "words")),
          Map.entry("quotes", Set.of("model", "text", "index", "stats", "csv", "words")),
          Map.entry(
              "app",
              Set.of(
                  "model", "ingest", "text", "stats", "index", "phrases", "coding", "report",
                  "quotes", "store", "csv", "words")),
          Map.entry("web", Set.of("app", "model")),
          // cli starts the web server for `serve` and `demo` (WebServer) and shares its JSON style
          // (ApiJson).
          Map.entry("cli", Set.of("app", "model", "web")));

  /** Libraries the JDK-only packages may not touch. */
  static final Set<String> JDK_ONLY = Set.of("model", "stats", "words");

  /** Packages that may use the JDK and one library only, with that library's package prefix. */
  static final Map<String, String> ONE_LIBRARY = Map.of("csv", "org.apache.commons.csv.");

  static final Pattern RIFFLE_USE = Pattern.compile("\\briffle\\.([a-z]+)\\.[A-Za-z]");
  static final Pattern IMPORT = Pattern.compile("^import (static )?([\\w.]+)", Pattern.MULTILINE);

  @Test
  void everyPackageIsOneOfTheDesignedStages() throws IOException {
    try (Stream<Path> dirs = Files.list(SOURCES)) {
      for (Path d : dirs.filter(Files::isDirectory).toList()) {
        String name = d.getFileName().toString();
        assertTrue(ALLOWED.containsKey(name), "package riffle." + name + " is not in DESIGN.md");
        assertTrue(
            Files.exists(d.resolve("package-info.java")),
            "riffle." + name + " needs a package-info.java saying what it does");
      }
    }
  }

  @Test
  void dependenciesPointOneWay() throws IOException {
    List<String> violations = new ArrayList<>();
    for (Path file : javaFiles()) {
      String pkg = SOURCES.relativize(file).getName(0).toString();
      String code = stripComments(Files.readString(file, StandardCharsets.UTF_8));
      Matcher m = RIFFLE_USE.matcher(code);
      while (m.find()) {
        String used = m.group(1);
        if (!used.equals(pkg) && !ALLOWED.getOrDefault(pkg, Set.of()).contains(used)) {
          violations.add(SOURCES.relativize(file) + " uses riffle." + used);
        }
      }
      if (JDK_ONLY.contains(pkg) || ONE_LIBRARY.containsKey(pkg)) {
        String library = ONE_LIBRARY.getOrDefault(pkg, "java.");
        Matcher imports = IMPORT.matcher(code);
        while (imports.find()) {
          String imported = imports.group(2);
          if (!imported.startsWith("java.")
              && !imported.startsWith(library)
              && !imported.startsWith("riffle." + pkg)) {
            violations.add(SOURCES.relativize(file) + " imports " + imported);
          }
        }
      }
    }
    assertEquals(List.of(), violations);
  }

  private static List<Path> javaFiles() throws IOException {
    try (Stream<Path> files = Files.walk(SOURCES)) {
      return files.filter(p -> p.toString().endsWith(".java")).toList();
    }
  }

  /** Drops comments so that Javadoc mentioning another package does not count as a use. */
  private static String stripComments(String code) {
    return code.replaceAll("(?s)/\\*.*?\\*/", "").replaceAll("//[^\\n]*", "");
  }
}
