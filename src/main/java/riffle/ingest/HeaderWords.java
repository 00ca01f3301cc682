package riffle.ingest;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * What a header's words say about its column. A header is lower-cased and every character that is
 * not a letter or digit becomes a space, so {@code "Respondent_ID"}, {@code "respondent id"} and
 * {@code "Respondent-ID"} read the same. Thread-safe.
 */
final class HeaderWords {
  private static final Set<String> ID_HEADERS =
      Set.of(
          "id",
          "respondent",
          "respondent id",
          "respondentid",
          "respondent number",
          "respondent no",
          "response",
          "response id",
          "responseid",
          "response number",
          "response no",
          "submission id",
          "submissionid",
          "record id",
          "resp id",
          "participant",
          "participant id",
          "entry id",
          "row id",
          "uuid");
  private static final Set<String> DATE_WORDS =
      Set.of(
          "date",
          "datetime",
          "timestamp",
          "time",
          "submitted",
          "created",
          "completed",
          "started",
          "finished",
          "answered",
          "when");
  private static final Set<String> CODES_WORDS =
      Set.of("code", "codes", "tag", "tags", "theme", "themes", "coding");
  private static final Set<String> NOT_CODES_WORDS =
      Set.of(
          "discount",
          "promo",
          "promotion",
          "coupon",
          "voucher",
          "post",
          "postal",
          "zip",
          "country",
          "area",
          "referral",
          "gift",
          "product",
          "sku",
          "order",
          "tracking",
          "language",
          "currency",
          "region",
          "dialling",
          "dialing",
          "phone",
          "iso",
          "qr",
          "bar",
          "campaign",
          "utm",
          "source");
  private static final Set<String> PERSONAL_WORDS =
      Set.of("email", "phone", "telephone", "surname", "firstname", "lastname", "fullname");
  private static final Set<String> PERSONAL_HEADERS =
      Set.of(
          "name",
          "full name",
          "first name",
          "last name",
          "given name",
          "family name",
          "your name",
          "customer name",
          "respondent name",
          "contact name",
          "contact",
          "e mail",
          "e mail address",
          "your e mail",
          "mail",
          "mobile",
          "mobile number",
          "address",
          "street",
          "street address",
          "postal address",
          "home address",
          "shipping address",
          "billing address",
          "delivery address",
          "ip",
          "ip address");
  private static final Set<String> MEASURE_WORDS =
      Set.of(
          "score",
          "rating",
          "nps",
          "rate",
          "satisfaction",
          "stars",
          "likely",
          "value",
          "amount",
          "price",
          "total",
          "spend",
          "spent",
          "cost",
          "revenue",
          "age",
          "quantity",
          "qty",
          "count");

  /** First words of a header that asks something. */
  private static final Set<String> QUESTION_STARTS =
      Set.of(
          "what",
          "whats",
          "why",
          "how",
          "which",
          "anything",
          "anyone",
          "any",
          "is",
          "was",
          "were",
          "are",
          "did",
          "do",
          "does",
          "would",
          "could",
          "can",
          "should",
          "will",
          "tell",
          "describe",
          "explain",
          "please",
          "where",
          "who",
          "if",
          "in");

  /** Two-word starts of a header that asks something ("in" alone starts "In stock"). */
  private static final Set<String> QUESTION_PAIRS = Set.of("in your", "if you", "if there");

  private final String joined;
  private final List<String> words;
  private final boolean asks;

  HeaderWords(String header) {
    StringBuilder sb = new StringBuilder(header.length());
    for (int i = 0; i < header.length(); i++) {
      char c = header.charAt(i);
      sb.append(Character.isLetterOrDigit(c) ? c : ' ');
    }
    String[] parts = sb.toString().toLowerCase(Locale.ROOT).strip().split(" +");
    this.words = parts.length == 1 && parts[0].isEmpty() ? List.of() : Arrays.asList(parts);
    this.joined = String.join(" ", words);
    String first = words.isEmpty() ? "" : words.get(0);
    boolean pairOnly = first.equals("in") || first.equals("if");
    this.asks =
        header.strip().endsWith("?")
            || (words.size() >= 3
                && (pairOnly
                    ? QUESTION_PAIRS.contains(first + " " + words.get(1))
                    : QUESTION_STARTS.contains(first)));
  }

  /**
   * Header worded as a question: it ends in a question mark, or it has three words or more and
   * starts as a question or a request does ({@code What made you choose us}, {@code Tell us why},
   * {@code In your own words}). Such a column is a question even when its answers are short.
   */
  boolean isQuestion() {
    return asks;
  }

  /** Header such as {@code id}, {@code Respondent ID}, {@code Response #}. */
  boolean isId() {
    return ID_HEADERS.contains(joined);
  }

  /** Header whose last word is {@code id}, such as {@code Order ID}. */
  boolean endsWithId() {
    return !words.isEmpty() && words.get(words.size() - 1).equals("id");
  }

  /** Header such as {@code Date}, {@code Submitted at}, {@code Start time}. */
  boolean isDate() {
    return words.stream().anyMatch(DATE_WORDS::contains);
  }

  /** Header such as {@code Q1 codes}, {@code Tags}, {@code Themes}, but not {@code Promo code}. */
  boolean isCodes() {
    return words.stream().anyMatch(CODES_WORDS::contains)
        && words.stream().noneMatch(NOT_CODES_WORDS::contains);
  }

  /** Header such as {@code Coder}, {@code Coded by}. */
  boolean isCoder() {
    return words.contains("coder")
        || words.contains("coders")
        || words.contains("annotator")
        || joined.contains("coded by");
  }

  /** Header of a column of personal data: e-mail, phone, name, address. */
  boolean isPersonal() {
    return PERSONAL_HEADERS.contains(joined)
        || words.stream().anyMatch(PERSONAL_WORDS::contains)
        || joined.contains("e mail")
        || joined.contains("phone number")
        || joined.contains("ip address");
  }

  /** Header of a rating, score or amount, whose values are never respondent ids. */
  boolean isMeasure() {
    return words.stream().anyMatch(MEASURE_WORDS::contains);
  }
}
