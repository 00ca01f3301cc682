package riffle.report;

import java.util.Objects;

/**
 * One code given to an answer, for the long-format export.
 *
 * @param codeId the code's id
 * @param coder who gave it (a person's name, or the rule or import that did)
 * @param origin how it was given, as the project records it (e.g. "manual", "imported")
 * @param spanStart where the coded passage starts in the masked text, or {@link #WHOLE_ANSWER}
 * @param spanEnd where it ends (exclusive), or {@link #WHOLE_ANSWER}
 */
public record ExportAssignment(
    String codeId, String coder, String origin, int spanStart, int spanEnd) {
  /** The span value of an assignment that covers the whole answer. */
  public static final int WHOLE_ANSWER = -1;

  /** Checks the components: both span ends given (start ≤ end) or both {@link #WHOLE_ANSWER}. */
  public ExportAssignment {
    Objects.requireNonNull(codeId, "codeId");
    Objects.requireNonNull(coder, "coder");
    Objects.requireNonNull(origin, "origin");
    boolean whole = spanStart == WHOLE_ANSWER && spanEnd == WHOLE_ANSWER;
    if (!whole && (spanStart < 0 || spanEnd < spanStart)) {
      throw new IllegalArgumentException(
          "span of code " + codeId + " is out of order: " + spanStart + ".." + spanEnd);
    }
  }

  /** Whether the assignment covers the whole answer rather than a passage. */
  public boolean wholeAnswer() {
    return spanStart == WHOLE_ANSWER;
  }
}
