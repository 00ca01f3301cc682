package riffle.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * One recurring phrase: the variants that share a stem sequence and a negation flag.
 *
 * @param phrase the label: the variant written most often (a negated phrase's label includes its
 *     cue, as in "didn't know if it would fit")
 * @param stems the stem sequence shared by the variants, space-separated (without the cue)
 * @param negated whether the phrase stands in the scope of a negation
 * @param answers how many answers contain it (an answer counts once however often it says it)
 * @param score its C-value times its standalone ratio (see the package overview); higher is better
 * @param variants how it is written, most frequent first (lower-case variants merged; at most
 *     {@link PhraseSettings#MAX_VARIANTS})
 * @param examples answers that contain it
 * @param waves answers containing it per wave, in the order the waves first appear among the mined
 *     answers (waves without it count 0)
 */
public record Phrase(
    String phrase,
    String stems,
    boolean negated,
    int answers,
    double score,
    List<String> variants,
    List<PhraseExample> examples,
    Map<String, Integer> waves) {
  /** Checks the components and copies the collections (keeping the waves' order). */
  public Phrase {
    Objects.requireNonNull(phrase, "phrase");
    Objects.requireNonNull(stems, "stems");
    variants = List.copyOf(variants);
    examples = List.copyOf(examples);
    waves = Collections.unmodifiableMap(new LinkedHashMap<>(waves));
  }
}
