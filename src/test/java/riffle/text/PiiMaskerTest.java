package riffle.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import riffle.model.PiiMask;
import riffle.model.PiiType;

/** The masker's contract: placeholders, offsets, exact reconstruction, precedence, settings. */
class PiiMaskerTest {
  static final PiiMasker STANDARD = PiiMasker.standard();

  // ---- helpers shared by the other Pii*Test classes ----

  /** Masks with the standard masker and checks every invariant of the result. */
  static PiiMasker.Masked mask(String text) {
    PiiMasker.Masked m = STANDARD.mask(text);
    assertInvariants(text, m);
    return m;
  }

  /** The one mask of the text, of the given type, covering exactly {@code span}. */
  static void assertOne(String text, PiiType type, String span) {
    PiiMasker.Masked m = mask(text);
    int start = text.indexOf(span);
    assertTrue(start >= 0, "test is wrong: [" + span + "] is not in [" + text + "]");
    assertEquals(
        List.of(type + " " + start + ".." + (start + span.length())),
        describe(m),
        "masks of [" + text + "] → [" + m.text() + "]");
  }

  /** Every span given is masked as {@code type}, and nothing else is masked. */
  static void assertAll(String text, PiiType type, String... spans) {
    PiiMasker.Masked m = mask(text);
    List<String> expected = new ArrayList<>();
    int from = 0;
    for (String span : spans) {
      int start = text.indexOf(span, from);
      assertTrue(start >= 0, "test is wrong: [" + span + "] is not in [" + text + "]");
      expected.add(type + " " + start + ".." + (start + span.length()));
      from = start + span.length();
    }
    assertEquals(expected, describe(m), "masks of [" + text + "] → [" + m.text() + "]");
  }

  /** Nothing in the text is masked, and it comes back unchanged. */
  static void assertUntouched(String text) {
    PiiMasker.Masked m = mask(text);
    assertEquals(List.of(), describe(m), "masks of [" + text + "] → [" + m.text() + "]");
    assertEquals(text, m.text());
  }

  static List<String> describe(PiiMasker.Masked m) {
    return m.masks().stream()
        .map(k -> k.type() + " " + k.start() + ".." + k.end())
        .collect(Collectors.toList());
  }

  /**
   * Masks are sorted, non-overlapping and in bounds, each placeholder sits where its mask says, no
   * mask splits a surrogate pair, and putting the original spans back rebuilds the input.
   */
  static void assertInvariants(String input, PiiMasker.Masked m) {
    String masked = m.text();
    StringBuilder rebuilt = new StringBuilder();
    int prevEnd = 0;
    int prevMaskedEnd = 0;
    for (PiiMask k : m.masks()) {
      int before = prevEnd;
      assertTrue(k.start() >= before, () -> "masks overlap or are out of order: " + m.masks());
      assertTrue(k.end() <= input.length(), "mask beyond the input: " + k);
      assertEquals(k.type().placeholder(), masked.substring(k.maskedStart(), k.maskedEnd()));
      assertEquals(
          input.substring(prevEnd, k.start()), masked.substring(prevMaskedEnd, k.maskedStart()));
      assertFalse(splitsPair(input, k.start()), "mask starts inside a surrogate pair: " + k);
      assertFalse(splitsPair(input, k.end()), "mask ends inside a surrogate pair: " + k);
      rebuilt.append(masked, prevMaskedEnd, k.maskedStart());
      rebuilt.append(input, k.start(), k.end());
      prevEnd = k.end();
      prevMaskedEnd = k.maskedEnd();
    }
    assertEquals(input.substring(prevEnd), masked.substring(prevMaskedEnd));
    rebuilt.append(masked, prevMaskedEnd, masked.length());
    assertEquals(input, rebuilt.toString(), "reconstruction");
  }

  private static boolean splitsPair(String s, int i) {
    return i > 0
        && i < s.length()
        && Character.isHighSurrogate(s.charAt(i - 1))
        && Character.isLowSurrogate(s.charAt(i));
  }

  // ---- the contract ----

  @Test
  void replacesEachPieceByItsTypedPlaceholderAndKeepsTheRest() {
    String answer =
        "Great machine! Mail me at priya.shah+riffle@example.com or call 07700 900123, "
            + "order ORD-48213 — my name is Priya.";
    PiiMasker.Masked m = mask(answer);
    assertEquals(
        "Great machine! Mail me at [email] or call [phone], order [reference] — my name is"
            + " [name].",
        m.text());
    assertEquals(
        List.of(PiiType.EMAIL, PiiType.PHONE, PiiType.REFERENCE, PiiType.NAME),
        m.masks().stream().map(PiiMask::type).toList());
  }

  @Test
  void reportsOffsetsIntoTheInputAndIntoTheMaskedText() {
    PiiMasker.Masked m = mask("call +44 7700 900123 or mail jo@example.org");
    assertEquals(
        List.of(
            new PiiMask(PiiType.PHONE, 5, 20, 5, 12), new PiiMask(PiiType.EMAIL, 29, 43, 21, 28)),
        m.masks());
    assertEquals("call [phone] or mail [email]", m.text());
  }

  @Test
  void leavesTextWithoutPersonalDataExactlyAsWritten() {
    for (String s :
        List.of(
            "",
            " ",
            "Loved the Velle Duo 2, it arrived in 3 days.",
            "\t  spaces\u00a0kept \r\n and line ends\n",
            "Émile aimait la crème — 😀 — שלום")) {
      PiiMasker.Masked m = mask(s);
      assertSame(s, m.text(), "text returned as given: [" + s + "]");
      assertTrue(m.masks().isEmpty());
    }
  }

  @Test
  void placeholdersAlreadyInTheAnswerDoNotConfuseReconstruction() {
    PiiMasker.Masked m = mask("[email] is what I typed, real one jo@example.com [email]");
    assertEquals("[email] is what I typed, real one [email] [email]", m.text());
    assertEquals(1, m.masks().size());
  }

  @Test
  void anEmailInsideAWebAddressIsMaskedAsPartOfTheAddress() {
    assertOne(
        "my link https://ondalune.example/track?mail=jo@example.com thanks",
        PiiType.URL,
        "https://ondalune.example/track?mail=jo@example.com");
  }

  @Test
  void aLuhnValid15DigitNumberIsACardNotAPhone() {
    // 378282246310005 is a published test card number (common practice in payment testing)
    assertOne("paid with 378282246310005 ok", PiiType.CARD, "378282246310005");
  }

  @Test
  void aReferenceBeatsAPhoneForTheSameDigits() {
    assertOne("my order number 4821345 never came", PiiType.REFERENCE, "4821345");
  }

  @Test
  void aPhoneNumberInAWebAddressIsPartOfTheAddress() {
    assertOne(
        "see https://ondalune.example/callback/07700900123 please",
        PiiType.URL,
        "https://ondalune.example/callback/07700900123");
  }

  @Test
  void masksAreSortedAndNeverOverlap() {
    String answer =
        "@jo_fan jo@example.com www.ondalune.example/a 4111 1111 1111 1111 "
            + "+1 555-010-0199 INV-2026-0042 ask for Jonas Berg";
    PiiMasker.Masked m = mask(answer);
    assertEquals(
        List.of(
            PiiType.HANDLE,
            PiiType.EMAIL,
            PiiType.URL,
            PiiType.CARD,
            PiiType.PHONE,
            PiiType.REFERENCE,
            PiiType.NAME),
        m.masks().stream().map(PiiMask::type).toList());
  }

  @Test
  void theStandardMaskerIsSharedAndGivesTheSameAnswerEveryTime() {
    assertSame(PiiMasker.standard(), PiiMasker.standard());
    String s = "call 020 7946 0018, order #48213";
    assertEquals(PiiMasker.standard().mask(s), PiiMasker.standard().mask(s));
  }

  @Test
  void theMaskListCannotBeChangedAfterwards() {
    PiiMasker.Masked m = mask("jo@example.com");
    assertThrows(UnsupportedOperationException.class, () -> m.masks().clear());
  }

  @Test
  void refusesANullText() {
    assertThrows(NullPointerException.class, () -> STANDARD.mask(null));
  }

  @Test
  void masksTheSameFromManyThreadsAtOnce() throws InterruptedException {
    String s = "Hi, I'm Priya. Call +44 7700 900123 about order ORD-48213, jo@example.com";
    PiiMasker.Masked expected = STANDARD.mask(s);
    List<Thread> threads = new ArrayList<>();
    List<PiiMasker.Masked> results = java.util.Collections.synchronizedList(new ArrayList<>());
    for (int t = 0; t < 8; t++) {
      Thread th =
          new Thread(
              () -> {
                for (int i = 0; i < 500; i++) {
                  results.add(STANDARD.mask(s));
                }
              });
      threads.add(th);
      th.start();
    }
    for (Thread th : threads) {
      th.join();
    }
    assertEquals(4000, results.size());
    assertTrue(results.stream().allMatch(expected::equals));
  }
}
