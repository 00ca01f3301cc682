package riffle.text;

import static riffle.text.PiiMaskerTest.assertAll;
import static riffle.text.PiiMaskerTest.assertOne;
import static riffle.text.PiiMaskerTest.assertUntouched;

import org.junit.jupiter.api.Test;
import riffle.model.PiiType;

/**
 * Street addresses, PO boxes and postcodes. Postcode shapes follow the postal operators' published
 * formats as written from memory (not copied from the documents): Royal Mail's PAF (UK), USPS
 * Publication 28 (US ZIP and ZIP+4), Canada Post, Deutsche Post, La Poste, PostNL, Correos, Poste
 * Italiane and Australia Post. Streets, towns and numbers are invented.
 */
class PiiPostalTest {
  @Test
  void masksUkPostcodesOfEveryPafShape() {
    // Royal Mail PAF outward codes A9, A99, AA9, AA99, A9A, AA9A; inward 9AA (memory); the
    // examples are the ones usually printed with the format (memory)
    for (String pc :
        new String[] {"M1 1AE", "B33 8TH", "CR2 6XH", "DN55 1PT", "W1A 0AX", "EC1A 1BB"}) {
      assertOne("my postcode " + pc + " was refused", PiiType.POSTCODE, pc);
      assertOne("delivery to " + pc + " took a week", PiiType.POSTCODE, pc);
    }
    // the inward code never uses C, I, K, M, O or V (PAF, memory)
    assertUntouched("delivery to NW1 6CI took a week");
    // a size after a chip name is no postcode; nor a model number
    assertUntouched("runs fine on my M1 8GB laptop");
    assertUntouched("Model SN1 2AB is the old one");
  }

  @Test
  void masksNumericPostcodesOnlyAfterACueOrBesideATownOrState() {
    // USPS Publication 28: ZIP or ZIP+4 after the state (memory)
    assertOne("it went to Kestrel, IA 50432 first", PiiType.POSTCODE, "50432");
    assertOne("Springfield IL 62704-1234 is where", PiiType.POSTCODE, "62704-1234");
    assertOne("zip code is 75081-4410", PiiType.POSTCODE, "75081-4410");
    // Deutsche Post, La Poste, Correos, Poste Italiane: five digits before the town (memory)
    assertOne("PLZ 34127 wird nicht akzeptiert", PiiType.POSTCODE, "34127");
    assertOne("we are in 69003 Lyon", PiiType.POSTCODE, "69003");
    assertOne("nach D-70173 Stuttgart", PiiType.POSTCODE, "D-70173");
    assertOne("a 28013 Madrid", PiiType.POSTCODE, "28013");
    assertOne("spedito a 00184 Roma", PiiType.POSTCODE, "00184");
    // PostNL: four digits and two letters, never SA, SD or SS (memory)
    assertOne("the price for 3581 KT Utrecht", PiiType.POSTCODE, "3581 KT");
    assertUntouched("the price for 3581 SS Utrecht was fair");
    // Australia Post: four digits after the state (memory); Canada Post: A9A 9A9 (memory)
    assertOne("out at Wollowra NSW 2317 it took long", PiiType.POSTCODE, "2317");
    assertOne("postal code K1A 0B1 rejected", PiiType.POSTCODE, "K1A 0B1");
    assertOne("shipping to H3Z 2Y7 is slow", PiiType.POSTCODE, "H3Z 2Y7");
  }

  @Test
  void leavesPricesSizesYearsAndQuantitiesAlone() {
    assertUntouched("paid €10115 for the lot, kidding, 101.15");
    assertUntouched("over 10000 Customers can't be wrong");
    assertUntouched("sold 25000 Units last year");
    assertUntouched("IN 2024 THE PRICE WENT UP BY 10%");
    assertUntouched("SHIPPED IN 12345 DAYS LOL");
    assertUntouched("In 2025 Ondalune changed the box");
    assertUntouched("the 12000 Series grinder");
  }

  @Test
  void masksEnglishAddressesWithFlatTownRegionAndPostcode() {
    assertOne(
        "I live at 14 Larkmead Road, Oxbury OX9 4QT and delivery was late",
        PiiType.ADDRESS,
        "14 Larkmead Road, Oxbury OX9 4QT");
    assertOne(
        "send to Flat 3, 27 Wrenfield Gardens, Hollowell HL4 7DW, thanks",
        PiiType.ADDRESS,
        "Flat 3, 27 Wrenfield Gardens, Hollowell HL4 7DW");
    assertOne(
        "My new address is 1185 Cottonwick Blvd, Apt 12C, Larkport, TX 75081 now",
        PiiType.ADDRESS,
        "1185 Cottonwick Blvd, Apt 12C, Larkport, TX 75081");
    assertOne(
        "nobody came to 88 W Harrow Ln, Kestrel, IA 50432",
        PiiType.ADDRESS,
        "88 W Harrow Ln, Kestrel, IA 50432");
    assertOne("it's 221B Quillon Street.", PiiType.ADDRESS, "221B Quillon Street");
    assertOne(
        "to 17 Banksia Crescent, Wollowra NSW 2317, two weeks",
        PiiType.ADDRESS,
        "17 Banksia Crescent, Wollowra NSW 2317");
    assertOne(
        "at 220 Maplehurst Road, Elmsford, ON L4T 2K9 first",
        PiiType.ADDRESS,
        "220 Maplehurst Road, Elmsford, ON L4T 2K9");
    assertOne(
        "Home is 8 Marlowe Rd, Eastwick EW1 2QQ.",
        PiiType.ADDRESS,
        "8 Marlowe Rd, Eastwick EW1 2QQ");
  }

  @Test
  void masksStreetWordsThatAreAlsoOrdinaryWordsOnlyWithATownPostcodeOrCue() {
    assertOne(
        "left outside 31b Harebell Close, Fenwick FN3 8QP",
        PiiType.ADDRESS,
        "31b Harebell Close, Fenwick FN3 8QP");
    assertOne("We moved to 3 Kestrel Close last month", PiiType.ADDRESS, "3 Kestrel Close");
    assertUntouched("Step 3 Press Close on the lid before brewing");
    assertUntouched("took 1 Test Drive at the shop first");
    assertUntouched("my 2 TB Hard Drive died");
  }

  @Test
  void masksAnAddressWrittenInLowerCaseAfterAnAddressCue() {
    assertOne("i live at 6 orchard mews so the van", PiiType.ADDRESS, "6 orchard mews");
    assertOne("deliver to 45 elm grove please", PiiType.ADDRESS, "45 elm grove");
    assertUntouched("i waited 6 days and the road was closed");
  }

  @Test
  void masksContinentalAddressesInTheirOwnOrder() {
    assertOne(
        "Meine Adresse ist Lindenkampstraße 14, 34127 Kassel",
        PiiType.ADDRESS,
        "Lindenkampstraße 14, 34127 Kassel");
    assertOne(
        "an Hauptstr. 112, D-70173 Stuttgart bitte",
        PiiType.ADDRESS,
        "Hauptstr. 112, D-70173 Stuttgart");
    assertOne(
        "livrer au 12 rue des Glycines, 69003 Lyon svp",
        PiiType.ADDRESS,
        "12 rue des Glycines, 69003 Lyon");
    assertOne(
        "Mon adresse : 5 bis avenue Marcel Dorval, 33000 Bordeaux",
        PiiType.ADDRESS,
        "5 bis avenue Marcel Dorval, 33000 Bordeaux");
    assertOne(
        "bezorgen op Kastanjelaan 41, 3581 KT Utrecht",
        PiiType.ADDRESS,
        "Kastanjelaan 41, 3581 KT Utrecht");
    assertOne(
        "Enviadlo a Calle Almendros 23, 28013 Madrid",
        PiiType.ADDRESS,
        "Calle Almendros 23, 28013 Madrid");
    assertOne(
        "es Avenida de los Tilos 104, 46010 Valencia",
        PiiType.ADDRESS,
        "Avenida de los Tilos 104, 46010 Valencia");
    assertOne(
        "Spedire a Via Gelsomini 18, 00184 Roma grazie",
        PiiType.ADDRESS,
        "Via Gelsomini 18, 00184 Roma");
    assertOne("till Storgatan 3, Lund", PiiType.ADDRESS, "Storgatan 3, Lund");
    // a capitalised word ending like a street, then a year, is no address
    assertUntouched("Frühlingsweg 2026 was the theme of the catalogue");
  }

  @Test
  void masksPoBoxes() {
    assertOne(
        "Ship it to PO Box 4471, Tarnwick VIC 3350, I'm never home",
        PiiType.ADDRESS,
        "PO Box 4471, Tarnwick VIC 3350");
    assertOne(
        "to P.O. Box 812, Corvel, ME 04011", PiiType.ADDRESS, "P.O. Box 812, Corvel, ME 04011");
    assertOne("Postfach 10 11 22, 50667 Köln", PiiType.ADDRESS, "Postfach 10 11 22, 50667 Köln");
    assertUntouched("the box was 45 x 35 x 40 cm");
  }

  @Test
  void aStreetSeenOnceIsAnAddressAgainWithAnotherNumber() {
    assertAll(
        "it said 12 Pinecrest Street, not 21 Pinecrest Street!",
        PiiType.ADDRESS,
        "12 Pinecrest Street",
        "21 Pinecrest Street");
  }

  @Test
  void leavesStreetWordsThatModifyANounAlone() {
    assertUntouched("Bought 2 Gravel Road bikes and this machine in one month");
    assertUntouched("the High Street shop was cheaper");
    assertUntouched("Main Street cafés use the same machine");
  }
}
