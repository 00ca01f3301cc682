package riffle.quotes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import riffle.model.Analysis;

class ClausesTest {
  static List<String> pieces(String text) {
    Analysis a = DemoQuotes.analyse(text);
    return Clauses.cut(a, new Vocabulary()).pieces().stream()
        .map(p -> a.masked().substring(p.start(), p.end()))
        .toList();
  }

  @Test
  void sentencesSplitIntoClausesAndTheirRuns() {
    List<String> p =
        pieces("Once I found the warranty page, it was reassuring because the price was fair.");
    assertTrue(p.contains("Once I found the warranty page"), p.toString());
    assertTrue(p.contains("it was reassuring"), p.toString());
    assertTrue(p.contains("because the price was fair."), p.toString());
    assertTrue(
        p.contains("Once I found the warranty page, it was reassuring because the price was fair."),
        p.toString());
  }

  @Test
  void joiningWordsFillersAndHeadingsAreTrimmed() {
    List<String> p = pieces("Simple: honestly fast and friendly - and the chat helped me.");
    assertTrue(p.contains("fast and friendly"), p.toString());
    assertTrue(p.contains("the chat helped me."), p.toString());
    assertTrue(p.stream().noneMatch(s -> s.startsWith("Simple")), p.toString());
    assertEquals(p.size(), new java.util.HashSet<>(p).size(), p.toString());
  }

  @Test
  void aQuotationIsClosed() {
    List<String> p = pieces("No date at checkout, just \"ships soon\"");
    assertTrue(p.contains("just \"ships soon\""), p.toString());
  }

  @Test
  void piecesWithPersonalDataAreNeverMade() {
    List<String> p = pieces("Great value. Mail me at jana@example.com, thanks.");
    assertTrue(p.contains("Great value."), p.toString());
    assertTrue(
        p.stream().noneMatch(s -> s.contains("[email]") || s.contains("Mail")), p.toString());
  }

  @Test
  void anAnswerWithoutSentencesHasNoPieces() {
    assertEquals(List.of(), pieces(""));
  }
}
