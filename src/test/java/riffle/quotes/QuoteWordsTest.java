package riffle.quotes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Collections;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

class QuoteWordsTest {
  @Test
  void theListsLoadFromTheirFiles() {
    // Sizes as the lists had in Java, before they moved to resource files.
    assertList(QuoteWords.FIRST_PERSON, 11, "i", "we", "ive");
    assertList(QuoteWords.POSITIVE, 81, "good", "reassuring", "wonderful");
    assertList(QuoteWords.NEGATIVE, 76, "expensive", "sceptical", "breaks");
    assertList(QuoteWords.LIGHT_VERBS, 63, "be", "'m", "got", "wo");
    assertList(QuoteWords.EXPLAINING, 9, "because", "knowing", "if");
    assertList(QuoteWords.GENERAL_ADVERBS, 31, "not", "n't", "really", "out");
  }

  @Test
  void praiseAndFrictionDoNotShareAWord() {
    assertTrue(Collections.disjoint(QuoteWords.POSITIVE, QuoteWords.NEGATIVE));
  }

  private static void assertList(Set<String> list, int size, String... known) {
    assertEquals(size, list.size());
    assertTrue(list.containsAll(List.of(known)), List.of(known).toString());
  }
}
