package riffle.quotes;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import riffle.model.PiiType;
import riffle.model.Token;
import riffle.words.WordList;

/**
 * Word lists and token tests the score uses. The lists are Riffle's own, written for buyer answers
 * about a shop (common English evaluative words), one file each under {@code riffle/words/en/};
 * they are matched on the lower-cased token as written, so inflections are listed.
 */
final class QuoteWords {
  private QuoteWords() {}

  /** First-person pronouns (the tokenizer splits "I'm" into "I" and "'m"). */
  static final Set<String> FIRST_PERSON = list("first-person");

  /** Wording that praises: the answer liked something. */
  static final Set<String> POSITIVE = list("praise-words");

  /** Wording of friction: something put the buyer off or held them back. */
  static final Set<String> NEGATIVE = list("friction-words");

  /**
   * Verbs too general to make a quote concrete ("it was good", "I got one"), and auxiliaries; a
   * negated one says nothing about friction either.
   */
  static final Set<String> LIGHT_VERBS = list("light-verbs");

  /** Words that start an explanation: a sub-headline explains why the benefit holds. */
  static final Set<String> EXPLAINING = list("explaining-words");

  /**
   * Adverbs and negation cues too general to make wording typical of a theme ("really", "not"); a
   * negated word carries its negation in its own key instead.
   */
  static final Set<String> GENERAL_ADVERBS = list("general-adverbs");

  private static Set<String> list(String name) {
    return WordList.set("en", name);
  }

  /** Lower-case form used by every list. */
  static String lower(Token t) {
    return t.text().toLowerCase(Locale.ROOT);
  }

  /** Whether the token is a word or number (not punctuation, symbols or emoji). */
  static boolean isWord(Token t) {
    String s = t.text();
    for (int i = 0; i < s.length(); ) {
      int c = s.codePointAt(i);
      if (Character.isLetterOrDigit(c)) {
        return true;
      }
      i += Character.charCount(c);
    }
    return false;
  }

  /** Whether the token is a placeholder of masked personal data, such as {@code [email]}. */
  static boolean isPlaceholder(Token t) {
    String s = t.text();
    return s.length() >= 3 && s.charAt(0) == '[' && PLACEHOLDERS.contains(s);
  }

  private static final List<String> PLACEHOLDER_LIST =
      Arrays.stream(PiiType.values()).map(PiiType::placeholder).toList();

  private static final Set<String> PLACEHOLDERS = Set.copyOf(PLACEHOLDER_LIST);

  /** Whether the text contains any placeholder of masked personal data. */
  static boolean containsPlaceholder(String text) {
    if (text.indexOf('[') < 0) {
      return false;
    }
    for (String p : PLACEHOLDER_LIST) {
      if (text.contains(p)) {
        return true;
      }
    }
    return false;
  }

  /**
   * Whether the text looks like it holds personal data the masks missed: an {@code @} (e-mail or
   * handle) or a run of 7 or more digits, possibly separated by spaces, dots, dashes, slashes or
   * brackets (the shortest phone number the masker recognises has 7 digits).
   */
  static boolean looksPersonal(String text) {
    if (text.indexOf('@') >= 0) {
      return true;
    }
    int digits = 0;
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (c >= '0' && c <= '9') {
        digits++;
        if (digits >= 7) {
          return true;
        }
      } else if (!(digits > 0 && " .-/()+".indexOf(c) >= 0 && nextIsDigit(text, i))) {
        digits = 0;
      }
    }
    return false;
  }

  private static boolean nextIsDigit(String text, int i) {
    return i + 1 < text.length() && text.charAt(i + 1) >= '0' && text.charAt(i + 1) <= '9';
  }

  /** Whether the token is content (noun, verb, adjective, adverb, number, foreign word). */
  static boolean isContent(Token t) {
    String p = t.pos();
    if (!isWord(t) || isPlaceholder(t)) {
      return false;
    }
    if (p.startsWith("VB") || p.equals("MD")) {
      return !LIGHT_VERBS.contains(lower(t));
    }
    if (p.startsWith("RB")) {
      return !GENERAL_ADVERBS.contains(lower(t));
    }
    return p.startsWith("NN")
        || p.startsWith("JJ")
        || p.equals("CD")
        || p.equals("FW")
        || p.equals("UH");
  }
}
