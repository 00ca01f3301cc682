package riffle.ingest;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import riffle.model.ColumnRole;

/**
 * Gives every column a role: named columns get the role they were named for; the others are
 * detected from their header and from a sample of the first {@value #SAMPLE} rows.
 *
 * <p>Naming any column for a role switches detection of that role off; a skipped column is {@link
 * ColumnRole#IGNORED} and leaves detection of the other columns as it was. Otherwise, in this
 * order:
 *
 * <ol>
 *   <li><b>CODER</b>: header with the word coder(s) or annotator, or "coded by".
 *   <li><b>CODES</b>: header with the word code(s), tag(s), theme(s) or coding, such as "Q1 codes",
 *       unless it also says discount, promo, coupon, voucher, postal, zip, country, product, order,
 *       tracking or the like (a promo code is not a code of the answer).
 *   <li><b>ID</b>, one column at most, the first of: a header such as id, respondent (id), response
 *       (id), submission id, record id or {@code #} whose values are at least 90% single tokens; a
 *       header ending in "id" whose values are unique single tokens; else the leftmost column of at
 *       least 5 values that are unique single tokens, at least 90% containing a digit, not dates
 *       and not under a score or rating header.
 *   <li><b>DATE</b>, one column at most: the leftmost header with the word date, time, timestamp,
 *       submitted, created, completed, started, finished, answered or when whose values are at
 *       least half dates or date-times (or 90% spreadsheet serial dates); else the leftmost column
 *       whose values are at least 80% dates or date-times.
 *   <li><b>IGNORED</b> when empty in the sample, or personal data: a header such as name, e-mail,
 *       phone, mobile, address or IP, or at least half the values shaped like e-mail addresses.
 *   <li><b>TEXT</b>: a header worded as a question ({@link HeaderWords#isQuestion}) over answers
 *       that are not all yes/no or numbers, however short and repeated ("What made you choose us?"
 *       answered "Price", "Fast delivery"); or free text, measured on the answers that are not
 *       {@link NonAnswers}: at least one, a mean length of at least {@value #TEXT_MEAN_LENGTH}
 *       characters and of at least {@value #TEXT_MEAN_WORDS} words, at least half holding a space,
 *       and at least 60% distinct.
 *   <li><b>META</b>: few distinct values, at most min(50, max(5, half the filled values)), with a
 *       mean length of at most {@value #META_MEAN_LENGTH} characters: device, customer type, order
 *       value band, country, plan, a yes/no question, a rating.
 *   <li><b>IGNORED</b> otherwise: many distinct short values, such as names, order numbers or free
 *       numbers; they are not kept.
 * </ol>
 *
 * <p>Every column gets the reason for its role, in words: the import prints them and the page's
 * preview shows them, so that no question is left out unseen.
 *
 * <p>A CODES column belongs to the nearest TEXT column on its left, else to the first TEXT column.
 */
final class RoleDetector {
  static final int SAMPLE = 500;
  static final int TEXT_MEAN_LENGTH = 15;
  static final int TEXT_MEAN_WORDS = 3;
  static final int META_MEAN_LENGTH = 40;

  /**
   * Most distinct answers a question's column may have and still read as a choice among set answers
   * (a segment) rather than answers in the buyers' own words.
   */
  static final int MAX_CHOICES = 12;

  private static final int MAX_LISTED = 30;

  private RoleDetector() {}

  /**
   * Finds the columns the settings name.
   *
   * @param names the unique header names
   * @param shortNames the questions' short names above their wording, empty strings without
   * @param settings the import settings
   * @param line the header's line, for messages
   * @return the role of each named column, by index; null for columns not named
   * @throws BadInput when a named column is not in the header
   */
  static ColumnRole[] named(String[] names, String[] shortNames, ImportSettings settings, long line)
      throws BadInput {
    ColumnRole[] roles = new ColumnRole[names.length];
    for (Map.Entry<String, List<String>> e : settings.namedColumns().entrySet()) {
      ColumnRole role = roleOf(e.getKey());
      for (String wanted : e.getValue()) {
        int i = find(names, wanted);
        if (i < 0) {
          i = find(shortNames, wanted);
        }
        if (i < 0) {
          throw new BadInput(
              line,
              0,
              "no column named '"
                  + wanted
                  + "' (the "
                  + e.getKey()
                  + "); the header has: "
                  + listed(names)
                  + "; check the name, or the delimiter if this list looks wrong",
              e.getKey());
        }
        roles[i] = role;
      }
    }
    return roles;
  }

  /**
   * Gives every column its role.
   *
   * @param names the unique header names
   * @param shortNames the questions' short names above their wording, empty strings without
   * @param named the roles of named columns, null for the others
   * @param sample the first rows kept
   * @param line the header's line, for messages
   * @throws BadInput when no column holds open text
   */
  static List<Column> detect(
      String[] names, String[] shortNames, ColumnRole[] named, List<SurveyRow> sample, long line)
      throws BadInput {
    int n = names.length;
    ColumnRole[] roles = named.clone();
    String[] reasons = new String[n];
    boolean[] detected = new boolean[n];
    Set<ColumnRole> off = EnumSet.noneOf(ColumnRole.class);
    for (ColumnRole r : named) {
      if (r != null) {
        off.add(r);
      }
    }
    HeaderWords[] words = new HeaderWords[n];
    ColumnProfile[] profiles = new ColumnProfile[n];
    for (int i = 0; i < n; i++) {
      words[i] = new HeaderWords(names[i]);
      profiles[i] = new ColumnProfile(sample, i);
      detected[i] = roles[i] == null;
      if (!detected[i]) {
        reasons[i] = "as named in the import settings";
      }
    }
    for (int i = 0; i < n; i++) {
      if (roles[i] != null) {
        continue;
      }
      if (!off.contains(ColumnRole.CODER) && words[i].isCoder()) {
        roles[i] = ColumnRole.CODER;
        reasons[i] = "the header names a coder";
      } else if (!off.contains(ColumnRole.CODES) && words[i].isCodes()) {
        roles[i] = ColumnRole.CODES;
        reasons[i] = "the header names codes";
      }
    }
    if (!off.contains(ColumnRole.ID)) {
      pickId(names, words, profiles, roles, reasons);
    }
    if (!off.contains(ColumnRole.DATE)) {
      pickDate(words, profiles, roles, reasons);
    }
    for (int i = 0; i < n; i++) {
      if (roles[i] == null) {
        Verdict v = byValues(words[i], profiles[i], off);
        roles[i] = v.role();
        reasons[i] = v.reason();
      }
    }
    return columns(names, shortNames, roles, reasons, detected, line);
  }

  private static void pickId(
      String[] names,
      HeaderWords[] words,
      ColumnProfile[] p,
      ColumnRole[] roles,
      String[] reasons) {
    int best = -1;
    int bestRank = Integer.MAX_VALUE;
    for (int i = 0; i < roles.length; i++) {
      if (roles[i] != null || p[i].filled == 0) {
        continue;
      }
      int rank;
      if ((words[i].isId() || names[i].equals("#")) && p[i].tokenShare >= 0.9) {
        rank = 1;
      } else if (words[i].endsWithId() && p[i].unique && p[i].tokenShare == 1) {
        rank = 2;
      } else if (p[i].filled >= 5
          && p[i].unique
          && p[i].tokenShare == 1
          && p[i].digitShare >= 0.9
          && p[i].dateShare < 0.5
          && p[i].emailShare == 0
          && !words[i].isMeasure()) {
        rank = 3;
      } else {
        continue;
      }
      if (rank < bestRank) {
        best = i;
        bestRank = rank;
      }
    }
    if (best >= 0) {
      roles[best] = ColumnRole.ID;
      reasons[best] =
          switch (bestRank) {
            case 1 -> "the header names an id";
            case 2 -> "unique values under a header ending in id";
            default -> "unique single values with digits, the first such column";
          };
    }
  }

  private static void pickDate(
      HeaderWords[] words, ColumnProfile[] p, ColumnRole[] roles, String[] reasons) {
    int best = -1;
    int bestRank = Integer.MAX_VALUE;
    for (int i = 0; i < roles.length; i++) {
      if (roles[i] != null || p[i].filled == 0) {
        continue;
      }
      int rank;
      if (words[i].isDate() && (p[i].dateShare >= 0.5 || p[i].serialShare >= 0.9)) {
        rank = 1;
      } else if (p[i].dateShare >= 0.8) {
        rank = 2;
      } else {
        continue;
      }
      if (rank < bestRank) {
        best = i;
        bestRank = rank;
      }
    }
    if (best >= 0) {
      roles[best] = ColumnRole.DATE;
      reasons[best] =
          p[best].dateShare < 0.5
              ? "spreadsheet serial dates under a date header"
              : percent(p[best].dateShare)
                  + " of its values are dates"
                  + (bestRank == 1 ? " under a date header" : "");
    }
  }

  /** A detected role and why. */
  private record Verdict(ColumnRole role, String reason) {}

  private static Verdict byValues(HeaderWords words, ColumnProfile p, Set<ColumnRole> off) {
    if (p.filled == 0) {
      return new Verdict(ColumnRole.IGNORED, "empty in the first rows");
    }
    if (words.isPersonal()) {
      return new Verdict(ColumnRole.IGNORED, "personal data, by its header");
    }
    if (p.emailShare >= 0.5) {
      return new Verdict(ColumnRole.IGNORED, "personal data: e-mail addresses");
    }
    boolean closed = p.yesNoShare + p.numberShare >= 0.9;
    boolean choices =
        p.distinct <= MAX_CHOICES
            && p.singletonShare < 0.05
            && p.substantive >= 2 * p.distinct
            && p.meanFilledLength <= META_MEAN_LENGTH;
    if (words.isQuestion() && p.substantive >= 1 && !closed && !choices) {
      return text(
          off,
          p.variety >= 0.6 || p.meanWords >= TEXT_MEAN_WORDS
              ? "the header asks a question"
              : "the header asks a question; short repeated answers kept as its answers");
    }
    boolean text =
        p.substantive >= 1
            && p.meanLength >= TEXT_MEAN_LENGTH
            && p.meanWords >= TEXT_MEAN_WORDS
            && p.spaceShare >= 0.5
            && p.variety >= 0.6;
    if (text) {
      return text(off, String.format(Locale.ROOT, "free text, %.0f words on average", p.meanWords));
    }
    int metaLimit = Math.min(50, Math.max(5, p.filled / 2));
    if (!off.contains(ColumnRole.META)
        && p.distinct <= metaLimit
        && p.meanFilledLength <= META_MEAN_LENGTH) {
      String what =
          p.yesNoShare >= 0.9
              ? "yes/no answers"
              : p.numberShare >= 0.9
                  ? "numbers"
                  : words.isQuestion()
                      ? "set answers, each given by several rows"
                      : "values such as a device, a plan or a country";
      return new Verdict(
          ColumnRole.META,
          (p.distinct == 1 ? "one value" : p.distinct + " distinct " + what)
              + ": kept as a segment");
    }
    return new Verdict(
        ColumnRole.IGNORED,
        String.format(
            Locale.ROOT,
            "%d distinct short values, %.0f characters on average, like names or order numbers;"
                + " name it as a text column to keep it as a question",
            p.distinct,
            p.meanFilledLength));
  }

  private static Verdict text(Set<ColumnRole> off, String reason) {
    return off.contains(ColumnRole.TEXT)
        ? new Verdict(ColumnRole.IGNORED, reason + "; not kept, as the text columns were named")
        : new Verdict(ColumnRole.TEXT, reason);
  }

  private static String percent(double share) {
    return String.format(Locale.ROOT, "%.0f%%", share * 100);
  }

  private static List<Column> columns(
      String[] names,
      String[] shortNames,
      ColumnRole[] roles,
      String[] reasons,
      boolean[] detected,
      long line)
      throws BadInput {
    int firstText = -1;
    for (int i = 0; i < roles.length && firstText < 0; i++) {
      if (roles[i] == ColumnRole.TEXT) {
        firstText = i;
      }
    }
    if (firstText < 0) {
      throw new BadInput(
          line,
          0,
          "no open-text column found; columns: "
              + explained(names, reasons)
              + "; name the text column",
          "text column");
    }
    List<Column> columns = new ArrayList<>(roles.length);
    int lastText = -1;
    for (int i = 0; i < roles.length; i++) {
      if (roles[i] == ColumnRole.TEXT) {
        lastText = i;
      }
      int answers = roles[i] == ColumnRole.CODES ? (lastText >= 0 ? lastText : firstText) : -1;
      columns.add(
          new Column(i, names[i], shortNames[i], roles[i], detected[i], answers, reasons[i]));
    }
    return columns;
  }

  /** Finds a header: exact match first, else the only one equal ignoring case and spacing. */
  static int find(String[] names, String wanted) {
    for (int i = 0; i < names.length; i++) {
      if (names[i].equals(wanted)) {
        return i;
      }
    }
    String w = HeaderNames.collapse(wanted).toLowerCase(Locale.ROOT);
    int found = -1;
    for (int i = 0; i < names.length; i++) {
      if (names[i].toLowerCase(Locale.ROOT).equals(w)) {
        if (found >= 0) {
          return -1;
        }
        found = i;
      }
    }
    return found;
  }

  /** The columns with the reasons for their roles, as many as {@link #listed} names. */
  private static String explained(String[] names, String[] reasons) {
    StringBuilder sb = new StringBuilder();
    for (int i = 0; i < names.length && i < MAX_LISTED; i++) {
      sb.append(i == 0 ? "" : ", ")
          .append('\'')
          .append(names[i])
          .append("' (")
          .append(reasons[i])
          .append(')');
    }
    if (names.length > MAX_LISTED) {
      sb.append(" and ").append(names.length - MAX_LISTED).append(" more");
    }
    return sb.toString();
  }

  private static String listed(String[] names) {
    StringBuilder sb = new StringBuilder();
    for (int i = 0; i < names.length && i < MAX_LISTED; i++) {
      sb.append(i == 0 ? "" : ", ").append('\'').append(names[i]).append('\'');
    }
    if (names.length > MAX_LISTED) {
      sb.append(" and ").append(names.length - MAX_LISTED).append(" more");
    }
    return sb.toString();
  }

  private static ColumnRole roleOf(String option) {
    switch (option) {
      case ImportSettings.Builder.TEXT:
        return ColumnRole.TEXT;
      case ImportSettings.Builder.ID:
        return ColumnRole.ID;
      case ImportSettings.Builder.DATE:
        return ColumnRole.DATE;
      case ImportSettings.Builder.CODES:
        return ColumnRole.CODES;
      case ImportSettings.Builder.CODER:
        return ColumnRole.CODER;
      case ImportSettings.Builder.META:
        return ColumnRole.META;
      case ImportSettings.Builder.SKIP:
        return ColumnRole.IGNORED;
      default:
        throw new IllegalStateException("unknown option " + option);
    }
  }
}
