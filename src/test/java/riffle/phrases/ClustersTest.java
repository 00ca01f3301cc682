package riffle.phrases;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import riffle.model.PhraseCluster;
import riffle.model.PhraseReport;

/** Phrases that travel together in invented answers, and phrases that do not. */
class ClustersTest {
  private static final List<String> DELIVERY =
      List.of(
          "The delivery date was vague.",
          "Delivery date?",
          "The delivery date came too late.",
          "The delivery date was hidden.");
  private static final List<String> SHIPPING =
      List.of(
          "The shipping cost was high.",
          "Shipping cost too steep.",
          "I hated the shipping cost.",
          "The shipping cost came late.");

  /**
   * 10 answers name the delivery date and the shipping cost together, 3 each name one of them
   * alone; "great price" and "warranty" are each in 18 of the 60 answers and meet about as often as
   * chance has them (6 times).
   */
  private static List<PhraseDoc> answers() {
    Answers.Builder b = Answers.builder();
    for (int i = 0; i < 10; i++) {
      b.add(1, DELIVERY.get(i % 4) + " " + SHIPPING.get((i / 2) % 4));
    }
    for (int i = 0; i < 3; i++) {
      b.add(1, DELIVERY.get(i));
      b.add(1, SHIPPING.get(i + 1));
    }
    String[] price = {"A great price.", "Great price, honestly.", "Such a great price!"};
    String[] warranty = {"The warranty.", "Warranty!", "I liked the warranty."};
    for (int i = 0; i < 6; i++) {
      b.add(1, price[i % 3] + " " + warranty[i % 3]);
      b.add(2, price[(i + 1) % 3]);
      b.add(2, warranty[(i + 2) % 3]);
    }
    b.add(4, "Nothing really, it was all clear.");
    return b.build();
  }

  @Test
  void phrasesNamedTogetherFormOneClusterWithItsQuery() {
    PhraseReport report =
        PhraseMiner.create(PhraseSettings.defaults()).mine(answers(), PhraseFilter.all());
    assertEquals(50, report.answers());
    assertEquals(13, Answers.phrase(report, "delivery date").answers());
    assertEquals(13, Answers.phrase(report, "shipping cost").answers());
    assertEquals(1, report.clusters().size(), report.clusters().toString());
    PhraseCluster c = report.clusters().get(0);
    assertEquals(List.of("delivery date", "shipping cost"), c.phrases());
    assertEquals(16, c.answers());
    assertEquals(10 / 16.0, c.cohesion(), 1e-12);
    assertEquals("\"delivery date\" OR \"shipping cost\"", c.query());
  }

  @Test
  void phrasesMeetingAsOftenAsChanceAreNotAssociated() {
    assertEquals(0, Clusters.associated(6, 18, 18, 50, 3));
    assertTrue(Clusters.associated(10, 13, 13, 60, 3) > 0);
    assertEquals(0, Clusters.associated(2, 2, 2, 60, 3), "fewer shared answers than the minimum");
    assertEquals(0, Clusters.associated(3, 40, 40, 60, 3), "less often than chance");
  }

  @Test
  void aPhraseNeverTravelsWithALongerPhraseContainingIt() {
    Answers.Builder b = Answers.builder();
    for (int i = 0; i < 8; i++) {
      b.add(1, i % 2 == 0 ? "I wanted a firm delivery date." : "A firm delivery date would help.");
      b.add(1, DELIVERY.get(i % 4));
    }
    b.add(6, "Nothing really.");
    PhraseReport report =
        PhraseMiner.create(PhraseSettings.defaults()).mine(b.build(), PhraseFilter.all());
    assertTrue(
        Answers.labels(report).contains("firm delivery date"), Answers.labels(report).toString());
    assertTrue(report.clusters().isEmpty(), report.clusters().toString());
  }

  @Test
  void queriesQuoteEveryPhraseAndEscapeQuotes() {
    assertEquals(
        "\"delivery date\" OR \"didn't know if it would fit\" OR \"say \\\"soon\\\"\"",
        PhraseMiner.query(List.of("delivery date", "didn't know if it would fit", "say \"soon\"")));
  }
}
