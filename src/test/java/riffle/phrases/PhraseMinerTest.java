package riffle.phrases;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import riffle.model.Phrase;
import riffle.model.PhraseExample;
import riffle.model.PhraseReport;

/** Mining the fixture {@code checkout-answers.tsv}: counts, filters, examples, determinism. */
class PhraseMinerTest {
  private static final PhraseMiner MINER =
      PhraseMiner.create(PhraseSettings.builder().minAnswers(2).get());
  private static final PhraseFilter STOPPED = PhraseFilter.all().withQuestion(Answers.STOPPED);

  private static List<PhraseDoc> docs;

  @BeforeAll
  static void analyse() throws IOException {
    docs = Answers.fixture();
  }

  @Test
  void countsEachPhraseByTheAnswersThatContainIt() {
    PhraseReport report = MINER.mine(docs, STOPPED);
    assertEquals(26, report.answers());
    Phrase delivery = Answers.phrase(report, "delivery date");
    assertNotNull(delivery, Answers.labels(report).toString());
    // "No idea about the delivery date" is negated, so 7 of the 8 mentions count.
    assertEquals(7, delivery.answers());
    assertEquals(Map.of("Wave 2", 6, "Wave 3", 1), delivery.waves());
    assertEquals(7, Answers.phrase(report, "shipping cost").answers());
    assertNotNull(Answers.phrase(report, "didn't know if it would fit"));
  }

  @Test
  void countsPerWaveListEveryWaveInOrderOfAppearanceIncludingZeros() {
    PhraseReport report = MINER.mine(docs, STOPPED);
    Phrase fit = Answers.phrase(report, "didn't know if it would fit");
    assertNotNull(fit, Answers.labels(report).toString());
    assertEquals(List.of("Wave 2", "Wave 3"), List.copyOf(fit.waves().keySet()));
    assertEquals(0, fit.waves().get("Wave 3"));
    assertEquals(2, fit.waves().get("Wave 2"));
  }

  @Test
  void examplesAreDistinctMaskedAnswersClosestToEightyCharacters() {
    PhraseReport report = MINER.mine(docs, STOPPED);
    Phrase delivery = Answers.phrase(report, "delivery date");
    List<PhraseExample> examples = delivery.examples();
    assertEquals(3, examples.size());
    Set<String> texts = new HashSet<>();
    for (PhraseExample e : examples) {
      assertTrue(texts.add(e.text()));
      PhraseDoc doc = docs.get((int) e.answerId() - 1);
      assertEquals(doc.analysis().masked(), e.text());
      assertEquals(doc.respondent(), e.respondent());
      assertEquals(doc.wave(), e.wave());
    }
    assertEquals(
        "The delivery date was vague and I needed it before my holiday.", examples.get(0).text());
    for (Phrase p : report.phrases()) {
      for (PhraseExample e : p.examples()) {
        assertFalse(e.text().contains("@example.net") || e.text().contains("07700"), e.text());
      }
    }
  }

  @Test
  void filtersSelectByWaveQuestionAndSegment() {
    PhraseReport wave3 = MINER.mine(docs, STOPPED.withWave("Wave 3"));
    assertEquals(8, wave3.answers());
    for (Phrase p : wave3.phrases()) {
      assertEquals(Set.of("Wave 3"), p.waves().keySet());
    }
    assertEquals(3, Answers.phrase(wave3, "shipping cost").answers());

    PhraseReport mobile = MINER.mine(docs, STOPPED.withSegment("device", "mobile"));
    assertEquals(14, mobile.answers());
    for (Phrase p : mobile.phrases()) {
      for (PhraseExample e : p.examples()) {
        assertEquals("mobile", docs.get((int) e.answerId() - 1).segments().get("device"));
      }
    }
    PhraseReport chose = MINER.mine(docs, PhraseFilter.all().withQuestion(Answers.CHOSE));
    assertEquals(13, chose.answers());
    assertTrue(Answers.labels(chose).contains("good value"), Answers.labels(chose).toString());
    assertFalse(Answers.labels(chose).contains("delivery date"));
    assertEquals(0, MINER.mine(docs, STOPPED.withWave("Wave 9")).answers());
  }

  @Test
  void sameAnswersGiveTheSameReportWhateverTheirOrder() {
    PhraseReport first = MINER.mine(docs, PhraseFilter.all());
    assertEquals(first, MINER.mine(docs, PhraseFilter.all()));
    List<PhraseDoc> shuffled = new ArrayList<>(docs);
    Collections.shuffle(shuffled, new Random(11));
    PhraseReport again = MINER.mine(shuffled, PhraseFilter.all());
    assertEquals(first.answers(), again.answers());
    assertEquals(first.clusters(), again.clusters());
    assertEquals(first.phrases().size(), again.phrases().size());
    for (int i = 0; i < first.phrases().size(); i++) {
      Phrase a = first.phrases().get(i);
      Phrase b = again.phrases().get(i);
      assertEquals(a.phrase(), b.phrase());
      assertEquals(a.answers(), b.answers());
      assertEquals(a.score(), b.score(), 1e-9);
      assertEquals(a.variants(), b.variants());
      assertEquals(a.examples(), b.examples());
      assertEquals(a.waves(), b.waves(), "same counts; only the order of the waves may differ");
    }
  }

  @Test
  void phrasesAreSortedByScoreThenAnswersThenLabel() {
    List<Phrase> phrases = MINER.mine(docs, PhraseFilter.all()).phrases();
    for (int i = 1; i < phrases.size(); i++) {
      Phrase a = phrases.get(i - 1);
      Phrase b = phrases.get(i);
      assertTrue(
          a.score() > b.score()
              || (a.score() == b.score() && a.answers() > b.answers())
              || (a.score() == b.score()
                  && a.answers() == b.answers()
                  && a.phrase().compareTo(b.phrase()) < 0),
          a + " before " + b);
    }
  }

  @Test
  void aLongAnswerGivesOnlyItsStartAsAnExample() {
    String tail = " and the warranty card was missing".repeat(400);
    List<PhraseDoc> longOnes =
        new Answers.Builder()
            .add(1, "The tamper was missing from the box" + tail)
            .add(1, "Again the tamper was missing from the box" + tail)
            .build();
    PhraseReport report = MINER.mine(longOnes, PhraseFilter.all());
    assertFalse(report.phrases().isEmpty());
    for (Phrase p : report.phrases()) {
      for (PhraseExample e : p.examples()) {
        String whole = longOnes.get((int) e.answerId() - 1).analysis().masked();
        assertEquals(whole.substring(0, riffle.model.ShownText.MAX_CHARS), e.text());
      }
    }
  }

  @Test
  void limitKeepsTheBestPhrases() {
    PhraseReport all = MINER.mine(docs, PhraseFilter.all());
    PhraseMiner three =
        PhraseMiner.create(PhraseSettings.builder().minAnswers(2).limit(3).examples(1).get());
    PhraseReport top = three.mine(docs, PhraseFilter.all());
    assertEquals(3, top.phrases().size());
    for (int i = 0; i < 3; i++) {
      assertEquals(all.phrases().get(i).phrase(), top.phrases().get(i).phrase());
      assertEquals(1, top.phrases().get(i).examples().size());
    }
  }

  @Test
  void noAnswersGiveAnEmptyReport() {
    PhraseReport report = MINER.mine(List.of(), PhraseFilter.all());
    assertEquals(new PhraseReport(0, List.of(), List.of()), report);
  }
}
