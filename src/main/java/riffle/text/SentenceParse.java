package riffle.text;

import java.util.List;

/**
 * The parse of one sentence with offsets relative to the sentence, so that identical sentences
 * share one parse (survey answers repeat a lot). Immutable once built; the arrays are never handed
 * out.
 *
 * @param starts token starts
 * @param ends token ends
 * @param tags Penn Treebank tags
 * @param stems Porter stems of the lower-cased tokens
 * @param negated whether a negation governs each token
 * @param chunks chunks over token indices
 */
record SentenceParse(
    int[] starts,
    int[] ends,
    String[] tags,
    String[] stems,
    boolean[] negated,
    List<ChunkSpan> chunks) {

  /**
   * A chunk over tokens {@code [first, end)}.
   *
   * @param type the chunk type
   * @param first its first token
   * @param end one past its last token
   */
  record ChunkSpan(String type, int first, int end) {}
}
