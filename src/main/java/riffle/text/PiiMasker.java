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
 * {@code [name]}, {@code [address]}, {@code [postcode]}, {@code [dob]}, {@code [iban]}, {@code
 * [id]}, {@code [ip]}, {@code [mac]}, {@code [plate]}); every other character is kept exactly as
 * written. Immutable and safe to share between threads; patterns are compiled once, word lists
 * ({@code riffle/words/any/}) read once.
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
 *       groups, the longest card-length stretch that passes is taken. A number failing Luhn is not
 *       a card.
 *   <dt>Card details
 *   <dd>An expiry date (month and year: {@code 12/28}, {@code 03/2027}) or a security code (3 or 4
 *       digits) written right after a card number, with or without cue words between ("exp", "valid
 *       thru", "cvv", "code"), joins the card's mask: "4111 1111 1111 1111 exp 12/28 cvv 123" is
 *       one {@code [card]}. Elsewhere an expiry after its cue ("exp", "expiry", "expires", "valid
 *       thru/through/until", and their German, Spanish, Italian and Dutch words) is masked when a
 *       payment-card word (card, visa, mastercard, amex, credit, debit …) stands in the 60
 *       characters before or 40 after it and no other kind of card (gift, loyalty, SIM, warranty …)
 *       does; a code after "CVV", "CVC", "CV2", "CSC" always, after "security code" or "CID" near a
 *       card word, up to 48 characters further on in the same sentence ("security code on the back
 *       of my debit card is 613"). Only the value is masked; the cue words stay.
 *   <dt>IBANs
 *   <dd>Two letters, two check digits and the national account number, of exactly the length the
 *       IBAN registry gives for that country ({@code riffle/words/any/iban-lengths.txt}), grouped
 *       by single spaces or hyphens or not at all, any case, ending at a group's end, whose check
 *       digits pass ISO/IEC 7064 MOD 97-10 (ISO 13616-1): {@code GB82 WEST 1234 5698 7654 32},
 *       {@code DE89370400440532013000}. Masked whole as {@code [iban]}.
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
 *   <dt>References (order, invoice, tracking, customer, account)
 *   <dd>Found by regular expressions. The defaults ({@link #standard()}) are: a prefixed code
 *       ({@code ORD}, {@code ORDER}, {@code INV}, {@code RMA}, {@code RET}, {@code REF}, {@code
 *       TRK}, {@code TKT}, any case, then an optional {@code -_#}, at least three digits and up to
 *       three further {@code -} or {@code /} parts: {@code ORD-48213}, {@code INV-2026-0042}); a
 *       cue word (order, invoice, receipt, rma, ticket, reference, ref, booking, confirmation,
 *       tracking, parcel, shipment, consignment, waybill, account, customer, member, membership,
 *       loyalty), an optional "no."/"number"/"id"/"code", an optional ":", "#", "is" or "was", then
 *       a code of 4 to 40 letters, digits and inner hyphens with four digits in a row near its
 *       start ({@code order #48213}, {@code order number is 48213}, {@code tracking
 *       JD014600006281}) — only the code is masked, the cue words stay readable; and a
 *       carrier-style code of 10 to 30 upper-case letters and digits with at least one letter and
 *       at least eight digits ({@code 1Z999AA10123456784}, {@code RR123456785GB}). {@link
 *       #withReferencePatterns(List)} replaces all three. A pattern with a group named {@code ref}
 *       masks only that group (when it took part in the match); otherwise the whole match. Patterns
 *       are Java regular expressions used as written (add {@code (?i)} for any case); empty matches
 *       are ignored.
 *   <dt>Handles
 *   <dd>{@code @name} where the {@code @} does not follow a letter, digit or address character (so
 *       never part of an e-mail address) and is followed by a letter or underscore, then letters,
 *       digits, underscores and inner dots: {@code @ondalune_fan}. "@ 5pm" and "@5pm" are not
 *       handles.
 *   <dt>Names
 *   <dd>One to three words after a cue phrase (cue words in any case), or alone on the last line; a
 *       word is letters and marks with inner apostrophes or hyphens (O'Neill, Anne-Marie, McTavish)
 *       or an initial ("P."), with particles between (van, von, de, da, der, la …: "Sanne van der
 *       Velde"); a title before the name stays readable ("Regards, Mr [name]"); a possessive "'s"
 *       is kept out of the mask. Words in {@code pii-not-names.txt} ("Amazing", "Happy", "Help",
 *       "the", weekdays, months, shop words…) are never taken as names.
 *       <ul>
 *         <li>"my name is X", "my name's X", "name: X", "full name: X", and "ich heiße", "je
 *             m'appelle", "me llamo", "mi chiamo", "mijn naam is", "ik heet": X is a name whatever
 *             its case ("my name is jonas"), later words in the first one's case; not after
 *             "product name:", "brand name:" and the like;
 *         <li>after every other cue the words must be capitalised and pass {@link PiiNameCheck}:
 *             OpenNLP's tagger reads them as proper nouns (its own dictionary knows "Delivery",
 *             "Highly", "Cheap" as common words, and most names not at all), and neither the
 *             chunker's phrase ("the Velle", "Velle Duo 2", "Ondalune team") nor another place in
 *             the answer ("the Velle grinder", "in Leeds", "ondalune.example") makes them a
 *             product, brand or place. The cues: "ask for", "thanks to", "thank you to",
 *             "spoke/speak/talked/chatted to/with", "kudos/props/shout-out to", "helped/served by",
 *             "c/o" (anywhere); "thanks", "thank you", "many thanks", "thx" with or without a comma
 *             (anywhere; the name followed by the end, punctuation, or "for", "and", "from" …);
 *             sign-offs "regards" (kind, best, warm …), "signed", "cheers", "best", "best wishes",
 *             "sincerely", "yours", "love" and their German, French, Spanish, Italian and Dutch
 *             forms, at a sentence's or line's start and followed by a comma, dash, colon or line
 *             break, the name then ending its line or sentence; "call me X"; "this is X" and "I'm
 *             X" / "I am X" at the start of a sentence or after a greeting, "it's X" only after a
 *             greeting ("Hi, it's Amara here"), the name followed by the end, punctuation, an
 *             emoji, or "from", "here", "speaking", "again", "and";
 *         <li>a last line (of an answer of two or more lines) that is only one to three such words,
 *             perhaps after a dash or "From" ("— Jasper Tillman", "Sent from my phone\n Kasia");
 *         <li>a second name after "and" or "&" ("thanks to Lars and Birgit");
 *         <li>once a name is found, its words are masked wherever else they stand in the answer as
 *             whole words written the same way ("the chat with Tomasz … Thanks to Tomasz!").
 *       </ul>
 *   <dt>Street addresses
 *   <dd>A house number (221B, 12-14) and one to four capitalised words ending in a street word of
 *       {@code pii-streets-*.txt} (Street, St, Road, Rd, Avenue, Lane, Boulevard, Crescent,
 *       Terrace, Gardens, Mews …: "14 Larkmead Road"); a street word that is also an ordinary word
 *       (Way, Close, Court, Place, Square, Drive, Park …) counts only with a town, postcode or flat
 *       after it or an address cue before it. Other languages: the street word first and the number
 *       after ("Via Gelsomini 18", "Calle Almendros 23", "C/ Mayor 5"), the number first and the
 *       street word after ("12 rue des Glycines", "5 bis avenue Marcel Dorval"), or a compound and
 *       its number ("Hauptstr. 112", "Kastanjelaan 41", "Storgatan 3"). After an address cue ("I
 *       live at", "my address is", "deliver to", "ship to", "moved to" …) the words may be lower
 *       case ("6 orchard mews"). The whole span is one {@code [address]}: a flat or unit before or
 *       after ("Flat 3, …", "…, Apt 12C"), a direction ("NW"), then the postcode and town
 *       (continental order) or the town, region and postcode (English order), then the country. PO
 *       boxes ("PO Box 4471", "Postfach 10 11 22", "Apartado de correos 27") likewise. A street
 *       found once is an address again wherever else a house number stands before it. Not an
 *       address: a street word followed by a common noun ("2 Gravel Road bikes"), a compound
 *       followed by a year ("Frühlingsweg 2026").
 *   <dt>Postcodes
 *   <dd>Outside an address: after a cue ("postcode", "post code", "zip", "zip code", "PLZ", "postal
 *       code", "code postal", "código postal", "CAP"), any postcode shape; after a US state (itself
 *       after a comma or a town) a ZIP or ZIP+4 (USPS Publication 28), after an Australian state
 *       four digits (Australia Post), after a Canadian province its postcode (Canada Post); five
 *       digits (Deutsche Post, La Poste, Correos, Poste Italiane) or four digits and two letters
 *       (PostNL) right before a capitalised town word that is not a unit, a currency or a common
 *       English word ("10115 Berlin", "D-70173 Stuttgart", "1016 GV Amsterdam"); UK (Royal Mail PAF
 *       shapes A9 9AA … AA9A 9AA, upper case with the space) and Canadian postcodes anywhere, being
 *       distinctive, except after a model or part word or when the inward code reads as a size ("M1
 *       8GB"). Shapes written from memory of the operators' formats. A price, size, year or
 *       quantity is never a postcode.
 *   <dt>Dates of birth
 *   <dd>A date after a birth cue ("born", "born on", "DOB", "D.O.B.", "date of birth", "birthday",
 *       "birth date", and their German, French, Spanish, Italian and Dutch forms) and a few joining
 *       words ("is", "on", "the", ":"), in any common format (15/03/1985, 1985-03-15, 15.03.85, 15
 *       March 1985, 15th of March, March 15, 1985, March 1985, month names of those languages), or
 *       the first dated date with a plausible birth year (1900–2015) in the 48 characters after the
 *       cue. A year alone ("born in 1985") and ages stay: they are not identifying alone. Only the
 *       date is masked as {@code [dob]}.
 *   <dt>National ids
 *   <dd>After a cue (SSN, social security number, NI number, national insurance number, national
 *       id, id number, passport number, driving licence number, tax id, Steuer-ID, BSN, DNI, NIE,
 *       NIF, codice fiscale, PPS, medicare number, NHS number …; abbreviations that are words in a
 *       language Riffle reads, such as "sin" or "nie", only in capitals), the value: groups of
 *       letters and digits with at least four digits. In their own checked shape anywhere: a
 *       hyphenated US SSN (never area 000, 666 or 9xx), a UK National Insurance number (HMRC's
 *       prefix letters, suffix A–D), a Spanish DNI or NIE whose check letter is right, an Italian
 *       codice fiscale. Masked as {@code [id]}, never as {@code [phone]}.
 *   <dt>IP and MAC addresses
 *   <dd>IPv4 dotted quads (0–255, no leading zeros, with an optional port), not after "version",
 *       "firmware", "build" …; IPv6 in full (eight groups) or shortened with one {@code ::} and a
 *       hexadecimal letter; MAC addresses as six pairs joined by {@code :} or {@code -}, or three
 *       groups of four joined by dots with a hexadecimal letter. Masked as {@code [ip]} and {@code
 *       [mac]}.
 *   <dt>Licence plates
 *   <dd>After a cue ("reg", "registration", "number plate", "licence plate", "plate number",
 *       "Kennzeichen", "immatriculation", "matrícula", "targa", "kenteken" …): one to three groups
 *       of letters and digits joined by single spaces or hyphens, four to ten characters with a
 *       letter and a digit ("KX19 LMT", "B-QZ 4821", "GH-472-KP"). Masked as {@code [plate]}.
 * </dl>
 *
 * <h2>Overlaps</h2>
 *
 * Every detector runs on the whole text; when candidates overlap, the longest wins, and between
 * equally long ones the more specific type, in this order: e-mail, web address, IBAN, card, MAC,
 * IP, id, date of birth, reference, plate, address, postcode, phone, handle, name. So an e-mail
 * address inside a web address is masked as part of the web address, a Luhn-valid 15-digit number
 * is a card rather than a phone, an IBAN is one mask rather than a phone number inside it, an SSN
 * after its cue is an id, and "order number 4821345" masks a reference rather than a phone. Masks
 * never overlap and come sorted by position.
 *
 * <h2>Known limits</h2>
 *
 * <ul>
 *   <li>Names are found only after the cue phrases above or alone on a last line; "Marta was super
 *       helpful" is not masked (unless the same word is found as a name elsewhere in the answer). A
 *       shop, brand or product thanked by name with nothing else in the answer to show it is one
 *       ("Thanks, Ondalune!", "Cheers, Velle") is masked as a name. A given name that is also a
 *       common English word ("Will", "Grace") is left when the tagger reads it as the word. Names
 *       in capitals ("REGARDS, JONAS"), "this is priya" in lower case and a lower-case surname
 *       after a capitalised first name ("my name is Jonas berg") are not masked.
 *   <li>Addresses are found from their street word: "12 Larkmead" without one, a street of no
 *       listed street word ("Am Markt 3"), and a number and street word across a line break are not
 *       recognised. A town alone ("delivered to Leeds") is never masked; a town that is also a
 *       common English word ("Reading", "Bath") is left outside the address (its postcode is still
 *       masked). A dated delivery right after "birthday" ("for his birthday on 12 June") is masked
 *       as a date of birth.
 *   <li>A phone number glued to the word before it ({@code Tel07700900123}) reads as part of a code
 *       and is not masked.
 *   <li>A phone number written right beside another number with only a space between ("07700 900123
 *       2") is read as one number and masked together; a ZIP+4 without its state (12345-6789) is
 *       masked as a phone. A phone number written as a rising range of two equal-length groups
 *       (6123-6789) is not masked.
 *   <li>Card numbers grouped in other ways (groups of one or two digits) are not recognised; about
 *       one in ten 13–15-digit phone numbers without a {@code +} or a leading 0 passes the Luhn
 *       check and is masked as a card.
 *   <li>An IBAN that fails its check (a typing error) or belongs to a country not in {@code
 *       iban-lengths.txt} is not masked as an IBAN; its digits may still be masked as a phone
 *       number. A national account number without its IBAN is masked as a reference after "account
 *       number" ("account number 41402612"), not as bank data of its own.
 *   <li>Addresses with quoted or bracketed local parts, IP-address hosts or consecutive dots are
 *       not recognised; bare host names without a path are left by design.
 *   <li>An analyst's reference pattern is run as given: one that backtracks catastrophically can
 *       make masking slow, and one that overflows the regular-expression stack on some answer finds
 *       nothing in that answer.
 * </ul>
 *
 * <h2>Cost</h2>
 *
 * One pass over the characters notes digits, {@code @}, slashes, dots, colons, hyphens, line breaks
 * and capitals; one pass over the words looks each up in one hash table of cue words ({@code
 * pii-cues-*.txt}, {@code pii-streets-*.txt}). Detectors run only when their characters or cue
 * words are there: without a digit only e-mail addresses, web addresses, handles and names are
 * looked for. The tagger runs only for a capitalised candidate after a name cue, on the sentence
 * around it (at most 24 parses per answer; identical stretches are parsed once per process). The
 * built-in patterns use possessive quantifiers, bounded repetition and no unbounded repeated groups
 * (which the JDK's engine would recurse on), and phones, cards, IBANs, IP and MAC addresses, e-mail
 * addresses and handles are found by linear scans: answers of 20,000 repeated digits, {@code @}s,
 * dots or cue phrases take milliseconds. {@code riffle.text.MaskBench} times this against an older
 * build.
 *
 * <p>Offsets count UTF-16 code units of the text as given (the pipeline gives the NFC text); a mask
 * never splits a surrogate pair. Digits of any script count as digits ({@code ０７７００ ９００１２３} is a
 * phone number).
 *
 * <p>Size: most of its lines are this documentation of what is masked and why; the finders
 * themselves live in the {@code Pii*} classes it calls.
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
    boolean lettersThenDigit = false;
    int upperRun = 0;
    int upperRunEnd = -2;
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
      }
      if (c >= 'A' && c <= 'Z') {
        upperRun = prev >= 'A' && prev <= 'Z' ? upperRun + 1 : 1;
        upperRunEnd = i;
      } else if (c >= '0' && c <= '9' && upperRun >= 2) {
        // two or more capitals right before the digit, or before a space and the digit ("QQ 12")
        lettersThenDigit |= upperRunEnd == i - 1 || (upperRunEnd == i - 2 && prev == ' ');
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
    if (maySpellAnAddress(
        text, at, dot, closer, cues.has(PiiLexicon.SPELLED), cues.has(PiiLexicon.AT))) {
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
      PiiIds.ids(text, cues.has(PiiLexicon.ID), hyphen, lettersThenDigit, longestDigitRun, found);
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
      String text, boolean at, boolean dot, boolean closer, boolean spelledDot, boolean spelledAt) {
    if (at) {
      return spelledDot;
    }
    if (closer
        && (PiiChars.containsIgnoreCase(text, "at]")
            || PiiChars.containsIgnoreCase(text, "at)")
            || PiiChars.containsIgnoreCase(text, "at}"))) {
      return true;
    }
    return (spelledDot || dot) && spelledAt && PiiChars.containsIgnoreCase(text, " at ");
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
