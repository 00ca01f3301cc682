package riffle.text;

import static riffle.text.PiiMaskerTest.assertOne;
import static riffle.text.PiiMaskerTest.assertUntouched;

import org.junit.jupiter.api.Test;
import riffle.model.PiiType;

/**
 * IP and MAC addresses. IPv4 examples are from the documentation ranges of RFC 5737, IPv6 from RFC
 * 3849's 2001:db8::/32; MAC addresses are locally administered ones, invented.
 */
class PiiNetworkTest {
  @Test
  void masksIpv4AndIpv6Addresses() {
    assertOne("my router is at 192.0.2.44 if needed", PiiType.IP, "192.0.2.44");
    assertOne("blocked my IP 203.0.113.77.", PiiType.IP, "203.0.113.77");
    assertOne("my ip is 198.51.100.9:8080", PiiType.IP, "198.51.100.9:8080");
    assertOne(
        "IPv6 2001:db8:85a3::8a2e:370:7334 gets a 403", PiiType.IP, "2001:db8:85a3::8a2e:370:7334");
    assertOne(
        "from 2001:0db8:0000:0042:0000:8a2e:0370:7334 today",
        PiiType.IP,
        "2001:0db8:0000:0042:0000:8a2e:0370:7334");
  }

  @Test
  void masksMacAddressesInTheirThreeWritings() {
    assertOne("MAC 02:1A:3F:9C:44:E7 in the app", PiiType.MAC, "02:1A:3F:9C:44:E7");
    assertOne("module 02-5b-c1-07-ae-19 never pairs", PiiType.MAC, "02-5b-c1-07-ae-19");
    assertOne("device 021a.3f9c.44e7 twice", PiiType.MAC, "021a.3f9c.44e7");
  }

  @Test
  void leavesVersionsTimesDatesAndPricesAlone() {
    assertUntouched("Version 2.1.0.4 of the app fixed it");
    assertUntouched("firmware 3.2.1.7 out of the box");
    assertUntouched("Timer at 12:30:00 did not start");
    assertUntouched("Opening hours 09:00-17:30, Mon-Fri");
    assertUntouched("on 15.03.2026 at 10.30");
    assertUntouched("not an address: 256.1.1.1 or 1.2.3");
    assertUntouched("Reset code 00-11-22 from the manual");
  }
}
