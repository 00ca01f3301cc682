package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.junit.jupiter.api.Test;
import riffle.model.InputException;

class DelimiterTest {
  @Test
  void parsesEveryAcceptedSpelling() {
    assertEquals(Optional.empty(), Delimiter.parse("auto"));
    assertEquals(Optional.empty(), Delimiter.parse(" AUTO "));
    assertEquals(Optional.of(Delimiter.COMMA), Delimiter.parse(","));
    assertEquals(Optional.of(Delimiter.COMMA), Delimiter.parse("comma"));
    assertEquals(Optional.of(Delimiter.SEMICOLON), Delimiter.parse(";"));
    assertEquals(Optional.of(Delimiter.SEMICOLON), Delimiter.parse("Semicolon"));
    assertEquals(Optional.of(Delimiter.TAB), Delimiter.parse("tab"));
    assertEquals(Optional.of(Delimiter.TAB), Delimiter.parse("\\t"));
    assertEquals(Optional.of(Delimiter.TAB), Delimiter.parse("\t"));
    assertEquals(Optional.of(Delimiter.PIPE), Delimiter.parse("|"));
    assertEquals(Optional.of(Delimiter.PIPE), Delimiter.parse("pipe"));
  }

  @Test
  void rejectsUnknownDelimiterListingTheAcceptedValues() {
    InputException e = assertThrows(InputException.class, () -> Delimiter.parse("colon"));
    assertTrue(e.getMessage().startsWith("unknown delimiter 'colon'"), e.getMessage());
    for (String accepted : new String[] {"auto", "comma", "semicolon", "tab", "pipe"}) {
      assertTrue(e.getMessage().contains(accepted), e.getMessage());
    }
    assertThrows(InputException.class, () -> Delimiter.parse(null));
    assertThrows(InputException.class, () -> Delimiter.parse(""));
  }

  @Test
  void labelsAndCharactersMatchTheOptionValues() {
    assertEquals("comma", Delimiter.COMMA.label());
    assertEquals("semicolon", Delimiter.SEMICOLON.label());
    assertEquals("tab", Delimiter.TAB.label());
    assertEquals("pipe", Delimiter.PIPE.label());
    for (Delimiter d : Delimiter.values()) {
      assertEquals(Optional.of(d), Delimiter.parse(d.label()));
      assertEquals(Optional.of(d), Delimiter.parse(String.valueOf(d.character())));
    }
  }
}
