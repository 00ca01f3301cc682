package riffle.model;

import java.time.Instant;
import java.util.Objects;
import java.util.Optional;

/**
 * A random review queue: the substantive answers of one wave and question (or of one segment value
 * of it) in a seeded random order, so that the answers a person reads from its start are a simple
 * random sample of them. The order itself is never stored; it follows from the seed and the answer
 * ids (see {@code riffle.coding.ReviewOrder}).
 *
 * @param id the queue's id
 * @param wave the wave's name
 * @param question the question's text
 * @param segmentColumn the segment column it is limited to, when it is
 * @param segmentValue the value of that column, when it is
 * @param seed the seed of the order, from 0 to {@link #MAX_SEED}
 * @param startedBy who started it
 * @param startedAt when
 */
public record ReviewQueue(
    long id,
    String wave,
    String question,
    Optional<String> segmentColumn,
    Optional<String> segmentValue,
    long seed,
    String startedBy,
    Instant startedAt) {
  /** The largest seed: 2<sup>53</sup> − 1, so that every JSON reader keeps it exact. */
  public static final long MAX_SEED = (1L << 53) - 1;

  public ReviewQueue {
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(question, "question");
    Objects.requireNonNull(segmentColumn, "segmentColumn");
    Objects.requireNonNull(segmentValue, "segmentValue");
    Objects.requireNonNull(startedBy, "startedBy");
    Objects.requireNonNull(startedAt, "startedAt");
    if (segmentColumn.isPresent() != segmentValue.isPresent()) {
      throw new InputException("a segment needs both its column and its value");
    }
    if (seed < 0 || seed > MAX_SEED) {
      throw new InputException(
          "a queue's seed is a whole number from 0 to " + MAX_SEED + ", not " + seed);
    }
  }

  /** The segment as {@code COLUMN=VALUE}, when the queue is limited to one. */
  public Optional<String> segment() {
    return segmentColumn.map(c -> c + "=" + segmentValue.orElseThrow());
  }
}
