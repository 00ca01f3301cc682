package riffle.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class CohenKappaTest {

  @Test
  @DisplayName("SAS/STAT PROC FREQ agreement example (two dermatologists, 88 patients)")
  void sasDermatologistExample() {
    long[][] table = {{10, 4, 1, 0}, {5, 10, 12, 2}, {2, 4, 12, 5}, {0, 2, 6, 13}};
    CohenKappa.Kappa k = CohenKappa.of(table);
    assertEquals(0.3449, k.kappa(), 5e-5);
    assertEquals(0.0724, k.standardError(), 5e-5);
    assertEquals(0.2030, k.interval().lower(), 5e-5);
    assertEquals(0.4868, k.interval().upper(), 5e-5);
    assertEquals(0.511364, k.observedAgreement(), 5e-7);
    assertEquals(0.254132, k.expectedAgreement(), 5e-7);
    assertEquals(88, k.items());
    assertEquals("fair", k.band());
  }

  /** 2×2 [[20, 5], [10, 15]]: po 0.7, pe 0.5, κ 0.4 (recalled from memory; library agrees). */
  @Test
  void twoByTwoTable() {
    CohenKappa.Kappa k = CohenKappa.of(new long[][] {{20, 5}, {10, 15}});
    assertEquals(0.7, k.observedAgreement(), 1e-12);
    assertEquals(0.5, k.expectedAgreement(), 1e-12);
    assertEquals(0.4, k.kappa(), 1e-12);
    assertEquals("fair", k.band());
  }

  @Test
  @DisplayName("Landis & Koch (1977) bands")
  void landisAndKochBands() {
    assertEquals("poor", CohenKappa.band(-0.2));
    assertEquals("poor", CohenKappa.band(0));
    assertEquals("slight", CohenKappa.band(0.01));
    assertEquals("slight", CohenKappa.band(0.20));
    assertEquals("fair", CohenKappa.band(0.21));
    assertEquals("moderate", CohenKappa.band(0.6));
    assertEquals("substantial", CohenKappa.band(0.61));
    assertEquals("substantial", CohenKappa.band(0.8));
    assertEquals("almost perfect", CohenKappa.band(0.81));
    assertEquals("almost perfect", CohenKappa.band(1));
  }

  @Test
  void perfectAgreementAndBadTables() {
    CohenKappa.Kappa k = CohenKappa.of(new long[][] {{7, 0}, {0, 3}});
    assertEquals(1, k.kappa(), 1e-12);
    assertEquals(0, k.standardError(), 1e-12);
    assertThrows(
        IllegalArgumentException.class, () -> CohenKappa.of(new long[][] {{5, 0}, {0, 0}}));
    assertThrows(IllegalArgumentException.class, () -> CohenKappa.of(new long[][] {{1, 2}}));
    assertThrows(
        IllegalArgumentException.class, () -> CohenKappa.of(new long[][] {{0, 0}, {0, 0}}));
    assertThrows(IllegalArgumentException.class, () -> CohenKappa.band(Double.NaN));
  }
}
