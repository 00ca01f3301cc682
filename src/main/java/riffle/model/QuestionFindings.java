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
 * @param bases substantive answers per wave, in wave order (waves coded for this question only)
 * @param notCoded the waves in which no answer to this question is coded yet: left out of every
 *     count and comparison
 * @param codes each code's share per wave, in codebook order (a theme before its codes)
 * @param changes each code's change between the waves compared
 * @param cooccurrence pairs of codes given to the same answers
 * @param saturation how complete the codebook looks for this question
 * @param segments frequencies per segment, when asked for (empty otherwise)
 */
public record QuestionFindings(
    String question,
    Map<String, Integer> bases,
    List<String> notCoded,
    List<CodeFrequency> codes,
    List<WaveChange> changes,
    List<Cooccurrence> cooccurrence,
    Saturation saturation,
    List<SegmentFindings> segments) {
  /** Checks the components and copies the collections. */
  public QuestionFindings {
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(saturation, "saturation");
    bases = Collections.unmodifiableMap(new LinkedHashMap<>(bases));
    notCoded = List.copyOf(notCoded);
    codes = List.copyOf(codes);
    changes = List.copyOf(changes);
    cooccurrence = List.copyOf(cooccurrence);
    segments = List.copyOf(segments);
  }
}
