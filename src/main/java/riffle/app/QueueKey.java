package riffle.app;

import java.util.Objects;
import java.util.Optional;
import riffle.model.InputException;

/**
 * Which review queue: one wave and question, and optionally one value of a segment column.
 *
 * @param wave the wave's name (any case)
 * @param question the question's number (1 = first) or text
 * @param segmentColumn the segment column, when the queue is limited to one value of it
 * @param segmentValue that value
 */
public record QueueKey(
    String wave, String question, Optional<String> segmentColumn, Optional<String> segmentValue) {
  public QueueKey {
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(segmentColumn, "segmentColumn");
    Objects.requireNonNull(segmentValue, "segmentValue");
    segmentColumn = segmentColumn.map(String::strip).filter(s -> !s.isEmpty());
    segmentValue = segmentValue.map(String::strip).filter(s -> !s.isEmpty());
    if (segmentColumn.isPresent() != segmentValue.isPresent()) {
      throw new InputException(
          "a segment is COLUMN=VALUE, such as device=mobile: give both the column and the value");
    }
  }

  /** The queue of a whole wave and question. */
  public static QueueKey of(String wave, String question) {
    return new QueueKey(wave, question, Optional.empty(), Optional.empty());
  }

  /**
   * The queue of a wave and question limited to a segment written {@code COLUMN=VALUE}; blank or
   * absent for none.
   *
   * @throws IllegalArgumentException when the segment is not {@code COLUMN=VALUE}
   */
  public static QueueKey of(String wave, String question, Optional<String> segment) {
    String s = segment.map(String::strip).orElse("");
    if (s.isEmpty()) {
      return of(wave, question);
    }
    int eq = s.indexOf('=');
    if (eq <= 0 || eq == s.length() - 1) {
      throw new InputException("a segment is COLUMN=VALUE, such as device=mobile, not '" + s + "'");
    }
    return new QueueKey(
        wave, question, Optional.of(s.substring(0, eq)), Optional.of(s.substring(eq + 1)));
  }
}
