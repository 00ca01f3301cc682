package riffle.app;

import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.OptionalLong;
import java.util.Set;
import riffle.coding.ReviewOrder;
import riffle.model.AnswerRead;
import riffle.model.Assignment;
import riffle.model.InputException;
import riffle.model.ReadSample;
import riffle.model.ReviewQueue;
import riffle.store.ProjectStore;

/**
 * Random review queues: each puts the substantive answers of one wave and question (or of one
 * segment value) in a seeded random order ({@link ReviewOrder}), so that the answers a person reads
 * from its start are a simple random sample, from which a share can be projected to every answer of
 * the wave. A queue is started once (its seed, starter and time are kept); reading in any other
 * order is allowed and is then said: the read answers are no longer a random sample.
 */
public final class ReviewQueues {
  private final ProjectStore store;

  ReviewQueues(ProjectStore store) {
    this.store = store;
  }

  /** A queue's key with the project's own names, and the segment as stored ('' for none). */
  private record Resolved(String wave, String question, int number, String column, String value) {
    String describe() {
      return "wave \""
          + wave
          + "\", question "
          + number
          + (column.isEmpty() ? "" : ", segment " + column + "=" + value);
    }
  }

  /**
   * Starts the queue of {@code key}, or returns it when it was started before.
   *
   * @param coder who starts it
   * @param key the wave, question and segment
   * @param seed the seed of its order (0 to {@link ReviewQueue#MAX_SEED}); when empty, one is drawn
   *     from the clock (and stored)
   * @throws IllegalArgumentException when the key names a wave, question or segment the project
   *     lacks, it holds no substantive answer, the seed is out of range, or the queue was started
   *     before with another seed
   */
  public QueueStatus start(String coder, QueueKey key, OptionalLong seed) throws InputException {
    if (seed.isPresent() && (seed.getAsLong() < 0 || seed.getAsLong() > ReviewQueue.MAX_SEED)) {
      throw new InputException(
          "a seed is a whole number from 0 to "
              + ReviewQueue.MAX_SEED
              + ", not "
              + seed.getAsLong());
    }
    Resolved r = resolve(key);
    List<Long> answers = store.queueAnswers(r.wave, r.question, r.column, r.value);
    if (answers.isEmpty()) {
      throw new InputException("there is no substantive answer to order for " + r.describe());
    }
    long chosen = seed.orElseGet(ReviewQueues::clockSeed);
    ProjectStore.QueueStart started =
        store.startQueue(r.wave, r.question, r.column, r.value, chosen, coder);
    ReviewQueue q = started.queue();
    if (!started.created() && seed.isPresent() && q.seed() != seed.getAsLong()) {
      throw new InputException(
          "the random order of "
              + r.describe()
              + " was started by "
              + q.startedBy()
              + " on "
              + q.startedAt()
              + " with seed "
              + q.seed()
              + "; it keeps that seed, since a new order would make the answers read so far"
              + " no random sample");
    }
    return status(q, answers, started.created());
  }

  /** The queue of {@code key} and its sample, when it was started. */
  public Optional<QueueStatus> status(QueueKey key) throws InputException {
    Resolved r = resolve(key);
    Optional<ReviewQueue> q = store.queue(r.wave, r.question, r.column, r.value);
    if (q.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(status(q.get(), answersOf(q.get()), false));
  }

  /** Every queue with its sample, by wave, question and segment. */
  public List<QueueStatus> all() throws InputException {
    List<QueueStatus> out = new ArrayList<>();
    for (ReviewQueue q : store.queues()) {
      out.add(status(q, answersOf(q), false));
    }
    return out;
  }

  /**
   * The next answers to read: the unread ones in the queue's order (a skipped one first), at most
   * {@code limit}; empty when the queue was not started.
   */
  public Optional<QueuePage> next(QueueKey key, int limit) throws InputException {
    checkLimit(limit);
    Optional<Ordered> o = ordered(key);
    if (o.isEmpty()) {
      return Optional.empty();
    }
    Ordered q = o.get();
    List<Integer> positions = new ArrayList<>();
    for (int i = 0; i < q.order.length && positions.size() < limit; i++) {
      if (!q.read.contains(q.order[i])) {
        positions.add(i);
      }
    }
    int offset = positions.isEmpty() ? q.order.length : positions.get(0);
    return Optional.of(new QueuePage(q.status, offset, items(q, positions)));
  }

  /**
   * A stretch of the queue's order, read answers included: from {@code offset} (by default the
   * first unread answer, or the start when every answer is read), at most {@code limit}; empty when
   * the queue was not started.
   */
  public Optional<QueuePage> page(QueueKey key, OptionalInt offset, int limit)
      throws InputException {
    checkLimit(limit);
    if (offset.isPresent() && offset.getAsInt() < 0) {
      throw new InputException("offset must be 0 or more, not " + offset.getAsInt());
    }
    Optional<Ordered> o = ordered(key);
    if (o.isEmpty()) {
      return Optional.empty();
    }
    Ordered q = o.get();
    int firstUnread = q.status.sample().sample();
    int from =
        Math.min(q.order.length, offset.orElse(firstUnread < q.order.length ? firstUnread : 0));
    List<Integer> positions = new ArrayList<>();
    for (int i = from; i < Math.min(q.order.length, from + limit); i++) {
      positions.add(i);
    }
    return Optional.of(new QueuePage(q.status, from, items(q, positions)));
  }

  /** A queue with its order and read answers. */
  private record Ordered(QueueStatus status, long[] order, Set<Long> read) {}

  private Optional<Ordered> ordered(QueueKey key) throws InputException {
    Resolved r = resolve(key);
    Optional<ReviewQueue> found = store.queue(r.wave, r.question, r.column, r.value);
    if (found.isEmpty()) {
      return Optional.empty();
    }
    ReviewQueue q = found.get();
    long[] order = ReviewOrder.order(q.seed(), answersOf(q));
    Set<Long> read = store.readAnswers(q.wave(), q.question());
    ReadSample sample = ReviewOrder.sample(order, read);
    return Optional.of(
        new Ordered(new QueueStatus(q, sample, false, summary(sample)), order, read));
  }

  private QueueStatus status(ReviewQueue q, List<Long> answers, boolean startedNow)
      throws InputException {
    long[] order = ReviewOrder.order(q.seed(), answers);
    ReadSample sample = ReviewOrder.sample(order, store.readAnswers(q.wave(), q.question()));
    return new QueueStatus(q, sample, startedNow, summary(sample));
  }

  private List<Long> answersOf(ReviewQueue q) throws InputException {
    return store.queueAnswers(
        q.wave(), q.question(), q.segmentColumn().orElse(""), q.segmentValue().orElse(""));
  }

  private List<QueuePage.Item> items(Ordered q, List<Integer> positions) throws InputException {
    List<Long> ids = new ArrayList<>(positions.size());
    for (int p : positions) {
      ids.add(q.order[p]);
    }
    List<String> questions = store.questions();
    Map<Long, ProjectStore.AnswerRow> rows = new HashMap<>();
    for (ProjectStore.AnswerRow row : store.answerRows(ids)) {
      rows.put(row.id(), row);
    }
    Map<Long, List<Assignment>> assigned = store.assignments(ids);
    Map<Long, AnswerRead> reads = store.reads(ids);
    List<QueuePage.Item> out = new ArrayList<>(positions.size());
    for (int p : positions) {
      long id = q.order[p];
      ProjectStore.AnswerRow row = rows.get(id);
      out.add(
          new QueuePage.Item(
              p + 1,
              q.read.contains(id),
              AnswerPage.Entry.of(
                  row,
                  questions.indexOf(row.question()) + 1,
                  assigned.getOrDefault(id, List.of()),
                  reads.get(id))));
    }
    return out;
  }

  private Resolved resolve(QueueKey key) throws InputException {
    String wave = Lookups.wave(key.wave(), store.waveNames(), "wave");
    List<String> questions = store.questions();
    String question = Lookups.question(key.question(), questions, store.questionNames());
    int number = questions.indexOf(question) + 1;
    if (key.segmentColumn().isEmpty()) {
      return new Resolved(wave, question, number, "", "");
    }
    String given = key.segmentColumn().get();
    List<String> columns = store.segmentColumns(wave);
    String column =
        columns.stream()
            .filter(c -> c.equalsIgnoreCase(given))
            .findFirst()
            .orElseThrow(
                () ->
                    new InputException(
                        "the respondents of wave \""
                            + wave
                            + "\" have no segment column \""
                            + given
                            + "\""
                            + (columns.isEmpty()
                                ? " (they have none)"
                                : "; they have: " + String.join(", ", columns))));
    return new Resolved(wave, question, number, column, key.segmentValue().orElseThrow());
  }

  /** What the sample allows, in one sentence. */
  static String summary(ReadSample s) {
    if (s.answers() == 0) {
      return "This queue has no answers left to order.";
    }
    if (s.complete()) {
      return "All "
          + count(s.answers())
          + " answers in this order are read: the counts are the answers' own, not estimates.";
    }
    if (s.random()) {
      return "Read the first "
          + count(s.sample())
          + " of "
          + count(s.answers())
          + " answers in this random order: a random sample, so a share of them can be"
          + " projected to all "
          + count(s.answers())
          + ".";
    }
    if (s.read() == 0) {
      return "Nothing read yet. Read from the start of this order and the answers read are a"
          + " random sample of the "
          + count(s.answers())
          + ".";
    }
    return "Read "
        + count(s.read())
        + " of "
        + count(s.answers())
        + " answers, but not a random sample: "
        + count(s.outside())
        + (s.outside() == 1 ? " was" : " were")
        + " read outside this random order, with "
        + count(s.skipped())
        + " unread before "
        + (s.outside() == 1 ? "it" : "them")
        + ". Reading those "
        + count(s.skipped())
        + " makes the read answers a random sample of "
        + count(s.read() + s.skipped())
        + ".";
  }

  private static String count(int n) {
    return String.format(Locale.ROOT, "%,d", n);
  }

  private static void checkLimit(int limit) {
    if (limit < 1 || limit > AnswerQuery.MAX_LIMIT) {
      throw new InputException(
          "limit must be from 1 to " + AnswerQuery.MAX_LIMIT + ", not " + limit);
    }
  }

  /** A seed from the clock, for a queue started without one (it is stored, so nothing is lost). */
  private static long clockSeed() {
    Instant now = Instant.now();
    return ReviewOrder.seed(now.getEpochSecond() * 1_000_000_000L + now.getNano());
  }
}
