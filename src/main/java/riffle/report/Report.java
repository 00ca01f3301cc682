package riffle.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import riffle.model.ConfidenceInterval;
import riffle.model.Findings;
import riffle.model.InputException;
import riffle.model.ProjectedCount;
import riffle.model.QuestionFindings;
import riffle.model.Share;
import riffle.model.WaveChange;
import riffle.stats.FinitePopulation;
import riffle.stats.Interval;
import riffle.stats.Proportions;

/**
 * Computes the findings of a project from its coded answers: code frequencies per question and wave
 * with Wilson intervals and flags, over the answers people read (or, for codes only rules give, the
 * answers the rules ran on), changes between waves with verdicts, co-occurrence and saturation. The
 * rules are in the package overview. Stateless and safe to call from any thread.
 */
public final class Report {
  private Report() {}

  /** Bases under this many answers are flagged "small base" (NCHS 2017, common practice). */
  public static final int SMALL_BASE = 30;

  /** Shares whose interval is wider than this are flagged "imprecise" (NCHS 2017). */
  public static final double IMPRECISE_WIDTH = 0.20;

  /** The adjusted p-value below which a change may be called a rise or a fall. */
  public static final double SIGNIFICANCE = WaveChange.SIGNIFICANCE;

  /** A change needs every expected count of its 2×2 table at least this large (Cochran 1954). */
  public static final double MIN_EXPECTED = 5;

  /** How many of the latest read answers the saturation looks at for new codes. */
  public static final int SATURATION_WINDOW = 50;

  /** The most points a saturation curve keeps besides those where a new code appeared. */
  static final int CURVE_POINTS = 200;

  /**
   * The findings for every question of the input.
   *
   * @param input questions, waves, codebook and answers
   * @param settings segments, waves to compare, co-occurrence per wave
   * @return one entry per question, in the input's order
   * @throws IllegalArgumentException when an answer names a wave, question or code the input does
   *     not have, the codebook's parents are broken, a compared wave does not exist, or no answer
   *     has a value in the segment column
   */
  public static Findings compute(ReportInput input, ReportSettings settings) {
    Objects.requireNonNull(input, "input");
    Objects.requireNonNull(settings, "settings");
    CodeBits codebook = new CodeBits(input.codebook());
    List<String> waves = input.waves();
    Map<String, Integer> waveIndex = index(waves);
    Map<String, List<ReportAnswer>> byQuestion = new LinkedHashMap<>();
    for (String q : input.questions()) {
      byQuestion.put(q, new ArrayList<>());
    }
    // A rule runs over whole waves (every saved rule on each import's new answers, "rules apply" on
    // every answer, all questions alike): one answer of a wave coded by a code's rule shows that
    // its rules ran on all of the wave's answers.
    boolean[][] ruleRan = new boolean[waves.size()][codebook.size()];
    long[] bits = new long[codebook.words];
    boolean segmentSeen = false;
    for (ReportAnswer a : input.answers()) {
      Integer w = waveIndex.get(a.wave());
      if (w == null) {
        throw new IllegalArgumentException(
            "answer " + a.id() + " belongs to wave \"" + a.wave() + "\", which is not in the list");
      }
      List<ReportAnswer> list = byQuestion.get(a.question());
      if (list == null) {
        throw new IllegalArgumentException(
            "answer " + a.id() + " answers \"" + a.question() + "\", which is not in the list");
      }
      list.add(a);
      if (!a.byRule().isEmpty()) {
        Arrays.fill(bits, 0);
        codebook.mark(a.id(), a.byRule(), java.util.Set.of(), bits, true);
        forEachBit(bits, i -> ruleRan[w][i] = true);
      }
      segmentSeen |=
          settings.segment().isPresent() && a.segments().containsKey(settings.segment().get());
    }
    if (settings.segment().isPresent() && !segmentSeen && !input.answers().isEmpty()) {
      throw new InputException(
          "no respondent has a value in the column \""
              + settings.segment().get()
              + "\"; name a column kept as a segment at import");
    }
    Optional<int[]> chosen = chosenPair(settings, waveIndex);
    List<QuestionFindings> questions = new ArrayList<>();
    for (Map.Entry<String, List<ReportAnswer>> e : byQuestion.entrySet()) {
      questions.add(
          new QuestionReport(
                  e.getKey(),
                  e.getValue(),
                  codebook,
                  waves,
                  waveIndex,
                  ruleRan,
                  random(waves, input.randomSamples().getOrDefault(e.getKey(), Set.of())),
                  settings)
              .findings(chosen));
    }
    return new Findings(questions);
  }

  /** Which waves' read answers are a random sample, by wave index. */
  private static boolean[] random(List<String> waves, Set<String> sampled) {
    boolean[] out = new boolean[waves.size()];
    for (int w = 0; w < out.length; w++) {
      out[w] = sampled.contains(waves.get(w));
    }
    return out;
  }

  private static Map<String, Integer> index(List<String> values) {
    Map<String, Integer> map = new HashMap<>();
    for (int i = 0; i < values.size(); i++) {
      map.put(values.get(i), i);
    }
    return map;
  }

  /** The two waves the settings name, when they name any. */
  private static Optional<int[]> chosenPair(ReportSettings settings, Map<String, Integer> waves) {
    if (settings.from().isEmpty()) {
      return Optional.empty();
    }
    Integer from = waves.get(settings.from().get());
    Integer to = waves.get(settings.to().orElseThrow());
    if (from == null || to == null) {
      String missing = from == null ? settings.from().get() : settings.to().orElseThrow();
      throw new InputException(
          "there is no wave \"" + missing + "\" to compare; the waves are " + waves.keySet());
    }
    return Optional.of(new int[] {from, to});
  }

  @FunctionalInterface
  interface BitAction {
    void at(int i);
  }

  static void forEachBit(long[] bits, BitAction action) {
    for (int w = 0; w < bits.length; w++) {
      for (long word = bits[w]; word != 0; word &= word - 1) {
        action.at(w * 64 + Long.numberOfTrailingZeros(word));
      }
    }
  }

  /** The reason a code given by hand has no share in a wave nobody has read. */
  static String notRead(String wave) {
    return "no answer of " + wave + " read by a person yet";
  }

  /** The reason a code only rules give has no share in a wave its rules did not reach. */
  static String rulesNotRun(String wave) {
    return "its rules coded no answer of " + wave;
  }

  /** A share with its Wilson interval and flags, over read answers (package-private for tests). */
  static Share share(int count, int base) {
    return share(count, base, false, 0);
  }

  /**
   * A share with its Wilson interval and flags; with a {@code population} above the base (the base
   * then being a random sample of it), the count it projects for the whole wave as well.
   */
  static Share share(int count, int base, boolean byRule, int population) {
    Interval ci = Proportions.wilson(count, base);
    Optional<ProjectedCount> projected =
        population > base
            ? FinitePopulation.project(count, base, population)
                .map(
                    p ->
                        new ProjectedCount(
                            population,
                            base,
                            p.projected(),
                            p.lower(),
                            p.upper(),
                            interval(p.interval())))
            : Optional.empty();
    return new Share(
        count,
        base,
        base == 0 ? 0 : (double) count / base,
        interval(ci),
        base < SMALL_BASE,
        ci.width() > IMPRECISE_WIDTH,
        byRule,
        projected);
  }

  static ConfidenceInterval interval(Interval ci) {
    return new ConfidenceInterval(ci.lower(), ci.upper());
  }

  /** The verdict rule of the package overview (package-private for the tests). */
  static String verdict(int r1, int n1, int r2, int n2, double pAdjusted, Interval ci) {
    double total = (double) n1 + n2;
    double carrying = (double) r1 + r2;
    double smallestExpected = Math.min(n1, n2) * Math.min(carrying, total - carrying) / total;
    if (n1 < SMALL_BASE || n2 < SMALL_BASE || smallestExpected < MIN_EXPECTED) {
      return WaveChange.TOO_FEW;
    }
    if (pAdjusted < SIGNIFICANCE && ci.lower() > 0) {
      return WaveChange.ROSE;
    }
    if (pAdjusted < SIGNIFICANCE && ci.upper() < 0) {
      return WaveChange.FELL;
    }
    return WaveChange.NO_CLEAR_CHANGE;
  }
}
