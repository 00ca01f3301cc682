package riffle.quotes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.OptionalLong;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;
import riffle.model.Code;
import riffle.model.CodeQuotes;
import riffle.model.Direction;
import riffle.model.Quote;
import riffle.model.QuoteFindings;
import riffle.model.QuoteSlot;
import riffle.model.Span;

class QuoteRankerTest {
  static final long PRICE = 1;
  static final long DELIVERY = 2;
  static final long VALUE = 3;
  static final long ADVICE = 4;

  static final List<Code> CODEBOOK =
      List.of(
          DemoQuotes.code(PRICE, "price too high", OptionalLong.empty(), Direction.FRICTION, 0),
          DemoQuotes.code(
              DELIVERY, "delivery unclear", OptionalLong.empty(), Direction.FRICTION, 1),
          DemoQuotes.code(VALUE, "good value", OptionalLong.empty(), Direction.PRAISE, 2),
          DemoQuotes.code(ADVICE, "helpful advice", OptionalLong.empty(), Direction.PRAISE, 3));

  /** Answers under construction; ids count from 1. */
  static final class Answers {
    final List<QuoteSource> list = new ArrayList<>();

    Answers add(String wave, String device, String text, Set<Long> codes, Map<Long, Span> spans) {
      int id = list.size() + 1;
      list.add(
          new QuoteSource(
              id,
              "R" + id,
              wave,
              "Why?",
              Map.of("device", device),
              DemoQuotes.analyse(text),
              codes,
              spans));
      return this;
    }

    Answers add(int copies, String wave, String text, long... codes) {
      Set<Long> set = new java.util.TreeSet<>();
      for (long c : codes) {
        set.add(c);
      }
      for (int i = 0; i < copies; i++) {
        add(wave, "mobile", text, set, Map.of());
      }
      return this;
    }

    Answers add(int copies, String text, long... codes) {
      return add(copies, "Spring", text, codes);
    }
  }

  static CodeQuotes of(QuoteFindings f, long code) {
    return f.codes().stream().filter(c -> c.codeId() == code).findFirst().orElseThrow();
  }

  static Answers shop() {
    return new Answers()
        .add(5, "The price was too high for a used machine.", PRICE)
        .add(3, "It was expensive, more than I wanted to spend.", PRICE)
        .add(
            2,
            "The price was not expensive at all, I just could not find a delivery date.",
            DELIVERY)
        .add(4, "I did not know when it would be delivered.", DELIVERY)
        .add(6, "Great value for money compared to a new machine.", VALUE)
        .add(
            3,
            "Great value for money compared to a new machine, and the chat helped me choose a"
                + " grinder.",
            VALUE,
            ADVICE)
        .add(4, "The chat helped me choose between two grinders.", ADVICE);
  }

  @Test
  void everyQuoteIsTheMaskedTextAtItsOffsets() {
    List<QuoteSource> answers = shop().list;
    QuoteFindings f = QuoteRanker.rank(CODEBOOK, answers, QuoteSettings.defaults());
    List<Quote> all = new ArrayList<>(f.quotes());
    f.codes().forEach(c -> all.addAll(c.quotes()));
    assertFalse(all.isEmpty());
    for (Quote q : all) {
      String masked = answers.get((int) q.answerId() - 1).analysis().masked();
      assertEquals(masked.substring(q.start(), q.end()), q.text());
    }
  }

  @Test
  void nearDuplicatesCollapseAndCountOnlyTheirOwnWording() {
    List<QuoteSource> answers =
        new Answers()
            .add(14, "Great value for money compared to a new machine.", VALUE)
            .add(3, "great value for money compared to a new one", VALUE)
            .add(2, "The chat helped me choose between two grinders.", VALUE)
            .list;
    CodeQuotes value = of(QuoteRanker.rank(CODEBOOK, answers, QuoteSettings.defaults()), VALUE);
    assertEquals(2, value.quotes().size(), value.quotes().toString());
    Quote top = value.quotes().get(0);
    assertEquals("Great value for money compared to a new machine.", top.text());
    // "… a new one" is shown with it but was not said this way: 14 buyers, not 17.
    assertEquals(14, top.count());
    assertEquals(14, top.answerIds().size());
    assertEquals(2, value.quotes().get(1).count());
    assertEquals(19, value.answers());
  }

  @Test
  void aWordingIsCountedByTheBuyersWhoWroteItAndShownInTheirMostCommonForm() {
    List<QuoteSource> answers =
        new Answers()
            .add(1, "Great value for money compared to a new machine from the big shops.", VALUE)
            .add(23, "Great value for money compared to a new machine", VALUE)
            .add(2, "great value for money, compared to a new machine!", VALUE)
            .list;
    CodeQuotes value = of(QuoteRanker.rank(CODEBOOK, answers, QuoteSettings.defaults()), VALUE);
    for (Quote q : value.quotes()) {
      if (q.text().contains("big shops")) {
        assertEquals(1, q.count(), q.toString());
      } else {
        // Case and punctuation aside, 25 buyers wrote it; shown as 23 of them wrote it.
        assertEquals(25, q.count(), q.toString());
        assertEquals("Great value for money compared to a new machine", q.text());
      }
    }
  }

  @Test
  void aStricterSimilarityKeepsVariantsApart() {
    List<QuoteSource> answers =
        new Answers()
            .add(4, "Great value for money compared to a new machine.", VALUE)
            .add(3, "great value for money compared to a new one", VALUE)
            .list;
    QuoteSettings strict = QuoteSettings.builder().similarity(1.0).get();
    assertEquals(2, of(QuoteRanker.rank(CODEBOOK, answers, strict), VALUE).quotes().size());
  }

  @Test
  void negatedFrictionWordsDoNotSpeakForAComplaint() {
    List<QuoteSource> answers =
        new Answers()
            .add(3, "The price was expensive for a used machine.", PRICE)
            .add(3, "The price was not expensive for a used machine.", PRICE)
            .list;
    List<Quote> quotes =
        of(QuoteRanker.rank(CODEBOOK, answers, QuoteSettings.defaults()), PRICE).quotes();
    assertEquals("The price was expensive for a used machine.", quotes.get(0).text());
    assertTrue(quotes.get(0).score() > quotes.get(1).score() * 1.5, quotes.toString());
  }

  @Test
  void anObjectionNeverContradictsItsTheme() {
    QuoteFindings f =
        QuoteRanker.rank(
            CODEBOOK,
            new Answers()
                .add(4, "The price was not expensive at all, it was fair.", PRICE)
                .add(1, "The price was too high.", PRICE)
                .list,
            QuoteSettings.defaults());
    List<Quote> objections = f.candidates(QuoteSlot.OBJECTION);
    assertEquals(List.of("The price was too high."), objections.stream().map(Quote::text).toList());
  }

  @Test
  void anAnswerWithTwoThemesIsQuotedForEachWithItsOwnClause() {
    QuoteFindings f = QuoteRanker.rank(CODEBOOK, shop().list, QuoteSettings.defaults());
    for (Quote q : of(f, ADVICE).quotes()) {
      assertFalse(q.text().contains("value"), q.text());
    }
    for (Quote q : of(f, VALUE).quotes()) {
      assertFalse(q.text().contains("chat"), q.text());
    }
  }

  @Test
  void aMarkedSpanChoosesTheSentence() {
    String text = "Delivery was quick. The price was good value for money for this grinder.";
    Answers a = new Answers();
    a.add(4, "The price was good value for money.", VALUE);
    int start = text.indexOf("Delivery");
    a.add("Spring", "mobile", text, Set.of(VALUE), Map.of(VALUE, new Span(start, start + 8)));
    List<Quote> quotes =
        of(QuoteRanker.rank(CODEBOOK, a.list, QuoteSettings.defaults()), VALUE).quotes();
    Quote fromSpan = quotes.stream().filter(q -> q.answerId() == 5).findFirst().orElseThrow();
    assertEquals("Delivery was quick.", fromSpan.text());
  }

  @Test
  void wordingNewInTheLatestWaveIsMarked() {
    List<QuoteSource> answers =
        new Answers()
            .add(3, "Spring", "Great value for money compared to a new machine.", VALUE)
            .add(2, "Autumn", "Great value for money compared to a new machine.", VALUE)
            .add(2, "Autumn", "Half the price of a new espresso machine, what a bargain.", VALUE)
            .list;
    QuoteSettings s = QuoteSettings.builder().latestWave("Autumn").get();
    List<Quote> quotes = of(QuoteRanker.rank(CODEBOOK, answers, s), VALUE).quotes();
    assertEquals(2, quotes.size());
    for (Quote q : quotes) {
      assertEquals(q.text().startsWith("Half"), q.fresh(), q.text());
    }
    QuoteSettings none = QuoteSettings.defaults();
    assertTrue(
        of(QuoteRanker.rank(CODEBOOK, answers, none), VALUE).quotes().stream()
            .noneMatch(Quote::fresh));
  }

  @Test
  void waveAndSegmentFiltersChooseWhatIsQuotedAndCounted() {
    Answers a =
        new Answers()
            .add(3, "Spring", "Great value for money compared to a new machine.", VALUE)
            .add(2, "Autumn", "Great value for money compared to a new machine.", VALUE);
    a.add(
        "Autumn",
        "desktop",
        "Great value for money compared to a new machine.",
        Set.of(VALUE),
        Map.of());
    QuoteSettings autumn = QuoteSettings.builder().waves(Set.of("Autumn")).get();
    CodeQuotes value = of(QuoteRanker.rank(CODEBOOK, a.list, autumn), VALUE);
    assertEquals(3, value.answers());
    Quote q = value.quotes().get(0);
    assertEquals(3, q.count());
    assertEquals(List.of(4L, 5L, 6L), q.answerIds());
    assertEquals("Autumn", q.wave());
    QuoteSettings desktop =
        QuoteSettings.builder().waves(Set.of("Autumn")).segments(Map.of("device", "desktop")).get();
    CodeQuotes d = of(QuoteRanker.rank(CODEBOOK, a.list, desktop), VALUE);
    assertEquals(1, d.answers());
    assertEquals(List.of(6L), d.quotes().get(0).answerIds());
    assertEquals(Map.of("device", "desktop"), d.quotes().get(0).segments());
  }

  @Test
  void theSameAnswersInAnotherOrderGiveTheSameFindings() {
    List<QuoteSource> answers = shop().list;
    QuoteFindings first = QuoteRanker.rank(CODEBOOK, answers, QuoteSettings.defaults());
    List<QuoteSource> shuffled = new ArrayList<>(answers);
    Collections.shuffle(shuffled, new Random(7));
    List<Code> codes = new ArrayList<>(CODEBOOK);
    Collections.reverse(codes);
    assertEquals(first, QuoteRanker.rank(CODEBOOK, answers, QuoteSettings.defaults()));
    assertEquals(first, QuoteRanker.rank(codes, shuffled, QuoteSettings.defaults()));
  }

  @Test
  void candidatesComeFromTheLeadingThemesOfEachDirection() {
    QuoteFindings f = QuoteRanker.rank(CODEBOOK, shop().list, QuoteSettings.defaults());
    List<Quote> benefits = f.candidates(QuoteSlot.BENEFIT);
    assertEquals(
        List.of("good value", "helpful advice"), benefits.stream().map(Quote::code).toList());
    for (Quote q : f.candidates(QuoteSlot.HEADLINE)) {
      assertTrue(q.text().split(" ").length <= QuoteSettings.DEFAULT_HEADLINE_MAX_WORDS, q.text());
      assertTrue(q.codeId() == VALUE || q.codeId() == ADVICE, q.code());
    }
    assertTrue(
        f.candidates(QuoteSlot.OBJECTION).stream()
            .allMatch(q -> q.codeId() == PRICE || q.codeId() == DELIVERY));
    QuoteSettings one = QuoteSettings.builder().leadingThemes(1).get();
    List<Quote> lead = QuoteRanker.rank(CODEBOOK, shop().list, one).candidates(QuoteSlot.BENEFIT);
    assertEquals(List.of("good value"), lead.stream().map(Quote::code).toList());
    for (Quote q : f.quotes()) {
      assertTrue(q.slot().isPresent());
    }
  }

  @Test
  void proofQuotesAreConcreteAndInTheFirstPerson() {
    QuoteFindings f =
        QuoteRanker.rank(
            CODEBOOK,
            new Answers()
                .add(3, "Great value for money.", VALUE)
                .add(2, "I paid 240 for a Brunic Pro that sells for 500 new.", VALUE)
                .list,
            QuoteSettings.defaults());
    List<Quote> proof = f.candidates(QuoteSlot.PROOF);
    assertEquals(
        List.of("I paid 240 for a Brunic Pro that sells for 500 new."),
        proof.stream().map(Quote::text).toList());
  }

  @Test
  void aThemeQuotesTheAnswersOfItsCodesButOnlyItsCodesCompeteForUses() {
    List<Code> codebook = new ArrayList<>(CODEBOOK);
    codebook.add(DemoQuotes.code(10, "service", OptionalLong.empty(), Direction.PRAISE, 4));
    codebook.set(
        3, DemoQuotes.code(ADVICE, "helpful advice", OptionalLong.of(10), Direction.PRAISE, 3));
    QuoteFindings f = QuoteRanker.rank(codebook, shop().list, QuoteSettings.defaults());
    assertEquals(of(f, ADVICE).answers(), of(f, 10).answers());
    assertEquals(7, of(f, 10).answers());
    assertTrue(f.quotes().stream().noneMatch(q -> q.codeId() == 10));
  }

  @Test
  void archivedCodesAreNotRankedAndACodeFilterLimitsTheRanking() {
    List<Code> codebook = new ArrayList<>(CODEBOOK);
    codebook.set(0, CODEBOOK.get(0).toBuilder().archived(true).build());
    QuoteFindings f = QuoteRanker.rank(codebook, shop().list, QuoteSettings.defaults());
    assertTrue(f.codes().stream().noneMatch(c -> c.codeId() == PRICE));
    QuoteFindings only =
        QuoteRanker.rank(CODEBOOK, shop().list, QuoteSettings.builder().codes(Set.of(VALUE)).get());
    assertEquals(List.of(VALUE), only.codes().stream().map(CodeQuotes::codeId).toList());
  }

  @Test
  void badInputIsRefusedWithTheReason() {
    List<QuoteSource> twice = new ArrayList<>(shop().list);
    twice.add(twice.get(0));
    IllegalArgumentException e =
        assertThrows(
            IllegalArgumentException.class,
            () -> QuoteRanker.rank(CODEBOOK, twice, QuoteSettings.defaults()));
    assertEquals("answer 1 is given twice", e.getMessage());
    List<QuoteSource> unknown = new Answers().add(1, "Nice.", 99).list;
    e =
        assertThrows(
            IllegalArgumentException.class,
            () -> QuoteRanker.rank(CODEBOOK, unknown, QuoteSettings.defaults()));
    assertEquals("answer 1 carries code 99, which is not in the codebook", e.getMessage());
    e =
        assertThrows(
            IllegalArgumentException.class,
            () ->
                new Answers()
                    .add("W", "mobile", "Short.", Set.of(VALUE), Map.of(VALUE, new Span(2, 40))));
    assertTrue(e.getMessage().contains("runs past the masked text"), e.getMessage());
    e =
        assertThrows(
            IllegalArgumentException.class,
            () ->
                new Answers()
                    .add("W", "mobile", "Short.", Set.of(VALUE), Map.of(PRICE, new Span(0, 2))));
    assertTrue(e.getMessage().contains("but not that code"), e.getMessage());
  }

  @Test
  void sourcesAreBuiltFromAssignments() {
    var analysis = DemoQuotes.analyse("Great value for money.");
    var at = java.time.Instant.parse("2026-01-01T00:00:00Z");
    QuoteSource s =
        QuoteSource.of(
            7,
            "R7",
            "Spring",
            "Why?",
            Map.of(),
            analysis,
            List.of(
                new riffle.model.Assignment(
                    7,
                    VALUE,
                    java.util.Optional.of(new Span(0, 5)),
                    "ak",
                    riffle.model.Origin.MANUAL,
                    at),
                new riffle.model.Assignment(
                    7, ADVICE, java.util.Optional.empty(), "ak", riffle.model.Origin.RULE, at)));
    assertEquals(Set.of(VALUE, ADVICE), s.codes());
    assertEquals(Map.of(VALUE, new Span(0, 5)), s.spans());
    assertThrows(
        IllegalArgumentException.class,
        () ->
            QuoteSource.of(
                8,
                "R8",
                "Spring",
                "Why?",
                Map.of(),
                analysis,
                List.of(
                    new riffle.model.Assignment(
                        7,
                        VALUE,
                        java.util.Optional.empty(),
                        "ak",
                        riffle.model.Origin.MANUAL,
                        at))));
  }
}
