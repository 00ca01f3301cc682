package riffle.model;

import java.util.List;
import java.util.Objects;

/**
 * The ranked quotes of one code.
 *
 * @param codeId the code
 * @param code its name
 * @param direction praise, friction or neutral
 * @param answers how many answers (within the filters) carry it or a code below it
 * @param quotes its best quotes, best first, near-duplicates collapsed
 */
public record CodeQuotes(
    long codeId, String code, Direction direction, int answers, List<Quote> quotes) {
  /** Checks the components and copies the list. */
  public CodeQuotes {
    Objects.requireNonNull(code, "code");
    Objects.requireNonNull(direction, "direction");
    quotes = List.copyOf(quotes);
  }
}
