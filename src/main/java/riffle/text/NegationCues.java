package riffle.text;

import java.util.Set;
import riffle.words.WordList;

/**
 * The words that can start a negation, shared by the negation scope and the phrase rules, read once
 * from {@code riffle/words/en/negation-cues.txt} and {@code negation-cues-no-apostrophe.txt}. Lower
 * case; whether a listed word negates in context ("no" as an answer, "not only") is {@link
 * NegationScope}'s to decide.
 */
public final class NegationCues {
  /** Cue words and tokens: not, n't, never, no, without, hardly, nothing … */
  public static final Set<String> WORDS = WordList.set("en", "negation-cues");

  /** Negated auxiliaries typed without their apostrophe: didnt, wasnt, dont … */
  public static final Set<String> APOSTROPHE_LESS =
      WordList.set("en", "negation-cues-no-apostrophe");

  private NegationCues() {}

  /** Whether a lower-case token is on either list. */
  public static boolean listed(String lower) {
    return WORDS.contains(lower) || APOSTROPHE_LESS.contains(lower);
  }
}
