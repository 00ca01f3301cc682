package riffle.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * One code's (or theme's) share of the answers to a question, wave by wave.
 *
 * @param code the code's name
 * @param codeId the code's id in the codebook
 * @param parent the parent theme's name, empty for a top-level code
 * @param theme whether the code has codes under it; its counts then include theirs, each answer
 *     counted once
 * @param direction "praise", "friction" or "neutral"
 * @param waves the share in each wave that has one, in wave order
 * @param byRule whether no person gave the code (or a code under it) to any answer of the question:
 *     every share of it is by rule
 * @param noShare the waves of the findings in which the code has no share, each with the reason in
 *     words (such as "no answer of Wave 2 read by a person yet")
 */
public record CodeFrequency(
    String code,
    String codeId,
    Optional<String> parent,
    boolean theme,
    String direction,
    Map<String, Share> waves,
    boolean byRule,
    Map<String, String> noShare) {
  /** Checks the components and copies the maps, keeping the waves' order. */
  public CodeFrequency {
    Objects.requireNonNull(code, "code");
    Objects.requireNonNull(codeId, "codeId");
    Objects.requireNonNull(parent, "parent");
    Objects.requireNonNull(direction, "direction");
    waves = Collections.unmodifiableMap(new LinkedHashMap<>(waves));
    noShare = Collections.unmodifiableMap(new LinkedHashMap<>(noShare));
  }
}
