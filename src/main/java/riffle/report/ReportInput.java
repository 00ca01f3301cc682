package riffle.report;

import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * What the findings are computed from: the questions and waves in order, the codebook and the coded
 * answers.
 *
 * @param questions the questions' texts, in the order the findings list them
 * @param waves the waves' names, oldest first; changes compare neighbours in this order
 * @param codebook the codes, a theme before or after its codes (order kept for display)
 * @param answers every answer to report on
 * @param randomSamples per question, the waves whose read answers are a random sample of the wave's
 *     answers to it (the first k of its review queue), so that shares are projected there
 */
public record ReportInput(
    List<String> questions,
    List<String> waves,
    List<ReportCode> codebook,
    List<ReportAnswer> answers,
    Map<String, Set<String>> randomSamples) {
  /** The input when no wave was read as a random sample. */
  public ReportInput(
      List<String> questions,
      List<String> waves,
      List<ReportCode> codebook,
      List<ReportAnswer> answers) {
    this(questions, waves, codebook, answers, Map.of());
  }

  /** Checks the components, copies the lists and rejects repeated questions, waves or code ids. */
  public ReportInput {
    questions = List.copyOf(questions);
    waves = List.copyOf(waves);
    codebook = List.copyOf(codebook);
    answers = List.copyOf(answers);
    randomSamples = Map.copyOf(randomSamples);
    unique(questions, "question");
    unique(waves, "wave");
    unique(codebook.stream().map(ReportCode::id).toList(), "code id");
  }

  private static void unique(List<String> values, String what) {
    var seen = new HashSet<String>();
    for (String v : values) {
      if (!seen.add(Objects.requireNonNull(v, what))) {
        throw new IllegalArgumentException("the " + what + " \"" + v + "\" appears twice");
      }
    }
  }
}
