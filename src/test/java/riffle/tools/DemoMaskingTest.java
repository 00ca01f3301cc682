package riffle.tools;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import riffle.model.Analysis;
import riffle.model.PiiMask;
import riffle.model.PiiType;
import riffle.text.TextAnalyzer;

/** Every piece of personal data the demo generator plants is masked, with the right type. */
class DemoMaskingTest {
  static final Map<String, PiiType> PLANTED =
      Map.of(
          "email", PiiType.EMAIL,
          "phone", PiiType.PHONE,
          "order", PiiType.REFERENCE,
          "name", PiiType.NAME);

  @Test
  void everyPlantedPieceOfPersonalDataIsMasked() {
    TextAnalyzer analyzer = TextAnalyzer.english();
    List<String> missed = new ArrayList<>();
    int planted = 0;
    for (SampleResponses.GeneratedWave w : SampleResponses.demoWaves()) {
      for (SampleResponses.GeneratedRespondent r : w.respondents()) {
        for (SampleResponses.GeneratedAnswer a : List.of(r.stopped(), r.chose())) {
          if (a.pii().isEmpty()) {
            continue;
          }
          Analysis analysis = analyzer.analyze(a.text());
          List<PiiType> found = analysis.pii().stream().map(PiiMask::type).toList();
          for (String kind : a.pii()) {
            planted++;
            if (!found.contains(PLANTED.get(kind))) {
              missed.add(kind.toUpperCase(Locale.ROOT) + " in: " + a.text());
            }
          }
        }
      }
    }
    assertEquals(List.of(), missed, "of " + planted + " planted");
  }
}
