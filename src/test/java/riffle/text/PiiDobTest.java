package riffle.text;

import static riffle.text.PiiMaskerTest.assertOne;
import static riffle.text.PiiMaskerTest.assertUntouched;

import org.junit.jupiter.api.Test;
import riffle.model.PiiType;

/** Dates of birth after a birth cue, in every common way of writing a date; ages stay. */
class PiiDobTest {
  @Test
  void masksADateOfBirthInEveryCommonFormat() {
    assertOne("DOB 1979-11-03 was asked for", PiiType.DOB, "1979-11-03");
    assertOne("date of birth 07.09.1968, why?", PiiType.DOB, "07.09.1968");
    assertOne("born 22 August 1991, first machine", PiiType.DOB, "22 August 1991");
    assertOne("I was born on March 12, 1984 and", PiiType.DOB, "March 12, 1984");
    assertOne("D.O.B. 30/06/75 (the form)", PiiType.DOB, "30/06/75");
    assertOne("birthday is 3rd of May", PiiType.DOB, "3rd of May");
    assertOne("my birthday, it's 4th July", PiiType.DOB, "4th July");
    assertOne("born in November 1993, so", PiiType.DOB, "November 1993");
    assertOne("dob: 1 Jan 1960", PiiType.DOB, "1 Jan 1960");
    assertOne("Geburtsdatum 05.04.1990 musste ich", PiiType.DOB, "05.04.1990");
    assertOne("date de naissance : 12 mars 1982", PiiType.DOB, "12 mars 1982");
    assertOne("fecha de nacimiento 15 de marzo de 1985", PiiType.DOB, "15 de marzo de 1985");
  }

  @Test
  void masksADatedBirthDateALittleAfterItsCue() {
    assertOne("Why do you need my date of birth? I gave 14/02/1987 but", PiiType.DOB, "14/02/1987");
    // further on, a date with a recent year is a delivery date, not a birth date
    assertUntouched("they wanted my date of birth, ordered on 12/03/2026 anyway");
  }

  @Test
  void leavesAgesYearsAndDatesWithoutABirthCueAlone() {
    assertUntouched("I'm 34 and this is my first machine");
    assertUntouched("born in 1985, so not a student");
    assertUntouched("born to brew, as the box says");
    assertUntouched("My first-born loves the milk frother, arrived 12 March");
    assertUntouched("arrived on 15/03/1985? no, on 15/03/2026");
  }
}
