/**
 * Recurring phrases, the phrases that travel together, and keyness between waves or segments.
 *
 * <p>The front door is {@link riffle.phrases.PhraseMiner}: {@code mine} lists the recurring phrases
 * of the answers a {@link riffle.phrases.PhraseFilter} accepts and groups those that travel
 * together; {@code keyness} lists the phrases whose share of answers differs between two filters.
 * Input is {@link riffle.phrases.PhraseDoc}s carrying each answer's {@code Analysis} (sentences,
 * tokens with Penn Treebank tags, Porter stems and negation marks, chunks); this package parses
 * nothing itself.
 *
 * <h2>Candidates</h2>
 *
 * <ul>
 *   <li>A candidate lies inside one sentence and never crosses punctuation, symbols, emoji or a
 *       masking placeholder ({@code [email]}, {@code [phone]} …): placeholders never appear in a
 *       phrase. Answers without sentences (foreign-language answers) count in no phrase.
 *   <li><b>Multi-word candidates</b> are word n-grams of 2 to {@code maxWords} (default 5) words
 *       that neither start nor end with a stopword and contain no negation cue, and that follow the
 *       chunker's phrase boundaries: they open at a chunk's first word that is no stopword (or at a
 *       noun or adjective inside a noun phrase) and close at a chunk's last word, or at a verb's
 *       particle ("showed up"). So a noun phrase loses its leading determiners and pronouns ("the
 *       delivery date" → "delivery date"), and adjective + noun ("great price"), verb + object
 *       ("liked the video") and verb + particle are candidates, but "three or four" inside
 *       "compared three or four shops" is not.
 *   <li><b>Single words</b> are candidates only as a whole noun phrase — a noun or adjective left
 *       once determiners, pronouns, numbers and adverbs are trimmed ("the price", "Warranty?") —
 *       and only when frequent: in at least {@link
 *       riffle.phrases.PhraseSettings#SINGLE_WORD_SUPPORT} times the minimum support.
 *   <li><b>Negation</b> (the text package marks the tokens a cue governs): a candidate's words are
 *       all negated or all plain, so "it did not arrive on time" never counts for "arrive on time".
 *       A negated candidate starts at the first content word of its scope (at most two stopwords
 *       in); the words further inside the scope give no other candidate. Its label keeps the
 *       buyer's cue, with the auxiliary written before it: "didn't know if it would fit", "did not
 *       arrive on time", "no delivery date". Its stems and its grouping leave the cue out, and it
 *       is flagged {@code negated}.
 *   <li>Stopwords are English function words, the intensifiers and fillers of survey answers, and
 *       the negation cues; the lists are in {@code riffle/words/en/} and read by {@code
 *       PhraseWords}.
 * </ul>
 *
 * <h2>Counting, grouping and labels</h2>
 *
 * A phrase is counted by the number of answers that contain it (an answer counts once, however
 * often it repeats the phrase), never by token frequency. Occurrences with the same stem sequence
 * and negation flag are one phrase ("delivery date", "Delivery Date" and "delivery dates");
 * variants are merged ignoring case, runs of spaces and the kind of apostrophe, listed most
 * frequent first, and the most frequent one is the label (on a tie, the spelling with fewer
 * capitals, then by text). Labels start and end on a letter or digit.
 *
 * <h2>Score</h2>
 *
 * <ul>
 *   <li><b>Minimum support</b>: {@code minAnswers} answers (default 3).
 *   <li><b>Word pairs that belong together</b>: a two-word candidate is kept only when Dunning's
 *       (1993) log-likelihood G² of the pair, over all adjacent word pairs of the mined answers,
 *       has p &lt; {@link riffle.phrases.PhraseSettings#PAIR_P} and the pair occurs more often than
 *       chance.
 *   <li><b>Termhood</b>: the C-value of Frantzi, Ananiadou and Mima (2000), computed exactly as in
 *       the paper's algorithm over the kept candidates, with answers as frequencies: log2|a| · f(a)
 *       for a phrase nested in no longer one, log2|a| · (f(a) − t(a)/c(a)) otherwise, where a
 *       longer phrase b passes on only f(b) − t(b). It favours multi-word phrases that stand on
 *       their own; a fragment that only ever occurs inside a longer phrase scores 0 and is dropped.
 *       Single words get the weight {@link riffle.phrases.PhraseSettings#SINGLE_WORD_WEIGHT}
 *       instead of the paper's log2 1 = 0.
 *   <li><b>Reasons before background</b>: the score is the C-value times the phrase's standalone
 *       ratio, min(1, (s + 1) / (r · f + 1)), where s is the number of its answers that are a
 *       single sentence, f its answers, and r the share of single-sentence answers among the
 *       analysed answers. A phrase that buyers also give as their whole answer ("the shipping cost
 *       was high") keeps its C-value; one that only ever comes alongside other sentences ("I had
 *       been looking for months", "in the end I took the chance") is background to the reasons and
 *       sinks. The +1s keep a rare phrase from being judged on a handful of answers. On the demo
 *       waves this moves such verbatim background sentences from the top of the list (where C-value
 *       alone puts them, for their length) to below the reasons.
 *   <li>Phrases are listed by score, then answers, then label; at most {@code limit} (default 50).
 *   <li><b>Stop phrases</b>: a phrase with any variant in the stop list is never reported (default
 *       {@link riffle.phrases.PhraseSettings#DEFAULT_STOP_PHRASES}: courtesy, fillers such as "to
 *       be honest" or "in the end", and bare generic nouns such as "thing" or "time"; bare pronoun
 *       phrases cannot arise, pronouns being stopwords).
 * </ul>
 *
 * Each phrase carries its answers per wave (every wave of the mined answers, zeros included) and up
 * to {@code examples} example answers (default 3): distinct masked texts — never anything else —
 * closest in length to 80 characters, ties by answer id, so the choice is deterministic.
 *
 * <h2>Phrases that travel together</h2>
 *
 * Over the first 200 phrases of a report, two phrases co-occur in an answer when it contains both
 * at places that do not overlap. A pair is associated when it co-occurs in at least {@code
 * minAnswers} answers, more often than chance (lift &gt; 1), with G² p &lt; {@link
 * riffle.phrases.PhraseSettings#ASSOCIATION_P} (N = the analysed answers), and Jaccard similarity
 * of at least {@link riffle.phrases.PhraseSettings#JACCARD_FLOOR}. Clusters come from
 * complete-linkage agglomeration over these similarities (an unassociated pair counts 0): two
 * clusters merge only while every pair across them is associated, the most similar first, so every
 * two phrases of a cluster travel together and a frequent phrase cannot chain unrelated ones (nor
 * does a phrase ever join a longer one containing it: the two never co-occur); ties go to the
 * best-ranked phrases. Each cluster of two or more phrases lists its phrases, the answers
 * containing any of them, its cohesion (mean pairwise similarity) and a query that codes it: the
 * phrases as double-quoted exact phrases joined by {@code OR}.
 *
 * <h2>Keyness</h2>
 *
 * Candidates are counted over the focus and the reference together (an answer in both belongs to
 * the focus) and must pass the rules above with at least {@link
 * riffle.phrases.PhraseSettings#KEYNESS_MIN_ANSWERS} answers in the two together, so that rare
 * phrases do not dominate. The unit is the answer: with a and b answers containing the phrase out
 * of c and d analysed answers, the log-likelihood is Dunning's G² of the 2×2 table [[a, c − a], [b,
 * d − b]] — the exact statistic for "contains it or not", which the two-term form of Rayson and
 * Garside (2000), meant for token counts, approaches only for rare phrases — with its p-value from
 * the chi-square distribution with one degree of freedom, and the effect size is Hardie's (2014)
 * Log Ratio log2((a/c)/(b/d)), a zero count taken as 0.5. Each p-value is also given adjusted by
 * Benjamini and Hochberg (1995) across every candidate compared, since hundreds are compared at
 * once and a few reach p &lt; 0.01 by chance. Key phrases are listed by log-likelihood, then label,
 * each with its direction ("more" or "less" in the focus).
 *
 * <h2>Determinism and speed</h2>
 *
 * The same answers always give the same report; ties are broken by phrase text. Counting interns
 * stems into int ids and word sequences into a trie of ints, and builds strings only for the few
 * hundred candidates that reach the report; {@code PhraseBench} (test scope) times it.
 */
package riffle.phrases;
