package riffle.text;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.regex.PatternSyntaxException;
import riffle.model.InputException;
import riffle.model.PiiType;

/** Order, invoice and tracking references, found by a list of regular expressions. */
final class PiiReferences {
  /**
   * The default patterns, in the order documented on {@link PiiMasker}: prefixed codes, a cue word
   * then a reference, and long upper-case carrier-style codes.
   */
  static final List<String> DEFAULTS =
      List.of(
          // ORD-48213, INV-2026-0042, RMA-AB1234, ref#5521-7
          "(?i)(?<![\\p{L}\\p{N}_-])(?:ORD|ORDER|INV|RMA|RET|REF|TRK|TKT)[-_#]?"
              + "(?=[A-Z]{0,3}\\d{3})[A-Z\\d]{3,20}+(?:[-/][A-Z\\d]{1,12}+){0,3}+"
              + "(?![\\p{L}\\p{N}])",
          // order 48213, order #48213, order number is 48213, tracking JD014600006281
          "(?i)(?<![\\p{L}\\p{N}])(?:order|invoice|receipt|rma|ticket|reference|ref|booking"
              + "|confirmation|tracking|parcel|shipment|consignment|waybill|account|customer|member"
              + "|membership|loyalty)"
              + "(?:\\s{1,3}(?:no\\.?|nr\\.?|num(?:ber)?|id|code|ref(?:erence)?))?"
              + "(?:\\s{0,3}[:#]|\\s{1,3}(?:is|was))?\\s{0,3}#?\\s{0,2}"
              + "(?<ref>(?=[A-Z-]{0,6}\\d{4})[A-Z\\d](?:[A-Z\\d]|-(?=[A-Z\\d])){3,39}+)"
              + "(?![\\p{L}\\p{N}])",
          // 1Z999AA10123456784, RR123456785GB: upper-case letters and at least eight digits
          "(?<![\\p{L}\\p{N}_-])(?=[A-Z\\d]{0,29}[A-Z])(?=(?:[A-Z]*+\\d){8})[A-Z\\d]{10,30}+"
              + "(?![\\p{L}\\p{N}_])");

  private static final String REF_GROUP = "ref";

  /** One compiled pattern; {@code ref} says whether it has a group named "ref". */
  record Ref(Pattern pattern, boolean ref) {}

  private PiiReferences() {}

  /**
   * Compiles the patterns, refusing a missing, empty or invalid one with a message that names it
   * and where its error is.
   */
  static List<Ref> compile(List<String> regexes) {
    if (regexes == null) {
      throw new InputException("the list of reference patterns is missing");
    }
    List<Ref> out = new ArrayList<>(regexes.size());
    for (int i = 0; i < regexes.size(); i++) {
      String regex = regexes.get(i);
      String which = "reference pattern " + (i + 1) + " of " + regexes.size();
      if (regex == null || regex.isEmpty()) {
        throw new InputException(which + " is empty; give a regular expression");
      }
      Pattern p;
      try {
        p = Pattern.compile(regex);
      } catch (PatternSyntaxException e) {
        throw new InputException(
            which
                + ", \""
                + regex
                + "\", is not a valid regular expression: "
                + e.getDescription()
                + " "
                + where(e.getIndex(), regex),
            e);
      }
      out.add(new Ref(p, hasRefGroup(regex)));
    }
    return List.copyOf(out);
  }

  private static String where(int index, String regex) {
    if (index < 0) {
      return "(position unknown)";
    }
    if (index >= regex.length()) {
      return "at the end of the pattern";
    }
    return "at character " + (index + 1) + " ('" + regex.charAt(index) + "')";
  }

  /** Whether the pattern defines a group named "ref": defining it again then fails. */
  private static boolean hasRefGroup(String regex) {
    if (!regex.contains("(?<" + REF_GROUP + ">")) {
      return false;
    }
    try {
      Pattern.compile(regex + "|(?<" + REF_GROUP + ">)");
      return false;
    } catch (PatternSyntaxException e) {
      return true;
    }
  }

  /**
   * Adds the matches of the default patterns ({@code refs} compiled from {@link #DEFAULTS}), each
   * run only when the answer can hold one: the first two need a reference word or prefix ({@code
   * cue}), the third eight digits ({@code eightDigits}).
   */
  static void findDefaults(
      String text, List<Ref> refs, boolean cue, boolean eightDigits, List<PiiSpan> out) {
    if (cue) {
      find(text, refs.subList(0, 2), out);
    }
    if (eightDigits) {
      find(text, refs.subList(2, 3), out);
    }
  }

  /**
   * Adds every match of every pattern; only the "ref" group when the pattern has one and it took
   * part. A pattern that overflows the regular-expression engine's stack on this text (possible
   * only with an analyst's own, deeply nested pattern on a very long answer) is skipped for it.
   */
  static void find(String text, List<Ref> refs, List<PiiSpan> out) {
    for (Ref r : refs) {
      Matcher m = r.pattern().matcher(text);
      try {
        while (m.find()) {
          int s = m.start();
          int e = m.end();
          if (r.ref() && m.start(REF_GROUP) >= 0) {
            s = m.start(REF_GROUP);
            e = m.end(REF_GROUP);
          }
          if (e > s) {
            out.add(new PiiSpan(PiiType.REFERENCE, s, e));
          }
        }
      } catch (StackOverflowError overflow) {
        // documented: this pattern finds nothing in this text
      }
    }
  }
}
