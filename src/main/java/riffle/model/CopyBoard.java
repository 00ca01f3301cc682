package riffle.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A copy board: buyer quotes pinned into slots (headline ideas, sub-headline ideas, benefits,
 * objections, proof quotes), each slot in the copywriter's order. Immutable; every change returns a
 * new board.
 *
 * @param title the board's title
 * @param slots one entry per slot, in {@link QuoteSlot} order
 */
public record CopyBoard(String title, List<BoardSlot> slots) {
  /**
   * The notice every board and board export carries: quotes come from personal data, and quoting a
   * respondent in public needs that person's consent.
   */
  public static final String CONSENT_NOTICE =
      "Quotes come from survey answers, which are personal data. Quoting a respondent publicly (on a"
          + " page, in an ad) needs that respondent's consent under the local privacy law; check"
          + " it before publishing. Personal data in the answers is masked.";

  /** Checks the components: every slot exactly once, in {@link QuoteSlot} order. */
  public CopyBoard {
    Objects.requireNonNull(title, "title");
    slots = List.copyOf(slots);
    QuoteSlot[] order = QuoteSlot.values();
    if (slots.size() != order.length) {
      throw new IllegalArgumentException("a copy board has the slots " + List.of(order));
    }
    for (int i = 0; i < order.length; i++) {
      if (slots.get(i).slot() != order[i]) {
        throw new IllegalArgumentException(
            "copy board slot " + (i + 1) + " must be " + order[i] + ", not " + slots.get(i).slot());
      }
    }
  }

  /** An empty board with every slot. */
  public static CopyBoard empty(String title) {
    List<BoardSlot> slots = new ArrayList<>();
    for (QuoteSlot s : QuoteSlot.values()) {
      slots.add(new BoardSlot(s, List.of()));
    }
    return new CopyBoard(title, slots);
  }

  /** The items of one slot, in order. */
  public List<BoardItem> items(QuoteSlot slot) {
    return slots.get(slot.ordinal()).items();
  }

  /**
   * This board with {@code item} pinned at the end of {@code slot}; pinning the same text of the
   * same answer to the same slot again changes nothing.
   */
  public CopyBoard pin(QuoteSlot slot, BoardItem item) {
    Objects.requireNonNull(item, "item");
    List<BoardItem> items = new ArrayList<>(items(slot));
    for (BoardItem b : items) {
      if (b.answerId() == item.answerId() && b.text().equals(item.text())) {
        return this;
      }
    }
    items.add(item);
    return with(slot, items);
  }

  /** This board without the item at {@code index} of {@code slot}. */
  public CopyBoard unpin(QuoteSlot slot, int index) {
    List<BoardItem> items = new ArrayList<>(items(slot));
    checkIndex(slot, index, items.size());
    items.remove(index);
    return with(slot, items);
  }

  /** This board with the item at {@code from} of {@code slot} moved to position {@code to}. */
  public CopyBoard move(QuoteSlot slot, int from, int to) {
    List<BoardItem> items = new ArrayList<>(items(slot));
    checkIndex(slot, from, items.size());
    checkIndex(slot, to, items.size());
    items.add(to, items.remove(from));
    return with(slot, items);
  }

  /**
   * This board with a working line beside the item at {@code index} (empty or blank removes it).
   */
  public CopyBoard withWorkingLine(QuoteSlot slot, int index, Optional<String> line) {
    List<BoardItem> items = new ArrayList<>(items(slot));
    checkIndex(slot, index, items.size());
    items.set(index, items.get(index).withWorkingLine(line));
    return with(slot, items);
  }

  private CopyBoard with(QuoteSlot slot, List<BoardItem> items) {
    List<BoardSlot> copy = new ArrayList<>(slots);
    copy.set(slot.ordinal(), new BoardSlot(slot, items));
    return new CopyBoard(title, copy);
  }

  private static void checkIndex(QuoteSlot slot, int index, int size) {
    if (index < 0 || index >= size) {
      throw new IllegalArgumentException(
          "the "
              + slot.name().toLowerCase(java.util.Locale.ROOT)
              + " slot has "
              + size
              + " items; there is no item "
              + (index + 1));
    }
  }
}
