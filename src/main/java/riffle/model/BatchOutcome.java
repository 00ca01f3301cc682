package riffle.model;

import java.util.List;

/**
 * What storing a {@link WaveBatch} changed.
 *
 * @param respondentsAdded respondents new to the wave
 * @param answersAdded answers stored
 * @param duplicateRows rows whose every answer was already stored with the same text
 * @param codesCreated codes new to the codebook (from codes columns)
 * @param assignmentsAdded imported assignments stored
 * @param problems answers refused because the wave holds a different text for them
 * @param added the answers stored, with their new ids, in batch order
 */
public record BatchOutcome(
    int respondentsAdded,
    int answersAdded,
    int duplicateRows,
    int codesCreated,
    int assignmentsAdded,
    List<InputProblem> problems,
    List<Added> added) {
  public BatchOutcome {
    problems = List.copyOf(problems);
    added = List.copyOf(added);
  }

  /**
   * An answer the batch stored.
   *
   * @param id its id in the project
   * @param answer what was stored
   */
  public record Added(long id, NewAnswer answer) {}
}
