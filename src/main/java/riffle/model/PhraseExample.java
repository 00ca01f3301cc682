package riffle.model;

import java.util.Objects;

/**
 * An answer quoted as an example of a phrase.
 *
 * @param answerId the answer's id
 * @param respondent the respondent's id
 * @param wave the wave's name
 * @param text the masked answer ({@code Analysis.masked()}): personal data never shows; of a long
 *     answer only its first {@link ShownText#MAX_CHARS} characters
 */
public record PhraseExample(long answerId, String respondent, String wave, String text) {
  /** Checks the components. */
  public PhraseExample {
    Objects.requireNonNull(respondent, "respondent");
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(text, "text");
  }
}
