package riffle.phrases;

import java.util.HashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * Which answers to mine: an optional wave, an optional question and any number of segment values,
 * all of which an answer must match exactly.
 *
 * @param wave the wave's name, or empty for every wave
 * @param question the question, or empty for every question
 * @param segments metadata column → required value; empty for everyone
 */
public record PhraseFilter(
    Optional<String> wave, Optional<String> question, Map<String, String> segments) {
  /** Checks the components and copies the segments. */
  public PhraseFilter {
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
    segments = Map.copyOf(segments);
  }

  /** Every answer. */
  public static PhraseFilter all() {
    return new PhraseFilter(Optional.empty(), Optional.empty(), Map.of());
  }

  /** This filter restricted to one wave. */
  public PhraseFilter withWave(String name) {
    return new PhraseFilter(Optional.of(name), question, segments);
  }

  /** This filter restricted to one question. */
  public PhraseFilter withQuestion(String text) {
    return new PhraseFilter(wave, Optional.of(text), segments);
  }

  /** This filter restricted to respondents whose {@code column} is {@code value}. */
  public PhraseFilter withSegment(String column, String value) {
    Map<String, String> more = new HashMap<>(segments);
    more.put(Objects.requireNonNull(column, "column"), Objects.requireNonNull(value, "value"));
    return new PhraseFilter(wave, question, more);
  }

  /** Whether the answer matches the wave, the question and every segment value. */
  public boolean accepts(PhraseDoc d) {
    if (wave.isPresent() && !wave.get().equals(d.wave())) {
      return false;
    }
    if (question.isPresent() && !question.get().equals(d.question())) {
      return false;
    }
    for (Map.Entry<String, String> e : segments.entrySet()) {
      if (!e.getValue().equals(d.segments().get(e.getKey()))) {
        return false;
      }
    }
    return true;
  }
}
