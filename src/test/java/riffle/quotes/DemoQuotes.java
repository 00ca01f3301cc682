package riffle.quotes;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import java.util.TreeSet;
import riffle.model.Analysis;
import riffle.model.Code;
import riffle.model.Direction;
import riffle.model.Progress;
import riffle.text.TextAnalyzer;
import riffle.tools.SampleResponses;
import riffle.tools.SampleResponses.GeneratedAnswer;
import riffle.tools.SampleResponses.GeneratedRespondent;
import riffle.tools.SampleResponses.GeneratedWave;
import riffle.tools.SampleResponses.Theme;

/**
 * The demo waves as quote sources: the generator's planted themes are the codes (ids 1 to 17 in
 * catalogue order) under their parent themes (ids from 101), with the generator's directions.
 */
final class DemoQuotes {
  private DemoQuotes() {}

  private static final class Pipeline {
    static final TextAnalyzer ENGLISH = TextAnalyzer.english();
  }

  static TextAnalyzer analyzer() {
    return Pipeline.ENGLISH;
  }

  static Analysis analyse(String text) {
    return Pipeline.ENGLISH.analyze(text);
  }

  /** A code with the given id, name, parent and direction. */
  static Code code(long id, String name, OptionalLong parent, Direction direction, int position) {
    return new Code(
        id,
        name,
        "",
        "",
        "",
        Optional.empty(),
        Optional.empty(),
        parent,
        direction,
        false,
        position,
        List.of(),
        false);
  }

  static final class Demo {
    static final List<Code> CODEBOOK = codebook();
    static final List<QuoteSource> ANSWERS = answers();
  }

  /** The planted themes as codes, each under its parent theme. */
  static List<Code> codebook() {
    Map<String, Long> parents = new LinkedHashMap<>();
    List<Code> codes = new ArrayList<>();
    int position = 0;
    for (int i = 0; i < SampleResponses.THEMES.size(); i++) {
      Theme t = SampleResponses.THEMES.get(i);
      Direction d = direction(t);
      Long parent = parents.get(t.parent());
      if (parent == null) {
        parent = 101L + parents.size();
        parents.put(t.parent(), parent);
        codes.add(code(parent, t.parent(), OptionalLong.empty(), d, position++));
      }
      codes.add(code(i + 1, t.code(), OptionalLong.of(parent), d, position++));
    }
    return List.copyOf(codes);
  }

  static Direction direction(Theme t) {
    return t.direction() == SampleResponses.Direction.PRAISE
        ? Direction.PRAISE
        : Direction.FRICTION;
  }

  /** The id of a planted theme's code. */
  static long id(Theme t) {
    return SampleResponses.THEMES.indexOf(t) + 1;
  }

  /** Every demo answer (all four waves, both questions), coded with its planted themes. */
  static List<QuoteSource> answers() {
    List<String> texts = new ArrayList<>();
    List<Object[]> meta = new ArrayList<>();
    for (GeneratedWave w : SampleResponses.demoWaves()) {
      for (GeneratedRespondent r : w.respondents()) {
        for (GeneratedAnswer a : List.of(r.stopped(), r.chose())) {
          texts.add(a.text());
          meta.add(new Object[] {w.name(), r, a});
        }
      }
    }
    List<Analysis> analyses = analyzer().analyzeAll(texts, Progress.NONE);
    List<QuoteSource> out = new ArrayList<>();
    for (int i = 0; i < texts.size(); i++) {
      String wave = (String) meta.get(i)[0];
      GeneratedRespondent r = (GeneratedRespondent) meta.get(i)[1];
      GeneratedAnswer a = (GeneratedAnswer) meta.get(i)[2];
      Set<Long> codes = new TreeSet<>();
      for (String theme : a.themes()) {
        codes.add(id(SampleResponses.theme(theme)));
      }
      out.add(
          new QuoteSource(
              i + 1,
              r.id(),
              wave,
              a.question().text(),
              Map.of("device", r.device(), "customer", r.customer()),
              analyses.get(i),
              codes,
              Map.of()));
    }
    return List.copyOf(out);
  }
}
