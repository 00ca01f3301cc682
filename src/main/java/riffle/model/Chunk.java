package riffle.model;

import java.util.Objects;

/**
 * A phrase chunk (CoNLL-2000 types: NP, VP, PP, ADJP, ADVP, PRT, SBAR …).
 *
 * @param type the chunk type
 * @param text the chunk's text, as in the masked text
 * @param start first character in the masked text
 * @param end one past the last character in the masked text
 */
public record Chunk(String type, String text, int start, int end) {
  public Chunk {
    Objects.requireNonNull(type, "type");
    Objects.requireNonNull(text, "text");
  }
}
