package riffle.coding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class FeaturesTest {
  @Test
  void aNegatedWordIsADifferentFeature() {
    List<String> negated = Features.of(SuggestionEngineTest.analyse("It was not expensive."));
    List<String> plain = Features.of(SuggestionEngineTest.analyse("It was expensive."));
    assertTrue(negated.contains("w:not:expens"), negated.toString());
    assertFalse(negated.contains("w:expens"), negated.toString());
    assertTrue(plain.contains("w:expens"), plain.toString());
    assertTrue(negated.contains("b:not not:expens"), negated.toString());
  }

  @Test
  void wordsPairsPrefixesAndChunksStayInsideASentence() {
    List<String> f =
        Features.of(SuggestionEngineTest.analyse("The delivery date was unclear. Great machines!"));
    assertTrue(f.contains("w:deliveri"), f.toString());
    assertTrue(f.contains("p:deliv"), f.toString());
    assertTrue(f.contains("b:deliveri date"), f.toString());
    assertTrue(f.contains("c:deliveri date"), "chunk without its determiner: " + f);
    assertTrue(f.contains("c:great machin"), f.toString());
    assertFalse(f.contains("b:unclear great"), "no pair across sentences: " + f);
    assertTrue(f.stream().noneMatch(s -> s.contains(".") || s.contains("!")), f.toString());
  }

  @Test
  void anUnparsedAnswerHasNoFeatures() {
    assertEquals(
        List.of(),
        Features.of(SuggestionEngineTest.analyse("Zu teuer und viel zu langsam geliefert")));
  }
}
