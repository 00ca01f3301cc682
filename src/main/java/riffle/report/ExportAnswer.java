package riffle.report;

import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

/**
 * One answer for the coded-answers exports.
 *
 * @param id the answer's id
 * @param respondent the respondent's id
 * @param wave the wave's name
 * @param question the question's text
 * @param substantive whether the answer counts in bases
 * @param maskedText the answer with personal data masked (exports never carry the original)
 * @param metadata the respondent's metadata, column → value
 * @param assignments the codes given to the answer
 * @param readBy who read it (coded it, marked it as read with no code applying, or coded it
 *     elsewhere), first reader first; empty while nobody has: its code cells are then unknown, not
 *     0
 */
public record ExportAnswer(
    String id,
    String respondent,
    String wave,
    String question,
    boolean substantive,
    String maskedText,
    Map<String, String> metadata,
    List<ExportAssignment> assignments,
    List<String> readBy) {
  /** Checks the components and copies the collections. */
  public ExportAnswer {
    Objects.requireNonNull(id, "id");
    Objects.requireNonNull(respondent, "respondent");
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(maskedText, "maskedText");
    metadata = Collections.unmodifiableMap(new TreeMap<>(metadata));
    assignments = List.copyOf(assignments);
    readBy = List.copyOf(readBy);
  }

  /** Whether a person has read the answer. */
  public boolean read() {
    return !readBy.isEmpty();
  }
}
