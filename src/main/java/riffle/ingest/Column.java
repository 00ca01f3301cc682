package riffle.ingest;

import java.util.Objects;
import riffle.model.ColumnRole;

/**
 * One column of a survey export and the role it plays.
 *
 * @param index the 0-based position of the column in the export
 * @param header the header name, trimmed; blank headers are called {@code Column N} and repeated
 *     ones get a {@code " (2)"} suffix, so headers are unique within a table
 * @param name the question's short name from a first header row above its wording ({@code Q2} above
 *     {@code What made you choose us?}); empty when the export has one header row
 * @param role what the column holds
 * @param detected true when the role was detected, false when the analyst named the column
 * @param answersColumn for a {@link ColumnRole#CODES} column, the index of the {@link
 *     ColumnRole#TEXT} column whose answers its codes belong to; -1 for every other role
 * @param reason why the column has its role, in words an analyst reads in the import's summary and
 *     the page's preview ("free text: 8 words on average")
 */
public record Column(
    int index,
    String header,
    String name,
    ColumnRole role,
    boolean detected,
    int answersColumn,
    String reason) {
  public Column {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(reason, "reason");
    if (index < 0) {
      throw new IllegalArgumentException("index must be >= 0, got " + index);
    }
    Objects.requireNonNull(header, "header");
    Objects.requireNonNull(role, "role");
    if (role == ColumnRole.CODES ? answersColumn < 0 : answersColumn != -1) {
      throw new IllegalArgumentException(
          "answersColumn must point at a text column for CODES and be -1 otherwise, got "
              + answersColumn
              + " for "
              + role);
    }
  }
}
