package riffle.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** What a screen is sent of a long answer: its start, flagged, with the matches inside it. */
class ShownTextTest {
  private static SearchHit hit(String text, List<SearchHit.Stretch> highlight) {
    return new SearchHit(7, "R-7", "Wave 1", "Why?", text, highlight, 1.5);
  }

  @Test
  void aCutNeverSplitsASurrogatePair() {
    String rocket = "ab\uD83D\uDE80cd";
    assertEquals(2, ShownText.cut(rocket, 3), "the pair stays whole, so it is left out");
    assertEquals(4, ShownText.cut(rocket, 4));
    assertEquals(6, ShownText.cut(rocket, 10));
  }

  @Test
  void aLongHitIsCutWithItsHighlightsClipped() {
    SearchHit h =
        hit(
            "late delivery again late",
            List.of(
                new SearchHit.Stretch(0, 4),
                new SearchHit.Stretch(5, 13),
                new SearchHit.Stretch(20, 24)));
    SearchHit cut = h.shortened(8);
    assertEquals("late del", cut.text());
    assertTrue(cut.truncated());
    assertEquals(
        List.of(new SearchHit.Stretch(0, 4), new SearchHit.Stretch(5, 8)), cut.highlight());
    assertEquals(h.answerId(), cut.answerId());
    assertEquals(h.score(), cut.score());
    SearchHit whole = hit("short", List.of());
    assertSame(whole, whole.shortened(8));
    assertFalse(whole.truncated());
  }

  @Test
  void resultsAndPreviewsCutEveryHit() {
    SearchHit a = hit("x".repeat(20), List.of());
    SearchHit b = hit("y", List.of());
    SearchResult r = new SearchResult(2, Map.of("Wave 1", 2), List.of(a, b)).shortened(5);
    assertEquals(2, r.total());
    assertEquals("xxxxx", r.hits().get(0).text());
    assertEquals("y", r.hits().get(1).text());
    RulePreview p = new RulePreview("Price", "price", 2, 1, 1, 0, List.of(a)).shortened(5);
    assertTrue(p.sample().get(0).truncated());
    assertEquals(1, p.wouldCode());
  }
}
