package riffle.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static riffle.text.PiiMaskerTest.assertOne;
import static riffle.text.PiiMaskerTest.assertUntouched;

import java.math.BigInteger;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import riffle.model.PiiType;

/**
 * IBANs: the structure of ISO 13616-1 and its check digits, ISO/IEC 7064 MOD 97-10. The example
 * IBANs are those printed in the IBAN registry (SWIFT, the ISO 13616 registration authority) and
 * widely reproduced, recalled from memory; each is checked here against an independent computation
 * with {@link BigInteger}, so a wrongly recalled one fails.
 */
class PiiIbanTest {
  /** Registry examples, print form (groups of four). */
  static final List<String> EXAMPLES =
      List.of(
          "GB82 WEST 1234 5698 7654 32",
          "DE89 3704 0044 0532 0130 00",
          "FR14 2004 1010 0505 0001 3M02 606",
          "NL91 ABNA 0417 1643 00",
          "ES91 2100 0418 4502 0005 1332",
          "IT60 X054 2811 1010 0000 0123 456",
          "BE68 5390 0754 7034",
          "AT61 1904 3002 3457 3201",
          "CH93 0076 2011 6238 5295 7",
          "IE29 AIBK 9311 5212 3456 78",
          "NO93 8601 1117 947",
          "PL61 1090 1014 0000 0712 1981 2874");

  /** MOD 97-10 as the standard states it: move four characters, letters to 10–35, mod 97 = 1. */
  static boolean reference(String iban) {
    String compact = iban.replace(" ", "").toUpperCase(Locale.ROOT);
    String moved = compact.substring(4) + compact.substring(0, 4);
    StringBuilder digits = new StringBuilder();
    for (char c : moved.toCharArray()) {
      digits.append(Character.isDigit(c) ? String.valueOf(c) : String.valueOf(c - 'A' + 10));
    }
    return new BigInteger(digits.toString()).mod(BigInteger.valueOf(97)).intValue() == 1;
  }

  @Test
  void theRegistryExamplesPassTheCheckAsTheStandardComputesIt() {
    // the registry's worked example: GB82WEST12345698765432 rearranged is
    // WEST12345698765432GB82, read as 3214282912345698765432161182, which is 1 modulo 97
    assertEquals(
        1, new BigInteger("3214282912345698765432161182").mod(BigInteger.valueOf(97)).intValue());
    for (String iban : EXAMPLES) {
      assertTrue(reference(iban), "recalled wrongly: " + iban);
      assertTrue(PiiBank.isValidIban(iban.replace(" ", "")), iban);
    }
  }

  @Test
  void everyIbanWithOneCharacterChangedFailsTheCheck() {
    for (String iban : EXAMPLES) {
      String compact = iban.replace(" ", "");
      for (int i = 2; i < compact.length(); i++) {
        char c = compact.charAt(i);
        char other =
            Character.isDigit(c)
                ? (char) ('0' + (c - '0' + 1) % 10)
                : c == 'Z' ? 'A' : (char) (c + 1);
        String changed = compact.substring(0, i) + other + compact.substring(i + 1);
        assertEquals(reference(changed), PiiBank.isValidIban(changed), changed);
        assertFalse(PiiBank.isValidIban(changed), changed);
      }
    }
  }

  @Test
  void masksTheWholeIbanGroupedOrNotInAnyCase() {
    for (String iban : EXAMPLES) {
      assertOne("refund to " + iban + " please", PiiType.IBAN, iban);
      String compact = iban.replace(" ", "");
      assertOne("IBAN: " + compact + ".", PiiType.IBAN, compact);
    }
    assertOne("iban gb82west12345698765432 sorry", PiiType.IBAN, "gb82west12345698765432");
    assertOne("DE89-3704-0044-0532-0130-00 is mine", PiiType.IBAN, "DE89-3704-0044-0532-0130-00");
  }

  @Test
  void doesNotCallAnIbanWhatFailsItsCountrysLengthOrTheCheck() {
    // a changed check digit; a German IBAN one digit short; a country without IBANs (their digit
    // groups may still be masked as what they look like, a phone number)
    for (String s :
        List.of(
            "refund to GB83 WEST 1234 5698 7654 32 please",
            "code DE89 3704 0044 0532 0130 0 was wrong",
            "ZZ12 ABCD 1234 5678 90 is a voucher")) {
      assertTrue(
          PiiMaskerTest.mask(s).masks().stream().noneMatch(m -> m.type() == PiiType.IBAN), s);
    }
    assertUntouched("the DE12 model and the UK34 one");
  }
}
