package riffle.phrases;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import riffle.model.KeyPhrase;
import riffle.model.Phrase;
import riffle.model.PhraseCluster;
import riffle.model.PhraseExample;
import riffle.model.PhraseReport;
import riffle.model.ShownText;
import riffle.stats.BenjaminiHochberg;
import riffle.stats.ChiSquare;
import riffle.stats.Keyness;
import riffle.stats.LogLikelihood;

/**
 * Finds recurring phrases in answers, the phrases that travel together, and the phrases whose
 * frequency differs between two groups of answers. The method is described in the package overview.
 *
 * <p>Immutable and thread-safe: every call works on its own state. Output depends only on the input
 * (ties are broken by phrase text), so the same answers in the same order always give the same
 * report.
 */
public final class PhraseMiner {
  private final PhraseSettings settings;

  private PhraseMiner(PhraseSettings settings) {
    this.settings = settings;
  }

  /** A miner with the given settings. */
  public static PhraseMiner create(PhraseSettings settings) {
    return new PhraseMiner(Objects.requireNonNull(settings, "settings"));
  }

  /** The settings this miner uses. */
  public PhraseSettings settings() {
    return settings;
  }

  /**
   * The recurring phrases of the answers the filter accepts, best first (at most {@link
   * PhraseSettings#limit()}), and the clusters of those phrases that travel together.
   */
  public PhraseReport mine(List<PhraseDoc> docs, PhraseFilter filter) {
    Objects.requireNonNull(filter, "filter");
    List<PhraseDoc> chosen = new ArrayList<>();
    for (PhraseDoc d : docs) {
      if (filter.accepts(d)) {
        chosen.add(d);
      }
    }
    Mining mining = new Mining(settings, chosen, new int[chosen.size()]);
    List<Mining.Scored> scored = mining.scored(settings.minAnswers());
    scored.sort(
        Comparator.comparingDouble((Mining.Scored s) -> -s.score())
            .thenComparingInt(s -> -s.support())
            .thenComparing(Mining.Scored::stems)
            .thenComparing(s -> mining.grams.negated(s.node())));
    List<Picked> picked = pick(mining, scored);
    picked.sort(
        Comparator.comparingDouble((Picked p) -> -p.scored.score())
            .thenComparingInt(p -> -p.scored.support())
            .thenComparing(Picked::label));

    List<String> waveOrder = new ArrayList<>();
    Set<String> seenWaves = new HashSet<>();
    for (PhraseDoc d : chosen) {
      if (seenWaves.add(d.wave())) {
        waveOrder.add(d.wave());
      }
    }
    List<Phrase> phrases = new ArrayList<>();
    List<int[]> spans = new ArrayList<>();
    int[] answers = new int[picked.size()];
    for (int i = 0; i < picked.size(); i++) {
      Picked p = picked.get(i);
      int[] docIdx = p.occurrences.docs(p.index);
      Map<String, Integer> waves = new LinkedHashMap<>();
      for (String w : waveOrder) {
        waves.put(w, 0);
      }
      for (int d : docIdx) {
        waves.merge(chosen.get(d).wave(), 1, Integer::sum);
      }
      List<String> variants = p.variants;
      phrases.add(
          new Phrase(
              p.label(),
              p.scored.stems(),
              mining.grams.negated(p.scored.node()),
              p.scored.support(),
              p.scored.score(),
              variants.subList(0, Math.min(variants.size(), PhraseSettings.MAX_VARIANTS)),
              examples(chosen, docIdx),
              waves));
      spans.add(p.occurrences.spans(p.index));
      answers[i] = p.scored.support();
    }
    List<PhraseCluster> clusters = new ArrayList<>();
    for (Clusters.Group g :
        Clusters.group(spans, answers, mining.analysed[0], settings.minAnswers())) {
      List<String> labels = new ArrayList<>();
      Set<Integer> covered = new HashSet<>();
      for (int m : g.members()) {
        labels.add(phrases.get(m).phrase());
        for (int d : picked.get(m).occurrences.docs(picked.get(m).index)) {
          covered.add(d);
        }
      }
      clusters.add(new PhraseCluster(labels, covered.size(), g.cohesion(), query(labels)));
    }
    clusters.sort(
        Comparator.comparingInt((PhraseCluster c) -> -c.answers())
            .thenComparing(c -> c.phrases().get(0)));
    return new PhraseReport(chosen.size(), phrases, clusters);
  }

  /**
   * The phrases whose share of answers differs between {@code focus} and {@code reference}, by
   * decreasing log-likelihood (at most {@link PhraseSettings#limit()}). An answer accepted by both
   * filters belongs to the focus only, so a reference of {@link PhraseFilter#all()} (or the same
   * question) compares a segment or a wave with all other answers. Only phrases in at least {@link
   * PhraseSettings#KEYNESS_MIN_ANSWERS} (and the minimum support) answers of the two together are
   * compared. Empty when either side has no analysed answer.
   */
  public List<KeyPhrase> keyness(List<PhraseDoc> docs, PhraseFilter focus, PhraseFilter reference) {
    Objects.requireNonNull(focus, "focus");
    Objects.requireNonNull(reference, "reference");
    List<PhraseDoc> chosen = new ArrayList<>();
    List<PhraseDoc> rest = new ArrayList<>();
    for (PhraseDoc d : docs) {
      if (focus.accepts(d)) {
        chosen.add(d);
      } else if (reference.accepts(d)) {
        rest.add(d);
      }
    }
    int[] sides = new int[chosen.size() + rest.size()];
    for (int i = chosen.size(); i < sides.length; i++) {
      sides[i] = 1;
    }
    chosen.addAll(rest);
    Mining mining = new Mining(settings, chosen, sides);
    long c = mining.analysed[0];
    long d = mining.analysed[1];
    if (c == 0 || d == 0) {
      return List.of();
    }
    List<Mining.Scored> scored =
        mining.scored(Math.max(settings.minAnswers(), PhraseSettings.KEYNESS_MIN_ANSWERS));
    Map<Integer, Double> ll = new LinkedHashMap<>();
    for (Mining.Scored s : scored) {
      long a = mining.grams.answers(s.node(), 0);
      long b = mining.grams.answers(s.node(), 1);
      ll.put(s.node(), LogLikelihood.g2(a, c - a, b, d - b));
    }
    // Hundreds of phrases are compared at once: adjust their p-values (Benjamini and Hochberg
    // 1995).
    double[] raw = new double[scored.size()];
    for (int i = 0; i < raw.length; i++) {
      raw[i] = ChiSquare.upperTailDf1(ll.get(scored.get(i).node()));
    }
    double[] adjusted = BenjaminiHochberg.adjust(raw);
    Map<Integer, Double> adjustedOf = new LinkedHashMap<>();
    for (int i = 0; i < raw.length; i++) {
      adjustedOf.put(scored.get(i).node(), adjusted[i]);
    }
    scored.sort(
        Comparator.comparingDouble((Mining.Scored s) -> -ll.get(s.node()))
            .thenComparing(Mining.Scored::stems)
            .thenComparing(s -> mining.grams.negated(s.node())));
    List<KeyPhrase> out = new ArrayList<>();
    for (Picked p : pick(mining, scored)) {
      int node = p.scored.node();
      int a = mining.grams.answers(node, 0);
      int b = mining.grams.answers(node, 1);
      double g2 = ll.get(node);
      double ratio = Keyness.logRatio(a, b, c, d);
      String direction = a * (double) d >= b * (double) c ? "more" : "less";
      out.add(
          new KeyPhrase(
              p.label(),
              a,
              b,
              g2,
              ratio,
              ChiSquare.upperTailDf1(g2),
              adjustedOf.get(node),
              direction,
              KeyPhrase.verdict(direction, adjustedOf.get(node))));
    }
    out.sort(
        Comparator.comparingDouble((KeyPhrase k) -> -k.logLikelihood())
            .thenComparing(KeyPhrase::phrase));
    return out;
  }

  /** A ranked candidate whose occurrences were collected and which is no stop phrase. */
  private record Picked(
      Mining.Scored scored, Occurrences occurrences, int index, List<String> variants) {
    String label() {
      return variants.get(0);
    }
  }

  /**
   * Walks down the ranked candidates, collecting occurrences in batches, and keeps the first {@link
   * PhraseSettings#limit()} that are not stop phrases.
   */
  private List<Picked> pick(Mining mining, List<Mining.Scored> ranked) {
    int limit = settings.limit();
    List<Picked> picked = new ArrayList<>();
    int next = 0;
    while (picked.size() < limit && next < ranked.size()) {
      int missing = limit - picked.size();
      int batch = Math.min(ranked.size() - next, missing + missing / 2 + 16);
      int[] nodes = new int[batch];
      for (int i = 0; i < batch; i++) {
        nodes[i] = ranked.get(next + i).node();
      }
      Occurrences occ = mining.occurrences(nodes);
      for (int i = 0; i < batch && picked.size() < limit; i++) {
        List<String> variants = occ.variants(i);
        if (!variants.isEmpty() && !occ.stopped(i, settings.stopPhrases())) {
          picked.add(new Picked(ranked.get(next + i), occ, i, variants));
        }
      }
      next += batch;
    }
    return picked;
  }

  /**
   * PhraseExample answers: distinct masked texts, those closest to {@link #EXAMPLE_LENGTH}
   * characters first (long enough to show the phrase in context, short enough to read at a glance),
   * ties by answer id.
   */
  private List<PhraseExample> examples(List<PhraseDoc> chosen, int[] docIdx) {
    List<PhraseDoc> candidates = new ArrayList<>();
    for (int d : docIdx) {
      candidates.add(chosen.get(d));
    }
    candidates.sort(
        Comparator.comparingInt(
                (PhraseDoc d) -> Math.abs(d.analysis().masked().length() - EXAMPLE_LENGTH))
            .thenComparingLong(PhraseDoc::answerId)
            .thenComparing(PhraseDoc::respondent));
    List<PhraseExample> out = new ArrayList<>();
    Set<String> texts = new HashSet<>();
    for (PhraseDoc d : candidates) {
      if (out.size() >= settings.examples()) {
        break;
      }
      String masked = d.analysis().masked();
      // An example is read at a glance: a long answer gives its start only.
      String text = masked.substring(0, ShownText.cut(masked, ShownText.MAX_CHARS));
      if (texts.add(text)) {
        out.add(new PhraseExample(d.answerId(), d.respondent(), d.wave(), text));
      }
    }
    return out;
  }

  /** The length, in characters, of the ideal example answer. */
  static final int EXAMPLE_LENGTH = 80;

  /** The phrases as double-quoted exact phrases joined by OR. */
  static String query(List<String> labels) {
    StringBuilder b = new StringBuilder();
    for (String label : labels) {
      if (b.length() > 0) {
        b.append(" OR ");
      }
      b.append('"').append(label.replace("\\", "\\\\").replace("\"", "\\\"")).append('"');
    }
    return b.toString();
  }
}
