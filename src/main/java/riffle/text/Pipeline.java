package riffle.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import opennlp.tools.chunker.ChunkSample;
import opennlp.tools.chunker.ChunkerContextGenerator;
import opennlp.tools.chunker.ChunkerModel;
import opennlp.tools.ml.BeamSearch;
import opennlp.tools.ml.model.MaxentModel;
import opennlp.tools.postag.POSTagFormat;
import opennlp.tools.postag.POSTaggerME;
import opennlp.tools.sentdetect.SentenceDetectorME;
import opennlp.tools.stemmer.PorterStemmer;
import opennlp.tools.stemmer.Stemmer;
import opennlp.tools.stemmer.snowball.SnowballStemmer;
import opennlp.tools.tokenize.TokenizerME;
import opennlp.tools.util.SequenceValidator;
import opennlp.tools.util.Span;
import opennlp.tools.util.TokenTag;

/**
 * One thread's set of OpenNLP tools: sentences → tokens → Penn Treebank tags → chunks → stems →
 * negation. Not thread-safe; {@link TextAnalyzer} keeps one per thread.
 */
final class Pipeline {
  /**
   * The chunker's beam: 3 sequences kept instead of OpenNLP's default 10. The chunker took about
   * two thirds of an import's CPU; with a beam of 3 it chunks 3.4 to 3.8 times faster, and 99.89%
   * of the chunk tags of 1,089 real review sentences (Universal Dependencies English EWT, reviews
   * genre, dev and test, CC BY-SA 4.0) and 99.99% of 112,481 tags of invented answers stay as the
   * beam of 10 gives them (measured outside the repository; see DEVELOPERS.md, import speed).
   */
  static final int CHUNK_BEAM = 3;

  private final SentenceDetectorME sentences;
  private final TokenizerME tokenizer;
  private final POSTaggerME tagger;
  private final BeamSearch chunker;
  private final ChunkerContextGenerator chunkContext;
  private final SequenceValidator<TokenTag> chunkValidator;
  private final Stemmer stemmer;
  private final String language;
  private final boolean english;

  Pipeline(Models models) {
    this.sentences = new SentenceDetectorME(models.sentences());
    this.tokenizer = new TokenizerME(models.tokens());
    // The 1.5 chunker was trained on Penn Treebank tags: the tagger must not convert to UD.
    this.tagger = new POSTaggerME(models.tags(), POSTagFormat.PENN);
    ChunkerModel chunks = models.chunks();
    this.chunker = new BeamSearch(CHUNK_BEAM, (MaxentModel) chunks.getArtifact("chunker.model"));
    this.chunkContext = chunks.getFactory().getContextGenerator();
    this.chunkValidator = chunks.getFactory().getSequenceValidator();
    this.language = models.language();
    this.english = language.equals(TextAnalyzer.ANALYSIS_LANGUAGE);
    this.stemmer = stemmerFor(models.language());
  }

  /** Porter for English; Snowball for the other languages it knows; lower case only else. */
  private static Stemmer stemmerFor(String language) {
    if (language.equals(TextAnalyzer.ANALYSIS_LANGUAGE)) {
      return new PorterStemmer();
    }
    SnowballStemmer.ALGORITHM algorithm =
        switch (language) {
          case "deu" -> SnowballStemmer.ALGORITHM.GERMAN;
          case "fra" -> SnowballStemmer.ALGORITHM.FRENCH;
          case "spa" -> SnowballStemmer.ALGORITHM.SPANISH;
          case "ita" -> SnowballStemmer.ALGORITHM.ITALIAN;
          case "nld" -> SnowballStemmer.ALGORITHM.DUTCH;
          case "por" -> SnowballStemmer.ALGORITHM.PORTUGUESE;
          case "swe" -> SnowballStemmer.ALGORITHM.SWEDISH;
          case "dan" -> SnowballStemmer.ALGORITHM.DANISH;
          case "nob", "nno" -> SnowballStemmer.ALGORITHM.NORWEGIAN;
          case "fin" -> SnowballStemmer.ALGORITHM.FINNISH;
          default -> null;
        };
    return algorithm == null ? word -> word : new SnowballStemmer(algorithm);
  }

  /** The language this pipeline's models are for. */
  String language() {
    return language;
  }

  /** Sentence spans of one line of text (no line breaks inside). */
  Span[] sentences(String line) {
    return sentences.sentPosDetect(line);
  }

  /** Analyses one sentence; offsets in the result are relative to the sentence. */
  SentenceParse parse(String sentence) {
    Span[] spans = keepSurrogatePairs(tokenizer.tokenizePos(sentence), sentence);
    String[] tokens = Span.spansToStrings(spans, sentence);
    String[] tags = tagger.tag(forTagging(tokens));
    Span[] chunks = tokens.length == 0 ? new Span[0] : chunk(tokens, tags);
    // The negation cues are English; other languages get no negation marks (a known limit).
    boolean[] negated = english ? NegationScope.mark(tokens, tags) : new boolean[tokens.length];
    String[] stems = new String[tokens.length];
    int[] starts = new int[tokens.length];
    int[] ends = new int[tokens.length];
    for (int i = 0; i < tokens.length; i++) {
      stems[i] = stem(tokens[i]);
      starts[i] = spans[i].getStart();
      ends[i] = spans[i].getEnd();
    }
    List<SentenceParse.ChunkSpan> chunkSpans = new ArrayList<>(chunks.length);
    for (Span c : chunks) {
      chunkSpans.add(new SentenceParse.ChunkSpan(c.getType(), c.getStart(), c.getEnd()));
    }
    return new SentenceParse(starts, ends, tags, stems, negated, chunkSpans);
  }

  /**
   * Chunks as OpenNLP's {@code ChunkerME.chunkAsSpans} does, with the beam of {@link #CHUNK_BEAM}.
   */
  private Span[] chunk(String[] tokens, String[] tags) {
    List<String> outcomes =
        chunker
            .bestSequence(
                TokenTag.create(tokens, tags), new Object[0], chunkContext, chunkValidator)
            .getOutcomes();
    return ChunkSample.phrasesAsSpanList(tokens, tags, outcomes.toArray(String[]::new));
  }

  /**
   * The tokenizer works on UTF-16 units and may cut an emoji (a surrogate pair) in two; such halves
   * are joined back into one token, so no token holds half a character.
   */
  static Span[] keepSurrogatePairs(Span[] spans, String text) {
    List<Span> out = new ArrayList<>(spans.length);
    for (Span span : spans) {
      int start = span.getStart();
      int end = span.getEnd();
      if (!out.isEmpty()) {
        Span last = out.get(out.size() - 1);
        boolean cut =
            last.getEnd() == start
                && start > 0
                && Character.isHighSurrogate(text.charAt(start - 1))
                && Character.isLowSurrogate(text.charAt(start));
        if (cut) {
          out.set(out.size() - 1, new Span(last.getStart(), end));
          continue;
        }
      }
      if (end < text.length()
          && end > start
          && Character.isHighSurrogate(text.charAt(end - 1))
          && Character.isLowSurrogate(text.charAt(end))) {
        end++; // a token that ends inside a pair takes the pair's second half
      }
      if (start > 0
          && start < end
          && Character.isLowSurrogate(text.charAt(start))
          && Character.isHighSurrogate(text.charAt(start - 1))) {
        start--;
      }
      if (!out.isEmpty() && start < out.get(out.size() - 1).getEnd()) {
        Span last = out.remove(out.size() - 1);
        start = last.getStart();
      }
      out.add(new Span(start, end));
    }
    return out.toArray(Span[]::new);
  }

  /**
   * Buyers shout ("did NOT arrive"); the tagger reads capitals as names. Words of two or more
   * capital letters are tagged in lower case; the tokens themselves stay as written.
   */
  private static String[] forTagging(String[] tokens) {
    String[] out = tokens;
    for (int i = 0; i < tokens.length; i++) {
      String t = tokens[i];
      if (t.length() >= 2 && isShouted(t)) {
        if (out == tokens) {
          out = tokens.clone();
        }
        out[i] = t.toLowerCase(Locale.ROOT);
      }
    }
    return out;
  }

  private static boolean isShouted(String token) {
    for (int i = 0; i < token.length(); i++) {
      char c = token.charAt(i);
      if (!Character.isUpperCase(c) && c != '\'') {
        return false;
      }
    }
    return true;
  }

  /**
   * Lower-cases, then applies Porter's stemmer to words of letters; other tokens stay as they are.
   */
  private String stem(String token) {
    String lower = token.toLowerCase(Locale.ROOT);
    for (int i = 0; i < lower.length(); i++) {
      if (!Character.isLetter(lower.charAt(i))) {
        return lower;
      }
    }
    return stemmer.stem(lower).toString();
  }
}
