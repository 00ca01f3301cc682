package riffle.app;

import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import riffle.model.ControlChars;

/**
 * Which buyer quotes to rank.
 *
 * @param code only this code's quotes (its name), or every code's
 * @param wave only quotes from this wave, or from all
 * @param segments only quotes from respondents with these segment values
 */
public record QuoteQuery(
    Optional<String> code, Optional<String> wave, Map<String, String> segments) {
  /** Every code, every wave. */
  public static final QuoteQuery ALL = new QuoteQuery(Optional.empty(), Optional.empty(), Map.of());

  public QuoteQuery {
    Objects.requireNonNull(code, "code");
    Objects.requireNonNull(wave, "wave");
    segments = Map.copyOf(segments);
    segments.keySet().forEach(k -> ControlChars.checkName("the segment column", k));
  }
}
