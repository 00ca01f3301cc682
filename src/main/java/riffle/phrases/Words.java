package riffle.phrases;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import riffle.text.NegationCues;

/**
 * The word lists of the phrase rules and the vocabulary of one mining run: stems are interned into
 * int ids, and each distinct token text is classified once.
 *
 * <p><b>Stopwords</b> ({@link #STOPWORDS}) are the English function words a phrase may contain but
 * never start or end with: articles and determiners, pronouns, forms of be, do and have, modals and
 * their clitics ('d, 'll, 's …), prepositions, conjunctions, wh-words, and the intensifiers and
 * fillers of survey answers (very, really, just, tbh, honestly …). Content words such as "less",
 * "like", "new" or "again" are not stopwords ("less waste", "like new").
 *
 * <p><b>Negation cues</b> ({@link NegationCues}) follow the text package's negation rule: not, n't,
 * never, no, without, hardly, nothing, nobody, none, nor, neither, cannot and the forms typed
 * without an apostrophe (didnt, wasnt, dont …). A cue is never part of a phrase's words; it only
 * shows in the label of the negated phrase that follows it.
 */
final class Words {
  static final int WORD = 1;
  static final int STOP = 2;
  static final int CUE = 4;

  static final Set<String> STOPWORDS =
      words(
          // articles, determiners, quantifiers
          "a",
          "an",
          "the",
          "this",
          "that",
          "these",
          "those",
          "some",
          "any",
          "each",
          "every",
          "all",
          "both",
          "either",
          "another",
          "such",
          "other",
          "same",
          "own",
          "enough",
          "many",
          "few",
          "several",
          // pronouns
          "i",
          "me",
          "my",
          "mine",
          "myself",
          "you",
          "your",
          "yours",
          "yourself",
          "he",
          "him",
          "his",
          "she",
          "her",
          "hers",
          "it",
          "its",
          "itself",
          "we",
          "us",
          "our",
          "ours",
          "they",
          "them",
          "their",
          "theirs",
          "one",
          "ones",
          "someone",
          "something",
          "anything",
          "everything",
          "anyone",
          "everyone",
          "somebody",
          "anybody",
          "everybody",
          "im",
          "ive",
          "id",
          "youre",
          "thats",
          "theres",
          "whats",
          // wh-words and connectives
          "what",
          "which",
          "who",
          "whom",
          "whose",
          "where",
          "when",
          "why",
          "how",
          "whether",
          "if",
          "than",
          "then",
          "there",
          "here",
          "and",
          "or",
          "but",
          "so",
          "because",
          "as",
          "while",
          "although",
          "though",
          "yet",
          "also",
          "plus",
          "either",
          "&",
          "+",
          "/",
          // be, do, have, modals, clitics
          "am",
          "is",
          "are",
          "was",
          "were",
          "be",
          "been",
          "being",
          "do",
          "does",
          "did",
          "doing",
          "have",
          "has",
          "had",
          "having",
          "will",
          "would",
          "shall",
          "should",
          "can",
          "could",
          "may",
          "might",
          "must",
          "'d",
          "'ll",
          "'m",
          "'re",
          "'s",
          "'ve",
          "ll",
          "d",
          "s",
          // prepositions and particles
          "of",
          "to",
          "in",
          "on",
          "at",
          "by",
          "for",
          "with",
          "from",
          "into",
          "onto",
          "about",
          "over",
          "under",
          "after",
          "before",
          "between",
          "through",
          "during",
          "up",
          "down",
          "out",
          "off",
          "around",
          "via",
          "per",
          "until",
          "till",
          "upon",
          "within",
          "against",
          "among",
          "across",
          "along",
          "behind",
          "beyond",
          "towards",
          "toward",
          // intensifiers and fillers
          "very",
          "really",
          "just",
          "too",
          "quite",
          "rather",
          "still",
          "even",
          "only",
          "already",
          "ever",
          "much",
          "more",
          "most",
          "pretty",
          "tbh",
          "honestly",
          "actually",
          "basically",
          "maybe",
          "perhaps",
          "probably",
          "etc",
          "ok",
          "okay",
          "yes",
          "yeah",
          "oh",
          "hmm",
          "um",
          "lol",
          "mostly",
          "mainly",
          "simply",
          "definitely",
          "totally",
          "absolutely",
          "anyway",
          "though",
          "however",
          "thus",
          "else",
          "far",
          "bit",
          "lot",
          "lots",
          "kind",
          "sort");

  /** Auxiliaries and modals that carry a negation ("did not", "could never"). */
  static final Set<String> AUXILIARIES =
      words(
          "am", "is", "are", "was", "were", "be", "been", "do", "does", "did", "have", "has", "had",
          "will", "would", "shall", "should", "can", "could", "may", "might", "must", "ca", "wo");

  private static Set<String> words(String... list) {
    return Set.copyOf(List.of(list));
  }

  private final Map<String, Integer> stemIds = new HashMap<>();
  private final List<String> stems = new ArrayList<>();
  private final Map<String, Integer> flagsByText = new HashMap<>();

  /** The id of {@code stem}, created when new. */
  int stem(String stem) {
    Integer id = stemIds.get(stem);
    if (id == null) {
      id = stems.size();
      stems.add(stem);
      stemIds.put(stem, id);
    }
    return id;
  }

  /** The id of {@code stem}, or -1 when it was never seen. */
  int knownStem(String stem) {
    Integer id = stemIds.get(stem);
    return id == null ? -1 : id;
  }

  String stemText(int id) {
    return stems.get(id);
  }

  /** {@link #WORD}, {@link #STOP} and {@link #CUE} bits of a token text. */
  int flags(String text) {
    Integer f = flagsByText.get(text);
    if (f == null) {
      f = classify(text);
      flagsByText.put(text, f);
    }
    return f;
  }

  private static int classify(String text) {
    if (isPlaceholder(text)) {
      return 0;
    }
    boolean letters = false;
    for (int i = 0; i < text.length(); ) {
      int c = text.codePointAt(i);
      if (Character.isLetterOrDigit(c)) {
        letters = true;
        break;
      }
      i += Character.charCount(c);
    }
    if (!letters) {
      return 0;
    }
    String lower = normalise(text);
    int f = WORD;
    if (NegationCues.listed(lower) || lower.endsWith("n't")) {
      f |= CUE | STOP;
    } else if (STOPWORDS.contains(lower)) {
      f |= STOP;
    }
    return f;
  }

  /** A masking placeholder such as {@code [email]}: never part of a phrase. */
  static boolean isPlaceholder(String text) {
    int n = text.length();
    if (n < 3 || text.charAt(0) != '[' || text.charAt(n - 1) != ']') {
      return false;
    }
    for (int i = 1; i < n - 1; i++) {
      char c = text.charAt(i);
      if (!(c >= 'a' && c <= 'z') && c != '_' && c != '-') {
        return false;
      }
    }
    return true;
  }

  /** Lower case (root locale) with typographic apostrophes read as {@code '}. */
  static String normalise(String text) {
    return text.toLowerCase(Locale.ROOT).replace('\u2019', '\'').replace('\u2018', '\'');
  }
}
