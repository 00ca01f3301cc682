package riffle.text;

import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import riffle.model.PiiType;

/**
 * Finds postal addresses (house number and street, PO boxes, with what follows: flat, town, region,
 * postcode, country) and postcodes standing on their own. The rules and their sources are
 * documented on {@link PiiMasker}; the street words are in {@code
 * riffle/words/any/pii-streets-*.txt}.
 *
 * <p>Postcode shapes (written from memory of each operator's published format, not copied from it):
 * Royal Mail's PAF (UK: outward code A9, A99, AA9, AA99, A9A or AA9A, a space, inward code 9AA,
 * where the inward letters are never C, I, K, M, O or V); USPS Publication 28 (US: ZIP 99999 and
 * ZIP+4 99999-9999, after a two-letter state); Canada Post (A9A 9A9 without D, F, I, O, Q, U, and
 * no W or Z first); PostNL (9999 AA, never SA, SD or SS); Deutsche Post, La Poste, Correos and
 * Poste Italiane (five digits); Australia Post (four digits after a state: NSW, VIC, QLD, WA, SA,
 * TAS, ACT, NT).
 *
 * <p>Size: one class holds the address rules because they read one another's matches (a street line
 * takes the town, region and postcode after it); about a third of its lines are the postcode
 * shapes, one short method per operator's format.
 */
final class PiiPostal {
  private static final String SP = "[ \\u00a0]{1,2}";

  /** A capitalised word ("Baker", "O'Connell", "Saint-Honoré"). */
  private static final String CAPW = "\\p{Lu}[\\p{L}\\p{M}]*+(?:['’\\-]\\p{L}[\\p{L}\\p{M}]*+)*+";

  /** A word in any case (after an address cue). */
  private static final String ANYW = "\\p{L}[\\p{L}\\p{M}]*+(?:['’\\-]\\p{L}[\\p{L}\\p{M}]*+)*+";

  /** An ordinal street name: 5th, 42nd. */
  private static final String ORD = "\\d{1,3}(?:st|nd|rd|th)";

  /** A house number: 12, 221B, 12-14, 7/2. */
  private static final String NUM =
      "\\d{1,5}(?:[A-Za-z](?![\\p{L}\\p{N}]))?(?:[-–/]\\d{1,5}(?:[A-Za-z](?![\\p{L}\\p{N}]))?)?";

  /** A house number after the street: 12, 12a, 12 b, 5-7. */
  private static final String NUM_AFTER =
      "\\d{1,4}(?:[ ]?[A-Za-z](?![\\p{L}\\p{N}]))?(?:[-/]\\d{1,4}(?:[A-Za-z](?![\\p{L}\\p{N}]))?)?"
          + "(?![\\p{L}\\p{N}])";

  private static final String PARTICLE =
      "(?:de|du|des|la|le|les|del|della|di|da|van|von|der|den|sur|en|aux|au|y|do|dos|das|los|las"
          + "|el)";

  private static final String LEFT = "(?<![\\p{L}\\p{N}\\p{M}\\-/.,])";

  private static final String RIGHT = "(?![\\p{L}\\p{N}\\p{M}])";

  /** English order: number, one to four name words, street word (capitalised). */
  private static final Pattern NUMBER_FIRST =
      Pattern.compile(
          LEFT
              + NUM
              + ",?"
              + SP
              + "(?:(?:"
              + CAPW
              + "|"
              + ORD
              + ")\\.?"
              + SP
              + "){1,4}(?=\\p{Lu})(?i:(?<after>"
              + PiiLexicon.alternation(PiiLexicon.StreetKind.AFTER)
              + ")|(?<weak>"
              + PiiLexicon.alternation(PiiLexicon.StreetKind.WEAK)
              + "))\\.?"
              + RIGHT);

  /** The same after an address cue, in any case. */
  private static final Pattern NUMBER_FIRST_ANY_CASE =
      Pattern.compile(
          LEFT
              + NUM
              + ",?"
              + SP
              + "(?<words>(?:(?:"
              + ANYW
              + "|"
              + ORD
              + ")\\.?"
              + SP
              + "){1,4})(?i:(?<after>"
              + PiiLexicon.alternation(PiiLexicon.StreetKind.AFTER)
              + ")|(?<weak>"
              + PiiLexicon.alternation(PiiLexicon.StreetKind.WEAK)
              + "))\\.?"
              + RIGHT);

  /** French order: number, street word, name ("12 rue de la Paix", "3 avenue Victor Hugo"). */
  private static final Pattern NUMBER_STREET_NAME =
      Pattern.compile(
          LEFT
              + "\\d{1,4}(?:[ ]?(?i:bis|ter|[a-z])(?![\\p{L}]))?,?"
              + SP
              + "(?i:"
              + PiiLexicon.alternation(PiiLexicon.StreetKind.FIRST)
              + ")\\.?"
              + SP
              + "(?:(?:"
              + PARTICLE
              + SP
              + "|[dl]['’]))*+"
              + CAPW
              + "(?:"
              + SP
              + "(?:(?:"
              + PARTICLE
              + SP
              + "|[dl]['’]))*+"
              + CAPW
              + "){0,3}+");

  /** Street word first, number after ("Via Roma 12", "Calle Mayor, 5", "C/ Mayor 5"). */
  private static final Pattern STREET_NAME_NUMBER =
      Pattern.compile(
          "(?<![\\p{L}\\p{N}\\p{M}])(?:(?=\\p{Lu})(?i:"
              + PiiLexicon.alternation(PiiLexicon.StreetKind.BEFORE)
              + ")\\.?|C/)"
              + SP
              + "(?:(?:"
              + PARTICLE
              + SP
              + "|[dl]['’]))*+"
              + CAPW
              + "(?:"
              + SP
              + "(?:(?:"
              + PARTICLE
              + SP
              + "|[dl]['’]))*+"
              + CAPW
              + "){0,3}+,?"
              + SP
              + NUM_AFTER);

  /** A compound street word and its number ("Hauptstraße 5", "Kerkstraat 12a"). */
  private static final Pattern COMPOUND_NUMBER =
      Pattern.compile("\\p{L}[\\p{L}\\p{M}\\-]*+\\.?,?" + SP + NUM_AFTER);

  /** PO boxes: "PO Box 1234", "Postfach 10 11 12", "Apartado de correos 27". */
  private static final Pattern PO_BOX =
      Pattern.compile(
          "(?<![\\p{L}\\p{N}])(?i:p\\.?[ ]?o\\.?[ ]?box|post[ ]office[ ]box|gpo[ ]box|locked[ ]bag"
              + "|postfach|postbus|apartado(?:[ ]de[ ]correos)?|casella[ ]postale"
              + "|bo[iî]te[ ]postale)[ ]{0,2}(?:no\\.?[ ]?|#[ ]?)?\\d{1,6}(?:[ ]\\d{2,3}){0,2}"
              + "(?![\\p{L}\\p{N}])");

  /** Flat or unit before the number: "Flat 3, ", "Apt 4B ". */
  private static final Pattern UNIT_BEFORE =
      Pattern.compile(
          "(?i:flat|apt|apartment|unit|suite|ste)\\.?[ ]{1,2}[A-Za-z0-9]{1,5},?[ ]{1,2}$");

  private static final Pattern UNIT_AFTER =
      Pattern.compile(
          ",?"
              + SP
              + "(?:(?i:apt|apartment|unit|suite|ste|flat|fl|floor)\\.?[ ]?|#[ ]?)[A-Za-z0-9]{1,5}"
              + "(?![\\p{L}\\p{N}])");

  private static final Pattern DIRECTION_AFTER =
      Pattern.compile(SP + "(?:NW|NE|SW|SE|N|S|E|W)(?![\\p{L}\\p{N}])");

  private static final String TOWN_WORDS =
      CAPW
          + "(?![\\p{L}\\p{N}])(?:(?:"
          + SP
          + "|-)(?:(?:upon|on|am|an|der|sur|en|de|la|le|les|del|di)(?:"
          + SP
          + "|-))?"
          + CAPW
          + "(?![\\p{L}\\p{N}])){0,2}+";

  private static final Pattern TOWN_AFTER_COMMA =
      Pattern.compile("," + SP + "(?<town>" + TOWN_WORDS + ")");

  private static final Pattern TOWN_NO_COMMA = Pattern.compile(SP + "(?<town>" + TOWN_WORDS + ")");

  private static final String US_STATES =
      "AL|AK|AZ|AR|CA|CO|CT|DE|DC|FL|GA|HI|ID|IL|IN|IA|KS|KY|LA|ME|MD|MA|MI|MN|MS|MO|MT|NE|NV|NH"
          + "|NJ|NM|NY|NC|ND|OH|OK|OR|PA|RI|SC|SD|TN|TX|UT|VT|VA|WA|WV|WI|WY";

  private static final String AU_STATES = "NSW|VIC|QLD|WA|SA|TAS|ACT|NT";

  private static final String CA_PROVINCES = "AB|BC|MB|NB|NL|NS|NT|NU|ON|PE|QC|SK|YT";

  private static final String REGIONS = US_STATES + "|" + AU_STATES + "|" + CA_PROVINCES;

  private static final Pattern REGION =
      Pattern.compile(",?" + SP + "(?:" + REGIONS + ")(?![\\p{L}\\p{N}])");

  private static final Pattern COUNTRY =
      Pattern.compile(
          ",?"
              + SP
              + "(?:United[ ]Kingdom|U\\.?K\\.?|England|Scotland|Wales|Northern[ ]Ireland|U\\.?S\\.?A\\.?"
              + "|United[ ]States|Germany|Deutschland|France|(?:The[ ])?Netherlands|Nederland|Spain"
              + "|España|Italy|Italia|Australia|Canada|Ireland|Belgium|Belgique|België|Austria"
              + "|Österreich|Switzerland|Schweiz|Suisse|Portugal|Sweden|Sverige|Denmark|Danmark"
              + "|Norway|Norge)(?![\\p{L}])");

  private static final String UK =
      "(?:[A-PR-UWYZ](?:[0-9][0-9]?|[A-HK-Y][0-9][0-9]?|[0-9][A-HJKPSTUW]|[A-HK-Y][0-9][ABEHMNPRV-Y])"
          + "[ ]?[0-9][ABD-HJLNP-UW-Z]{2}|GIR[ ]?0AA)";

  private static final String CA =
      "[ABCEGHJ-NPRSTVXY][0-9][ABCEGHJ-NPRSTV-Z][ ]?[0-9][ABCEGHJ-NPRSTV-Z][0-9]";

  private static final String NL = "[1-9][0-9]{3}[ ]?(?!SA|SD|SS)[A-Z]{2}";

  /** Any postcode shape; in an address or after a cue, numeric ones too. */
  private static final String ANY_POSTCODE =
      "(?:(?:D|F|E|I|NL|A|CH|B|L)-)?(?:"
          + UK
          + "|"
          + CA
          + "|"
          + NL
          + "|[0-9]{5}(?:-[0-9]{4})?|[0-9]{4})(?![\\p{L}\\p{N}])";

  private static final Pattern POSTCODE_AFTER =
      Pattern.compile(",?" + SP + "(?<pc>" + ANY_POSTCODE + ")");

  /** Continental order after a street: ", 75002 Paris", ", 1016 GV Amsterdam". */
  private static final Pattern POSTCODE_TOWN =
      Pattern.compile(
          ",?"
              + SP
              + "(?:(?:D|F|E|I|NL|A|CH|B|L)-)?(?:"
              + NL
              + "|[0-9]{4,5})"
              + SP
              + "(?<town>"
              + TOWN_WORDS
              + ")");

  private static final Pattern POSTCODE_CUE =
      Pattern.compile(
          "(?<![\\p{L}])(?:(?i:post[ ]?codes?|postal[ ]codes?|zip(?:[ ]?codes?)?|plz|postleitzahl"
              + "|code[ ]postal|c[óo]digo[ ]postal|postnummer)|CAP)(?![\\p{L}])"
              + "(?:[ ]{0,3}(?i:is|was|:|-|=|of|#))*+[ ]{0,3}(?<pc>(?i:"
              + ANY_POSTCODE.replace("(?![\\p{L}\\p{N}])", "")
              + "))(?![\\p{L}\\p{N}])");

  /**
   * UK and Canadian postcodes are distinctive enough to stand alone (upper case, with space),
   * except an inward code that reads as a size ("M1 8GB").
   */
  private static final Pattern UK_OR_CA =
      Pattern.compile(
          "(?:" + UK.replace("[ ]?", "[ ]") + "(?<![0-9][GTP]B)|" + CA + ")(?![\\p{L}\\p{N}])");

  /** Words that, just before a UK-shaped code, make it a model or part number ("Model SN1 2AB"). */
  private static final String[] MODEL_WORDS = {
    "model", "part", "serial", "sku", "type", "item", "article", "version", "code"
  };

  /** A numeric postcode before its town: "10115 Berlin", "D-10115 Berlin", "1016 GV Amsterdam". */
  private static final Pattern NUMERIC_BEFORE_TOWN =
      Pattern.compile(
          "(?:(?:D|F|E|I|NL|A|CH|B|L)-)?(?:"
              + NL
              + "|[0-9]{5})(?="
              + SP
              + "(?<town>"
              + CAPW
              + "))");

  /**
   * After a state or region, itself after a comma or a town: "Kestrel, IA 50432" (USPS: ZIP after
   * the state), "Wollowra NSW 2317" (Australia Post: four digits after the state), "Elmsford, ON
   * L4T 2K9" (Canada Post: after the province).
   */
  private static final Pattern AFTER_REGION =
      Pattern.compile(
          "(?<=(?:,|\\p{Lu}\\p{Ll}{1,30})[ ]{1,2})(?:(?:"
              + US_STATES
              + ")"
              + SP
              + "(?<zip>[0-9]{5}(?:-[0-9]{4})?)|(?:"
              + AU_STATES
              + ")"
              + SP
              + "(?<au>[0-9]{4})|(?:"
              + CA_PROVINCES
              + ")"
              + SP
              + "(?<ca>"
              + CA
              + "))(?![\\p{L}\\p{N}])");

  /** Cue phrases after which an address may be written in lower case. */
  private static final Pattern PLACE_CUE =
      Pattern.compile(
          "(?i)(?<![\\p{L}])(?:(?:live|living|lives|lived|reside|resides|based|located)[ ]{1,3}(?:at|in|on)"
              + "|(?:my|our|the|home|delivery|shipping|postal|billing|new)[ ]{1,3}address(?:[ ]{1,3}(?:is|was))?"
              + "|address[ ]{0,3}:|(?:deliver|delivered|delivering|ship|shipped|shipping|send|sent|moved)"
              + "[ ]{1,3}(?:it[ ]{1,3}|them[ ]{1,3})?(?:to|at)|delivery[ ]{1,3}to"
              + "|wohne[ ]{1,3}in|j['’]habite(?:[ ]{1,3}au)?|vivo[ ]{1,3}en|abito[ ]{1,3}in|woon[ ]{1,3}op)"
              + "(?![\\p{L}])");

  /** Street words that are abbreviations and may take a dot ("St.", "Rd."). */
  private static final java.util.Set<String> ABBREVIATIONS =
      java.util.Set.of(
          "st", "rd", "ave", "av", "ln", "dr", "blvd", "cres", "tce", "gdns", "pkwy", "hwy", "tpke",
          "ct", "pl", "sq", "cir");

  /** Words that never stand inside a street name written in lower case. */
  private static final java.util.Set<String> GLUE =
      java.util.Set.of(
          "and", "or", "but", "the", "a", "an", "of", "to", "in", "on", "at", "with", "for", "from",
          "by", "is", "was", "are", "were", "it", "my", "our", "your", "their", "his", "her", "me",
          "we", "i", "you", "they", "that", "this", "which", "so", "then", "days", "weeks");

  private PiiPostal() {}

  /**
   * Adds every address the cues point at; a street found once in the answer is an address wherever
   * else a house number stands before it ("… 4 Thistle Court … but it was 40 Thistle Court").
   */
  static void addresses(String text, PiiLexicon.Cues cues, List<PiiSpan> out) {
    boolean place = cues.has(PiiLexicon.PLACE);
    int[] placeEnds = place ? placeCueEnds(text) : new int[0];
    if (cues.has(PiiLexicon.STREET)) {
      java.util.Set<String> streets = new java.util.LinkedHashSet<>();
      for (int k = 0; k < cues.streetCount; k++) {
        int ws = cues.streets[k * 2];
        int we = cues.streets[k * 2 + 1];
        street(text, ws, we, placeEnds, out, streets);
      }
      for (String street : streets) {
        again(text, street, out);
      }
    }
    if (cues.has(PiiLexicon.POBOX)) {
      Matcher m = PO_BOX.matcher(text);
      while (m.find()) {
        out.add(new PiiSpan(PiiType.ADDRESS, m.start(), tail(text, m.end()).end));
      }
    }
  }

  /** The address around one street word at {@code [ws, we)}, when there is one. */
  private static void street(
      String text,
      int ws,
      int we,
      int[] placeEnds,
      List<PiiSpan> out,
      java.util.Set<String> streets) {
    String word = text.substring(ws, we).toLowerCase(Locale.ROOT);
    int n = text.length();
    boolean after = PiiLexicon.isStreet(PiiLexicon.StreetKind.AFTER, word);
    boolean weak = PiiLexicon.isStreet(PiiLexicon.StreetKind.WEAK, word);
    if (after || weak) {
      // the number stands up to five words before the street word
      boolean cue = cueBefore(placeEnds, ws);
      Matcher m = (cue ? NUMBER_FIRST_ANY_CASE : NUMBER_FIRST).matcher(text);
      m.useTransparentBounds(true);
      int limit = Math.min(n, we + 1);
      int from = Math.max(0, ws - 90);
      while (from < ws) {
        m.region(from, limit);
        if (!m.find() || m.start() >= ws) {
          break;
        }
        from = m.start() + 1;
        if (m.end() < we || (cue && !plainWords(m.group("words"))) || nounAfter(text, m.end())) {
          continue;
        }
        int end = m.end();
        String streetWord = m.group("after") != null ? m.group("after") : m.group("weak");
        if (text.charAt(end - 1) == '.'
            && !ABBREVIATIONS.contains(streetWord.toLowerCase(Locale.ROOT))) {
          end--; // "Quillon Street." ends a sentence; "Elm St." is abbreviated
        }
        Tail t = tail(text, end);
        if (m.group("after") != null || t.extended || cue) {
          out.add(new PiiSpan(PiiType.ADDRESS, unitStart(text, m.start()), t.end));
          int name = m.start();
          while (name < m.end() && !PiiChars.isInlineSpace(text.charAt(name))) {
            name++;
          }
          streets.add(text.substring(name, end).strip());
        }
        break;
      }
    }
    if (PiiLexicon.isStreet(PiiLexicon.StreetKind.FIRST, word)) {
      Matcher m = NUMBER_STREET_NAME.matcher(text);
      m.useTransparentBounds(true);
      for (int p = Math.max(0, ws - 10); p < ws; p++) {
        if (!PiiChars.isDigitAt(text, p) || PiiChars.isDigitAt(text, p - 1)) {
          continue;
        }
        m.region(p, n);
        if (m.lookingAt() && m.end() > we) {
          out.add(new PiiSpan(PiiType.ADDRESS, unitStart(text, p), tail(text, m.end()).end));
          break;
        }
      }
    }
    if (PiiLexicon.isStreet(PiiLexicon.StreetKind.BEFORE, word)
        || (ws + 1 < n && text.startsWith("C/", ws))) {
      Matcher m = STREET_NAME_NUMBER.matcher(text);
      m.region(ws, n);
      m.useTransparentBounds(true);
      if (m.lookingAt()) {
        out.add(new PiiSpan(PiiType.ADDRESS, ws, tail(text, m.end()).end));
      }
    }
    if (PiiLexicon.compoundEnd(text, ws, we) > 0 && Character.isUpperCase(text.codePointAt(ws))) {
      Matcher m = COMPOUND_NUMBER.matcher(text);
      m.region(ws, n);
      m.useTransparentBounds(true);
      if (m.lookingAt() && !isYear(text, m.end())) {
        out.add(new PiiSpan(PiiType.ADDRESS, ws, tail(text, m.end()).end));
      }
    }
  }

  /** Adds "NUMBER street" wherever else {@code street} stands after a house number. */
  private static void again(String text, String street, List<PiiSpan> out) {
    int at = -1;
    while ((at = text.indexOf(street, at + 1)) >= 0) {
      int e = at + street.length();
      if (PiiChars.isWordCharAt(text, e)) {
        continue;
      }
      int p = at;
      while (p > 0 && PiiChars.isInlineSpace(text.charAt(p - 1)) && at - p < 2) {
        p--;
      }
      if (p > 0
          && Character.isLetter(text.charAt(p - 1))
          && p - 1 > 0
          && PiiChars.isDigitAt(text, p - 2)) {
        p--; // "40b"
      }
      int d = p;
      while (d > 0 && PiiChars.isDigitAt(text, d - 1) && p - d < 5) {
        d--;
      }
      if (d < p && p < at && !PiiChars.isWordCharBefore(text, d)) {
        out.add(new PiiSpan(PiiType.ADDRESS, d, tail(text, e).end));
      }
    }
  }

  /**
   * Whether the number just before {@code e} is a year (1900–2099): "Spring 2026" is no address.
   */
  private static boolean isYear(String text, int e) {
    int s = e;
    while (s > 0 && PiiChars.isDigit(text.charAt(s - 1))) {
      s--;
    }
    if (e - s != 4) {
      return false;
    }
    int v = Integer.parseInt(text.substring(s, e));
    return v >= 1900 && v <= 2099;
  }

  /**
   * Whether a lower-case common noun follows the street word, which makes it a modifier: "12 Oak
   * Road bikes", "2 Street food vans".
   */
  private static boolean nounAfter(String text, int e) {
    int p = e;
    if (p >= text.length() || !PiiChars.isInlineSpace(text.charAt(p))) {
      return false;
    }
    p++;
    int q = p;
    while (q < text.length() && Character.isLowerCase(text.charAt(q))) {
      q++;
    }
    if (q == p || PiiChars.isWordCharAt(text, q)) {
      return false;
    }
    return PiiNameCheck.isNounOnly(text.substring(p, q));
  }

  /** Words of a lower-case street name: none of them a joining word ("12 and the road"). */
  private static boolean plainWords(String words) {
    for (String w : words.strip().split("[ \\u00a0.]+")) {
      if (GLUE.contains(w.toLowerCase(Locale.ROOT))) {
        return false;
      }
    }
    return true;
  }

  private static int[] placeCueEnds(String text) {
    Matcher m = PLACE_CUE.matcher(text);
    int[] ends = new int[4];
    int k = 0;
    while (m.find()) {
      if (k == ends.length) {
        ends = java.util.Arrays.copyOf(ends, k * 2);
      }
      ends[k++] = m.end();
    }
    return java.util.Arrays.copyOf(ends, k);
  }

  /** Whether an address cue ends in the 60 characters before {@code s}. */
  private static boolean cueBefore(int[] cueEnds, int s) {
    for (int e : cueEnds) {
      if (e <= s && s - e <= 60) {
        return true;
      }
    }
    return false;
  }

  /** Where a flat or unit written before the house number starts ("Flat 3, 12 Oak Road"). */
  private static int unitStart(String text, int s) {
    int from = Math.max(0, s - 24);
    Matcher m = UNIT_BEFORE.matcher(text);
    m.region(from, s);
    m.useTransparentBounds(true);
    for (int i = from; i < s; i++) {
      m.region(i, s);
      if (m.lookingAt() && !PiiChars.isWordCharBefore(text, i)) {
        return i;
      }
    }
    return s;
  }

  /** The end of an address after its street, and whether anything was added. */
  private record Tail(int end, boolean extended) {}

  /**
   * Extends an address over what may follow its street: flat or unit, direction ("NW"), then either
   * postcode and town (continental order) or town, region and postcode (English order), then a
   * country.
   */
  private static Tail tail(String text, int end) {
    int e = end;
    for (int round = 0; round < 2; round++) {
      e = extend(text, e, DIRECTION_AFTER);
      e = extend(text, e, UNIT_AFTER);
    }
    int continental = townAfter(text, e, POSTCODE_TOWN);
    if (continental > e) {
      e = continental;
    } else {
      int town = townAfter(text, e, TOWN_AFTER_COMMA);
      int region = extend(text, town, REGION);
      int postcode = extend(text, region, POSTCODE_AFTER);
      if (town == e && region == e && postcode == e) {
        // a town without a comma counts only before a region or a postcode: "London NW1 6XE"
        int bare = townAfter(text, e, TOWN_NO_COMMA);
        if (bare > e) {
          int r = extend(text, bare, REGION);
          int p = extend(text, r, POSTCODE_AFTER);
          if (p > r || r > bare) {
            postcode = p;
          }
        }
      }
      e = Math.max(e, postcode);
    }
    if (e > end) {
      e = extend(text, e, COUNTRY);
    }
    return new Tail(e, e > end);
  }

  private static int extend(String text, int at, Pattern p) {
    if (at >= text.length() || !startsTail(text.charAt(at))) {
      return at;
    }
    Matcher m = p.matcher(text);
    m.region(at, text.length());
    m.useTransparentBounds(true);
    return m.lookingAt() ? m.end() : at;
  }

  /** Every part after a street starts with a comma or a space. */
  private static boolean startsTail(char c) {
    return c == ',' || c == ' ' || c == '\u00a0';
  }

  /** Like {@link #extend}, but the town's first word must not be a common word ("Great"). */
  private static int townAfter(String text, int at, Pattern p) {
    if (at >= text.length() || !startsTail(text.charAt(at))) {
      return at;
    }
    Matcher m = p.matcher(text);
    m.region(at, text.length());
    m.useTransparentBounds(true);
    if (!m.lookingAt()) {
      return at;
    }
    String town = m.group("town");
    int space = town.indexOf(' ');
    String first = (space < 0 ? town : town.substring(0, space)).toLowerCase(Locale.ROOT);
    if (PiiLexicon.NOT_NAMES.contains(first)
        || first.length() < 2
        || PiiNameCheck.isCommonWord(space < 0 ? town : town.substring(0, space))) {
      return at;
    }
    return m.end();
  }

  // ---- postcodes on their own ----

  /**
   * Adds postcodes after a cue, after a state, before a town, and the distinctive UK and Canadian
   * shapes.
   */
  static void postcodes(String text, PiiLexicon.Cues cues, List<PiiSpan> out) {
    if (cues.has(PiiLexicon.POSTCODE) || text.contains("CAP")) {
      Matcher m = POSTCODE_CUE.matcher(text);
      while (m.find()) {
        out.add(new PiiSpan(PiiType.POSTCODE, m.start("pc"), m.end("pc")));
      }
    }
    int n = text.length();
    Matcher uk = null;
    Matcher town = null;
    Matcher region = null;
    for (int i = 0; i < n; i++) {
      char c = text.charAt(i);
      boolean upper = c >= 'A' && c <= 'Z';
      boolean digit = c >= '0' && c <= '9';
      if (!upper && !digit || PiiChars.isWordCharBefore(text, i)) {
        continue;
      }
      if (upper && i + 2 < n) {
        if (PiiChars.isDigitAt(text, i + 1) || PiiChars.isDigitAt(text, i + 2)) {
          uk = uk == null ? transparent(UK_OR_CA, text) : uk;
          uk.region(i, n);
          if (uk.lookingAt() && !PiiChars.hasWordStartingWith(text, i - 16, i, MODEL_WORDS)) {
            out.add(new PiiSpan(PiiType.POSTCODE, i, uk.end()));
            continue;
          }
        }
        boolean prefix =
            i + 1 < n && text.charAt(i + 1) == '-' && "DFEIABL".indexOf(c) >= 0
                || text.startsWith("NL-", i)
                || text.startsWith("CH-", i);
        if (prefix) {
          town = town == null ? transparent(NUMERIC_BEFORE_TOWN, text) : town;
          town.region(i, n);
          if (town.lookingAt() && plausibleTown(text, town.start("town"), town.end("town"))) {
            out.add(new PiiSpan(PiiType.POSTCODE, i, town.end()));
          }
          continue;
        }
        boolean code =
            i + 3 < n
                && text.charAt(i + 1) >= 'A'
                && text.charAt(i + 1) <= 'Z'
                && (text.charAt(i + 2) == ' ' || i + 4 < n && text.charAt(i + 3) == ' ')
                && i >= 2
                && text.charAt(i - 1) == ' ';
        if (code) {
          region = region == null ? transparent(AFTER_REGION, text) : region;
          region.region(i, n);
          if (region.lookingAt()) {
            String g =
                region.group("zip") != null ? "zip" : region.group("au") != null ? "au" : "ca";
            out.add(new PiiSpan(PiiType.POSTCODE, region.start(g), region.end(g)));
          }
        }
      } else if (digit && startsNumber(text, i) && digitsThenTown(text, i)) {
        town = town == null ? transparent(NUMERIC_BEFORE_TOWN, text) : town;
        town.region(i, n);
        if (town.lookingAt() && plausibleTown(text, town.start("town"), town.end("town"))) {
          out.add(new PiiSpan(PiiType.POSTCODE, i, town.end()));
        }
      }
    }
  }

  private static Matcher transparent(Pattern p, String text) {
    Matcher m = p.matcher(text);
    m.useTransparentBounds(true);
    return m;
  }

  /** Four or five digits, a space (and for four, two capitals): the shape before a town. */
  private static boolean digitsThenTown(String text, int i) {
    int e = i;
    while (e < text.length() && e - i < 6 && PiiChars.isDigitAt(text, e)) {
      e++;
    }
    int d = e - i;
    return (d == 4 || d == 5) && e < text.length() && PiiChars.isInlineSpace(text.charAt(e));
  }

  /** A number not glued to a price, a decimal or a list ("€10115", "1.10115", "3,10115"). */
  private static boolean startsNumber(String text, int i) {
    if (i == 0) {
      return true;
    }
    char p = text.charAt(i - 1);
    if ("€$£¥#.,/-+".indexOf(p) >= 0) {
      return false;
    }
    int q = i - 1;
    while (q >= 0 && PiiChars.isInlineSpace(text.charAt(q))) {
      q--;
    }
    return q < 0 || "€$£¥".indexOf(text.charAt(q)) < 0;
  }

  /**
   * A town after a postcode: not a common word, a unit or a currency ("10115 Euro", "12000
   * Reviews").
   */
  private static boolean plausibleTown(String text, int s, int e) {
    String w = text.substring(s, e).toLowerCase(Locale.ROOT);
    return w.length() >= 2
        && !PiiLexicon.NOT_NAMES.contains(w)
        && !PiiNumbers.isUnitWord(w)
        && !NOT_TOWNS.contains(w)
        && !PiiNameCheck.isCommonWord(text.substring(s, e));
  }

  /** Capitalised words that follow a number and are no town. */
  private static final java.util.Set<String> NOT_TOWNS =
      java.util.Set.of(
          "euro",
          "euros",
          "eur",
          "dollars",
          "pounds",
          "watts",
          "watt",
          "volts",
          "reviews",
          "orders",
          "units",
          "items",
          "pieces",
          "points",
          "stars",
          "customers",
          "users",
          "views",
          "miles",
          "steps",
          "calories",
          "bar",
          "series",
          "edition",
          "model",
          "models",
          "pro",
          "plus",
          "max",
          "mini",
          "mk",
          "version",
          "rpm",
          "psi",
          "kg",
          "mm");
}
