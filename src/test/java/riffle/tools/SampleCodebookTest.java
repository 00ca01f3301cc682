package riffle.tools;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import riffle.tools.SampleResponses.Question;
import riffle.tools.SampleResponses.Theme;

/**
 * The demo's codebook file ({@code sample-responses/codebook.csv}) is the generator's theme
 * catalogue: every planted theme under its parent theme, with its direction, so that the demo's
 * imported codes get their themes and directions.
 */
class SampleCodebookTest {
  static String expected() {
    Map<String, String> parents = new LinkedHashMap<>();
    StringBuilder children = new StringBuilder();
    for (Question q : Question.values()) {
      for (Theme t : SampleResponses.themes(q)) {
        String direction = t.direction().name().toLowerCase(Locale.ROOT);
        parents.putIfAbsent(t.parent(), direction);
        children
            .append(t.code())
            .append(',')
            .append(t.parent())
            .append(',')
            .append(direction)
            .append("\r\n");
      }
    }
    StringBuilder csv = new StringBuilder("name,theme,direction\r\n");
    parents.forEach((p, d) -> csv.append(p).append(",,").append(d).append("\r\n"));
    return csv.append(children).toString();
  }

  @Test
  void theCommittedCodebookIsTheGeneratorsCatalogue() throws Exception {
    Path committed = Path.of("sample-responses", "codebook.csv");
    if (Boolean.getBoolean("riffle.write")) {
      Files.writeString(committed, expected(), StandardCharsets.UTF_8);
    }
    assertEquals(expected(), Files.readString(committed, StandardCharsets.UTF_8));
  }
}
