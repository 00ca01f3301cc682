package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class DelimiterSnifferTest {
  private static final String Q = "What almost stopped you from buying?";

  private static String table(char d, String... rows) {
    StringBuilder sb = new StringBuilder("id" + d + "date" + d + Q + d + "device\n");
    for (String r : rows) {
      sb.append(r.replace('~', d)).append('\n');
    }
    return sb.toString();
  }

  @Test
  void detectsEachDelimiter() {
    for (Delimiter d : Delimiter.values()) {
      String text =
          table(
              d.character(),
              "1~2024-03-02~The price of the grinder~mobile",
              "2~2024-03-03~Shipping to Ireland~desktop");
      assertEquals(d, DelimiterSniffer.sniff(text, false), d.label());
      assertEquals(d, DelimiterSniffer.sniff(text, true), d.label());
    }
  }

  @Test
  void detectsSemicolonWhenAnswersHoldUnquotedCommas() {
    String text =
        table(
            ';',
            "1~2024-03-02~Price, mostly, and the fee~mobile",
            "2~2024-03-03~Nothing~desktop",
            "3~2024-03-04~The manual, the box, the burrs~mobile");
    assertEquals(Delimiter.SEMICOLON, DelimiterSniffer.sniff(text, false));
  }

  @Test
  void ignoresDelimitersInsideQuotedMultiLineFields() {
    String text =
        "id,answer,device\r\n"
            + "1,\"Two things; the price;\r\nand the; delivery; time\",mobile\r\n"
            + "2,\"Also; this\",desktop\r\n";
    assertEquals(Delimiter.COMMA, DelimiterSniffer.sniff(text, false));
    String tabs = "id\tanswer\n1\t\"a, b, c\nd, e\"\n2\tplain, words\n";
    assertEquals(Delimiter.TAB, DelimiterSniffer.sniff(tabs, false));
  }

  @Test
  void trailingDelimitersDoNotCountAgainstACandidate() {
    String text = "id;answer;device;\n1;Good price;mobile;;\n2;Fast delivery;desktop;\n";
    assertEquals(Delimiter.SEMICOLON, DelimiterSniffer.sniff(text, false));
  }

  @Test
  void singleColumnFallsBackToCommaForFilesAndTabForPaste() {
    String text = "Why did you choose us?\nCheaper than new\nThe warranty\n";
    assertEquals(Delimiter.COMMA, DelimiterSniffer.sniff(text, false));
    assertEquals(Delimiter.TAB, DelimiterSniffer.sniff(text, true));
  }

  @Test
  void tiesGoToMoreFieldsThenToTheDocumentedOrder() {
    // Both split the header into two and every row agrees: comma first for files, tab for paste.
    String both = "a,b\tc\n1,2\t3\n";
    assertEquals(Delimiter.COMMA, DelimiterSniffer.sniff(both, false));
    assertEquals(Delimiter.TAB, DelimiterSniffer.sniff(both, true));
    // Pipe splits the header into three, comma into two: more fields wins.
    assertEquals(Delimiter.PIPE, DelimiterSniffer.sniff("a|b|c,d\n1|2|3,4\n", false));
  }

  @Test
  void scoresTheShareOfRecordsAgreeingWithTheHeader() {
    String text = "a,b,c\n1,2,3\n1,2\n1,2,3,\n\n1,2,3,4\n";
    int[] h = new int[1];
    assertEquals(0.5, DelimiterSniffer.score(text, ',', h));
    assertEquals(3, h[0]);
    assertEquals(0.0, DelimiterSniffer.score(text, ';', h));
  }
}
