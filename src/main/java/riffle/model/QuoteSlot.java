package riffle.model;

/** The uses a buyer quote can be put to on a page, in the order a copy board lists them. */
public enum QuoteSlot {
  /** A short buyer phrase naming an end benefit, from a praise theme. */
  HEADLINE,
  /** A sentence that explains the benefit, from a praise theme. */
  SUBHEADLINE,
  /** One line per leading praise theme, in the buyers' most typical wording. */
  BENEFIT,
  /** A leading friction theme in the buyers' words, for the page to answer. */
  OBJECTION,
  /** A concrete, first-person praise quote. */
  PROOF
}
