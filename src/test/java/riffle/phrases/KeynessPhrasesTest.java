package riffle.phrases;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import riffle.model.KeyPhrase;
import riffle.model.WaveChange;
import riffle.stats.ChiSquare;
import riffle.stats.Keyness;
import riffle.stats.LogLikelihood;

/** Keyness of phrases between two invented waves of 40 answers each. */
class KeynessPhrasesTest {
  private static final PhraseMiner MINER = PhraseMiner.create(PhraseSettings.defaults());
  private static final PhraseFilter WAVE_2 = PhraseFilter.all().withWave("Wave 2");
  private static final PhraseFilter WAVE_3 = PhraseFilter.all().withWave("Wave 3");
  private static final List<String> DELIVERY =
      List.of(
          "The delivery date was vague.",
          "Delivery date?",
          "The delivery date came too late.",
          "The delivery date was hidden.");
  private static final List<String> OTHER =
      List.of(
          "The warranty was clear.",
          "I had to convince my partner first.",
          "Shipping cost on top of it.",
          "The checkout was slow on my phone.",
          "Nothing really.",
          "Great price for the quality.",
          "I wasn't sure the grinder would match.",
          "The photos were honest.");

  private static List<PhraseDoc> docs;

  /** Wave 2: 12 of 40 answers name the delivery date; Wave 3: 2 of 40; the rest alike. */
  @BeforeAll
  static void analyse() {
    Answers.Builder b = Answers.builder();
    for (int i = 0; i < 40; i++) {
      String wave2 = i < 12 ? DELIVERY.get(i % 4) : OTHER.get(i % OTHER.size());
      String wave3 = i < 2 ? DELIVERY.get(i) : OTHER.get(i % OTHER.size());
      b.add(1, "Wave 2", Answers.STOPPED, i % 2 == 0 ? "mobile" : "desktop", wave2);
      b.add(1, "Wave 3", Answers.STOPPED, i < 20 ? "mobile" : "desktop", wave3);
    }
    docs = b.build();
  }

  private static KeyPhrase key(List<KeyPhrase> list, String phrase) {
    return list.stream().filter(k -> k.phrase().equals(phrase)).findFirst().orElse(null);
  }

  @Test
  void aPhraseThatFellIsKeyWithItsLogLikelihoodLogRatioAndPValue() {
    List<KeyPhrase> key = MINER.keyness(docs, WAVE_3, WAVE_2);
    KeyPhrase delivery = key(key, "delivery date");
    assertNotNull(delivery, key.toString());
    assertEquals(2, delivery.focus());
    assertEquals(12, delivery.reference());
    double g2 = LogLikelihood.g2(2, 38, 12, 28);
    assertEquals(g2, delivery.logLikelihood(), 1e-12);
    assertEquals(Keyness.logRatio(2, 12, 40, 40), delivery.logRatio(), 1e-12);
    assertEquals(Math.log(2.0 / 12) / Math.log(2), delivery.logRatio(), 1e-12);
    assertEquals(ChiSquare.upperTailDf1(g2), delivery.p(), 1e-15);
    assertTrue(delivery.p() < 0.01, "2 of 40 against 12 of 40");
    assertEquals("less", delivery.direction());
    assertEquals(delivery, key.get(0), "the largest change comes first");

    KeyPhrase reverse = key(MINER.keyness(docs, WAVE_2, WAVE_3), "delivery date");
    assertEquals("more", reverse.direction());
    assertEquals(delivery.logLikelihood(), reverse.logLikelihood(), 1e-12);
    assertEquals(-delivery.logRatio(), reverse.logRatio(), 1e-12);
  }

  @Test
  void aDirectionIsStatedOnlyWhereTheAdjustedPPassesTheFindingsThreshold() {
    List<KeyPhrase> key = MINER.keyness(docs, WAVE_3, WAVE_2);
    boolean someUnclear = false;
    for (KeyPhrase k : key) {
      if (k.pAdjusted() < WaveChange.SIGNIFICANCE) {
        assertEquals(k.direction().equals("more") ? WaveChange.ROSE : WaveChange.FELL, k.verdict());
      } else {
        assertEquals(WaveChange.NO_CLEAR_CHANGE, k.verdict(), k.toString());
        someUnclear = true;
      }
    }
    assertTrue(someUnclear, "most phrases compared do not change clearly: " + key);
    assertEquals(WaveChange.FELL, KeyPhrase.verdict("less", 0.049));
    assertEquals(WaveChange.NO_CLEAR_CHANGE, KeyPhrase.verdict("less", 0.05));
    assertEquals(WaveChange.ROSE, KeyPhrase.verdict("more", 0.001));
  }

  @Test
  void keyPhrasesAreSortedByLogLikelihood() {
    List<KeyPhrase> key = MINER.keyness(docs, WAVE_3, WAVE_2);
    assertTrue(key.size() > 1, key.toString());
    for (int i = 1; i < key.size(); i++) {
      assertTrue(key.get(i - 1).logLikelihood() >= key.get(i).logLikelihood(), key.toString());
    }
  }

  @Test
  void phrasesInFewerThanFiveAnswersOfTheTwoWavesAreNotCompared() {
    List<PhraseDoc> few =
        Answers.builder()
            .add(2, "Wave 2", Answers.STOPPED, "mobile", "The delivery date was vague.")
            .add(1, "Wave 2", Answers.STOPPED, "mobile", "Delivery date?")
            .add(1, "Wave 3", Answers.STOPPED, "mobile", "The delivery date was hidden.")
            .add(10, "Wave 3", Answers.STOPPED, "mobile", "Nothing really.")
            .build();
    assertNull(key(MINER.keyness(few, WAVE_3, WAVE_2), "delivery date"));
  }

  @Test
  void aSegmentIsComparedWithEveryOtherAnswer() {
    PhraseFilter mobile = PhraseFilter.all().withSegment("device", "mobile");
    List<KeyPhrase> key = MINER.keyness(docs, mobile, PhraseFilter.all());
    KeyPhrase delivery = key(key, "delivery date");
    assertNotNull(delivery, key.toString());
    // Wave 2 mobile: 6 of the 12; Wave 3 mobile: both. 40 mobile answers against 40 others.
    assertEquals(8, delivery.focus());
    assertEquals(6, delivery.reference());
    assertEquals(LogLikelihood.g2(8, 32, 6, 34), delivery.logLikelihood(), 1e-12);
  }

  @Test
  void nothingToCompareWhenOneSideIsEmpty() {
    assertEquals(List.of(), MINER.keyness(docs, PhraseFilter.all().withWave("Wave 9"), WAVE_2));
    assertEquals(List.of(), MINER.keyness(docs, WAVE_2, WAVE_2));
  }
}
