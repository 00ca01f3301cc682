package riffle.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class CopyBoardTest {
  static BoardItem item(String text, long answer) {
    return new BoardItem(text, answer, "R" + answer, "W1", "Why?", "value", Optional.empty());
  }

  @Test
  void pinnedItemsCanBeReorderedGivenAWorkingLineAndUnpinned() {
    CopyBoard b =
        CopyBoard.empty("Page")
            .pin(QuoteSlot.BENEFIT, item("a", 1))
            .pin(QuoteSlot.BENEFIT, item("b", 2))
            .pin(QuoteSlot.BENEFIT, item("c", 3));
    assertSame(b, b.pin(QuoteSlot.BENEFIT, item("a", 1)));
    b = b.move(QuoteSlot.BENEFIT, 2, 0);
    assertEquals(
        List.of("c", "a", "b"), b.items(QuoteSlot.BENEFIT).stream().map(BoardItem::text).toList());
    b = b.withWorkingLine(QuoteSlot.BENEFIT, 1, Optional.of("Our line"));
    assertEquals(Optional.of("Our line"), b.items(QuoteSlot.BENEFIT).get(1).workingLine());
    assertEquals("a", b.items(QuoteSlot.BENEFIT).get(1).text());
    b = b.withWorkingLine(QuoteSlot.BENEFIT, 1, Optional.of("  "));
    assertEquals(Optional.empty(), b.items(QuoteSlot.BENEFIT).get(1).workingLine());
    b = b.unpin(QuoteSlot.BENEFIT, 0);
    assertEquals(2, b.items(QuoteSlot.BENEFIT).size());
    assertTrue(b.items(QuoteSlot.HEADLINE).isEmpty());
    CopyBoard done = b;
    IllegalArgumentException e =
        assertThrows(IllegalArgumentException.class, () -> done.unpin(QuoteSlot.PROOF, 0));
    assertEquals("the proof slot has 0 items; there is no item 1", e.getMessage());
  }

  @Test
  void aBoardHoldsEverySlotOnceInOrder() {
    assertThrows(IllegalArgumentException.class, () -> new CopyBoard("x", List.of()));
    List<BoardSlot> swapped = new java.util.ArrayList<>(CopyBoard.empty("x").slots());
    java.util.Collections.swap(swapped, 0, 1);
    IllegalArgumentException e =
        assertThrows(IllegalArgumentException.class, () -> new CopyBoard("x", swapped));
    assertEquals("copy board slot 1 must be HEADLINE, not SUBHEADLINE", e.getMessage());
  }

  @Test
  void aQuoteBecomesAnItemLinkedToItsAnswer() {
    Quote q =
        new Quote(
            3,
            "value",
            9,
            "R9",
            "W2",
            "Why?",
            Map.of(),
            "good value",
            0,
            10,
            0.5,
            2,
            List.of(4L, 9L),
            false,
            Optional.empty());
    BoardItem i = BoardItem.of(q);
    assertEquals(new BoardItem("good value", 9, "R9", "W2", "Why?", "value", Optional.empty()), i);
    assertEquals(Optional.of(QuoteSlot.PROOF), q.inSlot(QuoteSlot.PROOF).slot());
    assertThrows(
        IllegalArgumentException.class,
        () ->
            new Quote(
                3,
                "value",
                9,
                "R9",
                "W2",
                "Why?",
                Map.of(),
                "good value",
                0,
                4,
                0.5,
                1,
                List.of(9L),
                false,
                Optional.empty()));
    assertThrows(
        IllegalArgumentException.class,
        () ->
            new Quote(
                3,
                "value",
                9,
                "R9",
                "W2",
                "Why?",
                Map.of(),
                "good value",
                0,
                10,
                0.5,
                1,
                List.of(4L),
                false,
                Optional.empty()));
  }
}
