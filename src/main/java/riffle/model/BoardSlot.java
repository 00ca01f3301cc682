package riffle.model;

import java.util.List;
import java.util.Objects;

/**
 * One slot of a copy board and the items pinned to it, in the copywriter's order.
 *
 * @param slot the use
 * @param items the pinned items, first to last
 */
public record BoardSlot(QuoteSlot slot, List<BoardItem> items) {
  /** Checks the slot and copies the items. */
  public BoardSlot {
    Objects.requireNonNull(slot, "slot");
    items = List.copyOf(items);
  }
}
