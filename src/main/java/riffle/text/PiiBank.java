package riffle.text;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import riffle.model.PiiType;

/**
 * Finds IBANs (ISO 13616-1: country code, two check digits, the national account number; the MOD
 * 97-10 check of ISO/IEC 7064) and the details written beside a card number: its expiry date and
 * security code. Rules are documented on {@link PiiMasker}.
 */
final class PiiBank {
  /** The longest IBAN: 34 letters and digits. */
  static final int MAX_IBAN = 34;

  /** A month and a year: 12/28, 12/2028, 1-28, 03.27. */
  private static final String EXPIRY = "(?:0?[1-9]|1[0-2])[ ]?[/\\-.][ ]?(?:20[0-9]{2}|[0-9]{2})";

  /** "exp 12/28", "valid thru 12/28", "expiry date: 03/2027". */
  private static final Pattern EXPIRY_CUE =
      Pattern.compile(
          "(?i)(?<![\\p{L}])(?:exp(?:iry|ires|iration|iring)?|valid[ ]{1,3}(?:thru|through|until|till|to)"
              + "|good[ ]{1,3}thru|ablaufdatum|g[üu]ltig[ ]{1,3}bis|caducidad|vencimiento|scadenza"
              + "|vervaldatum)(?![\\p{L}])\\.?(?:[ ]{0,3}(?:date|is|was|on|:|-))*+[ ]{0,3}(?<v>"
              + EXPIRY
              + ")(?![\\p{N}])");

  /** "CVV 123", "security code: 1234", "CVC2 123". */
  private static final Pattern CODE_CUE =
      Pattern.compile(
          "(?i)(?<![\\p{L}])(?<cue>cvv2?|cvc2?|cv2|csc|cid|security[ ]{1,3}code|card[ ]{1,3}verification"
              + "(?:[ ]{1,3}(?:code|value|number))?|sicherheitscode|prüfnummer|kartenprüfnummer"
              + "|cryptogramme)(?![\\p{L}])(?:[ ]{0,3}(?:is|was|number|no\\.?|code|:|-|#))*+[ ]{0,3}"
              + "(?<v>[0-9]{3,4})(?![\\p{N}])");

  /**
   * What may follow a card number and belongs to it: expiry and security code, cue words between.
   */
  private static final Pattern BESIDE_CARD =
      Pattern.compile(
          "(?i)(?:[ ,;/|]{1,3}(?:(?:exp(?:iry|ires|iration)?|valid[ ]{1,3}(?:thru|through|until|to)"
              + "|cvv2?|cvc2?|cv2|csc|security[ ]{1,3}code|code|and)\\.?(?:[ ]{0,3}(?:date|is|:|-))*+"
              + "[ ]{0,3})?(?:"
              + EXPIRY
              + "|[0-9]{3,4})(?![\\p{N}/\\-.][0-9]|[\\p{L}\\p{N}])){1,2}");

  /** Words that, shortly before an expiry or "security code", say a card is meant. */
  private static final String[] CARD_WORDS = {
    "card",
    "visa",
    "mastercard",
    "amex",
    "credit",
    "debit",
    "maestro",
    "cc",
    "karte",
    "carte",
    "tarjeta",
    "carta",
    "kaart"
  };

  private PiiBank() {}

  // ---- IBAN ----

  /** Adds every IBAN whose length fits its country and whose check digits pass MOD 97-10. */
  static void ibans(String text, List<PiiSpan> out) {
    int n = text.length();
    for (int i = 0; i + 4 <= n; i++) {
      if (!isAsciiLetter(text.charAt(i))
          || !isAsciiLetter(text.charAt(i + 1))
          || !isAsciiDigit(text.charAt(i + 2))
          || !isAsciiDigit(text.charAt(i + 3))
          || PiiChars.isWordCharBefore(text, i)) {
        continue;
      }
      String country = text.substring(i, i + 2).toUpperCase(java.util.Locale.ROOT);
      Integer length = PiiLexicon.IBAN_LENGTHS.get(country);
      if (length == null) {
        continue;
      }
      int end = ibanEnd(text, i, length);
      if (end > 0) {
        out.add(new PiiSpan(PiiType.IBAN, i, end));
        i = end - 1;
      }
    }
  }

  /**
   * Where an IBAN of {@code length} characters starting at {@code start} ends, or -1: letters and
   * digits, grouped by single spaces or hyphens or not at all, ending at a group's end, passing the
   * check.
   */
  static int ibanEnd(String text, int start, int length) {
    int n = text.length();
    char[] chars = new char[length];
    int k = 0;
    int p = start;
    while (k < length && p < n) {
      char c = text.charAt(p);
      if (isAsciiLetter(c) || isAsciiDigit(c)) {
        chars[k++] = c;
        p++;
      } else if ((c == ' ' || c == '-' || c == '\u00a0')
          && k >= 2
          && p + 1 < n
          && (isAsciiLetter(text.charAt(p + 1)) || isAsciiDigit(text.charAt(p + 1)))) {
        p++;
      } else {
        break;
      }
    }
    if (k < length || PiiChars.isWordCharAt(text, p)) {
      return -1;
    }
    return isValidIban(new String(chars)) ? p : -1;
  }

  /**
   * The ISO 13616 check: the first four characters moved to the end, letters read as 10–35, the
   * whole number modulo 97 is 1 (ISO/IEC 7064, MOD 97-10).
   */
  static boolean isValidIban(String compact) {
    int n = compact.length();
    if (n < 5 || n > MAX_IBAN) {
      return false;
    }
    int remainder = 0;
    for (int k = 0; k < n; k++) {
      char c = compact.charAt((k + 4) % n);
      int v;
      if (isAsciiDigit(c)) {
        v = c - '0';
        remainder = (remainder * 10 + v) % 97;
      } else if (isAsciiLetter(c)) {
        v = Character.toUpperCase(c) - 'A' + 10;
        remainder = (remainder * 100 + v) % 97;
      } else {
        return false;
      }
    }
    return remainder == 1;
  }

  private static boolean isAsciiLetter(char c) {
    return (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z');
  }

  private static boolean isAsciiDigit(char c) {
    return c >= '0' && c <= '9';
  }

  // ---- card details ----

  /**
   * Extends each card number already found over the expiry and security code written right after it
   * ("4111 1111 1111 1111 exp 12/28 cvv 123"), and adds expiry dates and security codes written
   * after their cue near a card word ("card … exp 12/28", "CVV: 123").
   */
  static void cardDetails(String text, boolean cues, List<PiiSpan> out) {
    int found = out.size();
    for (int i = 0; i < found; i++) {
      PiiSpan s = out.get(i);
      if (s.type() != PiiType.CARD) {
        continue;
      }
      Matcher m = BESIDE_CARD.matcher(text);
      m.region(s.end(), text.length());
      m.useTransparentBounds(true);
      if (m.lookingAt()) {
        out.set(i, new PiiSpan(PiiType.CARD, s.start(), m.end()));
      }
    }
    if (!cues) {
      return;
    }
    Matcher e = EXPIRY_CUE.matcher(text);
    while (e.find()) {
      if (cardNear(text, e.start(), out, found)) {
        out.add(new PiiSpan(PiiType.CARD, e.start("v"), e.end("v")));
      }
    }
    Matcher c = CODE_CUE.matcher(text);
    while (c.find()) {
      String cue = c.group("cue");
      boolean cardOnly =
          !cue.regionMatches(true, 0, "security", 0, 8) && !cue.equalsIgnoreCase("cid");
      if (cardOnly || cardNear(text, c.start(), out, found)) {
        out.add(new PiiSpan(PiiType.CARD, c.start("v"), c.end("v")));
      }
    }
    Matcher far = CODE_WORD.matcher(text);
    while (far.find()) {
      // "security code on the back of my debit card is 613": the code a little further on
      int v = codeAfter(text, far.end(), Math.min(text.length(), far.end() + CODE_REACH));
      if (v >= 0 && cardNear(text, far.start(), out, found)) {
        out.add(new PiiSpan(PiiType.CARD, v, v + digitsAt(text, v)));
      }
    }
  }

  /** A security-code cue not followed by its code, for a code written a little further on. */
  private static final Pattern CODE_WORD =
      Pattern.compile(
          "(?i)(?<![\\p{L}])(?:cvv2?|cvc2?|cv2|csc|security[ ]{1,3}code|card[ ]{1,3}verification"
              + "(?:[ ]{1,3}(?:code|value|number))?)(?![\\p{L}])(?![ ]{0,3}(?:is|:|-)?[ ]{0,3}[0-9])");

  /** How far after a security-code cue its code is looked for. */
  private static final int CODE_REACH = 48;

  /** Kinds of card that are not payment cards: their expiry is no card detail. */
  private static final String[] OTHER_CARDS = {
    "gift",
    "loyalty",
    "reward",
    "membership",
    "member",
    "store",
    "sim",
    "sd",
    "memory",
    "business",
    "warranty",
    "greeting",
    "birthday",
    "guarantee",
    "id",
    "club",
    "bonus",
    "customer",
    "discount"
  };

  /**
   * Where the first lone 3- or 4-digit number in {@code [from, to)} starts, in the same sentence,
   * or -1.
   */
  private static int codeAfter(String text, int from, int to) {
    for (int i = from; i < to; i++) {
      char c = text.charAt(i);
      if (c == '.' || c == '!' || c == '?' || c == '\n') {
        return -1;
      }
      if (isAsciiDigit(c) && !PiiChars.isWordCharBefore(text, i)) {
        int d = digitsAt(text, i);
        if ((d == 3 || d == 4) && !PiiChars.isWordCharAt(text, i + d)) {
          return i;
        }
        i += d;
      }
    }
    return -1;
  }

  private static int digitsAt(String text, int i) {
    int e = i;
    while (e < text.length() && isAsciiDigit(text.charAt(e))) {
      e++;
    }
    return e - i;
  }

  /**
   * A card number in the 60 characters before {@code s}, or a payment-card word in the 60
   * characters before or the 40 after it ("Exp. 07/29 on my Mastercard").
   */
  private static boolean cardNear(String text, int s, List<PiiSpan> out, int found) {
    for (int i = 0; i < found; i++) {
      PiiSpan p = out.get(i);
      if (p.type() == PiiType.CARD && p.end() <= s && s - p.end() <= 60) {
        return true;
      }
    }
    int from = Math.max(0, s - 60);
    int to = Math.min(text.length(), s + 40);
    return PiiChars.hasWordStartingWith(text, from, to, CARD_WORDS)
        && !PiiChars.hasWordStartingWith(text, from, to, OTHER_CARDS);
  }
}
