package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class CodeListTest {
  @Test
  void splitsOnSemicolonAndPipeTrimmingEachCode() {
    assertEquals(
        List.of("price", "shipping", "trust"), CodeList.split(" price; shipping | trust "));
    assertEquals(List.of("price", "warranty"), CodeList.split("price;warranty"));
  }

  @Test
  void splitsOnCommaOnlyWhenNoOtherSeparatorOccurs() {
    assertEquals(List.of("price", "shipping"), CodeList.split("price, shipping"));
    assertEquals(
        List.of("price, too high", "shipping"), CodeList.split("price, too high; shipping"));
  }

  @Test
  void splitsOnLineBreaks() {
    assertEquals(List.of("price", "delivery time"), CodeList.split("price\r\ndelivery time\n"));
  }

  @Test
  void dropsEmptiesAndCollapsesRepeatsIgnoringCaseKeepingOrder() {
    assertEquals(List.of("Trust", "price"), CodeList.split("Trust;; price ;trust | PRICE |  "));
    assertEquals(List.of(), CodeList.split(""));
    assertEquals(List.of(), CodeList.split(" ; | "));
    assertEquals(List.of(), CodeList.split(null));
    assertEquals(List.of("noise"), CodeList.split("noise"));
  }
}
