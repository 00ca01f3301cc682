package riffle.quotes;

import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import riffle.model.Analysis;
import riffle.model.Assignment;
import riffle.model.Span;

/**
 * One answer as the quote ranker sees it: where it came from, its analysis (whose masked text is
 * all a quote is ever cut from) and the codes it carries.
 *
 * @param answerId the answer's id in the project
 * @param respondent the respondent's id
 * @param wave the wave's name
 * @param question the question, as in the export header
 * @param segments the respondent's metadata (column → value), for segment filters
 * @param analysis the answer's analysis
 * @param codes the ids of the codes the answer carries
 * @param spans per code id, the words of the masked answer that carry that code, where marked
 */
public record QuoteSource(
    long answerId,
    String respondent,
    String wave,
    String question,
    Map<String, String> segments,
    Analysis analysis,
    Set<Long> codes,
    Map<Long, Span> spans) {
  /**
   * Checks the components and copies the collections; a span must belong to a code the answer
   * carries and lie inside the masked text.
   */
  public QuoteSource {
    Objects.requireNonNull(respondent, "respondent");
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(analysis, "analysis");
    segments = Collections.unmodifiableMap(new TreeMap<>(segments));
    codes = Collections.unmodifiableSet(new TreeSet<>(codes));
    spans = Collections.unmodifiableMap(new TreeMap<>(spans));
    for (Map.Entry<Long, Span> e : spans.entrySet()) {
      if (!codes.contains(e.getKey())) {
        throw new IllegalArgumentException(
            "answer " + answerId + " has a span for code " + e.getKey() + " but not that code");
      }
      if (e.getValue().end() > analysis.masked().length()) {
        throw new IllegalArgumentException(
            "answer "
                + answerId
                + ": the span "
                + e.getValue().start()
                + ".."
                + e.getValue().end()
                + " of code "
                + e.getKey()
                + " runs past the masked text ("
                + analysis.masked().length()
                + " characters)");
      }
    }
  }

  /**
   * The source for one answer from its assignments (every assignment must be of this answer); a
   * code's span is taken from its assignment when marked.
   */
  public static QuoteSource of(
      long answerId,
      String respondent,
      String wave,
      String question,
      Map<String, String> segments,
      Analysis analysis,
      List<Assignment> assignments) {
    Set<Long> codes = new TreeSet<>();
    Map<Long, Span> spans = new TreeMap<>();
    for (Assignment a : assignments) {
      if (a.answerId() != answerId) {
        throw new IllegalArgumentException(
            "an assignment of answer " + a.answerId() + " was given for answer " + answerId);
      }
      codes.add(a.codeId());
      a.span().ifPresent(s -> spans.put(a.codeId(), s));
    }
    return new QuoteSource(answerId, respondent, wave, question, segments, analysis, codes, spans);
  }
}
