package riffle.report;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Random;
import java.util.Set;

/**
 * An invented survey of the invented shop Ondalune, built in code: exact counts per wave so that
 * the planted fall, the flat theme and the tiny base are known.
 */
final class Survey {
  static final String MAIN = "What almost stopped you from buying at Ondalune?";
  static final String TINY = "Anything else?";
  static final List<String> WAVES = List.of("Spring", "Summer", "Autumn");
  static final int BASE = 400;
  static final int TINY_BASE = 12;
  static final int NON_ANSWERS = 20;

  static final List<ReportCode> CODEBOOK =
      List.of(
          code("delivery", "Delivery", null, "friction"),
          code("cost", "Delivery cost", "delivery", "friction"),
          code("slow", "Slow delivery", "delivery", "friction"),
          new ReportCode("old", "Old delivery code", Optional.of("delivery"), "friction", true),
          code("quality", "Product quality", null, "praise"),
          code("fabric", "Soft fabric", "quality", "praise"),
          code("fit", "Fits well", "quality", "praise"),
          code("checkout", "Easy checkout", null, "praise"),
          code("late", "Late newcomer", null, "neutral"));

  static ReportCode code(String id, String name, String parent, String direction) {
    return new ReportCode(id, name, Optional.ofNullable(parent), direction, false);
  }

  /** Per wave, how many of the 400 main answers carry each code. */
  static final Map<String, int[]> COUNTS =
      Map.of(
          "cost", new int[] {120, 120, 48},
          "slow", new int[] {60, 64, 58},
          "fabric", new int[] {80, 80, 80},
          "fit", new int[] {50, 55, 52},
          "checkout", new int[] {30, 28, 33},
          "old", new int[] {40, 0, 0});

  final List<ReportAnswer> answers = new ArrayList<>();
  private long sequence = 0;

  Survey(long seed) {
    Random random = new Random(seed);
    for (int w = 0; w < WAVES.size(); w++) {
      List<Set<String>> codes = new ArrayList<>();
      for (int i = 0; i < BASE; i++) {
        codes.add(new HashSet<>());
      }
      for (Map.Entry<String, int[]> e : COUNTS.entrySet()) {
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < BASE; i++) {
          order.add(i);
        }
        Collections.shuffle(order, random);
        for (int k = 0; k < e.getValue()[w]; k++) {
          codes.get(order.get(k)).add(e.getKey());
        }
      }
      for (int i = 0; i < BASE; i++) {
        if (w == 2 && i >= BASE - 10) {
          codes.get(i).add("late"); // first given among the last coded answers
        }
        add(
            "m" + w + "-" + i,
            WAVES.get(w),
            MAIN,
            true,
            codes.get(i),
            i % 3 == 0 ? "new" : "returning");
      }
      for (int i = 0; i < NON_ANSWERS; i++) {
        add("n" + w + "-" + i, WAVES.get(w), MAIN, false, Set.of("checkout", "cost"), "new");
      }
      for (int i = 0; i < TINY_BASE; i++) {
        add(
            "t" + w + "-" + i,
            WAVES.get(w),
            TINY,
            true,
            w < 2 || i < 2 ? Set.of("cost") : Set.of(),
            "new");
      }
    }
  }

  private void add(
      String id,
      String wave,
      String question,
      boolean substantive,
      Set<String> codes,
      String buyer) {
    answers.add(
        new ReportAnswer(
            id,
            wave,
            question,
            substantive,
            codes,
            Map.of("buyer", buyer),
            OptionalLong.of(++sequence)));
  }

  ReportInput input() {
    return new ReportInput(List.of(MAIN, TINY), WAVES, CODEBOOK, answers);
  }
}
