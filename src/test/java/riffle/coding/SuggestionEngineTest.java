package riffle.coding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;
import riffle.model.Analysis;
import riffle.model.CodeMetrics;
import riffle.model.CodedExample;
import riffle.model.Suggestion;
import riffle.text.TextAnalyzer;

class SuggestionEngineTest {
  static final long PRICE_TOO_HIGH = 1;
  static final long PRICE_FINE = 2;
  static final long DELIVERY_DATE = 3;
  static final long LOUD_GRINDER = 4;
  static final List<Long> CODES = List.of(PRICE_TOO_HIGH, PRICE_FINE, DELIVERY_DATE, LOUD_GRINDER);

  private static final class Shared {
    static final TextAnalyzer ENGLISH = TextAnalyzer.english();
    static final List<CodedExample> EXAMPLES = invented();
  }

  static Analysis analyse(String text) {
    return Shared.ENGLISH.analyze(text);
  }

  private static final String[] OPENERS = {"", "honestly ", "well ", "to be fair ", "hmm "};
  private static final String[] CLOSERS = {"", " for me", " sadly", " to be honest", " overall"};

  /**
   * Invented answers to "What almost stopped you from ordering?". "not" occurs in answers of both
   * price codes (outside the negation scope in the first), so only the negated stem tells "not
   * expensive" from "expensive".
   */
  static List<CodedExample> invented() {
    String[][] templates = {
      {
        "i was not sure, but it was expensive",
        "it was expensive",
        "the machine felt expensive",
        "way too expensive",
        "not what i hoped, it was expensive",
        "quite expensive for a used machine"
      },
      {
        "it was not expensive",
        "the machine was not expensive at all",
        "not expensive, just had to decide",
        "it wasnt expensive",
        "never expensive there",
        "not expensive for a used machine"
      },
      {
        "i did not know the delivery date",
        "no delivery date was shown",
        "unclear when it would be delivered",
        "the delivery date was missing",
        "could not see a delivery date"
      },
      {"the grinder sounded loud in the video"},
      {
        "i liked the colours",
        "the website looked nice",
        "my partner had to agree first",
        "i was comparing a few shops",
        "the photos were small"
      }
    };
    int[] copies = {30, 30, 30, 3, 30};
    long[] codes = {PRICE_TOO_HIGH, PRICE_FINE, DELIVERY_DATE, LOUD_GRINDER, -1};
    Random r = new Random(11);
    List<String> texts = new ArrayList<>();
    List<Long> labels = new ArrayList<>();
    for (int t = 0; t < templates.length; t++) {
      for (int i = 0; i < copies[t]; i++) {
        String body = templates[t][i % templates[t].length];
        texts.add(OPENERS[r.nextInt(OPENERS.length)] + body + CLOSERS[r.nextInt(CLOSERS.length)]);
        labels.add(codes[t]);
      }
    }
    List<Analysis> analyses = Shared.ENGLISH.analyzeAll(texts, riffle.model.Progress.NONE);
    List<CodedExample> out = new ArrayList<>();
    for (int i = 0; i < texts.size(); i++) {
      Set<Long> c = labels.get(i) < 0 ? Set.of() : Set.of(labels.get(i));
      out.add(new CodedExample(100 + i, "Wave 1/R-" + i, analyses.get(i), c));
    }
    return List.copyOf(out);
  }

  static SuggestionEngine trained() {
    return SuggestionEngine.train(Shared.EXAMPLES, CODES, SuggestSettings.defaults());
  }

  static List<Long> codes(List<Suggestion> suggestions) {
    return suggestions.stream().map(Suggestion::codeId).toList();
  }

  static CodeMetrics metrics(SuggestionEngine e, long code) {
    return e.metrics().stream().filter(m -> m.codeId() == code).findFirst().orElseThrow();
  }

  @Test
  void notExpensiveAndExpensiveGetDifferentCodes() {
    SuggestionEngine engine = trained();
    List<Long> fine =
        codes(engine.suggest(1, analyse("well it was not expensive for me"), Set.of()));
    List<Long> high = codes(engine.suggest(2, analyse("well it was expensive for me"), Set.of()));
    assertEquals(List.of(PRICE_FINE), fine);
    assertEquals(List.of(PRICE_TOO_HIGH), high);
    // A cue no training answer used: only the negation mark links it to "not expensive".
    List<Long> hardly =
        codes(engine.suggest(3, analyse("honestly it was hardly expensive"), Set.of()));
    assertEquals(List.of(PRICE_FINE), hardly);
  }

  @Test
  void sameExamplesAndSeedGiveIdenticalSuggestionsAndMetrics() {
    SuggestionEngine first = trained();
    List<CodedExample> shuffled = new ArrayList<>(Shared.EXAMPLES);
    Collections.shuffle(shuffled, new Random(5));
    SuggestionEngine second =
        SuggestionEngine.train(shuffled, List.of(4L, 3L, 2L, 1L), SuggestSettings.defaults());
    assertEquals(first.metrics(), second.metrics());
    for (String probe :
        List.of(
            "the price was not expensive",
            "expensive and no delivery date",
            "i could not see when it would be delivered, quite expensive too",
            "the photos looked nice")) {
      Analysis a = analyse(probe);
      assertEquals(first.suggest(9, a, Set.of()), second.suggest(9, a, Set.of()), probe);
    }
  }

  @Test
  void aCodeWithTooFewExamplesHasAMetricsRowButNoSuggestions() {
    SuggestionEngine engine = trained();
    CodeMetrics loud = metrics(engine, LOUD_GRINDER);
    assertEquals(new CodeMetrics(LOUD_GRINDER, 123, 3, null, null, null, null, false), loud);
    assertEquals(
        List.of(), engine.suggest(1, analyse("the grinder sounded loud in the video"), Set.of()));
    CodeMetrics price = metrics(engine, PRICE_TOO_HIGH);
    assertTrue(price.ready());
    assertEquals(30, price.support());
    assertNotNull(price.threshold());
    assertTrue(price.f1() > 0.8, "a learnable code is measured as learnable: " + price);
    assertEquals(
        CODES, engine.metrics().stream().map(CodeMetrics::codeId).toList(), "one row per code");
  }

  @Test
  void suggestionsLeaveOutAssignedCodesAndComeMostConfidentFirst() {
    SuggestionEngine engine = trained();
    Analysis both = analyse("way too expensive and no delivery date was shown");
    List<Suggestion> all = engine.suggest(7, both, Set.of());
    assertEquals(Set.of(PRICE_TOO_HIGH, DELIVERY_DATE), Set.copyOf(codes(all)));
    assertTrue(all.get(0).confidence() >= all.get(1).confidence());
    for (Suggestion s : all) {
      assertEquals(7, s.answerId());
      assertTrue(s.confidence() >= metrics(engine, s.codeId()).threshold());
    }
    assertEquals(List.of(DELIVERY_DATE), codes(engine.suggest(7, both, Set.of(PRICE_TOO_HIGH))));
  }

  @Test
  void answersWithoutAParseGetNoSuggestion() {
    SuggestionEngine engine = trained();
    Analysis german = analyse("Die Maschine war mir viel zu teuer und die Lieferung dauerte lange");
    assertTrue(german.sentences().isEmpty(), "the pipeline leaves foreign answers unparsed");
    assertEquals(List.of(), engine.suggest(1, german, Set.of()));
    assertEquals(List.of(), engine.suggest(2, analyse("zzqx"), Set.of()));
  }

  /**
   * Every respondent answers three times with the same invented words; a code sits on a third of
   * the respondents at random. A model can only recognise a respondent it has seen, so recall on
   * held-out folds stays low when folds keep respondents whole — and would be near perfect if a
   * respondent's copies were split between training and test.
   */
  @Test
  void heldOutFoldsNeverContainARespondentSeenInTraining() {
    Random r = new Random(3);
    String[] syllables = {"ka", "lo", "mi", "ren", "tu", "vo", "sha", "pel", "dri", "zun"};
    List<String> texts = new ArrayList<>();
    List<String> respondents = new ArrayList<>();
    for (int i = 0; i < 60; i++) {
      String a = word(r, syllables);
      String b = word(r, syllables);
      for (int copy = 0; copy < 3; copy++) {
        texts.add("the " + a + " and the " + b + " were fine with me");
        respondents.add("Wave 2/R-" + i);
      }
    }
    List<Analysis> analyses = Shared.ENGLISH.analyzeAll(texts, riffle.model.Progress.NONE);
    List<CodedExample> examples = new ArrayList<>();
    Random coin = new Random(8);
    boolean coded = false;
    for (int i = 0; i < texts.size(); i++) {
      if (i % 3 == 0) {
        coded = coin.nextInt(3) == 0;
      }
      examples.add(
          new CodedExample(i, respondents.get(i), analyses.get(i), coded ? Set.of(9L) : Set.of()));
    }
    SuggestionEngine engine =
        SuggestionEngine.train(examples, List.of(9L), SuggestSettings.defaults());
    CodeMetrics m = engine.metrics().get(0);
    assertTrue(m.ready());
    assertTrue(m.f1() < 0.6, "no respondent leaks from training into its test fold: " + m);
    // The same answers, each its own respondent: now copies leak across folds and the
    // cross-validated F1 becomes near perfect, which is why folds group by respondent.
    List<CodedExample> leaky = new ArrayList<>();
    for (CodedExample e : examples) {
      leaky.add(new CodedExample(e.answerId(), "row-" + e.answerId(), e.analysis(), e.codes()));
    }
    CodeMetrics leaked =
        SuggestionEngine.train(leaky, List.of(9L), SuggestSettings.defaults()).metrics().get(0);
    assertTrue(leaked.f1() > 0.9, "copies in training make the fold look easy: " + leaked);
  }

  private static String word(Random r, String[] syllables) {
    StringBuilder b = new StringBuilder();
    for (int s = 0; s < 3; s++) {
      b.append(syllables[r.nextInt(syllables.length)]);
    }
    return b.toString();
  }

  @Test
  void aCodeNoAnswerCarriesIsNotReady() {
    SuggestionEngine engine =
        SuggestionEngine.train(Shared.EXAMPLES, List.of(77L), SuggestSettings.defaults());
    CodeMetrics m = engine.metrics().get(0);
    assertFalse(m.ready());
    assertEquals(0, m.support());
    assertNull(m.precision());
    assertEquals(List.of(), engine.suggest(1, analyse("it was expensive"), Set.of()));
  }

  @Test
  void noExamplesGiveAnEngineThatSuggestsNothing() {
    SuggestionEngine engine = SuggestionEngine.train(List.of(), CODES, SuggestSettings.defaults());
    assertEquals(4, engine.metrics().size());
    assertTrue(engine.metrics().stream().noneMatch(CodeMetrics::ready));
    assertEquals(List.of(), engine.suggest(1, analyse("it was expensive"), Set.of()));
  }

  @Test
  void anAnswerGivenTwiceIsRefused() {
    CodedExample e = Shared.EXAMPLES.get(0);
    IllegalArgumentException x =
        assertThrows(
            IllegalArgumentException.class,
            () -> SuggestionEngine.train(List.of(e, e), CODES, SuggestSettings.defaults()));
    assertEquals("answer 100 appears twice among the coded examples", x.getMessage());
  }
}
