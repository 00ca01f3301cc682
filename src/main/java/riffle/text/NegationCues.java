package riffle.text;

import java.util.Set;

/**
 * The words that can start a negation, shared by the negation scope and the phrase rules. Lower
 * case; whether a listed word negates in context ("no" as an answer, "not only") is {@link
 * NegationScope}'s to decide.
 */
public final class NegationCues {
  /** Cue words and tokens: not, n't, never, no, without, hardly, nothing … */
  public static final Set<String> WORDS =
      Set.of(
          "not", "n't", "'nt", "never", "no", "without", "hardly", "nothing", "nobody", "none",
          "nor", "neither", "cannot", "noone", "no-one");

  /** Negated auxiliaries typed without their apostrophe: didnt, wasnt, dont … */
  public static final Set<String> APOSTROPHE_LESS =
      Set.of(
          "didnt",
          "doesnt",
          "dont",
          "isnt",
          "wasnt",
          "arent",
          "werent",
          "havent",
          "hasnt",
          "hadnt",
          "cant",
          "couldnt",
          "wouldnt",
          "shouldnt",
          "wont",
          "aint",
          "mustnt",
          "neednt",
          "shant");

  private NegationCues() {}

  /** Whether a lower-case token is on either list. */
  public static boolean listed(String lower) {
    return WORDS.contains(lower) || APOSTROPHE_LESS.contains(lower);
  }
}
