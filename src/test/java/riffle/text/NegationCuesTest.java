package riffle.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class NegationCuesTest {
  @Test
  void theCueListsLoadFromTheirFiles() {
    // Sizes and entries as the lists stood in Java before they moved to resource files.
    assertEquals(15, NegationCues.WORDS.size());
    assertTrue(NegationCues.WORDS.containsAll(List.of("not", "n't", "'nt", "no-one")));
    assertEquals(19, NegationCues.APOSTROPHE_LESS.size());
    assertTrue(NegationCues.APOSTROPHE_LESS.containsAll(List.of("didnt", "wont", "shant")));
  }

  @Test
  void listedLooksAtBothLists() {
    assertTrue(NegationCues.listed("never"));
    assertTrue(NegationCues.listed("dont"));
    assertFalse(NegationCues.listed("barely"));
    assertFalse(NegationCues.listed("Not"));
  }
}
