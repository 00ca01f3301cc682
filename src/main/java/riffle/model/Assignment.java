package riffle.model;

import java.time.Instant;
import java.util.Objects;
import java.util.Optional;

/**
 * A code given to an answer.
 *
 * @param answerId the answer
 * @param codeId the code
 * @param span the words that carry the code, when marked
 * @param coder who made it
 * @param origin by hand, by rule, imported, or an accepted suggestion
 * @param at when it was made
 */
public record Assignment(
    long answerId, long codeId, Optional<Span> span, String coder, Origin origin, Instant at) {
  public Assignment {
    Objects.requireNonNull(span, "span");
    Objects.requireNonNull(coder, "coder");
    Objects.requireNonNull(origin, "origin");
    Objects.requireNonNull(at, "at");
  }
}
