package riffle.phrases;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import riffle.model.Token;

/**
 * The second pass of a mining run: for a chosen set of candidates, finds every occurrence again and
 * collects how each is written, which answers contain it and where. Only these few hundred
 * candidates cost strings; counting all of them (the first pass) builds none.
 */
final class Occurrences {
  private final int[] poolIndex;
  private final List<Map<String, Integer>> surfaces = new ArrayList<>();
  private final List<int[]> docs = new ArrayList<>();
  private final int[] docCount;
  private final List<int[]> spans = new ArrayList<>();
  private final int[] spanCount;

  /**
   * Collects the occurrences of {@code pool} (nodes of {@code grams}) in {@code answers}.
   *
   * @param answers the answers, in the order in which they were counted
   */
  Occurrences(
      PhraseWords words,
      Grams grams,
      int maxWords,
      List<PhraseDoc> answers,
      int[] pool,
      int nodes) {
    this.poolIndex = new int[nodes];
    Arrays.fill(poolIndex, -1);
    for (int i = 0; i < pool.length; i++) {
      poolIndex[pool[i]] = i;
      surfaces.add(new HashMap<>());
      docs.add(new int[4]);
      spans.add(new int[16]);
    }
    docCount = new int[pool.length];
    spanCount = new int[pool.length];
    Candidates finder = new Candidates(words, grams, maxWords, false);
    for (int d = 0; d < answers.size(); d++) {
      PhraseDoc doc = answers.get(d);
      int docIndex = d;
      finder.visit(
          doc.analysis(),
          (node, sentence, start, end, labelStart) -> {
            int i = node < poolIndex.length ? poolIndex[node] : -1;
            if (i < 0) {
              return;
            }
            List<Token> tokens = doc.analysis().sentences().get(sentence).tokens();
            String surface = surface(doc.analysis().masked(), tokens, start, end, labelStart);
            surfaces.get(i).merge(surface, 1, Integer::sum);
            addDoc(i, docIndex);
            addSpan(i, docIndex, sentence, start, end);
          });
    }
  }

  private static String surface(
      String masked, List<Token> tokens, int start, int end, int labelStart) {
    int from = tokens.get(labelStart < 0 ? start : labelStart).start();
    int to = tokens.get(end - 1).end();
    // The tokenizer sometimes leaves punctuation on a word ("Duo 2."): labels start and end on a
    // letter or digit.
    while (from < to && !Character.isLetterOrDigit(masked.codePointAt(from))) {
      from += Character.charCount(masked.codePointAt(from));
    }
    while (to > from && !Character.isLetterOrDigit(masked.codePointBefore(to))) {
      to -= Character.charCount(masked.codePointBefore(to));
    }
    String text = collapse(masked.substring(from, to));
    return labelStart < 0 ? "not " + text : text;
  }

  private void addDoc(int i, int doc) {
    int[] list = docs.get(i);
    int n = docCount[i];
    if (n > 0 && list[n - 1] == doc) {
      return;
    }
    if (n == list.length) {
      list = Arrays.copyOf(list, n * 2);
      docs.set(i, list);
    }
    list[n] = doc;
    docCount[i] = n + 1;
  }

  private void addSpan(int i, int doc, int sentence, int start, int end) {
    int[] list = spans.get(i);
    int n = spanCount[i];
    if (n + 4 > list.length) {
      list = Arrays.copyOf(list, list.length * 2);
      spans.set(i, list);
    }
    list[n] = doc;
    list[n + 1] = sentence;
    list[n + 2] = start;
    list[n + 3] = end;
    spanCount[i] = n + 4;
  }

  /** The answers (indices into the counted list) containing candidate {@code i}, ascending. */
  int[] docs(int i) {
    return Arrays.copyOf(docs.get(i), docCount[i]);
  }

  /**
   * The occurrences of candidate {@code i} as {doc, sentence, start, end} quadruples, by answer.
   */
  int[] spans(int i) {
    return Arrays.copyOf(spans.get(i), spanCount[i]);
  }

  /**
   * How candidate {@code i} is written: variants merged by {@link #canonical} form, most frequent
   * first (ties by the canonical form), each shown as its most frequent exact spelling (ties by the
   * spelling's text).
   */
  List<String> variants(int i) {
    Map<String, int[]> byKey = new HashMap<>();
    Map<String, String> shown = new HashMap<>();
    for (Map.Entry<String, Integer> e : surfaces.get(i).entrySet()) {
      String key = canonical(e.getKey());
      byKey.computeIfAbsent(key, k -> new int[2])[0] += e.getValue();
      String best = shown.get(key);
      int bestCount = best == null ? 0 : surfaces.get(i).get(best);
      if (best == null
          || e.getValue() > bestCount
          || (e.getValue() == bestCount && before(e.getKey(), best))) {
        shown.put(key, e.getKey());
      }
    }
    List<String> keys = new ArrayList<>(byKey.keySet());
    keys.sort(
        (a, b) -> {
          int c = Integer.compare(byKey.get(b)[0], byKey.get(a)[0]);
          return c != 0 ? c : a.compareTo(b);
        });
    List<String> out = new ArrayList<>();
    for (String k : keys) {
      out.add(shown.get(k));
    }
    return out;
  }

  /** Tie-break between equally frequent spellings: fewer capitals first, then by text. */
  private static boolean before(String a, String b) {
    int c =
        Long.compare(
            a.chars().filter(Character::isUpperCase).count(),
            b.chars().filter(Character::isUpperCase).count());
    return c != 0 ? c < 0 : a.compareTo(b) < 0;
  }

  /** Whether any variant of candidate {@code i} is a stop phrase. */
  boolean stopped(int i, Set<String> stopPhrases) {
    for (String s : surfaces.get(i).keySet()) {
      if (stopPhrases.contains(canonical(s))) {
        return true;
      }
    }
    return false;
  }

  /**
   * The form in which variants and stop phrases are compared: lower case, typographic apostrophes
   * as {@code '}, runs of white space as one space, trimmed.
   */
  static String canonical(String text) {
    return collapse(text.replace('\u2019', '\'').replace('\u2018', '\''))
        .toLowerCase(Locale.ROOT)
        .trim();
  }

  /** Runs of white space (line breaks included) as one space. */
  static String collapse(String text) {
    boolean clean = true;
    for (int i = 0; i < text.length() && clean; i++) {
      char c = text.charAt(i);
      clean = !Character.isWhitespace(c) || (c == ' ' && (i == 0 || text.charAt(i - 1) != ' '));
    }
    if (clean) {
      return text;
    }
    StringBuilder b = new StringBuilder(text.length());
    boolean space = false;
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (Character.isWhitespace(c)) {
        if (!space) {
          b.append(' ');
        }
        space = true;
      } else {
        b.append(c);
        space = false;
      }
    }
    return b.toString();
  }
}
