package riffle.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.TreeMap;
import riffle.model.CodeFrequency;
import riffle.model.ConfidenceInterval;
import riffle.model.Cooccurrence;
import riffle.model.Findings;
import riffle.model.QuestionFindings;
import riffle.model.Saturation;
import riffle.model.SaturationPoint;
import riffle.model.SegmentFindings;
import riffle.model.Share;
import riffle.model.WaveChange;
import riffle.stats.BenjaminiHochberg;
import riffle.stats.Chao1;
import riffle.stats.FisherExact;
import riffle.stats.Interval;
import riffle.stats.Proportions;

/**
 * Computes the findings of a project from its coded answers: code frequencies per question and wave
 * with Wilson intervals and flags, changes between waves with verdicts, co-occurrence and
 * saturation. The rules are in the package overview. Stateless and safe to call from any thread.
 */
public final class Report {
  private Report() {}

  /** Bases under this many answers are flagged "small base" (NCHS 2017, common practice). */
  public static final int SMALL_BASE = 30;

  /** Shares whose interval is wider than this are flagged "imprecise" (NCHS 2017). */
  public static final double IMPRECISE_WIDTH = 0.20;

  /** The adjusted p-value below which a change may be called a rise or a fall. */
  public static final double SIGNIFICANCE = 0.05;

  /** A change needs every expected count of its 2×2 table at least this large (Cochran 1954). */
  public static final double MIN_EXPECTED = 5;

  /** How many of the latest coded answers the saturation looks at for new codes. */
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
   *     not have, the codebook's parents are broken, or a compared wave does not exist
   */
  public static Findings compute(ReportInput input, ReportSettings settings) {
    Objects.requireNonNull(input, "input");
    Objects.requireNonNull(settings, "settings");
    Codebook codebook = new Codebook(input.codebook());
    List<String> waves = input.waves();
    Map<String, Integer> waveIndex = index(waves);
    Map<String, List<ReportAnswer>> byQuestion = new LinkedHashMap<>();
    for (String q : input.questions()) {
      byQuestion.put(q, new ArrayList<>());
    }
    for (ReportAnswer a : input.answers()) {
      if (!waveIndex.containsKey(a.wave())) {
        throw new IllegalArgumentException(
            "answer " + a.id() + " belongs to wave \"" + a.wave() + "\", which is not in the list");
      }
      List<ReportAnswer> list = byQuestion.get(a.question());
      if (list == null) {
        throw new IllegalArgumentException(
            "answer " + a.id() + " answers \"" + a.question() + "\", which is not in the list");
      }
      list.add(a);
    }
    List<int[]> pairs = comparedPairs(settings, waveIndex);
    List<QuestionFindings> questions = new ArrayList<>();
    for (Map.Entry<String, List<ReportAnswer>> e : byQuestion.entrySet()) {
      questions.add(
          question(e.getKey(), e.getValue(), codebook, waves, waveIndex, pairs, settings));
    }
    return new Findings(questions);
  }

  private static Map<String, Integer> index(List<String> values) {
    Map<String, Integer> map = new HashMap<>();
    for (int i = 0; i < values.size(); i++) {
      map.put(values.get(i), i);
    }
    return map;
  }

  private static List<int[]> comparedPairs(ReportSettings settings, Map<String, Integer> waves) {
    List<int[]> pairs = new ArrayList<>();
    if (settings.from().isPresent()) {
      Integer from = waves.get(settings.from().get());
      Integer to = waves.get(settings.to().orElseThrow());
      if (from == null || to == null) {
        String missing = from == null ? settings.from().get() : settings.to().orElseThrow();
        throw new IllegalArgumentException(
            "there is no wave \"" + missing + "\" to compare; the waves are " + waves.keySet());
      }
      pairs.add(new int[] {from, to});
    } else {
      for (int w = 0; w + 1 < waves.size(); w++) {
        pairs.add(new int[] {w, w + 1});
      }
    }
    return pairs;
  }

  private static QuestionFindings question(
      String question,
      List<ReportAnswer> allAnswers,
      Codebook codebook,
      List<String> allWaves,
      Map<String, Integer> allIndex,
      List<int[]> allPairs,
      ReportSettings settings) {
    // A wave in which no answer to this question is coded yet says nothing about its themes (its
    // zeros would read as falls): it is named as not coded and left out of every count.
    boolean[] coded = new boolean[allWaves.size()];
    for (ReportAnswer a : allAnswers) {
      if (a.substantive() && !a.codes().isEmpty()) {
        coded[allIndex.get(a.wave())] = true;
      }
    }
    List<String> waves = new ArrayList<>();
    List<String> notCoded = new ArrayList<>();
    for (int w = 0; w < allWaves.size(); w++) {
      (coded[w] ? waves : notCoded).add(allWaves.get(w));
    }
    Map<String, Integer> waveIndex = index(waves);
    List<ReportAnswer> answers = new ArrayList<>();
    for (ReportAnswer a : allAnswers) {
      if (waveIndex.containsKey(a.wave())) {
        answers.add(a);
      }
    }
    List<int[]> pairs = new ArrayList<>();
    if (settings.from().isPresent()) {
      for (int[] p : allPairs) {
        if (coded[p[0]] && coded[p[1]]) {
          pairs.add(
              new int[] {waveIndex.get(allWaves.get(p[0])), waveIndex.get(allWaves.get(p[1]))});
        }
      }
    } else {
      for (int w = 0; w + 1 < waves.size(); w++) {
        pairs.add(new int[] {w, w + 1});
      }
    }
    Tally tally =
        new Tally(codebook, waves.size(), settings.cooccurrencePerWave() ? waves.size() : 1);
    for (ReportAnswer a : answers) {
      tally.add(a, waveIndex.get(a.wave()), settings.cooccurrencePerWave());
    }
    // Only codes given to some answer of this question are reported for it (a codebook serves
    // every question).
    boolean[] used = used(codebook, waves.size(), tally);
    List<CodeFrequency> codes = frequencies(codebook, waves, tally, used);
    List<WaveChange> changes = new ArrayList<>();
    for (int[] pair : pairs) {
      changes.addAll(changes(codebook, waves, tally, pair[0], pair[1], used));
    }
    List<Cooccurrence> cooccurrence = cooccurrence(codebook, waves, tally, settings);
    List<SegmentFindings> segments =
        settings.segment().isPresent()
            ? segments(settings.segment().get(), answers, codebook, waves, waveIndex)
            : List.of();
    return new QuestionFindings(
        question,
        bases(waves, tally),
        notCoded,
        codes,
        changes,
        cooccurrence,
        saturation(answers, codebook),
        segments);
  }

  /** The codes some answer of the tally carries. */
  private static boolean[] used(Codebook codebook, int waves, Tally tally) {
    boolean[] used = new boolean[codebook.size()];
    for (int w = 0; w < waves; w++) {
      for (int i = 0; i < used.length; i++) {
        used[i] |= tally.count[w][i] > 0;
      }
    }
    return used;
  }

  private static Map<String, Integer> bases(List<String> waves, Tally tally) {
    Map<String, Integer> bases = new LinkedHashMap<>();
    for (int w = 0; w < waves.size(); w++) {
      bases.put(waves.get(w), tally.base[w]);
    }
    return bases;
  }

  private static List<CodeFrequency> frequencies(
      Codebook codebook, List<String> waves, Tally tally, boolean[] used) {
    List<CodeFrequency> rows = new ArrayList<>();
    for (int i = 0; i < codebook.size(); i++) {
      if (!used[i]) {
        continue;
      }
      Map<String, Share> shares = new LinkedHashMap<>();
      for (int w = 0; w < waves.size(); w++) {
        shares.put(waves.get(w), share(tally.count[w][i], tally.base[w]));
      }
      ReportCode c = codebook.codes.get(i);
      rows.add(
          new CodeFrequency(
              c.name(), c.id(), codebook.parentName(i), codebook.theme[i], c.direction(), shares));
    }
    return rows;
  }

  /** A share with its Wilson interval and flags (package-private for the tests). */
  static Share share(int count, int base) {
    Interval ci = Proportions.wilson(count, base);
    return new Share(
        count,
        base,
        base == 0 ? 0 : (double) count / base,
        interval(ci),
        base < SMALL_BASE,
        ci.width() > IMPRECISE_WIDTH);
  }

  private static ConfidenceInterval interval(Interval ci) {
    return new ConfidenceInterval(ci.lower(), ci.upper());
  }

  private static List<WaveChange> changes(
      Codebook codebook, List<String> waves, Tally tally, int from, int to, boolean[] used) {
    int n1 = tally.base[from];
    int n2 = tally.base[to];
    if (n1 == 0 || n2 == 0) {
      return List.of(); // nothing to compare: one wave has no answers to this question
    }
    int codes = codebook.size();
    List<Integer> compared = new ArrayList<>();
    for (int i = 0; i < codes; i++) {
      if (used[i]) {
        compared.add(i);
      }
    }
    double[] p = new double[compared.size()];
    Interval[] ci = new Interval[codes];
    for (int k = 0; k < compared.size(); k++) {
      int i = compared.get(k);
      int r1 = tally.count[from][i];
      int r2 = tally.count[to][i];
      p[k] = FisherExact.twoSided(r2, n2 - r2, r1, n1 - r1);
      ci[i] = Proportions.newcombe(r2, n2, r1, n1);
    }
    double[] adjustedByRank = BenjaminiHochberg.adjust(p);
    double[] adjusted = new double[codes];
    double[] raw = new double[codes];
    for (int k = 0; k < compared.size(); k++) {
      adjusted[compared.get(k)] = adjustedByRank[k];
      raw[compared.get(k)] = p[k];
    }
    List<WaveChange> rows = new ArrayList<>();
    for (int i : compared) {
      int r1 = tally.count[from][i];
      int r2 = tally.count[to][i];
      double diff = (double) r2 / n2 - (double) r1 / n1;
      ReportCode c = codebook.codes.get(i);
      rows.add(
          new WaveChange(
              c.name(),
              c.id(),
              waves.get(from),
              waves.get(to),
              diff,
              interval(ci[i]),
              raw[i],
              adjusted[i],
              verdict(r1, n1, r2, n2, adjusted[i], ci[i])));
    }
    return rows;
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

  private static List<Cooccurrence> cooccurrence(
      Codebook codebook, List<String> waves, Tally tally, ReportSettings settings) {
    List<Cooccurrence> rows = new ArrayList<>();
    int codes = codebook.size();
    for (int s = 0; s < tally.both.length; s++) {
      Optional<String> wave =
          settings.cooccurrencePerWave() ? Optional.of(waves.get(s)) : Optional.empty();
      int n = settings.cooccurrencePerWave() ? tally.base[s] : tally.pooledBase;
      int[] single = settings.cooccurrencePerWave() ? tally.count[s] : tally.pooled;
      for (int i = 0; i < codes; i++) {
        for (int j = i + 1; j < codes; j++) {
          int a = single[i];
          int b = single[j];
          if (a == 0 || b == 0 || codebook.related(i, j)) {
            continue;
          }
          int both = tally.both[s][i * codes + j];
          double p = FisherExact.twoSided(both, a - both, b - both, (long) n - a - b + both);
          rows.add(
              new Cooccurrence(
                  codebook.codes.get(i).name(),
                  codebook.codes.get(j).name(),
                  wave,
                  both,
                  (double) both / (a + b - both),
                  (double) both * n / ((double) a * b),
                  p));
        }
      }
    }
    return rows;
  }

  private static Saturation saturation(List<ReportAnswer> answers, Codebook codebook) {
    List<ReportAnswer> coded = new ArrayList<>();
    for (ReportAnswer a : answers) {
      if (a.substantive() && a.firstCoded().isPresent()) {
        coded.add(a);
      }
    }
    coded.sort(Comparator.comparingLong(a -> a.firstCoded().getAsLong()));
    int codes = codebook.size();
    long[] seen = new long[codes];
    int[] firstAt = new int[codes];
    long[] bits = new long[codebook.words];
    int distinct = 0;
    int step = Math.max(1, coded.size() / CURVE_POINTS);
    List<SaturationPoint> curve = new ArrayList<>();
    for (int k = 0; k < coded.size(); k++) {
      Arrays.fill(bits, 0);
      codebook.mark(coded.get(k), bits, false);
      boolean grew = false;
      for (int w = 0; w < bits.length; w++) {
        for (long word = bits[w]; word != 0; word &= word - 1) {
          int i = w * 64 + Long.numberOfTrailingZeros(word);
          if (seen[i]++ == 0) {
            firstAt[i] = k;
            distinct++;
            grew = true;
          }
        }
      }
      int answered = k + 1;
      if (grew || answered % step == 0 || answered == coded.size()) {
        curve.add(new SaturationPoint(answered, distinct));
      }
    }
    int windowStart = coded.size() - SATURATION_WINDOW;
    int newInWindow = 0;
    List<Long> counts = new ArrayList<>();
    for (int i = 0; i < codes; i++) {
      if (seen[i] > 0) {
        counts.add(seen[i]);
        if (firstAt[i] >= windowStart) {
          newInWindow++;
        }
      }
    }
    if (counts.isEmpty()) {
      return new Saturation(
          coded.size(), 0, 0, new ConfidenceInterval(0, 0), curve, SATURATION_WINDOW, 0);
    }
    Chao1 chao = Chao1.biasCorrected(counts.stream().mapToLong(Long::longValue).toArray());
    return new Saturation(
        coded.size(),
        distinct,
        chao.estimate(),
        interval(chao.interval()),
        curve,
        SATURATION_WINDOW,
        newInWindow);
  }

  private static List<SegmentFindings> segments(
      String segment,
      List<ReportAnswer> answers,
      Codebook codebook,
      List<String> waves,
      Map<String, Integer> waveIndex) {
    Map<String, Tally> byValue = new TreeMap<>();
    for (ReportAnswer a : answers) {
      String value = a.segments().get(segment);
      if (value == null) {
        continue;
      }
      byValue
          .computeIfAbsent(value, v -> new Tally(codebook, waves.size(), 0))
          .add(a, waveIndex.get(a.wave()), false);
    }
    List<SegmentFindings> rows = new ArrayList<>();
    for (Map.Entry<String, Tally> e : byValue.entrySet()) {
      rows.add(
          new SegmentFindings(
              segment,
              e.getKey(),
              bases(waves, e.getValue()),
              frequencies(
                  codebook, waves, e.getValue(), used(codebook, waves.size(), e.getValue()))));
    }
    return rows;
  }

  /** Counts of substantive answers per wave and code, and of code pairs. */
  private static final class Tally {
    final Codebook codebook;
    final int[] base;
    final int[][] count;
    final int[] pooled;
    int pooledBase;

    /** Pair counts per scope (one pooled scope, or one per wave), flattened i × codes + j. */
    final int[][] both;

    private final long[] bits;
    private final int[] present;

    Tally(Codebook codebook, int waves, int pairScopes) {
      this.codebook = codebook;
      int codes = codebook.size();
      base = new int[waves];
      count = new int[waves][codes];
      pooled = new int[codes];
      both = new int[pairScopes][pairScopes == 0 ? 0 : codes * codes];
      bits = new long[codebook.words];
      present = new int[codes];
    }

    void add(ReportAnswer a, int wave, boolean perWave) {
      Arrays.fill(bits, 0);
      codebook.mark(a, bits, true);
      if (!a.substantive()) {
        return;
      }
      base[wave]++;
      pooledBase++;
      int k = 0;
      for (int w = 0; w < bits.length; w++) {
        for (long word = bits[w]; word != 0; word &= word - 1) {
          int i = w * 64 + Long.numberOfTrailingZeros(word);
          count[wave][i]++;
          pooled[i]++;
          present[k++] = i;
        }
      }
      if (both.length == 0) {
        return;
      }
      int[] pairs = both[perWave ? wave : 0];
      int codes = count[wave].length;
      for (int x = 0; x < k; x++) {
        for (int y = x + 1; y < k; y++) {
          pairs[present[x] * codes + present[y]]++;
        }
      }
    }
  }
}
