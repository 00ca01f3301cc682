package riffle.quotes;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import riffle.model.Analysis;
import riffle.model.Sentence;
import riffle.model.Token;

/**
 * Cuts an analysed answer into quotable pieces: each sentence is split into clauses, and every run
 * of up to {@value #MAX_RUN} neighbouring clauses of one sentence (the whole sentence among them,
 * when it has no more clauses than that) is a piece. The score then picks the best piece.
 *
 * <p>A clause ends at a comma, semicolon, colon, dash, bracket or ellipsis, and before "but",
 * "because", "although", "though", "whereas", "unless" and "plus"; before "and", "or" and "so" only
 * when a new clause follows (a pronoun, or a determiner with a verb close behind), so that "fast
 * and friendly" stays whole. Leading punctuation and joining words ("and", "but", "so") are
 * trimmed, as are trailing symbols except a sentence's final . ! or ?. A piece holding a
 * placeholder of masked personal data, an {@code @} or a run of 7 or more digits is never made.
 */
final class Clauses {
  private Clauses() {}

  /** Longest run of neighbouring clauses that makes one piece. */
  static final int MAX_RUN = 6;

  private static final Set<String> HARD =
      Set.of(",", ";", ":", "-", "--", "\u2013", "\u2014", "(", ")", "...", "\u2026");

  private static final Set<String> ALWAYS_BREAK =
      Set.of("but", "because", "although", "though", "whereas", "unless", "plus", "cause", "cuz");

  private static final Set<String> BREAK_BEFORE_CLAUSE = Set.of("and", "or", "so");

  /**
   * "and", "or" and "so" after this many tokens of a clause start a new one: they then join
   * reasons, not two adjectives ("fast and friendly"). Splitting too often loses nothing, since
   * runs of neighbouring clauses are pieces too.
   */
  static final int JOINED_WORDS = 3;

  private static final Set<String> CLAUSE_OPENERS =
      Set.of("the", "my", "your", "this", "that", "it", "everything", "everyone", "there", "their");

  /** Openers trimmed from the start of a piece: they carry no meaning of their own. */
  private static final Set<String> LEADING_FILLERS =
      Set.of(
          "honestly",
          "mainly",
          "mostly",
          "basically",
          "simply",
          "overall",
          "ok",
          "okay",
          "oh",
          "well",
          "tbh");

  private static final Set<String> LEADING_JOINERS =
      Set.of("and", "or", "but", "so", "plus", "then", "also");

  /**
   * An answer cut up.
   *
   * @param pieces the quotable pieces, in text order
   * @param clauses the content word ids of every clause of the answer, quotable or not, in text
   *     order (ascending and distinct within a clause)
   * @param content the content word ids of the whole answer, ascending and distinct
   */
  record Cut(List<Piece> pieces, List<int[]> clauses, int[] content) {}

  /** The pieces and clauses of an answer; none for an answer without sentences. */
  static Cut cut(Analysis analysis, Vocabulary vocabulary) {
    List<Piece> out = new ArrayList<>();
    List<int[]> clauses = new ArrayList<>();
    Set<Long> made = new java.util.HashSet<>(); // trimming can make two runs the same piece
    for (Sentence s : analysis.sentences()) {
      List<Token> toks = s.tokens();
      Facts f = new Facts(toks, vocabulary);
      List<int[]> segments = segments(toks);
      int base = clauses.size();
      for (int[] seg : segments) {
        int[] ids = new int[seg[1] - seg[0]];
        int n = 0;
        for (int i = seg[0]; i < seg[1]; i++) {
          if (f.content[i]) {
            ids[n++] = f.id[i];
          }
        }
        clauses.add(distinct(ids, n));
      }
      for (int i = 0; i < segments.size(); i++) {
        for (int j = i; j < segments.size() && j - i < MAX_RUN; j++) {
          Piece p =
              piece(
                  analysis.masked(),
                  toks,
                  f,
                  segments.get(i)[0],
                  segments.get(j)[1],
                  base + i,
                  base + j);
          if (p != null && made.add(((long) p.start() << 32) | p.end())) {
            out.add(p);
          }
        }
      }
    }
    int total = 0;
    for (int[] c : clauses) {
      total += c.length;
    }
    int[] all = new int[total];
    int k = 0;
    for (int[] c : clauses) {
      System.arraycopy(c, 0, all, k, c.length);
      k += c.length;
    }
    return new Cut(out, clauses, distinct(all, total));
  }

  /** Clause boundaries as token ranges [from, to). */
  static List<int[]> segments(List<Token> toks) {
    List<int[]> out = new ArrayList<>();
    int from = 0;
    for (int i = 0; i < toks.size(); i++) {
      Token t = toks.get(i);
      if (HARD.contains(t.text())) {
        add(out, from, i);
        from = i + 1;
      } else if (i > from && breaksBefore(toks, from, i)) {
        add(out, from, i);
        from = i;
      }
    }
    add(out, from, toks.size());
    return out;
  }

  private static void add(List<int[]> out, int from, int to) {
    if (to > from) {
      out.add(new int[] {from, to});
    }
  }

  private static boolean breaksBefore(List<Token> toks, int from, int i) {
    String w = QuoteWords.lower(toks.get(i));
    if (ALWAYS_BREAK.contains(w)) {
      return true;
    }
    if (!BREAK_BEFORE_CLAUSE.contains(w) || i + 1 >= toks.size()) {
      return false;
    }
    Token next = toks.get(i + 1);
    if (next.pos().equals("PRP")
        || next.pos().equals("EX")
        || QuoteWords.lower(next).equals("also")
        || i - from >= JOINED_WORDS) {
      return true;
    }
    if (!CLAUSE_OPENERS.contains(QuoteWords.lower(next))) {
      return false;
    }
    for (int k = i + 2; k < toks.size() && k <= i + 5; k++) {
      Token t = toks.get(k);
      if (HARD.contains(t.text())) {
        return false;
      }
      if (t.pos().startsWith("VB") || t.pos().equals("MD")) {
        return true;
      }
    }
    return false;
  }

  /** The piece over tokens [from, to), trimmed; null when nothing quotable is left. */
  /** What the score reads from each token of a sentence, worked out once per sentence. */
  private static final class Facts {
    final int[] id;
    final boolean[] word;
    final boolean[] content;
    final boolean[] placeholder;
    final boolean[] counted;
    final boolean[] firstPerson;
    final boolean[] number;
    final boolean[] name;
    final boolean[] verb;
    final boolean[] explaining;
    final double[] polarity;

    Facts(List<Token> toks, Vocabulary vocabulary) {
      int n = toks.size();
      id = new int[n];
      word = new boolean[n];
      content = new boolean[n];
      placeholder = new boolean[n];
      counted = new boolean[n];
      firstPerson = new boolean[n];
      number = new boolean[n];
      name = new boolean[n];
      verb = new boolean[n];
      explaining = new boolean[n];
      polarity = new double[n];
      for (int i = 0; i < n; i++) {
        Token t = toks.get(i);
        placeholder[i] = QuoteWords.isPlaceholder(t);
        word[i] = QuoteWords.isWord(t);
        if (!word[i] || placeholder[i]) {
          id[i] = -1;
          continue;
        }
        String w = QuoteWords.lower(t);
        id[i] = vocabulary.id(t);
        content[i] = QuoteWords.isContent(t);
        counted[i] = !t.text().startsWith("'");
        firstPerson[i] = QuoteWords.FIRST_PERSON.contains(w);
        number[i] = t.pos().equals("CD") || hasDigit(w);
        name[i] = t.pos().startsWith("NNP") && i > 0 && !w.equals("i");
        verb[i] = t.pos().startsWith("VB") && !QuoteWords.LIGHT_VERBS.contains(w);
        explaining[i] = QuoteWords.EXPLAINING.contains(w);
        polarity[i] = polarity(toks, i, w, content[i]);
      }
    }
  }

  /** The piece over tokens [from, to), trimmed; null when nothing quotable is left. */
  private static Piece piece(
      String masked, List<Token> toks, Facts f, int from, int to, int firstClause, int lastClause) {
    int a = from;
    if (a + 1 < toks.size() && f.word[a] && toks.get(a + 1).text().equals(":")) {
      a += 2; // a heading word such as "Simple:" or "Reason:"
    }
    while (a < to
        && (!f.word[a]
            || LEADING_JOINERS.contains(QuoteWords.lower(toks.get(a)))
            || (LEADING_FILLERS.contains(QuoteWords.lower(toks.get(a))) && a + 1 < to))) {
      a++;
    }
    int b = to;
    while (b > a && !f.word[b - 1]) {
      if (b == toks.size() && b - 2 >= a && isTerminal(toks.get(b - 1).text()) && f.word[b - 2]) {
        break;
      }
      if (closesQuote(masked, toks.get(a).start(), toks.get(b - 1))) {
        break;
      }
      b--;
    }
    if (b <= a) {
      return null;
    }
    int words = 0;
    int[] content = new int[b - a];
    int[] stems = new int[b - a];
    int nc = 0;
    int ns = 0;
    boolean firstPerson = false;
    boolean number = false;
    boolean name = false;
    boolean verb = false;
    boolean explains = false;
    double polarity = 0;
    for (int i = a; i < b; i++) {
      if (f.placeholder[i]) {
        return null;
      }
      if (!f.word[i]) {
        continue;
      }
      words += f.counted[i] ? 1 : 0;
      stems[ns++] = f.id[i];
      if (f.content[i]) {
        content[nc++] = f.id[i];
      }
      firstPerson |= f.firstPerson[i];
      number |= f.number[i];
      name |= f.name[i];
      verb |= f.verb[i];
      explains |= f.explaining[i] && i > a;
      polarity += f.polarity[i];
    }
    if (nc == 0) {
      return null;
    }
    int start = toks.get(a).start();
    int end = toks.get(b - 1).end();
    String text = masked.substring(start, end);
    if (QuoteWords.containsPlaceholder(text) || QuoteWords.looksPersonal(text)) {
      return null;
    }
    double concreteness = ((number ? 1 : 0) + (name ? 1 : 0) + (verb ? 1 : 0)) / 3.0;
    return new Piece(
        start,
        end,
        words,
        distinct(content, nc),
        distinct(stems, ns),
        Arrays.copyOf(stems, ns),
        firstPerson,
        concreteness,
        polarity,
        explains,
        firstClause,
        lastClause);
  }

  /** Whether the token is a quotation mark that closes one opened earlier in the piece. */
  private static boolean closesQuote(String masked, int start, Token t) {
    if (!t.text().equals("\"")) {
      return false;
    }
    int marks = 0;
    for (int i = start; i < t.start(); i++) {
      marks += masked.charAt(i) == '"' ? 1 : 0;
    }
    return marks % 2 == 1;
  }

  private static double polarity(List<Token> toks, int i, String w, boolean isContent) {
    Token t = toks.get(i);
    if (QuoteWords.POSITIVE.contains(w)) {
      return t.negated() ? -1 : 1;
    }
    if (QuoteWords.NEGATIVE.contains(w)) {
      return t.negated() ? 1 : -1;
    }
    if (w.equals("too") && !t.negated() && i + 1 < toks.size()) {
      String p = toks.get(i + 1).pos();
      return p.startsWith("JJ") || p.startsWith("RB") ? -1 : 0;
    }
    return t.negated() && isContent ? -0.5 : 0;
  }

  private static boolean isTerminal(String s) {
    for (int i = 0; i < s.length(); i++) {
      if ("!?.".indexOf(s.charAt(i)) < 0) {
        return false;
      }
    }
    return !s.isEmpty();
  }

  private static boolean hasDigit(String w) {
    for (int i = 0; i < w.length(); i++) {
      if (Character.isDigit(w.charAt(i))) {
        return true;
      }
    }
    return false;
  }

  private static int[] distinct(int[] ids, int n) {
    int[] a = Arrays.copyOf(ids, n);
    Arrays.sort(a);
    int k = 0;
    for (int i = 0; i < a.length; i++) {
      if (i == 0 || a[i] != a[i - 1]) {
        a[k++] = a[i];
      }
    }
    return Arrays.copyOf(a, k);
  }
}
