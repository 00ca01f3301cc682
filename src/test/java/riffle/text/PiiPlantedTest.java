package riffle.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
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
  @Test
  void everyPlantedPieceIsMaskedWithItsTypeAndNothingElse() throws IOException {
    List<PlantedFixture.Answer> answers = PlantedFixture.planted();
    assertTrue(answers.size() >= 150, "planted answers: " + answers.size());
    Map<PiiType, int[]> counts = new EnumMap<>(PiiType.class);
    List<String> problems = new ArrayList<>();
    for (PlantedFixture.Answer a : answers) {
      PiiMasker.Masked m = PiiMasker.standard().mask(a.text());
      PiiMaskerTest.assertInvariants(a.text(), m);
      for (PlantedFixture.Planted p : a.planted()) {
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
    List<String> answers = PlantedFixture.ordinary();
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
