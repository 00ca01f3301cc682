package riffle.text;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import opennlp.tools.chunker.ChunkerME;
import opennlp.tools.util.Span;
import org.junit.jupiter.api.Test;

/**
 * The chunker's beam of {@link Pipeline#CHUNK_BEAM} against OpenNLP's own {@code ChunkerME} (beam
 * 10) on real review sentences: the reviews genre of Universal Dependencies English EWT (dev and
 * test; CC BY-SA 4.0, https://github.com/UniversalDependencies/UD_English-EWT), kept outside the
 * repository. Point {@code -Driffle.ewt=FOLDER} at a folder holding {@code en_ewt-ud-dev.conllu}
 * and {@code en_ewt-ud-test.conllu} (default {@code /work/corpora}); the test skips when they are
 * absent.
 */
class ChunkBeamCorpusTest {
  @Test
  void aBeamOfThreeChunksRealReviewsAsTheDefaultBeamDoes() throws IOException {
    Path folder = Path.of(System.getProperty("riffle.ewt", "/work/corpora"));
    List<String> sentences = new ArrayList<>();
    for (String name : List.of("en_ewt-ud-dev.conllu", "en_ewt-ud-test.conllu")) {
      Path file = folder.resolve(name);
      assumeTrue(Files.isRegularFile(file), "the EWT corpus is absent: " + file);
      sentences.addAll(reviewSentences(Files.readAllLines(file, StandardCharsets.UTF_8)));
    }
    Models models = Models.english();
    Pipeline pipeline = new Pipeline(models);
    opennlp.tools.tokenize.TokenizerME tokenizer =
        new opennlp.tools.tokenize.TokenizerME(models.tokens());
    opennlp.tools.postag.POSTaggerME tagger =
        new opennlp.tools.postag.POSTaggerME(models.tags(), opennlp.tools.postag.POSTagFormat.PENN);
    ChunkerME stock = new ChunkerME(models.chunks());
    int tokens = 0;
    int same = 0;
    for (String sentence : sentences) {
      SentenceParse ours = pipeline.parse(sentence);
      String[] words = tokenizer.tokenize(sentence);
      String[] tags = tagger.tag(words);
      if (!java.util.Arrays.equals(tags, ours.tags())) {
        continue; // a shouted word was tagged in lower case: the chunker saw other tags
      }
      String[] theirs = labels(stock.chunkAsSpans(words, tags), words.length);
      List<Span> mine = new ArrayList<>();
      for (SentenceParse.ChunkSpan c : ours.chunks()) {
        mine.add(new Span(c.first(), c.end(), c.type()));
      }
      String[] ourLabels = labels(mine.toArray(Span[]::new), words.length);
      for (int i = 0; i < words.length; i++) {
        tokens++;
        same += theirs[i].equals(ourLabels[i]) ? 1 : 0;
      }
    }
    double agreement = same / (double) tokens;
    System.out.printf(
        java.util.Locale.ROOT,
        "chunk beam %d vs 10 on %d EWT review sentences: %.4f of %d token labels agree%n",
        Pipeline.CHUNK_BEAM,
        sentences.size(),
        agreement,
        tokens);
    assertTrue(tokens > 9_000, "the corpus was read: " + tokens + " tokens");
    assertTrue(agreement >= 0.998, "agreement " + agreement);
  }

  /** The {@code # text} of every sentence whose id names the reviews genre. */
  static List<String> reviewSentences(List<String> lines) {
    List<String> out = new ArrayList<>();
    boolean review = false;
    for (String line : lines) {
      if (line.startsWith("# sent_id = ")) {
        review = line.substring("# sent_id = ".length()).startsWith("reviews");
      } else if (review && line.startsWith("# text = ")) {
        out.add(line.substring("# text = ".length()));
      }
    }
    return out;
  }

  private static String[] labels(Span[] chunks, int n) {
    String[] out = new String[n];
    java.util.Arrays.fill(out, "O");
    for (Span c : chunks) {
      for (int i = c.getStart(); i < c.getEnd(); i++) {
        out[i] = (i == c.getStart() ? "B-" : "I-") + c.getType();
      }
    }
    return out;
  }
}
