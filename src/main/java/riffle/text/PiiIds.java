package riffle.text;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import riffle.model.PiiType;

/**
 * Finds national identity, tax and insurance numbers (after their cue, or in a shape that carries
 * its own check), and licence plates after their cue. Rules are documented on {@link PiiMasker}.
 */
final class PiiIds {
  /** What may come between a cue and its value: "is", ":", "#", "no.", "number". */
  private static final String FILLER =
      "(?:[ ]{0,3}(?i:is|was|:|#|-|=|no\\.?|nr\\.?|number|num))*+[ ]{0,3}";

  /**
   * Cues of identity numbers. Abbreviations that are also words in a language Riffle reads ("sin",
   * "nie", "tin") count only in capitals.
   */
  private static final Pattern ID_CUE =
      Pattern.compile(
          "(?<![\\p{L}\\p{N}])(?<!(?i:order|customer|account|member|booking|ticket|user|transaction"
              + "|tracking|invoice)[ ]{1,2})(?:(?i:ssn|ss#|ss[ ]no|social[ ]{1,3}security(?:[ ]{1,3}(?:number|no|#))?"
              + "|social[ ]{1,3}insurance[ ]{1,3}(?:number|no)|ni[ ]{1,3}(?:number|no)"
              + "|national[ ]{1,3}insurance(?:[ ]{1,3}(?:number|no))?|nino"
              + "|national[ ]{1,3}id(?:entity)?(?:[ ]{1,3}(?:card|number|no))*|id[ ]{1,3}(?:card[ ]{1,3})?(?:number|no)"
              + "|identity[ ]{1,3}(?:card[ ]{1,3})?(?:number|no)|passport(?:[ ]{1,3}(?:number|no))?"
              + "|driv(?:ing|er['’]?s|ers|er)[ ]{1,3}licen[cs]e(?:[ ]{1,3}(?:number|no))?"
              + "|licen[cs]e[ ]{1,3}(?:number|no)|tax[ ]{1,3}(?:id|number|no|file[ ]{1,3}number|code)"
              + "|steuer-?id|steuer(?:identifikations)?nummer|personalausweis(?:nummer)?|ausweisnummer"
              + "|sozialversicherungsnummer|bsn|burgerservicenummer|dni|num[ée]ro[ ]{1,3}de[ ]{1,3}s[ée]curit[ée]"
              + "[ ]{1,3}sociale|codice[ ]{1,3}fiscale|pps(?:[ ]{1,3}(?:number|no))?|medicare(?:[ ]{1,3}(?:number|no))?"
              + "|nhs[ ]{1,3}(?:number|no))|SIN|NIE|NIF|NIR|TIN|TFN|INSEE)(?![\\p{L}])\\.?"
              + FILLER);

  /** Cues of licence plates. */
  private static final Pattern PLATE_CUE =
      Pattern.compile(
          "(?i)(?<![\\p{L}\\p{N}])(?:(?:car|vehicle|van)[ ]{1,3}reg(?:istration)?(?:[ ]{1,3}(?:plate|mark))?"
              + "|reg(?:istration)?[ ]{1,3}(?:plate|mark|no|number)|reg|registration|rego"
              + "|(?:number|licen[cs]e)[ ]{1,3}plate|plate[ ]{1,3}(?:number|no)|kennzeichen"
              + "|immatriculation|plaque(?:[ ]{1,3}d['’]immatriculation)?|matr[ií]cula|targa|kenteken"
              + "|nummerplaat)(?![\\p{L}])\\.?"
              + FILLER);

  /** US Social Security number with hyphens (an area of 000, 666 or 9xx is never issued). */
  private static final Pattern SSN =
      Pattern.compile(
          "(?<![\\p{L}\\p{N}\\-])(?!000|666|9)[0-9]{3}-(?!00)[0-9]{2}-(?!0000)[0-9]{4}(?![\\p{N}\\-]|[\\p{L}])");

  /** UK National Insurance number (HMRC's prefix rules; the suffix is A–D). */
  private static final Pattern NINO =
      Pattern.compile(
          "(?<![\\p{L}\\p{N}])(?!BG|GB|KN|NK|NT|TN|ZZ)[A-CEGHJ-PR-TW-Z][A-CEGHJ-NPR-TW-Z]"
              + "(?:[0-9]{6}|[ ][0-9]{2}[ ][0-9]{2}[ ][0-9]{2}[ ]?)[A-D](?![\\p{L}\\p{N}])");

  /** Spanish DNI and NIE: eight digits (or X, Y, Z and seven) and a check letter. */
  private static final Pattern DNI =
      Pattern.compile(
          "(?<![\\p{L}\\p{N}])(?<lead>[XYZ])?(?<num>[0-9]{7,8})-?(?<letter>[A-Z])(?![\\p{L}\\p{N}])");

  /**
   * Italian codice fiscale: six letters, two digits, a month letter, two digits, a letter, three
   * digits, a letter.
   */
  private static final Pattern FISCAL =
      Pattern.compile(
          "(?<![\\p{L}\\p{N}])[A-Z]{6}[0-9]{2}[A-EHLMPR-T][0-9]{2}[A-Z][0-9]{3}[A-Z](?![\\p{L}\\p{N}])");

  private static final String DNI_LETTERS = "TRWAGMYFPDXBNJZSQVHLCKE";

  private PiiIds() {}

  /** Adds identity numbers after cues (when {@code cues}) and in their own checked shapes. */
  static void ids(
      String text,
      boolean cues,
      boolean hyphen,
      boolean lettersThenDigit,
      int longestDigitRun,
      List<PiiSpan> out) {
    if (cues) {
      Matcher m = ID_CUE.matcher(text);
      while (m.find()) {
        int e = valueEnd(text, m.end(), false);
        if (e > m.end()) {
          out.add(new PiiSpan(PiiType.ID, m.end(), e));
        }
      }
    }
    if (hyphen) {
      Matcher m = SSN.matcher(text);
      while (m.find()) {
        out.add(new PiiSpan(PiiType.ID, m.start(), m.end()));
      }
    }
    if (lettersThenDigit) {
      Matcher nino = NINO.matcher(text);
      while (nino.find()) {
        out.add(new PiiSpan(PiiType.ID, nino.start(), nino.end()));
      }
      Matcher cf = FISCAL.matcher(text);
      while (cf.find()) {
        out.add(new PiiSpan(PiiType.ID, cf.start(), cf.end()));
      }
    }
    if (longestDigitRun >= 7) {
      Matcher dni = DNI.matcher(text);
      while (dni.find()) {
        if (dniValid(dni.group("lead"), dni.group("num"), dni.group("letter").charAt(0))) {
          out.add(new PiiSpan(PiiType.ID, dni.start(), dni.end()));
        }
      }
    }
  }

  /** The Spanish check letter: the number modulo 23 indexes TRWAGMYFPDXBNJZSQVHLCKE. */
  static boolean dniValid(String lead, String number, char letter) {
    if (lead == null && number.length() != 8 || lead != null && number.length() != 7) {
      return false;
    }
    String digits = (lead == null ? "" : String.valueOf("XYZ".indexOf(lead.charAt(0)))) + number;
    long v = Long.parseLong(digits);
    return DNI_LETTERS.charAt((int) (v % 23)) == letter;
  }

  /** Adds licence plates written after their cue. */
  static void plates(String text, List<PiiSpan> out) {
    Matcher m = PLATE_CUE.matcher(text);
    while (m.find()) {
      int e = valueEnd(text, m.end(), true);
      if (e > m.end()) {
        out.add(new PiiSpan(PiiType.PLATE, m.end(), e));
      }
    }
  }

  /**
   * The end of an identity number or plate starting at {@code p}: groups of letters and digits
   * joined by single spaces, hyphens, dots or slashes. A group counts when it has a digit or is one
   * to three (plates: four) capital letters; a lower-case group of one to three letters counts in a
   * plate after a group of letters and digits ("ab12 cde"). Trailing letter groups are dropped
   * unless one letter follows digits (the suffix of "QQ 12 34 56 C"). An id needs four digits and a
   * plate a digit and a letter, four to ten characters in all; at most 24 characters.
   */
  static int valueEnd(String text, int p, boolean plate) {
    int n = text.length();
    int i = p;
    int end = p;
    int digits = 0;
    int letters = 0;
    int alnum = 0;
    int groups = 0;
    boolean lastHadDigit = false;
    boolean lastMixed = false;
    int endDigits = 0;
    int endLetters = 0;
    int endAlnum = 0;
    while (i < n && groups < (plate ? 3 : 6)) {
      int gs = i;
      int gDigits = 0;
      int gUpper = 0;
      int gLower = 0;
      while (i < n && isAsciiAlnum(text.charAt(i))) {
        char c = text.charAt(i);
        if (c >= '0' && c <= '9') {
          gDigits++;
        } else if (c >= 'A' && c <= 'Z') {
          gUpper++;
        } else {
          gLower++;
        }
        i++;
      }
      int len = i - gs;
      if (len == 0 || PiiChars.isWordCharAt(text, i)) {
        break;
      }
      boolean counts =
          gDigits > 0 && (gLower == 0 || plate || len >= 2)
              || gLower == 0 && gUpper >= 1 && gUpper <= (plate ? 4 : 3)
              || plate && gUpper == 0 && gLower >= 1 && gLower <= 3 && lastMixed;
      if (!counts || alnum + len > 24) {
        break;
      }
      groups++;
      alnum += len;
      digits += gDigits;
      letters += gUpper + gLower;
      boolean suffix = gDigits == 0 && len == 1 && lastHadDigit;
      if (gDigits > 0 || suffix || plate) {
        end = i;
        endDigits = digits;
        endLetters = letters;
        endAlnum = alnum;
      }
      lastHadDigit = gDigits > 0;
      lastMixed = gDigits > 0 && gDigits < len;
      if (i + 1 < n && " -./".indexOf(text.charAt(i)) >= 0 && isAsciiAlnum(text.charAt(i + 1))) {
        i++;
      } else {
        break;
      }
    }
    if (plate) {
      return endDigits >= 1 && endLetters >= 1 && endAlnum >= 4 && endAlnum <= 10 ? end : p;
    }
    return endDigits >= 4 ? end : p;
  }

  private static boolean isAsciiAlnum(char c) {
    return (c >= '0' && c <= '9') || (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z');
  }
}
