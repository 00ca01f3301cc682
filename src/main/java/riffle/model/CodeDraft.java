package riffle.model;

import java.util.Objects;
import java.util.Optional;

/**
 * What a person gives for a new code, or changes of an existing one: an absent field is left as it
 * is (or takes its default for a new code); an empty colour, key or parent clears it.
 *
 * @param name the name (required for a new code)
 * @param description a short description
 * @param include guidance on what belongs under it
 * @param exclude guidance on what does not
 * @param colour a hex colour such as {@code #3a7d44}
 * @param key the keyboard key that toggles it
 * @param parent the name of its theme
 * @param direction praise, friction or neutral
 */
public record CodeDraft(
    Optional<String> name,
    Optional<String> description,
    Optional<String> include,
    Optional<String> exclude,
    Optional<String> colour,
    Optional<String> key,
    Optional<String> parent,
    Optional<Direction> direction) {
  public CodeDraft {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(description, "description");
    Objects.requireNonNull(include, "include");
    Objects.requireNonNull(exclude, "exclude");
    Objects.requireNonNull(colour, "colour");
    Objects.requireNonNull(key, "key");
    Objects.requireNonNull(parent, "parent");
    Objects.requireNonNull(direction, "direction");
  }

  /** A draft that only names a code. */
  public static CodeDraft named(String name) {
    return new CodeDraft(
        Optional.of(name),
        Optional.empty(),
        Optional.empty(),
        Optional.empty(),
        Optional.empty(),
        Optional.empty(),
        Optional.empty(),
        Optional.empty());
  }

  /** A copy with a parent theme. */
  public CodeDraft withParent(String theme) {
    return new CodeDraft(
        name, description, include, exclude, colour, key, Optional.of(theme), direction);
  }

  /** A copy with a key. */
  public CodeDraft withKey(String k) {
    return new CodeDraft(
        name, description, include, exclude, colour, Optional.of(k), parent, direction);
  }

  /** A copy with a direction. */
  public CodeDraft withDirection(Direction d) {
    return new CodeDraft(name, description, include, exclude, colour, key, parent, Optional.of(d));
  }
}
