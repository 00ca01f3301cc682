package riffle.text;

import java.util.Locale;
import java.util.Objects;
import java.util.Set;
import riffle.words.WordList;

/**
 * Marks the tokens of a sentence that a negation governs, so that "did not arrive on time" is not
 * counted as evidence for "arrived on time".
 *
 * <p>Input is one sentence (or answer) as OpenNLP's English tokenizer (1.5 model) splits it, with
 * the Penn Treebank tags of the 1.5 maxent tagger. Cues are recognised by their spelling, never by
 * their tag: the tagger tags "NOT" as {@code NNP} and "dont" as {@code JJ}. Tags only decide the
 * few ambiguous words named below, and a missing tag ({@code null}) counts as unknown.
 *
 * <h2>Cues</h2>
 *
 * Case-insensitive, with {@code ’ ‘ ` ´ ʼ} read as an apostrophe and "n;t" as "n't":
 *
 * <ul>
 *   <li>words: not, n't, 'nt, never, no, without, hardly, nothing, nobody, none, nor, neither,
 *       cannot, noone, no-one;
 *   <li>negated auxiliaries the tokenizer leaves whole: any token ending in "n't" ("Won't") or
 *       "'nt" ("did'nt"), and "n`" followed by a token "t" (how "didn`t" is split);
 *   <li>the forms typed without an apostrophe: didnt, doesnt, dont, isnt, wasnt, arent, werent,
 *       havent, hasnt, hadnt, cant, couldnt, wouldnt, shouldnt, wont, aint, mustnt, neednt, shant.
 *       "wont" is also a rare noun and adjective ("as is his wont", "wont to complain"): it is no
 *       cue after a possessive (my, his, her, its, our, your, their, or a {@code PRP$} tag) or
 *       before "to". "cant" as a noun is too rare in answers to except.
 * </ul>
 *
 * Exceptions:
 *
 * <ul>
 *   <li>"no" as an answer word is no cue: when it ends the sentence or is followed by punctuation,
 *       a pronoun (I, you, he, she, it, we, they, there, my, ...), a verb or modal ({@code VB*},
 *       {@code MD}), a wh-word, an interjection, "thanks", or "this"/"that" plus a verb. "No, it
 *       was fine" and "No it was fine" negate nothing; "no delivery date shown" is a determiner and
 *       negates "delivery date shown".
 *   <li>"not", "n't" and the apostrophe-less forms followed by "only", "just" or "merely" are
 *       additive ("not only cheap but also reliable", "isn't just loud, it also jams") and no cue.
 * </ul>
 *
 * <h2>Scope</h2>
 *
 * A cue's scope starts at the token after it and runs to the end of its clause. The cue itself is
 * never marked, nor is a cue inside another cue's scope (its own scope still applies), nor a token
 * without a letter or digit (brackets, quotes, symbols). The scope stops before, and does not mark:
 *
 * <ul>
 *   <li>a punctuation token made of . , ; : ! ? … or dashes (- – — ‒ ―, "--", "..."). Brackets and
 *       quotes do not stop it: "not (as promised) free" negates "as promised free";
 *   <li>"but", "although", "though", "however", "because", "whereas", "unless";
 *   <li>"yet", unless it comes right after the cue ("not yet arrived") or ends the clause ("haven't
 *       tried it yet", "no refund yet and I am still waiting");
 *   <li>"so", unless an adjective or adverb follows ("not so good", "not so much");
 *   <li>"and", "or", "&amp;", "plus" when a new clause follows: a subject pronoun (I, you, he, she,
 *       it, we, they, there), a finite verb or modal ({@code VBD VBZ VBP MD}: "did not arrive and
 *       was scratched"), or a noun phrase of up to six tokens followed by one ("and the box was
 *       dented"), optionally after one adverb ("and then it broke"). A base-form verb or a bare
 *       noun phrase continues the scope: "did not clean and descale it", "no manual and no tamper".
 * </ul>
 *
 * The tokenizer sometimes leaves punctuation attached to a word ("No," at the start of an answer,
 * "great...not"): a token ending in , ; : ! ? . or … ends the scope after itself, and a token with
 * , ; ! ? "..", or … inside it ends the scope at itself, its last part being checked as a cue.
 *
 * <p>"without" is a preposition, so its scope is only the noun or gerund phrase after it: it also
 * stops before a subject pronoun (I, he, she, we, they; you, it or there when a finite verb or
 * modal follows), a finite verb or modal, and a relative or wh-word ({@code WDT WP WP$ WRB}, or
 * which, who, whom, whose, where, when). "without a warranty I would not have ordered" negates "a
 * warranty", then "have ordered" through the second cue.
 *
 * <h2>Known limits</h2>
 *
 * <ul>
 *   <li>Double negation is not resolved: "not without problems" and "can't say I wasn't happy" mark
 *       the words as negated, however many cues govern them.
 *   <li>The scope only runs forward: an object cue negates nothing before it ("the seller said
 *       nothing" leaves "said" unmarked), and a cue followed by a comma negates nothing ("Not
 *       really, the grinder jams" leaves "really" unmarked only because the comma comes first).
 *   <li>Commas in lists end the scope: in "did not like the grinder, the frother or the tamper"
 *       only "like the grinder" is negated.
 *   <li>Subordinate clauses stay inside the scope ("didn't know if it would fit" negates "know if
 *       it would fit", "wasnt sure it would fit" negates "sure it would fit"), as do
 *       negative-polarity words ("hardly ever used it", "not at all", "no longer works"): they are
 *       marked like any other word.
 *   <li>"hardly" is treated as a full negation. "barely", "scarcely", "rarely", "seldom", "few",
 *       "little", "nowhere", and negative words such as "missing", "lack" or "fail" are no cues
 *       ("barely used" is praise for a refurbished machine).
 *   <li>Questions and sarcasm are read literally: "why didn't anyone tell me?" negates "anyone tell
 *       me", and "that was NOT annoying at all" negates "annoying".
 *   <li>"not just" meaning "not simply" ("it doesn't just work") is read as additive.
 *   <li>Ambiguous words decided by tags inherit the tagger's mistakes (a verb tagged as a noun
 *       after "and" keeps the scope open).
 * </ul>
 *
 * <p>Size: one class because cues, scope ends and the few tag-decided words are one left-to-right
 * pass over a sentence; its word lists are in {@code riffle/words/en/negation-*.txt}.
 */
final class NegationScope {

  private static final Set<String> CUES = NegationCues.WORDS;

  private static final Set<String> APOSTROPHE_LESS = NegationCues.APOSTROPHE_LESS;

  private static final Set<String> ADDITIVE = WordList.set("en", "negation-additive");

  private static final Set<String> CLAUSE_BREAKERS = WordList.set("en", "negation-clause-breakers");

  private static final Set<String> COORDINATORS = WordList.set("en", "negation-coordinators");

  private static final Set<String> SUBJECT_PRONOUNS =
      WordList.set("en", "negation-subject-pronouns");

  /** Subject pronouns that are never objects, so they always start a clause after "without". */
  private static final Set<String> UNAMBIGUOUS_SUBJECTS =
      WordList.set("en", "negation-unambiguous-subjects");

  private static final Set<String> POSSESSIVES = WordList.set("en", "negation-possessives");

  private static final Set<String> ANSWER_FOLLOWERS =
      WordList.set("en", "negation-answer-followers");

  private static final Set<String> ANSWER_FOLLOWER_TAGS = Set.of("MD", "PRP", "PRP$", "EX", "UH");

  private static final Set<String> WH_WORDS = WordList.set("en", "negation-wh-words");

  private static final Set<String> CLAUSE_ADVERBS = WordList.set("en", "negation-clause-adverbs");

  private static final Set<String> FINITE_VERB_TAGS = Set.of("VBD", "VBZ", "VBP", "MD");

  private static final Set<String> NOUN_PHRASE_TAGS = Set.of("DT", "PDT", "PRP$", "CD", "POS");

  private static final Set<String> WH_TAGS = Set.of("WDT", "WP", "WP$", "WRB");

  private static final String PUNCTUATION = ".,;:!?…-–—‒―";

  private static final String TRAILING_BREAKS = ".,;:!?…";

  private static final int NOUN_PHRASE_LOOKAHEAD = 6;

  private final String[] tokens;

  /** The tokens lower-cased, without punctuation stuck to their end, for word comparisons. */
  private final String[] words;

  private final String[] tags;
  private final boolean[] cue;

  private NegationScope(String[] tokens, String[] pennTags) {
    int n = tokens.length;
    this.tokens = new String[n];
    this.words = new String[n];
    this.tags = new String[n];
    for (int i = 0; i < n; i++) {
      this.tokens[i] = repairApostrophes(Objects.requireNonNull(tokens[i], "token"));
      words[i] = stripTrailingBreaks(this.tokens[i]).toLowerCase(Locale.ROOT);
      tags[i] = pennTags[i] == null ? "" : pennTags[i];
    }
    this.cue = new boolean[n];
  }

  /**
   * Marks the negated tokens of one sentence.
   *
   * @param tokens the tokens, as OpenNLP's English tokenizer produces them
   * @param pennTags their Penn Treebank tags, same length (an element may be null when unknown)
   * @return for each token, whether a negation cue governs it
   * @throws IllegalArgumentException when the arrays differ in length
   */
  static boolean[] mark(String[] tokens, String[] pennTags) {
    Objects.requireNonNull(tokens, "tokens");
    Objects.requireNonNull(pennTags, "pennTags");
    if (tokens.length != pennTags.length) {
      throw new IllegalArgumentException(
          tokens.length + " tokens but " + pennTags.length + " tags; give one tag per token");
    }
    return new NegationScope(tokens, pennTags).mark();
  }

  private boolean[] mark() {
    int n = tokens.length;
    int[] scopeStart = new int[n];
    for (int i = 0; i < n; i++) {
      scopeStart[i] = -1;
      if (cue[i]) {
        continue; // second half of a split "n` t"
      }
      if (isSplitApostropheCue(i)) {
        cue[i] = true;
        cue[i + 1] = true;
        scopeStart[i] = trailingBreak(i + 1) ? -1 : i + 2;
      } else if (isCue(i)) {
        cue[i] = true;
        scopeStart[i] = trailingBreak(i) ? -1 : i + 1;
      }
    }
    boolean[] negated = new boolean[n];
    for (int i = 0; i < n; i++) {
      if (scopeStart[i] < 0) {
        continue;
      }
      boolean phrase = "without".equals(cueWord(i));
      for (int j = scopeStart[i]; j < n; j++) {
        if (stopsBefore(j, j == scopeStart[i]) || (phrase && phraseStopsBefore(j))) {
          break;
        }
        if (!cue[j] && hasLetterOrDigit(tokens[j])) {
          negated[j] = true;
        }
        if (trailingBreak(j) || internalBreak(j) >= 0) {
          break;
        }
      }
    }
    return negated;
  }

  private boolean isCue(int i) {
    String w = cueWord(i);
    if (w.isEmpty()) {
      return false;
    }
    if ("no".equals(w)) {
      return !isAnswerNo(i);
    }
    boolean notFamily =
        "not".equals(w)
            || "n't".equals(w)
            || APOSTROPHE_LESS.contains(w)
            || (w.length() > 3 && (w.endsWith("n't") || w.endsWith("'nt")));
    if (notFamily) {
      if (i + 1 < words.length && ADDITIVE.contains(words[i + 1])) {
        return false;
      }
      if ("wont".equals(w)) {
        return !isNounWont(i);
      }
      return true;
    }
    return CUES.contains(w);
  }

  private boolean isSplitApostropheCue(int i) {
    return i + 1 < words.length && "n'".equals(words[i]) && "t".equals(words[i + 1]);
  }

  /** "No" answering a question rather than determining a noun. */
  private boolean isAnswerNo(int i) {
    int next = i + 1;
    if (next >= words.length || isPunctuation(next)) {
      return true;
    }
    String w = words[next];
    String tag = tags[next];
    if (SUBJECT_PRONOUNS.contains(w)
        || POSSESSIVES.contains(w)
        || ANSWER_FOLLOWERS.contains(w)
        || WH_WORDS.contains(w)) {
      return true;
    }
    if (tag.startsWith("VB") || ANSWER_FOLLOWER_TAGS.contains(tag) || WH_TAGS.contains(tag)) {
      return true;
    }
    if (("this".equals(w) || "that".equals(w)) && next + 1 < words.length) {
      return tags[next + 1].startsWith("VB")
          || "MD".equals(tags[next + 1])
          || words[next + 1].startsWith("'");
    }
    return false;
  }

  private boolean isNounWont(int i) {
    boolean afterPossessive =
        i > 0 && (POSSESSIVES.contains(words[i - 1]) || "PRP$".equals(tags[i - 1]));
    boolean beforeTo = i + 1 < words.length && "to".equals(words[i + 1]);
    return afterPossessive || beforeTo;
  }

  private boolean stopsBefore(int j, boolean first) {
    if (isPunctuation(j)) {
      return true;
    }
    String w = words[j];
    if (CLAUSE_BREAKERS.contains(w)) {
      return true;
    }
    int next = j + 1;
    boolean last = next >= words.length;
    if ("yet".equals(w)) {
      boolean endsClause = last || trailingBreak(j) || stopsBefore(next, false);
      return !first && !endsClause;
    }
    if ("so".equals(w)) {
      return !last && !(tags[next].startsWith("JJ") || tags[next].startsWith("RB"));
    }
    if (COORDINATORS.contains(w)) {
      return startsClause(next);
    }
    return false;
  }

  /** Whether a new clause (subject, or finite verb of a new predicate) starts at {@code k}. */
  private boolean startsClause(int k) {
    if (k < words.length && (CLAUSE_ADVERBS.contains(words[k]) || tags[k].startsWith("RB"))) {
      k++;
    }
    if (k >= words.length) {
      return false;
    }
    if (SUBJECT_PRONOUNS.contains(words[k]) || FINITE_VERB_TAGS.contains(tags[k])) {
      return true;
    }
    int end = k;
    while (end < words.length && end - k < NOUN_PHRASE_LOOKAHEAD && isNounPhraseTag(tags[end])) {
      end++;
    }
    return end > k && end < words.length && FINITE_VERB_TAGS.contains(tags[end]);
  }

  /** Where the noun or gerund phrase after "without" ends. */
  private boolean phraseStopsBefore(int j) {
    String w = words[j];
    if (UNAMBIGUOUS_SUBJECTS.contains(w)) {
      return true;
    }
    if (SUBJECT_PRONOUNS.contains(w)
        && j + 1 < words.length
        && FINITE_VERB_TAGS.contains(tags[j + 1])) {
      return true;
    }
    return FINITE_VERB_TAGS.contains(tags[j]) || WH_TAGS.contains(tags[j]) || WH_WORDS.contains(w);
  }

  private static boolean isNounPhraseTag(String tag) {
    return NOUN_PHRASE_TAGS.contains(tag) || tag.startsWith("JJ") || tag.startsWith("NN");
  }

  /** A token made only of clause-ending punctuation or dashes. */
  private boolean isPunctuation(int j) {
    String t = tokens[j];
    if (t.isEmpty()) {
      return false;
    }
    for (int c = 0; c < t.length(); c++) {
      if (PUNCTUATION.indexOf(t.charAt(c)) < 0) {
        return false;
      }
    }
    return true;
  }

  /** A word with clause-ending punctuation stuck to its end ("No,", "fine."). */
  private boolean trailingBreak(int j) {
    String t = tokens[j];
    return t.length() > 1
        && TRAILING_BREAKS.indexOf(t.charAt(t.length() - 1)) >= 0
        && hasLetter(t)
        && !isPunctuation(j);
  }

  /**
   * The index just after the last clause break inside a word ("great...not", "fine,but"), or -1. A
   * single full stop inside a word ("e.g", "3.5") and a colon ("10:30") are not breaks.
   */
  private int internalBreak(int j) {
    String t = stripTrailingBreaks(tokens[j]);
    if (!hasLetter(t)) {
      return -1;
    }
    int after = -1;
    for (int c = 1; c < t.length() - 1; c++) {
      char ch = t.charAt(c);
      boolean isBreak =
          ",;!?…".indexOf(ch) >= 0
              || (ch == '.' && (t.charAt(c - 1) == '.' || t.charAt(c + 1) == '.'));
      if (isBreak) {
        after = c + 1;
      }
    }
    return after;
  }

  /** The part of a token that can be a cue: after any inner break, without trailing breaks. */
  private String cueWord(int i) {
    String w = stripTrailingBreaks(tokens[i]);
    int after = internalBreak(i);
    return (after >= 0 ? w.substring(after) : w).toLowerCase(Locale.ROOT);
  }

  private static String stripTrailingBreaks(String t) {
    int end = t.length();
    while (end > 1 && TRAILING_BREAKS.indexOf(t.charAt(end - 1)) >= 0) {
      end--;
    }
    return t.substring(0, end);
  }

  private static boolean hasLetterOrDigit(String t) {
    for (int c = 0; c < t.length(); c++) {
      if (Character.isLetterOrDigit(t.charAt(c))) {
        return true;
      }
    }
    return false;
  }

  private static boolean hasLetter(String t) {
    for (int c = 0; c < t.length(); c++) {
      if (Character.isLetter(t.charAt(c))) {
        return true;
      }
    }
    return false;
  }

  /** Reads typographic and mistyped apostrophes as {@code '}, and "n;t" as "n't". */
  private static String repairApostrophes(String token) {
    StringBuilder out = new StringBuilder(token.length());
    for (int c = 0; c < token.length(); c++) {
      char ch = token.charAt(c);
      out.append("’‘`´ʼ′".indexOf(ch) >= 0 ? '\'' : ch);
    }
    int n = out.length();
    if (n >= 3
        && (out.charAt(n - 3) == 'n' || out.charAt(n - 3) == 'N')
        && out.charAt(n - 2) == ';'
        && (out.charAt(n - 1) == 't' || out.charAt(n - 1) == 'T')) {
      out.setCharAt(n - 2, '\'');
    }
    return out.toString();
  }
}
