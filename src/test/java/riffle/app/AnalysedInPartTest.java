package riffle.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import riffle.model.Analysis;
import riffle.model.InputProblem;
import riffle.model.NewAnswer;
import riffle.model.NewRespondent;

/** The import report's notes on answers longer than the analysed prefix. */
class AnalysedInPartTest {
  private static NewAnswer answer(int length, long line, int column, boolean truncated) {
    String text = "x".repeat(length);
    return new NewAnswer(
        "Why?",
        text,
        text,
        true,
        line,
        column,
        List.of(),
        "import",
        new Analysis("eng", false, text, List.of(), List.of(), truncated));
  }

  @Test
  void eachLongAnswerIsNotedWithItsPositionUpToTheLimitThenCounted() {
    List<NewRespondent> respondents =
        List.of(
            new NewRespondent(
                "R-1",
                2,
                "",
                Map.of(),
                List.of(answer(12_000, 2, 3, true), answer(5, 2, 4, false))),
            new NewRespondent("R-2", 3, "", Map.of(), List.of(answer(9_000, 3, 3, true))),
            new NewRespondent("R-3", 4, "", Map.of(), List.of(answer(7_000, 4, 3, true))));
    List<InputProblem> notes = WaveImporter.analysedInPart("w.csv", respondents, 2);
    assertEquals(3, notes.size());
    assertEquals(2, notes.get(0).line());
    assertEquals(3, notes.get(0).column());
    assertTrue(notes.get(0).message().startsWith("this answer is 12,000 characters long"));
    assertEquals(3, notes.get(1).line());
    assertEquals("1 more answer analysed only in part, not listed", notes.get(2).message());
    assertEquals(List.of(), WaveImporter.analysedInPart("w.csv", List.of(), 2));
  }
}
