package riffle.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import riffle.model.Analysis;
import riffle.model.Chunk;
import riffle.model.Progress;
import riffle.model.Sentence;
import riffle.model.Token;

class TextAnalyzerTest {
  static final TextAnalyzer ANALYZER = TextAnalyzer.english();

  /**
   * The Penn Treebank tag set (Marcus, Santorini and Marcinkiewicz 1993, Table 2), with the
   * punctuation tags the OpenNLP models emit.
   */
  static final Set<String> PENN =
      Set.of(
          "CC", "CD", "DT", "EX", "FW", "IN", "JJ", "JJR", "JJS", "LS", "MD", "NN", "NNS", "NNP",
          "NNPS", "PDT", "POS", "PRP", "PRP$", "RB", "RBR", "RBS", "RP", "SYM", "TO", "UH", "VB",
          "VBD", "VBG", "VBN", "VBP", "VBZ", "WDT", "WP", "WP$", "WRB", "#", "$", ".", ",", ":",
          "(", ")", "``", "''", "-LRB-", "-RRB-");

  static String chunks(Sentence s) {
    return s.chunks().stream()
        .map(c -> "[" + c.type() + " " + c.text() + "]")
        .collect(Collectors.joining(" "));
  }

  @Test
  void chunksTheConll2000ExampleAsPublished() {
    // Tjong Kim Sang & Buchholz (2000), CoNLL-2000 shared task, the example sentence.
    Analysis a =
        ANALYZER.analyze(
            "He reckons the current account deficit will narrow to only # 1.8 billion in"
                + " September .");
    assertEquals(1, a.sentences().size());
    assertEquals(
        "[NP He] [VP reckons] [NP the current account deficit] [VP will narrow] [PP to]"
            + " [NP only # 1.8 billion] [PP in] [NP September]",
        chunks(a.sentences().get(0)));
  }

  @Test
  void tagsComeFromThePennTreebankSet() {
    Analysis a =
        ANALYZER.analyze(
            "Wasn't sure the grinder would fit under my cabinets. Delivery was fast, 5 days!"
                + " Great price (€249) for a tested machine 👍");
    List<String> tags = new ArrayList<>();
    a.sentences().forEach(s -> s.tokens().forEach(t -> tags.add(t.pos())));
    assertFalse(tags.isEmpty());
    for (String tag : tags) {
      assertTrue(PENN.contains(tag), "not a Penn Treebank tag: " + tag);
    }
  }

  @Test
  void shoutedWordsAreTaggedAsWords() {
    Token not = ANALYZER.analyze("It did NOT arrive on time").sentences().get(0).tokens().get(2);
    assertEquals("NOT", not.text());
    assertEquals("RB", not.pos());
  }

  @Test
  void offsetsPointIntoTheMaskedText() {
    String text = "Price was ok.\nDelivery date?? never shown\r\n- warranty: unclear";
    Analysis a = ANALYZER.analyze(text);
    assertEquals(3, a.sentences().size(), "each line is at least one sentence");
    for (Sentence s : a.sentences()) {
      assertEquals(s.text(), a.masked().substring(s.start(), s.end()));
      for (Token t : s.tokens()) {
        assertEquals(t.text(), a.masked().substring(t.start(), t.end()));
      }
      for (Chunk c : s.chunks()) {
        assertEquals(c.text(), a.masked().substring(c.start(), c.end()));
      }
    }
  }

  @Test
  void emojiStayWholeTokensAndPlaceholdersKeepTheirName() {
    Analysis a = ANALYZER.analyze("great machine😅👍 email me at jo@example.com ☕");
    List<String> tokens = new ArrayList<>();
    a.sentences().forEach(s -> s.tokens().forEach(t -> tokens.add(t.text())));
    for (String t : tokens) {
      assertFalse(Character.isHighSurrogate(t.charAt(t.length() - 1)), "half an emoji: " + t);
      assertFalse(Character.isLowSurrogate(t.charAt(0)), "half an emoji: " + t);
    }
    Token email =
        a.sentences().stream()
            .flatMap(s -> s.tokens().stream())
            .filter(t -> t.text().equals("[email]"))
            .findFirst()
            .orElseThrow();
    assertEquals("[email]", email.stem());
  }

  @Test
  void stemsAreLowerCasePorterStems() {
    List<Token> tokens = ANALYZER.analyze("Machines ARRIVED quickly").sentences().get(0).tokens();
    assertEquals(List.of("machin", "arriv", "quickli"), tokens.stream().map(Token::stem).toList());
  }

  @Test
  void emptyBlankAndEmojiOnlyAnswersGiveNoSentencesAndNoErrors() {
    for (String text : List.of("", "   ", "\n\n", "☕☕☕", "👍", "\u0000\u0007")) {
      Analysis a = ANALYZER.analyze(text);
      assertEquals(text, a.masked());
      assertFalse(a.truncated());
      for (Sentence s : a.sentences()) {
        assertTrue(s.end() <= text.length());
      }
    }
  }

  @Test
  void longAnswersAreAnalysedUpToTheCapAndFlagged() {
    String text = "The machine arrived late and the box was damaged. ".repeat(400);
    Analysis a = ANALYZER.analyze(text);
    assertEquals(20_000, text.length());
    assertTrue(a.truncated());
    assertEquals(text, a.masked(), "masking still covers the whole answer");
    int last = a.sentences().get(a.sentences().size() - 1).end();
    assertTrue(last <= TextAnalyzer.MAX_ANALYSED_CHARS, "analysis stops at the cap: " + last);
  }

  @Test
  void theLanguageOfALongAnswerIsJudgedOnItsAnalysedStart() {
    // English first, then far more German: the verdict (like the parse) reads only the start,
    // while masking still covers the whole answer.
    String text =
        "The grinder arrived late and the box was damaged, so I almost cancelled. ".repeat(70)
            + "Die Lieferung war sehr langsam und der Kundendienst hat nie geantwortet. "
                .repeat(2_000)
            + "Schreib mir an anna.k@example.com";
    Analysis a = ANALYZER.analyze(text);
    assertTrue(a.truncated());
    assertEquals(TextAnalyzer.ANALYSIS_LANGUAGE, a.language());
    assertFalse(a.foreign());
    assertTrue(a.masked().endsWith("[email]"), "masking reads the whole answer");
  }

  @Test
  void manyAnswersOnAllCoresMatchOneByOne() {
    Random random = new Random(11);
    List<String> answers = new ArrayList<>();
    String[] parts = {
      "no delivery date",
      "wasnt sure it would fit",
      "great price",
      "the warranty",
      "fast",
      "didn't know the shop",
      "shipping cost too high!",
      "tested machines 👍"
    };
    for (int i = 0; i < 600; i++) {
      answers.add(
          parts[random.nextInt(parts.length)] + ", " + parts[random.nextInt(parts.length)] + ".");
    }
    List<Analysis> all = ANALYZER.analyzeAll(answers, Progress.NONE);
    TextAnalyzer fresh = TextAnalyzer.english();
    for (int i = 0; i < answers.size(); i++) {
      assertEquals(fresh.analyze(answers.get(i)), all.get(i));
    }
  }

  @Test
  void randomUnicodeNeverBreaksTheAnalysisAndRepeatsExactly() {
    List<String> texts = RandomText.strings(new Random(20_261_201L), 400);
    List<Analysis> first = new ArrayList<>();
    for (String t : texts) {
      Analysis a = ANALYZER.analyze(t);
      for (Sentence s : a.sentences()) {
        assertTrue(0 <= s.start() && s.start() <= s.end() && s.end() <= a.masked().length());
        for (Token tok : s.tokens()) {
          assertTrue(s.start() <= tok.start() && tok.start() < tok.end() && tok.end() <= s.end());
        }
      }
      first.add(a);
    }
    List<Analysis> again = new ArrayList<>();
    TextAnalyzer fresh = TextAnalyzer.english();
    for (String t : RandomText.strings(new Random(20_261_201L), 400)) {
      again.add(fresh.analyze(t));
    }
    assertEquals(first, again);
  }
}
