package riffle.model;

import java.time.LocalDate;
import java.util.Objects;

/**
 * Counts for one wave.
 *
 * @param name the wave's name
 * @param fieldedOn when it was fielded
 * @param respondents respondents in the wave
 * @param answers answers in the wave, non-answers included
 * @param substantive answers that count in bases
 */
public record WaveSummary(
    String name, LocalDate fieldedOn, int respondents, int answers, int substantive) {
  public WaveSummary {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(fieldedOn, "fieldedOn");
  }
}
