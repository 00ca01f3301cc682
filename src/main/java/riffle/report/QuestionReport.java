package riffle.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import riffle.model.CodeFrequency;
import riffle.model.ConfidenceInterval;
import riffle.model.Cooccurrence;
import riffle.model.Coverage;
import riffle.model.NotCompared;
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
 * The findings of one question: its shares per wave, the changes between waves, the codes that
 * travel together, the saturation curve and the segments.
 *
 * <p>Size: one class because every part reads the one {@link Tally} counted in a single pass over
 * the question's answers, and the same settings and waves.
 */
final class QuestionReport {
  final String question;
  final List<ReportAnswer> answers;
  final CodeBits codebook;
  final List<String> allWaves;
  final Map<String, Integer> allIndex;
  final boolean[][] ruleRan;

  /** Whether the answers read in a wave are a random sample of its answers to the question. */
  final boolean[] random;

  final ReportSettings settings;
  final Tally tally;

  /** Indexes into {@link #allWaves} of the waves the findings show. */
  final List<Integer> shown = new ArrayList<>();

  QuestionReport(
      String question,
      List<ReportAnswer> answers,
      CodeBits codebook,
      List<String> allWaves,
      Map<String, Integer> allIndex,
      boolean[][] ruleRan,
      boolean[] random,
      ReportSettings settings) {
    this.question = question;
    this.random = random;
    this.answers = answers;
    this.codebook = codebook;
    this.allWaves = allWaves;
    this.allIndex = allIndex;
    this.ruleRan = ruleRan;
    this.settings = settings;
    int waves = allWaves.size();
    tally = new Tally(codebook, waves, settings.cooccurrencePerWave() ? waves : 1);
    for (ReportAnswer a : answers) {
      tally.add(a, allIndex.get(a.wave()), settings.cooccurrencePerWave());
    }
    // A wave is shown when a person read some of its answers, or when rules gave a code there
    // (codes given by hand are then left without a share); a wave with neither says nothing.
    for (int w = 0; w < waves; w++) {
      if (tally.read[w] > 0 || tally.anyCode(w)) {
        shown.add(w);
      }
    }
  }

  QuestionFindings findings(Optional<int[]> chosen) {
    List<String> notCoded = new ArrayList<>();
    Map<String, Coverage> coverage = new LinkedHashMap<>();
    for (int w = 0; w < allWaves.size(); w++) {
      if (tally.read[w] == 0) {
        notCoded.add(allWaves.get(w));
      }
      if (tally.answers[w] + tally.nonAnswers[w] > 0) {
        coverage.put(allWaves.get(w), tally.coverage(w, random[w]));
      }
    }
    // Only codes given to some answer of this question are reported for it (a codebook serves
    // every question).
    boolean[] used = used(tally);
    Share[][] shares = new Share[allWaves.size()][];
    for (int w : shown) {
      shares[w] = shares(tally, w);
    }
    List<CodeFrequency> codes = frequencies(tally, shares, used);
    List<WaveChange> changes = new ArrayList<>();
    List<NotCompared> notCompared = new ArrayList<>();
    compare(shares, used, chosen, changes, notCompared);
    List<SegmentFindings> segments =
        settings.segment().isPresent() ? segments(settings.segment().get()) : List.of();
    return new QuestionFindings(
        question,
        bases(tally),
        coverage,
        notCoded,
        codes,
        changes,
        notCompared,
        cooccurrence(),
        saturation(),
        segments);
  }

  /** The codes some substantive answer of a shown wave carries. */
  private boolean[] used(Tally t) {
    boolean[] used = new boolean[codebook.size()];
    for (int w : shown) {
      for (int i = 0; i < used.length; i++) {
        used[i] |= t.all[w][i] > 0;
      }
    }
    return used;
  }

  private Map<String, Integer> bases(Tally t) {
    Map<String, Integer> bases = new LinkedHashMap<>();
    for (int w : shown) {
      bases.put(allWaves.get(w), t.read[w]);
    }
    return bases;
  }

  /**
   * Each code's share in wave w of a tally (null where it has none): over the read answers for a
   * code a person gave somewhere in the question, else over every answer when its rules ran on the
   * wave. A code a person gave has a share by rule only in a wave nobody has read.
   */
  private Share[] shares(Tally t, int w) {
    Share[] out = new Share[codebook.size()];
    for (int i = 0; i < out.length; i++) {
      if (tally.human[i] && t.read[w] > 0) {
        // A random sample of the wave, cut to a segment, is a random sample of the segment's
        // answers (Cochran 1977 §2.13, domains of study), so segments are projected too.
        boolean project = random[w] && t.read[w] < t.answers[w];
        out[i] = Report.share(t.count[w][i], t.read[w], false, project ? t.answers[w] : 0);
      } else if (ruleRan[w][i] && t.answers[w] > 0) {
        out[i] = Report.share(t.all[w][i], t.answers[w], true, 0);
      }
    }
    return out;
  }

  private String noShare(int w, int i) {
    String wave = allWaves.get(w);
    return tally.human[i] ? Report.notRead(wave) : Report.rulesNotRun(wave);
  }

  private List<CodeFrequency> frequencies(Tally t, Share[][] shares, boolean[] used) {
    List<CodeFrequency> rows = new ArrayList<>();
    for (int i = 0; i < codebook.size(); i++) {
      if (!used[i]) {
        continue;
      }
      Map<String, Share> waves = new LinkedHashMap<>();
      Map<String, String> none = new LinkedHashMap<>();
      for (int w : shown) {
        Share s = shares[w][i];
        if (s != null) {
          waves.put(allWaves.get(w), s);
        } else {
          none.put(allWaves.get(w), t.answers[w] == 0 ? noAnswers(w) : noShare(w, i));
        }
      }
      ReportCode c = codebook.codes.get(i);
      rows.add(
          new CodeFrequency(
              c.name(),
              c.id(),
              codebook.parentName(i),
              codebook.theme[i],
              c.direction(),
              waves,
              !tally.human[i],
              none));
    }
    return rows;
  }

  private String noAnswers(int w) {
    return "no answer in " + allWaves.get(w);
  }

  /**
   * The comparisons: for each code, each wave with a share against the code's previous wave with a
   * share of the same kind (both over read answers, or both by rule), or the chosen pair; the
   * p-values of the codes compared between the same two waves are adjusted together.
   */
  private void compare(
      Share[][] shares,
      boolean[] used,
      Optional<int[]> chosen,
      List<WaveChange> changes,
      List<NotCompared> notCompared) {
    // (from, to) → codes compared between them, in codebook order.
    Map<Long, List<Integer>> pairs = new TreeMap<>();
    for (int i = 0; i < codebook.size(); i++) {
      if (!used[i]) {
        continue;
      }
      if (chosen.isPresent()) {
        int from = chosen.get()[0];
        int to = chosen.get()[1];
        Share a = shares[from] == null ? null : shares[from][i];
        Share b = shares[to] == null ? null : shares[to][i];
        if (a != null && b != null && a.byRule() == b.byRule()) {
          pairs.computeIfAbsent(pairKey(from, to), k -> new ArrayList<>()).add(i);
        } else if (a != null || b != null) {
          notCompared.add(notCompared(i, from, to, a, b));
        }
        continue;
      }
      int[] last = {-1, -1}; // the latest wave with a share over read answers, and by rule
      for (int k = 0; k < shown.size(); k++) {
        int w = shown.get(k);
        Share s = shares[w][i];
        if (k > 0) {
          int prev = shown.get(k - 1);
          Share p = shares[prev][i];
          boolean same = s != null && p != null && s.byRule() == p.byRule();
          if (!same && (s != null || p != null)) {
            notCompared.add(notCompared(i, prev, w, p, s));
          }
        }
        if (s == null) {
          continue;
        }
        int kind = s.byRule() ? 1 : 0;
        if (last[kind] >= 0) {
          pairs.computeIfAbsent(pairKey(last[kind], w), x -> new ArrayList<>()).add(i);
        }
        last[kind] = w;
      }
    }
    for (Map.Entry<Long, List<Integer>> e : pairs.entrySet()) {
      int from = (int) (e.getKey() >>> 32);
      int to = (int) (e.getKey() & 0xffffffffL);
      changes.addAll(changes(shares[from], shares[to], from, to, e.getValue()));
    }
  }

  private static long pairKey(int from, int to) {
    return ((long) from << 32) | to;
  }

  private NotCompared notCompared(int i, int from, int to, Share a, Share b) {
    String reason;
    if (a == null || b == null) {
      int missing = a == null ? from : to;
      reason = tally.answers[missing] == 0 ? noAnswers(missing) : noShare(missing, i);
    } else {
      String hand = a.byRule() ? allWaves.get(to) : allWaves.get(from);
      String rule = a.byRule() ? allWaves.get(from) : allWaves.get(to);
      reason =
          "read by a person in "
              + hand
              + " but given by rule in "
              + rule
              + ": counted over different answers";
    }
    ReportCode c = codebook.codes.get(i);
    return new NotCompared(c.name(), c.id(), allWaves.get(from), allWaves.get(to), reason);
  }

  private List<WaveChange> changes(
      Share[] before, Share[] after, int from, int to, List<Integer> compared) {
    double[] p = new double[compared.size()];
    Interval[] ci = new Interval[compared.size()];
    for (int k = 0; k < compared.size(); k++) {
      int i = compared.get(k);
      Share a = before[i];
      Share b = after[i];
      p[k] = FisherExact.twoSided(b.count(), b.base() - b.count(), a.count(), a.base() - a.count());
      ci[k] = Proportions.newcombe(b.count(), b.base(), a.count(), a.base());
    }
    double[] adjusted = BenjaminiHochberg.adjust(p);
    List<WaveChange> rows = new ArrayList<>();
    for (int k = 0; k < compared.size(); k++) {
      int i = compared.get(k);
      Share a = before[i];
      Share b = after[i];
      ReportCode c = codebook.codes.get(i);
      rows.add(
          new WaveChange(
              c.name(),
              c.id(),
              allWaves.get(from),
              allWaves.get(to),
              b.share() - a.share(),
              Report.interval(ci[k]),
              p[k],
              adjusted[k],
              Report.verdict(a.count(), a.base(), b.count(), b.base(), adjusted[k], ci[k]),
              a.byRule()));
    }
    return rows;
  }

  /** Co-occurrence over the answers people read, all shown waves pooled or per wave. */
  private List<Cooccurrence> cooccurrence() {
    List<Cooccurrence> rows = new ArrayList<>();
    int codes = codebook.size();
    List<Integer> scopes = settings.cooccurrencePerWave() ? shown : List.of(0);
    for (int s : scopes) {
      Optional<String> wave =
          settings.cooccurrencePerWave() ? Optional.of(allWaves.get(s)) : Optional.empty();
      int n = settings.cooccurrencePerWave() ? tally.read[s] : tally.pooledRead;
      int[] single = settings.cooccurrencePerWave() ? tally.count[s] : tally.pooled;
      int[] both = tally.both[s];
      for (int i = 0; i < codes; i++) {
        for (int j = i + 1; j < codes; j++) {
          int a = single[i];
          int b = single[j];
          if (a == 0 || b == 0 || codebook.related(i, j)) {
            continue;
          }
          int ab = both[i * codes + j];
          double p = FisherExact.twoSided(ab, a - ab, b - ab, (long) n - a - b + ab);
          rows.add(
              new Cooccurrence(
                  codebook.codes.get(i).name(),
                  codebook.codes.get(j).name(),
                  wave,
                  ab,
                  (double) ab / (a + b - ab),
                  (double) ab * n / ((double) a * b),
                  p));
        }
      }
    }
    return rows;
  }

  private Saturation saturation() {
    List<ReportAnswer> read = new ArrayList<>();
    for (ReportAnswer a : answers) {
      if (a.substantive() && a.read() && a.firstCoded().isPresent()) {
        read.add(a);
      }
    }
    read.sort(Comparator.comparingLong(a -> a.firstCoded().getAsLong()));
    int codes = codebook.size();
    long[] seen = new long[codes];
    int[] firstAt = new int[codes];
    long[] bits = new long[codebook.words];
    int distinct = 0;
    int step = Math.max(1, read.size() / Report.CURVE_POINTS);
    List<SaturationPoint> curve = new ArrayList<>();
    for (int k = 0; k < read.size(); k++) {
      Arrays.fill(bits, 0);
      ReportAnswer a = read.get(k);
      codebook.mark(a.id(), a.codes(), a.byRule(), bits, false);
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
      if (grew || answered % step == 0 || answered == read.size()) {
        curve.add(new SaturationPoint(answered, distinct));
      }
    }
    int windowStart = read.size() - Report.SATURATION_WINDOW;
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
          read.size(), 0, 0, new ConfidenceInterval(0, 0), curve, Report.SATURATION_WINDOW, 0);
    }
    Chao1 chao = Chao1.biasCorrected(counts.stream().mapToLong(Long::longValue).toArray());
    return new Saturation(
        read.size(),
        distinct,
        chao.estimate(),
        Report.interval(chao.interval()),
        curve,
        Report.SATURATION_WINDOW,
        newInWindow);
  }

  /**
   * Frequencies per value of a segment column: values that differ only in case or surrounding space
   * are one value, shown as most answers spell it; answers without a value form {@link
   * SegmentFindings#NO_VALUE}, listed last.
   */
  private List<SegmentFindings> segments(String segment) {
    Map<String, Tally> byKey = new TreeMap<>();
    Map<String, Map<String, Integer>> spellings = new HashMap<>();
    for (ReportAnswer a : answers) {
      String raw = a.segments().get(segment);
      String value = raw == null ? "" : raw.strip();
      String key = value.toLowerCase(Locale.ROOT);
      spellings.computeIfAbsent(key, k -> new TreeMap<>()).merge(value, 1, Integer::sum);
      byKey
          .computeIfAbsent(key, k -> new Tally(codebook, allWaves.size(), 0))
          .add(a, allIndex.get(a.wave()), false);
    }
    List<SegmentFindings> rows = new ArrayList<>();
    for (Map.Entry<String, Tally> e : byKey.entrySet()) {
      Tally t = e.getValue();
      String value =
          e.getKey().isEmpty() ? SegmentFindings.NO_VALUE : spelling(spellings.get(e.getKey()));
      Share[][] shares = new Share[allWaves.size()][];
      Map<String, Coverage> coverage = new LinkedHashMap<>();
      for (int w : shown) {
        shares[w] = shares(t, w);
        coverage.put(allWaves.get(w), t.coverage(w, random[w]));
      }
      rows.add(
          new SegmentFindings(segment, value, bases(t), coverage, frequencies(t, shares, used(t))));
    }
    rows.sort(
        Comparator.comparing((SegmentFindings s) -> s.value().equals(SegmentFindings.NO_VALUE))
            .thenComparing(s -> s.value().toLowerCase(Locale.ROOT)));
    return rows;
  }

  /** The spelling most answers use (ties: the first in code-point order). */
  private static String spelling(Map<String, Integer> counts) {
    String best = null;
    for (Map.Entry<String, Integer> e : counts.entrySet()) {
      if (best == null || e.getValue() > counts.get(best)) {
        best = e.getKey();
      }
    }
    return best;
  }
}
