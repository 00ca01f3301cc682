package riffle.quotes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.PropertyNamingStrategies;
import com.fasterxml.jackson.datatype.jdk8.Jdk8Module;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;
import riffle.model.Analysis;
import riffle.model.Quote;
import riffle.model.QuoteFindings;
import riffle.model.QuoteSlot;
import riffle.model.Sentence;
import riffle.model.Token;
import riffle.tools.SampleResponses;
import riffle.tools.SampleResponses.Theme;

/**
 * On the demo waves (all four, coded with the generator's planted themes), benefit lines and
 * objections come from the leading planted themes, each in that theme's own wording.
 */
class DemoQuotesTest {
  static final QuoteSettings SETTINGS = QuoteSettings.builder().latestWave("Wave 3").get();

  static QuoteFindings findings() {
    return QuoteRanker.rank(DemoQuotes.Demo.CODEBOOK, DemoQuotes.Demo.ANSWERS, SETTINGS);
  }

  /** The planted themes of one direction, most answers first (the generator's ground truth). */
  static List<String> leading(SampleResponses.Direction direction) {
    Map<String, Integer> counts = new HashMap<>();
    for (var w : SampleResponses.demoWaves()) {
      for (Theme t : SampleResponses.THEMES) {
        counts.merge(t.code(), w.count(t), Integer::sum);
      }
    }
    return SampleResponses.THEMES.stream()
        .filter(t -> t.direction() == direction)
        .map(Theme::code)
        .sorted(Comparator.comparing((String c) -> -counts.get(c)))
        .limit(QuoteSettings.DEFAULT_LEADING_THEMES)
        .toList();
  }

  /** Content stems of a theme's planted wording (short forms and sentence templates). */
  static Set<String> wording(Theme t) {
    Set<String> out = new HashSet<>();
    List<String> texts = new ArrayList<>(t.shortForms());
    texts.addAll(t.sentences());
    for (String text : texts) {
      String plain = text.replaceAll("\\{[a-z0-9]+\\}", " ").replaceAll("[\\[\\]|]", " ");
      out.addAll(stems(DemoQuotes.analyse(plain)));
    }
    return out;
  }

  static Set<String> stems(Analysis a) {
    Set<String> out = new HashSet<>();
    for (Sentence s : a.sentences()) {
      for (Token t : s.tokens()) {
        if (QuoteWords.isContent(t)) {
          out.add(t.stem());
        }
      }
    }
    return out;
  }

  /** The planted theme whose wording shares the most content stems with the text. */
  static String closestTheme(String text, SampleResponses.Direction direction) {
    Set<String> q = stems(DemoQuotes.analyse(text));
    String best = null;
    double most = -1;
    for (Theme t : SampleResponses.THEMES) {
      if (t.direction() != direction) {
        continue;
      }
      Set<String> w = wording(t);
      double shared = q.stream().filter(w::contains).count() / (double) w.size();
      if (shared > most) {
        most = shared;
        best = t.code();
      }
    }
    return best;
  }

  @Test
  void benefitLinesComeFromTheLeadingPlantedPraiseThemesInTheirOwnWording() {
    List<Quote> benefits = findings().candidates(QuoteSlot.BENEFIT);
    List<String> expected = leading(SampleResponses.Direction.PRAISE);
    assertEquals(expected, benefits.stream().map(Quote::code).toList());
    for (Quote q : benefits) {
      assertEquals(q.code(), closestTheme(q.text(), SampleResponses.Direction.PRAISE), q.text());
      assertTrue(q.count() >= 10, q + " is not a typical wording");
    }
  }

  @Test
  void objectionsComeFromTheLeadingPlantedFrictionThemesInTheirOwnWording() {
    List<Quote> objections = findings().candidates(QuoteSlot.OBJECTION);
    Set<String> expected = new HashSet<>(leading(SampleResponses.Direction.FRICTION));
    assertEquals(expected, new HashSet<>(objections.stream().map(Quote::code).toList()));
    assertEquals(expected.size() * QuoteSettings.DEFAULT_OBJECTION_QUOTES, objections.size());
    for (Quote q : objections) {
      assertEquals(q.code(), closestTheme(q.text(), SampleResponses.Direction.FRICTION), q.text());
    }
  }

  @Test
  void headlineIdeasAreShortPraise() {
    QuoteFindings f = findings();
    List<Quote> heads = f.candidates(QuoteSlot.HEADLINE);
    assertEquals(QuoteSettings.DEFAULT_PER_SLOT, heads.size());
    Set<String> praise = new HashSet<>();
    SampleResponses.THEMES.stream()
        .filter(t -> t.direction() == SampleResponses.Direction.PRAISE)
        .forEach(t -> praise.add(t.code()));
    for (Quote q : heads) {
      assertTrue(praise.contains(q.code()), q.code());
      assertTrue(q.text().split("\\s+").length <= QuoteSettings.DEFAULT_HEADLINE_MAX_WORDS);
    }
    for (QuoteSlot slot : List.of(QuoteSlot.SUBHEADLINE, QuoteSlot.PROOF)) {
      assertFalse(f.candidates(slot).isEmpty(), slot.name());
      assertTrue(f.candidates(slot).stream().allMatch(q -> praise.contains(q.code())));
    }
  }

  @Test
  void everyQuoteOfTheDemoIsVerbatimAtItsOffsets() {
    QuoteSettings wide = QuoteSettings.builder().perCode(1000).latestWave("Wave 3").get();
    QuoteFindings f = QuoteRanker.rank(DemoQuotes.Demo.CODEBOOK, DemoQuotes.Demo.ANSWERS, wide);
    Map<Long, QuoteSource> byId = new HashMap<>();
    DemoQuotes.Demo.ANSWERS.forEach(a -> byId.put(a.answerId(), a));
    List<Quote> all = new ArrayList<>(f.quotes());
    f.codes().forEach(c -> all.addAll(c.quotes()));
    assertTrue(all.size() > 1000, "quotes: " + all.size());
    int fresh = 0;
    for (Quote q : all) {
      QuoteSource s = byId.get(q.answerId());
      assertEquals(s.analysis().masked().substring(q.start(), q.end()), q.text());
      assertEquals(s.wave(), q.wave());
      assertEquals(s.respondent(), q.respondent());
      assertTrue(
          q.answerIds().stream()
              .allMatch(
                  id ->
                      byId.get(id).codes().stream()
                          .anyMatch(
                              c ->
                                  c == q.codeId()
                                      || DemoQuotes.Demo.CODEBOOK.stream()
                                          .anyMatch(
                                              k ->
                                                  k.id() == c
                                                      && k.parent().orElse(-1) == q.codeId()))));
      if (q.fresh()) {
        fresh++;
        assertEquals("Wave 3", q.wave());
        assertTrue(q.answerIds().stream().allMatch(id -> byId.get(id).wave().equals("Wave 3")));
      }
    }
    assertTrue(fresh > 0);
  }

  @Test
  void shuffledDemoAnswersGiveTheSameFindings() {
    List<QuoteSource> shuffled = new ArrayList<>(DemoQuotes.Demo.ANSWERS);
    Collections.shuffle(shuffled, new Random(20_260_901L));
    assertEquals(findings(), QuoteRanker.rank(DemoQuotes.Demo.CODEBOOK, shuffled, SETTINGS));
  }

  @Test
  void findingsSerialiseWithTheDesignedKeys() {
    ObjectMapper mapper =
        new ObjectMapper()
            .registerModule(new Jdk8Module())
            .setPropertyNamingStrategy(PropertyNamingStrategies.SNAKE_CASE);
    JsonNode root = mapper.valueToTree(findings());
    JsonNode quote = root.get("quotes").get(0);
    for (String key :
        new String[] {
          "code",
          "respondent",
          "question",
          "text",
          "score",
          "slot",
          "answer_id",
          "answer_ids",
          "count",
          "wave",
          "fresh",
          "start",
          "end",
          "segments"
        }) {
      assertTrue(quote.has(key), key);
    }
    assertEquals("HEADLINE", quote.get("slot").asText());
    JsonNode code = root.get("codes").get(0);
    for (String key : new String[] {"code_id", "code", "direction", "answers", "quotes"}) {
      assertTrue(code.has(key), key);
    }
    assertTrue(code.get("quotes").get(0).get("slot").isNull());
  }
}
