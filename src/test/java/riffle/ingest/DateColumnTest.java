package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import riffle.model.ColumnRole;

/**
 * The date column is read whole: its order is settled by the values that only one order can read,
 * dots read day-first, an order that matters and cannot be told is asked for, and every value that
 * cannot be read is named with its line.
 */
class DateColumnTest {
  private static final String ANSWER = "\"The parcel came a day early and well packed\"";

  private static SurveyTable table(String... dates) throws UnreadableInputException {
    StringBuilder sb = new StringBuilder("id,Submitted,Why did you choose us?\n");
    for (int i = 0; i < dates.length; i++) {
      sb.append("R").append(i).append(',').append(dates[i]).append(',').append(ANSWER).append('\n');
    }
    SurveyTable t = Csv.read(sb.toString());
    assertEquals(ColumnRole.DATE, t.columns().get(1).role(), t.columns().get(1).reason());
    return t;
  }

  private static DateColumn.Reading read(Optional<DateOrder> order, String... dates)
      throws UnreadableInputException {
    return DateColumn.read(table(dates), order, 20);
  }

  @Test
  void aDayAboveTwelveSettlesDayFirst() throws Exception {
    DateColumn.Reading r =
        read(Optional.empty(), "03/04/2026", "13/04/2026 09:15", "02/05/2026", "28/04/2026");
    assertEquals(Optional.of(LocalDate.of(2026, 5, 2)), r.latest());
    assertEquals("day-first, as 13/04/2026 09:15 shows", r.read());
    assertEquals(List.of(), r.problems());
    assertEquals(Optional.empty(), r.unsettled());
  }

  @Test
  void aSecondNumberAboveTwelveSettlesMonthFirst() throws Exception {
    DateColumn.Reading r = read(Optional.empty(), "03/04/2026", "4/15/26 2:05 PM", "05/02/2026");
    assertEquals(Optional.of(LocalDate.of(2026, 5, 2)), r.latest());
    assertTrue(r.read().startsWith("month-first"), r.read());
  }

  @Test
  void datesWithDotsReadDayFirstWithoutAsking() throws Exception {
    DateColumn.Reading r = read(Optional.empty(), "03.04.2026", "05.02.2026", "11.03.2026");
    assertEquals(Optional.of(LocalDate.of(2026, 4, 3)), r.latest());
    assertEquals(Optional.empty(), r.unsettled());
  }

  @Test
  void anOrderThatChangesTheWaveDateIsAskedFor() throws Exception {
    DateColumn.Reading r = read(Optional.empty(), "03/04/2026", "05/02/2026");
    assertTrue(r.unsettled().isPresent());
    assertTrue(r.unsettled().get().contains("2026-04-03 day-first, 2026-05-02 month-first"));
    DateColumn.Reading set = read(Optional.of(DateOrder.MDY), "03/04/2026", "05/02/2026");
    assertEquals(Optional.of(LocalDate.of(2026, 5, 2)), set.latest());
    assertEquals(Optional.empty(), set.unsettled());
  }

  @Test
  void anOrderThatChangesNothingIsNotAskedFor() throws Exception {
    DateColumn.Reading r = read(Optional.empty(), "04/04/2026", "2026-05-20", "03/03/2026");
    assertEquals(Optional.empty(), r.unsettled());
    assertEquals(Optional.of(LocalDate.of(2026, 5, 20)), r.latest());
  }

  @Test
  void valuesThatCannotBeReadAreNamedWithTheirLine() throws Exception {
    DateColumn.Reading r =
        read(Optional.empty(), "14.03.2026", "31.02.2026", "2026-03-20", "15.03.2026", "soon");
    assertEquals(Optional.of(LocalDate.of(2026, 3, 20)), r.latest());
    assertEquals(2, r.problems().size(), r.problems().toString());
    assertEquals(3, r.problems().get(0).line());
    assertEquals(2, r.problems().get(0).column());
    assertTrue(r.problems().get(0).message().startsWith("cannot read '31.02.2026' as a day-first"));
    assertEquals(6, r.problems().get(1).line());
  }

  @Test
  void twoDigitYearsWidenAsPosixStrptimeDoes() {
    // The Open Group Base Specifications Issue 7, strptime %y: 69-99 are 1969-1999, 00-68
    // 2000-2068.
    assertEquals(2068, DateShapes.year("68"));
    assertEquals(1969, DateShapes.year("69"));
    assertEquals(2026, DateShapes.year("26"));
  }

  @Test
  void spreadsheetSerialsReadInThe1900DateSystem() throws Exception {
    // ECMA-376 Part 1, 18.17.4.1: serial 61 is 1 March 1900. That 45,658 shows as 1 January
    // 2025 in a spreadsheet is recalled from memory.
    assertEquals(LocalDate.of(1900, 3, 1), DateColumn.serialDay(61));
    assertEquals(LocalDate.of(2025, 1, 1), DateColumn.serialDay(45_658));
    DateColumn.Reading r = read(Optional.empty(), "45658", "45690.5", "45689");
    assertEquals(Optional.of(LocalDate.of(2025, 2, 2)), r.latest());
    assertEquals("spreadsheet serial numbers (1900 date system)", r.read());
  }
}
