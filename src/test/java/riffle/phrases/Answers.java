package riffle.phrases;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import riffle.model.Analysis;
import riffle.model.Phrase;
import riffle.model.PhraseReport;
import riffle.model.Progress;
import riffle.text.TextAnalyzer;

/** Builds analysed {@link PhraseDoc}s for tests, with one shared English pipeline. */
final class Answers {
  private Answers() {}

  static final String STOPPED = "What almost stopped you from ordering?";
  static final String CHOSE = "What made you choose us?";

  private static final class Pipeline {
    static final TextAnalyzer ENGLISH = TextAnalyzer.english();
  }

  static TextAnalyzer analyzer() {
    return Pipeline.ENGLISH;
  }

  static Analysis analyse(String text) {
    return Pipeline.ENGLISH.analyze(text);
  }

  /** A list of answers under construction; ids count from 1 in the order added. */
  static final class Builder {
    private final List<String> texts = new ArrayList<>();
    private final List<String[]> meta = new ArrayList<>();

    /** Adds {@code text} as the answer of a new respondent, {@code copies} times. */
    Builder add(int copies, String wave, String question, String device, String text) {
      for (int i = 0; i < copies; i++) {
        texts.add(text);
        meta.add(new String[] {wave, question, device});
      }
      return this;
    }

    Builder add(int copies, String text) {
      return add(copies, "Wave 2", STOPPED, "mobile", text);
    }

    List<PhraseDoc> build() {
      List<Analysis> analyses = Pipeline.ENGLISH.analyzeAll(texts, Progress.NONE);
      List<PhraseDoc> docs = new ArrayList<>();
      for (int i = 0; i < texts.size(); i++) {
        String[] m = meta.get(i);
        docs.add(
            new PhraseDoc(
                i + 1, "R" + (i + 1), m[0], m[1], Map.of("device", m[2]), analyses.get(i)));
      }
      return docs;
    }
  }

  static Builder builder() {
    return new Builder();
  }

  /**
   * The fixture {@code checkout-answers.tsv} (see the README beside it): wave, question code
   * (stopped or chose), device and answer text per line.
   */
  static List<PhraseDoc> fixture() throws IOException {
    Builder b = builder();
    try (InputStream in = Answers.class.getResourceAsStream("checkout-answers.tsv")) {
      String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
      for (String line : text.split("\n")) {
        if (line.isBlank() || line.startsWith("#")) {
          continue;
        }
        String[] f = line.split("\t", 4);
        b.add(1, f[0], f[1].equals("stopped") ? STOPPED : CHOSE, f[2], f[3]);
      }
    }
    return b.build();
  }

  /** The phrase with the given label, or null. */
  static Phrase phrase(PhraseReport report, String label) {
    for (Phrase p : report.phrases()) {
      if (p.phrase().equals(label)) {
        return p;
      }
    }
    return null;
  }

  /** The phrase labels of a report, in order. */
  static List<String> labels(PhraseReport report) {
    return report.phrases().stream().map(Phrase::phrase).toList();
  }
}
