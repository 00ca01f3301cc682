package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;

class NonAnswersTest {
  @Test
  void recognisesEveryDocumentedForm() {
    assertFalse(NonAnswers.forms().isEmpty());
    for (String form : NonAnswers.forms()) {
      assertTrue(NonAnswers.isNonAnswer(form), form);
    }
  }

  @Test
  void recognisesTheFormsAnalystsMeet() {
    String[] forms = {
      "",
      " ",
      "\t\n",
      "n/a",
      "N/A",
      "NA",
      "-",
      "--",
      "none",
      "None.",
      "nothing",
      "NOTHING!",
      "no",
      "No.",
      ".",
      "nil",
      "nope",
      "no comment",
      "No comments.",
      "not applicable",
      "idk",
      "IDK",
      "?",
      "???",
      "x",
      "X",
      "...",
      "…",
      "  n/a  ",
      "(none)",
      "\"nothing\"",
      "I don’t know",
      "i dont know",
      "Nothing really",
      "nothing  else",
      "no idea!",
      "dunno",
      null
    };
    for (String f : forms) {
      assertTrue(NonAnswers.isNonAnswer(f), "expected a non-answer: [" + f + "]");
    }
  }

  @Test
  void keepsRealAnswersThatStartLikeNonAnswers() {
    String[] answers = {
      "no warranty info",
      "nothing about delivery",
      "None of the photos showed the back of the machine",
      "No PayPal",
      "x-ray of the boiler, just kidding, a photo would do",
      "NA shipping is expensive",
      "idk if the grinder fits",
      "price",
      "42",
      "Not sure the burrs were new"
    };
    for (String a : answers) {
      assertFalse(NonAnswers.isNonAnswer(a), "expected a real answer: [" + a + "]");
    }
  }

  @Test
  void theFormsLoadFromTheirFileAsTheyAreCompared() {
    List<String> forms = NonAnswers.forms();
    assertEquals(32, forms.size(), "as many forms as the list had in Java");
    assertEquals(List.of("n/a", "na", "n.a"), forms.subList(0, 3));
    assertTrue(forms.containsAll(List.of("i don't know", "no comment", "no answer")));
    for (String form : forms) {
      assertEquals(form.strip().toLowerCase(Locale.ROOT).replaceAll("\\s+", " "), form, form);
      assertFalse(form.contains("\u2019"), form);
    }
  }
}
