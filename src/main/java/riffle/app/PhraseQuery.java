package riffle.app;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import riffle.model.ControlChars;
import riffle.model.SettingException;

/**
 * What to mine: which answers, and optionally a wave to compare with.
 *
 * @param wave only this wave, when given
 * @param question only this question: its number (1, 2 …) or its text, when given
 * @param segments only respondents with these segment values
 * @param against compare {@code wave} with this wave, when given
 * @param limit at most this many phrases
 */
public record PhraseQuery(
    Optional<String> wave,
    Optional<String> question,
    Map<String, String> segments,
    Optional<String> against,
    int limit) {
  public PhraseQuery {
    segments = Collections.unmodifiableMap(new LinkedHashMap<>(segments));
    segments.keySet().forEach(k -> ControlChars.checkName("the segment column", k));
    if (limit < 1 || limit > 10_000) {
      throw new SettingException("limit", "the limit must be from 1 to 10000, not " + limit);
    }
    if (against.isPresent() && wave.isEmpty()) {
      throw new SettingException(
          "against", "a comparison needs a wave to compare with the wave it names");
    }
  }
}
