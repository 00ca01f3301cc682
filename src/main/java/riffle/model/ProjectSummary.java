package riffle.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Counts for a whole project.
 *
 * @param waves per wave, in the order they were created
 * @param questions the open-text questions, in the order first seen
 * @param questionNames the questions' short names from two-row headers ({@code Q2}), by question,
 *     for those that have one
 * @param respondents respondents over all waves
 * @param answers answers over all waves, non-answers included
 * @param substantive answers that count in bases
 * @param codes codes in the codebook, archived ones included
 * @param assignments code assignments
 */
public record ProjectSummary(
    List<WaveSummary> waves,
    List<String> questions,
    Map<String, String> questionNames,
    int respondents,
    int answers,
    int substantive,
    int codes,
    int assignments) {
  public ProjectSummary {
    waves = List.copyOf(waves);
    questions = List.copyOf(questions);
    questionNames = Collections.unmodifiableMap(new LinkedHashMap<>(questionNames));
  }
}
