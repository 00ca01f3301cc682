package riffle.model;

import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.TreeMap;

/**
 * A buyer's wording lifted verbatim from one masked answer, with the answers that said nearly the
 * same.
 *
 * @param codeId the code the quote speaks for
 * @param code that code's name
 * @param answerId the answer the text is cut from
 * @param respondent that answer's respondent
 * @param wave that answer's wave
 * @param question the question it answers
 * @param segments the respondent's metadata (column → value)
 * @param text the quote, exactly {@code masked.substring(start, end)} of the answer
 * @param start first character of the quote in the masked answer
 * @param end one past its last character
 * @param score the ranking score (see the quotes package's documentation); higher is better
 * @param count how many answers said it this way (this one included)
 * @param answerIds the ids of those answers, ascending
 * @param fresh whether the wording is new in the latest wave: said there and never before
 * @param slot the use it is a candidate for, or empty in a code's own ranking
 */
public record Quote(
    long codeId,
    String code,
    long answerId,
    String respondent,
    String wave,
    String question,
    Map<String, String> segments,
    String text,
    int start,
    int end,
    double score,
    int count,
    List<Long> answerIds,
    boolean fresh,
    Optional<QuoteSlot> slot) {
  /** Checks the components and copies the collections. */
  public Quote {
    Objects.requireNonNull(code, "code");
    Objects.requireNonNull(respondent, "respondent");
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
    segments = Collections.unmodifiableMap(new TreeMap<>(segments));
    Objects.requireNonNull(text, "text");
    answerIds = List.copyOf(answerIds);
    Objects.requireNonNull(slot, "slot");
    if (start < 0 || end - start != text.length()) {
      throw new IllegalArgumentException(
          "quote offsets " + start + ".." + end + " do not fit its text of " + text.length());
    }
    if (count != answerIds.size() || !answerIds.contains(answerId)) {
      throw new IllegalArgumentException("a quote's count and answer ids must include its answer");
    }
  }

  /** This quote as a candidate for {@code use}. */
  public Quote inSlot(QuoteSlot use) {
    return new Quote(
        codeId,
        code,
        answerId,
        respondent,
        wave,
        question,
        segments,
        text,
        start,
        end,
        score,
        count,
        answerIds,
        fresh,
        Optional.of(use));
  }
}
