package riffle.text;

import static riffle.text.PiiMaskerTest.assertAll;
import static riffle.text.PiiMaskerTest.assertOne;
import static riffle.text.PiiMaskerTest.assertUntouched;

import org.junit.jupiter.api.Test;
import riffle.model.PiiType;

/** Social-media handles. */
class PiiHandleTest {
  @Test
  void masksHandles() {
    assertOne("follow @ondalune_fan!", PiiType.HANDLE, "@ondalune_fan");
    assertOne("@Priya.Shah loved it", PiiType.HANDLE, "@Priya.Shah");
    assertOne("ask (@_jonas99).", PiiType.HANDLE, "@_jonas99");
    assertOne("tag @zoë", PiiType.HANDLE, "@zoë");
  }

  @Test
  void masksSeveralHandles() {
    assertAll("@jo, @priya and @marta_b", PiiType.HANDLE, "@jo", "@priya", "@marta_b");
  }

  @Test
  void leavesAddressesAndTimesAlone() {
    assertOne("jo@example.com", PiiType.EMAIL, "jo@example.com");
    assertUntouched("see you @ 5pm, or @5pm, 2@3, @, @@, @-");
    assertUntouched("name@");
  }
}
