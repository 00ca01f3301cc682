package riffle.model;

import java.util.List;

/**
 * Counts for a whole project.
 *
 * @param waves per wave, in the order they were created
 * @param questions the open-text questions, in the order first seen
 * @param respondents respondents over all waves
 * @param answers answers over all waves, non-answers included
 * @param substantive answers that count in bases
 * @param codes codes in the codebook, archived ones included
 * @param assignments code assignments
 */
public record ProjectSummary(
    List<WaveSummary> waves,
    List<String> questions,
    int respondents,
    int answers,
    int substantive,
    int codes,
    int assignments) {
  public ProjectSummary {
    waves = List.copyOf(waves);
    questions = List.copyOf(questions);
  }
}
