package riffle.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The findings of a project: per question, code frequencies with intervals, wave changes,
 * co-occurrence and saturation (the document {@code riffle report --json} prints).
 *
 * @param questions one entry per question, in the project's order
 * @param questionNames the questions' short names from two-row headers, by question, for those that
 *     have one
 */
public record Findings(List<QuestionFindings> questions, Map<String, String> questionNames) {
  /** Copies the list and the names. */
  public Findings {
    questions = List.copyOf(questions);
    questionNames = Collections.unmodifiableMap(new LinkedHashMap<>(questionNames));
  }

  /** Findings of questions that have no short names. */
  public Findings(List<QuestionFindings> questions) {
    this(questions, Map.of());
  }

  /** A question as headings show it: its short name and its wording, or its wording alone. */
  public String label(QuestionFindings q) {
    String name = questionNames.get(q.question());
    return name == null ? q.question() : name + ": " + q.question();
  }
}
