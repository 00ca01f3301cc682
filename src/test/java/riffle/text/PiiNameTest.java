package riffle.text;

import static riffle.text.PiiMaskerTest.assertAll;
import static riffle.text.PiiMaskerTest.assertOne;
import static riffle.text.PiiMaskerTest.assertUntouched;

import org.junit.jupiter.api.Test;
import riffle.model.PiiType;

/**
 * Names given after cue phrases or as a sign-off, and the ordinary, product, brand and town words
 * after the same phrases (the tagger and chunker tell them apart; see {@link PiiNameCheck}).
 */
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

  @Test
  void masksNamesInSignOffs() {
    assertOne("Great service.\nRegards, Helena Marsh", PiiType.NAME, "Helena Marsh");
    assertOne(
        "Kind regards,\nMarguerite Delacroix-Fournier",
        PiiType.NAME,
        "Marguerite Delacroix-Fournier");
    assertOne("Signed, Tobias Renner", PiiType.NAME, "Tobias Renner");
    assertOne("Cheers mate, Dorota", PiiType.NAME, "Dorota");
    assertOne("Best,\nNiamh", PiiType.NAME, "Niamh");
    assertOne("Many thanks,\nYusuf", PiiType.NAME, "Yusuf");
    assertOne("Cheers!\nRhiannon x", PiiType.NAME, "Rhiannon");
    assertOne("Mit freundlichen Grüßen, Ulrike Brandauer", PiiType.NAME, "Ulrike Brandauer");
    assertOne("Kind regards, P. Lindqvist", PiiType.NAME, "P. Lindqvist");
    assertOne("Thanks, Agnieszka Wolanin", PiiType.NAME, "Agnieszka Wolanin");
    assertOne("Thank you Liesel for sorting it", PiiType.NAME, "Liesel");
  }

  @Test
  void masksANameAloneOnTheLastLine() {
    assertOne("Love the machine.\n— Jasper Tillman", PiiType.NAME, "Jasper Tillman");
    assertOne("The guide helped.\n\nPriyanka Raghunathan", PiiType.NAME, "Priyanka Raghunathan");
    assertOne("Sent from my phone\nKasia", PiiType.NAME, "Kasia");
    assertUntouched("Great machine.\nHighly Recommended");
    assertUntouched("Good.\nFive Stars");
    assertUntouched("Arrived on time\nWell packed\nRecommended");
    assertUntouched("Fast.\nVelle Duo 2");
  }

  @Test
  void masksNamesAfterNameColonAndWithParticlesTitlesAndApostrophes() {
    assertOne("Name: Rafael Orsini, customer since 2021", PiiType.NAME, "Rafael Orsini");
    assertOne("Full name: Desmond Achterberg", PiiType.NAME, "Desmond Achterberg");
    assertOne("name: joost kramer", PiiType.NAME, "joost kramer");
    assertOne("My name is Sanne van der Velde and", PiiType.NAME, "Sanne van der Velde");
    assertOne("signed, Beatriz da Costa", PiiType.NAME, "Beatriz da Costa");
    assertOne("My name's Ollie McTavish, I run a café", PiiType.NAME, "Ollie McTavish");
    assertOne("Hi, this is Callum O'Rourke from Oxbury.", PiiType.NAME, "Callum O'Rourke");
    assertOne("Regards, Mr Anselm Kowarik", PiiType.NAME, "Anselm Kowarik");
    assertOne("Je m'appelle Solène Garnier et", PiiType.NAME, "Solène Garnier");
    assertUntouched("Product name: Velle Duo 2");
  }

  @Test
  void masksNamesAfterCallMeItsAndCareOf() {
    assertOne("You can call me Bex if you need more", PiiType.NAME, "Bex");
    assertOne("Hi, it's Amara here, love it", PiiType.NAME, "Amara");
    assertOne("Send it c/o Marta at the office", PiiType.NAME, "Marta");
    assertUntouched("Call me Maybe played on hold");
    assertUntouched("It's Velle 2 now");
  }

  @Test
  void masksEveryPlaceTheSameNameStandsAndASecondNameAfterAnd() {
    assertAll(
        "the chat with Tomasz changed my mind. Thanks to Tomasz!",
        PiiType.NAME,
        "Tomasz",
        "Tomasz");
    assertAll("thanks to Lars and Birgit for the call", PiiType.NAME, "Lars", "Birgit");
  }

  @Test
  void leavesProductBrandAndTownWordsAlone() {
    assertUntouched("Thanks, Ondalune team!");
    assertUntouched("This is Velle Duo 2 and it works");
    assertUntouched("Thanks, Velle! The Velle grinder is the best part");
    assertUntouched("Thanks Ondalune! Found you via ondalune.example");
    assertUntouched("Cheers, Leeds!\nDelivered in Leeds fast");
    assertUntouched("I'm Canadian and shipping took ages");
    assertUntouched("Regards, Customer Support would be a better sign-off");
    assertUntouched("thanks to DHL it came in 2 days");
    assertUntouched("I spoke to Ondalune support twice");
  }
}
