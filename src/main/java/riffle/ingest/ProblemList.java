package riffle.ingest;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import riffle.model.InputProblem;

/**
 * Collects positioned problems up to a limit and counts the rest, so a broken file of a million
 * rows does not produce a million messages. Not thread-safe.
 */
final class ProblemList {
  private final String source;
  private final int max;
  private final List<InputProblem> problems = new ArrayList<>();
  private long unlisted;

  ProblemList(String source, int max) {
    this.source = source;
    this.max = max;
  }

  /** Adds a problem, or only counts it once the limit is reached. */
  void add(long line, int column, String message) {
    if (problems.size() < max) {
      problems.add(new InputProblem(source, line, column, message));
    } else {
      unlisted++;
    }
  }

  /**
   * Returns the problems listed, those about the whole input first, then by line and column,
   * followed by "N more problems not listed" when some were cut.
   */
  List<InputProblem> list() {
    List<InputProblem> all = new ArrayList<>(problems);
    all.sort(Comparator.comparingLong(InputProblem::line).thenComparingInt(InputProblem::column));
    if (unlisted == 0) {
      return List.copyOf(all);
    }
    all.add(
        new InputProblem(
            source,
            0,
            0,
            unlisted + (unlisted == 1 ? " more problem" : " more problems") + " not listed"));
    return List.copyOf(all);
  }
}
