package riffle.text;

/**
 * The Luhn check-digit test (ISO/IEC 7812-1, annex B), which every payment card number passes and
 * nine in ten other long numbers fail.
 */
final class Luhn {
  private Luhn() {}

  /**
   * Whether the number passes the check. Spaces and hyphens between digits are ignored; any other
   * character, or fewer than two digits, fails.
   */
  static boolean isValid(CharSequence number) {
    int sum = 0;
    int count = 0;
    for (int i = number.length() - 1; i >= 0; i--) {
      char c = number.charAt(i);
      if (c == ' ' || c == '-') {
        continue;
      }
      int d = Character.digit(c, 10);
      if (d < 0) {
        return false;
      }
      sum += weighted(d, count);
      count++;
    }
    return count >= 2 && sum % 10 == 0;
  }

  /** Whether {@code digits[from..to)}, each 0–9, pass the check. */
  static boolean isValid(int[] digits, int from, int to) {
    if (to - from < 2) {
      return false;
    }
    int sum = 0;
    for (int i = to - 1, k = 0; i >= from; i--, k++) {
      sum += weighted(digits[i], k);
    }
    return sum % 10 == 0;
  }

  /** The digit's contribution when it stands {@code fromRight} places left of the check digit. */
  private static int weighted(int digit, int fromRight) {
    if (fromRight % 2 == 0) {
      return digit;
    }
    int doubled = digit * 2;
    return doubled > 9 ? doubled - 9 : doubled;
  }
}
