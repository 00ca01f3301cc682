package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** What the command line's one writer does to each kind of character. */
class TerminalTextTest {
  private static String printed(String... pieces) {
    ByteArrayOutputStream bytes = new ByteArrayOutputStream();
    PrintWriter w = TerminalText.writer(new PrintStream(bytes, true, StandardCharsets.UTF_8));
    for (String p : pieces) {
      w.print(p);
    }
    w.flush();
    return bytes.toString(StandardCharsets.UTF_8);
  }

  @Test
  void terminalControlsBecomeVisibleEscapes() {
    assertEquals("\\u001B[31mred\\u001B[0m", printed("\u001B[31mred\u001B[0m"));
    assertEquals("\\u001B]0;title\\u0007", printed("\u001B]0;title\u0007"), "OSC with BEL");
    assertEquals("\\u009B2J", printed("\u009B2J"), "one-character CSI");
    assertEquals("a\\u0008b\\u007F", printed("a\bb\u007F"), "backspace and DEL");
    assertEquals(
        "\\u202Ecod.exe\\u202C \\u2066x\\u2069", printed("\u202Ecod.exe\u202C \u2066x\u2069"));
  }

  @Test
  void ordinaryTextLineEndsAndTabsPassUnchanged() {
    String text = "Caf\u00e9 cr\u00e8me\tfast \uD83D\uDE80 \u05E9\u05DC\u05D5\u05DD\nnext\r\nlast";
    assertEquals(text, printed(text));
    assertEquals("a\r\nb", printed("a\r", "\nb"), "a CR LF split across writes is a line end");
  }

  @Test
  void aCarriageReturnThatWouldOverwriteTheLineIsShown() {
    assertEquals("fake\\u000Dreal", printed("fake\rreal"));
    assertEquals("end\\u000D", printed("end\r"), "a CR left at the end is shown on flush");
  }

  @Test
  void singleCharactersAndClosingGoThroughTheSameRule() {
    ByteArrayOutputStream bytes = new ByteArrayOutputStream();
    PrintWriter w = TerminalText.writer(new PrintStream(bytes, true, StandardCharsets.UTF_8));
    w.print('\u001B');
    w.print('x');
    w.print('\r');
    w.close();
    assertEquals("\\u001Bx\\u000D", bytes.toString(StandardCharsets.UTF_8));
  }

  @Test
  void jsonStaysValidAndMeansTheSame() throws Exception {
    String value = "x\u009B\u202E\u001B\u007Fy";
    String json = printed(JsonOutput.MAPPER.writeValueAsString(Map.of("text", value)));
    assertTrue(json.contains("\"x\\u009B\\u202E\\u001B\\u007Fy\""), json);
    assertEquals(value, JsonOutput.MAPPER.readTree(json).get("text").asText());
  }
}
