package riffle.model;

/**
 * How much of an answer a screen is sent at once. Answers are stored whole, however long; a page of
 * answers or search hits carries at most {@link #MAX_CHARS} characters of each, marked as
 * shortened, and the whole text is fetched on request. Stateless.
 */
public final class ShownText {
  /**
   * Characters of one answer sent to a screen at once: about 900 words, far past any answer read at
   * a glance, and the same cut as the analysed prefix.
   */
  public static final int MAX_CHARS = 5_000;

  private ShownText() {}

  /**
   * The length of the part of {@code text} to send: all of it up to {@code max} characters, else
   * {@code max} characters, one less when that would split a surrogate pair.
   */
  public static int cut(String text, int max) {
    if (text.length() <= max) {
      return text.length();
    }
    return Character.isHighSurrogate(text.charAt(max - 1)) ? max - 1 : max;
  }
}
