package riffle.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import org.junit.jupiter.api.Test;
import riffle.model.CodeFrequency;
import riffle.model.InputException;
import riffle.model.NotCompared;
import riffle.model.QuestionFindings;
import riffle.model.SegmentFindings;
import riffle.model.Share;
import riffle.model.WaveChange;
import riffle.stats.Interval;
import riffle.stats.Proportions;

/**
 * Bases follow coverage: a share of a code given by hand is over the answers people read in that
 * wave; a code only rules give is over the answers its rules ran on; a comparison is made only
 * between shares of the same kind, and the findings say why the others are not.
 */
class ReviewBasesTest {
  static final List<ReportCode> BOOK =
      List.of(
          new ReportCode("fit", "Unsure it fits", Optional.empty(), "friction", false),
          new ReportCode("late", "Delivery time", Optional.empty(), "friction", false),
          new ReportCode("price", "Price", Optional.empty(), "friction", false));

  final List<ReportAnswer> answers = new ArrayList<>();
  long sequence;

  /** Adds n answers of a wave: read or not, with codes a person gave and codes a rule gave. */
  void add(String wave, int n, boolean read, Set<String> hand, Set<String> rule, String device) {
    for (int i = 0; i < n; i++) {
      Set<String> codes = new java.util.HashSet<>(hand);
      codes.addAll(rule);
      sequence++;
      answers.add(
          new ReportAnswer(
              wave + "-" + sequence,
              wave,
              "Q",
              true,
              codes,
              device == null ? Map.of() : Map.of("device", device),
              read ? OptionalLong.of(sequence) : OptionalLong.empty(),
              read,
              rule));
    }
  }

  QuestionFindings compute(List<String> waves, ReportSettings settings) {
    return Report.compute(new ReportInput(List.of("Q"), waves, BOOK, answers), settings)
        .questions()
        .get(0);
  }

  static CodeFrequency row(QuestionFindings q, String id) {
    return q.codes().stream().filter(c -> c.codeId().equals(id)).findFirst().orElseThrow();
  }

  @Test
  void aHandShareIsOverTheAnswersReadAndAnUnseenRuleCodeIsNotAPersonsFinding() {
    // 100 answers; people read 40: 10 of them carry the code, 5 more carry it by a rule applied
    // after they were read. 60 unread answers, 30 of them with the rule's code.
    add("W1", 10, true, Set.of("fit"), Set.of(), null);
    add("W1", 5, true, Set.of(), Set.of("fit"), null);
    add("W1", 25, true, Set.of(), Set.of(), null);
    add("W1", 30, false, Set.of(), Set.of("fit"), null);
    add("W1", 30, false, Set.of(), Set.of(), null);
    QuestionFindings q = compute(List.of("W1"), ReportSettings.DEFAULTS);
    Share s = row(q, "fit").waves().get("W1");
    assertEquals(10, s.count());
    assertEquals(40, s.base());
    assertFalse(s.byRule());
    Interval wilson = Proportions.wilson(10, 40);
    assertEquals(wilson.lower(), s.ci().lower(), 1e-15);
    assertEquals(40, q.coverage().get("W1").read());
    assertEquals(100, q.coverage().get("W1").answers());
    assertEquals(0.4, q.coverage().get("W1").share(), 1e-12);
    assertEquals(40, q.saturation().coded(), "the 40 read answers make the saturation");
    assertEquals(1, q.saturation().observed(), "the rule's unseen code is not among them");
  }

  @Test
  void handCodesCompareAcrossAWaveOnlyRulesTouchedAndSayWhyNotWithIt() {
    add("W1", 60, true, Set.of("fit"), Set.of(), null);
    add("W1", 140, true, Set.of(), Set.of(), null);
    add("W2", 120, false, Set.of(), Set.of("late"), null);
    add("W2", 80, false, Set.of(), Set.of(), null);
    add("W3", 20, true, Set.of("fit", "late"), Set.of(), null);
    add("W3", 180, true, Set.of(), Set.of(), null);
    QuestionFindings q = compute(List.of("W1", "W2", "W3"), ReportSettings.DEFAULTS);
    assertEquals(List.of("W1", "W2", "W3"), List.copyOf(q.bases().keySet()));
    assertEquals(List.of("W2"), q.notCoded());
    WaveChange fit = q.changes().stream().filter(c -> c.codeId().equals("fit")).findFirst().get();
    assertEquals("W1", fit.from());
    assertEquals("W3", fit.to(), "the unread wave is stepped over");
    assertEquals(WaveChange.FELL, fit.verdict());
    assertEquals(0.1 - 0.3, fit.diff(), 1e-12);
    List<String> why =
        q.notCompared().stream()
            .filter(n -> n.codeId().equals("fit"))
            .map(n -> n.from() + ">" + n.to() + ": " + n.reason())
            .toList();
    assertEquals(
        List.of(
            "W1>W2: no answer of W2 read by a person yet",
            "W2>W3: no answer of W2 read by a person yet"),
        why);
    // "late": by hand in W3, by rule in W2 (nobody read W2), never in W1 by hand.
    CodeFrequency late = row(q, "late");
    assertTrue(late.waves().get("W2").byRule());
    assertEquals(120, late.waves().get("W2").count());
    assertEquals(0, late.waves().get("W1").count(), "read in W1, and nobody gave it there");
    assertFalse(late.waves().get("W1").byRule());
    assertTrue(
        q.changes().stream()
            .noneMatch(
                c -> c.codeId().equals("late") && (c.from().equals("W2") || c.to().equals("W2"))),
        "never between a wave by rule and a wave read by people");
    NotCompared mixed =
        q.notCompared().stream()
            .filter(n -> n.codeId().equals("late") && n.to().equals("W2"))
            .findFirst()
            .orElseThrow();
    assertEquals(
        "read by a person in W1 but given by rule in W2: counted over different answers",
        mixed.reason());
  }

  @Test
  void aCodeOnlyRulesGiveIsReportedOverTheAnswersItsRulesRanOn() {
    add("W1", 50, true, Set.of(), Set.of("price"), null);
    add("W1", 50, true, Set.of("fit"), Set.of(), null);
    add("W1", 100, false, Set.of(), Set.of(), null);
    add("W2", 10, false, Set.of(), Set.of("late"), null); // its rules ran on W2, not price's
    add("W2", 190, false, Set.of(), Set.of(), null);
    QuestionFindings q = compute(List.of("W1", "W2"), ReportSettings.DEFAULTS);
    CodeFrequency price = row(q, "price");
    assertTrue(price.byRule());
    Share w1 = price.waves().get("W1");
    assertTrue(w1.byRule());
    assertEquals(50, w1.count());
    assertEquals(200, w1.base(), "every answer of the wave, read or not");
    assertFalse(price.waves().containsKey("W2"));
    assertEquals("its rules coded no answer of W2", price.noShare().get("W2"));
    assertFalse(row(q, "fit").byRule());
  }

  @Test
  void twoChosenWavesWithoutComparableSharesSayWhy() {
    add("W1", 40, true, Set.of("fit"), Set.of(), null);
    add("W3", 40, true, Set.of("fit"), Set.of(), null);
    QuestionFindings q =
        compute(List.of("W1", "W2", "W3"), ReportSettings.DEFAULTS.comparing("W1", "W2"));
    assertEquals(List.of(), q.changes());
    assertEquals("no answer in W2", q.notCompared().get(0).reason());
    QuestionFindings direct =
        compute(List.of("W1", "W2", "W3"), ReportSettings.DEFAULTS.comparing("W1", "W3"));
    assertEquals(1, direct.changes().size());
    assertEquals(List.of(), direct.notCompared());
  }

  @Test
  void segmentValuesDifferingInCaseOrSpaceAreOneValueAndBlanksAGroup() {
    add("W1", 5, true, Set.of("fit"), Set.of(), "Mobile");
    add("W1", 2, true, Set.of(), Set.of(), "mobile ");
    add("W1", 1, false, Set.of(), Set.of(), " MOBILE");
    add("W1", 4, true, Set.of(), Set.of(), "tablet");
    add("W1", 3, true, Set.of("fit"), Set.of(), null);
    QuestionFindings q = compute(List.of("W1"), ReportSettings.DEFAULTS.withSegment("device"));
    assertEquals(
        List.of("Mobile", "tablet", SegmentFindings.NO_VALUE),
        q.segments().stream().map(SegmentFindings::value).toList());
    SegmentFindings mobile = q.segments().get(0);
    assertEquals(8, mobile.coverage().get("W1").answers());
    assertEquals(7, mobile.coverage().get("W1").read());
    assertEquals(7, mobile.bases().get("W1"));
    assertEquals(5, row(mobile, "fit").waves().get("W1").count());
    assertEquals(3, row(q.segments().get(2), "fit").waves().get("W1").count());
    InputException e =
        assertThrows(
            InputException.class,
            () -> compute(List.of("W1"), ReportSettings.DEFAULTS.withSegment("plan")));
    assertTrue(e.getMessage().contains("\"plan\""), e.getMessage());
  }

  static CodeFrequency row(SegmentFindings s, String id) {
    return s.codes().stream().filter(c -> c.codeId().equals(id)).findFirst().orElseThrow();
  }

  @Test
  void anUnreadAnswerCannotCarryACodeAPersonGave() {
    assertThrows(
        IllegalArgumentException.class,
        () ->
            new ReportAnswer(
                "x",
                "W1",
                "Q",
                true,
                Set.of("fit"),
                Map.of(),
                OptionalLong.empty(),
                false,
                Set.of()));
    assertThrows(
        IllegalArgumentException.class,
        () ->
            new ReportAnswer(
                "x",
                "W1",
                "Q",
                true,
                Set.of(),
                Map.of(),
                OptionalLong.empty(),
                true,
                Set.of("fit")));
  }
}
