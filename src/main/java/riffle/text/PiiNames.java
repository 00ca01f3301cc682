package riffle.text;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import riffle.model.PiiType;

/**
 * Finds names a respondent gives for themselves or for staff after a cue phrase. Rules and limits
 * are documented on {@link PiiMasker}.
 */
final class PiiNames {
  /** The cue phrases, each in a named group saying which rule applies after it. */
  static final Pattern CUE =
      Pattern.compile(
          "(?<![\\p{L}\\p{N}\\p{M}])(?:"
              + "(?<my>my\\s{1,3}name(?:\\s{1,3}is|['’]s)(?:\\s{0,3}:)?)"
              + "|(?<this>this\\s{1,3}is)"
              + "|(?<iam>i['’]m|i\\s{1,3}am|im)"
              + "|(?<other>ask\\s{1,3}for|thanks\\s{1,3}to|thank\\s{1,3}you\\s{1,3}to"
              + "|(?:spoke|speak|spoken|talked|talk|chatted)\\s{1,3}(?:to|with))"
              + ")(?![\\p{L}\\p{N}\\p{M}])",
          Pattern.CASE_INSENSITIVE);

  /** An optional greeting that may come before "I'm …" or "this is …" at the start. */
  static final Pattern GREETING =
      Pattern.compile(
          "\\s*(?:(?:hi|hello|hey|hiya|howdy|greetings|dear\\s{1,3}\\p{L}{1,30}"
              + "|good\\s{1,3}(?:morning|afternoon|evening))"
              + "(?:\\s{1,3}(?:there|all|team|everyone|folks))?[\\s,!.:;\\-–—]*)?",
          Pattern.CASE_INSENSITIVE);

  /** Cue words for the quick check that decides whether {@link #CUE} runs at all. */
  private static final String[] CUE_WORDS = {
    "name", "this", "i'm", "i’m", "i am", "im ", "ask", "thank", "spoke", "speak", "talk", "chatted"
  };

  /** Words that may follow a name given after "this is" or "I'm". */
  private static final Set<String> FOLLOWERS = Set.of("from", "here", "speaking", "again");

  /**
   * Common words that are not names even when capitalised ("This is Amazing!", "I'm Happy.", "ask
   * for Help"), nor when they follow "my name is" ("my name is not important").
   */
  static final Set<String> COMMON =
      Set.copyOf(
          Arrays.asList(
              ("a an the this that these those it its it's my our your his her their me us you"
                      + " him them i we he she they who what which why how where when there here"
                      + " and but or so as if than then because though also too very really just"
                      + " not no yes nor only still already always never ever again even quite"
                      + " of to for from in on at by with without about into onto over under"
                      + " after before between through during up down out off near"
                      + " is was are were be been being am do does did done have has had"
                      + " will would can could should shall may might must"
                      + " great good best better nice fine ok okay amazing awesome excellent"
                      + " perfect brilliant fantastic wonderful lovely super superb outstanding"
                      + " terrific incredible impressive stunning beautiful gorgeous"
                      + " bad poor terrible awful horrible worst worse disappointing ridiculous"
                      + " unacceptable annoying frustrating crazy insane rubbish useless"
                      + " happy glad sure sorry satisfied dissatisfied disappointed impressed"
                      + " delighted pleased thrilled excited grateful thankful new back right"
                      + " wrong true false correct exactly absolutely definitely totally"
                      + " completely probably hopefully honestly seriously literally actually"
                      + " basically simply truly finally first second third last next other"
                      + " another same different all none one some any every each most more less"
                      + " everything nothing something anything everyone someone anyone nobody"
                      + " everybody somebody anybody"
                      + " thanks thank please help support service customer customers team staff"
                      + " shop store company website site online coffee espresso machine"
                      + " machines grinder order delivery refund return returns price love like"
                      + " hi hello hey dear regards cheers"
                      + " monday tuesday wednesday thursday friday saturday sunday january"
                      + " february march april may june july august september october november"
                      + " december today tomorrow yesterday tonight morning afternoon evening"
                      + " irrelevant unimportant private withheld confidential secret written"
                      + " spelled spelt above below attached mentioned")
                  .split(" ")));

  private PiiNames() {}

  private enum Cue {
    MY_NAME,
    THIS_IS,
    I_AM,
    OTHER
  }

  /** Whether the text may hold a cue phrase at all (cheap; decides whether the regex runs). */
  static boolean mayContain(String text) {
    for (String w : CUE_WORDS) {
      if (PiiChars.containsIgnoreCase(text, w)) {
        return true;
      }
    }
    return false;
  }

  static void find(String text, List<PiiSpan> out) {
    Matcher m = CUE.matcher(text);
    int n = text.length();
    while (m.find()) {
      Cue cue = cueOf(m);
      int p = m.end();
      int q = p;
      while (q < n && q - p < 3 && PiiChars.isInlineSpace(text.charAt(q))) {
        q++;
      }
      if (q == p && !(cue == Cue.MY_NAME && text.charAt(p - 1) == ':')) {
        continue;
      }
      if (cue == Cue.THIS_IS && !sentenceStart(text, m.start())) {
        continue;
      }
      if (cue == Cue.I_AM && !answerStart(text, m.start())) {
        continue;
      }
      int end = nameEnd(text, q, cue);
      if (end > q) {
        out.add(new PiiSpan(PiiType.NAME, q, end));
      }
    }
  }

  private static Cue cueOf(Matcher m) {
    if (m.start("my") >= 0) {
      return Cue.MY_NAME;
    }
    if (m.start("this") >= 0) {
      return Cue.THIS_IS;
    }
    return m.start("iam") >= 0 ? Cue.I_AM : Cue.OTHER;
  }

  /** Where the one- or two-word name starting at {@code q} ends, or -1 when there is none. */
  private static int nameEnd(String text, int q, Cue cue) {
    Word w1 = Word.at(text, q);
    if (w1 == null || COMMON.contains(w1.lower)) {
      return -1;
    }
    boolean anyCase = cue == Cue.MY_NAME;
    if (!anyCase && !(w1.capitalised && w1.nameEnd - w1.start >= 2)) {
      return -1;
    }
    Word last = w1;
    if (!w1.possessive
        && w1.end < text.length()
        && PiiChars.isInlineSpace(text.charAt(w1.end))
        && (w1.end + 1 >= text.length() || !PiiChars.isInlineSpace(text.charAt(w1.end + 1)))) {
      Word w2 = Word.at(text, w1.end + 1);
      boolean lowerPair = anyCase && !w1.capitalised;
      if (w2 != null
          && !COMMON.contains(w2.lower)
          && (w2.capitalised || lowerPair)
          && w2.nameEnd - w2.start >= 2) {
        last = w2;
      }
    }
    if (cue == Cue.THIS_IS || cue == Cue.I_AM) {
      if (last.possessive || !followerOk(text, last.end)) {
        return -1; // "This is Ondalune's best machine", "I'm Priya's partner"
      }
    }
    return last.nameEnd;
  }

  /** After "this is Priya" or "I'm Priya": the end, punctuation, a symbol, or "from"/"here". */
  private static boolean followerOk(String text, int e) {
    int n = text.length();
    int f = e;
    while (f < n && PiiChars.isInlineSpace(text.charAt(f))) {
      f++;
    }
    if (f >= n) {
      return true;
    }
    char c = text.charAt(f);
    if (".,!?;:)…-–—\n\r\t\"”’".indexOf(c) >= 0) {
      return true;
    }
    int cp = text.codePointAt(f);
    int type = Character.getType(cp);
    if (type == Character.OTHER_SYMBOL || type == Character.SURROGATE) {
      return true; // an emoji
    }
    Word next = Word.at(text, f);
    return next != null && f > e && FOLLOWERS.contains(next.lower);
  }

  /** The start of the answer or of a sentence, or right after a greeting at the start. */
  private static boolean sentenceStart(String text, int s) {
    int p = s;
    while (p > 0 && Character.isWhitespace(text.charAt(p - 1))) {
      if (text.charAt(p - 1) == '\n' || text.charAt(p - 1) == '\r') {
        return true;
      }
      p--;
    }
    if (p == 0 || ".!?…".indexOf(text.charAt(p - 1)) >= 0) {
      return true;
    }
    return answerStart(text, s);
  }

  /** Nothing before {@code s} but white space and perhaps a greeting. */
  private static boolean answerStart(String text, int s) {
    return s <= 60 && GREETING.matcher(text).region(0, s).matches();
  }

  /** One word: letters and marks, with inner apostrophes or hyphens ("O'Neill", "Anne-Marie"). */
  private record Word(
      int start, int end, int nameEnd, boolean possessive, boolean capitalised, String lower) {
    static Word at(String text, int p) {
      int n = text.length();
      if (p >= n || !Character.isLetter(text.codePointAt(p))) {
        return null;
      }
      int first = text.codePointAt(p);
      int e = p + Character.charCount(first);
      boolean hasLower = false;
      while (e < n) {
        int cp = text.codePointAt(e);
        if (PiiChars.isLetterOrMark(cp)) {
          hasLower |= Character.isLowerCase(cp);
          e += Character.charCount(cp);
        } else if ((cp == '\'' || cp == '’' || cp == '-') && PiiChars.isLetterAt(text, e + 1)) {
          e++;
        } else {
          break;
        }
      }
      boolean possessive =
          e - p >= 3
              && (text.charAt(e - 1) == 's' || text.charAt(e - 1) == 'S')
              && (text.charAt(e - 2) == '\'' || text.charAt(e - 2) == '’');
      int nameEnd = possessive ? e - 2 : e;
      boolean capitalised =
          (Character.isUpperCase(first) || Character.isTitleCase(first)) && hasLower;
      String lower = text.substring(p, nameEnd).toLowerCase(Locale.ROOT);
      return new Word(p, e, nameEnd, possessive, capitalised, lower);
    }
  }
}
