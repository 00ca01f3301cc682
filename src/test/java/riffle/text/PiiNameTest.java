package riffle.text;

import static riffle.text.PiiMaskerTest.assertAll;
import static riffle.text.PiiMaskerTest.assertOne;
import static riffle.text.PiiMaskerTest.assertUntouched;

import org.junit.jupiter.api.Test;
import riffle.model.PiiType;

/** Names given after cue phrases, and the ordinary words after the same phrases. */
class PiiNameTest {
  @Test
  void masksTheNameAfterMyNameIs() {
    assertOne("My name is Priya and I love it", PiiType.NAME, "Priya");
    assertOne("my name is Jonas Berg.", PiiType.NAME, "Jonas Berg");
    assertOne("my name's Marta", PiiType.NAME, "Marta");
    assertOne("MY NAME IS: Zoë O'Neill", PiiType.NAME, "Zoë O'Neill");
    assertOne("my name is Anne-Marie, hi", PiiType.NAME, "Anne-Marie");
  }

  @Test
  void masksALowerCaseNameAfterMyNameIs() {
    assertOne("my name is jonas, thanks", PiiType.NAME, "jonas");
    assertOne("my name is jonas berg", PiiType.NAME, "jonas berg");
    assertOne("my name is JONAS BERG", PiiType.NAME, "JONAS BERG");
    assertOne("my name is priya and that's it", PiiType.NAME, "priya");
  }

  @Test
  void leavesCommonWordsAfterMyNameIsAlone() {
    assertUntouched("my name is not important");
    assertUntouched("my name is on the order");
  }

  @Test
  void masksTheNameAfterThisIsOnlyWhenItEndsTheIntroduction() {
    assertOne("This is Priya.", PiiType.NAME, "Priya");
    assertOne("Hi, this is Jonas Berg from Leeds", PiiType.NAME, "Jonas Berg");
    assertOne("Great service. This is Marta here", PiiType.NAME, "Marta");
    assertOne("This is Priya 😊", PiiType.NAME, "Priya");
    assertOne("this is Priya speaking", PiiType.NAME, "Priya");
  }

  @Test
  void leavesOrdinaryWordsAfterThisIsAlone() {
    assertUntouched("this is great");
    assertUntouched("This is Amazing!");
    assertUntouched("This is Ondalune's best machine");
    assertUntouched("This is Velle Duo 2 and it works");
    assertUntouched("I think this is Priya's favourite.");
    assertUntouched("this is priya");
  }

  @Test
  void masksTheNameAfterIAmOnlyAtTheStartOfTheAnswer() {
    assertOne("I'm Priya from Leeds", PiiType.NAME, "Priya");
    assertOne("Hi, I’m Jonas. Great shop", PiiType.NAME, "Jonas");
    assertOne("Hello there! I am Marta Nowak.", PiiType.NAME, "Marta Nowak");
    assertUntouched("I'm Happy with it");
    assertUntouched("I'm Happy.");
    assertUntouched("Overall I'm Priya.");
    assertUntouched("I'm not sure");
  }

  @Test
  void masksStaffNamesAfterAskForAndThanksTo() {
    assertOne("ask for Jonas Berg in the shop", PiiType.NAME, "Jonas Berg");
    assertOne("Thanks to Marta's quick reply", PiiType.NAME, "Marta");
    assertOne("thank you to Priya!", PiiType.NAME, "Priya");
    assertOne("I spoke to Jonas on the phone", PiiType.NAME, "Jonas");
    assertOne("talked with Zoë Martin Monday", PiiType.NAME, "Zoë Martin");
    assertAll("ask for Priya, thanks to Jonas", PiiType.NAME, "Priya", "Jonas");
  }

  @Test
  void leavesOrdinaryWordsAfterAskForAndThanksToAlone() {
    assertUntouched("ask for a refund");
    assertUntouched("Ask for Help if stuck, thanks to the team");
    assertUntouched("thanks to DHL and thanks to Amazing support");
    assertUntouched("I spoke to Customer Service");
  }

  @Test
  void doesNotMaskNamesWithoutACue() {
    // by design: "X was super helpful" has no cue phrase
    assertUntouched("Marta was super helpful");
  }
}
