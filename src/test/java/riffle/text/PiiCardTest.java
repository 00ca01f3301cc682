package riffle.text;

import static riffle.text.PiiMaskerTest.assertAll;
import static riffle.text.PiiMaskerTest.assertOne;
import static riffle.text.PiiMaskerTest.assertUntouched;

import org.junit.jupiter.api.Test;
import riffle.model.PiiType;

/**
 * Payment-card numbers. All numbers here are published test card numbers that payment providers
 * document for testing (common practice), or variants of them that fail the Luhn check.
 */
class PiiCardTest {
  @Test
  void masksCardNumbersGroupedBySpacesOrHyphensOrUndivided() {
    assertOne("card 4111 1111 1111 1111 declined", PiiType.CARD, "4111 1111 1111 1111");
    assertOne("card 4111-1111-1111-1111.", PiiType.CARD, "4111-1111-1111-1111");
    assertOne("4111111111111111", PiiType.CARD, "4111111111111111");
    assertOne("Mastercard 5555 5555 5555 4444", PiiType.CARD, "5555 5555 5555 4444");
    assertOne("amex 3782 822463 10005, charged twice", PiiType.CARD, "3782 822463 10005");
    assertOne("old visa 4222222222222", PiiType.CARD, "4222222222222");
  }

  @Test
  void masksTheExpiryAndSecurityCodeWrittenRightAfterTheCard() {
    assertOne("4111 1111 1111 1111 123 was my card", PiiType.CARD, "4111 1111 1111 1111 123");
    assertOne(
        "card 4111 1111 1111 1111 exp 12/28 cvv 123 charged twice",
        PiiType.CARD,
        "4111 1111 1111 1111 exp 12/28 cvv 123");
    assertOne(
        "card 4012 8888 8888 1881, 09/27, 442 declined",
        PiiType.CARD,
        "4012 8888 8888 1881, 09/27, 442");
    assertOne("paid 5555 5555 5555 4444 then waited", PiiType.CARD, "5555 5555 5555 4444");
  }

  @Test
  void masksAnExpiryOrSecurityCodeAfterItsCueNearACard() {
    assertOne("my visa card valid thru 03/2027 was refused", PiiType.CARD, "03/2027");
    assertOne("credit card exp 08/26, is that why?", PiiType.CARD, "08/26");
    assertOne("the CVV 731 kept failing", PiiType.CARD, "731");
    assertOne("CVC: 0918", PiiType.CARD, "0918");
    assertOne("my card's security code 0457 was refused", PiiType.CARD, "0457");
  }

  @Test
  void leavesDatesAndCodesWithoutACardAlone() {
    assertUntouched("the beans expire 12/26 according to the bag");
    assertUntouched("the warranty is valid until 03/2028");
    assertUntouched("the security code for the parcel locker was 4821");
  }

  @Test
  void masksTwoCardsInOneAnswer() {
    assertAll(
        "first 4111 1111 1111 1111 then 5555-5555-5555-4444",
        PiiType.CARD,
        "4111 1111 1111 1111",
        "5555-5555-5555-4444");
  }

  @Test
  void leavesANumberFailingTheLuhnCheckAlone() {
    // 16 digits failing Luhn: not a card, and too long for a phone number
    assertUntouched("card 4111 1111 1111 1112 declined");
    assertUntouched("4111111111111112");
    assertUntouched("5555-5555-5555-4445");
  }

  @Test
  void leavesNumbersTooShortOrTooLongForACardAlone() {
    assertUntouched("serial 411111111111111111111111");
    // passes the Luhn check, but 11 digits are too few for a card: a phone number
    assertOne("weird 79927398713 number", PiiType.PHONE, "79927398713");
  }

  @Test
  void doesNotTakePhoneNumbersForCards() {
    // 00447700900122 passes the Luhn check, but no card number starts with 0
    assertOne("call 0044 7700 900122", PiiType.PHONE, "0044 7700 900122");
    assertUntouched("0000 0000 0000 0000");
    assertOne("+44 7700 900123", PiiType.PHONE, "+44 7700 900123");
  }

  @Test
  void doesNotTakeCardsGroupedOddlyForCards() {
    assertUntouched("4 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1");
  }
}
