package riffle.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import riffle.model.PiiType;

/**
 * Finds phone numbers and payment-card numbers in one linear scan over written numbers. The rules
 * are documented on {@link PiiMasker}; this class keeps them in one place.
 *
 * <p>A <em>run</em> is a written number: digit groups joined by single separators (a space, a
 * hyphen or a dot), where a group may be wrapped in parentheses, optionally led by {@code +}. A
 * <em>chunk</em> is the part of a run between spaces ({@code 010-1234} is one chunk of two groups).
 *
 * <p>Size: one class because phone and card numbers are found in the same single scan over written
 * numbers, and a run is decided between them only once it has been read whole.
 */
final class PiiNumbers {
  /** E.164 allows at most 15 digits in an international number. */
  static final int MAX_PHONE_DIGITS = 15;

  /** Fewer digits are too easily a price, a quantity or a short reference. */
  static final int MIN_PHONE_DIGITS = 7;

  static final int MIN_CARD_DIGITS = 13;
  static final int MAX_CARD_DIGITS = 19;

  /** Words that, just before a short undivided number, say it is a phone number. */
  private static final String[] PHONE_CUES =
      "call phone tel mobile cell number ring text whatsapp sms contact reach fax landline"
          .split(" ");

  /** Words (lower case) that, right after a number, make it a quantity rather than a phone. */
  private static final Set<String> UNITS =
      Set.of(
          ("mm cm m km g kg mg ml cl dl l w kw watt watts v volt volts bar psi rpm hz mah x "
                  + "times pcs pieces cups shots espressos coffees days weeks months years hours hrs "
                  + "h minutes mins min seconds secs sec s eur euro euros usd gbp dollars pounds kr "
                  + "sek chf points pts stars reviews people users customers views miles mi ft lbs oz")
              .split(" "));

  /** Currency codes (lower case) that, right before a number, make it a price. */
  private static final Set<String> CURRENCY_CODES =
      Set.of("eur", "usd", "gbp", "chf", "sek", "nok", "dkk", "kr", "rs", "aud", "cad", "pln");

  private static final String CURRENCY_SIGNS = "€$£¥₹₩₽¢";

  private PiiNumbers() {}

  /** Whether a lower-case word is a unit that makes the number before it a quantity. */
  static boolean isUnitWord(String lower) {
    return UNITS.contains(lower);
  }

  /** Adds every phone and card number of {@code text} to {@code out}. */
  static void find(String text, List<PiiSpan> out) {
    int n = text.length();
    int i = 0;
    while (i < n) {
      char c = text.charAt(i);
      boolean plus = c == '+' && startsGroup(text, i + 1);
      if ((plus || startsGroup(text, i)) && startAllowed(text, i)) {
        Run run = Run.parse(text, i, plus);
        run.findCards(out);
        run.findPhones(out);
        i = Math.max(run.scanEnd, i + 1);
      } else {
        i++;
      }
    }
  }

  /** Whether a digit group starts at {@code i}: a digit, or a digit group in parentheses. */
  static boolean startsGroup(String text, int i) {
    if (i >= text.length()) {
      return false;
    }
    char c = text.charAt(i);
    return PiiChars.isDigit(c) || (c == '(' && parenGroupEnd(text, i) > 0);
  }

  /** The index after {@code (ddd)} starting at {@code i} (1–5 digits), or -1. */
  static int parenGroupEnd(String text, int i) {
    int n = text.length();
    int j = i + 1;
    while (j < n && j - i <= 6 && PiiChars.isDigit(text.charAt(j))) {
      j++;
    }
    int digits = j - i - 1;
    return digits >= 1 && digits <= 5 && j < n && text.charAt(j) == ')' ? j + 1 : -1;
  }

  /**
   * Whether a number may start at {@code i}: not inside a word or code ({@code ORD-48213}, {@code
   * v2.1}, {@code JD0146…}), not a hash-tagged or path number, not the tail of {@code 1,299}.
   */
  static boolean startAllowed(String text, int i) {
    if (i == 0) {
      return true;
    }
    char p = text.charAt(i - 1);
    if (PiiChars.isWordCharBefore(text, i) || p == '_') {
      return false;
    }
    if ("#@/\\=&".indexOf(p) >= 0) {
      return false;
    }
    if (p == '.' && PiiChars.isWordCharBefore(text, i - 1)) {
      return abbreviatedCueBefore(text, i - 1); // "Tel.07700 900123", but not "v2.07700"
    }
    if (p == '-' && PiiChars.isWordCharBefore(text, i - 1)) {
      return false;
    }
    if (p == ',' && PiiChars.isDigitAt(text, i - 2)) {
      // "1,299" or "249,99": the part after a thousands or decimal comma
      int j = i;
      while (j < text.length() && PiiChars.isDigit(text.charAt(j))) {
        j++;
      }
      return j - i > 3;
    }
    return true;
  }

  /** Abbreviations that may be joined to a phone number by a dot: "Tel.", "Mob.", "No.". */
  private static final Set<String> DOTTED_CUES = Set.of("tel", "ph", "mob", "no", "nr", "fax");

  private static boolean abbreviatedCueBefore(String text, int dot) {
    int q = dot;
    while (q > 0 && dot - q <= 3 && Character.isLetter(text.charAt(q - 1))) {
      q--;
    }
    if (q == dot || PiiChars.isWordCharBefore(text, q)) {
      return false;
    }
    return DOTTED_CUES.contains(text.substring(q, dot).toLowerCase(java.util.Locale.ROOT));
  }

  /** One digit group of a run. */
  private record Group(int start, int end, int digits, boolean paren, char sepBefore, int chunk) {}

  private enum Kind {
    NONE,
    WEAK,
    STRONG
  }

  /** One written number and the chunks it is made of. */
  private static final class Run {
    final String text;
    final int start;
    final boolean plus;
    final List<Group> groups = new ArrayList<>();
    int scanEnd;

    /** Whether the last chunk runs straight into letters ("07700900123pls", "58mm"). */
    boolean letterGlued;

    int[] chunkFirst = new int[0];
    int[] chunkLast = new int[0];
    int[] chunkDigits = new int[0];
    boolean[] blocker = new boolean[0];

    /** Digit values of the whole run, in order, and where each group's digits begin. */
    int[] digits = new int[0];

    int[] groupDigitStart = new int[0];

    private Run(String text, int start, boolean plus) {
      this.text = text;
      this.start = start;
      this.plus = plus;
    }

    static Run parse(String text, int start, boolean plus) {
      Run run = new Run(text, start, plus);
      int n = text.length();
      int pos = plus ? start + 1 : start;
      int chunk = 0;
      char sep = 0;
      while (true) {
        int gStart = pos;
        boolean paren = text.charAt(pos) == '(';
        int gEnd;
        if (paren) {
          gEnd = parenGroupEnd(text, pos);
        } else {
          gEnd = pos;
          while (gEnd < n && PiiChars.isDigit(text.charAt(gEnd))) {
            gEnd++;
          }
        }
        int digits = paren ? gEnd - gStart - 2 : gEnd - gStart;
        run.groups.add(new Group(gStart, gEnd, digits, paren, sep, chunk));
        pos = gEnd;
        if (pos >= n) {
          break;
        }
        char c = text.charAt(pos);
        if (paren && PiiChars.isDigit(c)) {
          sep = 0; // "(0)20"
        } else if (!paren && c == '(' && parenGroupEnd(text, pos) > 0) {
          sep = 0; // "44(0)20"
        } else if ((c == '-' || c == '.') && startsGroup(text, pos + 1)) {
          sep = c;
          pos++;
        } else if (PiiChars.isInlineSpace(c) && startsGroup(text, pos + 1)) {
          sep = ' ';
          chunk++;
          pos++;
        } else {
          break;
        }
      }
      run.scanEnd = pos;
      if (pos < n && PiiChars.isLetterOrMark(text.codePointAt(pos))) {
        run.letterGlued = true;
      } else if (gluedAfter(text, pos)) {
        run.dropLastChunk();
      }
      run.index();
      return run;
    }

    /**
     * Whether the number runs straight into another kind of number or symbol ("15/03", "10:30",
     * "12%", "1,299", "3_"), which makes its last chunk part of that.
     */
    private static boolean gluedAfter(String text, int pos) {
      if (pos >= text.length()) {
        return false;
      }
      char c = text.charAt(pos);
      if (c == '_' || c == '%' || c == '°') {
        return true;
      }
      if ((c == '/' || c == ':') && PiiChars.isDigitAt(text, pos + 1)) {
        return true;
      }
      if (c == ',' && PiiChars.isDigitAt(text, pos + 1)) {
        int j = pos + 1;
        while (j < text.length() && PiiChars.isDigit(text.charAt(j))) {
          j++;
        }
        return j - pos - 1 <= 3;
      }
      return false;
    }

    private void dropLastChunk() {
      int last = groups.get(groups.size() - 1).chunk();
      while (!groups.isEmpty() && groups.get(groups.size() - 1).chunk() == last) {
        groups.remove(groups.size() - 1);
      }
    }

    private void index() {
      int chunks = groups.isEmpty() ? 0 : groups.get(groups.size() - 1).chunk() + 1;
      chunkFirst = new int[chunks];
      chunkLast = new int[chunks];
      chunkDigits = new int[chunks];
      groupDigitStart = new int[groups.size()];
      int total = 0;
      for (Group g : groups) {
        total += g.digits();
      }
      digits = new int[total];
      int k = 0;
      for (int gi = 0; gi < groups.size(); gi++) {
        Group g = groups.get(gi);
        groupDigitStart[gi] = k;
        int from = g.paren() ? g.start() + 1 : g.start();
        for (int p = from; p < from + g.digits(); p++) {
          digits[k++] = Character.digit(text.charAt(p), 10);
        }
        if (gi == 0 || groups.get(gi - 1).chunk() != g.chunk()) {
          chunkFirst[g.chunk()] = gi;
        }
        chunkLast[g.chunk()] = gi;
        chunkDigits[g.chunk()] += g.digits();
      }
      blocker = new boolean[chunks];
      for (int c = 0; c < chunks; c++) {
        blocker[c] = isBlocker(c);
      }
    }

    private Group group(int i) {
      return groups.get(i);
    }

    private int spanStart(int chunk) {
      return plus && chunk == 0 ? start : group(chunkFirst[chunk]).start();
    }

    private int spanEnd(int chunk) {
      return group(chunkLast[chunk]).end();
    }

    private int digitIndex(int chunk) {
      return groupDigitStart[chunkFirst[chunk]];
    }

    /** The number group {@code gi} spells (its first 18 digits). */
    private long value(int gi) {
      long v = 0;
      int from = groupDigitStart[gi];
      for (int k = from; k < from + Math.min(group(gi).digits(), 18); k++) {
        v = v * 10 + digits[k];
      }
      return v;
    }

    // ---- cards ----

    void findCards(List<PiiSpan> out) {
      int chunks = chunkFirst.length;
      int a = 0;
      while (a < chunks) {
        if (!cardLike(a) || digits[digitIndex(a)] == 0) {
          a++;
          continue;
        }
        int count = 0;
        int best = -1;
        for (int b = a; b < chunks && cardLike(b); b++) {
          count += chunkDigits[b];
          if (count > MAX_CARD_DIGITS) {
            break;
          }
          int from = digitIndex(a);
          if (count >= MIN_CARD_DIGITS && Luhn.isValid(digits, from, from + count)) {
            best = b;
          }
        }
        if (best >= 0) {
          out.add(new PiiSpan(PiiType.CARD, spanStart(a), spanEnd(best)));
          a = best + 1;
        } else {
          a++;
        }
      }
    }

    /** Groups of three or more digits, joined by hyphens only, no parentheses, no plus. */
    private boolean cardLike(int chunk) {
      if (plus && chunk == 0) {
        return false;
      }
      for (int g = chunkFirst[chunk]; g <= chunkLast[chunk]; g++) {
        Group gr = group(g);
        if (gr.paren() || gr.digits() < 3 || (g > chunkFirst[chunk] && gr.sepBefore() != '-')) {
          return false;
        }
      }
      return true;
    }

    // ---- phones ----

    void findPhones(List<PiiSpan> out) {
      int chunks = chunkFirst.length;
      int a = 0;
      while (a < chunks) {
        if (blocker[a]) {
          a++;
          continue;
        }
        int b = a;
        while (b + 1 < chunks && !blocker[b + 1]) {
          b++;
        }
        phoneInSegment(a, b, out);
        a = b + 1;
      }
    }

    /**
     * The phone number of chunks {@code a..b}: the whole when it is one, else a tail starting like
     * a phone number, else the whole when it is a weaker match. A last chunk running into letters
     * ("58mm", "07700900123pls") takes part only in a strong match.
     */
    private void phoneInSegment(int a, int b, List<PiiSpan> out) {
      boolean glued = letterGlued && b == chunkFirst.length - 1;
      Kind whole = classify(a, b);
      if (whole == Kind.STRONG) {
        out.add(new PiiSpan(PiiType.PHONE, spanStart(a), spanEnd(b)));
        return;
      }
      for (int k = a + 1; k <= b; k++) {
        if (classify(k, b) == Kind.STRONG) {
          out.add(new PiiSpan(PiiType.PHONE, spanStart(k), spanEnd(b)));
          return;
        }
      }
      if (!glued) {
        if (whole == Kind.WEAK) {
          out.add(new PiiSpan(PiiType.PHONE, spanStart(a), spanEnd(b)));
        }
      } else if (b > a) {
        phoneInSegment(a, b - 1, out);
      }
    }

    private Kind classify(int a, int b) {
      int firstGroup = chunkFirst[a];
      int lastGroup = chunkLast[b];
      int count = 0;
      int singles = 0;
      int zeroTrunks = 0;
      for (int g = firstGroup; g <= lastGroup; g++) {
        Group gr = group(g);
        count += gr.digits();
        if (count > MAX_PHONE_DIGITS + 2) {
          return Kind.NONE; // also keeps the work per candidate bounded
        }
        if (gr.digits() == 1) {
          singles++;
          if (gr.paren() && digits[groupDigitStart[g]] == 0) {
            zeroTrunks++;
          }
        }
      }
      int groupCount = lastGroup - firstGroup + 1;
      if (groupCount > 8 || singles > 2) {
        return Kind.NONE;
      }
      int s = spanStart(a);
      int e = spanEnd(b);
      int d0 = digitIndex(a);
      if (plus && a == 0) {
        // international: +CC …; "(0)" after the country code is not dialled
        int dialled = count - zeroTrunks;
        return digits[d0] != 0 && dialled >= MIN_PHONE_DIGITS && dialled <= MAX_PHONE_DIGITS
            ? Kind.STRONG
            : Kind.NONE;
      }
      if (currencyBefore(s)) {
        return Kind.NONE;
      }
      if (count >= 3 && digits[d0] == 0 && digits[d0 + 1] == 0) {
        // international with the 00 exit prefix
        int dialled = count - 2;
        return digits[d0 + 2] != 0 && dialled >= MIN_PHONE_DIGITS && dialled <= MAX_PHONE_DIGITS
            ? Kind.STRONG
            : Kind.NONE;
      }
      if (count < MIN_PHONE_DIGITS || count > MAX_PHONE_DIGITS) {
        return Kind.NONE;
      }
      Group g0 = group(firstGroup);
      if (digits[d0] == 0) {
        // national number with a trunk prefix: 07700 900123, 020 7946 0018
        return isDate(firstGroup, lastGroup) ? Kind.NONE : Kind.STRONG;
      }
      if (g0.paren() && g0.digits() >= 2) {
        return Kind.STRONG; // (555) 010-1234
      }
      if (isNanp(firstGroup, lastGroup)) {
        return Kind.STRONG; // 555-010-1234, 1 555 010 1234
      }
      if (singles > 1 || (singles == 1 && g0.digits() != 1)) {
        return Kind.NONE;
      }
      if (isThousands(firstGroup, lastGroup)
          || isYears(firstGroup, lastGroup)
          || isRange(firstGroup, lastGroup)
          || isDate(firstGroup, lastGroup)
          || unitAfter(e)) {
        return Kind.NONE;
      }
      if (groupCount == 1 && count <= 9 && !phoneCueBefore(s)) {
        return Kind.NONE;
      }
      return Kind.WEAK;
    }

    private boolean isNanp(int first, int last) {
      int n = last - first + 1;
      if (n == 4
          && !group(first).paren()
          && group(first).digits() == 1
          && digits[groupDigitStart[first]] == 1) {
        first++;
        n--;
      }
      return n == 3
          && group(first).digits() == 3
          && group(first + 1).digits() == 3
          && group(first + 2).digits() == 4
          && !group(first + 1).paren()
          && !group(first + 2).paren();
    }

    /** 1 299 000, 12.345.678: a big number written with thousands separators. */
    private boolean isThousands(int first, int last) {
      if (last == first) {
        return false;
      }
      Group g0 = group(first);
      if (g0.paren() || g0.digits() > 3 || digits[groupDigitStart[first]] == 0) {
        return false;
      }
      char sep = group(first + 1).sepBefore();
      if (sep != ' ' && sep != '.') {
        return false;
      }
      for (int g = first + 1; g <= last; g++) {
        if (group(g).digits() != 3 || group(g).sepBefore() != sep || group(g).paren()) {
          return false;
        }
      }
      return true;
    }

    /** 2019 2020 2021: a list of years. */
    private boolean isYears(int first, int last) {
      for (int g = first; g <= last; g++) {
        if (group(g).paren() || group(g).digits() != 4 || !isYear(value(g))) {
          return false;
        }
      }
      return last > first;
    }

    /** 1350-1500: a range of two same-length numbers, rising. */
    private boolean isRange(int first, int last) {
      if (last != first + 1) {
        return false;
      }
      Group a = group(first);
      Group b = group(last);
      return b.sepBefore() == '-'
          && !a.paren()
          && !b.paren()
          && a.digits() == b.digits()
          && digits[groupDigitStart[first]] != 0
          && digits[groupDigitStart[last]] != 0
          && value(first) < value(last);
    }

    /** Y-M-D or D-M-Y (or M-D-Y) with one separator: hyphen, dot or space. */
    private boolean isDate(int first, int last) {
      if (last != first + 2) {
        return false;
      }
      Group a = group(first);
      Group b = group(first + 1);
      Group c = group(last);
      if (a.paren() || b.paren() || c.paren()) {
        return false;
      }
      char sep = b.sepBefore();
      if ((sep != '-' && sep != '.' && sep != ' ') || c.sepBefore() != sep) {
        return false;
      }
      if (a.digits() == 4 && b.digits() <= 2 && c.digits() <= 2) {
        return isYear(value(first)) && isMonth(value(first + 1)) && isDay(value(last));
      }
      if (a.digits() <= 2 && b.digits() <= 2 && (c.digits() == 4 || c.digits() == 2)) {
        long x = value(first);
        long y = value(first + 1);
        boolean dayMonth = isDay(x) && isMonth(y);
        boolean monthDay = isMonth(x) && isDay(y);
        return (dayMonth || monthDay) && (c.digits() == 2 || isYear(value(last)));
      }
      return false;
    }

    private boolean isBlocker(int chunk) {
      if (plus && chunk == 0) {
        return false;
      }
      int first = chunkFirst[chunk];
      int last = chunkLast[chunk];
      int n = last - first + 1;
      if (n == 3 && group(first + 1).sepBefore() != ' ' && isDate(first, last)) {
        return true;
      }
      if (n == 2) {
        Group a = group(first);
        Group b = group(last);
        if (b.sepBefore() == '.' && b.digits() <= 2) {
          return true; // 249.99, 12.5, 9.30
        }
        if (b.sepBefore() == '-'
            && a.digits() == 4
            && b.digits() == 4
            && isYear(value(first))
            && isYear(value(last))) {
          return true; // 2019-2026
        }
      }
      if (n == 4) {
        // 09.30-12.30: a span of clock times
        Group h1 = group(first);
        Group m1 = group(first + 1);
        Group h2 = group(first + 2);
        Group m2 = group(last);
        return m1.sepBefore() == '.'
            && h2.sepBefore() == '-'
            && m2.sepBefore() == '.'
            && h1.digits() <= 2
            && h2.digits() <= 2
            && m1.digits() == 2
            && m2.digits() == 2
            && value(first) <= 24
            && value(first + 2) <= 24
            && value(first + 1) <= 59
            && value(last) <= 59;
      }
      return false;
    }

    private static boolean isYear(long v) {
      return v >= 1900 && v <= 2099;
    }

    private static boolean isMonth(long v) {
      return v >= 1 && v <= 12;
    }

    private static boolean isDay(long v) {
      return v >= 1 && v <= 31;
    }

    private boolean currencyBefore(int s) {
      int p = s - 1;
      if (p >= 0 && PiiChars.isInlineSpace(text.charAt(p))) {
        p--;
      }
      if (p < 0) {
        return false;
      }
      if (CURRENCY_SIGNS.indexOf(text.charAt(p)) >= 0) {
        return true;
      }
      int q = p;
      while (q >= 0 && p - q < 4 && Character.isLetter(text.charAt(q))) {
        q--;
      }
      if (q == p || p - q > 3 || PiiChars.isWordCharBefore(text, q + 1)) {
        return false;
      }
      return CURRENCY_CODES.contains(lower(q + 1, p + 1));
    }

    private boolean unitAfter(int e) {
      int n = text.length();
      int p = e;
      if (p < n && PiiChars.isInlineSpace(text.charAt(p))) {
        p++;
      }
      if (p >= n) {
        return false;
      }
      if ("%°€$£‰".indexOf(text.charAt(p)) >= 0) {
        return true;
      }
      int q = p;
      while (q < n && q - p <= 10 && Character.isLetter(text.charAt(q))) {
        q++;
      }
      if (q == p || PiiChars.isWordCharAt(text, q)) {
        return false;
      }
      return UNITS.contains(lower(p, q));
    }

    private boolean phoneCueBefore(int s) {
      return PiiChars.hasWordStartingWith(text, s - 32, s, PHONE_CUES);
    }

    private String lower(int from, int to) {
      StringBuilder sb = new StringBuilder(to - from);
      for (int i = from; i < to; i++) {
        sb.append(Character.toLowerCase(text.charAt(i)));
      }
      return sb.toString();
    }
  }
}
