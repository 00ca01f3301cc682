package riffle.text;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import riffle.model.PiiType;

/**
 * Finds e-mail addresses, web addresses and @handles. Rules are documented on {@link PiiMasker}.
 */
final class PiiAddresses {
  /**
   * Characters a web address does not contain: white space, controls, format marks, {@code <>"}.
   */
  private static final String URL_BODY = "[^\\s\\p{Z}\\p{Cc}\\p{Cf}<>\"]";

  /** {@code http://…}, {@code https://…}, {@code ftp://…}, any case. */
  static final Pattern SCHEME_URL =
      Pattern.compile(
          "(?<![\\p{L}\\p{N}\\p{M}])(?:https?|ftp)://" + URL_BODY + "++", Pattern.CASE_INSENSITIVE);

  /** {@code www.host…}, any case, not inside a word, an e-mail address or a path. */
  static final Pattern WWW_URL =
      Pattern.compile(
          "(?<![\\p{L}\\p{N}\\p{M}@._%+\\-/])www\\." + URL_BODY + "++", Pattern.CASE_INSENSITIVE);

  /** {@code host.tld/path}: a bare host name directly followed by a slash. */
  static final Pattern BARE_URL =
      Pattern.compile(
          "(?<![\\p{L}\\p{N}\\p{M}@._%+\\-/])[\\p{L}\\p{N}][\\p{L}\\p{N}\\p{M}.\\-]*+/"
              + URL_BODY
              + "*+");

  /** One way of writing "at" in an address spelled out against harvesting. */
  private static final String SPELLED_AT =
      "(?<at>\\s{0,3}[\\[({]\\s{0,2}at\\s{0,2}[\\])}]\\s{0,3}|\\s{1,3}at\\s{1,3}|@)";

  private static final String SPELLED_DOT =
      "(?:\\s{0,3}[\\[({]\\s{0,2}dot\\s{0,2}[\\])}]\\s{0,3}|\\s{1,3}dot\\s{1,3}|\\.)";

  /** {@code jonas at example dot com}, {@code jonas [at] example [dot] com} and the like. */
  static final Pattern SPELLED_EMAIL =
      Pattern.compile(
          "(?<![\\p{L}\\p{N}\\p{M}._%+\\-])"
              + "(?<local>[\\p{L}\\p{N}][\\p{L}\\p{N}\\p{M}._%+\\-]{0,63}+)"
              + SPELLED_AT
              + "(?<domain>(?:[\\p{L}\\p{N}][\\p{L}\\p{N}\\p{M}\\-]{0,62}+"
              + SPELLED_DOT
              + "){1,4})"
              + "(?:com|org|net|edu|gov|info|biz|io|co|uk|de|fr|nl|be|es|it|ie|eu|ch|at|se|no|dk"
              + "|fi|pl|pt|us|ca|au|nz|me|example|test)(?![\\p{L}\\p{N}\\p{M}])",
          Pattern.CASE_INSENSITIVE);

  /** Words that, shortly before "name at host dot com", say an e-mail address follows. */
  private static final String[] EMAIL_CUES = {
    "mail", "email", "address", "contact", "reach", "write"
  };

  private static final String TRAILING_PUNCTUATION = ".,;:!?'\"’”»…";

  private PiiAddresses() {}

  // ---- e-mail ----

  private static boolean isLocalChar(char c) {
    return Character.isLetterOrDigit(c)
        || isMark(c)
        || c == '.'
        || c == '_'
        || c == '%'
        || c == '+'
        || c == '-';
  }

  private static boolean isDomainChar(char c) {
    return Character.isLetterOrDigit(c) || isMark(c) || c == '.' || c == '-';
  }

  private static boolean isMark(char c) {
    return PiiChars.isLetterOrMark(c) && !Character.isLetter(c);
  }

  /** Adds each {@code local@host.tld}: local part of letters, digits and {@code ._%+-}. */
  static void emails(String text, List<PiiSpan> out) {
    int n = text.length();
    int from = 0;
    int a;
    while ((a = text.indexOf('@', from)) >= 0) {
      from = a + 1;
      int ls = a;
      while (ls > 0 && isLocalChar(text.charAt(ls - 1))) {
        ls--;
      }
      while (ls < a && !Character.isLetterOrDigit(text.charAt(ls))) {
        ls++; // a local part starts with a letter or digit, not ".", "-" or "+"
      }
      if (ls == a) {
        continue;
      }
      int de = a + 1;
      while (de < n && isDomainChar(text.charAt(de))) {
        de++;
      }
      while (de > a + 1 && (text.charAt(de - 1) == '.' || text.charAt(de - 1) == '-')) {
        de--;
      }
      if (validHost(text, a + 1, de)) {
        out.add(new PiiSpan(PiiType.EMAIL, ls, de));
        from = Math.max(from, de);
      }
    }
  }

  /**
   * Adds addresses spelled out against harvesting. Bracketed forms ({@code [at]}, {@code (dot)})
   * always count; the plain-word form "jonas at example dot com" counts when the local part has a
   * mailbox character (digit, {@code ._%+-}) or an e-mail cue word stands shortly before it, so
   * that "we found you at ondalune dot com" is left alone.
   */
  static void spelledEmails(String text, List<PiiSpan> out) {
    Matcher m = SPELLED_EMAIL.matcher(text);
    int from = 0;
    while (from < text.length() && m.find(from)) {
      String at = m.group("at");
      String domain = m.group("domain");
      boolean dotSpelled = PiiChars.containsIgnoreCase(domain, "dot");
      boolean bracketed = at.indexOf('[') >= 0 || at.indexOf('(') >= 0 || at.indexOf('{') >= 0;
      boolean plainAt = !bracketed && at.indexOf('@') < 0;
      boolean accept;
      if (at.indexOf('@') >= 0) {
        accept = dotSpelled; // otherwise an ordinary address, found by emails()
      } else if (bracketed) {
        accept = true;
      } else {
        accept = plainAt && (hasMailboxChar(m.group("local")) || emailCueBefore(text, m.start()));
      }
      if (accept) {
        out.add(new PiiSpan(PiiType.EMAIL, m.start(), m.end()));
        from = m.end();
      } else {
        from = m.start() + 1;
      }
    }
  }

  private static boolean hasMailboxChar(String local) {
    for (int i = 0; i < local.length(); i++) {
      char c = local.charAt(i);
      if (Character.isDigit(c) || "._%+-".indexOf(c) >= 0) {
        return true;
      }
    }
    return false;
  }

  private static boolean emailCueBefore(String text, int s) {
    return PiiChars.hasWordStartingWith(text, s - 40, s, EMAIL_CUES)
        || PiiChars.indexOfIgnoreCase(text, "e-mail", Math.max(0, s - 40), s) >= 0;
  }

  // ---- handles ----

  /**
   * Adds each {@code @name}: the {@code @} not after a letter, digit or address character, then a
   * letter or underscore, then letters, digits, underscores and inner dots. "@ 5pm" and "@5pm" are
   * not handles.
   */
  static void handles(String text, List<PiiSpan> out) {
    int n = text.length();
    int from = 0;
    int a;
    while ((a = text.indexOf('@', from)) >= 0) {
      from = a + 1;
      if (a > 0) {
        char p = text.charAt(a - 1);
        if (isLocalChar(p) || p == '@' || p == '/' || PiiChars.isWordCharBefore(text, a)) {
          continue;
        }
      }
      if (a + 1 >= n) {
        continue;
      }
      int first = text.codePointAt(a + 1);
      if (!Character.isLetter(first) && first != '_') {
        continue;
      }
      int e = a + 1;
      while (e < n) {
        int cp = text.codePointAt(e);
        if (PiiChars.isWordChar(cp) || cp == '_' || cp == '.') {
          e += Character.charCount(cp);
        } else {
          break;
        }
      }
      while (text.charAt(e - 1) == '.') {
        e--;
      }
      if (e < n && text.charAt(e) == '@') {
        continue; // "@jo@example.com" is an address with a stray "@"
      }
      out.add(new PiiSpan(PiiType.HANDLE, a, e));
      from = e;
    }
  }

  // ---- web addresses ----

  /** Adds web addresses: with a scheme, starting {@code www.}, or a bare host with a path. */
  static void urls(String text, boolean scheme, boolean www, boolean bare, List<PiiSpan> out) {
    if (scheme) {
      Matcher m = SCHEME_URL.matcher(text);
      while (m.find()) {
        int hostStart = text.indexOf("://", m.start()) + 3;
        int e = trimEnd(text, m.start(), m.end());
        if (e > hostStart && PiiChars.isWordCharAt(text, hostStart)) {
          out.add(new PiiSpan(PiiType.URL, m.start(), e));
        }
      }
    }
    if (www) {
      Matcher m = WWW_URL.matcher(text);
      while (m.find()) {
        int e = trimEnd(text, m.start(), m.end());
        int hostEnd = m.start();
        while (hostEnd < e && "/?#:".indexOf(text.charAt(hostEnd)) < 0) {
          hostEnd++;
        }
        if (validHost(text, m.start(), hostEnd)) {
          out.add(new PiiSpan(PiiType.URL, m.start(), e));
        }
      }
    }
    if (bare) {
      Matcher m = BARE_URL.matcher(text);
      while (m.find()) {
        int slash = text.indexOf('/', m.start());
        if (validHost(text, m.start(), slash)) {
          out.add(
              new PiiSpan(
                  PiiType.URL, m.start(), Math.max(slash + 1, trimEnd(text, slash, m.end()))));
        }
      }
    }
  }

  /**
   * Where a web address really ends: sentence punctuation and quotes after it are not part of it,
   * nor is a closing bracket that it did not open.
   */
  static int trimEnd(String text, int start, int end) {
    int opens = 0;
    int closes = 0;
    int squareOpens = 0;
    int squareCloses = 0;
    for (int i = start; i < end; i++) {
      switch (text.charAt(i)) {
        case '(' -> opens++;
        case ')' -> closes++;
        case '[' -> squareOpens++;
        case ']' -> squareCloses++;
        default -> {}
      }
    }
    int e = end;
    while (e > start) {
      char c = text.charAt(e - 1);
      if (TRAILING_PUNCTUATION.indexOf(c) >= 0) {
        e--;
      } else if (c == ')' && closes > opens) {
        closes--;
        e--;
      } else if (c == ']' && squareCloses > squareOpens) {
        squareCloses--;
        e--;
      } else if (c == '}' || c == '>') {
        e--;
      } else {
        break;
      }
    }
    return e;
  }

  /**
   * A host name: two or more dot-separated labels of letters, digits, marks and inner hyphens, the
   * last of them all letters (at least two) or an IDNA {@code xn--} label.
   */
  static boolean validHost(String text, int start, int end) {
    if (end <= start) {
      return false;
    }
    int labels = 0;
    int labelStart = start;
    for (int i = start; i <= end; i++) {
      if (i == end || text.charAt(i) == '.') {
        if (i == labelStart || text.charAt(labelStart) == '-' || text.charAt(i - 1) == '-') {
          return false;
        }
        labels++;
        if (i == end && !isTopLevel(text, labelStart, end)) {
          return false;
        }
        labelStart = i + 1;
      } else if (!isDomainChar(text.charAt(i))) {
        return false;
      }
    }
    return labels >= 2;
  }

  private static boolean isTopLevel(String text, int start, int end) {
    if (end - start > 4 && text.regionMatches(true, start, "xn--", 0, 4)) {
      return true;
    }
    if (end - start < 2 || !Character.isLetter(text.charAt(start))) {
      return false;
    }
    for (int i = start; i < end; i++) {
      char c = text.charAt(i);
      if (!Character.isLetter(c) && !isMark(c)) {
        return false;
      }
    }
    return true;
  }
}
