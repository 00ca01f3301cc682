package riffle.model;

import java.time.Instant;
import java.util.Objects;

/**
 * A saved search query that codes the answers it matches.
 *
 * @param id the rule's id
 * @param codeId the code it gives
 * @param query the query, in the analysts' query language
 * @param author who saved it
 * @param at when it was saved
 */
public record Rule(long id, long codeId, String query, String author, Instant at) {
  public Rule {
    Objects.requireNonNull(query, "query");
    Objects.requireNonNull(author, "author");
    Objects.requireNonNull(at, "at");
  }
}
