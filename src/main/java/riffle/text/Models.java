package riffle.text;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import opennlp.tools.chunker.ChunkerModel;
import opennlp.tools.postag.POSModel;
import opennlp.tools.sentdetect.SentenceModel;
import opennlp.tools.tokenize.TokenizerModel;

/**
 * The four OpenNLP models of one language's pipeline. English loads from the classpath by the
 * {@code .bin} names in {@code models/manifest.tsv}; another language loads from a folder named by
 * its ISO 639-3 code holding {@code sentences.bin}, {@code tokens.bin}, {@code tags.bin} and {@code
 * chunks.bin}. Model objects are thread-safe and shared; the {@code *ME} tools built on them are
 * not.
 *
 * @param language ISO 639-3 code
 * @param sentences the sentence detector's model
 * @param tokens the tokenizer's model
 * @param tags the tagger's model (Penn Treebank tags)
 * @param chunks the chunker's model
 */
record Models(
    String language,
    SentenceModel sentences,
    TokenizerModel tokens,
    POSModel tags,
    ChunkerModel chunks) {
  static final String SENTENCES = "/en-sent.bin";
  static final String TOKENS = "/en-token.bin";
  static final String TAGS = "/en-pos-maxent.bin";
  static final String CHUNKS = "/en-chunker.bin";

  /** File names of a language folder, in the order of the components. */
  static final List<String> FILES =
      List.of("sentences.bin", "tokens.bin", "tags.bin", "chunks.bin");

  /** The English models, loaded on first use. */
  static Models english() {
    return Holder.ENGLISH;
  }

  private static final class Holder {
    static final Models ENGLISH = loadEnglish();
  }

  private static Models loadEnglish() {
    try (InputStream s = open(SENTENCES);
        InputStream t = open(TOKENS);
        InputStream p = open(TAGS);
        InputStream c = open(CHUNKS)) {
      return new Models(
          TextAnalyzer.ANALYSIS_LANGUAGE,
          new SentenceModel(s),
          new TokenizerModel(t),
          new POSModel(p),
          new ChunkerModel(c));
    } catch (IOException e) {
      throw new UncheckedIOException("an English model in this build is damaged", e);
    }
  }

  /**
   * Models for other languages found in {@code folders}: each sub-folder named by a three-letter
   * code with all four files. The first folder that has a language wins.
   *
   * @param problems receives one line per language folder that could not be used
   */
  static Map<String, Models> others(List<Path> folders, List<String> problems) {
    Map<String, Models> out = new LinkedHashMap<>();
    for (Path folder : folders) {
      if (!Files.isDirectory(folder)) {
        continue;
      }
      try (var dirs = Files.list(folder)) {
        for (Path dir : dirs.filter(Files::isDirectory).sorted().toList()) {
          String code = dir.getFileName().toString();
          if (code.matches("[a-z]{3}")
              && !code.equals(TextAnalyzer.ANALYSIS_LANGUAGE)
              && !out.containsKey(code)) {
            load(code, dir, problems).ifPresent(m -> out.put(code, m));
          }
        }
      } catch (IOException e) {
        problems.add(folder + ": cannot list the folder (" + e.getMessage() + ")");
      }
    }
    return out;
  }

  private static Optional<Models> load(String code, Path dir, List<String> problems) {
    for (String name : FILES) {
      if (!Files.isRegularFile(dir.resolve(name))) {
        problems.add(dir + ": " + name + " is missing; the folder needs " + FILES);
        return Optional.empty();
      }
    }
    try {
      return Optional.of(
          new Models(
              code,
              new SentenceModel(dir.resolve(FILES.get(0))),
              new TokenizerModel(dir.resolve(FILES.get(1))),
              new POSModel(dir.resolve(FILES.get(2))),
              new ChunkerModel(dir.resolve(FILES.get(3)))));
    } catch (IOException | RuntimeException e) {
      problems.add(dir + ": not an OpenNLP model set (" + e.getMessage() + ")");
      return Optional.empty();
    }
  }

  static InputStream open(String resource) {
    InputStream in = Models.class.getResourceAsStream(resource);
    if (in == null) {
      throw new IllegalStateException(
          "the model " + resource + " is missing from this build; rebuild with mvn package");
    }
    return in;
  }
}
