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
 * @param value the column's value shared by these answers
 * @param bases substantive answers per wave, in wave order
 * @param codes the codes' shares among them
 */
public record SegmentFindings(
    String segment, String value, Map<String, Integer> bases, List<CodeFrequency> codes) {
  /** Checks the components and copies the collections. */
  public SegmentFindings {
    Objects.requireNonNull(segment, "segment");
    Objects.requireNonNull(value, "value");
    bases = Collections.unmodifiableMap(new LinkedHashMap<>(bases));
    codes = List.copyOf(codes);
  }
}
