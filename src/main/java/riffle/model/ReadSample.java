package riffle.model;

/**
 * Where the answers a person has read lie in a review queue's random order. They are a random
 * sample when they are exactly the first {@code sample} answers of the order ({@code sample} ≥ 1):
 * every one of those is read and no answer after them is.
 *
 * @param answers the queue's answers (N)
 * @param read how many of them a person has read
 * @param sample k: how many answers from the start of the order are read without a gap
 * @param outside read answers after the first unread one: read outside the random order
 * @param skipped unread answers before the last read one; reading them makes the read answers a
 *     random sample again (of {@code sample + skipped + outside})
 * @param random whether the read answers are a random sample
 */
public record ReadSample(
    int answers, int read, int sample, int outside, int skipped, boolean random) {
  public ReadSample {
    if (answers < 0
        || read < 0
        || read > answers
        || sample < 0
        || outside < 0
        || skipped < 0
        || sample + outside != read
        || sample + outside + skipped > answers
        || (outside == 0) != (skipped == 0)) {
      throw new IllegalArgumentException(
          "inconsistent sample: answers="
              + answers
              + ", read="
              + read
              + ", sample="
              + sample
              + ", outside="
              + outside
              + ", skipped="
              + skipped);
    }
    if (random != (sample >= 1 && outside == 0)) {
      throw new IllegalArgumentException("random means: read from the start, none outside");
    }
  }

  /** Whether every answer of the queue is read (a census, not a sample). */
  public boolean complete() {
    return answers > 0 && sample == answers;
  }
}
