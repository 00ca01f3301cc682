package riffle.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import org.junit.jupiter.api.Test;
import riffle.csv.SafeCsv;
import riffle.model.Findings;

class ExportsTest {
  static final String HOSTILE = "<img src=x onerror=alert(1)>";

  /** The invented survey with a hostile code name, question and wave. */
  private static Findings hostileFindings() {
    List<ReportCode> codebook = new ArrayList<>(Survey.CODEBOOK);
    codebook.add(Survey.code("evil", HOSTILE, "quality", "neutral"));
    Survey survey = new Survey(11L);
    List<ReportAnswer> answers = new ArrayList<>(survey.answers);
    for (int i = 0; i < 40; i++) {
      answers.add(
          new ReportAnswer(
              "h" + i,
              i % 2 == 0 ? "Autumn" : "\"><script>alert(2)</script>",
              i % 4 < 2 ? Survey.MAIN : HOSTILE,
              true,
              Set.of("evil", "cost"),
              Map.of(),
              OptionalLong.of(10_000 + i)));
    }
    ReportInput input =
        new ReportInput(
            List.of(Survey.MAIN, Survey.TINY, HOSTILE),
            List.of("Spring", "Summer", "Autumn", "\"><script>alert(2)</script>"),
            codebook,
            answers);
    return Report.compute(input, ReportSettings.DEFAULTS);
  }

  @Test
  void htmlEscapesEveryPieceOfProjectText() {
    String html = Exports.html(hostileFindings(), "Ondalune & friends <b>");
    assertFalse(html.contains("<img"), "hostile code name became markup");
    assertFalse(html.contains("<script"), "hostile wave name became markup");
    assertFalse(html.contains("<b>"), "the title became markup");
    assertTrue(html.contains("&lt;img src=x onerror=alert(1)&gt;"));
    assertTrue(html.contains("&quot;&gt;&lt;script&gt;alert(2)&lt;/script&gt;"));
    assertTrue(html.contains("Ondalune &amp; friends &lt;b&gt;"));
  }

  @Test
  void htmlIsSelfContainedWithChartsAndPrintStyles() {
    String html = Exports.html(hostileFindings(), "Findings");
    assertTrue(html.startsWith("<!DOCTYPE html>"));
    assertTrue(html.contains("<style>") && html.contains("@media print"));
    assertFalse(html.contains("<script"), "no scripts");
    assertFalse(html.contains("src=\"http") || html.contains("href=\"http"), "no fetches");
    assertTrue(html.contains("aria-label=\"co-occurrence heatmap\""));
    assertTrue(html.contains("aria-label=\"distinct codes against answers coded\""));
    assertTrue(html.contains("aria-label=\"Delivery cost: share by wave\""));
    // Verdict first, then numbers.
    assertTrue(
        html.contains("Delivery cost</span> fell from Summer to Autumn"), "verdict sentence");
    assertTrue(html.contains("small base"));
  }

  @Test
  void markdownEscapesTablesAndMarkup() {
    String md = Exports.markdown(hostileFindings(), "Findings | Ondalune");
    assertTrue(md.startsWith("# Findings \\| Ondalune\n"));
    assertFalse(md.contains("<img"));
    assertTrue(md.contains("&lt;img src=x onerror=alert(1)&gt;"));
    assertTrue(md.contains("**Delivery cost** fell from Summer to Autumn"));
    assertTrue(md.contains("| Code | Theme | Spring | Summer | Autumn |"));
  }

  private static CodedExport export(String text) {
    return new CodedExport(
        Survey.CODEBOOK,
        List.of(
            new ExportAnswer(
                "a1",
                "r1",
                "Spring",
                Survey.MAIN,
                true,
                text,
                Map.of("country", "@SUM(A1)", "buyer", "new"),
                List.of(
                    new ExportAssignment("cost", "Mila", "manual", 0, 5),
                    new ExportAssignment("old", "import", "imported", -1, -1)),
                List.of("Mila", "import")),
            new ExportAnswer(
                "a2", "r2", "Spring", Survey.MAIN, false, "n/a", Map.of(), List.of(), List.of()),
            new ExportAnswer(
                "a3",
                "r3",
                "Spring",
                Survey.MAIN,
                true,
                "All fine",
                Map.of(),
                List.of(),
                List.of("Mila")),
            new ExportAnswer(
                "a4",
                "r4",
                "Spring",
                Survey.MAIN,
                true,
                "Shipping was dear",
                Map.of(),
                List.of(new ExportAssignment("cost", "Mila", "rule", -1, -1)),
                List.of())));
  }

  @Test
  void csvCellsThatLookLikeFormulasAreNeutralised() {
    for (String risky : List.of("=HYPERLINK(\"x\")", "+1", "-5 stars", "@cmd", "\tx", "\rx")) {
      String csv = Exports.codedAnswersCsv(export(risky), false);
      String cell = SafeCsv.cell(risky);
      assertTrue(cell.startsWith("'") || cell.startsWith("\"'"), risky + " → " + cell);
      assertTrue(csv.contains(cell), csv);
    }
    String csv = Exports.codedAnswersCsv(export("fine, \"quoted\"\nline"), false);
    assertTrue(csv.contains("\"fine, \"\"quoted\"\"\nline\""));
    assertTrue(csv.contains("'@SUM(A1)"), "metadata is neutralised too");
    assertEquals("plain", SafeCsv.cell("plain"));
    assertEquals("", SafeCsv.cell(""));
  }

  @Test
  void wideCsvHasOneColumnPerActiveCodeBlankWhereNobodyReadTheAnswer() {
    String csv = Exports.codedAnswersCsv(export("Too pricey"), false);
    String[] lines = csv.split("\r\n", -1);
    assertEquals(
        "answer_id,respondent,wave,question,substantive,read,read_by,buyer,country,text,Delivery,"
            + "Delivery cost,Slow delivery,Product quality,Soft fabric,Fits well,Easy checkout,"
            + "Late newcomer",
        lines[0]);
    assertEquals(
        "a1,r1,Spring,What almost stopped you from buying at Ondalune?,1,1,Mila; import,new,"
            + "'@SUM(A1),Too pricey,1,1,0,0,0,0,0,0",
        lines[1]);
    // Nobody read it: unknown, not absent.
    assertTrue(lines[2].startsWith("a2,r2,Spring,"));
    assertTrue(lines[2].endsWith(",0,0,,,,n/a,,,,,,,,"), lines[2]);
    // Read with no code applying: 0 everywhere.
    assertTrue(lines[3].endsWith(",1,1,Mila,,,All fine,0,0,0,0,0,0,0,0"), lines[3]);
    // Unread but coded by a rule: 1 where the rule gave it, blank elsewhere.
    assertTrue(lines[4].endsWith(",1,0,,,,Shipping was dear,1,1,,,,,,"), lines[4]);
  }

  @Test
  void longCsvHasOneRowPerCodeGivenWithSpans() {
    String csv = Exports.codedAnswersLongCsv(export("Too pricey"), false);
    String[] lines = csv.split("\r\n");
    assertEquals(
        "answer_id,respondent,wave,question,read,read_by,code_id,code,archived,coder,origin,"
            + "span_start,span_end,passage",
        lines[0]);
    assertTrue(
        lines[1].endsWith(",1,Mila; import,cost,Delivery cost,0,Mila,manual,0,5,Too p"), lines[1]);
    assertTrue(lines[2].endsWith(",old,Old delivery code,1,import,imported,,,"), lines[2]);
    // The read answer without a code has its row, with the code's columns empty; the unread
    // non-answer without codes has none.
    assertTrue(lines[3].startsWith("a3,r3,Spring,"), lines[3]);
    assertTrue(lines[3].endsWith(",1,Mila,,,,,,,,"), lines[3]);
    assertTrue(lines[4].endsWith(",0,,cost,Delivery cost,0,Mila,rule,,,"), lines[4]);
    assertEquals(5, lines.length);
  }

  @Test
  void bomOptionStartsTheFileWithTheUtf8ByteOrderMark() {
    byte[] bytes = Exports.codedAnswersCsv(export("fine"), true).getBytes(StandardCharsets.UTF_8);
    assertArrayEquals(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}, Arrays.copyOf(bytes, 3));
    byte[] plain = Exports.codedAnswersCsv(export("fine"), false).getBytes(StandardCharsets.UTF_8);
    assertEquals('a', plain[0]);
  }

  @Test
  void codebookAsMarkdown() {
    String md = Exports.codebookMarkdown(Survey.CODEBOOK, "Codebook");
    assertTrue(
        md.contains(
            "- **Delivery** (friction) `delivery`\n  - **Delivery cost** (friction) `cost`\n"));
    assertTrue(md.contains("  - **Old delivery code** (friction, archived) `old`\n"));
  }

  @Test
  void exportsRefuseCodesMissingFromTheCodebook() {
    CodedExport bad =
        new CodedExport(
            Survey.CODEBOOK,
            List.of(
                new ExportAnswer(
                    "a1",
                    "r1",
                    "Spring",
                    "q",
                    true,
                    "x",
                    Map.of(),
                    List.of(new ExportAssignment("ghost", "Mila", "manual", -1, -1)),
                    List.of("Mila"))));
    assertThrows(IllegalArgumentException.class, () -> Exports.codedAnswersCsv(bad, false));
    assertThrows(IllegalArgumentException.class, () -> Exports.codedAnswersLongCsv(bad, false));
    assertThrows(
        IllegalArgumentException.class, () -> new ExportAssignment("c", "M", "manual", 5, 2));
    assertEquals(Optional.empty(), Survey.CODEBOOK.get(0).parentId());
  }
}
