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
 * @param waves the share in each wave, in wave order
 */
public record CodeFrequency(
    String code,
    String codeId,
    Optional<String> parent,
    boolean theme,
    String direction,
    Map<String, Share> waves) {
  /** Checks the components and copies the map, keeping the waves' order. */
  public CodeFrequency {
    Objects.requireNonNull(code, "code");
    Objects.requireNonNull(codeId, "codeId");
    Objects.requireNonNull(parent, "parent");
    Objects.requireNonNull(direction, "direction");
    waves = Collections.unmodifiableMap(new LinkedHashMap<>(waves));
  }
}
