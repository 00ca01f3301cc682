package riffle.quotes;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import riffle.model.BoardItem;
import riffle.model.CopyBoard;
import riffle.model.Quote;
import riffle.model.QuoteFindings;

/**
 * Answers full of personal data (fixture {@code personal-answers.tsv}): no e-mail, phone number,
 * card-like number or self-given name ever reaches a quote or an export.
 */
class PersonalDataTest {
  record Line(long code, String answer, List<String> secrets) {}

  static List<Line> fixture() throws IOException {
    List<Line> out = new ArrayList<>();
    try (InputStream in = PersonalDataTest.class.getResourceAsStream("personal-answers.tsv")) {
      for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
        if (line.isBlank() || line.startsWith("#")) {
          continue;
        }
        String[] cells = line.split("\t");
        long code =
            switch (cells[0]) {
              case "value" -> QuoteRankerTest.VALUE;
              case "advice" -> QuoteRankerTest.ADVICE;
              default -> QuoteRankerTest.PRICE;
            };
        out.add(new Line(code, cells[1], List.of(cells[2].split("\\|"))));
      }
    }
    return out;
  }

  @Test
  void noPersonalDataReachesAQuoteOrAnExport() throws IOException {
    List<Line> lines = fixture();
    QuoteRankerTest.Answers answers = new QuoteRankerTest.Answers();
    List<String> secrets = new ArrayList<>();
    for (Line l : lines) {
      answers.add("Spring", "mobile", l.answer(), Set.of(l.code()), Map.of());
      secrets.addAll(l.secrets());
    }
    QuoteSettings wide = QuoteSettings.builder().perCode(1000).perSlot(1000).get();
    QuoteFindings f = QuoteRanker.rank(QuoteRankerTest.CODEBOOK, answers.list, wide);
    List<Quote> all = new ArrayList<>(f.quotes());
    f.codes().forEach(c -> all.addAll(c.quotes()));
    for (long code :
        List.of(QuoteRankerTest.VALUE, QuoteRankerTest.ADVICE, QuoteRankerTest.PRICE)) {
      assertFalse(QuoteRankerTest.of(f, code).quotes().isEmpty(), "no quote for code " + code);
    }
    CopyBoard board = CopyBoard.empty("Personal data");
    for (Quote q : f.quotes()) {
      board = board.pin(q.slot().orElseThrow(), BoardItem.of(q));
    }
    List<String> texts = new ArrayList<>();
    all.forEach(q -> texts.add(q.text()));
    texts.add(BoardExport.markdown(board));
    texts.add(BoardExport.plainText(board));
    texts.add(BoardExport.csv(board));
    for (String text : texts) {
      String lower = text.toLowerCase(Locale.ROOT);
      for (String secret : secrets) {
        assertFalse(lower.contains(secret.toLowerCase(Locale.ROOT)), secret + " in: " + text);
      }
      assertFalse(text.contains("["), "a placeholder in: " + text);
      assertFalse(QuoteWords.looksPersonal(text.replace(CopyBoard.CONSENT_NOTICE, "")), text);
    }
    for (Quote q : all) {
      assertTrue(answers.list.get((int) q.answerId() - 1).analysis().masked().contains(q.text()));
    }
  }

  @Test
  void numbersAndAddressesTheMasksMissAreRecognised() {
    assertTrue(QuoteWords.looksPersonal("call 555 0100 222"));
    assertTrue(QuoteWords.looksPersonal("ref 88123456"));
    assertTrue(QuoteWords.looksPersonal("write to someone@somewhere"));
    assertFalse(QuoteWords.looksPersonal("it cost 1,299 and came in 3-5 days"));
    assertFalse(QuoteWords.looksPersonal("from 2019 to 2024"));
  }
}
