package riffle.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Everything the findings say about one question.
 *
 * @param question the question's text
 * @param bases the answers a person has read per wave, in wave order: the base of the shares of
 *     codes given by hand (only the waves the findings show: those with a read answer, or with a
 *     code given by rule)
 * @param coverage per wave with answers to the question, how many of its substantive answers a
 *     person has read
 * @param notCoded the waves in which no answer to this question is read by a person yet: codes
 *     given by hand have no share there and are not compared
 * @param codes each code's share per wave, in codebook order (a theme before its codes)
 * @param changes each code's change between the waves compared
 * @param notCompared the comparisons left out, each with its reason
 * @param cooccurrence pairs of codes given to the same answers
 * @param saturation how complete the codebook looks for this question
 * @param segments frequencies per segment, when asked for (empty otherwise)
 */
public record QuestionFindings(
    String question,
    Map<String, Integer> bases,
    Map<String, Coverage> coverage,
    List<String> notCoded,
    List<CodeFrequency> codes,
    List<WaveChange> changes,
    List<NotCompared> notCompared,
    List<Cooccurrence> cooccurrence,
    Saturation saturation,
    List<SegmentFindings> segments) {
  /** Checks the components and copies the collections. */
  public QuestionFindings {
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(saturation, "saturation");
    bases = Collections.unmodifiableMap(new LinkedHashMap<>(bases));
    coverage = Collections.unmodifiableMap(new LinkedHashMap<>(coverage));
    notCoded = List.copyOf(notCoded);
    codes = List.copyOf(codes);
    changes = List.copyOf(changes);
    notCompared = List.copyOf(notCompared);
    cooccurrence = List.copyOf(cooccurrence);
    segments = List.copyOf(segments);
  }
}
