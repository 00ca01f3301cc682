/**
 * Word lists that Riffle's stages read: stop words, negation cues, non-answers, evaluative words,
 * the cue, street and name words of the personal-data masks, IBAN lengths.
 *
 * <p>Front door: {@link riffle.words.WordList}. Each list is a UTF-8 resource file, one entry per
 * line, under {@code riffle/words/<language>/<name>.txt} ({@code any} for a list of every
 * language), so that another language adds files, not code. Uses the JDK only, so that any stage
 * may read its lists through it.
 */
package riffle.words;
