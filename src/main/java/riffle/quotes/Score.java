package riffle.quotes;

import riffle.model.Direction;

/**
 * The parts of a quote's score; the formulas and the reasons for their weights are in the package
 * documentation. The weights are Riffle's own choices, tuned by reading the demo answers' quotes,
 * not published values.
 */
final class Score {
  private Score() {}

  /** Bonus for first-person voice in a code's ranking. */
  static final double VOICE_WEIGHT = 0.2;

  /** Bonus per unit of concreteness in a code's ranking. */
  static final double CONCRETE_WEIGHT = 0.2;

  /** Factor for wording that agrees with the code's direction. */
  static final double AGREES = 1.25;

  /** Factor for wording that contradicts the code's direction. */
  static final double CONTRADICTS = 0.5;

  /** Weight of the number of answers sharing a wording: 1 + this × ln(count). */
  static final double POPULARITY_WEIGHT = 0.1;

  /** A headline idea has at least this many words before its length penalty. */
  static final int HEADLINE_MIN_WORDS = 3;

  /** A sub-headline idea has at least this many words. */
  static final int SUBHEADLINE_MIN_WORDS = 8;

  /** Factor for a headline idea in the first person: a headline speaks for the shop. */
  static final double HEADLINE_FIRST_PERSON = 0.85;

  /** Bonus of a sub-headline idea that explains ("because", "so", "which"). */
  static final double EXPLAINS_WEIGHT = 0.25;

  /**
   * The length factor: 1 inside [min, max] words, (n / min)² below and (max / n)² above, so a
   * three-word quote under a six-word minimum keeps a quarter of its score.
   */
  static double length(int words, int min, int max) {
    if (words < min) {
      double r = words / (double) min;
      return r * r;
    }
    if (words > max) {
      double r = max / (double) words;
      return r * r;
    }
    return 1;
  }

  /** The direction factor: agreeing wording gains, contradicting wording loses. */
  static double direction(Direction code, double polarity) {
    int sign = code == Direction.PRAISE ? 1 : code == Direction.FRICTION ? -1 : 0;
    double agreement = sign * polarity;
    if (agreement > 0) {
      return AGREES;
    }
    return agreement < 0 ? CONTRADICTS : 1;
  }

  /** Whether the wording does not contradict the direction (for candidates by use). */
  static boolean compatible(Direction code, double polarity) {
    return code == Direction.PRAISE ? polarity >= 0 : code != Direction.FRICTION || polarity <= 0;
  }

  /** The popularity factor of a wording said by {@code count} answers. */
  static double popularity(int count) {
    return 1 + POPULARITY_WEIGHT * Math.log(count);
  }

  /** Rounded for display: four decimals. */
  static double rounded(double score) {
    return Math.round(score * 10_000) / 10_000.0;
  }
}
