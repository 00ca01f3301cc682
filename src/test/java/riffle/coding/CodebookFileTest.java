package riffle.coding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;
import org.junit.jupiter.api.Test;
import riffle.coding.CodebookFile.Format;
import riffle.coding.CodebookFile.Row;
import riffle.csv.SafeCsv;
import riffle.model.Code;
import riffle.model.Direction;
import riffle.model.InputException;

/** Codebook files: what is read, what is refused (with its place), and what is written. */
class CodebookFileTest {
  static Code code(long id, String name, OptionalLong parent, String key) {
    return new Code(
        id,
        name,
        "",
        "",
        "",
        Optional.empty(),
        Optional.ofNullable(key),
        parent,
        Direction.FRICTION,
        false,
        (int) id,
        List.of(),
        false);
  }

  static List<Row> read(String text, Format f) throws InputException {
    return CodebookFile.read("book", text.getBytes(StandardCharsets.UTF_8), f);
  }

  static String refused(String text, Format f) {
    return assertThrows(InputException.class, () -> read(text, f)).getMessage();
  }

  @Test
  void csvRoundTripsThroughTheWriter() throws Exception {
    List<Code> book =
        List.of(
            code(1, "Delivery", OptionalLong.empty(), null),
            code(2, "Date, unclear \"again\"", OptionalLong.of(1), "d"));
    List<Row> rows = read(CodebookFile.csv(book), Format.CSV);
    assertEquals(2, rows.size());
    assertEquals(Optional.of("Date, unclear \"again\""), rows.get(1).draft().name());
    assertEquals(Optional.of("Delivery"), rows.get(1).draft().parent());
    assertEquals(Optional.of(Direction.FRICTION), rows.get(1).draft().direction());
    assertEquals(3, rows.get(1).line());
    List<Row> json = read(CodebookFile.json(book), Format.JSON);
    assertEquals(rows.get(1).draft(), json.get(1).draft());
  }

  @Test
  void formulaLikeCellsAreNeutralised() {
    String csv = CodebookFile.csv(List.of(code(1, "@cost", OptionalLong.empty(), null)));
    assertTrue(csv.contains("\r\n'@cost,"), csv);
    assertEquals("'-1", SafeCsv.neutralise("-1"));
    assertEquals("'\tx", SafeCsv.neutralise("\tx"));
    assertEquals("plain", SafeCsv.neutralise("plain"));
  }

  @Test
  void formulaLikeNamesComeBackAsWrittenFromTheCsvFile() throws Exception {
    List<String> names =
        List.of("=HYPERLINK(\"http://x\")", "+1", "-5 stars", "@cost", "'=quoted", "'plain");
    List<Code> book = new java.util.ArrayList<>();
    for (int i = 0; i < names.size(); i++) {
      book.add(code(i + 1, names.get(i), OptionalLong.empty(), null));
    }
    String csv = CodebookFile.csv(book);
    assertTrue(csv.contains("\r\n\"'=HYPERLINK(\"\"http://x\"\")\","), csv);
    List<Row> rows = read(csv, Format.CSV);
    assertEquals(names.size(), rows.size());
    for (int i = 0; i < names.size(); i++) {
      assertEquals(Optional.of(names.get(i)), rows.get(i).draft().name(), csv);
    }
  }

  @Test
  void problemsNameTheirPlace() {
    assertTrue(
        refused("name,colour,size\nA,#fff,3\n", Format.CSV)
            .startsWith("book:1:3: unknown column \"size\""));
    assertTrue(refused("theme\nA\n", Format.CSV).contains("needs a \"name\" column"));
    assertTrue(refused("name\nA\n\"\"\n", Format.CSV).startsWith("book:3:1: a code needs a name"));
    assertTrue(refused("name\nA\na\n", Format.CSV).contains("listed twice (first on line 2)"));
    assertTrue(refused("name,archived\nA,maybe\n", Format.CSV).startsWith("book:2:2:"));
    assertTrue(refused("{\"codes\": [{\"name\": \"A\",}]}", Format.JSON).startsWith("book:1:"));
    assertTrue(refused("[]", Format.JSON).contains("\"codes\" array"));
    assertTrue(
        refused("{\"codes\": [{\"nom\": \"A\"}]}", Format.JSON).contains("unknown field \"nom\""));
    assertTrue(refused("{\"codes\": [3]}", Format.JSON).contains("code 1 is not an object"));
    assertTrue(
        assertThrows(
                InputException.class,
                () -> CodebookFile.read("book", new byte[] {(byte) 0xff, 'a'}, Format.CSV))
            .getMessage()
            .contains("not UTF-8"));
    assertTrue(
        assertThrows(InputException.class, () -> Format.of("book.xlsx"))
            .getMessage()
            .contains(".csv or .json"));
  }

  @Test
  void aByteOrderMarkAndSpacesAreTolerated() throws Exception {
    List<Row> rows = read("\uFEFFName , Direction\n Fit , praise \n", Format.CSV);
    assertEquals(Optional.of("Fit"), rows.get(0).draft().name());
    assertEquals(Optional.of(Direction.PRAISE), rows.get(0).draft().direction());
  }
}
