package riffle.text;

import static riffle.text.PiiMaskerTest.assertAll;
import static riffle.text.PiiMaskerTest.assertOne;
import static riffle.text.PiiMaskerTest.assertUntouched;

import org.junit.jupiter.api.Test;
import riffle.model.PiiType;

/** E-mail addresses, written plainly or spelled out. */
class PiiEmailTest {
  @Test
  void masksPlainAddresses() {
    assertOne("write to jonas@example.com.", PiiType.EMAIL, "jonas@example.com");
    assertOne("jonas.berg@example.org", PiiType.EMAIL, "jonas.berg@example.org");
    assertOne("(jo_b-99@example.net)", PiiType.EMAIL, "jo_b-99@example.net");
  }

  @Test
  void masksPlusAddressingSubdomainsAndUpperCase() {
    assertOne("use priya+shop@example.com", PiiType.EMAIL, "priya+shop@example.com");
    assertOne("at jo@mail.eu.example.co.uk,", PiiType.EMAIL, "jo@mail.eu.example.co.uk");
    assertOne("JONAS.BERG@EXAMPLE.COM!", PiiType.EMAIL, "JONAS.BERG@EXAMPLE.COM");
  }

  @Test
  void masksAddressesWithLettersBeyondAscii() {
    assertOne("mail zoë@exämple.example", PiiType.EMAIL, "zoë@exämple.example");
    assertOne("mail zoe\u0308@example.com", PiiType.EMAIL, "zoe\u0308@example.com");
    assertOne("mail jo@example.xn--p1ai", PiiType.EMAIL, "jo@example.xn--p1ai");
  }

  @Test
  void masksSeveralAddresses() {
    assertAll(
        "jo@example.com;priya@example.org , x@example.net",
        PiiType.EMAIL,
        "jo@example.com",
        "priya@example.org",
        "x@example.net");
  }

  @Test
  void masksBracketedSpelledOutAddresses() {
    assertOne(
        "reach me: jonas [at] example [dot] com", PiiType.EMAIL, "jonas [at] example [dot] com");
    assertOne("jonas(at)example.com thanks", PiiType.EMAIL, "jonas(at)example.com");
    assertOne("jonas@example dot com", PiiType.EMAIL, "jonas@example dot com");
  }

  @Test
  void masksPlainWordAddressesAfterAnEmailCueOrWithMailboxCharacters() {
    assertOne("my email is jonas at example dot com", PiiType.EMAIL, "jonas at example dot com");
    assertOne(
        "jonas.berg at example dot co dot uk",
        PiiType.EMAIL,
        "jonas.berg at example dot co dot uk");
    assertOne("priya77 AT example DOT org", PiiType.EMAIL, "priya77 AT example DOT org");
  }

  @Test
  void leavesPlainWordsThatOnlyLookLikeASpelledAddressAlone() {
    assertUntouched("we found you at ondalune dot com and liked it");
    assertUntouched("look at this dot");
  }

  @Test
  void leavesThingsThatAreNotAddressesAlone() {
    assertUntouched("meet @ 5pm, 2 @ €5 each, @@@, a@b, jo@localhost, jo@example.c");
    assertUntouched("x@.com and x@-example.com is odd");
    assertUntouched("jo@example..com");
  }
}
