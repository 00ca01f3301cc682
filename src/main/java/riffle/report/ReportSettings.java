package riffle.report;

import java.util.Objects;
import java.util.Optional;
import riffle.model.InputException;
import riffle.model.SettingException;

/**
 * Options of a findings computation.
 *
 * @param segment a metadata column whose values split the frequencies, empty for none
 * @param from the earlier wave of a single comparison, empty to compare each pair of neighbouring
 *     waves
 * @param to the later wave of that comparison, present exactly when {@code from} is
 * @param cooccurrencePerWave whether to count co-occurrence per wave instead of pooling the waves
 */
public record ReportSettings(
    Optional<String> segment,
    Optional<String> from,
    Optional<String> to,
    boolean cooccurrencePerWave) {
  /** Neighbouring waves compared, no segments, co-occurrence pooled over waves. */
  public static final ReportSettings DEFAULTS =
      new ReportSettings(Optional.empty(), Optional.empty(), Optional.empty(), false);

  /** Checks that a comparison names both waves, and two different ones. */
  public ReportSettings {
    Objects.requireNonNull(segment, "segment");
    Objects.requireNonNull(from, "from");
    Objects.requireNonNull(to, "to");
    if (from.isPresent() != to.isPresent()) {
      throw new SettingException(
          from.isEmpty() ? "from" : "to",
          "a comparison needs both waves: the one to compare from and the one to compare to");
    }
    if (from.isPresent() && from.equals(to)) {
      throw new InputException("compare two different waves, not " + from.get() + " with itself");
    }
  }

  /** These settings with frequencies split by the given metadata column. */
  public ReportSettings withSegment(String column) {
    return new ReportSettings(Optional.of(column), from, to, cooccurrencePerWave);
  }

  /** These settings comparing only the two given waves. */
  public ReportSettings comparing(String fromWave, String toWave) {
    return new ReportSettings(
        segment, Optional.of(fromWave), Optional.of(toWave), cooccurrencePerWave);
  }

  /** These settings with co-occurrence counted per wave. */
  public ReportSettings withCooccurrencePerWave() {
    return new ReportSettings(segment, from, to, true);
  }
}
