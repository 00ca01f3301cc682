package riffle.app;

import java.util.Objects;
import java.util.Optional;
import riffle.model.ControlChars;

/**
 * What findings to compute.
 *
 * @param question only this question (its number or text), or all
 * @param segment split frequencies by this metadata column, or not at all
 * @param from compare only this wave with {@code to}; empty to compare neighbouring waves
 * @param to the later wave of that comparison
 */
public record FindingsQuery(
    Optional<String> question,
    Optional<String> segment,
    Optional<String> from,
    Optional<String> to) {
  /** Every question, neighbouring waves compared. */
  public static final FindingsQuery ALL =
      new FindingsQuery(Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty());

  public FindingsQuery {
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(segment, "segment");
    Objects.requireNonNull(from, "from");
    Objects.requireNonNull(to, "to");
    segment.ifPresent(s -> ControlChars.checkName("the segment column", s));
  }
}
