package riffle.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/** Seeded random strings for blasts: Latin words, emoji, right-to-left and control characters. */
final class RandomText {
  private static final String[] PIECES = {
    "delivery",
    "NOT",
    "didnt",
    "warranty",
    " ",
    "  ",
    ".",
    ",",
    "!",
    "?",
    "\n",
    "\r\n",
    "\t",
    "שלום",
    "مرحبا",
    "☕",
    "👍🏽",
    "é",
    "\u0301",
    "\u0000",
    "\u200f",
    "\uFEFF",
    "1.8",
    "€249",
    "[",
    "]",
    "\"",
    "'",
    "-",
    "https://",
    "@",
    "ß",
    "İ",
    "日本語",
    "\uD83D",
    "\uDE00"
  };

  private RandomText() {}

  static List<String> strings(Random random, int count) {
    List<String> out = new ArrayList<>(count);
    for (int i = 0; i < count; i++) {
      StringBuilder sb = new StringBuilder();
      int parts = random.nextInt(40);
      for (int p = 0; p < parts; p++) {
        if (random.nextInt(4) == 0) {
          sb.append((char) random.nextInt(0x3000));
        } else {
          sb.append(PIECES[random.nextInt(PIECES.length)]);
        }
      }
      out.add(sb.toString());
    }
    return out;
  }
}
