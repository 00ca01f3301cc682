package riffle.stats;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class BenjaminiHochbergTest {

  static final double[] FIFTEEN = {
    0.0001, 0.0004, 0.0019, 0.0095, 0.0201, 0.0278, 0.0298, 0.0344, 0.0459, 0.3240, 0.4262, 0.5719,
    0.6528, 0.7590, 1.000
  };

  @Test
  @DisplayName("Benjamini & Hochberg (1995) JRSS B 57:289, worked example: 4 rejections at q 0.05")
  void workedExampleRejectsFour() {
    assertEquals(4, BenjaminiHochberg.rejections(FIFTEEN, 0.05));
  }

  @Test
  @DisplayName(
      "Adjusted p-values of the 1995 example (library values in src/test/resources/riffle/stats/checks.md)")
  void adjustedValuesOfTheWorkedExample() {
    double[] expected = {
      0.0015, 0.003, 0.0095, 0.035625, 0.0603, 0.063857, 0.063857, 0.0645, 0.0765, 0.486, 0.581182,
      0.714875, 0.753231, 0.813214, 1.0
    };
    assertArrayEquals(expected, BenjaminiHochberg.adjust(FIFTEEN), 5e-7);
  }

  /** The adjusted values keep the input's order, and rejection is "adjusted p ≤ q". */
  @Test
  void shuffledInputKeepsItsOrderAndRejectionMatchesAdjustedValues() {
    Random random = new Random(1995L);
    for (int round = 0; round < 200; round++) {
      double[] p = new double[1 + random.nextInt(40)];
      for (int i = 0; i < p.length; i++) {
        p[i] = random.nextInt(4) == 0 ? random.nextDouble() * 0.01 : random.nextDouble();
      }
      double[] adjusted = BenjaminiHochberg.adjust(p);
      double q = 0.01 + random.nextDouble() * 0.2;
      int below = 0;
      for (int i = 0; i < p.length; i++) {
        assertTrue(adjusted[i] >= p[i] * (1 - 1e-15) && adjusted[i] <= 1);
        for (int j = 0; j < p.length; j++) {
          if (p[i] <= p[j]) {
            assertTrue(adjusted[i] <= adjusted[j], "monotone");
          }
        }
        if (adjusted[i] <= q) {
          below++;
        }
      }
      assertEquals(below, BenjaminiHochberg.rejections(p, q));
    }
  }

  @Test
  void rejectsValuesThatAreNotProbabilities() {
    assertThrows(IllegalArgumentException.class, () -> BenjaminiHochberg.adjust(new double[] {2}));
    assertThrows(
        IllegalArgumentException.class, () -> BenjaminiHochberg.adjust(new double[] {Double.NaN}));
    assertThrows(
        IllegalArgumentException.class, () -> BenjaminiHochberg.rejections(new double[] {0.1}, 0));
    assertEquals(0, BenjaminiHochberg.adjust(new double[0]).length);
  }
}
