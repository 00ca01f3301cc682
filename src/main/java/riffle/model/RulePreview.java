package riffle.model;

import java.util.List;
import java.util.Objects;

/**
 * What a rule would do if applied now.
 *
 * @param code the code's name
 * @param query the rule's query
 * @param matches answers the query matches
 * @param wouldCode answers it would code (matches without the code and not removed by a person)
 * @param alreadyCoded matches that carry the code already
 * @param keptOff matches from which a person removed the code: the rule leaves them alone
 * @param sample some of the answers it would code, best matches first
 */
public record RulePreview(
    String code,
    String query,
    int matches,
    int wouldCode,
    int alreadyCoded,
    int keptOff,
    List<SearchHit> sample) {
  public RulePreview {
    Objects.requireNonNull(code, "code");
    Objects.requireNonNull(query, "query");
    sample = List.copyOf(sample);
  }

  /** This preview with every sample's text cut to at most {@code max} characters. */
  public RulePreview shortened(int max) {
    return new RulePreview(
        code,
        query,
        matches,
        wouldCode,
        alreadyCoded,
        keptOff,
        sample.stream().map(h -> h.shortened(max)).toList());
  }
}
