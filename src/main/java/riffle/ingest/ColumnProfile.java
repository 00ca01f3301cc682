package riffle.ingest;

import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * What the values of one column look like over a sample of rows: how many are filled, how many
 * distinct, how long, whether they hold spaces, digits, e-mail addresses or dates. Values are
 * trimmed for this only; non-answers ("n/a", "-") are left out of the length and variety figures.
 */
final class ColumnProfile {
  /** Non-blank values. */
  final int filled;

  /** Non-blank values that are not non-answers. */
  final int substantive;

  /** Distinct non-blank values, ignoring case. */
  final int distinct;

  /** True when no non-blank value repeats exactly. */
  final boolean unique;

  /** Mean length in characters of the substantive values. */
  final double meanLength;

  /** Mean number of words of the substantive values. */
  final double meanWords;

  /** Share of substantive values containing whitespace. */
  final double spaceShare;

  /** Share of distinct substantive values among substantive values (ignoring case). */
  final double variety;

  /** Share of substantive values whose value (ignoring case) no other row gives. */
  final double singletonShare;

  /** Mean length of all non-blank values. */
  final double meanFilledLength;

  /** Share of non-blank values that are one token (no whitespace) of at most 64 characters. */
  final double tokenShare;

  /** Share of non-blank values containing a digit. */
  final double digitShare;

  /** Share of non-blank values shaped like an e-mail address. */
  final double emailShare;

  /** Share of non-blank values shaped like a date or date-time. */
  final double dateShare;

  /** Share of non-blank values that are spreadsheet serial dates ({@link DateColumn#isSerial}). */
  final double serialShare;

  /** Share of non-blank values that are a yes, a no or the like ({@code Y}, {@code true}). */
  final double yesNoShare;

  /** Share of non-blank values that are a number (a rating, an amount, a percentage). */
  final double numberShare;

  private static final Set<String> YES_NO =
      Set.of("yes", "no", "y", "n", "true", "false", "maybe", "not sure", "yes.", "no.");

  private static final Pattern NUMBER = Pattern.compile("[-+]?\\d+(?:[.,]\\d+)?\\s*%?");

  ColumnProfile(List<SurveyRow> sample, int column) {
    int filled = 0;
    int substantive = 0;
    long length = 0;
    long filledLength = 0;
    long wordCount = 0;
    int spaced = 0;
    int tokens = 0;
    int digits = 0;
    int emails = 0;
    int dates = 0;
    int yesNo = 0;
    int serials = 0;
    int numbers = 0;
    Set<String> exact = new HashSet<>();
    Set<String> folded = new HashSet<>();
    Map<String, Integer> foldedSubstantive = new HashMap<>();
    for (SurveyRow row : sample) {
      String v = row.cells().get(column).strip();
      if (v.isEmpty()) {
        continue;
      }
      filled++;
      filledLength += v.length();
      exact.add(v);
      String f = v.toLowerCase(Locale.ROOT);
      folded.add(f);
      int words = words(v);
      if (words <= 1 && v.length() <= 64) {
        tokens++;
      }
      if (hasDigit(v)) {
        digits++;
      }
      if (words == 1 && isEmail(v)) {
        emails++;
      }
      if (DateShapes.looksLikeDate(v)) {
        dates++;
      }
      if (DateColumn.isSerial(v)) {
        serials++;
      }
      if (YES_NO.contains(f)) {
        yesNo++;
      }
      if (NUMBER.matcher(v).matches()) {
        numbers++;
      }
      if (!NonAnswers.isNonAnswer(v)) {
        substantive++;
        length += v.length();
        wordCount += words;
        if (words > 1) {
          spaced++;
        }
        foldedSubstantive.merge(f, 1, Integer::sum);
      }
    }
    this.filled = filled;
    this.substantive = substantive;
    this.distinct = folded.size();
    this.unique = exact.size() == filled;
    this.meanLength = share(length, substantive);
    this.meanWords = share(wordCount, substantive);
    this.spaceShare = share(spaced, substantive);
    this.variety = share(foldedSubstantive.size(), substantive);
    this.singletonShare =
        share(foldedSubstantive.values().stream().filter(c -> c == 1).count(), substantive);
    this.meanFilledLength = share(filledLength, filled);
    this.tokenShare = share(tokens, filled);
    this.digitShare = share(digits, filled);
    this.emailShare = share(emails, filled);
    this.dateShare = share(dates, filled);
    this.serialShare = share(serials, filled);
    this.yesNoShare = share(yesNo, filled);
    this.numberShare = share(numbers, filled);
  }

  private static double share(long part, long whole) {
    return whole == 0 ? 0 : (double) part / whole;
  }

  private static int words(String v) {
    int words = 0;
    boolean in = false;
    for (int i = 0; i < v.length(); i++) {
      boolean space = Character.isWhitespace(v.charAt(i));
      if (!space && !in) {
        words++;
      }
      in = !space;
    }
    return words;
  }

  private static boolean hasDigit(String v) {
    for (int i = 0; i < v.length(); i++) {
      if (Character.isDigit(v.charAt(i))) {
        return true;
      }
    }
    return false;
  }

  private static boolean isEmail(String v) {
    int at = v.indexOf('@');
    return at > 0 && v.indexOf('.', at) > at + 1 && !v.endsWith(".") && v.indexOf('@', at + 1) < 0;
  }
}
