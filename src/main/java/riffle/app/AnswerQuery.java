package riffle.app;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.OptionalLong;
import riffle.model.ControlChars;
import riffle.model.InputException;

/**
 * Which answers to list for coding, and which page of them.
 *
 * @param wave only this wave
 * @param question only this question (its number, 1 = first)
 * @param segments only respondents with these metadata values (column → value)
 * @param coded only coded answers (true) or only uncoded ones (false)
 * @param code only answers carrying this code (its id)
 * @param text a query in the analysts' query language, blank for every answer
 * @param offset how many matching answers to skip, in id order
 * @param limit how many answers to return (1–500)
 */
public record AnswerQuery(
    Optional<String> wave,
    OptionalInt question,
    Map<String, String> segments,
    Optional<Boolean> coded,
    OptionalLong code,
    String text,
    int offset,
    int limit) {
  /** Largest page. */
  public static final int MAX_LIMIT = 500;

  public AnswerQuery {
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(coded, "coded");
    Objects.requireNonNull(code, "code");
    Objects.requireNonNull(text, "text");
    segments = Collections.unmodifiableMap(new LinkedHashMap<>(segments));
    segments.keySet().forEach(k -> ControlChars.checkName("the segment column", k));
    if (offset < 0) {
      throw new InputException("offset must be 0 or more, not " + offset);
    }
    if (limit < 1 || limit > MAX_LIMIT) {
      throw new InputException("limit must be from 1 to " + MAX_LIMIT + ", not " + limit);
    }
  }

  /** The first {@code limit} answers of the project. */
  public static AnswerQuery first(int limit) {
    return new AnswerQuery(
        Optional.empty(),
        OptionalInt.empty(),
        Map.of(),
        Optional.empty(),
        OptionalLong.empty(),
        "",
        0,
        limit);
  }
}
