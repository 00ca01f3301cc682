package riffle.model;

import java.util.Objects;

/**
 * What one change to the codebook or the coding did.
 *
 * @param edit the id of the recorded edit, or 0 when nothing changed
 * @param action what was done ("assign", "merge", "undo" …)
 * @param changed how many rows (assignments, codes, rules) changed
 * @param skipped how many steps of an undo or redo were left alone because someone changed the same
 *     row since
 * @param message a sentence for the person who asked
 */
public record EditOutcome(long edit, String action, int changed, int skipped, String message) {
  public EditOutcome {
    Objects.requireNonNull(action, "action");
    Objects.requireNonNull(message, "message");
  }
}
