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
import riffle.model.Cooccurrence;
import riffle.model.Findings;
import riffle.model.InputException;
import riffle.model.QuestionFindings;
import riffle.model.Saturation;
import riffle.model.Share;
import riffle.model.WaveChange;
import riffle.stats.BenjaminiHochberg;
import riffle.stats.Chao1;
import riffle.stats.FisherExact;
import riffle.stats.Interval;
import riffle.stats.Proportions;

class ReportTest {
  final Survey survey = new Survey(7L);
  final Findings findings = Report.compute(survey.input(), ReportSettings.DEFAULTS);
  final QuestionFindings main = findings.questions().get(0);
  final QuestionFindings tiny = findings.questions().get(1);

  private static CodeFrequency row(QuestionFindings q, String id) {
    return q.codes().stream().filter(c -> c.codeId().equals(id)).findFirst().orElseThrow();
  }

  private static WaveChange change(QuestionFindings q, String id, String from) {
    return q.changes().stream()
        .filter(c -> c.codeId().equals(id) && c.from().equals(from))
        .findFirst()
        .orElseThrow();
  }

  private List<ReportAnswer> mainAnswers(String wave) {
    return survey.answers.stream()
        .filter(a -> a.question().equals(Survey.MAIN) && a.wave().equals(wave) && a.substantive())
        .toList();
  }

  @Test
  void basesCountSubstantiveAnswersOnly() {
    assertEquals(Map.of("Spring", 400, "Summer", 400, "Autumn", 400), main.bases());
    assertEquals(List.of("Spring", "Summer", "Autumn"), List.copyOf(main.bases().keySet()));
    // Non-answers carry "checkout" and "cost" but count nowhere.
    assertEquals(30, row(main, "checkout").waves().get("Spring").count());
    assertEquals(120, row(main, "cost").waves().get("Spring").count());
  }

  @Test
  void aThemeCountsEachAnswerOnceHoweverManyOfItsCodesItCarries() {
    for (String wave : Survey.WAVES) {
      long either =
          mainAnswers(wave).stream()
              .filter(a -> a.codes().contains("cost") || a.codes().contains("slow"))
              .count();
      Share theme = row(main, "delivery").waves().get(wave);
      assertEquals(either, theme.count(), wave);
      int children =
          row(main, "cost").waves().get(wave).count() + row(main, "slow").waves().get(wave).count();
      assertTrue(theme.count() < children, "some answers carry both delivery codes");
    }
    assertTrue(row(main, "delivery").theme());
    assertEquals(Optional.of("Delivery"), row(main, "cost").parent());
    assertEquals(Optional.empty(), row(main, "delivery").parent());
  }

  @Test
  void archivedCodesAreLeftOut() {
    assertTrue(main.codes().stream().noneMatch(c -> c.codeId().equals("old")));
    // Display order: each theme before its codes, in codebook order.
    assertEquals(
        List.of("delivery", "cost", "slow", "quality", "fabric", "fit", "checkout", "late"),
        main.codes().stream().map(CodeFrequency::codeId).toList());
  }

  @Test
  void sharesCarryTheWilsonIntervalOfTheStatsPackage() {
    Share s = row(main, "cost").waves().get("Autumn");
    Interval wilson = Proportions.wilson(48, 400);
    assertEquals(0.12, s.share(), 1e-12);
    assertEquals(wilson.lower(), s.ci().lower(), 1e-15);
    assertEquals(wilson.upper(), s.ci().upper(), 1e-15);
    assertFalse(s.smallBase());
    assertFalse(s.imprecise());
  }

  @Test
  void smallBasesAndWideIntervalsAreFlagged() {
    Share s = row(tiny, "cost").waves().get("Spring");
    assertEquals(12, s.base());
    assertTrue(s.smallBase());
    assertTrue(s.imprecise());
    assertEquals(Report.share(29, 29).smallBase(), true);
    assertEquals(Report.share(30, 30).smallBase(), false);
    // 50% of 100 has a Wilson interval about 19.2 points wide: precise enough; of 90, not.
    assertFalse(Report.share(50, 100).imprecise());
    assertTrue(Report.share(45, 90).imprecise());
  }

  @Test
  void plantedFallIsReportedAsFell() {
    WaveChange fall = change(main, "cost", "Summer");
    assertEquals("Autumn", fall.to());
    assertEquals(WaveChange.FELL, fall.verdict());
    assertEquals(0.12 - 0.30, fall.diff(), 1e-12);
    assertTrue(fall.ci().upper() < 0);
    assertEquals(WaveChange.NO_CLEAR_CHANGE, change(main, "cost", "Spring").verdict());
    assertEquals(WaveChange.FELL, change(main, "delivery", "Summer").verdict());
  }

  @Test
  void flatThemeShowsNoClearChange() {
    for (String from : List.of("Spring", "Summer")) {
      WaveChange flat = change(main, "fabric", from);
      assertEquals(WaveChange.NO_CLEAR_CHANGE, flat.verdict());
      assertEquals(0, flat.diff(), 1e-12);
      assertEquals(1.0, flat.p(), 1e-12);
    }
    assertEquals(WaveChange.NO_CLEAR_CHANGE, change(main, "checkout", "Summer").verdict());
  }

  @Test
  void tinyBaseIsTooFewAnswersToTell() {
    // 12 of 12 carry "cost" in Summer, 2 of 12 in Autumn: a big drop, but bases under 30.
    WaveChange c = change(tiny, "cost", "Summer");
    assertEquals(WaveChange.TOO_FEW, c.verdict());
    assertTrue(c.p() < 0.001, "the test alone would call it significant");
  }

  @Test
  void rareCodesOnLargeBasesAreTooFewToTell() {
    Interval ci = Proportions.newcombe(0, 400, 4, 400);
    assertEquals(WaveChange.TOO_FEW, Report.verdict(4, 400, 0, 400, 0.01, ci));
    assertEquals(WaveChange.NO_CLEAR_CHANGE, Report.verdict(40, 400, 50, 400, 0.3, ci));
  }

  @Test
  void changesUseFisherNewcombeAndBenjaminiHochbergFromTheStatsPackage() {
    List<WaveChange> pair = main.changes().stream().filter(c -> c.from().equals("Summer")).toList();
    assertEquals(main.codes().size(), pair.size());
    double[] p = new double[pair.size()];
    for (int i = 0; i < p.length; i++) {
      WaveChange c = pair.get(i);
      Share before = row(main, c.codeId()).waves().get("Summer");
      Share after = row(main, c.codeId()).waves().get("Autumn");
      int r1 = before.count();
      int r2 = after.count();
      assertEquals(FisherExact.twoSided(r2, 400 - r2, r1, 400 - r1), c.p(), 1e-15);
      Interval ci = Proportions.newcombe(r2, 400, r1, 400);
      assertEquals(ci.lower(), c.ci().lower(), 1e-15);
      assertEquals(ci.upper(), c.ci().upper(), 1e-15);
      p[i] = c.p();
    }
    double[] adjusted = BenjaminiHochberg.adjust(p);
    for (int i = 0; i < p.length; i++) {
      assertEquals(adjusted[i], pair.get(i).pAdjusted(), 1e-15);
    }
  }

  @Test
  void chosenWavesAreComparedDirectly() {
    Findings chosen =
        Report.compute(survey.input(), ReportSettings.DEFAULTS.comparing("Spring", "Autumn"));
    List<WaveChange> changes = chosen.questions().get(0).changes();
    assertTrue(
        changes.stream().allMatch(c -> c.from().equals("Spring") && c.to().equals("Autumn")));
    assertThrows(
        InputException.class,
        () ->
            Report.compute(survey.input(), ReportSettings.DEFAULTS.comparing("Spring", "Winter")));
  }

  @Test
  void cooccurrenceCountsJaccardLiftAndFisher() {
    Cooccurrence pair =
        main.cooccurrence().stream()
            .filter(c -> c.a().equals("Delivery cost") && c.b().equals("Soft fabric"))
            .findFirst()
            .orElseThrow();
    List<ReportAnswer> all = new ArrayList<>();
    Survey.WAVES.forEach(w -> all.addAll(mainAnswers(w)));
    int a = 0;
    int b = 0;
    int both = 0;
    for (ReportAnswer x : all) {
      boolean hasA = x.codes().contains("cost");
      boolean hasB = x.codes().contains("fabric");
      a += hasA ? 1 : 0;
      b += hasB ? 1 : 0;
      both += hasA && hasB ? 1 : 0;
    }
    int n = all.size();
    assertEquals(both, pair.count());
    assertEquals((double) both / (a + b - both), pair.jaccard(), 1e-12);
    assertEquals((double) both * n / ((double) a * b), pair.lift(), 1e-12);
    assertEquals(FisherExact.twoSided(both, a - both, b - both, n - a - b + both), pair.p(), 1e-15);
    assertEquals(Optional.empty(), pair.wave());
    // A theme and its own codes are not paired.
    assertTrue(
        main.cooccurrence().stream()
            .noneMatch(c -> c.a().equals("Delivery") && c.b().equals("Delivery cost")));
  }

  @Test
  void cooccurrencePerWaveHasOneScopePerWave() {
    Findings perWave =
        Report.compute(survey.input(), ReportSettings.DEFAULTS.withCooccurrencePerWave());
    Set<Optional<String>> scopes = new java.util.HashSet<>();
    perWave.questions().get(0).cooccurrence().forEach(c -> scopes.add(c.wave()));
    assertEquals(
        Set.of(Optional.of("Spring"), Optional.of("Summer"), Optional.of("Autumn")), scopes);
  }

  @Test
  void saturationFollowsCodingOrderAndUsesChao1() {
    Saturation s = main.saturation();
    assertEquals(1200, s.coded());
    assertEquals(6, s.observed()); // cost, slow, fabric, fit, checkout, late; old is archived
    assertEquals(1, s.newInWindow(), "only the late newcomer appears in the last 50 answers");
    assertEquals(1200, s.curve().get(s.curve().size() - 1).answers());
    assertEquals(6, s.curve().get(s.curve().size() - 1).codes());
    assertTrue(s.curve().size() <= Report.CURVE_POINTS + 10);
    // Directly given codes: cost 120+120+48, slow 60+64+58, fabric 240, fit 157, checkout 91, late
    // 10.
    long[] counts = {288, 182, 240, 157, 91, 10};
    Chao1 expected = Chao1.biasCorrected(counts);
    assertEquals(expected.estimate(), s.chao1(), 1e-12);
    assertEquals(expected.interval().upper(), s.ci().upper(), 1e-12);
  }

  @Test
  void segmentsSplitFrequencies() {
    Findings split = Report.compute(survey.input(), ReportSettings.DEFAULTS.withSegment("buyer"));
    var segments = split.questions().get(0).segments();
    assertEquals(List.of("new", "returning"), segments.stream().map(s -> s.value()).toList());
    int spring = segments.stream().mapToInt(s -> s.bases().get("Spring")).sum();
    assertEquals(400, spring);
  }

  @Test
  void badInputIsRefusedWithAClearMessage() {
    List<ReportAnswer> answers = new ArrayList<>(survey.answers);
    answers.add(
        new ReportAnswer(
            "x1", "Spring", Survey.MAIN, true, Set.of("nope"), Map.of(), OptionalLong.empty()));
    ReportInput bad =
        new ReportInput(List.of(Survey.MAIN, Survey.TINY), Survey.WAVES, Survey.CODEBOOK, answers);
    IllegalArgumentException e =
        assertThrows(
            IllegalArgumentException.class, () -> Report.compute(bad, ReportSettings.DEFAULTS));
    assertTrue(e.getMessage().contains("nope"), e.getMessage());
    assertThrows(
        IllegalArgumentException.class,
        () ->
            Report.compute(
                new ReportInput(
                    List.of(Survey.MAIN),
                    Survey.WAVES,
                    List.of(
                        Survey.code("a", "A", "b", "praise"), Survey.code("b", "B", "a", "praise")),
                    List.of()),
                ReportSettings.DEFAULTS));
    assertThrows(
        IllegalArgumentException.class,
        () -> new ReportInput(List.of("q", "q"), Survey.WAVES, Survey.CODEBOOK, List.of()));
    assertThrows(
        IllegalArgumentException.class,
        () -> new ReportCode("a", "A", Optional.empty(), "happy", false));
  }

  @Test
  void aWaveWithoutAnswersIsNotComparedAndUncodedQuestionsHaveEmptySaturation() {
    List<ReportAnswer> answers = new ArrayList<>();
    for (int i = 0; i < 40; i++) {
      answers.add(
          new ReportAnswer(
              "q" + i,
              "Spring",
              "Only asked once",
              true,
              Set.of("cost"),
              Map.of(),
              OptionalLong.empty()));
    }
    Findings only =
        Report.compute(
            new ReportInput(List.of("Only asked once"), Survey.WAVES, Survey.CODEBOOK, answers),
            ReportSettings.DEFAULTS);
    QuestionFindings q = only.questions().get(0);
    assertEquals(List.of(), q.changes());
    assertTrue(q.notCoded().contains("Summer"), "a wave without answers is named as not coded");
    assertFalse(q.bases().containsKey("Summer"));
    assertFalse(row(q, "cost").waves().containsKey("Summer"));
    assertEquals(0, q.saturation().coded());
    assertEquals(0, q.saturation().observed());
    assertEquals(List.of(), q.saturation().curve());
  }
}
