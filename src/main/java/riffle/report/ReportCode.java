package riffle.report;

import java.util.Objects;
import java.util.Optional;
import java.util.Set;

/**
 * One entry of the codebook, as the findings need it.
 *
 * @param id the code's id, unique in the codebook
 * @param name the code's name as analysts read it
 * @param parentId the id of the theme it belongs to, empty for a top-level code
 * @param direction "praise", "friction" or "neutral"
 * @param archived whether the code is archived; archived codes and their assignments are left out
 *     of every count
 */
public record ReportCode(
    String id, String name, Optional<String> parentId, String direction, boolean archived) {
  /** The directions a code may have. */
  public static final Set<String> DIRECTIONS = Set.of("praise", "friction", "neutral");

  /** Checks the components. */
  public ReportCode {
    Objects.requireNonNull(id, "id");
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(parentId, "parentId");
    Objects.requireNonNull(direction, "direction");
    if (!DIRECTIONS.contains(direction)) {
      throw new IllegalArgumentException(
          "code " + id + " has direction \"" + direction + "\"; use praise, friction or neutral");
    }
    if (parentId.isPresent() && parentId.get().equals(id)) {
      throw new IllegalArgumentException("code " + id + " cannot be its own parent");
    }
  }
}
