package riffle.words;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class WordListTest {
  @Test
  void readsEntriesInOrderWithoutCommentsOrBlanks() {
    assertEquals(List.of("alpha", "beta gamma", "c#sharp"), WordList.entries("xx", "sample"));
  }

  @Test
  void aSetKeepsFileOrder() {
    assertEquals(
        List.of("alpha", "beta gamma", "c#sharp"), List.copyOf(WordList.set("xx", "sample")));
  }

  @Test
  void aMissingListOrARepeatedEntryIsAFaultOfTheBuild() {
    IllegalStateException missing =
        assertThrows(IllegalStateException.class, () -> WordList.entries("xx", "absent"));
    assertTrue(missing.getMessage().contains("riffle/words/xx/absent.txt"), missing.getMessage());
    IllegalStateException twice =
        assertThrows(IllegalStateException.class, () -> WordList.entries("xx", "twice"));
    assertTrue(twice.getMessage().contains("twice.txt:3"), twice.getMessage());
  }

  @Test
  void namesAreCheckedSoThatAPathCannotBeSmuggledIn() {
    assertThrows(IllegalArgumentException.class, () -> WordList.entries("en", "../x"));
    assertThrows(IllegalArgumentException.class, () -> WordList.entries("EN", "stop"));
  }

  @Test
  void aListOfPairsSplitsEachEntryAtItsFirstSpace() {
    assertEquals(
        List.of(Map.entry("AD", "24"), Map.entry("be", "a value of words")),
        List.copyOf(WordList.map("xx", "pairs").entrySet()));
  }

  @Test
  void aPairWithoutAValueOrARepeatedKeyIsAFaultOfTheBuild() {
    IllegalStateException noValue =
        assertThrows(IllegalStateException.class, () -> WordList.map("xx", "pairs-no-value"));
    assertTrue(noValue.getMessage().contains("pairs-no-value.txt:2"), noValue.getMessage());
    IllegalStateException twice =
        assertThrows(IllegalStateException.class, () -> WordList.map("xx", "pairs-twice"));
    assertTrue(twice.getMessage().contains("pairs-twice.txt:3"), twice.getMessage());
  }
}
