package riffle.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import riffle.model.Analysis;
import riffle.model.Sentence;

/** The cache form gives back exactly the sentences it was given, and refuses what does not fit. */
class AnalysisCodecTest {
  private static final TextAnalyzer ANALYZER = TextAnalyzer.english();

  private static Analysis analyse(String text) {
    return ANALYZER.analyze(text);
  }

  @Test
  void sentencesSurviveTheRoundTripIncludingNonAsciiWordsAndNegation() {
    for (String text :
        List.of(
            "The café crème was NOT great. I wasn't sure it would fit — naïve me!",
            "delivery date??",
            "Prix élevé, ça coûte trop 😅 but the warranty helped",
            "")) {
      Analysis a = analyse(text);
      byte[] bytes = AnalysisCodec.encode(a.sentences());
      assertEquals(Optional.of(a.sentences()), AnalysisCodec.decode(a.masked(), bytes), text);
    }
  }

  @Test
  void oneDecoderSharesEqualTagsAndStemsBetweenEntries() {
    Analysis a = analyse("The delivery date was unclear.");
    Analysis b = analyse("No delivery date shown.");
    AnalysisCodec.Decoder decoder = AnalysisCodec.decoder();
    List<Sentence> first =
        decoder.decode(a.masked(), AnalysisCodec.encode(a.sentences())).orElseThrow();
    List<Sentence> second =
        decoder.decode(b.masked(), AnalysisCodec.encode(b.sentences())).orElseThrow();
    assertEquals(a.sentences(), first);
    assertEquals(b.sentences(), second);
    assertSame(first.get(0).tokens().get(1).stem(), second.get(0).tokens().get(1).stem());
  }

  @Test
  void entriesThatDoNotFitTheTextAreRefused() {
    Analysis a = analyse("The delivery date was unclear, so I waited.");
    byte[] bytes = AnalysisCodec.encode(a.sentences());
    String masked = a.masked();
    assertTrue(AnalysisCodec.decode(masked.substring(0, 10), bytes).isEmpty(), "shorter text");
    for (int cut = 0; cut < bytes.length; cut++) {
      assertTrue(
          AnalysisCodec.decode(masked, Arrays.copyOf(bytes, cut)).isEmpty(), "cut at " + cut);
    }
    assertTrue(
        AnalysisCodec.decode(masked, Arrays.copyOf(bytes, bytes.length + 1)).isEmpty(),
        "trailing byte");
    byte[] otherFormat = bytes.clone();
    otherFormat[0] = 9;
    assertTrue(AnalysisCodec.decode(masked, otherFormat).isEmpty(), "unknown format");
  }
}
