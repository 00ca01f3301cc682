package riffle.app;

import java.util.Objects;
import riffle.model.ReadSample;
import riffle.model.ReviewQueue;

/**
 * A review queue and where its read answers lie in its order.
 *
 * @param queue the queue
 * @param sample whether the read answers are a random sample of it, and of how many
 * @param startedNow true only when this call started the queue
 * @param summary the same in one sentence, for a person
 */
public record QueueStatus(
    ReviewQueue queue, ReadSample sample, boolean startedNow, String summary) {
  public QueueStatus {
    Objects.requireNonNull(queue, "queue");
    Objects.requireNonNull(sample, "sample");
    Objects.requireNonNull(summary, "summary");
  }
}
