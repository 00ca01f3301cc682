package riffle.phrases;

import java.util.Arrays;
import java.util.List;
import riffle.model.Analysis;
import riffle.model.Chunk;
import riffle.model.PiiMask;
import riffle.model.Sentence;
import riffle.model.Token;

/**
 * Finds the phrase candidates of one answer, sentence by sentence, and hands each occurrence to a
 * {@link Sink}. The rules (documented for users in the package overview):
 *
 * <ul>
 *   <li>A candidate lies inside one sentence, in a run of word tokens: punctuation, symbols, emoji
 *       and masking placeholders end a run, so no candidate crosses them.
 *   <li>Multi-word candidates are the n-grams of 2 to {@code maxWords} words that neither start nor
 *       end with a stopword or a negation cue, contain no cue, and follow the chunker's phrase
 *       boundaries: they open at a chunk's first word that is no stopword, or at a noun or
 *       adjective inside a noun phrase, and close at a chunk's last word that is no stopword, or at
 *       a verb's particle ("showed up"). So the chunk phrases (a noun phrase without its leading
 *       determiners and pronouns, adjective + noun, verb + object, verb + particle, a negated
 *       predicate) are candidates when short enough, and fragments such as "three or four" inside
 *       "compared three or four shops" are not.
 *   <li>Single words come from noun-phrase chunks only: a noun phrase that, without its leading
 *       determiners, pronouns, numbers and adverbs, is one noun or adjective ("the price",
 *       "Warranty?").
 *   <li>Negation: a candidate's words are either all negated or all plain. A negated candidate
 *       starts at the first content word of its negation scope (at most two stopwords into it), so
 *       "I did not know when it would arrive" gives the negated "know when it would arrive" and
 *       never the plain "arrive"; the words inside the scope give no other candidate. Its label
 *       starts at the cue, with an auxiliary written before it ("did not know …", "didn't know …",
 *       "no delivery date").
 * </ul>
 *
 * Not thread-safe; one instance per mining run.
 */
final class Candidates {
  /** Receives one occurrence of a candidate. */
  interface Sink {
    /**
     * @param node the candidate's sequence (see {@link Grams})
     * @param sentence the sentence's index in the answer
     * @param start first token of the candidate's words
     * @param end one past its last token
     * @param labelStart first token of its label (before {@code start} for a negated candidate
     *     whose cue is shown)
     */
    void accept(int node, int sentence, int start, int end, int labelStart);
  }

  private static final int NOUN_ADJ = 8;
  private static final int PARTICLE = 16;
  private static final int VERB = 32;
  private static final int NEG = 64;
  private static final int SINGLE = 128;
  private static final int MODIFIER = 256;
  private static final int OPENS = 512;
  private static final int CLOSES = 1024;

  private final PhraseWords words;
  private final Grams grams;
  private final int maxWords;
  private final boolean create;
  private int[] stem = new int[64];
  private int[] bits = new int[64];
  private int[] contentStart = new int[64];
  private int[] labelStart = new int[64];

  // Adjacent word pairs, for Dunning's test of two-word candidates (counted when creating).
  private final LongIntMap pairs = new LongIntMap(1 << 14);
  private int[] firsts = new int[1 << 12];
  private int[] seconds = new int[1 << 12];
  private long pairTotal;

  /**
   * @param create true to add unseen sequences to {@code grams} (counting); false to report only
   *     sequences already there (collecting examples of known candidates)
   */
  Candidates(PhraseWords words, Grams grams, int maxWords, boolean create) {
    this.words = words;
    this.grams = grams;
    this.maxWords = maxWords;
    this.create = create;
  }

  /** Visits every candidate occurrence of the answer; a foreign answer has none. */
  void visit(Analysis analysis, Sink sink) {
    List<Sentence> sentences = analysis.sentences();
    for (int si = 0; si < sentences.size(); si++) {
      Sentence sentence = sentences.get(si);
      int n = prepare(sentence, analysis.pii());
      if (n > 0) {
        emit(n, si, sink);
      }
    }
  }

  /** Classifies the tokens of a sentence; returns their number. */
  private int prepare(Sentence sentence, List<PiiMask> pii) {
    List<Token> tokens = sentence.tokens();
    int n = tokens.size();
    if (stem.length < n) {
      int c = Math.max(n, stem.length * 2);
      stem = new int[c];
      bits = new int[c];
      contentStart = new int[c];
      labelStart = new int[c];
    }
    for (int i = 0; i < n; i++) {
      Token t = tokens.get(i);
      int f = words.flags(t.text());
      if ((f & PhraseWords.WORD) != 0 && masked(t, pii)) {
        f = 0;
      }
      if ((f & PhraseWords.WORD) != 0) {
        int id = create ? words.stem(t.stem()) : words.knownStem(t.stem());
        stem[i] = id;
        if (id < 0) {
          f = 0;
        }
      }
      String pos = t.pos();
      if (pos.startsWith("NN") || pos.startsWith("JJ")) {
        f |= NOUN_ADJ;
      } else if (pos.equals("RP")) {
        f |= PARTICLE;
      } else if (pos.startsWith("VB")) {
        f |= VERB;
      }
      if (pos.equals("DT")
          || pos.equals("PDT")
          || pos.startsWith("PRP")
          || pos.equals("CD")
          || pos.startsWith("RB")
          || pos.startsWith("W")) {
        f |= MODIFIER;
      }
      if (t.negated()) {
        f |= NEG;
      }
      bits[i] = f;
      contentStart[i] = -1;
    }
    markNegationRuns(tokens, n);
    markChunks(sentence, tokens, n);
    if (create) {
      countPairs(n);
    }
    return n;
  }

  private static boolean masked(Token t, List<PiiMask> pii) {
    for (PiiMask m : pii) {
      if (t.start() < m.maskedEnd() && m.maskedStart() < t.end()) {
        return true;
      }
    }
    return false;
  }

  /**
   * For each run of negated tokens, marks its content start (first non-stopword word, at most two
   * stopwords in) and where its label starts.
   */
  private void markNegationRuns(List<Token> tokens, int n) {
    int i = 0;
    while (i < n) {
      if ((bits[i] & NEG) == 0) {
        i++;
        continue;
      }
      int runStart = i;
      while (i < n && (bits[i] & NEG) != 0) {
        i++;
      }
      for (int k = runStart; k < Math.min(i, runStart + 3); k++) {
        int f = bits[k];
        if ((f & PhraseWords.WORD) == 0) {
          break;
        }
        if ((f & PhraseWords.STOP) == 0) {
          contentStart[k] = k;
          labelStart[k] = labelOfRun(tokens, runStart);
          break;
        }
      }
    }
  }

  /** The token where a negated phrase's label starts: its cue, with the auxiliary before it. */
  private int labelOfRun(List<Token> tokens, int runStart) {
    int cue = runStart - 1;
    if (cue < 0 || (bits[cue] & PhraseWords.CUE) == 0) {
      return -1;
    }
    if (cue > 0) {
      Token c = tokens.get(cue);
      Token host = tokens.get(cue - 1);
      String cueText = PhraseWords.normalise(c.text());
      String hostText = PhraseWords.normalise(host.text());
      boolean attached = host.end() == c.start() && cueText.equals("n't");
      boolean auxiliary =
          (cueText.equals("not") || cueText.equals("never") || cueText.equals("n't"))
              && (PhraseWords.AUXILIARIES.contains(hostText) || host.pos().equals("MD"));
      if (attached || auxiliary) {
        return cue - 1;
      }
    }
    return cue;
  }

  /**
   * Marks where candidates may open and close (see the class overview; a token outside every chunk
   * is a chunk of its own), and the single-word candidates: a noun or adjective that is all a noun
   * phrase holds once determiners, pronouns, numbers and adverbs are trimmed.
   */
  private void markChunks(Sentence sentence, List<Token> tokens, int n) {
    for (int i = 0; i < n; i++) {
      bits[i] |= OPENS | CLOSES;
    }
    int t = 0;
    for (Chunk chunk : sentence.chunks()) {
      while (t < n && tokens.get(t).start() < chunk.start()) {
        t++;
      }
      int from = t;
      int to = from;
      while (to < n && tokens.get(to).end() <= chunk.end()) {
        to++;
      }
      if (to == from) {
        continue;
      }
      int first = from;
      while (first < to && !content(first)) {
        first++;
      }
      int last = to - 1;
      while (last > first && !content(last)) {
        last--;
      }
      boolean nominal = chunk.type().equals("NP");
      for (int i = from; i < to; i++) {
        if (i != first && !(nominal && i > first && (bits[i] & NOUN_ADJ) != 0 && content(i))) {
          bits[i] &= ~OPENS;
        }
        if (i != last) {
          bits[i] &= ~CLOSES;
        }
      }
      if (!chunk.type().equals("NP")) {
        continue;
      }
      int head = from;
      while (head < to && ((bits[head] & MODIFIER) != 0 || !content(head))) {
        head++;
      }
      if (head == last && (bits[head] & NOUN_ADJ) != 0) {
        bits[head] |= SINGLE;
      }
    }
  }

  /** A word that is no stopword (nor cue). */
  private boolean content(int i) {
    return (bits[i] & PhraseWords.WORD) != 0 && (bits[i] & PhraseWords.STOP) == 0;
  }

  private void countPairs(int n) {
    for (int i = 0; i + 1 < n; i++) {
      if ((bits[i] & PhraseWords.WORD) != 0 && (bits[i + 1] & PhraseWords.WORD) != 0) {
        int a = stem[i];
        int b = stem[i + 1];
        int need = Math.max(a, b) + 1;
        if (need > firsts.length) {
          int c = Math.max(need, firsts.length * 2);
          firsts = Arrays.copyOf(firsts, c);
          seconds = Arrays.copyOf(seconds, c);
        }
        firsts[a]++;
        seconds[b]++;
        pairs.increment(((long) a << 32) | b);
        pairTotal++;
      }
    }
  }

  private void emit(int n, int sentence, Sink sink) {
    for (int s = 0; s < n; s++) {
      int f = bits[s];
      if ((f & PhraseWords.WORD) == 0 || (f & PhraseWords.STOP) != 0) {
        continue;
      }
      boolean negated = (f & NEG) != 0;
      if (negated ? contentStart[s] != s : (f & OPENS) == 0) {
        continue;
      }
      int label = negated ? labelStart[s] : s;
      int node = negated ? Grams.NEGATED : Grams.PLAIN;
      int limit = Math.min(n, s + maxWords);
      for (int e = s; e < limit; e++) {
        int g = bits[e];
        if ((g & PhraseWords.WORD) == 0
            || (g & PhraseWords.CUE) != 0
            || ((g & NEG) != 0) != negated) {
          break;
        }
        node = create ? grams.child(node, stem[e]) : grams.find(node, stem[e]);
        if (node < 0) {
          break;
        }
        if (e == s) {
          if ((g & SINGLE) != 0) {
            sink.accept(node, sentence, s, e + 1, label);
          }
        } else if ((g & PhraseWords.STOP) == 0
            ? (g & CLOSES) != 0
            : (g & PARTICLE) != 0 && (bits[e - 1] & VERB) != 0) {
          sink.accept(node, sentence, s, e + 1, label);
        }
      }
    }
  }

  /**
   * Dunning's 2×2 table for a two-word sequence over all adjacent word pairs counted so far: {k11,
   * k12, k21, k22} = {first then second, first then another, another then second, neither}.
   */
  long[] pairTable(int first, int second) {
    long k11 = Math.max(0, pairs.get(((long) first << 32) | second));
    long a = first < firsts.length ? firsts[first] : 0;
    long b = second < seconds.length ? seconds[second] : 0;
    return new long[] {k11, a - k11, b - k11, pairTotal - a - b + k11};
  }
}
