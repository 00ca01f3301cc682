package riffle.model;

import java.util.List;
import java.util.Objects;

/**
 * One sentence of an analysed answer.
 *
 * @param text the sentence, as in the masked text
 * @param start first character in the masked text
 * @param end one past the last character in the masked text
 * @param tokens its tokens, in order
 * @param chunks its chunks, in order
 */
public record Sentence(String text, int start, int end, List<Token> tokens, List<Chunk> chunks) {
  public Sentence {
    Objects.requireNonNull(text, "text");
    tokens = List.copyOf(tokens);
    chunks = List.copyOf(chunks);
  }
}
