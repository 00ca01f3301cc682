package riffle.text;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import riffle.model.PiiType;

/**
 * Finds dates of birth: a date written after a birth cue ("born", "DOB", "date of birth",
 * "birthday" and their German, French, Spanish, Italian and Dutch forms). A year alone ("born in
 * 1985") is left, as an age is. Rules are documented on {@link PiiMasker}.
 */
final class PiiDates {
  private static final String MONTHS =
      "january|february|march|april|may|june|july|august|september|october|november|december"
          + "|jan|feb|mar|apr|jun|jul|aug|sept|sep|oct|nov|dec"
          + "|januar|jänner|februar|märz|maerz|mai|juni|juli|oktober|dezember"
          + "|janvier|février|fevrier|mars|avril|juin|juillet|août|aout|septembre|octobre|novembre"
          + "|décembre|decembre"
          + "|enero|febrero|marzo|abril|mayo|junio|julio|agosto|septiembre|setiembre|octubre"
          + "|noviembre|diciembre"
          + "|gennaio|febbraio|aprile|maggio|giugno|luglio|settembre|ottobre|dicembre"
          + "|januari|februari|maart|mei|augustus";

  private static final String DAY = "(?:0?[1-9]|[12][0-9]|3[01])";

  private static final String MONTH_NUMBER = "(?:0?[1-9]|1[0-2])";

  private static final String YEAR = "(?:19[0-9]{2}|20[0-9]{2}|['’]?[0-9]{2})";

  private static final String MONTH_NAME = "(?:" + MONTHS + ")(?![\\p{L}])\\.?";

  /** Every common way of writing a date, day-month-year, month-day-year or year-month-day. */
  private static final String DATE =
      "(?:"
          + DAY
          + "[./\\-]"
          + MONTH_NUMBER
          + "[./\\-]"
          + YEAR
          + "|"
          + MONTH_NUMBER
          + "[./\\-]"
          + DAY
          + "[./\\-]"
          + YEAR
          + "|(?:19|20)[0-9]{2}[./\\-]"
          + MONTH_NUMBER
          + "[./\\-]"
          + DAY
          + "|"
          + DAY
          + "(?:st|nd|rd|th|er|\\.)?[ ]{0,2}(?:of[ ]{1,2}|de[ ]{1,2})?"
          + MONTH_NAME
          + "(?:,?[ ]{1,2}(?:de[ ]{1,2})?"
          + YEAR
          + ")?"
          + "|"
          + MONTH_NAME
          + "[ ]{1,2}"
          + DAY
          + "(?:st|nd|rd|th)?(?:,?[ ]{1,2}"
          + YEAR
          + ")?"
          + "|"
          + MONTH_NAME
          + ",?[ ]{1,2}(?:19|20)[0-9]{2}"
          + ")(?![\\p{L}\\p{N}])";

  /** A birth cue. */
  private static final Pattern CUE =
      Pattern.compile(
          "(?i)(?<![\\p{L}\\p{N}])(?:date[ ]{1,3}of[ ]{1,3}birth|d\\.?[ ]?o\\.?[ ]?b\\.?|born(?:[ ]{1,3}on)?"
              + "|birth[ ]?date|birthday|b-?day|geboren(?:[ ]{1,3}(?:am|op))?|geburtsdatum|geburtstag"
              + "|n[ée]e?[ ]{1,3}le|date[ ]{1,3}de[ ]{1,3}naissance|fecha[ ]{1,3}de[ ]{1,3}nacimiento"
              + "|nacid[oa][ ]{1,3}el|data[ ]{1,3}di[ ]{1,3}nascita|nat[oa][ ]{1,3}il|geboortedatum"
              + "|verjaardag)(?![\\p{L}])");

  /** Joining words after the cue, then any date: "born on 3 May", "DOB: 1985-03-15". */
  private static final Pattern NEXT_DATE =
      Pattern.compile(
          "(?i)(?:[ ]{0,3}(?:is|was|on|the|in|it['’]?s|:|-|–|=|,|\\())*+[ ]{0,3}(?<date>"
              + DATE
              + ")");

  /** A date with a year, found a little further on ("my date of birth? I gave 14/02/1987"). */
  private static final Pattern DATED =
      Pattern.compile("(?i)(?<![\\p{L}\\p{N}])(?<date>" + DATE + ")");

  /** How far after a cue a dated birth date is looked for. */
  private static final int REACH = 48;

  private PiiDates() {}

  /**
   * Adds every date of birth: a date right after a birth cue and its joining words, or else the
   * first date within {@value #REACH} characters after the cue whose year is a plausible birth year
   * (1900–2015). Only the date is masked; the cue stays.
   */
  static void find(String text, List<PiiSpan> out) {
    Matcher cue = CUE.matcher(text);
    Matcher next = NEXT_DATE.matcher(text);
    next.useTransparentBounds(true);
    Matcher dated = DATED.matcher(text);
    dated.useTransparentBounds(true);
    int n = text.length();
    while (cue.find()) {
      next.region(cue.end(), n);
      if (next.lookingAt()) {
        out.add(new PiiSpan(PiiType.DOB, next.start("date"), next.end("date")));
        continue;
      }
      dated.region(cue.end(), Math.min(n, cue.end() + REACH));
      while (dated.find()) {
        if (birthYear(text, dated.start("date"), dated.end("date"))) {
          out.add(new PiiSpan(PiiType.DOB, dated.start("date"), dated.end("date")));
          break;
        }
      }
    }
  }

  /** Whether the date at {@code [s, e)} holds a four-digit year from 1900 to 2015. */
  private static boolean birthYear(String text, int s, int e) {
    for (int i = s; i + 4 <= e; i++) {
      if ((i == s || !PiiChars.isDigitAt(text, i - 1))
          && (i + 4 == e || !PiiChars.isDigitAt(text, i + 4))
          && PiiChars.isDigitAt(text, i)
          && PiiChars.isDigitAt(text, i + 3)) {
        String y = text.substring(i, i + 4);
        if (y.chars().allMatch(c -> c >= '0' && c <= '9')) {
          int v = Integer.parseInt(y);
          return v >= 1900 && v <= 2015;
        }
      }
    }
    return false;
  }
}
