package riffle.model;

import java.util.List;
import java.util.Objects;

/**
 * The analysis of one answer.
 *
 * @param language the detected language (ISO 639-3, such as {@code eng}), or {@code und} when the
 *     answer is too short, or too close between languages, to judge
 * @param foreign true when the answer is not in the analysis language; it then gets no English-only
 *     steps (no sentences, tokens or chunks)
 * @param masked the answer with personal data replaced by typed placeholders, everything else
 *     exactly as written
 * @param pii the masks, in text order
 * @param sentences sentences with tokens and chunks; offsets are into {@code masked}
 * @param truncated true when the answer was longer than the analysis cap and only its start was
 *     analysed
 */
public record Analysis(
    String language,
    boolean foreign,
    String masked,
    List<PiiMask> pii,
    List<Sentence> sentences,
    boolean truncated) {
  public Analysis {
    Objects.requireNonNull(language, "language");
    Objects.requireNonNull(masked, "masked");
    pii = List.copyOf(pii);
    sentences = List.copyOf(sentences);
  }
}
