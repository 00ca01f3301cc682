package riffle.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;

/** CSV for spreadsheets: RFC 4180 records, the OWASP cell rule, and its undoing on reading. */
class SafeCsvTest {
  @Test
  void recordsAreRfc4180WithCrlfAndQuotesWhereNeeded() {
    String csv =
        SafeCsv.create(false)
            .row(List.of("id", "text"))
            .row(List.of("1", "fine, \"quoted\"\nline"))
            .toString();
    assertEquals("id,text\r\n1,\"fine, \"\"quoted\"\"\nline\"\r\n", csv);
  }

  @Test
  void theByteOrderMarkComesFirstWhenAsked() {
    assertEquals("\uFEFFa\r\n", SafeCsv.create(true).row(List.of("a")).toString());
    assertEquals("a\r\n", SafeCsv.create(false).row(List.of("a")).toString());
  }

  @Test
  void cellsThatLookLikeFormulasGetALeadingQuote() {
    assertEquals("'=SUM(A1)", SafeCsv.neutralise("=SUM(A1)"));
    assertEquals("'-3", SafeCsv.neutralise("-3"));
    assertEquals("''=x", SafeCsv.neutralise("'=x"));
    assertEquals("'plain", SafeCsv.neutralise("'plain"));
    assertEquals("\"'\rx\"", SafeCsv.cell("\rx"));
    assertEquals("", SafeCsv.cell(""));
  }

  /** Seeded blast: whatever a cell holds, writing then reading with restore gives it back. */
  @Test
  void everyCellComesBackAsWrittenWhenRestored() throws Exception {
    Random random = new Random(16);
    String alphabet = "'=+-@\t\r\n,\" ax#";
    List<String> cells = new ArrayList<>();
    for (int i = 0; i < 300; i++) {
      StringBuilder cell = new StringBuilder();
      for (int n = random.nextInt(6); n > 0; n--) {
        cell.append(alphabet.charAt(random.nextInt(alphabet.length())));
      }
      cells.add(cell.toString());
    }
    String csv = SafeCsv.create(false).row(cells).toString();
    try (CSVParser parser = CSVParser.parse(new StringReader(csv), CSVFormat.RFC4180)) {
      List<CSVRecord> records = parser.getRecords();
      assertEquals(1, records.size());
      List<String> read = records.get(0).stream().map(SafeCsv::restore).toList();
      assertEquals(cells, read);
    }
  }
}
