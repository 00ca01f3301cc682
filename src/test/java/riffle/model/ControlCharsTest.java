package riffle.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Which characters steer a terminal or the text direction, and the one-line rule for names. */
class ControlCharsTest {
  @Test
  void c0C1DelAndBidiControlsAreControls() {
    for (int c :
        new int[] {
          0x00, 0x07, 0x08, 0x1B, 0x7F, 0x80, 0x9B, 0x9F, 0x202A, 0x202E, 0x2066, 0x2069
        }) {
      assertTrue(ControlChars.isControl(c), Integer.toHexString(c));
    }
    for (int c :
        new int[] {'\t', '\n', '\r', ' ', 'a', 0xA0, 0xE9, 0x200D, 0x200F, 0x2029, 0x2070}) {
      assertFalse(ControlChars.isControl(c), Integer.toHexString(c));
    }
  }

  @Test
  void aNameIsOneLineOfOrdinaryCharacters() {
    assertEquals(
        "Caf\u00e9 cr\u00e8me \uD83D\uDE80",
        ControlChars.checkName("the code name", "Caf\u00e9 cr\u00e8me \uD83D\uDE80"));
    InputException esc =
        assertThrows(
            InputException.class, () -> ControlChars.checkName("the code name", "Price\u001B[2J"));
    assertEquals(
        "the code name \"Price\\u001B[2J\" holds the control character \\u001B at character 6;"
            + " a name is one line of ordinary characters: give it without that one",
        esc.getMessage());
    assertTrue(
        ControlChars.problem("the wave name", "two\nlines").orElseThrow().contains("a line break"));
    assertTrue(ControlChars.problem("the wave name", "a\tb").orElseThrow().contains("a tab"));
    assertTrue(ControlChars.problem("x", "para\u2029graph").orElseThrow().contains("a line break"));
    assertTrue(ControlChars.problem("x", "plain").isEmpty());
  }
}
