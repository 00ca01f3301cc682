package riffle.model;

/**
 * The words of an answer that carry a code.
 *
 * @param start first character, an offset into the masked answer
 * @param end one past the last character
 */
public record Span(int start, int end) {
  public Span {
    if (start < 0 || end <= start) {
      throw new InputException("a span needs 0 <= start < end, got " + start + ".." + end);
    }
  }
}
