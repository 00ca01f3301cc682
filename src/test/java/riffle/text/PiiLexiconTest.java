package riffle.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.junit.jupiter.api.Test;
import riffle.text.PiiLexicon.StreetKind;

class PiiLexiconTest {
  @Test
  void eachCueFamilyLoadsFromItsFile() {
    Map<String, Integer> known =
        Map.ofEntries(
            Map.entry("regards", PiiLexicon.NAME),
            Map.entry("heiße", PiiLexicon.NAME),
            Map.entry("geboren", PiiLexicon.DOB),
            Map.entry("cvv", PiiLexicon.CARD),
            Map.entry("steuernummer", PiiLexicon.ID),
            Map.entry("kenteken", PiiLexicon.PLATE),
            Map.entry("postfach", PiiLexicon.POBOX),
            Map.entry("deliver", PiiLexicon.PLACE),
            Map.entry("zip", PiiLexicon.POSTCODE),
            Map.entry("waybill", PiiLexicon.REFERENCE),
            Map.entry("dot", PiiLexicon.SPELLED),
            Map.entry("at", PiiLexicon.AT));
    for (Map.Entry<String, Integer> e : known.entrySet()) {
      assertTrue(PiiLexicon.scan("well " + e.getKey()).has(e.getValue()), e.getKey());
    }
    assertFalse(PiiLexicon.scan("well grinder").has(PiiLexicon.NAME));
  }

  @Test
  void eachStreetKindLoadsFromItsFile() {
    assertTrue(PiiLexicon.isStreet(StreetKind.AFTER, "street"));
    assertTrue(PiiLexicon.isStreet(StreetKind.WEAK, "close"));
    assertTrue(PiiLexicon.isStreet(StreetKind.BEFORE, "calle"));
    assertTrue(PiiLexicon.isStreet(StreetKind.FIRST, "rue"));
    assertTrue(PiiLexicon.isStreet(StreetKind.SUFFIX, "straße"));
    assertFalse(PiiLexicon.isStreet(StreetKind.AFTER, "calle"));
    assertTrue(PiiLexicon.scan("12 baker street").has(PiiLexicon.STREET));
  }

  @Test
  void theNameListsAndIbanLengthsLoadFromTheirFiles() {
    assertTrue(PiiLexicon.NOT_NAMES.contains("amazing"));
    assertTrue(PiiLexicon.NOT_NAMES.contains("it's"));
    assertTrue(PiiLexicon.PARTICLES.contains("van"));
    assertTrue(PiiLexicon.TITLES.contains("señora"));
    assertEquals(22, PiiLexicon.IBAN_LENGTHS.get("DE"));
    assertEquals(22, PiiLexicon.IBAN_LENGTHS.get("GB"));
  }
}
