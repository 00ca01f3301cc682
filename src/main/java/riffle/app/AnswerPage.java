package riffle.app;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import riffle.model.AnswerRead;
import riffle.model.Assignment;
import riffle.model.ShownText;
import riffle.store.ProjectStore;

/**
 * One page of the answers a coder works through.
 *
 * @param query the whole query the filters made, in the analysts' query language
 * @param total answers matching it
 * @param coded how many of those carry at least one code
 * @param substantive how many of those are substantive (the rest are non-answers, kept apart)
 * @param read how many of the substantive ones a person has read (the coding's progress)
 * @param offset where this page starts among them (0 = first)
 * @param answers the page's answers, in id order
 */
public record AnswerPage(
    String query,
    int total,
    int coded,
    int substantive,
    int read,
    int offset,
    List<Entry> answers) {
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
   * @param read whether a person has read it (see {@link riffle.model.AnswerRead})
   * @param marked whether it carries the "read, no code applies" mark
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
      List<Assignment> assignments,
      boolean read,
      boolean marked) {
    public Entry {
      Objects.requireNonNull(respondent, "respondent");
      Objects.requireNonNull(wave, "wave");
      Objects.requireNonNull(question, "question");
      Objects.requireNonNull(text, "text");
      segments = Collections.unmodifiableMap(new LinkedHashMap<>(segments));
      assignments = List.copyOf(assignments);
    }

    /**
     * An answer of the store as the screen shows it: its text cut to {@link ShownText#MAX_CHARS},
     * its codes, and whether (and how) a person read it.
     *
     * @param read how a person read it, or null while nobody has
     */
    static Entry of(
        ProjectStore.AnswerRow row,
        int questionNumber,
        List<Assignment> assignments,
        AnswerRead read) {
      int cut = ShownText.cut(row.masked(), ShownText.MAX_CHARS);
      return new Entry(
          row.id(),
          row.respondent(),
          row.wave(),
          row.question(),
          questionNumber,
          row.masked().substring(0, cut),
          cut < row.masked().length(),
          row.masked().length(),
          row.substantive(),
          row.segments(),
          assignments,
          read != null,
          read != null && read.marked());
    }
  }
}
