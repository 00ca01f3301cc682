package riffle.text;

import static riffle.text.PiiMaskerTest.assertAll;
import static riffle.text.PiiMaskerTest.assertOne;
import static riffle.text.PiiMaskerTest.assertUntouched;

import org.junit.jupiter.api.Test;
import riffle.model.PiiType;

/** Phone numbers, and the numbers in answers that only look like them. */
class PiiPhoneTest {
  @Test
  void masksInternationalPhoneNumbers() {
    assertOne("call me on +44 7700 900123 please", PiiType.PHONE, "+44 7700 900123");
    assertOne("US: +1 (555) 010-1234.", PiiType.PHONE, "+1 (555) 010-1234");
    assertOne("from abroad 0044 7700 900123", PiiType.PHONE, "0044 7700 900123");
    assertOne("Berlin office +49 30 1234567, ask there", PiiType.PHONE, "+49 30 1234567");
    assertOne("+447700900123", PiiType.PHONE, "+447700900123");
    assertOne("ring +44 (0)20 7946 0018 anytime", PiiType.PHONE, "+44 (0)20 7946 0018");
    assertOne("tel:+1-555-010-0142", PiiType.PHONE, "+1-555-010-0142");
  }

  @Test
  void masksNationalPhoneNumbersInEveryCommonGrouping() {
    assertOne("mobile 07700 900123", PiiType.PHONE, "07700 900123");
    assertOne("landline 020 7946 0018.", PiiType.PHONE, "020 7946 0018");
    assertOne("(555) 010-1234 is my cell", PiiType.PHONE, "(555) 010-1234");
    assertOne("it's 555-010-1234!", PiiType.PHONE, "555-010-1234");
    assertOne("it's 555.010.1234!", PiiType.PHONE, "555.010.1234");
    assertOne("or 1 555 010 1234", PiiType.PHONE, "1 555 010 1234");
    assertOne("(07700 900123)", PiiType.PHONE, "07700 900123");
    assertOne("07700900123", PiiType.PHONE, "07700900123");
    assertOne("call 5550101234 after six", PiiType.PHONE, "5550101234");
    assertOne("local 555-0123 works too", PiiType.PHONE, "555-0123");
    assertOne("020\u00a07946\u00a00018", PiiType.PHONE, "020\u00a07946\u00a00018");
  }

  @Test
  void masksPhoneNumbersTypedWithoutASpaceAroundThem() {
    assertOne("Tel.07700 900123", PiiType.PHONE, "07700 900123");
    assertOne("call 07700900123pls", PiiType.PHONE, "07700900123");
    assertOne("mob:+44 7700 900123", PiiType.PHONE, "+44 7700 900123");
    assertUntouched("v2.07700900123 and the 1920x1080 screen");
  }

  @Test
  void masksSeveralPhoneNumbersInOneAnswer() {
    assertAll(
        "07700 900123 / 020 7946 0018, or +1 555 010 0100",
        PiiType.PHONE,
        "07700 900123",
        "020 7946 0018",
        "+1 555 010 0100");
  }

  @Test
  void masksOnlyThePhoneWhenAnotherNumberComesFirst() {
    assertOne("Velle Duo 2 07700 900123", PiiType.PHONE, "07700 900123");
    assertOne("on 2026-03-15 07700 900123 rang", PiiType.PHONE, "07700 900123");
    assertOne("07700 900123 2026-03-15", PiiType.PHONE, "07700 900123");
  }

  @Test
  void masksShortUndividedNumbersOnlyAfterAPhoneCue() {
    assertOne("my number: 9460018", PiiType.PHONE, "9460018");
    assertOne("text me at 79460018", PiiType.PHONE, "79460018");
    assertUntouched("we sold 4821345 units");
  }

  @Test
  void masksPhoneNumbersWrittenInOtherScriptsDigits() {
    assertOne("call ０７７００ ９００１２３", PiiType.PHONE, "０７７００ ９００１２３");
    assertOne("اتصل ٠٧٧٠٠ ٩٠٠١٢٣", PiiType.PHONE, "٠٧٧٠٠ ٩٠٠١٢٣");
  }

  @Test
  void neverMasksMoreThanFifteenDigitsAsAPhoneNumber() {
    // ITU-T E.164: an international number has at most 15 digits
    assertOne("+123456789012345", PiiType.PHONE, "+123456789012345");
    assertUntouched("+1234567890123456");
    assertUntouched("+4477009001234567");
    assertUntouched("+44 7700 9001 2345 67");
    assertUntouched("00 1234 5678 9012 3456");
  }

  @Test
  void needsAtLeastSevenDigits() {
    assertUntouched("call 555 012? no, 55 01 23");
    assertUntouched("+44 7700");
    assertUntouched("01234 5");
    assertOne("ring 012 3456", PiiType.PHONE, "012 3456");
  }

  @Test
  void leavesPricesAlone() {
    assertUntouched("it cost €249, reduced from 249.99 and once 1,299.");
    assertUntouched("paid $1 299 000 for the whole fleet, or 1.299.000 EUR");
    assertUntouched("€ 1249999 is too much; EUR 1249999 also");
    assertUntouched("1.299,00 € and 1299,99");
  }

  @Test
  void leavesDatesAndTimesAlone() {
    assertUntouched("delivered 2026-03-15, ordered 15/03/2026, paid 15.03.2026");
    assertUntouched("15-03-26 and 2026.03.15 and 03.15.2026 and 2026 03 15");
    assertUntouched("at 10:30, or 9.30, between 09.30-12.30, or 14:30-16:00");
    assertUntouched("2026-03-15 10.30");
    assertUntouched("we have used it from 2019-2026");
  }

  @Test
  void leavesYearsQuantitiesAndModelsAlone() {
    assertUntouched("since 2026 we drink 2 kg a month; the 58 mm basket; Velle Duo 2");
    assertUntouched("between 1350-1500 W it pulls a shot, budget 1000-1500");
    assertUntouched("15% off, 100% happy, 12.5% better, 1000000%");
    assertUntouched("1 299 000 visitors, 12 345 678 shots");
    assertUntouched("1500 2000 W, 58mm, 2kg, 1920x1080, 2x");
    assertUntouched("rated 5 5 5 5 5 5 5 5");
    assertUntouched("nums 4 8 15 16 23 42");
    assertUntouched("the 1250000 reviews");
    assertUntouched("we bought in 2019 2020 2021 and 2024-2026");
  }

  @Test
  void leavesReferencesAndCardsToTheirOwnTypes() {
    assertOne("order ORD-48213 late", PiiType.REFERENCE, "ORD-48213");
    assertOne("invoice INV-2026-0042", PiiType.REFERENCE, "INV-2026-0042");
    assertOne("tracking JD014600006281", PiiType.REFERENCE, "JD014600006281");
    // 4111 1111 1111 1111 is a published test card number (common practice in payment testing)
    assertOne("card 4111 1111 1111 1111", PiiType.CARD, "4111 1111 1111 1111");
  }

  @Test
  void leavesNumbersInsideWordsAndCodesAlone() {
    assertUntouched("part AB-07700900123 and sku7700900123 and v2.07700900");
    assertUntouched("#07700900123 is our ticket, path /07700900123");
    assertUntouched("x=07700900123&y");
  }
}
