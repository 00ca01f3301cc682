package riffle.text;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static riffle.text.PiiMaskerTest.assertOne;
import static riffle.text.PiiMaskerTest.assertUntouched;

import org.junit.jupiter.api.Test;
import riffle.model.PiiType;

/**
 * National identity, tax and insurance numbers, masked as {@code [id]}; licence plates after their
 * cue as {@code [plate]}. All numbers are invented or the formats' usual examples (memory).
 */
class PiiIdTest {
  @Test
  void masksAnSsnAsAnIdNotAPhone() {
    assertOne("my SSN 123-45-6789 was asked", PiiType.ID, "123-45-6789");
    assertOne("ssn: 123456789", PiiType.ID, "123456789");
    assertOne("Social security number 987-65-4320 on it", PiiType.ID, "987-65-4320");
    // written alone, the SSN shape (area never 000, 666 or 9xx) is an id too
    assertOne("it said 219-09-9999 on the label", PiiType.ID, "219-09-9999");
  }

  @Test
  void masksIdsAfterTheirCue() {
    assertOne("national insurance number QQ 12 34 56 C?", PiiType.ID, "QQ 12 34 56 C");
    assertOne("NI number: AB123456C was requested", PiiType.ID, "AB123456C");
    assertOne("my passport number 533380006 by mistake", PiiType.ID, "533380006");
    assertOne("passport no. C01X00T47", PiiType.ID, "C01X00T47");
    assertOne("Tax ID DE 123 456 789 for the invoice", PiiType.ID, "DE 123 456 789");
    assertOne("Steuer-ID 12 345 678 901 stand da", PiiType.ID, "12 345 678 901");
    assertOne("BSN 111222333 hoeft niet", PiiType.ID, "111222333");
    assertOne("driving licence number MORGA753116SM9IJ asked", PiiType.ID, "MORGA753116SM9IJ");
  }

  @Test
  void masksIdsWhoseShapeCarriesItsOwnCheck() {
    // Spanish DNI: the letter is TRWAGMYFPDXBNJZSQVHLCKE at the number modulo 23
    assertTrue(PiiIds.dniValid(null, "12345678", 'Z'));
    assertFalse(PiiIds.dniValid(null, "12345678", 'A'));
    assertTrue(PiiIds.dniValid("X", "1234567", 'L'));
    assertOne("My DNI 12345678Z is on the invoice", PiiType.ID, "12345678Z");
    assertOne("el NIE X1234567L", PiiType.ID, "X1234567L");
    assertOne("Codice fiscale RSSMRA85T10A562S richiesto", PiiType.ID, "RSSMRA85T10A562S");
    assertOne("my number AB 12 34 56 C is on file", PiiType.ID, "AB 12 34 56 C");
  }

  @Test
  void leavesWhatOnlyLooksLikeAnIdAlone() {
    assertUntouched("the tax was 20% which is normal");
    assertUntouched("Passport photo booth next to the pickup point, handy");
    assertUntouched("code 12345678A from the box did nothing");
  }

  @Test
  void masksLicencePlatesAfterTheirCue() {
    assertOne("scratched my car, reg KX19 LMT, and drove off", PiiType.PLATE, "KX19 LMT");
    assertOne("number plate B-QZ 4821 blocked", PiiType.PLATE, "B-QZ 4821");
    assertOne("Licence plate GH-472-KP on the van", PiiType.PLATE, "GH-472-KP");
    assertOne("Kennzeichen M-RX 3107 hat geparkt", PiiType.PLATE, "M-RX 3107");
    assertOne("kenteken 72-TRN-4 reed", PiiType.PLATE, "72-TRN-4");
    assertOne("reg: ab12 cde please", PiiType.PLATE, "ab12 cde");
  }

  @Test
  void leavesCueWordsWithoutAPlateAlone() {
    assertUntouched("reg price was 399, sale price 299");
    assertUntouched("Registration of the warranty took 2 minutes");
    assertUntouched("registration 2026 model");
  }
}
