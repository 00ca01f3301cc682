package riffle.model;

/** Receives progress of long work; implementations must be cheap, as they are called often. */
@FunctionalInterface
public interface Progress {
  /** Reports nothing. */
  Progress NONE = (phase, done, total) -> {};

  /**
   * Reports that {@code done} of {@code total} units of {@code phase} are finished.
   *
   * @param phase a short lower-case label such as "storing"
   * @param done units finished so far
   * @param total units in all, or -1 when unknown
   */
  void update(String phase, long done, long total);
}
