package riffle.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

class ErfTest {

  /** commons-math3 computes erfc through the regularised incomplete gamma function. */
  @Test
  void agreesWithCommonsMathToThirteenDigitsAcrossAllThreeIntervals() {
    Random random = new Random(42L);
    for (int i = 0; i < 5_000; i++) {
      double x = (random.nextDouble() - 0.3) * (i % 2 == 0 ? 2 : 14);
      double expected = org.apache.commons.math3.special.Erf.erfc(x);
      assertEquals(expected, Erf.erfc(x), 5e-14 * expected + 1e-300, "x = " + x);
    }
  }

  @Test
  void boundaryValues() {
    assertEquals(1, Erf.erfc(0));
    assertEquals(2, Erf.erfc(-30));
    assertEquals(0, Erf.erfc(30));
    // erfc(1) = 0.157299207050285 (memory; agrees with commons-math3 above).
    assertEquals(0.157299207050285, Erf.erfc(1), 1e-15);
    assertEquals(2 - Erf.erfc(0.3), Erf.erfc(-0.3), 1e-16);
  }
}
