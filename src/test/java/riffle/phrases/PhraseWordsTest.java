package riffle.phrases;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class PhraseWordsTest {
  @Test
  void theStopwordsLoadFromTheirFile() {
    // 216 distinct words, as the list had in Java.
    assertEquals(216, PhraseWords.STOPWORDS.size());
    assertTrue(PhraseWords.STOPWORDS.containsAll(List.of("the", "'ll", "&", "tbh", "sort")));
    assertFalse(PhraseWords.STOPWORDS.contains("less"));
    assertFalse(PhraseWords.STOPWORDS.contains("like"));
  }

  @Test
  void theNegatingAuxiliariesLoadFromTheirFile() {
    assertEquals(24, PhraseWords.AUXILIARIES.size());
    assertTrue(PhraseWords.AUXILIARIES.containsAll(List.of("did", "could", "ca", "wo")));
  }

  @Test
  void aTokenIsClassifiedByTheLists() {
    PhraseWords words = new PhraseWords();
    assertEquals(PhraseWords.WORD, words.flags("grinder"));
    assertEquals(PhraseWords.WORD | PhraseWords.STOP, words.flags("The"));
    assertEquals(PhraseWords.WORD | PhraseWords.STOP | PhraseWords.CUE, words.flags("didnt"));
    assertEquals(PhraseWords.WORD | PhraseWords.STOP | PhraseWords.CUE, words.flags("Won’t"));
    assertEquals(0, words.flags("[email]"));
    assertEquals(0, words.flags("!"));
  }
}
