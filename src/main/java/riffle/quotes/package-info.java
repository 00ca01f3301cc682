/**
 * Buyer wording for page copy: ranked quotes per code, candidates by use (headline and sub-headline
 * ideas, benefit lines, objections to answer, proof quotes), and the copy board's exports.
 *
 * <p>Front doors: {@link riffle.quotes.QuoteRanker#rank} turns the codebook and {@link
 * riffle.quotes.QuoteSource}s into {@link riffle.model.QuoteFindings}, under {@link
 * riffle.quotes.QuoteSettings}; {@link riffle.quotes.BoardExport} writes a {@link
 * riffle.model.CopyBoard} as Markdown, plain text or CSV.
 *
 * <h2>Privacy</h2>
 *
 * A quote is always a verbatim substring of the answer's <em>masked</em> text, with its offsets
 * ({@code masked.substring(start, end)}); it is never rewritten and never cut from the original. A
 * piece that holds a placeholder of masked personal data ({@code [email]}, {@code [phone]}, {@code
 * [name]} …) is never a quote, nor is one holding an {@code @} or a run of seven or more digits
 * (separated by spaces, dots, dashes, slashes or brackets at most): personal data the masks missed.
 * Every board export opens with {@link riffle.model.CopyBoard#CONSENT_NOTICE}: quoting a respondent
 * publicly needs their consent under the local privacy law.
 *
 * <h2>Pieces</h2>
 *
 * Each sentence of an answer is split into clauses at commas, semicolons, colons, dashes, brackets
 * and ellipses, before "but", "because", "although", "though", "whereas", "unless", "plus", and
 * before "and", "or", "so" when a new clause follows or the clause already has three tokens. Every
 * run of up to six neighbouring clauses of one sentence is a piece (so whole sentences compete with
 * their clauses), trimmed of leading punctuation, joining words ("and", "but") and fillers
 * ("honestly", "mainly"), a heading word before a colon ("Simple:"), and trailing symbols other
 * than the sentence's final . ! ?. For one code, an answer offers:
 *
 * <ol>
 *   <li>the pieces overlapping the code's span, when the coder marked one (all pieces when none
 *       overlaps);
 *   <li>otherwise, when the answer also carries codes that are neither above nor below this one,
 *       the pieces none of whose clauses resembles one of those codes more than this one (cosine to
 *       the centroids below), so that "fast delivery, and the chat helped me" is not quoted for the
 *       price; all pieces when that leaves none;
 *   <li>otherwise all its pieces.
 * </ol>
 *
 * Each answer contributes its best-scoring piece to the code (and, for headline ideas, its best
 * piece of at most {@code headlineMaxWords} words).
 *
 * <h2>Score</h2>
 *
 * <pre>
 * score = T × L × D × (1 + 0.2·V + 0.2·C)
 * </pre>
 *
 * <ul>
 *   <li><b>T, typicality</b>: cosine between the piece's content words (nouns, specific verbs,
 *       adjectives, adverbs other than "very", "not" and the like; numbers) weighted by idf, and
 *       the code's centroid, in which each word weighs the share of the code's answers holding it
 *       times its idf — Rocchio's class centroid over tf-idf vectors (Manning, Raghavan &amp;
 *       Schütze, <i>Introduction to Information Retrieval</i>, 2008, §14.2), with idf = ln(1 + N /
 *       df) over all answers given (Salton &amp; Buckley 1988). Words are Porter stems; a negated
 *       word (the text stage's negation scope) is its own word, so "not expensive" never counts as
 *       "expensive". A code's answers include those of the codes below it; the centroid uses all
 *       waves and segments, so a filter changes which answers are quoted, not what is typical.
 *   <li><b>L, length</b>: 1 from {@code minWords} to {@code maxWords} words (6 to 25 by default:
 *       short enough to quote, long enough to say something; common practice for pull quotes,
 *       Riffle's choice), (n / min)² below and (max / n)² above.
 *   <li><b>D, direction</b>: the piece's polarity is the sum over its words of +1 for praise words
 *       and −1 for friction words (Riffle's own lists, read by {@code QuoteWords}), each flipped
 *       when negated, −1 for "too" before an adjective or adverb, and −0.5 for any other negated
 *       content word (something missing: "no delivery date"). D is 1.25 when the polarity agrees
 *       with the code's direction (positive for praise, negative for friction), 0.5 when it
 *       contradicts it, 1 when it is zero or the code is neutral. So "it was not expensive" ranks
 *       low under a price complaint.
 *   <li><b>V, voice</b>: 1 when the piece speaks in the first person (I, me, my, we, us, our).
 *   <li><b>C, concreteness</b>: the share of three marks present: a number, a named thing (a proper
 *       noun other than the sentence's first word) and a specific verb (not be, have, get, make,
 *       like, want … nor an auxiliary).
 * </ul>
 *
 * The weights (0.2, 1.25, 0.5) are Riffle's choices, set by reading the ranked demo quotes.
 *
 * <h2>Near-duplicates</h2>
 *
 * Pieces are taken best first (score, then answer id); a piece joins the first earlier
 * representative whose set of word stems (all words, negation marked) has a Jaccard similarity of
 * at least {@code similarity} (0.6 by default) with its own, or becomes a representative (Broder's
 * resemblance, 1997; found with the prefix filter of Bayardo, Ma &amp; Srikant 2007), so near
 * variants show once. A quote's wording is its group's best piece inside the wave and segment
 * filters; its count is the answers inside the filters whose piece has that wording — the same
 * stems in the same order, case and punctuation aside — never those of a longer or shorter piece
 * near it ("said this way by 14 buyers"); its text is the exact form most of those answers wrote;
 * and its score is multiplied by the popularity factor 1 + 0.1·ln(count). Grouping runs over all
 * waves and segments; a wording is <b>new</b> when the settings name the latest wave and every
 * answer of its group is from that wave.
 *
 * <h2>Candidates by use</h2>
 *
 * Only codes without codes below them compete (a theme's quotes are its codes' quotes), and a
 * candidate's wording must not contradict the code's direction (polarity ≥ 0 for praise, ≤ 0 for
 * friction). The leading themes of a direction are its codes with the most answers inside the
 * filters (then codebook order), {@code leadingThemes} of them.
 *
 * <ul>
 *   <li><b>Headline ideas</b> (praise): each answer's best piece of 3 to {@code headlineMaxWords}
 *       words, scored T × L(3, max) × D, × 0.85 in the first person (a headline speaks for the
 *       shop), grouped as above; at most two per code, the best {@code perSlot} overall.
 *   <li><b>Sub-headline ideas</b> (praise): quotes of at least 8 words, scored T × L × D × (1 +
 *       0.25·explains + 0.2·C), where explains marks "because", "since", "so", "which", "means",
 *       "knowing", "without" or "if" after the first word; at most two per code, {@code perSlot}
 *       overall.
 *   <li><b>Benefit lines</b>: one per leading praise theme, its most typical wording: the quote
 *       with the best T × L × D × popularity.
 *   <li><b>Objections</b>: per leading friction theme, its {@code objectionQuotes} most typical
 *       quotes, ranked the same way.
 *   <li><b>Proof quotes</b> (praise): first-person quotes with some concreteness, scored T × L × D
 *       × (1 + C); at most two per code, {@code perSlot} overall.
 * </ul>
 *
 * <p>The ranking is deterministic: answers are processed in id order and every tie is broken by
 * answer id, then position, so the same answers in any order give the same findings.
 */
package riffle.quotes;
