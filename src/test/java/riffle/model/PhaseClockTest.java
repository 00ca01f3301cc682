package riffle.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * A long phase's pace and time left: units over the time since the phase began, nothing before it
 * has run long enough to tell, and a new phase starts its own count.
 */
class PhaseClockTest {
  private static final long SECOND = 1_000_000_000L;

  @Test
  void paceAndTimeLeftFollowTheUnitsDoneSinceThePhaseBegan() {
    PhaseClock clock = new PhaseClock();
    assertEquals(Optional.empty(), clock.update("analysing", 0, 1_000, 10 * SECOND));
    // Too early to tell: a second in.
    assertEquals(Optional.empty(), clock.update("analysing", 150, 1_000, 11 * SECOND));
    PhaseClock.Estimate e = clock.update("analysing", 400, 1_000, 12 * SECOND).orElseThrow();
    assertEquals(200.0, e.perSecond(), 1e-9);
    assertEquals(3, e.secondsLeft());
    assertEquals("200/s, about 3 s left", e.words());
  }

  @Test
  void aNewPhaseCountsFromItsOwnStart() {
    PhaseClock clock = new PhaseClock();
    clock.update("analysing", 0, 100, 0);
    clock.update("analysing", 90, 100, 9 * SECOND);
    assertEquals(Optional.empty(), clock.update("storing", 10, 100, 10 * SECOND));
    PhaseClock.Estimate e = clock.update("storing", 50, 100, 12 * SECOND).orElseThrow();
    assertEquals(25.0, e.perSecond(), 1e-9);
    assertEquals(2, e.secondsLeft());
  }

  @Test
  void noEstimateWithoutATotalOrOnceDone() {
    PhaseClock clock = new PhaseClock();
    clock.update("reading", 0, -1, 0);
    assertEquals(Optional.empty(), clock.update("reading", 10, -1, 5 * SECOND));
    clock.update("storing", 0, 10, 0);
    assertEquals(Optional.empty(), clock.update("storing", 10, 10, 5 * SECOND));
  }

  @Test
  void longTimesReadInMinutesAndHours() {
    assertEquals("59 s", PhaseClock.duration(59));
    assertEquals("3 min 5 s", PhaseClock.duration(185));
    assertEquals("1 h 2 min", PhaseClock.duration(3_725));
  }
}
