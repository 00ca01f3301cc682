package riffle.text;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import riffle.words.WordList;

/**
 * The word lists of the personal-data detectors, read once from {@code riffle/words/any/} (the
 * {@code pii-*.txt} lists, {@code iban-lengths.txt}), and the one pass over an answer that tells
 * which detectors have anything to look at.
 *
 * <p>The pass reads each word (letters and marks with inner apostrophes, {@code ’} read as {@code
 * '}), lower-cases it and looks it up in one hash table of cue words. Each hit sets its family's
 * bit; street words also record where they stand, so that the address rules start there instead of
 * scanning the whole answer. Immutable and safe to share.
 */
final class PiiLexicon {
  /** A name cue word ("regards", "I'm", "thanks" …). */
  static final int NAME = 1;

  /** A date-of-birth cue word. */
  static final int DOB = 1 << 1;

  /** A card-detail cue word (expiry, CVV …). */
  static final int CARD = 1 << 2;

  /** A national-id cue word. */
  static final int ID = 1 << 3;

  /** A licence-plate cue word. */
  static final int PLATE = 1 << 4;

  /** A street word (see {@code pii-streets-*.txt}), also a compound such as "Hauptstraße 5". */
  static final int STREET = 1 << 5;

  /** A PO-box word. */
  static final int POBOX = 1 << 6;

  /** A word saying a place follows ("live", "deliver", "address" …). */
  static final int PLACE = 1 << 7;

  /** A postcode cue word ("postcode", "zip", "PLZ" …). */
  static final int POSTCODE = 1 << 8;

  /**
   * A reference cue word ("receipt", "tracking" …) or a word starting like a reference prefix (ord,
   * inv, rma, ret, ref, trk, tkt: "ORD-48213", "invoice", "REF5521").
   */
  static final int REFERENCE = 1 << 9;

  /** The word "dot" (an e-mail address spelled out: "jonas at example dot com"). */
  static final int SPELLED = 1 << 10;

  /** The word "at" (the same). */
  static final int AT = 1 << 11;

  /** Hashes of the first three letters of the reference prefixes. */
  private static final long[] PREFIXES = {
    prefixHash("ord"),
    prefixHash("inv"),
    prefixHash("rma"),
    prefixHash("ret"),
    prefixHash("ref"),
    prefixHash("trk"),
    prefixHash("tkt")
  };

  private static final Map<String, Integer> FAMILY_NAMES =
      Map.ofEntries(
          Map.entry("name", NAME),
          Map.entry("dob", DOB),
          Map.entry("card", CARD),
          Map.entry("id", ID),
          Map.entry("plate", PLATE),
          Map.entry("pobox", POBOX),
          Map.entry("place", PLACE),
          Map.entry("postcode", POSTCODE),
          Map.entry("reference", REFERENCE),
          Map.entry("spelled", SPELLED),
          Map.entry("at", AT));

  /** Kinds of street words, one list each: {@code pii-streets-<kind>.txt}. */
  enum StreetKind {
    AFTER,
    WEAK,
    BEFORE,
    FIRST,
    SUFFIX
  }

  /** Street words by kind, lower case. */
  static final Map<StreetKind, List<String>> STREETS;

  /** Words never taken as names. */
  static final Set<String> NOT_NAMES;

  /** Lower-case words that may stand between the words of a name. */
  static final Set<String> PARTICLES;

  /** Titles that may come before a name and stay readable. */
  static final Set<String> TITLES;

  /** IBAN length by upper-case country code. */
  static final Map<String, Integer> IBAN_LENGTHS;

  /** Open-addressing table of cue-word hashes and their family bits. */
  private static final long[] KEYS;

  private static final int[] BITS;

  /** Compound street endings, longest first. */
  private static final String[] SUFFIXES;

  static {
    Map<String, Integer> bits = new HashMap<>();
    for (Map.Entry<String, Integer> e : FAMILY_NAMES.entrySet()) {
      for (String w : WordList.entries("any", "pii-cues-" + e.getKey())) {
        bits.merge(w, e.getValue(), (a, b) -> a | b);
      }
    }
    Map<StreetKind, List<String>> byKind = new LinkedHashMap<>();
    for (StreetKind kind : StreetKind.values()) {
      List<String> words =
          new ArrayList<>(
              WordList.entries("any", "pii-streets-" + kind.name().toLowerCase(Locale.ROOT)));
      words.sort(Comparator.comparingInt(String::length).reversed());
      byKind.put(kind, List.copyOf(words));
      if (kind != StreetKind.SUFFIX) {
        for (String w : words) {
          bits.merge(w, STREET, (a, b) -> a | b);
        }
      }
    }
    STREETS = Map.copyOf(byKind);
    SUFFIXES = byKind.get(StreetKind.SUFFIX).toArray(String[]::new);
    NOT_NAMES = WordList.set("any", "pii-not-names");
    PARTICLES = WordList.set("any", "pii-name-particles");
    TITLES = WordList.set("any", "pii-name-titles");
    int size = Integer.highestOneBit(bits.size() * 4);
    KEYS = new long[size];
    BITS = new int[size];
    for (Map.Entry<String, Integer> e : bits.entrySet()) {
      long h = hash(e.getKey(), 0, e.getKey().length());
      int slot = (int) (h & (size - 1));
      while (KEYS[slot] != 0 && KEYS[slot] != h) {
        slot = (slot + 1) & (size - 1);
      }
      KEYS[slot] = h;
      BITS[slot] |= e.getValue();
    }
    Map<String, Integer> lengths = new HashMap<>();
    for (Map.Entry<String, String> e : WordList.map("any", "iban-lengths").entrySet()) {
      lengths.put(e.getKey(), Integer.parseInt(e.getValue()));
    }
    IBAN_LENGTHS = Map.copyOf(lengths);
  }

  private PiiLexicon() {}

  /** What the one pass found: family bits, and where street words stand. */
  static final class Cues {
    int families;

    /** Start and end of each street word or compound, flattened. */
    int[] streets = new int[0];

    int streetCount;

    boolean has(int family) {
      return (families & family) != 0;
    }

    private void addStreet(int start, int end) {
      if (streets.length < (streetCount + 1) * 2) {
        streets = java.util.Arrays.copyOf(streets, Math.max(8, streets.length * 2));
      }
      streets[streetCount * 2] = start;
      streets[streetCount * 2 + 1] = end;
      streetCount++;
    }
  }

  /** Reads every word of {@code text} once and reports the families of cue words it holds. */
  static Cues scan(String text) {
    Cues cues = new Cues();
    int n = text.length();
    int i = 0;
    while (i < n) {
      char ch = text.charAt(i);
      if (ch < 0x80 ? !isAsciiLetter(ch) : !PiiChars.isLetterOrMark(text.codePointAt(i))) {
        i += ch < 0x80 ? 1 : Character.charCount(text.codePointAt(i));
        continue;
      }
      int start = i;
      long h = OFFSET;
      long prefix = 0;
      while (i < n) {
        char c = text.charAt(i);
        if (c < 0x80) {
          if (isAsciiLetter(c)) {
            h = step(h, c | 0x20);
            i++;
            if (i - start == 3) {
              prefix = h;
            }
          } else if (c == '\'' && PiiChars.isLetterAt(text, i + 1)) {
            h = step(h, '\'');
            i++;
          } else {
            break;
          }
        } else {
          int cp = text.codePointAt(i);
          if (PiiChars.isLetterOrMark(cp)) {
            h = step(h, Character.toLowerCase(cp));
            i += Character.charCount(cp);
          } else if (cp == '’' && PiiChars.isLetterAt(text, i + 1)) {
            h = step(h, '\'');
            i++;
          } else {
            break;
          }
        }
      }
      if (prefix != 0 && (cues.families & REFERENCE) == 0) {
        for (long p : PREFIXES) {
          if (p == prefix) {
            cues.families |= REFERENCE;
            break;
          }
        }
      }
      int family = lookup(h);
      if (family != 0) {
        cues.families |= family;
        if ((family & STREET) != 0) {
          cues.addStreet(start, i);
        }
      } else if (i - start >= 4 && numberFollows(text, i) && compoundEnd(text, start, i) > 0) {
        cues.families |= STREET;
        cues.addStreet(start, i);
      }
    }
    return cues;
  }

  private static boolean isAsciiLetter(char c) {
    return (c | 0x20) >= 'a' && (c | 0x20) <= 'z';
  }

  /** After a word: an optional dot, spaces or a comma, then a digit ("Hauptstr. 5"). */
  private static boolean numberFollows(String text, int e) {
    int p = e;
    if (p < text.length() && text.charAt(p) == '.') {
      p++;
    }
    int spaces = 0;
    while (p < text.length() && spaces < 3 && (text.charAt(p) == ' ' || text.charAt(p) == ',')) {
      p++;
      spaces++;
    }
    return spaces > 0 && PiiChars.isDigitAt(text, p);
  }

  /**
   * The length of the street ending that closes the compound word {@code text[start, end)} ("Haupt"
   * + "straße"), or 0. The ending must leave at least three letters before it; "str" counts only
   * with its dot.
   */
  static int compoundEnd(String text, int start, int end) {
    for (String s : SUFFIXES) {
      int len = s.length();
      if (end - start >= len + 3 && text.regionMatches(true, end - len, s, 0, len)) {
        if (s.equals("str") && !(end < text.length() && text.charAt(end) == '.')) {
          continue;
        }
        return len;
      }
    }
    return 0;
  }

  /** The family bits of one lower-case word, or 0. */
  static int familiesOf(String lowerWord) {
    return lookup(hash(lowerWord, 0, lowerWord.length()));
  }

  private static int lookup(long h) {
    int mask = KEYS.length - 1;
    int slot = (int) (h & mask);
    while (KEYS[slot] != 0) {
      if (KEYS[slot] == h) {
        return BITS[slot];
      }
      slot = (slot + 1) & mask;
    }
    return 0;
  }

  private static final long OFFSET = 0xcbf29ce484222325L;

  /** FNV-1a over code points; collisions only make a detector run for nothing. */
  private static long step(long h, int cp) {
    long x = h ^ cp;
    x *= 0x100000001b3L;
    return x == 0 ? 1 : x;
  }

  private static long prefixHash(String three) {
    long h = OFFSET;
    for (int i = 0; i < 3; i++) {
      h = step(h, three.charAt(i));
    }
    return h;
  }

  private static long hash(String s, int from, int to) {
    long h = OFFSET;
    for (int i = from; i < to; ) {
      int cp = s.codePointAt(i);
      h = step(h, cp == '’' ? '\'' : Character.toLowerCase(cp));
      i += Character.charCount(cp);
    }
    return h;
  }

  /** A regular-expression alternation of the words of one street kind (quoted, longest first). */
  static String alternation(StreetKind kind) {
    StringBuilder sb = new StringBuilder();
    for (String w : STREETS.get(kind)) {
      if (sb.length() > 0) {
        sb.append('|');
      }
      sb.append(Pattern.quote(w));
    }
    return sb.toString();
  }

  /** Whether {@code lowerWord} is a street word of {@code kind}. */
  static boolean isStreet(StreetKind kind, String lowerWord) {
    return STREETS.get(kind).contains(lowerWord);
  }
}
