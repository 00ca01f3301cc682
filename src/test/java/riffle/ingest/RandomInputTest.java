package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import riffle.model.ColumnRole;

/**
 * Seeded random blasts at the sniffers and the reader: no exception other than {@link
 * UnreadableInputException}, tables that keep their invariants, and the same result for the same
 * seed.
 */
class RandomInputTest {
  private static final long SEED = 20_240_302L;
  private static final int INPUTS = 3000;
  private static final String CSV_CHARS = ",;\t|\"\"\n\r\n  abcxyz019é€’\u00a0-.?";
  private static final Charset[] CHARSETS = {
    StandardCharsets.UTF_8,
    StandardCharsets.UTF_16LE,
    StandardCharsets.UTF_16BE,
    Charset.forName("windows-1252")
  };

  @Test
  void readerNeverThrowsAnythingButUnreadableInputAndRepeatsItself() {
    List<String> first = blast(new Random(SEED));
    List<String> second = blast(new Random(SEED));
    assertEquals(INPUTS, first.size());
    assertEquals(first, second);
    long readable = first.stream().filter(s -> !s.startsWith("unreadable")).count();
    assertTrue(
        readable > INPUTS / 10, "too few random inputs were readable to test much: " + readable);
  }

  @Test
  void quoteScannerAgreesWithTheParserOnRandomText() throws IOException {
    Random rnd = new Random(SEED + 1);
    for (int n = 0; n < INPUTS; n++) {
      String text = csvish(rnd, 1 + rnd.nextInt(120));
      Delimiter d = Delimiter.values()[rnd.nextInt(4)];
      long[] unclosed = QuoteScanner.unclosedQuote(text, d.character());
      List<int[]> parsed = new ArrayList<>();
      boolean failed = false;
      try (CSVParser p = CSVParser.parse(new StringReader(text), CsvRecords.format(d))) {
        for (CSVRecord r : p) {
          parsed.add(new int[] {r.size()});
        }
      } catch (UncheckedIOException | IOException e) {
        failed = true;
      }
      String what = "input " + n + ": [" + GoldenFixturesTest.escape(text) + "] split by " + d;
      if (failed) {
        assertNotNull(unclosed, what);
        continue;
      }
      assertNull(unclosed, what);
      QuoteScanner s = new QuoteScanner(text, d.character(), text.length());
      List<CsvRecords.Raw> raws;
      try {
        raws = CsvRecords.read(text, d);
      } catch (BadInput e) {
        throw new AssertionError(what, e);
      }
      for (int i = 0; i < parsed.size(); i++) {
        assertTrue(s.next(), what);
        assertEquals(parsed.get(i)[0], s.fields(), what + ", record " + i);
        assertEquals(s.startLine(), raws.get(i).line(), what + ", record " + i);
      }
      assertEquals(false, s.next(), what);
    }
  }

  @Test
  void sniffersNeverThrow() throws BadInput {
    Random rnd = new Random(SEED + 2);
    for (int n = 0; n < INPUTS; n++) {
      byte[] b = new byte[rnd.nextInt(200)];
      rnd.nextBytes(b);
      try {
        EncodingSniffer.Decoded d = EncodingSniffer.decode(b, java.util.Optional.empty());
        assertNotNull(DelimiterSniffer.sniff(d.text(), rnd.nextBoolean()));
      } catch (BadInput expected) {
        assertTrue(!expected.getMessage().isEmpty());
      }
      assertNotNull(DelimiterSniffer.sniff(csvish(rnd, rnd.nextInt(300)), rnd.nextBoolean()));
    }
  }

  private static List<String> blast(Random rnd) {
    List<String> results = new ArrayList<>(INPUTS);
    for (int n = 0; n < INPUTS; n++) {
      ImportSettings.Builder settings = ImportSettings.builder().maxProblems(1 + rnd.nextInt(5));
      if (rnd.nextInt(4) == 0) {
        settings.delimiter(Delimiter.values()[rnd.nextInt(4)]);
      }
      if (rnd.nextInt(6) == 0) {
        settings.encoding(CHARSETS[rnd.nextInt(CHARSETS.length)].name());
      }
      ImportSettings s = settings.get();
      try {
        SurveyTable t;
        switch (rnd.nextInt(4)) {
          case 0 -> {
            byte[] b = new byte[rnd.nextInt(300)];
            rnd.nextBytes(b);
            t = SurveyReader.readBytes("random.bin", b, s);
          }
          case 1 -> t = SurveyReader.readPaste(csvish(rnd, rnd.nextInt(400)), s);
          case 2 -> t = SurveyReader.readPaste(unicode(rnd, rnd.nextInt(200)), s);
          default -> {
            Charset cs = CHARSETS[rnd.nextInt(CHARSETS.length)];
            t = SurveyReader.readBytes("random.csv", surveyish(rnd).getBytes(cs), s);
          }
        }
        checkInvariants(t, s);
        results.add(GoldenFixturesTest.render(t));
      } catch (UnreadableInputException e) {
        assertTrue(e.getMessage().startsWith(e.problem().source()), e.getMessage());
        results.add("unreadable: " + e.getMessage());
      }
    }
    return results;
  }

  private static void checkInvariants(SurveyTable t, ImportSettings s) {
    int width = t.columns().size();
    assertTrue(width > 0);
    for (int i = 0; i < width; i++) {
      Column c = t.columns().get(i);
      assertEquals(i, c.index());
      if (c.role() == ColumnRole.CODES) {
        assertEquals(ColumnRole.TEXT, t.columns().get(c.answersColumn()).role());
      }
    }
    assertTrue(!t.columnsWith(ColumnRole.TEXT).isEmpty());
    assertTrue(t.columnsWith(ColumnRole.ID).size() <= 1);
    assertTrue(t.columnsWith(ColumnRole.DATE).size() <= 1);
    assertTrue(!t.rows().isEmpty());
    long line = 0;
    int number = 0;
    for (SurveyRow r : t.rows()) {
      assertEquals(width, r.cells().size());
      assertTrue(r.line() > line, "lines ascend");
      assertTrue(r.number() > number, "numbers ascend");
      line = r.line();
      number = r.number();
    }
    assertTrue(t.problems().size() <= s.maxProblems() + 1);
    assertTrue(t.skippedRows() >= 0);
  }

  /** Text made of the characters that matter to CSV, plus a few letters. */
  private static String csvish(Random rnd, int length) {
    StringBuilder sb = new StringBuilder(length);
    for (int i = 0; i < length; i++) {
      sb.append(CSV_CHARS.charAt(rnd.nextInt(CSV_CHARS.length())));
    }
    return sb.toString();
  }

  /** Arbitrary UTF-16 code units, lone surrogates included. */
  private static String unicode(Random rnd, int length) {
    StringBuilder sb = new StringBuilder(length);
    for (int i = 0; i < length; i++) {
      sb.append((char) rnd.nextInt(0x10000));
    }
    return sb.toString();
  }

  /** A survey-shaped table with random damage: stray quotes, delimiters, line breaks. */
  private static String surveyish(Random rnd) {
    char d = Delimiter.values()[rnd.nextInt(4)].character();
    String[] words = {
      "price",
      "the",
      "shipping",
      "grinder",
      "was",
      "slow",
      "warranty",
      "boiler",
      "n/a",
      "\"",
      "\n",
      ",",
      ";",
      "|",
      "\t",
      "descaling",
      "refurbished"
    };
    StringBuilder sb = new StringBuilder("id" + d + "answer" + d + "device\n");
    int rows = rnd.nextInt(12);
    for (int r = 0; r < rows; r++) {
      sb.append('R').append(r).append(d);
      boolean quoted = rnd.nextInt(3) == 0;
      sb.append(quoted ? "\"" : "");
      int n = 3 + rnd.nextInt(8);
      for (int w = 0; w < n; w++) {
        String word = words[rnd.nextInt(rnd.nextInt(5) == 0 ? words.length : 8)];
        sb.append(word).append(' ');
      }
      sb.append(quoted && rnd.nextInt(10) > 0 ? "\"" : "");
      sb.append(d).append(rnd.nextBoolean() ? "mobile" : "desktop");
      sb.append(rnd.nextBoolean() ? "\n" : "\r\n");
    }
    return sb.toString();
  }
}
