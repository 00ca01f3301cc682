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
 * @param firstCoded the sequence number of the answer's first coding by a person, which orders the
 *     saturation curve; empty while no person has coded it
 */
public record ReportAnswer(
    String id,
    String wave,
    String question,
    boolean substantive,
    Set<String> codes,
    Map<String, String> segments,
    OptionalLong firstCoded) {
  /** Checks the components and copies the collections. */
  public ReportAnswer {
    Objects.requireNonNull(id, "id");
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
    codes = Set.copyOf(codes);
    segments = Collections.unmodifiableMap(new TreeMap<>(segments));
    Objects.requireNonNull(firstCoded, "firstCoded");
  }
}
