package riffle.phrases;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import riffle.text.NegationCues;
import riffle.words.WordList;

/**
 * The word lists of the phrase rules and the vocabulary of one mining run: stems are interned into
 * int ids, and each distinct token text is classified once.
 *
 * <p><b>Stopwords</b> ({@link #STOPWORDS}, {@code riffle/words/en/phrase-stopwords.txt}) are the
 * English function words a phrase may contain but never start or end with: articles and
 * determiners, pronouns, forms of be, do and have, modals and their clitics ('d, 'll, 's …),
 * prepositions, conjunctions, wh-words, and the intensifiers and fillers of survey answers (very,
 * really, just, tbh, honestly …). Content words such as "less", "like", "new" or "again" are not
 * stopwords ("less waste", "like new").
 *
 * <p><b>Negation cues</b> ({@link NegationCues}) follow the text package's negation rule: not, n't,
 * never, no, without, hardly, nothing, nobody, none, nor, neither, cannot and the forms typed
 * without an apostrophe (didnt, wasnt, dont …). A cue is never part of a phrase's words; it only
 * shows in the label of the negated phrase that follows it.
 */
final class PhraseWords {
  static final int WORD = 1;
  static final int STOP = 2;
  static final int CUE = 4;

  static final Set<String> STOPWORDS = WordList.set("en", "phrase-stopwords");

  /** Auxiliaries and modals that carry a negation ("did not", "could never"). */
  static final Set<String> AUXILIARIES = WordList.set("en", "negating-auxiliaries");

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
