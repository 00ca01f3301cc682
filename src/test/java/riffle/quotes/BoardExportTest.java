package riffle.quotes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import java.util.Optional;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import riffle.csv.SafeCsv;
import riffle.model.BoardItem;
import riffle.model.CopyBoard;
import riffle.model.QuoteSlot;

class BoardExportTest {
  static BoardItem item(String text, long answer, String line) {
    return new BoardItem(
        text,
        answer,
        "R" + answer,
        "Wave 3",
        "Why us?",
        "price and value",
        Optional.ofNullable(line));
  }

  static CopyBoard board() {
    return CopyBoard.empty("Spring page")
        .pin(QuoteSlot.HEADLINE, item("half the price of a new one", 12, "Half the price of new"))
        .pin(QuoteSlot.HEADLINE, item("great price for the quality", 7, null))
        .pin(QuoteSlot.OBJECTION, item("=HYPERLINK(\"http://x.example\"), \"sure\"", 40, null))
        .pin(QuoteSlot.PROOF, item("-3 bar\nless <b>pressure</b> [link](x) *wow*", 41, "@once"));
  }

  @Test
  void csvIsRfc4180WithTheNoticeAnswerIdsAndNeutralisedFormulas() throws IOException {
    String csv = BoardExport.csv(board());
    assertTrue(csv.endsWith("\r\n"));
    List<CSVRecord> rows;
    try (CSVParser p = CSVParser.parse(new StringReader(csv), CSVFormat.RFC4180)) {
      rows = p.getRecords();
    }
    assertEquals(CopyBoard.CONSENT_NOTICE, rows.get(0).get(0));
    assertEquals(BoardExport.CSV_COLUMNS, rows.get(1).toList());
    assertEquals(6, rows.size());
    for (CSVRecord r : rows) {
      assertEquals(BoardExport.CSV_COLUMNS.size(), r.size());
    }
    assertEquals(
        List.of(
            "headline",
            "1",
            "half the price of a new one",
            "Half the price of new",
            "price and value",
            "12",
            "R12",
            "Wave 3",
            "Why us?"),
        rows.get(2).toList());
    assertEquals("7", rows.get(3).get(5));
    assertEquals("'=HYPERLINK(\"http://x.example\"), \"sure\"", rows.get(4).get(2));
    assertEquals("objection", rows.get(4).get(0));
    assertEquals("'-3 bar\nless <b>pressure</b> [link](x) *wow*", rows.get(5).get(2));
    assertEquals("'@once", rows.get(5).get(3));
  }

  @Test
  void markdownSaysWhereEachQuoteComesFromAndEscapesTheAnswerText() {
    String md = BoardExport.markdown(board());
    assertTrue(md.startsWith("# Spring page\n\n> " + CopyBoard.CONSENT_NOTICE + "\n"));
    assertTrue(md.contains("## Headline ideas\n\n1. **Half the price of new**  \n"));
    assertTrue(md.contains("\u201chalf the price of a new one\u201d"));
    assertTrue(md.contains("answer 12"));
    assertTrue(md.contains("## Sub-headline ideas\n\n_Nothing pinned._\n"));
    assertTrue(md.contains("\\<b\\>pressure\\</b\\> \\[link\\](x) \\*wow\\*"), md);
    assertFalse(md.contains("<b>"));
    assertTrue(md.indexOf("Headline ideas") < md.indexOf("Objections to answer"));
    assertTrue(md.indexOf("Objections to answer") < md.indexOf("Proof quotes"));
  }

  @Test
  void plainTextKeepsEveryQuoteOnOneLine() {
    String text = BoardExport.plainText(board());
    assertTrue(text.startsWith("Spring page\n\n" + CopyBoard.CONSENT_NOTICE + "\n"));
    assertTrue(text.contains("\"-3 bar less <b>pressure</b> [link](x) *wow*\""));
    assertTrue(text.contains("Benefits\n--------\n(nothing pinned)\n"));
    assertTrue(text.contains("1. Half the price of new\n   \"half the price of a new one\"\n"));
  }

  @Test
  void cellsAreQuotedOnlyWhenNeeded() {
    assertEquals("plain", SafeCsv.cell("plain"));
    assertEquals("\"a,b\"", SafeCsv.cell("a,b"));
    assertEquals("\"say \"\"hi\"\"\"", SafeCsv.cell("say \"hi\""));
    assertEquals("'+1", SafeCsv.cell("+1"));
    assertEquals("'\tx", SafeCsv.cell("\tx"));
    assertEquals("\"'\rx\"", SafeCsv.cell("\rx"));
    assertEquals("", SafeCsv.cell(""));
  }
}
