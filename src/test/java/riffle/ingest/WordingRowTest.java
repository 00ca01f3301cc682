package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import riffle.model.ColumnRole;

/**
 * Exports with short names in the first header row and each question's wording in the second: the
 * wording names the question, the short name is kept beside it, and the data starts below both. A
 * one-row header over answers that happen to be questions is not taken for two rows.
 */
class WordingRowTest {
  private static final String ROWS =
      "B1,2026-03-02,\"The delivery estimate felt long for a small parcel\",Price,mobile\n"
          + "B2,2026-03-03,\"I could not tell whether the bulb came in the box\",Fast delivery,desktop\n"
          + "B3,2026-03-04,\"A review said the shade scratches, which worried me\",reviews,mobile\n";

  @Test
  void theSecondRowWordsTheQuestionsAndTheFirstNamesThem() throws Exception {
    SurveyTable t =
        Csv.read(
            "resp_id,date,Q1,Q2,device\n"
                + "Respondent ID,Date completed,What almost stopped you from buying?,"
                + "What made you choose us?,Device\n"
                + ROWS);
    assertEquals(
        List.of(
            "Respondent ID",
            "Date completed",
            "What almost stopped you from buying?",
            "What made you choose us?",
            "Device"),
        t.columns().stream().map(Column::header).toList());
    assertEquals("Q2", t.columns().get(3).name());
    assertEquals(ColumnRole.TEXT, t.columns().get(3).role());
    assertEquals(3, t.rows().size());
    assertEquals(1, t.rows().get(0).number());
    assertEquals(3, t.rows().get(0).line());
  }

  @Test
  void aColumnCanBeNamedByItsShortName() throws Exception {
    SurveyTable t =
        Csv.read(
            "resp_id,date,Q1,Q2,device\n"
                + "Respondent ID,Date completed,What almost stopped you from buying?,"
                + "What made you choose us?,Device\n"
                + ROWS,
            ImportSettings.builder().skippedColumn("Q2").get());
    assertEquals(ColumnRole.IGNORED, t.columns().get(3).role());
  }

  @Test
  void aOneRowHeaderOverAnswersIsNotTakenForTwo() throws Exception {
    SurveyTable t =
        Csv.read(
            "id,Comment\n"
                + "K1,\"What a lovely lamp, would you believe it arrived early?\"\n"
                + "K2,\"The shade is thinner than the photos suggest\"\n");
    assertEquals("Comment", t.columns().get(1).header());
    assertEquals("", t.columns().get(1).name());
    assertEquals(2, t.rows().size());
  }

  @Test
  void aSecondRowOfDataIsNotAWordingRow() {
    assertEquals(
        false,
        WordingRow.follows(
            new String[] {"id", "date", "Q1"},
            new String[] {"K1", "2026-03-02", "What would you change about the checkout?"}));
  }
}
