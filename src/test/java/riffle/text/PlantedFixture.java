package riffle.text;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import riffle.model.PiiType;

/**
 * The masking fixtures of {@code riffle/text/pii/}: the planted answers ({@code planted.txt}, each
 * piece of personal data marked ⟦kind|value⟧) and the ordinary answers ({@code ordinary.txt}). See
 * the README beside them.
 */
public final class PlantedFixture {
  private PlantedFixture() {}

  /**
   * One planted piece: its kind and where it stands in the answer.
   *
   * @param type its kind
   * @param start where it starts in the answer
   * @param end where it ends
   * @param value the text planted
   */
  public record Planted(PiiType type, int start, int end, String value) {}

  /**
   * One answer of the planted fixture.
   *
   * @param line its line in the file
   * @param text the answer, marks removed
   * @param planted its planted pieces
   */
  public record Answer(int line, String text, List<Planted> planted) {}

  /** Every planted answer, "\\n" read as a line break. */
  public static List<Answer> planted() throws IOException {
    List<Answer> out = new ArrayList<>();
    List<String> lines = lines("pii/planted.txt");
    for (int i = 0; i < lines.size(); i++) {
      String raw = lines.get(i);
      if (raw.isBlank() || raw.startsWith("#")) {
        continue;
      }
      out.add(parse(i + 1, raw.replace("\\n", "\n")));
    }
    return out;
  }

  /** The ordinary answers, "\n" read as a line break. */
  public static List<String> ordinary() throws IOException {
    List<String> out = new ArrayList<>();
    for (String raw : lines("pii/ordinary.txt")) {
      if (!raw.isBlank() && !raw.startsWith("#")) {
        out.add(raw.replace("\\n", "\n"));
      }
    }
    return out;
  }

  private static Answer parse(int line, String marked) {
    StringBuilder text = new StringBuilder();
    List<Planted> planted = new ArrayList<>();
    int i = 0;
    while (i < marked.length()) {
      int open = marked.indexOf('⟦', i);
      if (open < 0) {
        text.append(marked, i, marked.length());
        break;
      }
      text.append(marked, i, open);
      int bar = marked.indexOf('|', open);
      int close = marked.indexOf('⟧', open);
      assertTrue(bar > open && close > bar, "planted.txt line " + line + ": unclosed mark");
      PiiType type = PiiType.valueOf(marked.substring(open + 1, bar).toUpperCase(Locale.ROOT));
      String value = marked.substring(bar + 1, close);
      planted.add(new Planted(type, text.length(), text.length() + value.length(), value));
      text.append(value);
      i = close + 1;
    }
    return new Answer(line, text.toString(), planted);
  }

  private static List<String> lines(String name) throws IOException {
    try (InputStream in = PlantedFixture.class.getResourceAsStream(name)) {
      assertNotNull(in, name + " is missing");
      return List.of(new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n", -1));
    }
  }
}
