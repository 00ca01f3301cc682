package riffle.model;

import java.util.List;

/**
 * Buyer wording for page copy: ranked quotes per code, and candidates per use (the document {@code
 * riffle quotes --json} prints).
 *
 * @param codes per code in codebook order, its ranked quotes (each with an empty slot)
 * @param quotes the candidates per use, grouped by slot in {@link QuoteSlot} order, best first
 *     within a slot; a quote can be a candidate for more than one slot
 */
public record QuoteFindings(List<CodeQuotes> codes, List<Quote> quotes) {
  /** Copies the lists. */
  public QuoteFindings {
    codes = List.copyOf(codes);
    quotes = List.copyOf(quotes);
  }

  /** The candidates for one use, best first. */
  public List<Quote> candidates(QuoteSlot slot) {
    return quotes.stream().filter(q -> q.slot().equals(java.util.Optional.of(slot))).toList();
  }
}
