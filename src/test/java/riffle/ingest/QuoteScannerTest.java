package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class QuoteScannerTest {
  @Test
  void locatesTheUnclosedQuoteByLineAndField() {
    String text =
        "id,date,answer,device\n"
            + "1,2024-01-01,\"closed\nover two lines\",mobile\n"
            + "2,2024-01-02,\"never closed, mobile\n"
            + "3,2024-01-03,fine,desktop\n";
    assertArrayEquals(new long[] {4, 3}, QuoteScanner.unclosedQuote(text, ','));
  }

  @Test
  void countsLinesTheSameForCrLfAndCr() {
    for (String eol : new String[] {"\n", "\r\n", "\r"}) {
      String text = "a;b" + eol + "1;\"x" + eol + "y\"" + eol + "\"open;2" + eol + "3;4";
      assertArrayEquals(new long[] {4, 1}, QuoteScanner.unclosedQuote(text, ';'), eol);
    }
  }

  @Test
  void treatsDoubledQuotesAndQuotesInsideFieldsAsText() {
    assertNull(QuoteScanner.unclosedQuote("a,b\n\"say \"\"hi\"\"\",x\nit's 5\" long,y\n", ','));
    assertNull(QuoteScanner.unclosedQuote("a,b\n\"closed\" then text \" more,y\n", ','));
  }

  @Test
  void reportsFieldsAndTheLastFilledField() {
    QuoteScanner s = new QuoteScanner("a,b,c\n1,,\n,\" \",\n\"x\ny\",2\n", ',', 1000);
    assertTrue(s.next());
    assertEquals(3, s.fields());
    assertEquals(3, s.lastFilled());
    assertTrue(s.next());
    assertEquals(3, s.fields());
    assertEquals(1, s.lastFilled());
    assertEquals(2, s.startLine());
    assertTrue(s.next());
    assertEquals(0, s.lastFilled());
    assertTrue(s.next());
    assertEquals(4, s.startLine());
    assertEquals(2, s.fields());
    assertFalse(s.cut());
    assertFalse(s.next());
  }

  @Test
  void marksARecordCutByTheLimit() {
    QuoteScanner s = new QuoteScanner("a,b\n1,\"long answer\"\n", ',', 8);
    assertTrue(s.next());
    assertTrue(s.next());
    assertTrue(s.cut());
  }
}
