package riffle.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import riffle.model.PiiMask;
import riffle.model.PiiType;

/**
 * The planted fixture ({@code pii/planted.txt}): every piece of personal data of every kind is
 * masked, with the type it is, and nothing else in those answers is masked; the ordinary fixture
 * ({@code pii/ordinary.txt}) comes through unchanged. Prints the count per kind and the false masks
 * per 1,000 ordinary answers.
 */
class PiiPlantedTest {
  /** One planted piece: its kind and where it stands in the answer. */
  record Planted(PiiType type, int start, int end, String value) {}

  /** One answer of the planted fixture: its text and its planted pieces. */
  record Answer(int line, String text, List<Planted> planted) {}

  static List<Answer> planted() throws IOException {
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
  static List<String> ordinary() throws IOException {
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
    try (InputStream in = PiiPlantedTest.class.getResourceAsStream(name)) {
      assertNotNull(in, name + " is missing");
      return List.of(new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n", -1));
    }
  }

  @Test
  void everyPlantedPieceIsMaskedWithItsTypeAndNothingElse() throws IOException {
    List<Answer> answers = planted();
    assertTrue(answers.size() >= 150, "planted answers: " + answers.size());
    Map<PiiType, int[]> counts = new EnumMap<>(PiiType.class);
    List<String> problems = new ArrayList<>();
    for (Answer a : answers) {
      PiiMasker.Masked m = PiiMasker.standard().mask(a.text());
      PiiMaskerTest.assertInvariants(a.text(), m);
      for (Planted p : a.planted()) {
        int[] c = counts.computeIfAbsent(p.type(), t -> new int[3]);
        Set<PiiType> covering = EnumSet.noneOf(PiiType.class);
        int covered = 0;
        for (PiiMask k : m.masks()) {
          int s = Math.max(k.start(), p.start());
          int e = Math.min(k.end(), p.end());
          if (e > s) {
            covered += e - s;
            covering.add(k.type());
          }
        }
        if (covered < p.end() - p.start()) {
          c[2]++;
          problems.add(
              "LEAK " + p.type() + " line " + a.line() + ": " + p.value() + " → " + m.text());
        } else if (!covering.equals(EnumSet.of(p.type()))) {
          c[1]++;
          problems.add(
              "TYPE "
                  + p.type()
                  + " masked as "
                  + covering
                  + " line "
                  + a.line()
                  + ": "
                  + m.text());
        } else {
          c[0]++;
        }
      }
      for (PiiMask k : m.masks()) {
        boolean planted =
            a.planted().stream().anyMatch(p -> k.start() < p.end() && p.start() < k.end());
        if (!planted) {
          problems.add(
              "EXTRA "
                  + k.type()
                  + " line "
                  + a.line()
                  + ": "
                  + a.text().substring(k.start(), k.end())
                  + " → "
                  + m.text());
        }
      }
    }
    StringBuilder table = new StringBuilder("kind: masked / other type / leaked\n");
    counts.forEach(
        (t, c) ->
            table.append(
                String.format(
                    Locale.ROOT, "  %-9s %3d / %d / %d%n", t.placeholder(), c[0], c[1], c[2])));
    System.out.print(table);
    problems.forEach(System.out::println);
    assertEquals(
        EnumSet.allOf(PiiType.class), counts.keySet(), "the fixture should plant every kind");
    assertEquals(List.of(), problems, "of " + answers.size() + " planted answers\n" + table);
  }

  @Test
  void ordinaryAnswersComeThroughUnchanged() throws IOException {
    List<String> answers = ordinary();
    assertTrue(answers.size() >= 200, "ordinary answers: " + answers.size());
    List<String> masked = new ArrayList<>();
    int falseMasks = 0;
    for (String a : answers) {
      PiiMasker.Masked m = PiiMasker.standard().mask(a);
      PiiMaskerTest.assertInvariants(a, m);
      falseMasks += m.masks().size();
      if (!m.masks().isEmpty()) {
        masked.add(a + " → " + m.text());
      }
    }
    System.out.printf(
        Locale.ROOT,
        "ordinary answers: %d, false masks: %d (%.1f per 1,000 answers)%n",
        answers.size(),
        falseMasks,
        1000.0 * falseMasks / answers.size());
    masked.forEach(System.out::println);
    assertEquals(List.of(), masked);
  }
}
