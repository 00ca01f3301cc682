package riffle.app;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import riffle.model.Assignment;

/**
 * One page of the answers a coder works through.
 *
 * @param query the whole query the filters made, in the analysts' query language
 * @param total answers matching it
 * @param coded how many of those carry at least one code
 * @param offset where this page starts among them (0 = first)
 * @param answers the page's answers, in id order
 */
public record AnswerPage(String query, int total, int coded, int offset, List<Entry> answers) {
  public AnswerPage {
    Objects.requireNonNull(query, "query");
    answers = List.copyOf(answers);
  }

  /**
   * An answer as the coding screen shows it.
   *
   * @param id the answer's id
   * @param respondent the respondent's id from the export
   * @param wave the wave's name
   * @param question the question's text
   * @param questionNumber the question's number (1 = first)
   * @param text the masked text, which spans point into; only its start when {@code truncated}
   * @param truncated true when {@code text} is the first {@link riffle.model.ShownText#MAX_CHARS}
   *     characters of a longer answer (the whole is {@link AnswerBrowser#text})
   * @param length the length of the whole masked text, in characters
   * @param substantive false for a non-answer
   * @param segments the respondent's metadata
   * @param assignments its codes, in the order given
   */
  public record Entry(
      long id,
      String respondent,
      String wave,
      String question,
      int questionNumber,
      String text,
      boolean truncated,
      int length,
      boolean substantive,
      Map<String, String> segments,
      List<Assignment> assignments) {
    public Entry {
      Objects.requireNonNull(respondent, "respondent");
      Objects.requireNonNull(wave, "wave");
      Objects.requireNonNull(question, "question");
      Objects.requireNonNull(text, "text");
      segments = Collections.unmodifiableMap(new LinkedHashMap<>(segments));
      assignments = List.copyOf(assignments);
    }
  }
}
