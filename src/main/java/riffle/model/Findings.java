package riffle.model;

import java.util.List;

/**
 * The findings of a project: per question, code frequencies with intervals, wave changes,
 * co-occurrence and saturation (the document {@code riffle report --json} prints).
 *
 * @param questions one entry per question, in the project's order
 */
public record Findings(List<QuestionFindings> questions) {
  /** Copies the list. */
  public Findings {
    questions = List.copyOf(questions);
  }
}
