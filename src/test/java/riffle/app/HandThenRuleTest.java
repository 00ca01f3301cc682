package riffle.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.CodeFrequency;
import riffle.model.Findings;
import riffle.model.NotCompared;
import riffle.model.QuestionFindings;
import riffle.model.SegmentFindings;
import riffle.model.Share;
import riffle.model.WaveChange;
import riffle.stats.FisherExact;

/**
 * Issue 13's trial, end to end: wave 1 coded by hand, wave 2 touched only by saved rules. The codes
 * given by hand get no share in wave 2 and no verdict; a code given by hand in wave 1 and by rule
 * in wave 2 is not compared across the two; a code only rules give is counted over the answers its
 * rules ran on, labelled by rule; coverage is said; the coded CSV leaves unread cells blank.
 */
class HandThenRuleTest {
  @TempDir static Path dir;
  static Path file;
  static QuestionFindings q;

  @BeforeAll
  static void build() throws Exception {
    file = HandThenRule.build(dir);
    try (Project p = Project.openExisting(file)) {
      Findings f =
          p.reporting()
              .findings(
                  new FindingsQuery(
                      Optional.empty(), Optional.of("device"), Optional.empty(), Optional.empty()));
      q = f.questions().get(0);
    }
  }

  private static CodeFrequency row(String code) {
    return q.codes().stream().filter(c -> c.code().equals(code)).findFirst().orElseThrow();
  }

  @Test
  void coverageSaysWhoReadWhat() {
    assertEquals(80, q.coverage().get("Wave 1").read());
    assertEquals(80, q.coverage().get("Wave 1").answers());
    assertEquals(1, q.coverage().get("Wave 1").nonAnswers(), "n/a is apart");
    assertEquals(0, q.coverage().get("Wave 2").read());
    assertEquals(80, q.coverage().get("Wave 2").answers());
    assertEquals(List.of("Wave 2"), q.notCoded());
    assertEquals(Map.of("Wave 1", 80, "Wave 2", 0), q.bases());
  }

  @Test
  void codesGivenByHandHaveNoShareAndNoVerdictWhereNobodyRead() {
    CodeFrequency unsure = row(HandThenRule.UNSURE);
    assertEquals(31, unsure.waves().get("Wave 1").count());
    assertEquals(80, unsure.waves().get("Wave 1").base());
    assertFalse(unsure.waves().containsKey("Wave 2"));
    assertEquals("no answer of Wave 2 read by a person yet", unsure.noShare().get("Wave 2"));
    // What the counting before review state said: wave 2's 80 answers as "coded", none of them
    // carrying the code — a fall that Fisher's test calls certain.
    assertTrue(FisherExact.twoSided(0, 80, 31, 49) < 0.001);
    for (WaveChange c : q.changes()) {
      assertFalse(
          c.code().equals(HandThenRule.UNSURE) || c.code().equals(HandThenRule.DELIVERY),
          "no verdict for a code given by hand: " + c);
    }
    NotCompared n = notCompared(HandThenRule.UNSURE);
    assertEquals("Wave 1", n.from());
    assertEquals("Wave 2", n.to());
    assertEquals("no answer of Wave 2 read by a person yet", n.reason());
  }

  @Test
  void aCodeGivenByHandThenByRuleIsNotComparedAcrossTheTwo() {
    CodeFrequency delivery = row(HandThenRule.DELIVERY);
    assertFalse(delivery.byRule(), "a person gave it in wave 1");
    Share hand = delivery.waves().get("Wave 1");
    assertEquals(18, hand.count(), "the rule applied after reading adds nothing to the hand count");
    assertFalse(hand.byRule());
    Share rule = delivery.waves().get("Wave 2");
    assertTrue(rule.byRule());
    assertEquals(44, rule.count());
    assertEquals(80, rule.base(), "over every answer its rule ran on");
    assertTrue(notCompared(HandThenRule.DELIVERY).reason().contains("given by rule in Wave 2"));
  }

  @Test
  void aCodeOnlyRulesGiveIsCountedOverTheAnswersItsRulesRanOnAndSaysSo() {
    CodeFrequency price = row(HandThenRule.PRICE);
    assertTrue(price.byRule());
    assertEquals(13, price.waves().get("Wave 1").count());
    assertEquals(80, price.waves().get("Wave 1").base());
    assertEquals(18, price.waves().get("Wave 2").count());
    WaveChange c =
        q.changes().stream()
            .filter(x -> x.code().equals(HandThenRule.PRICE))
            .findFirst()
            .orElseThrow();
    assertTrue(c.byRule());
    assertEquals(WaveChange.NO_CLEAR_CHANGE, c.verdict());
  }

  @Test
  void saturationCountsTheAnswersAPersonRead() {
    assertEquals(80, q.saturation().coded());
    assertEquals(2, q.saturation().observed(), "the rule-only code is no person's finding");
  }

  @Test
  void segmentValuesDifferingInCaseOrSpaceAreOneAndBlanksAreAGroup() {
    List<String> values = q.segments().stream().map(SegmentFindings::value).toList();
    assertEquals(3, values.size(), values.toString());
    assertTrue(values.contains("Mobile"), "the spelling most answers use: " + values);
    assertEquals(SegmentFindings.NO_VALUE, values.get(2));
    int read = 0;
    int answers = 0;
    for (SegmentFindings s : q.segments()) {
      read += s.coverage().get("Wave 1").read();
      answers += s.coverage().get("Wave 2").answers();
      assertFalse(
          s.codes().stream()
              .filter(c -> c.code().equals(HandThenRule.UNSURE))
              .anyMatch(c -> c.waves().containsKey("Wave 2")),
          "no share of a hand code in an unread wave in any segment");
    }
    assertEquals(80, read);
    assertEquals(80, answers);
  }

  @Test
  void htmlAndMarkdownPrintCoverageAndTheReasonsInsteadOfAVerdict() throws Exception {
    try (Project p = Project.openExisting(file)) {
      Findings f =
          p.reporting()
              .findings(
                  new FindingsQuery(
                      Optional.empty(), Optional.of("device"), Optional.empty(), Optional.empty()));
      for (String doc : List.of(p.reporting().html(f, "t"), p.reporting().markdown(f, "t"))) {
        assertTrue(doc.contains("device: Mobile"), "the segment split");
        assertTrue(doc.contains("device: (no value)"));
        assertTrue(doc.contains("Wave 1 read 80 of 80 (100%)"), doc);
        assertTrue(doc.contains("Wave 2 read 0 of 80 (0%)"));
        assertTrue(doc.contains("no answer of Wave 2 read by a person yet"));
        assertTrue(doc.contains("given by rule in Wave 2: counted over different answers"));
        assertTrue(doc.contains("by rule"));
        assertFalse(doc.contains(" fell from"), "no fall is claimed");
        assertFalse(doc.contains(" rose from"), "no rise is claimed");
      }
    }
  }

  @Test
  void theCodedCsvLeavesUnreadCellsBlankAndSaysWhoRead() throws Exception {
    try (Project p = Project.openExisting(file)) {
      List<String> lines = p.reporting().codedCsv(Optional.empty(), false, false).lines().toList();
      assertEquals(
          "answer_id,respondent,wave,question,substantive,read,read_by,device,text,Unsure it fits,"
              + "Delivery time,Price",
          lines.get(0));
      for (String line : lines.subList(1, lines.size())) {
        List<String> cells = List.of(line.split(",", -1));
        int n = cells.size();
        if (cells.get(2).equals("Wave 1")) {
          assertEquals("1", cells.get(5), line);
          assertEquals("mila", cells.get(6), line);
          assertTrue(cells.get(n - 3).equals("0") || cells.get(n - 3).equals("1"), line);
        } else {
          assertEquals("0", cells.get(5), line);
          assertEquals("", cells.get(6), line);
          assertEquals("", cells.get(n - 3), "unread, so unknown: " + line);
          assertTrue(cells.get(n - 2).equals("") || cells.get(n - 2).equals("1"), line);
        }
      }
      String longCsv = p.reporting().codedCsv(Optional.empty(), true, false);
      assertTrue(longCsv.lines().findFirst().orElseThrow().contains(",read,read_by,"));
    }
  }

  private static NotCompared notCompared(String code) {
    return q.notCompared().stream().filter(n -> n.code().equals(code)).findFirst().orElseThrow();
  }
}
