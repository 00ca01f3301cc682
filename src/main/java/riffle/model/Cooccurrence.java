package riffle.model;

import java.util.Objects;
import java.util.Optional;

/**
 * How often two codes are given to the same answers.
 *
 * @param a the first code's name
 * @param b the second code's name
 * @param wave the wave counted, empty when all waves are pooled
 * @param count substantive answers carrying both
 * @param jaccard count / answers carrying either
 * @param lift count × base / (answers with a × answers with b); above 1 when they meet more often
 *     than chance
 * @param p the two-sided Fisher exact p-value of the association
 */
public record Cooccurrence(
    String a, String b, Optional<String> wave, int count, double jaccard, double lift, double p) {
  /** Checks the components. */
  public Cooccurrence {
    Objects.requireNonNull(a, "a");
    Objects.requireNonNull(b, "b");
    Objects.requireNonNull(wave, "wave");
  }
}
