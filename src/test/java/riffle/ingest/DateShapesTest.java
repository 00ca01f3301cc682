package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DateShapesTest {
  @Test
  void acceptsTheFormatsExportsUse() {
    String[] dates = {
      "2024-03-02",
      "2024-03-02T14:05:09Z",
      "2024-03-02T14:05:09.123+01:00",
      "2024-03-02 14:05",
      "2024/03/02",
      "02/03/2024",
      "3/2/24",
      "3/2/2024 2:05 PM",
      "02.03.2024",
      "02-03-2024 14:05:09",
      "2 Mar 2024",
      "March 2, 2024",
      "Mar 2nd, 2024 10:00",
      "  2024-03-02  "
    };
    for (String d : dates) {
      assertTrue(DateShapes.looksLikeDate(d), d);
    }
  }

  @Test
  void rejectsValuesThatOnlyLookNumeric() {
    String[] notDates = {
      "2024",
      "R-1001",
      "13/13/2024",
      "2024-13-02",
      "2024-02-32",
      "1.5",
      "€200–€500",
      "",
      "Shipped on 2 Mar 2024",
      "555-0134",
      "12.5.3.1",
      "32/01/2024"
    };
    for (String d : notDates) {
      assertFalse(DateShapes.looksLikeDate(d), d);
    }
  }
}
