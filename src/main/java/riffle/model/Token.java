package riffle.model;

import java.util.Objects;

/**
 * One token of an analysed answer.
 *
 * @param text the token as written (in the masked text; a placeholder is one token)
 * @param start first character in the masked text
 * @param end one past the last character in the masked text
 * @param pos its Penn Treebank part-of-speech tag
 * @param stem its normalised stem (lower case, Porter)
 * @param negated true when a negation governs it (see the text package's negation rule)
 */
public record Token(String text, int start, int end, String pos, String stem, boolean negated) {
  public Token {
    Objects.requireNonNull(text, "text");
    Objects.requireNonNull(pos, "pos");
    Objects.requireNonNull(stem, "stem");
  }
}
