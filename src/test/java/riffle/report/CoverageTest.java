package riffle.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import org.junit.jupiter.api.Test;
import riffle.model.CodeFrequency;
import riffle.model.QuestionFindings;

/**
 * What a question's findings leave out: codes nobody gave to its answers, and waves nobody has
 * coded yet (their zeros would read as falls).
 */
class CoverageTest {
  @Test
  void unusedCodesAndUncodedWavesAreLeftOutOfAQuestionsFindings() {
    List<ReportCode> book =
        List.of(
            new ReportCode("1", "delivery date unclear", Optional.empty(), "friction", false),
            new ReportCode("2", "helpful advice", Optional.empty(), "praise", false));
    List<ReportAnswer> answers = new ArrayList<>();
    for (int i = 0; i < 200; i++) {
      // Wave 1 is coded (a quarter carry the friction code); wave 2 is imported but not coded.
      answers.add(
          new ReportAnswer(
              "a" + i,
              "Wave 1",
              "Q1",
              true,
              i % 4 == 0 ? Set.of("1") : Set.of(),
              Map.of(),
              OptionalLong.of(i)));
      answers.add(
          new ReportAnswer(
              "b" + i, "Wave 2", "Q1", true, Set.of(), Map.of(), OptionalLong.empty()));
    }
    QuestionFindings q =
        Report.compute(
                new ReportInput(List.of("Q1"), List.of("Wave 1", "Wave 2"), book, answers),
                ReportSettings.DEFAULTS)
            .questions()
            .get(0);
    assertEquals(
        List.of("delivery date unclear"),
        q.codes().stream().map(CodeFrequency::code).toList(),
        "the praise code belongs to another question");
    assertTrue(q.changes().isEmpty(), "an uncoded wave is not compared: " + q.changes());
    assertEquals(List.of("Wave 2"), q.notCoded());
    assertEquals(List.of("Wave 1"), List.copyOf(q.bases().keySet()), "nor counted");
    assertEquals(50, q.codes().get(0).waves().get("Wave 1").count());
  }
}
