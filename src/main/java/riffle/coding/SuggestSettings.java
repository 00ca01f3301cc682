package riffle.coding;

import riffle.model.InputException;

/**
 * How the suggestion engine learns and chooses thresholds. Immutable; build with {@link
 * #builder()}, which validates in {@link Builder#get()}.
 */
public final class SuggestSettings {
  /** Default seed of the fold assignment. */
  public static final long DEFAULT_SEED = 20_260_501L;

  /** Default number of cross-validation folds. */
  public static final int DEFAULT_FOLDS = 5;

  /** Default precision a code's threshold aims for. */
  public static final double DEFAULT_TARGET_PRECISION = 0.8;

  /**
   * Default least number of human-coded answers with the code, and without it, before the code gets
   * suggestions (chosen from the learning curve on the demo pilot; see the package overview).
   */
  public static final int DEFAULT_MIN_EXAMPLES = 8;

  /** Default least number of training answers a feature must occur in to be used. */
  public static final int DEFAULT_CUTOFF = 2;

  private final long seed;
  private final int folds;
  private final double targetPrecision;
  private final int minExamples;
  private final int cutoff;

  private SuggestSettings(Builder b) {
    this.seed = b.seed;
    this.folds = b.folds;
    this.targetPrecision = b.targetPrecision;
    this.minExamples = b.minExamples;
    this.cutoff = b.cutoff;
  }

  /** Returns the default settings. */
  public static SuggestSettings defaults() {
    return builder().get();
  }

  /** Returns a builder holding the defaults. */
  public static Builder builder() {
    return new Builder();
  }

  /** Returns the seed that shuffles respondents into folds. */
  public long seed() {
    return seed;
  }

  /** Returns the number of cross-validation folds (fewer when there are fewer respondents). */
  public int folds() {
    return folds;
  }

  /** Returns the precision each code's threshold aims for. */
  public double targetPrecision() {
    return targetPrecision;
  }

  /** Returns the least number of positive, and of negative, examples a ready code has. */
  public int minExamples() {
    return minExamples;
  }

  /** Returns the least number of training answers a feature must occur in. */
  public int cutoff() {
    return cutoff;
  }

  @Override
  public String toString() {
    return "SuggestSettings[seed="
        + seed
        + ", folds="
        + folds
        + ", targetPrecision="
        + targetPrecision
        + ", minExamples="
        + minExamples
        + ", cutoff="
        + cutoff
        + "]";
  }

  /** Collects settings; {@link #get()} checks them. Not thread-safe. */
  public static final class Builder {
    private long seed = DEFAULT_SEED;
    private int folds = DEFAULT_FOLDS;
    private double targetPrecision = DEFAULT_TARGET_PRECISION;
    private int minExamples = DEFAULT_MIN_EXAMPLES;
    private int cutoff = DEFAULT_CUTOFF;

    private Builder() {}

    /** Sets the seed that shuffles respondents into folds. */
    public Builder seed(long value) {
      seed = value;
      return this;
    }

    /** Sets the number of cross-validation folds (2 to 20). */
    public Builder folds(int value) {
      folds = value;
      return this;
    }

    /** Sets the precision each threshold aims for (above 0, at most 1). */
    public Builder targetPrecision(double value) {
      targetPrecision = value;
      return this;
    }

    /**
     * Sets the least number of positive, and of negative, examples of a ready code (at least 2).
     */
    public Builder minExamples(int value) {
      minExamples = value;
      return this;
    }

    /** Sets the least number of training answers a feature must occur in (1 to 100). */
    public Builder cutoff(int value) {
      cutoff = value;
      return this;
    }

    /**
     * Checks the settings and builds them.
     *
     * @return the settings
     * @throws IllegalArgumentException naming the setting and its allowed range when a value is out
     *     of range
     */
    public SuggestSettings get() {
      if (folds < 2 || folds > 20) {
        throw new InputException("folds must be between 2 and 20, got " + folds);
      }
      if (!(targetPrecision > 0 && targetPrecision <= 1)) {
        throw new InputException(
            "targetPrecision must be above 0 and at most 1, got " + targetPrecision);
      }
      if (minExamples < 2 || minExamples > 10_000) {
        throw new InputException("minExamples must be between 2 and 10000, got " + minExamples);
      }
      if (cutoff < 1 || cutoff > 100) {
        throw new InputException("cutoff must be between 1 and 100, got " + cutoff);
      }
      return new SuggestSettings(this);
    }
  }
}
