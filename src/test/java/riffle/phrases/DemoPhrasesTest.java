package riffle.phrases;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import riffle.model.Analysis;
import riffle.model.KeyPhrase;
import riffle.model.Phrase;
import riffle.model.PhraseCluster;
import riffle.model.PhraseReport;
import riffle.model.Progress;
import riffle.tools.SampleResponses;
import riffle.tools.SampleResponses.GeneratedAnswer;
import riffle.tools.SampleResponses.GeneratedRespondent;
import riffle.tools.SampleResponses.GeneratedWave;
import riffle.tools.SampleResponses.Question;
import riffle.tools.SampleResponses.Theme;

/**
 * Mining the demo waves, whose planted themes are known ({@link GeneratedAnswer#themes()}). A
 * phrase is judged by the ground truth of the answers that contain it: it is about a planted theme
 * when at least 80% of them carry that theme. The best phrases must be planted themes, every
 * planted theme must be reached near the top, clusters must join only themes the generator links,
 * and the two themes the checkout change reduced must fall in Wave 3.
 */
class DemoPhrasesTest {
  private static List<PhraseDoc> docs;
  private static List<List<String>> planted;
  private static final PhraseMiner MINER = PhraseMiner.create(PhraseSettings.defaults());

  /** Analyses every demo answer once, with one shared pipeline. */
  @BeforeAll
  static void analyse() {
    List<String> texts = new ArrayList<>();
    List<String[]> meta = new ArrayList<>();
    planted = new ArrayList<>();
    for (GeneratedWave w : SampleResponses.demoWaves()) {
      for (GeneratedRespondent r : w.respondents()) {
        for (GeneratedAnswer a : List.of(r.stopped(), r.chose())) {
          texts.add(a.text());
          meta.add(new String[] {r.id(), w.name(), a.question().text(), r.device()});
          planted.add(a.themes());
        }
      }
    }
    List<Analysis> analyses = Answers.analyzer().analyzeAll(texts, Progress.NONE);
    docs = new ArrayList<>();
    for (int i = 0; i < texts.size(); i++) {
      String[] m = meta.get(i);
      docs.add(new PhraseDoc(i, m[0], m[1], m[2], Map.of("device", m[3]), analyses.get(i)));
    }
  }

  /**
   * What a phrase's answers are about, by the planted ground truth: the answers whose masked text
   * contains one of its variants, and the share of them carrying its most frequent planted theme
   * and carrying none.
   *
   * @param theme the most frequent planted theme ("" when none)
   * @param share the share of the answers carrying it
   * @param none the share of the answers carrying no planted theme
   */
  record Truth(String theme, double share, double none) {
    /** Most of its answers carry one planted theme. */
    boolean planted() {
      return share >= 0.8;
    }

    /** It names what its answers are about: a planted theme, or an off-catalogue reason. */
    boolean content() {
      return planted() || none >= 0.8;
    }
  }

  static Truth truth(Phrase p, PhraseFilter filter) {
    return truth(p.variants(), filter);
  }

  static Truth truth(List<String> variants, PhraseFilter filter) {
    Map<String, Integer> counts = new HashMap<>();
    int n = 0;
    int none = 0;
    for (PhraseDoc d : docs) {
      if (!filter.accepts(d)) {
        continue;
      }
      String masked = d.analysis().masked().toLowerCase(Locale.ROOT);
      boolean has = false;
      for (String v : variants) {
        has |= masked.contains(v.toLowerCase(Locale.ROOT));
      }
      if (has) {
        n++;
        List<String> themes = planted.get((int) d.answerId());
        if (themes.isEmpty()) {
          none++;
        }
        for (String t : themes) {
          counts.merge(t, 1, Integer::sum);
        }
      }
    }
    String best = "";
    int most = 0;
    for (Map.Entry<String, Integer> e : counts.entrySet()) {
      if (e.getValue() > most || (e.getValue() == most && e.getKey().compareTo(best) < 0)) {
        best = e.getKey();
        most = e.getValue();
      }
    }
    return n == 0 ? new Truth("", 0, 0) : new Truth(best, most / (double) n, none / (double) n);
  }

  private static PhraseFilter question(Question q) {
    return PhraseFilter.all().withQuestion(q.text());
  }

  /**
   * The top of the list is what buyers give as reasons: for each question, at least 8 of the 10
   * best phrases are about a planted theme (by the ground truth of the answers that contain them),
   * not off-catalogue reasons nor the background sentences that come with any theme ("I had been
   * looking for months").
   */
  @Test
  void atLeastEightOfTheTenBestPhrasesArePlantedThemes() {
    for (Question q : Question.values()) {
      List<Phrase> top = MINER.mine(docs, question(q)).phrases().subList(0, 10);
      int themes = 0;
      for (Phrase p : top) {
        themes += truth(p, question(q)).planted() ? 1 : 0;
      }
      assertTrue(themes >= 8, q + ": " + themes + " of 10 are planted themes" + describe(top, q));
    }
  }

  private static String describe(List<Phrase> phrases, Question q) {
    StringBuilder b = new StringBuilder();
    for (Phrase p : phrases) {
      Truth t = truth(p, question(q));
      b.append(
          String.format(
              Locale.ROOT,
              "%n  %s (%d answers): %s %.2f, no theme %.2f",
              p.phrase(),
              p.answers(),
              t.theme(),
              t.share(),
              t.none()));
    }
    return b.toString();
  }

  /** The share of the question's substantive demo answers that carry {@code theme}. */
  private static double realisedShare(Theme theme) {
    int base = 0;
    int carrying = 0;
    for (GeneratedWave w : SampleResponses.demoWaves()) {
      base += w.base(theme.question());
      for (GeneratedRespondent r : w.respondents()) {
        GeneratedAnswer a = theme.question() == Question.STOPPED ? r.stopped() : r.chose();
        carrying += a.themes().contains(theme.code()) ? 1 : 0;
      }
    }
    return carrying / (double) base;
  }

  /**
   * Every planted theme that at least 5% of a question's answers carry (all of them, by the
   * generator's catalogue) is reached at the top of the report {@code riffle phrases} shows: one of
   * the 20 best phrases is about it, or one of the clusters is (most answers its phrases cover
   * carry it).
   */
  @Test
  void everyPlantedThemeOfFivePercentIsReachedByTheReportsPhrasesOrClusters() {
    for (Question q : Question.values()) {
      PhraseReport report = MINER.mine(docs, question(q));
      Map<String, Phrase> byLabel = new HashMap<>();
      Set<String> reached = new TreeSet<>();
      for (int i = 0; i < report.phrases().size(); i++) {
        Phrase p = report.phrases().get(i);
        byLabel.put(p.phrase(), p);
        Truth t = truth(p, question(q));
        if (t.planted()) {
          reached.add(t.theme());
        }
      }
      for (PhraseCluster c : report.clusters()) {
        List<String> variants = new ArrayList<>();
        for (String label : c.phrases()) {
          variants.addAll(byLabel.get(label).variants());
        }
        Truth t = truth(variants, question(q));
        if (t.planted()) {
          reached.add(t.theme());
        }
      }
      Set<String> expected = new TreeSet<>();
      for (Theme t : SampleResponses.themes(q)) {
        if (realisedShare(t) >= 0.05) {
          expected.add(t.code());
        }
      }
      assertEquals(SampleResponses.themes(q).size(), expected.size(), "catalogue of " + q);
      assertEquals(expected, reached, q + describe(report.phrases(), q) + report.clusters());
    }
  }

  /**
   * Between Wave 2 and Wave 3 the shop began to show the delivery date and the warranty at
   * checkout. In the keyness of Wave 3 against Wave 2 (phrases mapped to themes by the planted
   * ground truth of their answers), each of those two themes has a phrase that falls significantly
   * (p &lt; 0.01, negative Log Ratio), its most frequent phrase falls, and none of its phrases
   * rises (p &lt; 0.05); the most frequent phrase of each flat theme does not change (p &ge; 0.01),
   * and no more of the flat themes' phrases reach p &lt; 0.01 than chance would give.
   */
  @Test
  void theSiteChangeThemesFallInWave3AndFlatThemesDoNot() {
    PhraseMiner all = PhraseMiner.create(PhraseSettings.builder().limit(10_000).get());
    PhraseFilter stopped = question(Question.STOPPED);
    PhraseFilter wave2 = stopped.withWave("Wave 2");
    List<KeyPhrase> key = all.keyness(docs, stopped.withWave("Wave 3"), wave2);
    Map<String, List<KeyPhrase>> byTheme = new TreeMap<>();
    for (KeyPhrase k : key) {
      Truth t = truth(List.of(k.phrase()), stopped);
      if (t.planted()) {
        byTheme.computeIfAbsent(t.theme(), x -> new ArrayList<>()).add(k);
      }
    }
    int flat = 0;
    List<KeyPhrase> chance = new ArrayList<>();
    for (Theme theme : SampleResponses.themes(Question.STOPPED)) {
      List<KeyPhrase> phrases = byTheme.getOrDefault(theme.code(), List.of());
      assertFalse(phrases.isEmpty(), theme.code() + " has no phrase in the keyness list");
      if (SampleResponses.SITE_CHANGE_THEMES.contains(theme)) {
        KeyPhrase main =
            phrases.stream()
                .max(Comparator.comparingInt((KeyPhrase k) -> k.focus() + k.reference()))
                .orElseThrow();
        assertTrue(main.logRatio() < 0, theme.code() + ": " + main);
        assertTrue(
            phrases.stream().anyMatch(k -> k.p() < 0.01 && k.logRatio() < 0),
            theme.code() + ": " + phrases);

        for (KeyPhrase k : phrases) {
          assertFalse(k.p() < 0.05 && k.logRatio() > 0, theme.code() + " rises: " + k);
        }
      } else {
        KeyPhrase main =
            phrases.stream()
                .max(Comparator.comparingInt((KeyPhrase k) -> k.focus() + k.reference()))
                .orElseThrow();
        // 0.05 shared among the seven flat themes (Bonferroni): 0.007, taken as 0.01
        assertTrue(main.p() >= 0.01, theme.code() + " is flat, yet " + main);
        flat += phrases.size();
        for (KeyPhrase k : phrases) {
          if (k.p() < 0.01) {
            chance.add(k);
          }
          assertTrue(k.pAdjusted() >= 0.05, theme.code() + " is flat, yet after adjustment " + k);
        }
      }
    }
    // With no adjustment for multiple comparisons, about 1% of the flat themes' phrases reach
    // p < 0.01 by chance alone; allow twice that, rounded up.
    assertTrue(chance.size() <= Math.ceil(0.02 * flat), chance + " of " + flat + " flat phrases");
    for (KeyPhrase k : key) {
      assertTrue(k.pAdjusted() >= k.p(), "an adjusted p is never below its p: " + k);
    }
  }

  /**
   * Phrases of different planted themes share a cluster only when the generator makes those themes
   * travel together ({@link SampleResponses#LINKS}), and such links are found.
   */
  @Test
  void clustersJoinOnlyThemesThatTravelTogether() {
    Set<Set<String>> links = new HashSet<>();
    for (SampleResponses.Link l : SampleResponses.LINKS) {
      links.add(Set.of(l.theme().code(), l.anchor().code()));
    }
    Set<Set<String>> seen = new HashSet<>();
    for (Question q : Question.values()) {
      PhraseReport report = MINER.mine(docs, question(q));
      Map<String, Phrase> byLabel = new HashMap<>();
      for (Phrase p : report.phrases()) {
        byLabel.put(p.phrase(), p);
      }
      for (PhraseCluster c : report.clusters()) {
        Set<String> themes = new TreeSet<>();
        for (String label : c.phrases()) {
          Truth t = truth(byLabel.get(label), question(q));
          if (t.planted()) {
            themes.add(t.theme());
          }
        }
        for (String a : themes) {
          for (String b : themes) {
            if (!a.equals(b)) {
              assertTrue(links.contains(Set.of(a, b)), c + " joins " + themes);
              seen.add(Set.of(a, b));
            }
          }
        }
      }
    }
    assertTrue(seen.size() >= 3, "planted links found: " + seen);
  }
}
