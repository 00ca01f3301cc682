package riffle.app;

import java.util.List;
import java.util.Objects;

/**
 * A segment column of a question's answers and its values, merged as the findings merge them
 * (values that differ only in case or surrounding space are one value; blanks are "(no value)").
 *
 * @param column the metadata column
 * @param values its values, as the findings list them
 */
public record SegmentColumn(String column, List<Value> values) {
  /** Checks the components and copies the list. */
  public SegmentColumn {
    Objects.requireNonNull(column, "column");
    values = List.copyOf(values);
  }

  /**
   * One value and how many answers carry it.
   *
   * @param value the value as most answers spell it, or "(no value)"
   * @param answers answers with this value, non-answers included
   * @param substantive of them, answers that say something (the base of coverage)
   * @param read of those, answers a person has read: the base of a hand code's share
   * @param smallBase whether {@code read} is under the findings' small base
   * @param filterable whether screens can limit their answers to this value (not "(no value)")
   */
  public record Value(
      String value, int answers, int substantive, int read, boolean smallBase, boolean filterable) {
    /** Checks the components. */
    public Value {
      Objects.requireNonNull(value, "value");
      if (read < 0 || substantive < read || answers < substantive) {
        throw new IllegalArgumentException(
            "need 0 <= read <= substantive <= answers, got "
                + read
                + "/"
                + substantive
                + "/"
                + answers);
      }
    }
  }
}
