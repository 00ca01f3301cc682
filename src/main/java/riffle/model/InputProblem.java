package riffle.model;

import java.util.Objects;
import java.util.Optional;

/**
 * A problem found in an input, with its position.
 *
 * @param source the file name (or {@code "paste"}) the problem was found in
 * @param line the 1-based physical line, or 0 when the problem concerns the whole input
 * @param column the 1-based column (field number), or 0 when it concerns the whole line
 * @param message what is wrong and what to do, in words an analyst can act on
 * @param setting the setting whose change the message suggests, in plain words ({@code max size},
 *     {@code text column}), for the command line to name its option and the page its field
 */
public record InputProblem(
    String source, long line, int column, String message, Optional<String> setting) {
  public InputProblem {
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(message, "message");
    Objects.requireNonNull(setting, "setting");
  }

  /** A problem whose fix lies in the input itself, not in a setting. */
  public InputProblem(String source, long line, int column, String message) {
    this(source, line, column, message, Optional.empty());
  }

  /** Renders as {@code source:line:column: message}, leaving out unknown positions. */
  @Override
  public String toString() {
    StringBuilder sb = new StringBuilder(source);
    if (line > 0) {
      sb.append(':').append(line);
      if (column > 0) {
        sb.append(':').append(column);
      }
    }
    return sb.append(": ").append(message).toString();
  }
}
