package riffle.quotes;

/**
 * A quotable stretch of one answer: a sentence, a clause, or a run of neighbouring clauses, with
 * the features the score reads.
 *
 * @param start first character in the masked text
 * @param end one past the last character
 * @param words its words (tokens with a letter or digit)
 * @param content the ids of its content words, distinct and ascending (typicality)
 * @param stems the ids of all its word stems, distinct and ascending (near-duplicates)
 * @param wording the ids of its word stems in text order: two pieces with the same wording say the
 *     same thing the same way, whatever their case and punctuation ("said this way by N buyers")
 * @param firstPerson whether it speaks in the first person
 * @param concreteness share of the three marks of concrete wording it shows: a number, a named
 *     thing, a specific verb
 * @param polarity praise words count +1, friction words −1, either flipped when negated; a negated
 *     content word that is neither counts −0.5 (something missing)
 * @param explains whether it contains a word that starts an explanation ("because", "so", "which")
 * @param firstClause the answer-wide index of its first clause
 * @param lastClause the answer-wide index of its last clause
 */
record Piece(
    int start,
    int end,
    int words,
    int[] content,
    int[] stems,
    int[] wording,
    boolean firstPerson,
    double concreteness,
    double polarity,
    boolean explains,
    int firstClause,
    int lastClause) {}
