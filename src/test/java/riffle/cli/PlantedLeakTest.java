package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.DataFormatter;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.text.PlantedFixture;

/**
 * End to end: the planted answers of {@code riffle/text/pii/planted.txt}, imported as a coded wave,
 * leak none of their planted personal data into quotes and candidates, search hits, the coded
 * answers CSV (wide and long), the findings, the copy board or its exports.
 */
class PlantedLeakTest {
  @TempDir static Path dir;
  static String project;
  static List<String> planted = new ArrayList<>();
  static int answers;
  static String written;

  /** Codes of the sample codebook, two praise and two friction, given in turn. */
  static final List<String> CODES = List.of("value", "service", "delivery", "cost");

  @BeforeAll
  static void importPlanted() throws Exception {
    StringBuilder csv = new StringBuilder("id,What made you choose us?,chose codes\n");
    int i = 0;
    for (PlantedFixture.Answer a : PlantedFixture.planted()) {
      csv.append("P-")
          .append(i + 1)
          .append(',')
          .append(quoted(a.text()))
          .append(',')
          .append(CODES.get(i % CODES.size()))
          .append('\n');
      a.planted().forEach(p -> planted.add(p.value()));
      i++;
    }
    answers = i;
    written = csv.toString();
    Path file = dir.resolve("planted.csv");
    Files.writeString(file, csv, StandardCharsets.UTF_8);
    project = dir.resolve("planted.riffle").toString();
    CliTest.ok("import", "--project", project, "--file", file.toString(), "--wave", "Planted");
    CliTest.ok("codes", "load", "--project", project, "--file", "sample-responses/codebook.csv");
  }

  static String quoted(String cell) {
    return "\"" + cell.replace("\"", "\"\"") + "\"";
  }

  @Test
  void noPlantedValueReachesQuotesSearchExportsOrTheBoard() throws Exception {
    Map<String, String> outputs = new LinkedHashMap<>();
    JsonNode quotes = CliTest.ok("quotes", "--project", project, "--json").json();
    List<JsonNode> ranked = new ArrayList<>();
    quotes.get("codes").forEach(c -> c.get("quotes").forEach(ranked::add));
    assertTrue(ranked.size() >= 12, "quotes per code: " + quotes);
    outputs.put("quotes --json", quotes.toString());
    outputs.put("quotes", CliTest.ok("quotes", "--project", project).out());

    JsonNode search =
        CliTest.ok(
                "search", "--project", project, "--query", "is:coded", "--limit", "500", "--json")
            .json();
    assertEquals(answers, search.get("total").asInt(), "every answer is a search hit");
    StringBuilder hits = new StringBuilder();
    search.get("hits").forEach(h -> hits.append(h.get("text").asText()).append('\n'));
    outputs.put("search hits", hits.toString());

    String[] slots = {"headline", "proof", "objection", "benefit"};
    for (int k = 0; k < 8; k++) {
      JsonNode q = ranked.get(k * ranked.size() / 8);
      CliTest.ok(
          "board",
          "pin",
          "--project",
          project,
          "--slot",
          slots[k % slots.length],
          "--answer",
          q.get("answer_id").asText(),
          "--text",
          q.get("text").asText(),
          "--code",
          q.get("code").asText(),
          "--coder",
          "ana");
    }
    outputs.put("board", CliTest.ok("board", "--project", project).out());
    for (String[] export :
        List.of(
            new String[] {"coded", "csv", "coded.csv"},
            new String[] {"findings", "md", "findings.md"},
            new String[] {"quotes", "md", "board.md"},
            new String[] {"quotes", "txt", "board.txt"},
            new String[] {"quotes", "csv", "board.csv"})) {
      Path out = dir.resolve(export[2]);
      CliTest.ok(
          "export",
          "--project",
          project,
          "--what",
          export[0],
          "--format",
          export[1],
          "--out",
          out.toString());
      outputs.put(export[2], Files.readString(out, StandardCharsets.UTF_8));
    }
    Path longCsv = dir.resolve("coded-long.csv");
    CliTest.ok(
        "export",
        "--project",
        project,
        "--what",
        "coded",
        "--format",
        "csv",
        "--long",
        "--out",
        longCsv.toString());
    outputs.put("coded-long.csv", Files.readString(longCsv, StandardCharsets.UTF_8));
    Path xlsx = dir.resolve("coded.xlsx");
    CliTest.ok(
        "export",
        "--project",
        project,
        "--what",
        "coded",
        "--format",
        "xlsx",
        "--out",
        xlsx.toString());
    StringBuilder cells = new StringBuilder();
    DataFormatter shown = new DataFormatter();
    try (InputStream in = Files.newInputStream(xlsx);
        XSSFWorkbook book = new XSSFWorkbook(in)) {
      for (Sheet sheet : book) {
        for (Row row : sheet) {
          for (Cell cell : row) {
            cells.append(shown.formatCellValue(cell)).append('\n');
          }
        }
      }
    }
    outputs.put("coded.xlsx", cells.toString());
    assertTrue(outputs.get("board.md").contains("Headline"), outputs.get("board.md"));
    assertTrue(outputs.get("coded.csv").lines().count() > answers, "one row per answer");
    assertTrue(outputs.get("coded.xlsx").lines().count() > answers, "the workbook's cells");

    List<String> leaks = new ArrayList<>();
    for (String value : planted) {
      Pattern p =
          Pattern.compile(
              "(?<![\\p{L}\\p{N}])" + Pattern.quote(value) + "(?![\\p{L}\\p{N}])",
              Pattern.CASE_INSENSITIVE | Pattern.UNICODE_CASE);
      assertTrue(p.matcher(written).find(), "the check finds " + value + " where it was written");
      outputs.forEach(
          (where, text) -> {
            if (p.matcher(text).find()) {
              leaks.add(value + " in " + where);
            }
          });
    }
    assertEquals(List.of(), leaks, "of " + planted.size() + " planted values");
  }
}
