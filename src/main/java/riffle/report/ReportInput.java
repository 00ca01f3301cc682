package riffle.report;

import java.util.HashSet;
import java.util.List;
import java.util.Objects;

/**
 * What the findings are computed from: the questions and waves in order, the codebook and the coded
 * answers.
 *
 * @param questions the questions' texts, in the order the findings list them
 * @param waves the waves' names, oldest first; changes compare neighbours in this order
 * @param codebook the codes, a theme before or after its codes (order kept for display)
 * @param answers every answer to report on
 */
public record ReportInput(
    List<String> questions,
    List<String> waves,
    List<ReportCode> codebook,
    List<ReportAnswer> answers) {
  /** Checks the components, copies the lists and rejects repeated questions, waves or code ids. */
  public ReportInput {
    questions = List.copyOf(questions);
    waves = List.copyOf(waves);
    codebook = List.copyOf(codebook);
    answers = List.copyOf(answers);
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
