package riffle.text;

import opennlp.tools.chunker.ChunkerME;
import opennlp.tools.postag.POSTagFormat;
import opennlp.tools.postag.POSTaggerME;
import opennlp.tools.tokenize.TokenizerME;
import opennlp.tools.util.Span;

/**
 * Asks OpenNLP's English tagger and chunker whether capitalised words after a name cue are a name.
 * A word the tagger's own dictionary knows as a common English word in lower case ("delivery",
 * "highly", "cheap") is a name only when the tagger reads it as a proper noun (NNP, NNPS) in the
 * sentence and its dictionary knows the capitalised form as one too ("Will", "Price"); a word the
 * dictionary knows only capitalised needs the proper-noun tag in the sentence; a word it does not
 * know at all (most given names and surnames: "Niamh", "Halvorsen") is a name unless the sentence
 * tags it a number. Then the noun phrase the words stand in must not make them a product, brand or
 * place ("the Velle", "Velle Duo 2", "Ondalune team"). Only the sentence around the words is
 * parsed, and only for answers with a candidate. Each thread has its own tools over the shared
 * models (see {@link Models}); thread-safe.
 */
final class PiiNameCheck {
  /** Characters of context parsed before and after the candidate. */
  private static final int BEFORE = 60;

  private static final int AFTER = 40;

  /** Parsed stretches kept, by their text, before the cache is cleared and refilled. */
  static final int CACHE_LIMIT = 20_000;

  /** Parses of stretches of text (offsets relative to the stretch); survey answers repeat. */
  private static final java.util.concurrent.ConcurrentHashMap<String, Parse> CACHE =
      new java.util.concurrent.ConcurrentHashMap<>();

  private static final ThreadLocal<Tools> TOOLS = ThreadLocal.withInitial(Tools::new);

  /** The tagger's dictionary of words seen in its training text and their tags (read-only). */
  private static final class Dictionary {
    static final opennlp.tools.postag.TagDictionary WORDS =
        Models.english().tags().getFactory().getTagDictionary();
  }

  private PiiNameCheck() {}

  /** One thread's tokenizer, tagger and chunker. */
  private static final class Tools {
    final TokenizerME tokenizer;
    final POSTaggerME tagger;
    final ChunkerME chunker;

    Tools() {
      Models m = Models.english();
      tokenizer = new TokenizerME(m.tokens());
      // The chunker was trained on Penn Treebank tags: the tagger must not convert to UD.
      tagger = new POSTaggerME(m.tags(), POSTagFormat.PENN);
      chunker = new ChunkerME(m.chunks());
    }
  }

  /** The parse of a stretch of text: token offsets into the whole text, tags, chunk per token. */
  record Parse(
      String text, int[] starts, int[] ends, String[] tags, int[] chunkOf, String[] chunkTypes) {
    int tokenAt(int offset) {
      for (int i = 0; i < starts.length; i++) {
        if (starts[i] <= offset && offset < ends[i]) {
          return i;
        }
      }
      return -1;
    }
  }

  /**
   * Parses the sentence around {@code [start, end)} of {@code text}, from {@code context} at the
   * latest.
   */
  static Parse parse(String text, int context, int start, int end) {
    int from = Math.min(context, start);
    while (from > 0 && start - from < BEFORE && !sentenceBreak(text.charAt(from - 1))) {
      from--;
    }
    int to = end;
    while (to < text.length() && to - end < AFTER && !sentenceBreak(text.charAt(to))) {
      to++;
    }
    if (to < text.length() && ".!?".indexOf(text.charAt(to)) >= 0) {
      to++;
    }
    String window = text.substring(from, to);
    Parse relative = CACHE.get(window);
    if (relative == null) {
      relative = parseWindow(window);
      if (CACHE.size() >= CACHE_LIMIT) {
        CACHE.clear();
      }
      CACHE.put(window, relative);
    }
    int k = relative.starts().length;
    int[] starts = new int[k];
    int[] ends = new int[k];
    for (int i = 0; i < k; i++) {
      starts[i] = from + relative.starts()[i];
      ends[i] = from + relative.ends()[i];
    }
    return new Parse(
        text, starts, ends, relative.tags(), relative.chunkOf(), relative.chunkTypes());
  }

  private static Parse parseWindow(String window) {
    Tools t = TOOLS.get();
    Span[] spans = Pipeline.keepSurrogatePairs(t.tokenizer.tokenizePos(window), window);
    String[] tokens = Span.spansToStrings(spans, window);
    String[] tags = t.tagger.tag(tokens);
    Span[] chunks = tokens.length == 0 ? new Span[0] : t.chunker.chunkAsSpans(tokens, tags);
    int[] starts = new int[tokens.length];
    int[] ends = new int[tokens.length];
    int[] chunkOf = new int[tokens.length];
    java.util.Arrays.fill(chunkOf, -1);
    String[] types = new String[chunks.length];
    for (int c = 0; c < chunks.length; c++) {
      types[c] = chunks[c].getType();
      for (int i = chunks[c].getStart(); i < chunks[c].getEnd(); i++) {
        chunkOf[i] = c;
      }
    }
    for (int i = 0; i < tokens.length; i++) {
      starts[i] = spans[i].getStart();
      ends[i] = spans[i].getEnd();
    }
    return new Parse(window, starts, ends, tags, chunkOf, types);
  }

  private static boolean sentenceBreak(char c) {
    return c == '.' || c == '!' || c == '?' || c == '\n' || c == '\r';
  }

  /**
   * How many of the candidate words (from the first; {@code starts[k], ends[k]}) read as a name, or
   * 0 when the first does not or the phrase shows a product, brand or place. A particle ("van",
   * "de") counts only before a confirmed word. With {@code parse} false (an answer that already had
   * its share of parses) only the dictionary decides, as if the sentence tagged every word a proper
   * noun.
   */
  static int confirm(
      String text,
      int context,
      int[] starts,
      int[] ends,
      boolean[] particle,
      int count,
      boolean parse) {
    Parse p = parse ? parse(text, context, starts[0], ends[count - 1]) : null;
    int confirmed = 0;
    for (int k = 0; k < count; k++) {
      if (particle[k]) {
        continue;
      }
      if (!nameWord(text, p, starts[k], ends[k])) {
        break;
      }
      confirmed = k + 1;
    }
    if (confirmed == 0 || p == null) {
      return confirmed;
    }
    int first = p.tokenAt(starts[0]);
    int last = p.tokenAt(ends[confirmed - 1] - 1);
    if (first < 0 || last < 0 || productPhrase(p, first, last)) {
      return 0;
    }
    return confirmed;
  }

  /** Whether the word at {@code [s, e)} reads as part of a name (rules in the class comment). */
  private static boolean nameWord(String text, Parse p, int s, int e) {
    String word = text.substring(s, e);
    String[] asWritten = Dictionary.WORDS == null ? null : Dictionary.WORDS.getTags(word);
    String[] lower =
        Dictionary.WORDS == null
            ? null
            : Dictionary.WORDS.getTags(word.toLowerCase(java.util.Locale.ROOT));
    boolean tagged = p == null;
    boolean proper = true;
    boolean number = false;
    for (int i = 0; p != null && i < p.starts().length; i++) {
      if (p.ends()[i] <= s || p.starts()[i] >= e) {
        continue;
      }
      if (!Character.isLetter(p.text().codePointAt(p.starts()[i]))) {
        continue;
      }
      tagged = true;
      proper &= p.tags()[i].startsWith("NNP");
      number |= p.tags()[i].equals("CD");
    }
    if (!tagged || number) {
      return false;
    }
    if (lower != null && !hasProper(lower)) {
      return proper && asWritten != null && hasProper(asWritten); // "Will", not "Delivery"
    }
    if (asWritten != null) {
      return proper; // "Paris": a name only where the sentence reads it as one
    }
    return true; // a word the tagger never saw: "Niamh", "Halvorsen"
  }

  /**
   * Whether the tagger's dictionary knows {@code word} as an ordinary English word: its lower-case
   * form has tags and none is a proper noun, nor is its capitalised form ("Highly", "Hours"; not
   * "Paris", "Will").
   */
  static boolean isCommonWord(String word) {
    if (Dictionary.WORDS == null) {
      return false;
    }
    String[] lower = Dictionary.WORDS.getTags(word.toLowerCase(java.util.Locale.ROOT));
    if (lower == null || hasProper(lower)) {
      return false;
    }
    String[] asWritten = Dictionary.WORDS.getTags(word);
    return asWritten == null || !hasProper(asWritten);
  }

  /** Whether the dictionary knows the lower-case {@code word} only as a common noun ("bikes"). */
  static boolean isNounOnly(String word) {
    String[] tags = Dictionary.WORDS == null ? null : Dictionary.WORDS.getTags(word);
    if (tags == null) {
      return false;
    }
    for (String t : tags) {
      if (!t.equals("NN") && !t.equals("NNS")) {
        return false;
      }
    }
    return true;
  }

  private static boolean hasProper(String[] tags) {
    for (String t : tags) {
      if (t.startsWith("NNP")) {
        return true;
      }
    }
    return false;
  }

  /**
   * Whether tokens {@code first..last} stand in a noun phrase that makes them a product, brand or
   * place: a determiner, possessive, adjective or number before them in the phrase ("the Velle",
   * "my Ondalune"), a common noun or number after them ("Ondalune team", "Velle Duo 2"), or more
   * proper nouns than a name has (four or more).
   */
  static boolean productPhrase(Parse p, int first, int last) {
    int chunk = p.chunkOf()[first];
    int n = p.tags().length;
    if (last + 1 < n) {
      String next = p.tags()[last + 1];
      boolean sameChunk = chunk >= 0 && p.chunkOf()[last + 1] == chunk;
      if (next.equals("CD") && (sameChunk || adjacent(p, last))) {
        return true; // "Velle 2", "Velle Duo 2"
      }
    }
    if (chunk < 0 || !"NP".equals(p.chunkTypes()[chunk])) {
      return false;
    }
    int proper = 0;
    // the phrase around the name, cut at punctuation: "Marta , 5 Linden" is two phrases
    int from = first;
    while (from > 0 && p.chunkOf()[from - 1] == chunk && !punctuation(p.tags()[from - 1])) {
      from--;
    }
    int to = last;
    while (to + 1 < n && p.chunkOf()[to + 1] == chunk && !punctuation(p.tags()[to + 1])) {
      to++;
    }
    for (int i = from; i <= to; i++) {
      String tag = p.tags()[i];
      if (tag.startsWith("NNP")) {
        proper++;
      }
      if (i < first
          && (tag.equals("DT")
              || tag.equals("PRP$")
              || tag.startsWith("JJ")
              || tag.equals("CD")
              || tag.equals("POS"))) {
        return true;
      }
      if (i > last && (tag.equals("NN") || tag.equals("NNS") || tag.equals("CD"))) {
        return true;
      }
    }
    return proper > 3;
  }

  private static boolean punctuation(String tag) {
    return tag.equals(",")
        || tag.equals(".")
        || tag.equals(":")
        || tag.equals("-LRB-")
        || tag.equals("-RRB-")
        || tag.equals("``")
        || tag.equals("''");
  }

  private static boolean adjacent(Parse p, int last) {
    return p.starts()[last + 1] - p.ends()[last] <= 1;
  }

  /**
   * Whether the word at {@code [s, e)}, seen elsewhere in the answer, is used there as a product,
   * brand or place: after a determiner or possessive ("the Velle"), after a place preposition ("in
   * Leeds"), or before a common noun or a number in its phrase ("Ondalune app", "Velle 2").
   */
  static boolean usedAsThing(String text, int s, int e, boolean parse) {
    int q = s;
    while (q > 0 && PiiChars.isInlineSpace(text.charAt(q - 1))) {
      q--;
    }
    int ws = q;
    while (ws > 0 && Character.isLetter(text.charAt(ws - 1))) {
      ws--;
    }
    if (ws < q) {
      String before = text.substring(ws, q).toLowerCase(java.util.Locale.ROOT);
      if (THING_BEFORE.contains(before)) {
        return true;
      }
    }
    if (!parse) {
      return false;
    }
    Parse p = parse(text, s, s, e);
    int first = p.tokenAt(s);
    int last = p.tokenAt(e - 1);
    return first >= 0 && last >= 0 && productPhrase(p, first, last);
  }

  private static final java.util.Set<String> THING_BEFORE =
      java.util.Set.of(
          "the",
          "a",
          "an",
          "my",
          "our",
          "your",
          "their",
          "his",
          "her",
          "this",
          "that",
          "these",
          "those",
          "in",
          "near",
          "around",
          "outside",
          "across",
          "throughout",
          "via",
          "every",
          "another",
          "any");
}
