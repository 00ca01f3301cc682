package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.List;
import org.junit.jupiter.api.Test;
import riffle.model.ColumnRole;

class RoleDetectorTest {
  private static final String[] ANSWERS = {
    "The shipping cost to Portugal was higher than I expected",
    "Not sure the boiler had really been descaled before",
    "I compared three shops and yours had the clearest warranty",
    "Photos of the grinder burrs were a bit blurry for me",
    "Whether the steam wand would be loud in a small flat",
    "The checkout asked me to create an account first",
    "Delivery in two weeks felt long for a machine in stock",
    "A friend told me refurbished machines break quickly"
  };

  private static List<ColumnRole> roles(SurveyTable t) {
    return t.columns().stream().map(Column::role).toList();
  }

  /** Builds a CSV with one row per answer; each column is a function of the row index. */
  private static String csv(String header, java.util.function.IntFunction<String> row) {
    StringBuilder sb = new StringBuilder(header).append('\n');
    for (int i = 0; i < ANSWERS.length; i++) {
      sb.append(row.apply(i)).append('\n');
    }
    return sb.toString();
  }

  private static String a(int i) {
    return "\"" + ANSWERS[i] + "\"";
  }

  private static String b(int i) {
    return "\"" + ANSWERS[(i + 3) % ANSWERS.length] + ", and the price\"";
  }

  @Test
  void detectsEveryRoleInATypicalExport() throws IOException {
    String[] devices = {"mobile", "desktop", "tablet"};
    SurveyTable t =
        Csv.read(
            csv(
                "Response ID,Submitted at,Name,Email,Q1,Q1 codes,Q2,Q2 codes,Coded by,Device,Order"
                    + " value",
                i ->
                    String.join(
                        ",",
                        "R-" + (1001 + i),
                        "2024-03-0" + (i + 1) + " 10:1" + i,
                        "Customer " + (char) ('A' + i) + " Person",
                        "buyer" + i + "@example.com",
                        a(i),
                        "price; shipping",
                        b(i),
                        "trust",
                        i % 2 == 0 ? "Mira" : "Tom",
                        devices[i % 3],
                        i % 2 == 0 ? "under €200" : "€200–€500")));
    assertEquals(
        List.of(
            ColumnRole.ID,
            ColumnRole.DATE,
            ColumnRole.IGNORED,
            ColumnRole.IGNORED,
            ColumnRole.TEXT,
            ColumnRole.CODES,
            ColumnRole.TEXT,
            ColumnRole.CODES,
            ColumnRole.CODER,
            ColumnRole.META,
            ColumnRole.META),
        roles(t));
    assertEquals(4, t.columns().get(5).answersColumn());
    assertEquals(6, t.columns().get(7).answersColumn());
    assertTrue(t.columns().stream().allMatch(Column::detected));
    assertEquals(-1, t.columns().get(4).answersColumn());
  }

  @Test
  void codesBeforeAnyTextBelongToTheFirstTextColumn() throws IOException {
    SurveyTable t = Csv.read(csv("Tags,id,Comment", i -> "price|trust,K" + i + "," + a(i)));
    assertEquals(ColumnRole.CODES, t.columns().get(0).role());
    assertEquals(2, t.columns().get(0).answersColumn());
  }

  @Test
  void promoAndPostCodesAreNotCodesOfAnswers() throws IOException {
    SurveyTable t =
        Csv.read(
            csv(
                "id,Promo code,Post code,Comment",
                i -> "K" + i + ",SPRING24,1000-00" + i + "," + a(i)));
    assertEquals(ColumnRole.META, t.columns().get(1).role());
    assertEquals(ColumnRole.IGNORED, t.columns().get(2).role());
  }

  @Test
  void ignoresColumnsOfEmailAddressesEvenWithoutAHeaderSayingSo() throws IOException {
    SurveyTable t =
        Csv.read(csv("id,Contact info,Comment", i -> "K" + i + ",p" + i + "@example.org," + a(i)));
    assertEquals(ColumnRole.IGNORED, t.columns().get(1).role());
  }

  @Test
  void detectsAtMostOneId() throws IOException {
    SurveyTable t =
        Csv.read(csv("Order ID,Respondent ID,Comment", i -> "55" + i + ",R" + i + "," + a(i)));
    assertEquals(List.of(ColumnRole.IGNORED, ColumnRole.ID, ColumnRole.TEXT), roles(t));
  }

  @Test
  void detectsAnIdFromUniqueTokensWithDigits() throws IOException {
    SurveyTable t =
        Csv.read(csv("Ref,Comment,Rating", i -> "X9" + i + "Q," + a(i) + "," + (i % 5)));
    assertEquals(List.of(ColumnRole.ID, ColumnRole.TEXT, ColumnRole.META), roles(t));
  }

  @Test
  void doesNotTakeUniqueAmountsOrScoresForAnId() throws IOException {
    SurveyTable t =
        Csv.read(csv("Order value,NPS,Comment", i -> "3" + i + "9.00,1" + i + "," + a(i)));
    assertEquals(List.of(ColumnRole.IGNORED, ColumnRole.IGNORED, ColumnRole.TEXT), roles(t));
  }

  @Test
  void doesNotTakeAResponseColumnOfFreeTextForAnId() throws IOException {
    SurveyTable t = Csv.read(csv("Response,Device", i -> a(i) + ",mobile"));
    assertEquals(List.of(ColumnRole.TEXT, ColumnRole.META), roles(t));
  }

  @Test
  void detectsDatesByValueWhenTheHeaderDoesNotSay() throws IOException {
    String[] shapes = {
      "02/03/2024",
      "2024-03-02T10:15:00Z",
      "3/2/24 2:05 PM",
      "2 Mar 2024",
      "March 2, 2024",
      "02.03.2024 14:05",
      "2024/03/02",
      "2024-03-02 10:15"
    };
    SurveyTable t =
        Csv.read(csv("id,Stamp,Comment", i -> "K" + i + "," + "\"" + shapes[i] + "\"," + a(i)));
    assertEquals(ColumnRole.DATE, t.columns().get(1).role());
  }

  @Test
  void aDateHeaderWithoutDatesIsNotADate() throws IOException {
    SurveyTable t =
        Csv.read(
            csv(
                "id,Delivery time,Comment",
                i -> "K" + i + "," + (i % 2 == 0 ? "2-3 days" : "1 week") + "," + a(i)));
    assertEquals(ColumnRole.META, t.columns().get(1).role());
  }

  @Test
  void shortAnswersAreNotFreeText() {
    String[] words = {
      "Price", "Shipping", "Warranty", "Photos", "Noise", "Account", "Delivery", "Trust"
    };
    UnreadableInputException e =
        assertThrows(
            UnreadableInputException.class,
            () ->
                Csv.read(csv("id,Main reason,device", i -> "K" + i + "," + words[i] + ",mobile")));
    // The message says why each column is what it is, and how to keep the short answers.
    assertEquals(
        "test.csv:1: no open-text column found; columns: 'id' (the header names an id), 'Main"
            + " reason' (8 distinct short values, 7 characters on average, like names or order"
            + " numbers; name it as a text column to keep it as a question), 'device' (one value:"
            + " kept as a segment); name the text column",
        e.getMessage());
    assertEquals(java.util.Optional.of("text column"), e.problem().setting());
  }

  @Test
  void repeatedLongChoicesAreSegmentsNotText() throws IOException {
    StringBuilder sb = new StringBuilder("id,How did you hear about us?,Comment\n");
    for (int i = 0; i < 40; i++) {
      String choice = i % 2 == 0 ? "From a friend or colleague" : "Search engine result page";
      sb.append("K")
          .append(i)
          .append(',')
          .append(choice)
          .append(',')
          .append('"')
          .append(ANSWERS[i % 8])
          .append(" for order ")
          .append(i)
          .append("\"\n");
    }
    SurveyTable t = Csv.read(sb.toString());
    assertEquals(List.of(ColumnRole.ID, ColumnRole.META, ColumnRole.TEXT), roles(t));
  }

  @Test
  void nonAnswersDoNotStopAColumnFromBeingText() throws IOException {
    String[] values = {"n/a", "-", a(2), "none", a(4), "", a(6), "no"};
    SurveyTable t = Csv.read(csv("id,Anything else?", i -> "K" + i + "," + values[i]));
    assertEquals(ColumnRole.TEXT, t.columns().get(1).role());
  }

  @Test
  void namingTextColumnsSwitchesOffTextDetection() throws IOException {
    SurveyTable t =
        Csv.read(
            csv("id,Q1,Q2", i -> "K" + i + "," + a(i) + "," + b(i)),
            ImportSettings.builder().textColumn("q2").get());
    assertEquals(List.of(ColumnRole.ID, ColumnRole.IGNORED, ColumnRole.TEXT), roles(t));
    assertFalse(t.columns().get(2).detected());
    assertTrue(t.columns().get(1).detected());
  }

  @Test
  void namedColumnsWinOverDetection() throws IOException {
    SurveyTable t =
        Csv.read(
            csv(
                "id,Submitted,Q1,Device",
                i -> "K" + i + ",2024-03-0" + (i + 1) + "," + a(i) + ",mobile"),
            ImportSettings.builder()
                .textColumn("Device")
                .metaColumn("Q1")
                .idColumn("Submitted")
                .dateColumn("id")
                .get());
    assertEquals(
        List.of(ColumnRole.DATE, ColumnRole.ID, ColumnRole.META, ColumnRole.TEXT), roles(t));
    assertTrue(t.columns().stream().noneMatch(Column::detected));
  }

  @Test
  void emptyColumnsAreIgnored() throws IOException {
    SurveyTable t = Csv.read(csv("id,Comment,Notes", i -> "K" + i + "," + a(i) + ","));
    assertEquals(ColumnRole.IGNORED, t.columns().get(2).role());
  }

  @Test
  void findsNamedColumnsExactlyOrIgnoringCaseAndSpacing() {
    String[] names = {"Q1", "What almost stopped you?", "q1 (2)"};
    assertEquals(0, RoleDetector.find(names, "Q1"));
    assertEquals(1, RoleDetector.find(names, "what  almost STOPPED you?"));
    assertEquals(2, RoleDetector.find(names, "Q1 (2)"));
    assertEquals(-1, RoleDetector.find(names, "Q2"));
  }
}
