package riffle.text;

import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import riffle.model.PiiType;

/**
 * Finds names a respondent gives for themselves or for staff after a cue phrase, or alone on the
 * last line as a sign-off. Rules and limits are documented on {@link PiiMasker}: names after "my
 * name is" and "name:" are taken in any case; after every other cue the words must be capitalised
 * and {@link PiiNameCheck} must read them as a proper noun that is no product, brand or place.
 *
 * <p>Size: one class because every cue, the sign-off line and the proper-noun check share the one
 * walk over an answer's tokens and its bookkeeping of what is already masked.
 */
final class PiiNames {
  /** The cue phrases, each in a named group saying which rule applies after it. */
  static final Pattern CUE =
      Pattern.compile(
          "(?<![\\p{L}\\p{N}\\p{M}])(?:"
              + "(?<my>my\\s{1,3}(?:full\\s{1,3})?name(?:\\s{1,3}is|['’]s)(?:\\s{0,3}:)?"
              + "|(?:(?:full|first|last|sur)\\s{0,3})?name\\s{0,3}[:=]"
              + "|ich\\s{1,3}hei(?:ß|ss)e|me\\s{1,3}llamo|mi\\s{1,3}chiamo|je\\s{1,3}m['’]appelle"
              + "|mijn\\s{1,3}naam\\s{1,3}is|ik\\s{1,3}heet)"
              + "|(?<other>ask\\s{1,3}for|thanks\\s{1,3}to|thank\\s{1,3}you\\s{1,3}to|c/o|care\\s{1,3}of"
              + "|(?:spoke|speak|spoken|talked|talk|chatted)\\s{1,3}(?:to|with)"
              + "|(?:kudos|props)\\s{1,3}to|shout\\s{0,3}-?\\s{0,3}outs?\\s{1,3}to"
              + "|(?:helped|served)\\s{1,3}by)"
              + "|(?<call>call\\s{1,3}me)"
              + "|(?<thanks>many\\s{1,3}thanks|thanks(?:\\s{1,3}(?:again|so\\s{1,3}much|a\\s{1,3}lot))?"
              + "|thank\\s{1,3}you(?:\\s{1,3}(?:again|so\\s{1,3}much))?|thx)"
              + "|(?<sign>(?:(?:kind|kindest|best|warm|warmest|many)\\s{1,3})?regards|signed|cheers(?:\\s{1,3}(?:mate|all|guys|folks|everyone|again))?"
              + "|best(?:\\s{1,3}wishes)?|(?:yours\\s{1,3})?sincerely|yours(?:\\s{1,3}truly)?|love"
              + "|mit\\s{1,3}freundlichen\\s{1,3}gr(?:ü|ue)(?:ß|ss)en|(?:viele|liebe|beste)\\s{1,3}gr(?:ü|ue)(?:ß|ss)e"
              + "|gru(?:ß|ss)|cordialement|(?:un\\s{1,3})?saludos?|(?:cordiali\\s{1,3})?saluti"
              + "|met\\s{1,3}vriendelijke\\s{1,3}groet(?:en)?|groet(?:en|jes)?)"
              + "|(?<this>this\\s{1,3}is|it['’]s|it\\s{1,3}is)"
              + "|(?<iam>i['’]m|i\\s{1,3}am|im)"
              + ")(?![\\p{L}\\p{N}\\p{M}])",
          Pattern.CASE_INSENSITIVE);

  /** An optional greeting that may come before "I'm …" or "this is …" at the start. */
  static final Pattern GREETING =
      Pattern.compile(
          "\\s*(?:(?:hi|hello|hey|hiya|howdy|greetings|dear\\s{1,3}\\p{L}{1,30}"
              + "|good\\s{1,3}(?:morning|afternoon|evening))"
              + "(?:\\s{1,3}(?:there|all|team|everyone|folks))?[\\s,!.:;\\-–—]*)?",
          Pattern.CASE_INSENSITIVE);

  /** Words that may follow a name given after "this is" or "I'm". */
  private static final Set<String> FOLLOWERS = Set.of("from", "here", "speaking", "again", "and");

  /** Words that may follow a name in a sign-off ("Cheers, Rhiannon x"). */
  private static final Set<String> SIGN_OFF_FOLLOWERS = Set.of("from", "here", "x", "xx", "xxx");

  /** Words that may follow a name after "thanks" ("Thanks Jonas for sorting it"). */
  private static final Set<String> THANKS_FOLLOWERS =
      Set.of("from", "here", "again", "for", "and", "so", "x", "xx");

  /** Words that may follow a name after "call me" ("call me Jo if it breaks"). */
  private static final Set<String> CALL_FOLLOWERS =
      Set.of("from", "here", "if", "and", "or", "when", "please", "anytime");

  /** Product, brand and shop words before "name:" that make it no person's name. */
  private static final Set<String> THING_NAMES =
      Set.of(
          "product",
          "brand",
          "model",
          "shop",
          "store",
          "company",
          "item",
          "file",
          "business",
          "trade",
          "domain",
          "wifi",
          "network",
          "machine",
          "code",
          "user",
          "screen");

  /** Names longer than this many words are not taken. */
  static final int MAX_WORDS = 3;

  private PiiNames() {}

  private enum Cue {
    MY_NAME,
    OTHER,
    CALL_ME,
    THANKS,
    SIGN_OFF,
    THIS_IS,
    I_AM,
    LAST_LINE
  }

  /**
   * Adds the names found after cues (when {@code cues} says the answer holds a cue word) and on a
   * sign-off last line, then every other place in the answer where the same name words stand.
   */
  static void find(String text, boolean cues, boolean lineBreak, List<PiiSpan> out) {
    if (!cues && !lineBreak) {
      return;
    }
    int before = out.size();
    Checks checks = new Checks(text);
    if (cues) {
      Matcher m = CUE.matcher(text);
      while (m.find()) {
        Cue cue = cueOf(m);
        int q = afterCue(text, m.end(), cue);
        if (q < 0 || !placeOk(text, m.start(), cue)) {
          continue;
        }
        if (cue == Cue.MY_NAME && thingBefore(text, m.start())) {
          continue;
        }
        name(text, m.start(), q, cue, checks, out);
      }
    }
    if (lineBreak) {
      lastLine(text, checks, out);
    }
    if (out.size() > before) {
      propagate(text, before, out);
    }
  }

  private static Cue cueOf(Matcher m) {
    if (m.start("my") >= 0) {
      return Cue.MY_NAME;
    }
    if (m.start("other") >= 0) {
      return Cue.OTHER;
    }
    if (m.start("call") >= 0) {
      return Cue.CALL_ME;
    }
    if (m.start("thanks") >= 0) {
      return Cue.THANKS;
    }
    if (m.start("sign") >= 0) {
      return Cue.SIGN_OFF;
    }
    return m.start("this") >= 0 ? Cue.THIS_IS : Cue.I_AM;
  }

  /**
   * Where the name may start after a cue ending at {@code p}, or -1. Sign-offs need a comma, dash,
   * colon or line break after them ("Regards, Jonas"); "thanks" may take a comma, dash or nothing;
   * the other cues one to three spaces (or "my name is:" a colon).
   */
  private static int afterCue(String text, int p, Cue cue) {
    int n = text.length();
    int q = p;
    boolean separator = false;
    boolean lineBreak = false;
    while (q < n && q - p < 6) {
      char c = text.charAt(q);
      if (PiiChars.isInlineSpace(c) || c == '\t') {
        q++;
      } else if (c == '\n' || c == '\r') {
        lineBreak = true;
        q++;
      } else if ((c == ',' || c == '-' || c == '–' || c == '—' || c == ':' || c == '!')
          && !separator
          && (cue == Cue.SIGN_OFF || cue == Cue.THANKS)) {
        separator = true;
        q++;
      } else {
        break;
      }
    }
    char last = text.charAt(p - 1);
    if (q == p && !(cue == Cue.MY_NAME && (last == ':' || last == '='))) {
      return -1;
    }
    if (cue == Cue.SIGN_OFF && !separator && !lineBreak) {
      return -1;
    }
    if (lineBreak && cue != Cue.SIGN_OFF && cue != Cue.THANKS) {
      return -1;
    }
    return q;
  }

  /** Where a cue may stand: sign-offs, "this is" and "I'm" at a sentence's or line's start. */
  private static boolean placeOk(String text, int s, Cue cue) {
    return switch (cue) {
      case SIGN_OFF, I_AM -> sentenceStart(text, s);
      case THIS_IS -> {
        boolean itIs = Character.toLowerCase(text.charAt(s)) == 'i';
        yield itIs ? greetingBefore(text, s) : sentenceStart(text, s);
      }
      default -> true;
    };
  }

  /** "product name:", "brand name:": the word before "name" names a thing. */
  private static boolean thingBefore(String text, int s) {
    int e = s;
    while (e > 0 && PiiChars.isInlineSpace(text.charAt(e - 1))) {
      e--;
    }
    int b = e;
    while (b > 0 && Character.isLetter(text.charAt(b - 1))) {
      b--;
    }
    return b < e && THING_NAMES.contains(text.substring(b, e).toLowerCase(Locale.ROOT));
  }

  /** The candidate words of a name starting at {@code q}. */
  private static final class Candidate {
    final int[] starts = new int[MAX_WORDS * 2 + 1];
    final int[] ends = new int[MAX_WORDS * 2 + 1];
    final boolean[] particle = new boolean[MAX_WORDS * 2 + 1];
    int count;
    boolean possessive;

    int end() {
      return ends[count - 1];
    }
  }

  /**
   * The name words from {@code q}: an optional title (stays readable), then up to three words
   * joined by single spaces, with particles between; every word capitalised, or, after "my name
   * is", all in the first word's case. A common word ends the name; a possessive ends it after its
   * word.
   */
  private static Candidate words(String text, int q, boolean anyCase) {
    Word first = Word.at(text, q);
    if (first != null && PiiLexicon.TITLES.contains(first.lower) && !first.possessive) {
      int p = first.end;
      if (p < text.length() && text.charAt(p) == '.') {
        p++;
      }
      if (p < text.length() && PiiChars.isInlineSpace(text.charAt(p))) {
        first = Word.at(text, p + 1);
      } else {
        return null;
      }
    }
    if (first == null || PiiLexicon.NOT_NAMES.contains(first.lower)) {
      return null;
    }
    boolean lower = anyCase && !first.capitalised && !first.initial;
    if (!lower && !(first.capitalised || first.initial)) {
      return null;
    }
    if (!first.initial && first.nameEnd - first.start < 2) {
      return null;
    }
    Candidate c = new Candidate();
    add(c, first, false);
    int names = 1;
    Word w = first;
    while (names < MAX_WORDS && !w.possessive) {
      int p = w.end;
      if (p + 1 >= text.length()
          || !PiiChars.isInlineSpace(text.charAt(p))
          || PiiChars.isInlineSpace(text.charAt(p + 1))) {
        break;
      }
      Word next = Word.at(text, p + 1);
      if (next == null) {
        break;
      }
      if (PiiLexicon.PARTICLES.contains(next.lower) && !next.capitalised && !lower) {
        Word after = particleRun(text, next, c);
        if (after == null) {
          break;
        }
        next = after;
      }
      boolean shape =
          lower
              ? !next.capitalised && next.nameEnd - next.start >= 2
              : (next.capitalised && next.nameEnd - next.start >= 2) || next.initial;
      if (!shape || PiiLexicon.NOT_NAMES.contains(next.lower)) {
        // particles taken for this word go back
        while (c.count > 0 && c.particle[c.count - 1]) {
          c.count--;
        }
        break;
      }
      add(c, next, false);
      names++;
      w = next;
    }
    c.possessive = w.possessive;
    return c;
  }

  /** Adds the particles from {@code p} on; returns the word after them, or null. */
  private static Word particleRun(String text, Word p, Candidate c) {
    Word w = p;
    int taken = 0;
    while (w != null && PiiLexicon.PARTICLES.contains(w.lower) && !w.capitalised && taken < 3) {
      add(c, w, true);
      taken++;
      int e = w.end;
      if (e + 1 >= text.length() || !PiiChars.isInlineSpace(text.charAt(e))) {
        return null;
      }
      w = Word.at(text, e + 1);
    }
    return w;
  }

  private static void add(Candidate c, Word w, boolean particle) {
    c.starts[c.count] = w.start;
    c.ends[c.count] = w.nameEnd;
    c.particle[c.count] = particle;
    c.count++;
  }

  /** Checks and adds the name after one cue. */
  private static void name(
      String text, int context, int q, Cue cue, Checks checks, List<PiiSpan> out) {
    Candidate c = words(text, q, cue == Cue.MY_NAME);
    if (c == null) {
      return;
    }
    Set<String> followers =
        switch (cue) {
          case THIS_IS, I_AM -> FOLLOWERS;
          case SIGN_OFF, LAST_LINE -> SIGN_OFF_FOLLOWERS;
          case THANKS -> THANKS_FOLLOWERS;
          case CALL_ME -> CALL_FOLLOWERS;
          default -> null;
        };
    if (followers != null
        && (c.possessive && cue != Cue.THANKS || !followerOk(text, c.end(), followers))) {
      return; // "This is Ondalune's best machine", "I'm Priya's partner"
    }
    int count = c.count;
    if (cue != Cue.MY_NAME) {
      count = checks.confirm(context, c, cue);
      if (count == 0 || (followers != null && count < c.count)) {
        return;
      }
    }
    int s = c.starts[0];
    int e = c.ends[count - 1];
    if (checks.usedAsThingElsewhere(s, e, c, count)) {
      return;
    }
    out.add(new PiiSpan(PiiType.NAME, s, e));
    int and = andAfter(text, e);
    if (and > 0 && cue != Cue.I_AM && cue != Cue.THIS_IS) {
      name(text, context, and, cue == Cue.MY_NAME ? Cue.OTHER : cue, checks, out);
    }
  }

  /** Where a second name starts after "Lars and Birgit" or "Lars & Birgit", or -1. */
  private static int andAfter(String text, int e) {
    for (String joint : new String[] {" and ", " & "}) {
      if (text.startsWith(joint, e)) {
        return e + joint.length();
      }
    }
    return -1;
  }

  /**
   * The tagger checks of one answer, remembered by their words so that a name repeated many times
   * is checked once, and bounded: after {@value #PARSES} sentence parses an answer's further
   * candidates are judged by the tagger's dictionary alone.
   */
  private static final class Checks {
    /** Sentence parses allowed per answer. */
    static final int PARSES = 24;

    /** Other places of a word looked at for product, brand or place use. */
    static final int PLACES = 6;

    final String text;
    final java.util.Map<String, Integer> confirmed = new java.util.HashMap<>(4);
    final java.util.Map<String, Boolean> things = new java.util.HashMap<>(4);
    int parses;

    Checks(String text) {
      this.text = text;
    }

    int confirm(int context, Candidate c, Cue cue) {
      String key = cue.name() + '\u0000' + text.substring(c.starts[0], c.end());
      Integer known = confirmed.get(key);
      if (known == null) {
        boolean parse = parses < PARSES;
        parses += parse ? 1 : 0;
        known = PiiNameCheck.confirm(text, context, c.starts, c.ends, c.particle, c.count, parse);
        confirmed.put(key, known);
      }
      return known;
    }

    /** Whether a word of the name is used as a product, brand or place elsewhere in the answer. */
    boolean usedAsThingElsewhere(int s, int e, Candidate c, int count) {
      for (int k = 0; k < count; k++) {
        if (c.particle[k] || c.ends[k] - c.starts[k] < 2) {
          continue;
        }
        String word = text.substring(c.starts[k], c.ends[k]);
        Boolean thing = things.get(word);
        if (thing == null) {
          thing = usedAsThing(word, s, e);
          things.put(word, thing);
        }
        if (thing) {
          return true;
        }
      }
      return false;
    }

    private boolean usedAsThing(String word, int s, int e) {
      if (inDomain(word)) {
        return true; // "Thanks Ondalune! … ondalune.example"
      }
      int from = 0;
      int at;
      int looked = 0;
      while ((at = text.indexOf(word, from)) >= 0 && looked < PLACES) {
        from = at + 1;
        int end = at + word.length();
        if ((at >= s && at < e) || !wholeWord(text, at, end)) {
          continue;
        }
        looked++;
        boolean parse = parses < PARSES;
        parses += parse ? 1 : 0;
        if (PiiNameCheck.usedAsThing(text, at, end, parse)) {
          return true;
        }
      }
      return false;
    }

    /**
     * Whether the word stands, in any case, as a label of a host name ("ondalune.example", "…@
     * ondalune.example"), not as the local part of an e-mail address ("priya.shah@…").
     */
    private boolean inDomain(String word) {
      String lower = word.toLowerCase(Locale.ROOT) + ".";
      int at = -1;
      while ((at = PiiChars.indexOfIgnoreCase(text, lower, at + 1, text.length())) >= 0) {
        int after = at + lower.length();
        char before = at > 0 ? text.charAt(at - 1) : ' ';
        if (Character.isLetterOrDigit(before) || !PiiChars.isLetterAt(text, after)) {
          continue;
        }
        int tokenEnd = after;
        while (tokenEnd < text.length() && !Character.isWhitespace(text.charAt(tokenEnd))) {
          tokenEnd++;
        }
        if (text.indexOf('@', after) < 0 || text.indexOf('@', after) >= tokenEnd) {
          return true;
        }
      }
      return false;
    }
  }

  private static boolean wholeWord(String text, int s, int e) {
    return !PiiChars.isWordCharBefore(text, s) && !PiiChars.isWordCharAt(text, e);
  }

  /** A last line that is only a name: "— Jonas Berg", "From Priya", "J. Berg". */
  private static void lastLine(String text, Checks checks, List<PiiSpan> out) {
    int e = text.length();
    while (e > 0 && Character.isWhitespace(text.charAt(e - 1))) {
      e--;
    }
    int s = e;
    while (s > 0 && !isLineBreak(text.charAt(s - 1))) {
      s--;
    }
    if (s == 0) {
      return; // a single line: no sign-off line
    }
    int q = s;
    while (q < e
        && (Character.isWhitespace(text.charAt(q)) || "-–—~".indexOf(text.charAt(q)) >= 0)) {
      q++;
    }
    if (text.regionMatches(true, q, "from ", 0, 5)) {
      q += 5;
    }
    Candidate c = words(text, q, false);
    if (c == null) {
      return;
    }
    int tail = c.end();
    while (tail < e
        && (".!,".indexOf(text.charAt(tail)) >= 0 || Character.isWhitespace(text.charAt(tail)))) {
      tail++;
    }
    while (tail < e && (text.charAt(tail) == 'x' || text.charAt(tail) == 'X')) {
      tail++; // "Rhiannon x"
    }
    while (tail < e) {
      int type = Character.getType(text.codePointAt(tail));
      if (type != Character.OTHER_SYMBOL
          && !Character.isSurrogate(text.charAt(tail))
          && !Character.isWhitespace(text.charAt(tail))) {
        return; // more than a name on the line
      }
      tail++;
    }
    int count = checks.confirm(c.starts[0], c, Cue.LAST_LINE);
    if (count < c.count) {
      return;
    }
    int ns = c.starts[0];
    int ne = c.end();
    if (!checks.usedAsThingElsewhere(ns, ne, c, count)) {
      out.add(new PiiSpan(PiiType.NAME, ns, ne));
    }
  }

  /**
   * Masks the words of each name found (from index {@code from} of {@code out}) wherever else they
   * stand in the answer, as whole words written the same way: "Thanks to Marta! Marta sorted it".
   */
  private static void propagate(String text, int from, List<PiiSpan> out) {
    int found = out.size();
    Set<String> done = new java.util.HashSet<>();
    for (int i = from; i < found; i++) {
      PiiSpan name = out.get(i);
      int p = name.start();
      while (p < name.end()) {
        Word w = Word.at(text, p);
        if (w == null) {
          p++;
          continue;
        }
        String word = text.substring(w.start, w.nameEnd);
        if (w.nameEnd - w.start >= 2
            && !PiiLexicon.PARTICLES.contains(w.lower)
            && !PiiLexicon.NOT_NAMES.contains(w.lower)
            && done.add(word)) {
          int at = -1;
          while ((at = text.indexOf(word, at + 1)) >= 0) {
            int end = at + word.length();
            if (!insideName(out, from, found, at) && wholeWord(text, at, end)) {
              out.add(new PiiSpan(PiiType.NAME, at, end));
            }
          }
        }
        p = Math.max(w.end, p + 1);
      }
    }
  }

  /** Whether {@code at} lies inside one of the names {@code out[from, to)}. */
  private static boolean insideName(List<PiiSpan> out, int from, int to, int at) {
    for (int i = from; i < to; i++) {
      if (at >= out.get(i).start() && at < out.get(i).end()) {
        return true;
      }
    }
    return false;
  }

  /** After a name: the end, punctuation, a symbol, or one of {@code followers}. */
  private static boolean followerOk(String text, int e, Set<String> followers) {
    int n = text.length();
    int f = e;
    while (f < n && PiiChars.isInlineSpace(text.charAt(f))) {
      f++;
    }
    if (f >= n) {
      return true;
    }
    char c = text.charAt(f);
    if (".,!?;:)…-–—\n\r\t\"”’(".indexOf(c) >= 0) {
      return true;
    }
    int cp = text.codePointAt(f);
    int type = Character.getType(cp);
    if (type == Character.OTHER_SYMBOL || type == Character.SURROGATE) {
      return true; // an emoji
    }
    Word next = Word.at(text, f);
    return next != null && f > e && followers.contains(next.lower);
  }

  private static boolean isLineBreak(char c) {
    return c == '\n' || c == '\r' || c == '\u2028' || c == '\u2029';
  }

  /**
   * The start of the answer, of a line or of a sentence, or right after a greeting at the start.
   */
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
    return greetingBefore(text, s);
  }

  /** Nothing before {@code s} but white space and perhaps a greeting. */
  private static boolean greetingBefore(String text, int s) {
    return s <= 60 && GREETING.matcher(text).region(0, s).matches();
  }

  /**
   * One word: letters and marks, with inner apostrophes or hyphens ("O'Neill", "Anne-Marie"); or an
   * initial, one capital letter and a dot ("J.").
   */
  private record Word(
      int start,
      int end,
      int nameEnd,
      boolean possessive,
      boolean capitalised,
      boolean initial,
      String lower) {
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
      boolean upper = Character.isUpperCase(first) || Character.isTitleCase(first);
      if (e == p + Character.charCount(first) && upper && e < n && text.charAt(e) == '.') {
        String lower = text.substring(p, e).toLowerCase(Locale.ROOT);
        return new Word(p, e + 1, e + 1, false, false, true, lower);
      }
      boolean possessive =
          e - p >= 3
              && (text.charAt(e - 1) == 's' || text.charAt(e - 1) == 'S')
              && (text.charAt(e - 2) == '\'' || text.charAt(e - 2) == '’');
      int nameEnd = possessive ? e - 2 : e;
      boolean capitalised = upper && hasLower;
      String lower = text.substring(p, nameEnd).toLowerCase(Locale.ROOT);
      return new Word(p, e, nameEnd, possessive, capitalised, false, lower);
    }
  }
}
