package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import riffle.model.InputProblem;

/**
 * Reads every fixture export named by a {@code .expected} file in {@code
 * src/test/resources/riffle/ingest/} and compares what an analyst would see with the expected text.
 * The format is explained in the README.md beside the fixtures. Run with {@code
 * -Driffle.golden.update=true} to rewrite the expectations after a deliberate change, then review
 * the diff before committing it.
 */
class GoldenFixturesTest {
  private static final String UPDATE = "riffle.golden.update";

  @TestFactory
  Stream<DynamicTest> everyFixtureReadsAsExpected() throws IOException, URISyntaxException {
    Path dir = Paths.get(GoldenFixturesTest.class.getResource("README.md").toURI()).getParent();
    List<Path> expected = new ArrayList<>();
    try (Stream<Path> files = Files.list(dir)) {
      files
          .filter(p -> p.getFileName().toString().endsWith(".expected"))
          .sorted()
          .forEach(expected::add);
    }
    assertFalse(expected.isEmpty(), "no .expected files found in " + dir);
    return expected.stream()
        .map(p -> DynamicTest.dynamicTest(p.getFileName().toString(), () -> check(dir, p)));
  }

  private static void check(Path dir, Path expectedFile) throws IOException {
    List<String> lines = Files.readAllLines(expectedFile, StandardCharsets.UTF_8);
    List<String> directives = new ArrayList<>();
    List<String> expected = new ArrayList<>();
    String input = null;
    boolean paste = false;
    ImportSettings.Builder b = ImportSettings.builder();
    for (String line : lines) {
      if (line.startsWith("#") || line.startsWith("input:") || line.startsWith("option:")) {
        directives.add(line);
      } else {
        expected.add(line);
      }
      if (line.startsWith("input:")) {
        input = line.substring("input:".length()).strip();
      } else if (line.startsWith("option:")) {
        String option = line.substring("option:".length()).strip();
        if (option.equals("paste")) {
          paste = true;
        } else {
          apply(b, option);
        }
      }
    }
    if (input == null) {
      throw new IllegalStateException(expectedFile + " has no 'input:' line");
    }
    Path file = dir.resolve(input);
    ImportSettings settings = b.get();
    String actual;
    try {
      SurveyTable t =
          paste
              ? SurveyReader.readPaste(Files.readString(file, StandardCharsets.UTF_8), settings)
              : SurveyReader.readFile(file, settings);
      actual = render(t);
    } catch (UnreadableInputException e) {
      actual = "unreadable: " + e.getMessage() + "\n";
    }
    if (Boolean.getBoolean(UPDATE)) {
      Path source =
          Paths.get("src/test/resources/riffle/ingest").resolve(expectedFile.getFileName());
      Files.writeString(
          source, String.join("\n", directives) + "\n" + actual, StandardCharsets.UTF_8);
      return;
    }
    assertEquals(String.join("\n", expected) + "\n", actual, expectedFile.getFileName().toString());
  }

  private static void apply(ImportSettings.Builder b, String option) {
    int eq = option.indexOf('=');
    String key = option.substring(0, eq).strip();
    String value = option.substring(eq + 1).strip();
    switch (key) {
      case "delimiter" -> b.delimiter(Delimiter.parse(value).orElse(null));
      case "encoding" -> b.encoding(value);
      case "text-column" -> b.textColumn(value);
      case "id-column" -> b.idColumn(value);
      case "date-column" -> b.dateColumn(value);
      case "codes-column" -> b.codesColumn(value);
      case "coder-column" -> b.coderColumn(value);
      case "meta-column" -> b.metaColumn(value);
      case "max-bytes" -> b.maxBytes(Long.parseLong(value));
      case "max-problems" -> b.maxProblems(Integer.parseInt(value));
      case "max-columns" -> b.maxColumns(Integer.parseInt(value));
      default -> throw new IllegalArgumentException("unknown fixture option " + key);
    }
  }

  /** Renders a table as the fixture format describes. */
  static String render(SurveyTable t) {
    StringBuilder sb = new StringBuilder();
    sb.append("encoding: ")
        .append(t.encoding())
        .append(t.encodingDetected() ? " (detected)" : " (as given)")
        .append('\n');
    sb.append("delimiter: ")
        .append(t.delimiter().label())
        .append(t.delimiterDetected() ? " (detected)" : " (as given)")
        .append('\n');
    sb.append("columns:\n");
    for (Column c : t.columns()) {
      sb.append("  [")
          .append(c.index())
          .append("] ")
          .append(c.header())
          .append(": ")
          .append(c.role());
      if (c.answersColumn() >= 0) {
        sb.append(" of [").append(c.answersColumn()).append(']');
      }
      sb.append(c.detected() ? " (detected)" : " (named)").append('\n');
    }
    sb.append("rows: ")
        .append(t.rows().size())
        .append(", skipped: ")
        .append(t.skippedRows())
        .append('\n');
    for (SurveyRow r : t.rows()) {
      sb.append("row ").append(r.number()).append(" at line ").append(r.line()).append(": ");
      for (int i = 0; i < r.cells().size(); i++) {
        sb.append(i == 0 ? "" : " | ").append(escape(r.cells().get(i)));
      }
      sb.append('\n');
    }
    if (t.problems().isEmpty()) {
      sb.append("problems: none\n");
    } else {
      sb.append("problems:\n");
      for (InputProblem p : t.problems()) {
        sb.append("  ").append(p).append('\n');
      }
    }
    return sb.toString();
  }

  static String escape(String cell) {
    StringBuilder sb = new StringBuilder(cell.length());
    for (int i = 0; i < cell.length(); i++) {
      char c = cell.charAt(i);
      switch (c) {
        case '\\' -> sb.append("\\\\");
        case '\n' -> sb.append("\\n");
        case '\r' -> sb.append("\\r");
        case '\t' -> sb.append("\\t");
        case '|' -> sb.append("\\|");
        default -> sb.append(c);
      }
    }
    return sb.toString();
  }
}
