package riffle.report;

import java.util.Collections;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalLong;
import java.util.Set;
import java.util.TreeMap;

/**
 * One answer with its codes, as the findings need it (no text: counting never reads it).
 *
 * @param id the answer's id
 * @param wave the name of its wave (one of {@link ReportInput#waves()})
 * @param question the question it answers (one of {@link ReportInput#questions()})
 * @param substantive whether it counts in bases (non-answers such as "n/a" do not)
 * @param codes the ids of the codes it carries
 * @param segments the respondent's metadata (column → value) used to split frequencies
 * @param firstCoded the sequence number of the answer's first reading by a person (such as the
 *     epoch milliseconds of the first mark), which orders the saturation curve; empty while no
 *     person has read it
 * @param read whether a person has read it (coded it, marked it as read with no code applying, or
 *     coded it elsewhere before the import): only read answers are in the base of a code given by
 *     hand
 * @param byRule the ids among {@code codes} that a rule gave and no person has seen (the answer is
 *     unread, or the rule gave them after its last reading): they count in shares by rule only,
 *     never among the read answers
 */
public record ReportAnswer(
    String id,
    String wave,
    String question,
    boolean substantive,
    Set<String> codes,
    Map<String, String> segments,
    OptionalLong firstCoded,
    boolean read,
    Set<String> byRule) {
  /** Checks the components and copies the collections. */
  public ReportAnswer {
    Objects.requireNonNull(id, "id");
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
    codes = Set.copyOf(codes);
    segments = Collections.unmodifiableMap(new TreeMap<>(segments));
    Objects.requireNonNull(firstCoded, "firstCoded");
    byRule = Set.copyOf(byRule);
    if (!codes.containsAll(byRule)) {
      throw new IllegalArgumentException(
          "answer " + id + " names codes given by rule that it does not carry");
    }
    if (!read && (firstCoded.isPresent() || codes.size() > byRule.size())) {
      throw new IllegalArgumentException(
          "answer " + id + " carries codes a person gave (or was read first) but is not read");
    }
  }

  /**
   * An answer whose codes a person gave: read when it carries a code or has a first coding (the
   * findings as they were before review state, with every coded answer read).
   */
  public ReportAnswer(
      String id,
      String wave,
      String question,
      boolean substantive,
      Set<String> codes,
      Map<String, String> segments,
      OptionalLong firstCoded) {
    this(
        id,
        wave,
        question,
        substantive,
        codes,
        segments,
        firstCoded,
        !codes.isEmpty() || firstCoded.isPresent(),
        Set.of());
  }
}
