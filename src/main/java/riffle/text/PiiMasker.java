package riffle.text;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import riffle.model.PiiMask;
import riffle.model.PiiType;

/**
 * Masks personal data in an answer: each piece found is replaced by its type's placeholder ({@code
 * [email]}, {@code [phone]}, {@code [url]}, {@code [card]}, {@code [reference]}, {@code [handle]},
 * {@code [name]}); every other character is kept exactly as written. Immutable and safe to share
 * between threads; patterns are compiled once.
 *
 * <h2>What is masked</h2>
 *
 * <dl>
 *   <dt>E-mail addresses
 *   <dd>{@code local@host.tld}: a local part of letters, digits, marks and {@code ._%+-} (starting
 *       with a letter or digit), a host of two or more dot-separated labels whose last label is
 *       letters only (two or more) or an IDNA {@code xn--} label. Any case, plus-addressing and
 *       subdomains included; a trailing dot or hyphen is not part of the address. Addresses spelled
 *       out against harvesting are masked too: bracketed forms ({@code jonas [at] example [dot]
 *       com}, {@code jonas(at)example.com}) and {@code jonas@example dot com} always; the
 *       plain-word form {@code jonas at example dot com} only when the local part has a digit or
 *       one of {@code ._%+-}, or a cue word ("mail", "email", "e-mail", "address", "contact",
 *       "reach", "write") stands in the 40 characters before it — so "we found you at ondalune dot
 *       com" stays. Spelled forms need a common top-level domain (com, org, net, edu, gov, info,
 *       biz, io, co, me, example, test and the main European, North American and Australasian
 *       country codes).
 *   <dt>Web addresses
 *   <dd>With a scheme ({@code http://}, {@code https://}, {@code ftp://}), starting {@code www.},
 *       or a bare host name followed by a path ({@code ondalune.example/returns}). A bare host name
 *       without a path ({@code ondalune.example}) is <em>not</em> masked: it names a shop or a site
 *       far more often than a person, and masking it would blank out brand names in quotes; a path
 *       points at a particular page (an order, a profile), so it is masked. The address ends at
 *       white space, a control or format character, {@code <>"}; sentence punctuation and quotes
 *       after it, and a closing bracket it did not open, are left outside.
 *   <dt>Payment-card numbers
 *   <dd>13 to 19 digits passing the Luhn check (ISO/IEC 7812-1), written undivided or in groups of
 *       three or more digits separated by single spaces or hyphens, not starting with 0 (no card
 *       scheme issues numbers starting with 0), not after a {@code +}. Inside a longer run of
 *       groups, the longest card-length stretch that passes is taken ("4111 1111 1111 1111 123"
 *       masks the card and leaves the security code). A number failing Luhn is not a card.
 *   <dt>Phone numbers
 *   <dd>A written number is digit groups joined by single spaces, hyphens or dots, with groups
 *       optionally in parentheses, optionally led by {@code +}; it must not start inside a word or
 *       code ({@code ORD-48213}, {@code v2.1}, {@code JD0146…}; "Tel.", "Mob.", "Ph.", "No.", "Nr."
 *       and "Fax." before a dot are fine), after {@code #@/\=&} or after a thousands comma. Its
 *       last part is left out when it runs straight into {@code %}, {@code °}, {@code /} or {@code
 *       :} and a digit, or a thousands comma ({@code 12%}, {@code 10:30}, {@code 15/03}); when it
 *       runs straight into letters it counts only for a match of the strong kinds below
 *       (international, trunk 0, parentheses, 3-3-4), so {@code 07700900123pls} is masked and
 *       {@code 58mm}, {@code 1920x1080} are not. It is a phone number when it has 7 to 15 digits —
 *       15 is the ITU-T E.164 ceiling; 7 is the shortest subscriber number commonly written (a
 *       local number such as 555-0123), and fewer digits are too often prices, quantities or short
 *       references — at most eight groups and at most two single-digit groups, and it is one of:
 *       <ul>
 *         <li>international: {@code +} then a country code not starting with 0 ({@code +44 7700
 *             900123}, {@code +1 (555) 010-1234}, {@code +44 (0)20 …}, where the {@code (0)} is not
 *             counted), or the {@code 00} exit prefix ({@code 0044 …}, the 00 not counted);
 *         <li>national with a trunk 0 ({@code 07700 900123}, {@code 020 7946 0018}), unless it
 *             reads as a date;
 *         <li>an area code in parentheses ({@code (555) 010-1234});
 *         <li>North American 3-3-4, optionally led by 1 ({@code 555-010-1234}, {@code
 *             555.010.1234}, {@code 1 555 010 1234});
 *         <li>any other grouping of 7 to 15 digits ({@code 555-0123}, {@code 5550101234}) unless it
 *             reads as a number of thousands ({@code 1 299 000}), a list of years ({@code 2019 2020
 *             2021}), a rising range ({@code 1350-1500}), a date, a price (a currency sign or code
 *             just before) or a quantity (a unit such as mm, kg, W, bar, %, days just after);
 *             undivided numbers of 7 to 9 digits here need a phone cue word ("call", "phone",
 *             "tel", "mobile", "number", …) in the 32 characters before them.
 *       </ul>
 *       A 16-digit number, with or without {@code +}, is never a phone number. Dates (2026-03-15,
 *       15.03.2026, 15-03-26; slashes never join a number), decimals (249.99, 9.30), year ranges
 *       (2019-2026) and clock-time spans (09.30-12.30) inside a written number are never part of a
 *       phone number. When a number is not a phone as a whole, a tail of it that starts like one
 *       ({@code 0…}, {@code (…)}) is tried, so "Velle Duo 2 07700 900123" masks only the phone.
 *   <dt>References (order, invoice, tracking)
 *   <dd>Found by regular expressions. The defaults ({@link #standard()}) are: a prefixed code
 *       ({@code ORD}, {@code ORDER}, {@code INV}, {@code RMA}, {@code RET}, {@code REF}, {@code
 *       TRK}, {@code TKT}, any case, then an optional {@code -_#}, at least three digits and up to
 *       three further {@code -} or {@code /} parts: {@code ORD-48213}, {@code INV-2026-0042}); a
 *       cue word (order, invoice, receipt, rma, ticket, reference, ref, booking, confirmation,
 *       tracking, parcel, shipment, consignment, waybill), an optional "no."/"number"/"id"/"code",
 *       an optional ":", "#", "is" or "was", then a code of 4 to 40 letters, digits and inner
 *       hyphens with four digits in a row near its start ({@code order #48213}, {@code order number
 *       is 48213}, {@code tracking JD014600006281}) — only the code is masked, the cue words stay
 *       readable; and a carrier-style code of 10 to 30 upper-case letters and digits with at least
 *       one letter and at least eight digits ({@code 1Z999AA10123456784}, {@code RR123456785GB}).
 *       {@link #withReferencePatterns(List)} replaces all three. A pattern with a group named
 *       {@code ref} masks only that group (when it took part in the match); otherwise the whole
 *       match. Patterns are Java regular expressions used as written (add {@code (?i)} for any
 *       case); empty matches are ignored.
 *   <dt>Handles
 *   <dd>{@code @name} where the {@code @} does not follow a letter, digit or address character (so
 *       never part of an e-mail address) and is followed by a letter or underscore, then letters,
 *       digits, underscores and inner dots: {@code @ondalune_fan}. "@ 5pm" and "@5pm" are not
 *       handles.
 *   <dt>Names
 *   <dd>One or two words after a cue phrase (cue words in any case); a word is letters and marks
 *       with inner apostrophes or hyphens (O'Neill, Anne-Marie); a possessive "'s" is kept out of
 *       the mask. Words in a list of common English words ("Amazing", "Happy", "Help", "the",
 *       weekdays, months, shop words…) are never taken as names.
 *       <ul>
 *         <li>"my name is X" / "my name's X": X is a name whatever its case ("my name is jonas"); a
 *             second word is taken when capitalised, or when both are lower case;
 *         <li>"ask for X", "thanks to X", "thank you to X", "spoke/speak/talked/talk/chatted
 *             to/with X": X capitalised (an initial capital and some lower case), one or two such
 *             words ("ask for Jonas Berg"; "ask for a refund" is left);
 *         <li>"this is X": at the start of the answer or of a sentence (or after a greeting), X
 *             capitalised, not possessive, and followed by the end, punctuation, an emoji, or
 *             "from", "here", "speaking", "again" ("This is Priya from Leeds"; "This is great" and
 *             "This is Ondalune's best machine" are left);
 *         <li>"I'm X" / "I am X": only at the very start of the answer (after an optional greeting
 *             such as "Hi,"), with the same conditions as "this is".
 *       </ul>
 * </dl>
 *
 * <h2>Overlaps</h2>
 *
 * Every detector runs on the whole text; when candidates overlap, the longest wins, and between
 * equally long ones the more specific type, in this order: e-mail, web address, card, reference,
 * phone, handle, name. So an e-mail address inside a web address is masked as part of the web
 * address, a Luhn-valid 15-digit number is a card rather than a phone, and "order number 4821345"
 * masks a reference rather than a phone. Masks never overlap and come sorted by position.
 *
 * <h2>Known limits</h2>
 *
 * <ul>
 *   <li>Names are found only after the cue phrases above; "Marta was super helpful" is not masked.
 *       A shop or product name after a cue ("thanks to Ondalune", "This is Velle.") is masked as a
 *       name, and a capitalised common word missing from the list ("I'm Thrilled.") too. "I'm
 *       Priya" later in an answer, "this is priya" in lower case, and a lower-case surname after a
 *       capitalised first name ("my name is Jonas berg") are not masked.
 *   <li>A phone number glued to the word before it ({@code Tel07700900123}) reads as part of a code
 *       and is not masked.
 *   <li>A phone number written right beside another number with only a space between ("07700 900123
 *       2") is read as one number and masked together; postal codes with 7 or more digits in
 *       phone-like groups (ZIP+4 such as 12345-6789) are masked as phones. A phone number written
 *       as a rising range of two equal-length groups (6123-6789) is not masked.
 *   <li>Card numbers grouped in other ways (groups of one or two digits) are not recognised; about
 *       one in ten 13–15-digit phone numbers without a {@code +} or a leading 0 passes the Luhn
 *       check and is masked as a card.
 *   <li>Bank account numbers are not a type of their own: the digits of an IBAN may be partly
 *       masked as a phone number ("DE89 3704 0044 0532 0130 00" loses its tail from "0044").
 *   <li>Addresses with quoted or bracketed local parts, IP-address hosts or consecutive dots are
 *       not recognised; bare host names without a path are left by design.
 *   <li>An analyst's reference pattern is run as given: one that backtracks catastrophically can
 *       make masking slow, and one that overflows the regular-expression stack on some answer finds
 *       nothing in that answer.
 * </ul>
 *
 * <h2>Cost</h2>
 *
 * One pass decides which detectors can find anything (a digit, an {@code @}, a slash, "://",
 * "www.", a cue word); answers with none of these cost one scan. The built-in patterns use
 * possessive quantifiers, bounded repetition and no unbounded repeated groups (which the JDK's
 * engine would recurse on), and phones, cards, e-mail addresses and handles are found by linear
 * scans: answers of 20,000 repeated digits, {@code @}s, dots or cue phrases take milliseconds.
 *
 * <p>Offsets count UTF-16 code units of the text as given (the pipeline gives the NFC text); a mask
 * never splits a surrogate pair. Digits of any script count as digits ({@code ０７７００ ９００１２３} is a
 * phone number).
 */
public final class PiiMasker {
  private static final PiiMasker STANDARD =
      new PiiMasker(PiiReferences.compile(PiiReferences.DEFAULTS), true);

  /** Overlap tie-break: lower ranks are more specific. */
  private static final Map<PiiType, Integer> RANK = ranks();

  private static Map<PiiType, Integer> ranks() {
    List<PiiType> order =
        List.of(
            PiiType.EMAIL,
            PiiType.URL,
            PiiType.IBAN,
            PiiType.CARD,
            PiiType.MAC,
            PiiType.IP,
            PiiType.ID,
            PiiType.DOB,
            PiiType.REFERENCE,
            PiiType.PLATE,
            PiiType.ADDRESS,
            PiiType.POSTCODE,
            PiiType.PHONE,
            PiiType.HANDLE,
            PiiType.NAME);
    Map<PiiType, Integer> out = new java.util.EnumMap<>(PiiType.class);
    for (int i = 0; i < order.size(); i++) {
      out.put(order.get(i), i);
    }
    if (out.size() != PiiType.values().length) {
      throw new IllegalStateException("every type needs a rank");
    }
    return out;
  }

  private static final Comparator<PiiSpan> PRECEDENCE =
      Comparator.comparingInt(PiiSpan::length)
          .reversed()
          .thenComparingInt(s -> RANK.get(s.type()))
          .thenComparingInt(PiiSpan::start);

  private final List<PiiReferences.Ref> references;

  /** Whether the references are the defaults, which all need a digit to match. */
  private final boolean defaultReferences;

  private PiiMasker(List<PiiReferences.Ref> references, boolean defaultReferences) {
    this.references = references;
    this.defaultReferences = defaultReferences;
  }

  /** A masker with the default reference patterns. */
  public static PiiMasker standard() {
    return STANDARD;
  }

  /**
   * A masker whose order, invoice and tracking references are found by {@code regexes} instead of
   * the defaults (an empty list masks no references).
   *
   * @throws IllegalArgumentException when the list or a pattern is missing or empty, or a pattern
   *     is not a valid regular expression; the message names the pattern and where its error is
   */
  public static PiiMasker withReferencePatterns(List<String> regexes) {
    return new PiiMasker(PiiReferences.compile(regexes), false);
  }

  /**
   * The text with its personal data masked, and where each mask is. Never throws for a non-null
   * text.
   */
  public Masked mask(String text) {
    Objects.requireNonNull(text, "text");
    if (text.isEmpty()) {
      return new Masked(text, List.of());
    }
    boolean digit = false;
    boolean at = false;
    boolean slash = false;
    boolean dot = false;
    boolean colon = false;
    boolean hyphen = false;
    boolean upperPair = false;
    boolean lineBreak = false;
    boolean closer = false;
    int digits = 0;
    int digitRun = 0;
    int longestDigitRun = 0;
    char prev = 0;
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (c == '@') {
        at = true;
      } else if (c == '/') {
        slash = true;
      } else if (c == '.') {
        dot = true;
      } else if (c == ':') {
        colon = true;
      } else if (c == '-') {
        hyphen = true;
      } else if (c == '\n' || c == '\r' || c == '\u2028' || c == '\u2029') {
        lineBreak = true;
      } else if (c == ']' || c == ')' || c == '}') {
        closer = true;
      } else if (c >= 'A' && c <= 'Z' && prev >= 'A' && prev <= 'Z') {
        upperPair = true;
      }
      if (PiiChars.isDigit(c)) {
        digit = true;
        digits++;
        longestDigitRun = Math.max(longestDigitRun, ++digitRun);
      } else {
        digitRun = 0;
      }
      prev = c;
    }
    PiiLexicon.Cues cues = PiiLexicon.scan(text);
    List<PiiSpan> found = new ArrayList<>();
    if (at && dot) {
      PiiAddresses.emails(text, found);
    }
    if (at) {
      PiiAddresses.handles(text, found);
    }
    if (maySpellAnAddress(text, at, dot, closer, cues.has(PiiLexicon.SPELLED))) {
      PiiAddresses.spelledEmails(text, found);
    }
    boolean scheme = slash && text.contains("://");
    boolean www = dot && PiiChars.containsIgnoreCase(text, "www.");
    if (scheme || www || (slash && dot)) {
      PiiAddresses.urls(text, scheme, www, slash && dot, found);
    }
    if (digit) {
      PiiNumbers.find(text, found);
      PiiBank.cardDetails(text, cues.has(PiiLexicon.CARD), found);
      PiiBank.ibans(text, found);
      PiiIds.ids(text, cues.has(PiiLexicon.ID), hyphen, upperPair, longestDigitRun, found);
      if (cues.has(PiiLexicon.PLATE)) {
        PiiIds.plates(text, found);
      }
      if (cues.has(PiiLexicon.DOB) || (dot && PiiChars.containsIgnoreCase(text, "d.o.b"))) {
        PiiDates.find(text, found);
      }
      if (dot || colon || hyphen) {
        PiiNetwork.find(text, colon, found);
      }
      if (cues.has(PiiLexicon.STREET) || cues.has(PiiLexicon.POBOX)) {
        PiiPostal.addresses(text, cues, found);
      }
      PiiPostal.postcodes(text, cues, found);
    }
    if (!defaultReferences) {
      PiiReferences.find(text, references, found);
    } else if (digit) {
      PiiReferences.findDefaults(
          text, references, cues.has(PiiLexicon.REFERENCE), digits >= 8, found);
    }
    PiiNames.find(
        text, cues.has(PiiLexicon.NAME) || (slash && text.contains("c/o")), lineBreak, found);
    if (found.isEmpty()) {
      return new Masked(text, List.of());
    }
    return build(text, resolve(found));
  }

  /**
   * Whether an e-mail address may be spelled out: "dot" as a word with an {@code @}, or without one
   * "at" in brackets, or " at " with "dot" or a dot.
   */
  private static boolean maySpellAnAddress(
      String text, boolean at, boolean dot, boolean closer, boolean spelledDot) {
    if (at) {
      return spelledDot;
    }
    if (closer
        && (PiiChars.containsIgnoreCase(text, "at]")
            || PiiChars.containsIgnoreCase(text, "at)")
            || PiiChars.containsIgnoreCase(text, "at}"))) {
      return true;
    }
    return (spelledDot || dot) && PiiChars.containsIgnoreCase(text, " at ");
  }

  /** The longest candidates first, ties to the more specific type; overlapping ones dropped. */
  private static List<PiiSpan> resolve(List<PiiSpan> found) {
    found.sort(PRECEDENCE);
    TreeMap<Integer, PiiSpan> taken = new TreeMap<>();
    for (PiiSpan s : found) {
      Map.Entry<Integer, PiiSpan> before = taken.floorEntry(s.start());
      if (before != null && before.getValue().end() > s.start()) {
        continue;
      }
      Map.Entry<Integer, PiiSpan> after = taken.ceilingEntry(s.start());
      if (after != null && after.getKey() < s.end()) {
        continue;
      }
      taken.put(s.start(), s);
    }
    return new ArrayList<>(taken.values());
  }

  private static Masked build(String text, List<PiiSpan> spans) {
    StringBuilder sb = new StringBuilder(text.length());
    List<PiiMask> masks = new ArrayList<>(spans.size());
    int prev = 0;
    for (PiiSpan s : spans) {
      sb.append(text, prev, s.start());
      int maskedStart = sb.length();
      sb.append(s.type().placeholder());
      masks.add(new PiiMask(s.type(), s.start(), s.end(), maskedStart, sb.length()));
      prev = s.end();
    }
    sb.append(text, prev, text.length());
    return new Masked(sb.toString(), masks);
  }

  /**
   * A masked text.
   *
   * @param text the input with each piece of personal data replaced by its type's placeholder
   * @param masks the pieces, sorted and non-overlapping; {@code start}/{@code end} index the input,
   *     {@code maskedStart}/{@code maskedEnd} index {@link #text()}
   */
  public record Masked(String text, List<PiiMask> masks) {
    public Masked {
      Objects.requireNonNull(text, "text");
      masks = List.copyOf(masks);
    }
  }
}
