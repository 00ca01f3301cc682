package riffle.quotes;

import java.util.Collections;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import riffle.model.InputException;

/**
 * How quotes are ranked and which answers they come from. Immutable; build with {@link #builder()},
 * which validates in {@link Builder#get()}.
 */
public final class QuoteSettings {
  /** Default shortest quote, in words, before the length penalty starts. */
  public static final int DEFAULT_MIN_WORDS = 6;

  /** Default longest quote, in words, before the length penalty starts. */
  public static final int DEFAULT_MAX_WORDS = 25;

  /** Default longest headline idea, in words (a headline is a short phrase). */
  public static final int DEFAULT_HEADLINE_MAX_WORDS = 10;

  /** Default number of quotes listed per code. */
  public static final int DEFAULT_PER_CODE = 5;

  /** Default number of candidates per slot (headline, sub-headline and proof ideas). */
  public static final int DEFAULT_PER_SLOT = 10;

  /** Default number of leading themes that get a benefit line or objection quotes. */
  public static final int DEFAULT_LEADING_THEMES = 5;

  /** Default number of quotes per leading friction theme among the objections. */
  public static final int DEFAULT_OBJECTION_QUOTES = 2;

  /**
   * Default Jaccard similarity of two quotes' word-stem sets at which they count as the same
   * wording. 0.6 joins "great price for the quality" with "great price for the quality of the
   * machine" (5 of 8 stems shared) but keeps "great price" apart from "great service" (1 of 3).
   * Chosen on the demo answers; not a published value.
   */
  public static final double DEFAULT_SIMILARITY = 0.6;

  private final int minWords;
  private final int maxWords;
  private final int headlineMaxWords;
  private final int perCode;
  private final int perSlot;
  private final int leadingThemes;
  private final int objectionQuotes;
  private final double similarity;
  private final Optional<String> latestWave;
  private final Set<String> waves;
  private final Map<String, String> segments;
  private final Set<Long> codes;

  private QuoteSettings(Builder b) {
    this.minWords = b.minWords;
    this.maxWords = b.maxWords;
    this.headlineMaxWords = b.headlineMaxWords;
    this.perCode = b.perCode;
    this.perSlot = b.perSlot;
    this.leadingThemes = b.leadingThemes;
    this.objectionQuotes = b.objectionQuotes;
    this.similarity = b.similarity;
    this.latestWave = b.latestWave;
    this.waves = Collections.unmodifiableSet(new TreeSet<>(b.waves));
    this.segments = Collections.unmodifiableMap(new TreeMap<>(b.segments));
    this.codes = Collections.unmodifiableSet(new TreeSet<>(b.codes));
  }

  /** The defaults: every answer, no latest wave (nothing marked new). */
  public static QuoteSettings defaults() {
    return builder().get();
  }

  /** A builder starting from the defaults. */
  public static Builder builder() {
    return new Builder();
  }

  /** Shortest quote in words before the length penalty. */
  public int minWords() {
    return minWords;
  }

  /** Longest quote in words before the length penalty. */
  public int maxWords() {
    return maxWords;
  }

  /** Longest headline idea in words. */
  public int headlineMaxWords() {
    return headlineMaxWords;
  }

  /** Quotes listed per code. */
  public int perCode() {
    return perCode;
  }

  /** Candidates per slot for headline, sub-headline and proof ideas. */
  public int perSlot() {
    return perSlot;
  }

  /** Leading themes per direction that get a benefit line or objection quotes. */
  public int leadingThemes() {
    return leadingThemes;
  }

  /** Quotes per leading friction theme among the objections. */
  public int objectionQuotes() {
    return objectionQuotes;
  }

  /** Jaccard similarity of stem sets at which two quotes are the same wording. */
  public double similarity() {
    return similarity;
  }

  /** The latest wave, whose wording is marked new when no earlier wave said it; empty for none. */
  public Optional<String> latestWave() {
    return latestWave;
  }

  /** Waves whose answers may be quoted; empty for all. */
  public Set<String> waves() {
    return waves;
  }

  /** Metadata values an answer must have to be quoted (column → value); empty for all. */
  public Map<String, String> segments() {
    return segments;
  }

  /** Codes to rank; empty for all codes that are not archived. */
  public Set<Long> codes() {
    return codes;
  }

  /** Builds {@link QuoteSettings}; not thread-safe. */
  public static final class Builder {
    private int minWords = DEFAULT_MIN_WORDS;
    private int maxWords = DEFAULT_MAX_WORDS;
    private int headlineMaxWords = DEFAULT_HEADLINE_MAX_WORDS;
    private int perCode = DEFAULT_PER_CODE;
    private int perSlot = DEFAULT_PER_SLOT;
    private int leadingThemes = DEFAULT_LEADING_THEMES;
    private int objectionQuotes = DEFAULT_OBJECTION_QUOTES;
    private double similarity = DEFAULT_SIMILARITY;
    private Optional<String> latestWave = Optional.empty();
    private Set<String> waves = Set.of();
    private Map<String, String> segments = Map.of();
    private Set<Long> codes = Set.of();

    private Builder() {}

    /** Quote length in words without penalty: {@code min} to {@code max}, 1 ≤ min ≤ max ≤ 100. */
    public Builder words(int min, int max) {
      this.minWords = min;
      this.maxWords = max;
      return this;
    }

    /** Longest headline idea in words, 2 to 30. */
    public Builder headlineMaxWords(int value) {
      this.headlineMaxWords = value;
      return this;
    }

    /** Quotes per code, 1 to 1,000. */
    public Builder perCode(int value) {
      this.perCode = value;
      return this;
    }

    /** Candidates per headline, sub-headline and proof slot, 1 to 1,000. */
    public Builder perSlot(int value) {
      this.perSlot = value;
      return this;
    }

    /** Leading themes per direction, 1 to 100. */
    public Builder leadingThemes(int value) {
      this.leadingThemes = value;
      return this;
    }

    /** Quotes per leading friction theme, 1 to 20. */
    public Builder objectionQuotes(int value) {
      this.objectionQuotes = value;
      return this;
    }

    /** Near-duplicate threshold: Jaccard similarity of stem sets, above 0 and at most 1. */
    public Builder similarity(double value) {
      this.similarity = value;
      return this;
    }

    /** The latest wave, for marking new wording. */
    public Builder latestWave(String wave) {
      this.latestWave = Optional.of(Objects.requireNonNull(wave, "wave"));
      return this;
    }

    /** Quote only answers of these waves (empty for all). */
    public Builder waves(Set<String> names) {
      this.waves = Set.copyOf(names);
      return this;
    }

    /** Quote only answers whose respondent has all these metadata values (empty for all). */
    public Builder segments(Map<String, String> values) {
      this.segments = Map.copyOf(values);
      return this;
    }

    /** Rank only these codes (empty for all). */
    public Builder codes(Set<Long> ids) {
      this.codes = Set.copyOf(ids);
      return this;
    }

    /** The settings, checked; a bad value is rejected with what is allowed. */
    public QuoteSettings get() {
      if (minWords < 1 || maxWords < minWords || maxWords > 100) {
        throw new InputException(
            "quote length must satisfy 1 <= min words <= max words <= 100, got "
                + minWords
                + " to "
                + maxWords);
      }
      range("headline max words", headlineMaxWords, 2, 30);
      range("quotes per code", perCode, 1, 1000);
      range("candidates per slot", perSlot, 1, 1000);
      range("leading themes", leadingThemes, 1, 100);
      range("quotes per objection", objectionQuotes, 1, 20);
      if (!(similarity > 0 && similarity <= 1)) {
        throw new InputException(
            "the near-duplicate similarity must be above 0 and at most 1, got " + similarity);
      }
      if (latestWave.isPresent() && latestWave.get().isBlank()) {
        throw new InputException("the latest wave needs a name");
      }
      return new QuoteSettings(this);
    }

    private static void range(String what, int value, int min, int max) {
      if (value < min || value > max) {
        throw new InputException(what + " must be " + min + " to " + max + ", got " + value);
      }
    }
  }
}
