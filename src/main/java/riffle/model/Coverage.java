package riffle.model;

import java.util.Collection;

/**
 * How many of a wave's answers to a question a person has read: the base of every share of a code
 * given by hand ("read 112 of 580 (19%)"), and whether those answers stand for the rest.
 *
 * @param read substantive answers a person has read (coded, marked as read with no code applying,
 *     or imported as coded elsewhere)
 * @param answers substantive answers
 * @param nonAnswers non-answers ("n/a", "-" …), kept apart: they count in no base
 * @param share read / answers (0 when there are no answers)
 * @param sample how the answers read relate to the wave's: {@link #ALL}, {@link #RANDOM}, {@link
 *     #NOT_RANDOM} or {@link #NONE}
 */
public record Coverage(int read, int answers, int nonAnswers, double share, String sample) {
  /** Every answer was read: the shares are the wave's. */
  public static final String ALL = "all";

  /** The answers read are a random sample of the wave's (its review queue's first k). */
  public static final String RANDOM = "random";

  /**
   * Some answers were read, not as a random sample (in file order, or picked by search or by a
   * phrase): the shares describe the answers read and are not projected to the wave.
   */
  public static final String NOT_RANDOM = "not_random";

  /** No answer was read. */
  public static final String NONE = "none";

  /** Checks the components. */
  public Coverage {
    if (read < 0 || answers < read || nonAnswers < 0) {
      throw new IllegalArgumentException(
          "need 0 <= read <= answers and non-answers >= 0, got " + read + "/" + answers);
    }
    String expected =
        read == 0 ? NONE : read == answers ? ALL : RANDOM.equals(sample) ? RANDOM : NOT_RANDOM;
    if (!expected.equals(sample)) {
      throw new IllegalArgumentException(
          "a reading of " + read + " of " + answers + " is not \"" + sample + "\"");
    }
  }

  /** The coverage of {@code read} out of {@code answers}, read in no random order. */
  public static Coverage of(int read, int answers, int nonAnswers) {
    return of(read, answers, nonAnswers, false);
  }

  /**
   * The coverage of {@code read} out of {@code answers}, with its share.
   *
   * @param random whether the answers read are a random sample of the wave's (ignored when none or
   *     every answer was read)
   */
  public static Coverage of(int read, int answers, int nonAnswers, boolean random) {
    String sample = read == 0 ? NONE : read == answers ? ALL : random ? RANDOM : NOT_RANDOM;
    return new Coverage(
        read, answers, nonAnswers, answers == 0 ? 0 : (double) read / answers, sample);
  }

  /** What a partial reading stands for: ", a random sample", ", not a random sample" or "". */
  public String sampleNote() {
    return switch (sample) {
      case RANDOM -> ", a random sample";
      case NOT_RANDOM -> ", not a random sample";
      default -> "";
    };
  }

  /**
   * What the partial readings of some waves allow, as a sentence starting with ". ", or "" when
   * every wave was read in full or not at all.
   */
  public static String caution(Collection<Coverage> waves) {
    boolean random = waves.stream().anyMatch(c -> c.sample.equals(RANDOM));
    boolean other = waves.stream().anyMatch(c -> c.sample.equals(NOT_RANDOM));
    if (random && other) {
      return ". Where the answers read are a random sample, shares are projected to the wave;"
          + " elsewhere they describe the answers read only, and changes compare those.";
    }
    if (random) {
      return ". The answers read are a random sample: shares are projected to the wave.";
    }
    if (other) {
      return ". The answers read are not a random sample of the wave (a random order in the"
          + " coding screen or riffle queue makes one): shares describe the answers read only,"
          + " are not projected to the wave, and changes compare those.";
    }
    return "";
  }
}
