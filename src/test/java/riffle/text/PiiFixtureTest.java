package riffle.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The invented answers of {@code pii/answers.txt} mask exactly as recorded there (see README). */
class PiiFixtureTest {
  private record Entry(int line, String answer, String expected) {}

  @Test
  void everyFixtureAnswerMasksAsRecorded() throws IOException {
    List<Entry> entries = read("pii/answers.txt");
    assertTrue(entries.size() >= 30, "fixture has " + entries.size() + " answers");
    for (Entry e : entries) {
      PiiMasker.Masked m = PiiMasker.standard().mask(e.answer());
      PiiMaskerTest.assertInvariants(e.answer(), m);
      assertEquals(e.expected(), m.text(), "answers.txt line " + e.line());
    }
  }

  private static List<Entry> read(String name) throws IOException {
    String text;
    try (InputStream in = PiiFixtureTest.class.getResourceAsStream(name)) {
      assertNotNull(in, name + " is missing");
      text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
    }
    List<Entry> out = new ArrayList<>();
    String[] lines = text.split("\n", -1);
    for (int i = 0; i < lines.length; i++) {
      if (lines[i].startsWith("> ")) {
        assertTrue(
            i + 1 < lines.length && lines[i + 1].startsWith("= "),
            name + " line " + (i + 2) + " should give the masked text");
        out.add(new Entry(i + 1, lines[i].substring(2), lines[i + 1].substring(2)));
        i++;
      }
    }
    return out;
  }
}
