package riffle.phrases;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.junit.jupiter.api.Test;
import riffle.model.Phrase;
import riffle.model.PhraseExample;
import riffle.model.PhraseReport;

/** Which phrases invented Ondalune answers yield, and how they are counted and labelled. */
class PhraseCandidatesTest {
  private static final PhraseMiner MINER = PhraseMiner.create(PhraseSettings.defaults());

  private static PhraseReport mine(Answers.Builder answers) {
    return MINER.mine(answers.build(), PhraseFilter.all());
  }

  @Test
  void nounPhrasesLoseTheirLeadingDeterminersAndPronouns() {
    PhraseReport report =
        mine(
            Answers.builder()
                .add(2, "The delivery date was vague.")
                .add(1, "My delivery date moved twice.")
                .add(1, "A delivery date would have helped."));
    Phrase p = Answers.phrase(report, "delivery date");
    assertNotNull(p, Answers.labels(report).toString());
    assertEquals(4, p.answers());
    for (String label : Answers.labels(report)) {
      String first = label.toLowerCase(Locale.ROOT).split(" ")[0];
      assertFalse(Set.of("the", "my", "a").contains(first), label);
    }
  }

  @Test
  void adjectiveNounVerbObjectAndVerbParticleAreCandidates() {
    PhraseReport report =
        mine(
            Answers.builder()
                .add(2, "Great price for a dual boiler.")
                .add(1, "A great price, honestly.")
                .add(3, "I liked the video of the machine pulling a shot.")
                .add(1, "The shipping fee showed up at the very end.")
                .add(1, "A surcharge showed up at checkout.")
                .add(1, "Extra costs only showed up after I entered my card."));
    List<String> labels = Answers.labels(report);
    assertTrue(labels.contains("Great price"), labels.toString());
    assertTrue(labels.contains("liked the video"), labels.toString());
    assertTrue(labels.contains("showed up"), labels.toString());
  }

  @Test
  void singleWordsOnlyWhenAFrequentNounOrAdjectiveStandsAlone() {
    PhraseReport report =
        mine(
            Answers.builder()
                .add(6, "The price.")
                .add(5, "Warranty?")
                .add(8, "I ordered it.")
                .add(4, "I checked the price difference twice before ordering."));
    List<String> labels = Answers.labels(report);
    Phrase price = Answers.phrase(report, "price");
    assertNotNull(price, labels.toString());
    // Only the six answers where "price" is a noun phrase of its own count for the single word.
    assertEquals(6, price.answers());
    assertFalse(labels.contains("Warranty"), "5 answers are under twice the minimum support");
    assertFalse(labels.contains("ordered"), "a verb is never a phrase on its own");
  }

  @Test
  void phrasesNeverCrossPunctuation() {
    PhraseReport report =
        mine(
            Answers.builder()
                .add(5, "Shipping, cost and warranty were all unclear.")
                .add(1, "The shipping cost was unclear.")
                .add(1, "Shipping cost too high")
                .add(1, "I hated the shipping cost."));
    Phrase p = Answers.phrase(report, "shipping cost");
    assertNotNull(p, Answers.labels(report).toString());
    assertEquals(3, p.answers());
  }

  @Test
  void placeholdersNeverAppearInPhrases() {
    PhraseReport report =
        mine(
            Answers.builder()
                .add(4, "Please email anna.k@example.com about the delivery date.")
                .add(3, "Call me on 07700 900123 about the delivery date.")
                .add(3, "My order ORD-48213 had no tracking link."));
    Phrase p = Answers.phrase(report, "delivery date");
    assertNotNull(p, Answers.labels(report).toString());
    assertEquals(7, p.answers());
    for (Phrase phrase : report.phrases()) {
      for (String v : phrase.variants()) {
        assertFalse(v.contains("[") || v.contains("example") || v.contains("07700"), v);
      }
      for (PhraseExample e : phrase.examples()) {
        assertFalse(e.text().contains("anna.k@example.com"), e.text());
      }
    }
  }

  @Test
  void foreignAnswersCountInNoPhrase() {
    List<PhraseDoc> docs =
        Answers.builder()
            .add(6, "Ich wusste nicht, wann die Lieferung kommt und ob die Garantie gilt.")
            .add(1, "The delivery date was missing.")
            .add(1, "Delivery date!")
            .add(1, "I wanted a firm delivery date.")
            .build();
    assertTrue(docs.get(0).analysis().foreign(), "precondition: the German answer is foreign");
    PhraseReport report = MINER.mine(docs, PhraseFilter.all());
    assertEquals(9, report.answers());
    assertEquals(List.of("delivery date"), Answers.labels(report));
    assertEquals(3, report.phrases().get(0).answers());
  }

  @Test
  void aNegatedPredicateNeverCountsAsItsPositive() {
    PhraseReport report =
        mine(
            Answers.builder()
                .add(3, "It did not arrive on time.")
                .add(1, "My grinder didn't arrive on time, sadly.")
                .add(3, "It arrived on time."));
    Phrase praise = Answers.phrase(report, "arrived on time");
    assertNotNull(praise, Answers.labels(report).toString());
    assertEquals(3, praise.answers());
    assertFalse(praise.negated());
    Phrase complaint = Answers.phrase(report, "did not arrive on time");
    assertNotNull(complaint, Answers.labels(report).toString());
    assertTrue(complaint.negated());
    assertEquals(4, complaint.answers());
    assertTrue(
        complaint.variants().contains("didn't arrive on time"), complaint.variants()::toString);
    assertEquals(praise.stems(), complaint.stems(), "same words, told apart by the flag only");
  }

  @Test
  void aNegatedPhraseIsLabelledWithTheBuyersCue() {
    PhraseReport report =
        mine(
            Answers.builder()
                .add(2, "I didn't know if it would fit.")
                .add(1, "Didnt know if it would fit under the cabinet")
                .add(1, "I did not know if it would fit next to the kettle."));
    Phrase p = Answers.phrase(report, "didn't know if it would fit");
    assertNotNull(p, Answers.labels(report).toString());
    assertTrue(p.negated());
    assertEquals(4, p.answers());
    assertTrue(
        p.variants()
            .containsAll(List.of("did not know if it would fit", "Didnt know if it would fit")),
        p.variants()::toString);
    assertNull(Answers.phrase(report, "would fit"), "words inside the scope give no plain phrase");
  }

  @Test
  void variantsAreGroupedByStemsAndLabelledWithTheMostFrequentForm() {
    PhraseReport report =
        mine(
            Answers.builder()
                .add(2, "delivery date")
                .add(1, "Delivery Date?")
                .add(1, "I wanted clear delivery dates.")
                .add(1, "The delivery date was vague")
                .add(1, "delivery date, delivery date!!"));
    Phrase p = Answers.phrase(report, "delivery date");
    assertNotNull(p, Answers.labels(report).toString());
    assertEquals(6, p.answers(), "an answer that repeats the phrase counts once");
    assertEquals(List.of("delivery date", "delivery dates"), p.variants());
    assertEquals("deliveri date", p.stems());
    assertEquals(1, report.phrases().stream().filter(x -> x.stems().equals(p.stems())).count());
  }

  @Test
  void stopPhrasesAreNeverReported() {
    Answers.Builder answers =
        Answers.builder()
            .add(4, "No particular reason.")
            .add(1, "No particular reason, the site just felt right.")
            .add(2, "The delivery date was vague.")
            .add(2, "Delivery date?");
    List<PhraseDoc> docs = answers.build();
    List<String> byDefault = Answers.labels(MINER.mine(docs, PhraseFilter.all()));
    assertFalse(byDefault.contains("No particular reason"), byDefault.toString());
    assertTrue(byDefault.contains("delivery date"), byDefault.toString());

    PhraseMiner noStops = PhraseMiner.create(PhraseSettings.builder().stopPhrases(Set.of()).get());
    assertTrue(
        Answers.labels(noStops.mine(docs, PhraseFilter.all())).contains("No particular reason"));

    PhraseMiner custom =
        PhraseMiner.create(PhraseSettings.builder().stopPhrases(Set.of("Delivery  Date")).get());
    assertFalse(Answers.labels(custom.mine(docs, PhraseFilter.all())).contains("delivery date"));
  }

  /** Dunning's test: a pair whose words each go with many others is no phrase. */
  @Test
  void twoWordsMustBelongTogether() {
    Answers.Builder answers = Answers.builder().add(3, "good machine").add(3, "delivery date");
    for (String noun : List.of("service", "packaging", "support", "advice", "photos", "value")) {
      answers.add(3, "good " + noun);
    }
    for (String word : List.of("lever", "espresso", "old", "new", "second", "demo")) {
      answers.add(3, word + " machine");
    }
    List<String> labels = Answers.labels(mine(answers));
    assertTrue(labels.contains("delivery date"), labels.toString());
    assertFalse(labels.contains("good machine"), labels.toString());
  }
}
