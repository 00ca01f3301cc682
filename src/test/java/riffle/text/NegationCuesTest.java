package riffle.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import riffle.words.WordList;

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

  @Test
  void theWordListsOfTheScopeRuleLoadFromTheirFiles() {
    // Sizes and entries as the lists stood in NegationScope before they moved to resource files.
    assertList("negation-additive", 3, "only", "merely");
    assertList("negation-clause-breakers", 7, "but", "whereas", "unless");
    assertList("negation-coordinators", 4, "and", "&", "plus");
    assertList("negation-subject-pronouns", 8, "i", "it", "there");
    assertList("negation-unambiguous-subjects", 5, "i", "they");
    assertList("negation-possessives", 7, "my", "its", "their");
    assertList("negation-answer-followers", 10, "yes", "thanks", "us");
    assertList("negation-wh-words", 9, "which", "whose", "how");
    assertList("negation-clause-adverbs", 4, "then", "still");
  }

  private static void assertList(String name, int size, String... known) {
    Set<String> list = WordList.set("en", name);
    assertEquals(size, list.size(), name);
    assertTrue(list.containsAll(List.of(known)), name);
  }
}
