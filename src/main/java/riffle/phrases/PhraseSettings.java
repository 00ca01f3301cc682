package riffle.phrases;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import riffle.model.InputException;

/**
 * How phrases are mined. Immutable; build with {@link #builder()}, which validates in {@link
 * Builder#get()}.
 *
 * <p>The fixed thresholds of the method are constants here so that their documentation sits in one
 * place; the package overview explains how they work together.
 */
public final class PhraseSettings {
  /** Default minimum support: a phrase must occur in at least this many answers. */
  public static final int DEFAULT_MIN_ANSWERS = 3;

  /** Default longest phrase, in words. */
  public static final int DEFAULT_MAX_WORDS = 5;

  /** Default number of phrases (and key phrases) reported. */
  public static final int DEFAULT_LIMIT = 50;

  /** Default number of example answers per phrase. */
  public static final int DEFAULT_EXAMPLES = 3;

  /**
   * A single word needs this many times the minimum support: single words are allowed only when
   * frequent.
   */
  public static final int SINGLE_WORD_SUPPORT = 2;

  /**
   * The C-value length weight of a single word. The paper's log2|a| is 0 for one word; a bare noun
   * or adjective that stands alone as a noun phrase gets half the weight of a two-word term, so it
   * outranks one only when it stands alone in twice as many answers.
   */
  public static final double SINGLE_WORD_WEIGHT = 0.5;

  /**
   * A two-word candidate must be a pair of words that belong together: Dunning's G² of the pair
   * against all adjacent word pairs must have p below this, with the pair more frequent than
   * chance.
   */
  public static final double PAIR_P = 0.001;

  /**
   * Two phrases are associated when they co-occur in at least {@code minAnswers} answers, more
   * often than chance, with G² p below this.
   */
  public static final double ASSOCIATION_P = 0.001;

  /**
   * The least Jaccard similarity (answers with both / answers with either) of two associated
   * phrases; two clusters merge only when every pair across them reaches it. Low, because two
   * themes that travel together are each named in many answers without the other.
   */
  public static final double JACCARD_FLOOR = 0.05;

  /** Keyness reports a phrase only when focus and reference together have this many answers. */
  public static final int KEYNESS_MIN_ANSWERS = 5;

  /** At most this many variants are listed per phrase. */
  public static final int MAX_VARIANTS = 10;

  /**
   * Phrases never reported (compared with each variant in lower case): courtesy, fillers and bare
   * generic nouns that recur in answers to any question. Bare pronoun phrases need no entry:
   * pronouns are stopwords and never start or end a phrase.
   */
  public static final Set<String> DEFAULT_STOP_PHRASES =
      Set.copyOf(
          List.of(
              "thank you",
              "thanks",
              "thanks a lot",
              "many thanks",
              "to be honest",
              "to be fair",
              "a lot",
              "lot",
              "lots",
              "a bit",
              "bit",
              "kind of",
              "sort of",
              "at all",
              "in the end",
              "the end",
              "end",
              "so far",
              "the only thing",
              "only thing",
              "main thing",
              "thing",
              "things",
              "stuff",
              "way",
              "time",
              "reason",
              "no reason",
              "particular reason",
              "no particular reason",
              "all good",
              "keep it up",
              "n/a"));

  private final int minAnswers;
  private final int maxWords;
  private final int limit;
  private final Set<String> stopPhrases;
  private final int examples;

  private PhraseSettings(Builder b) {
    this.minAnswers = b.minAnswers;
    this.maxWords = b.maxWords;
    this.limit = b.limit;
    this.stopPhrases = Set.copyOf(b.stopPhrases);
    this.examples = b.examples;
  }

  /** The defaults. */
  public static PhraseSettings defaults() {
    return builder().get();
  }

  /** A builder starting from the defaults. */
  public static Builder builder() {
    return new Builder();
  }

  /** Minimum support: a phrase must occur in at least this many answers. */
  public int minAnswers() {
    return minAnswers;
  }

  /** Longest phrase, in words. */
  public int maxWords() {
    return maxWords;
  }

  /** Most phrases (and key phrases) reported. */
  public int limit() {
    return limit;
  }

  /** Phrases never reported, in lower case. */
  public Set<String> stopPhrases() {
    return stopPhrases;
  }

  /** PhraseExample answers per phrase. */
  public int examples() {
    return examples;
  }

  /** Builds {@link PhraseSettings}; not thread-safe. */
  public static final class Builder {
    private int minAnswers = DEFAULT_MIN_ANSWERS;
    private int maxWords = DEFAULT_MAX_WORDS;
    private int limit = DEFAULT_LIMIT;
    private Set<String> stopPhrases = DEFAULT_STOP_PHRASES;
    private int examples = DEFAULT_EXAMPLES;

    private Builder() {}

    /** Minimum support in answers (at least 2: a phrase must recur). */
    public Builder minAnswers(int value) {
      this.minAnswers = value;
      return this;
    }

    /** Longest phrase in words, 1 to 8. */
    public Builder maxWords(int value) {
      this.maxWords = value;
      return this;
    }

    /** Most phrases reported, 1 to 10,000. */
    public Builder limit(int value) {
      this.limit = value;
      return this;
    }

    /**
     * Phrases never reported, replacing {@link #DEFAULT_STOP_PHRASES} (add to that set to keep it).
     * Matched against every variant, ignoring case, runs of spaces and the kind of apostrophe.
     */
    public Builder stopPhrases(Set<String> value) {
      Objects.requireNonNull(value, "stopPhrases");
      Set<String> normalised = new LinkedHashSet<>();
      for (String s : value) {
        normalised.add(Occurrences.canonical(Objects.requireNonNull(s, "stop phrase")));
      }
      this.stopPhrases = normalised;
      return this;
    }

    /** PhraseExample answers per phrase, 0 to 20. */
    public Builder examples(int value) {
      this.examples = value;
      return this;
    }

    /**
     * The settings.
     *
     * @throws IllegalArgumentException naming the option and its allowed range when a value is out
     *     of range
     */
    public PhraseSettings get() {
      if (minAnswers < 2) {
        throw new InputException(
            "minAnswers must be at least 2 (a phrase must recur), got " + minAnswers);
      }
      if (maxWords < 1 || maxWords > 8) {
        throw new InputException("maxWords must be between 1 and 8, got " + maxWords);
      }
      if (limit < 1 || limit > 10_000) {
        throw new InputException("limit must be between 1 and 10000, got " + limit);
      }
      if (examples < 0 || examples > 20) {
        throw new InputException("examples must be between 0 and 20, got " + examples);
      }
      return new PhraseSettings(this);
    }
  }
}
