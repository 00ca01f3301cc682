package riffle.model;

import java.time.Instant;
import java.util.List;
import java.util.Objects;

/**
 * That a person has read an answer: who, and when first. An answer is read once it carries a code a
 * person gave (by hand, imported from a file coded elsewhere, or an accepted suggestion), a person
 * took a code off it, or a person marked it as read with no code applying; codes made by rules
 * never make an answer read.
 *
 * @param answerId the answer
 * @param readers who read it, in the order of their first mark
 * @param first when it was first read (the earliest of its marks still in the project)
 * @param last its latest mark: a code a rule gave before then was on the answer while a person read
 *     it
 * @param marked whether it carries the "read, no code applies" mark (of a person, or of an import
 *     coded elsewhere that gave it no code)
 */
public record AnswerRead(
    long answerId, List<String> readers, Instant first, Instant last, boolean marked) {
  /** Checks the components and copies the list. */
  public AnswerRead {
    readers = List.copyOf(readers);
    Objects.requireNonNull(first, "first");
    Objects.requireNonNull(last, "last");
    if (readers.isEmpty()) {
      throw new IllegalArgumentException("a read answer has a reader");
    }
  }
}
