package riffle.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Code frequencies among the answers of one segment (one value of a metadata column).
 *
 * @param segment the metadata column
 * @param value the column's value shared by these answers (as most of them spell it; values that
 *     differ only in case or surrounding space are one value), or {@link #NO_VALUE}
 * @param bases the answers a person has read per wave, in wave order (the findings' waves)
 * @param coverage per wave, how many of the segment's substantive answers a person has read
 * @param codes the codes' shares among them
 */
public record SegmentFindings(
    String segment,
    String value,
    Map<String, Integer> bases,
    Map<String, Coverage> coverage,
    List<CodeFrequency> codes) {
  /** The group of respondents with no value in the segment's column. */
  public static final String NO_VALUE = "(no value)";

  /** Checks the components and copies the collections. */
  public SegmentFindings {
    Objects.requireNonNull(segment, "segment");
    Objects.requireNonNull(value, "value");
    bases = Collections.unmodifiableMap(new LinkedHashMap<>(bases));
    coverage = Collections.unmodifiableMap(new LinkedHashMap<>(coverage));
    codes = List.copyOf(codes);
  }
}
