package riffle.coding;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;

class FoldsTest {
  /** 300 answers from 97 respondents, one to five answers each, in a scrambled order. */
  private static List<String> respondents(long seed) {
    Random r = new Random(seed);
    List<String> out = new ArrayList<>();
    for (int i = 0; i < 97; i++) {
      int answers = 1 + r.nextInt(5);
      for (int a = 0; a < answers; a++) {
        out.add("Wave 1/R-" + i);
      }
    }
    Collections.shuffle(out, new Random(seed + 1));
    return out;
  }

  @Test
  void aRespondentsAnswersAlwaysShareOneFold() {
    for (long seed = 0; seed < 20; seed++) {
      List<String> keys = respondents(seed);
      int[] fold = Folds.assign(keys, 5, seed);
      Map<String, Integer> seen = new HashMap<>();
      for (int i = 0; i < keys.size(); i++) {
        Integer before = seen.putIfAbsent(keys.get(i), fold[i]);
        assertTrue(before == null || before == fold[i], keys.get(i) + " split across folds");
        assertTrue(fold[i] >= 0 && fold[i] < 5);
      }
      int[] perFold = new int[5];
      for (int f : seen.values()) {
        perFold[f]++;
      }
      for (int n : perFold) {
        assertTrue(n == 19 || n == 20, "97 respondents dealt to 5 folds: 19 or 20 each");
      }
    }
  }

  @Test
  void foldsDependOnTheSeedAndNotOnTheExampleOrder() {
    List<String> keys = respondents(3);
    List<String> reversed = new ArrayList<>(keys);
    Collections.reverse(reversed);
    int[] a = Folds.assign(keys, 5, 42);
    int[] b = Folds.assign(reversed, 5, 42);
    for (int i = 0; i < keys.size(); i++) {
      assertEquals(a[i], b[keys.size() - 1 - i]);
    }
    assertArrayEquals(a, Folds.assign(keys, 5, 42));
    assertFalse(java.util.Arrays.equals(a, Folds.assign(keys, 5, 43)));
  }

  @Test
  void fewerRespondentsThanFoldsUseOneFoldPerRespondent() {
    int[] fold = Folds.assign(List.of("a", "b", "a"), 5, 1);
    assertEquals(2, Folds.count(2, 5));
    assertEquals(fold[0], fold[2]);
    assertTrue(fold[0] != fold[1]);
  }
}
