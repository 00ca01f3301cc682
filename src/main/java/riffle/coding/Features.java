package riffle.coding;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import riffle.model.Analysis;
import riffle.model.Chunk;
import riffle.model.Sentence;
import riffle.model.Token;

/**
 * Turns an answer's analysis into the names of its binary features. Stateless and thread-safe.
 *
 * <p>A word is a token whose stem holds a letter or digit (punctuation and emoji are no words; a
 * masking placeholder such as {@code [email]} is one). A word's unit is its stem, or {@code
 * not:stem} when a negation governs it, so "not expensive" and "expensive" never share a feature.
 * The features are, within each sentence: every unit ({@code w:}), the first {@link #PREFIX}
 * letters of a long stem ({@code p:}, negated like its word), every pair of adjacent units ({@code
 * b:}), and every chunk of two or more words after leading determiners and possessives ({@code c:},
 * the units joined by spaces). An answer without sentences (not in the analysis language, or empty)
 * has no features.
 */
final class Features {
  /**
   * A stem longer than this also gives its first letters as a feature ({@code p:}), so that
   * misspellings and word forms the stemmer keeps apart ("delivry", "deliveri", "deliv") still
   * share one: +0.02 micro-F1 at 300 coded answers on the demo pilot, no change at 1,000.
   */
  static final int PREFIX = 5;

  private Features() {}

  /**
   * Returns the distinct features of one answer, in order of first appearance.
   *
   * @param analysis the answer's analysis
   * @return the feature names, possibly none
   */
  static List<String> of(Analysis analysis) {
    Set<String> out = new LinkedHashSet<>();
    for (Sentence s : analysis.sentences()) {
      List<Token> words = new ArrayList<>();
      for (Token t : s.tokens()) {
        if (isWord(t)) {
          words.add(t);
        }
      }
      String previous = null;
      for (Token t : words) {
        String unit = unit(t);
        out.add("w:" + unit);
        if (t.stem().length() > PREFIX) {
          out.add("p:" + (t.negated() ? "not:" : "") + t.stem().substring(0, PREFIX));
        }
        if (previous != null) {
          out.add("b:" + previous + ' ' + unit);
        }
        previous = unit;
      }
      for (Chunk c : s.chunks()) {
        String phrase = chunkPhrase(c, words);
        if (phrase != null) {
          out.add("c:" + phrase);
        }
      }
    }
    return List.copyOf(out);
  }

  /** The chunk's units joined by spaces, without leading determiners; null under two words. */
  private static String chunkPhrase(Chunk c, List<Token> words) {
    StringBuilder b = new StringBuilder();
    int n = 0;
    for (Token t : words) {
      if (t.start() < c.start() || t.end() > c.end()) {
        continue;
      }
      if (n == 0 && isDeterminer(t)) {
        continue;
      }
      if (n > 0) {
        b.append(' ');
      }
      b.append(unit(t));
      n++;
    }
    return n >= 2 ? b.toString() : null;
  }

  private static boolean isDeterminer(Token t) {
    return t.pos().equals("DT") || t.pos().equals("PDT") || t.pos().equals("PRP$");
  }

  private static String unit(Token t) {
    return t.negated() ? "not:" + t.stem() : t.stem();
  }

  private static boolean isWord(Token t) {
    String s = t.stem();
    for (int i = 0; i < s.length(); ) {
      int cp = s.codePointAt(i);
      if (Character.isLetterOrDigit(cp)) {
        return true;
      }
      i += Character.charCount(cp);
    }
    return false;
  }
}
