package riffle.index;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * One answer as the index holds it.
 *
 * @param answerId the answer's id in the project
 * @param respondent the respondent's id from the export
 * @param wave the wave's name
 * @param question the question's text
 * @param text the masked answer (what is searched, shown and highlighted)
 * @param codes names of the codes assigned to it
 * @param segments segment values by column (device, customer …)
 * @param chunks the answer's chunk phrases (noun, verb and other phrases), as written
 */
public record IndexedAnswer(
    long answerId,
    String respondent,
    String wave,
    String question,
    String text,
    List<String> codes,
    Map<String, String> segments,
    List<String> chunks) {
  public IndexedAnswer {
    Objects.requireNonNull(respondent, "respondent");
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(text, "text");
    codes = List.copyOf(codes);
    segments = Collections.unmodifiableMap(new LinkedHashMap<>(segments));
    chunks = List.copyOf(chunks);
  }
}
