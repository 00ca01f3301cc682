package riffle.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;
import riffle.model.PiiMask;
import riffle.model.PiiType;

/**
 * Seeded random blasts: thousands of random strings of any Unicode (emoji, right-to-left text,
 * controls, lone surrogates) mixed with fragments of personal data. Masking never throws, every
 * result keeps its invariants (see {@link PiiMaskerTest#assertInvariants}), and the same seed gives
 * the same results.
 */
class PiiRandomInputTest {
  private static final long SEED = 20_260_315L;
  private static final int INPUTS = 5000;

  /** Pieces that make the detectors work hard: half-formed and whole personal data. */
  private static final String[] FRAGMENTS = {
    "@",
    "@@",
    ".",
    "..",
    "-",
    "+",
    "+44 ",
    "(",
    ")",
    "(0)",
    "00",
    "0",
    "07700",
    " 900123",
    "555-01",
    "4111 1111 1111 1111",
    "5555-5555-5555-4444",
    "3782 822463 10005",
    "www.",
    "http://",
    "https://",
    "://",
    "/",
    "example",
    ".com",
    "jo",
    "Priya",
    "Jonas Berg",
    "my name is ",
    "This is ",
    "I'm ",
    "ask for ",
    "thanks to ",
    " at ",
    " dot ",
    "[at]",
    "(dot)",
    "ORD-",
    "INV-2026-",
    "order #",
    "tracking ",
    "1Z999AA1",
    "€",
    "249.99",
    "1,299",
    "2026-03-15",
    "15.03.2026",
    "10:30",
    "%",
    "kg",
    "'s",
    "’",
    "\u00a0",
    "\u202f",
    " ",
    "  ",
    "\n",
    "\t",
    "221B Baker Street",
    " Road",
    "12 rue de la Paix",
    "Via Roma 12",
    "Kerkstraat 12",
    ", London NW1 6XE",
    "NW1 6XE",
    "PO Box 12",
    "postcode ",
    "zip 90210",
    "10115 Berlin",
    "Regards, ",
    "Cheers,\n",
    "Ingrid",
    "name: ",
    "born ",
    "DOB 15/03/1985",
    "3rd of May",
    "exp 12/28",
    "cvv 123",
    "GB82 WEST 1234 5698 7654 32",
    "DE89370400440532013000",
    "SSN 123-45-6789",
    "QQ 12 34 56 C",
    "12345678Z",
    "192.0.2.44",
    "2001:db8::1",
    "02:1A:3F:9C:44:E7",
    "reg AB12 CDE",
    "Kennzeichen "
  };

  /** Characters from many scripts and classes, including emoji and right-to-left text. */
  private static final String[] ALPHABETS = {
    "abcxyzABCXYZ0123456789",
    "éüßøÆœ\u0308\u0301",
    "שלום עולם مرحبا ٠١٢٣٤٥٦٧٨٩ \u200f\u200e\u202b\u202c",
    "漢字かなカナ한국어",
    "😀👍🏽👨‍👩‍👧☕️🇬🇧",
    "\u0000\u0007\u001b\u007f\u0085\u2028\u2029\ufeff\u200b",
    "０１２３４５６７８９＠．",
    ".,;:!?()[]{}<>\"'#&=_*\\|~^`"
  };

  @Test
  void randomInputsNeverBreakTheMaskerAndRepeatThemselves() {
    List<PiiMasker.Masked> first = blast(new Random(SEED));
    List<PiiMasker.Masked> second = blast(new Random(SEED));
    assertEquals(INPUTS, first.size());
    assertEquals(first, second, "same seed, same masks");
    Set<PiiType> seen = EnumSet.noneOf(PiiType.class);
    for (PiiMasker.Masked m : first) {
      for (PiiMask k : m.masks()) {
        seen.add(k.type());
      }
    }
    assertEquals(EnumSet.allOf(PiiType.class), seen, "the blast should exercise every detector");
  }

  @Test
  void randomCodeUnitsIncludingLoneSurrogatesNeverBreakTheMasker() {
    Random rnd = new Random(SEED + 1);
    for (int n = 0; n < INPUTS; n++) {
      char[] cs = new char[rnd.nextInt(200)];
      for (int i = 0; i < cs.length; i++) {
        cs[i] = (char) rnd.nextInt(Character.MAX_VALUE + 1);
      }
      String s = new String(cs);
      PiiMaskerTest.assertInvariants(s, PiiMasker.standard().mask(s));
    }
  }

  @Test
  void randomCodePointsNeverBreakTheMasker() {
    Random rnd = new Random(SEED + 2);
    for (int n = 0; n < INPUTS; n++) {
      StringBuilder sb = new StringBuilder();
      int len = rnd.nextInt(120);
      for (int i = 0; i < len; i++) {
        int cp = rnd.nextInt(Character.MAX_CODE_POINT + 1);
        if (cp < Character.MIN_SURROGATE || cp > Character.MAX_SURROGATE) {
          sb.appendCodePoint(cp);
        }
      }
      String s = sb.toString();
      PiiMaskerTest.assertInvariants(s, PiiMasker.standard().mask(s));
    }
  }

  private static List<PiiMasker.Masked> blast(Random rnd) {
    List<PiiMasker.Masked> out = new ArrayList<>(INPUTS);
    int masked = 0;
    for (int n = 0; n < INPUTS; n++) {
      String s = answer(rnd);
      PiiMasker.Masked m = PiiMasker.standard().mask(s);
      PiiMaskerTest.assertInvariants(s, m);
      masked += m.masks().isEmpty() ? 0 : 1;
      out.add(m);
    }
    assertTrue(masked > INPUTS / 10, "too few random inputs held anything to mask: " + masked);
    return out;
  }

  private static String answer(Random rnd) {
    StringBuilder sb = new StringBuilder();
    int parts = 1 + rnd.nextInt(16);
    for (int p = 0; p < parts; p++) {
      if (rnd.nextInt(3) == 0) {
        String alphabet = ALPHABETS[rnd.nextInt(ALPHABETS.length)];
        int[] cps = alphabet.codePoints().toArray();
        int len = 1 + rnd.nextInt(8);
        for (int i = 0; i < len; i++) {
          sb.appendCodePoint(cps[rnd.nextInt(cps.length)]);
        }
      } else if (rnd.nextInt(4) == 0) {
        int len = 1 + rnd.nextInt(12);
        for (int i = 0; i < len; i++) {
          sb.append((char) ('0' + rnd.nextInt(10)));
        }
      } else {
        sb.append(FRAGMENTS[rnd.nextInt(FRAGMENTS.length)]);
      }
    }
    return sb.toString();
  }
}
