package riffle.model;

import java.time.Instant;
import java.util.Map;
import java.util.Objects;

/**
 * One row of the audit trail.
 *
 * @param id its id, in the order changes were made
 * @param at when
 * @param actor who
 * @param action what ("import", "assign", "merge", "undo" …)
 * @param detail the change's particulars
 */
public record HistoryEntry(
    long id, Instant at, String actor, String action, Map<String, Object> detail) {
  public HistoryEntry {
    Objects.requireNonNull(at, "at");
    Objects.requireNonNull(actor, "actor");
    Objects.requireNonNull(action, "action");
    detail = Map.copyOf(detail);
  }
}
