package riffle.phrases;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.Test;

class CValueTest {

  /**
   * Frantzi, Ananiadou &amp; Mima (2000), International Journal on Digital Libraries 3(2):115–130,
   * §2.3.1, as listed in src/test/resources/riffle/stats/checks.md: six candidates around "basal
   * cell carcinoma".
   */
  @Test
  void reproducesThePapersWorkedExample() {
    List<String> terms =
        List.of(
            "adenoid cystic basal cell carcinoma",
            "cystic basal cell carcinoma",
            "ulcerated basal cell carcinoma",
            "recurrent basal cell carcinoma",
            "circumscribed basal cell carcinoma",
            "basal cell carcinoma");
    int[] frequency = {5, 11, 7, 5, 3, 984};
    double[] value = cValues(terms, frequency);
    assertArrayEquals(new double[] {11.6096, 12.0, 14.0, 10.0, 6.0, 1551.36}, value, 0.005);
  }

  /** The order in which candidates arrive must not matter (the algorithm sorts by length). */
  @Test
  void resultDoesNotDependOnInputOrder() {
    List<String> terms =
        new ArrayList<>(
            List.of(
                "basal cell carcinoma",
                "cystic basal cell carcinoma",
                "adenoid cystic basal cell carcinoma"));
    double[] forward = cValues(terms, new int[] {984, 11, 5});
    Collections.reverse(terms);
    double[] backward = cValues(terms, new int[] {5, 11, 984});
    assertEquals(forward[0], backward[2], 1e-9);
    assertEquals(forward[1], backward[1], 1e-9);
    assertEquals(forward[2], backward[0], 1e-9);
  }

  @Test
  void aTermThatOnlyOccursInsideALongerOneScoresZero() {
    double[] value =
        cValues(List.of("firm delivery date shown", "firm delivery date"), new int[] {7, 7});
    assertEquals(2 * 7, value[0], 1e-9);
    assertEquals(0, value[1], 1e-9);
  }

  /** Candidates nested in one another when one's words are a contiguous run of the other's. */
  private static double[] cValues(List<String> terms, int[] frequency) {
    int n = terms.size();
    int[] length = new int[n];
    for (int i = 0; i < n; i++) {
      length[i] = terms.get(i).split(" ").length;
    }
    return CValue.compute(
        length,
        frequency,
        a -> {
          List<Integer> inside = new ArrayList<>();
          for (int b = 0; b < n; b++) {
            if (length[b] < length[a]
                && (" " + terms.get(a) + " ").contains(" " + terms.get(b) + " ")) {
              inside.add(b);
            }
          }
          return inside.stream().mapToInt(Integer::intValue).toArray();
        },
        CValue::log2);
  }
}
