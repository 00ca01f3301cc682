package riffle.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static riffle.text.PiiMaskerTest.assertAll;
import static riffle.text.PiiMaskerTest.assertInvariants;
import static riffle.text.PiiMaskerTest.assertOne;
import static riffle.text.PiiMaskerTest.assertUntouched;
import static riffle.text.PiiMaskerTest.describe;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import riffle.model.InputException;
import riffle.model.PiiType;

/** Order, invoice and tracking references: the default patterns and an analyst's own. */
class PiiReferenceTest {
  @Test
  void masksPrefixedOrderAndInvoiceCodes() {
    assertOne("my ORD-48213 never came", PiiType.REFERENCE, "ORD-48213");
    assertOne("INV-2026-0042 was wrong", PiiType.REFERENCE, "INV-2026-0042");
    assertOne("return rma-ab12345 please", PiiType.REFERENCE, "rma-ab12345");
    assertOne("ticket TKT#55213/2", PiiType.REFERENCE, "TKT#55213/2");
    assertOne("ORDER48213", PiiType.REFERENCE, "ORDER48213");
  }

  @Test
  void masksOnlyTheCodeAfterACueWord() {
    assertOne("order #48213 was late", PiiType.REFERENCE, "48213");
    assertOne("Order number 48213.", PiiType.REFERENCE, "48213");
    assertOne("my order number is 48213", PiiType.REFERENCE, "48213");
    assertOne("order no. 48213", PiiType.REFERENCE, "48213");
    assertOne("invoice: 2026-0042", PiiType.REFERENCE, "2026-0042");
    assertOne("booking ref AB12345", PiiType.REFERENCE, "AB12345");
    assertOne("tracking JD014600006281 stuck", PiiType.REFERENCE, "JD014600006281");
    assertOne("tracking number: jd014600006281", PiiType.REFERENCE, "jd014600006281");
    assertOne("parcel # 4821-3377", PiiType.REFERENCE, "4821-3377");
    // customer and account numbers are references to the shop's records, not phone numbers
    assertOne("customer number 55501234 please", PiiType.REFERENCE, "55501234");
    assertOne("account number 41402612 was charged", PiiType.REFERENCE, "41402612");
  }

  @Test
  void masksCarrierStyleCodesWithoutACue() {
    assertOne("it said 1Z999AA10123456784 online", PiiType.REFERENCE, "1Z999AA10123456784");
    assertOne("RR123456785GB arrived", PiiType.REFERENCE, "RR123456785GB");
  }

  @Test
  void leavesOrdinaryWordsAfterCueWordsAlone() {
    assertUntouched("my order arrived in 3 days, order 2 more, tracking was fine");
    assertUntouched("in order of 1500 W; reference point; the ticket was 12 euros");
    assertUntouched("reorder 4821, ordered 2, order of 48");
    assertUntouched("Velle Duo 2, EC685M, model X200");
    assertUntouched("ABCDEFGHIJ1234567 is lower-case free but few digits? no: ABCDEFGH12");
  }

  @Test
  void masksSeveralReferences() {
    assertAll(
        "ORD-48213 and ORD-48214, invoice INV-2026-0042",
        PiiType.REFERENCE,
        "ORD-48213",
        "ORD-48214",
        "INV-2026-0042");
  }

  @Test
  void ownPatternsReplaceTheDefaults() {
    PiiMasker own = PiiMasker.withReferencePatterns(List.of("\\bOL-\\d{6}\\b"));
    String answer = "order OL-482133, not ORD-48213";
    PiiMasker.Masked m = own.mask(answer);
    assertInvariants(answer, m);
    assertEquals("order [reference], not ORD-48213", m.text());
  }

  @Test
  void anOwnPatternWithARefGroupMasksOnlyThatGroup() {
    PiiMasker own =
        PiiMasker.withReferencePatterns(List.of("(?i)kundennummer:?\\s*(?<ref>\\d{5,8})"));
    String answer = "Kundennummer: 4821339, danke";
    PiiMasker.Masked m = own.mask(answer);
    assertInvariants(answer, m);
    assertEquals("Kundennummer: [reference], danke", m.text());
  }

  @Test
  void ownPatternsWorkInAnswersWithoutDigits() {
    PiiMasker own = PiiMasker.withReferencePatterns(List.of("\\bcase [A-Z]{6}\\b"));
    assertEquals("re [reference].", own.mask("re case QWERTY.").text());
  }

  @Test
  void anEmptyListMasksNoReferencesButEverythingElse() {
    PiiMasker none = PiiMasker.withReferencePatterns(List.of());
    assertEquals("ORD-48213 and [email]", none.mask("ORD-48213 and jo@example.com").text());
  }

  @Test
  void ownPatternsMatchingNothingOrEmptyDoNoHarm() {
    PiiMasker own = PiiMasker.withReferencePatterns(List.of("x*", "(?=a)"));
    String answer = "abc 07700 900123";
    PiiMasker.Masked m = own.mask(answer);
    assertInvariants(answer, m);
    assertEquals(List.of("PHONE 4..16"), describe(m));
  }

  @Test
  void refusesAnInvalidPatternNamingItAndWhereItIsWrong() {
    InputException e =
        assertThrows(
            InputException.class,
            () -> PiiMasker.withReferencePatterns(List.of("ORD-\\d+", "INV-(\\d+")));
    assertEquals(
        "reference pattern 2 of 2, \"INV-(\\d+\", is not a valid regular expression: "
            + "Unclosed group at the end of the pattern",
        e.getMessage());
    InputException bad =
        assertThrows(
            InputException.class, () -> PiiMasker.withReferencePatterns(List.of("ORD-[0-9")));
    assertTrue(
        bad.getMessage().startsWith("reference pattern 1 of 1, \"ORD-[0-9\""), bad.getMessage());
    InputException star =
        assertThrows(InputException.class, () -> PiiMasker.withReferencePatterns(List.of("*ORD")));
    assertEquals(
        "reference pattern 1 of 1, \"*ORD\", is not a valid regular expression: "
            + "Dangling meta character '*' at character 1 ('*')",
        star.getMessage());
  }

  @Test
  void refusesAMissingOrEmptyPattern() {
    List<String> withNull = new ArrayList<>(Arrays.asList("ORD-\\d+", null));
    assertEquals(
        "reference pattern 2 of 2 is empty; give a regular expression",
        assertThrows(InputException.class, () -> PiiMasker.withReferencePatterns(withNull))
            .getMessage());
    assertThrows(InputException.class, () -> PiiMasker.withReferencePatterns(List.of("")));
    assertThrows(InputException.class, () -> PiiMasker.withReferencePatterns(null));
  }

  @Test
  void aPatternThatOverflowsTheStackOnALongAnswerFindsNothingThereInsteadOfFailing() {
    PiiMasker own = PiiMasker.withReferencePatterns(List.of("(a|b)*c"));
    String answer = "ab".repeat(200_000) + " call 07700 900123";
    PiiMasker.Masked m = own.mask(answer);
    assertInvariants(answer, m);
    assertEquals(1, m.masks().size());
    assertEquals(PiiType.PHONE, m.masks().get(0).type());
  }
}
