package riffle.app;

import java.util.List;
import java.util.Objects;

/**
 * Answers of a review queue, in its random order.
 *
 * @param status the queue and its sample
 * @param offset where {@code answers} start in the order (0 = first) when they are a stretch of it;
 *     for the next unread answers, the position of the first of them
 * @param answers the answers, in the queue's order
 */
public record QueuePage(QueueStatus status, int offset, List<Item> answers) {
  public QueuePage {
    Objects.requireNonNull(status, "status");
    answers = List.copyOf(answers);
  }

  /**
   * One answer of the queue.
   *
   * @param position its place in the order (1 = first)
   * @param read whether a person has read it
   * @param answer the answer as the coding screen shows it (masked text, codes)
   */
  public record Item(int position, boolean read, AnswerPage.Entry answer) {
    public Item {
      Objects.requireNonNull(answer, "answer");
    }
  }
}
