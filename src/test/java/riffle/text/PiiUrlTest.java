package riffle.text;

import static riffle.text.PiiMaskerTest.assertAll;
import static riffle.text.PiiMaskerTest.assertOne;
import static riffle.text.PiiMaskerTest.assertUntouched;

import org.junit.jupiter.api.Test;
import riffle.model.PiiType;

/** Web addresses. */
class PiiUrlTest {
  @Test
  void masksAddressesWithAScheme() {
    assertOne(
        "see https://ondalune.example/orders/48213?x=1.",
        PiiType.URL,
        "https://ondalune.example/orders/48213?x=1");
    assertOne("HTTP://EXAMPLE.COM", PiiType.URL, "HTTP://EXAMPLE.COM");
    assertOne("ftp://files.example.org/a", PiiType.URL, "ftp://files.example.org/a");
    assertOne("<https://example.com/a>", PiiType.URL, "https://example.com/a");
  }

  @Test
  void masksAddressesStartingWithWww() {
    assertOne("at www.ondalune.example, then", PiiType.URL, "www.ondalune.example");
    assertOne("WWW.Example.COM/Profile/Jonas!", PiiType.URL, "WWW.Example.COM/Profile/Jonas");
  }

  @Test
  void masksBareHostNamesWithAPath() {
    assertOne("go to ondalune.example/returns.", PiiType.URL, "ondalune.example/returns");
    assertOne("shop.example.com/u/jonas_b", PiiType.URL, "shop.example.com/u/jonas_b");
    assertOne("ondalune.example/", PiiType.URL, "ondalune.example/");
  }

  @Test
  void leavesBareHostNamesWithoutAPathAlone() {
    // by design: a bare host name names a shop or site far more often than a person
    assertUntouched("bought it from ondalune.example, great shop");
    assertUntouched("Ondalune.com is my favourite");
  }

  @Test
  void keepsSentencePunctuationAndUnopenedBracketsOutside() {
    assertOne("(see https://example.com/a)", PiiType.URL, "https://example.com/a");
    assertOne(
        "https://example.com/wiki/Espresso_(drink).",
        PiiType.URL,
        "https://example.com/wiki/Espresso_(drink)");
    assertOne("\"https://example.com/q?a=b\"", PiiType.URL, "https://example.com/q?a=b");
    assertAll(
        "https://a.example/x, https://b.example/y",
        PiiType.URL,
        "https://a.example/x",
        "https://b.example/y");
  }

  @Test
  void leavesSlashedWordsAndFractionsAlone() {
    assertUntouched("and/or, km/h, 24/7, e.g./i.e., 1.5/10, w/o, n.a./");
  }

  @Test
  void leavesASchemeWithoutAnAddressAlone() {
    assertUntouched("the https:// part was missing, and http://.");
  }
}
