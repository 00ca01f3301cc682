package riffle.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * One respondent read from an export, with their answers and segments.
 *
 * @param externalId the export's own id, or {@code row-N} when it has none
 * @param line the 1-based physical line where the record starts
 * @param respondedAt when they answered, as written in the export; empty string when unknown
 * @param meta segment values by column header (device, country …), in column order
 * @param answers one per open-text question
 */
public record NewRespondent(
    String externalId,
    long line,
    String respondedAt,
    Map<String, String> meta,
    List<NewAnswer> answers) {
  public NewRespondent {
    Objects.requireNonNull(externalId, "externalId");
    Objects.requireNonNull(respondedAt, "respondedAt");
    meta = Collections.unmodifiableMap(new LinkedHashMap<>(meta));
    answers = List.copyOf(answers);
  }
}
