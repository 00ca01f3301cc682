package riffle.text;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The Luhn check of ISO/IEC 7812-1. */
class LuhnTest {
  /** Published test card numbers that payment providers document for testing (common practice). */
  static final String[] PUBLISHED_TEST_NUMBERS = {
    "4111 1111 1111 1111",
    "4111-1111-1111-1111",
    "5555 5555 5555 4444",
    "3782 822463 10005",
    "378282246310005",
    "6011111111111117",
    "4012888888881881",
    "4222222222222"
  };

  @Test
  void acceptsPublishedTestCardNumbers() {
    for (String n : PUBLISHED_TEST_NUMBERS) {
      assertTrue(Luhn.isValid(n), n);
    }
  }

  @Test
  void acceptsTheWorkedExampleOfTheStandard() {
    // the worked example usually given with the algorithm of ISO/IEC 7812-1 (annex B): account
    // 7992739871, check digit 3 (recalled from memory; the digit sum is checked here)
    assertTrue(Luhn.isValid("79927398713"));
    assertFalse(Luhn.isValid("79927398710"));
  }

  @Test
  void rejectsEveryNumberWithOneDigitChanged() {
    for (String n : PUBLISHED_TEST_NUMBERS) {
      String digits = n.replace(" ", "").replace("-", "");
      for (int i = 0; i < digits.length(); i++) {
        char c = digits.charAt(i);
        char other = (char) ('0' + (c - '0' + 1) % 10);
        String changed = digits.substring(0, i) + other + digits.substring(i + 1);
        assertFalse(Luhn.isValid(changed), changed);
      }
    }
    assertFalse(Luhn.isValid("4111 1111 1111 1112"));
    assertFalse(Luhn.isValid("5555 5555 5555 4445"));
  }

  @Test
  void rejectsTextThatIsNotANumber() {
    assertFalse(Luhn.isValid(""));
    assertFalse(Luhn.isValid("0"));
    assertFalse(Luhn.isValid("4111 1111 1111 111a"));
    assertFalse(Luhn.isValid("4111.1111.1111.1111"));
  }

  @Test
  void checksDigitArraysLikeText() {
    int[] digits = {9, 4, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 9};
    assertTrue(Luhn.isValid(digits, 1, 17));
    assertFalse(Luhn.isValid(digits, 0, 17));
    assertFalse(Luhn.isValid(digits, 3, 4));
  }
}
