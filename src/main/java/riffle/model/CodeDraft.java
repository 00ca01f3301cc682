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

  /** A builder that starts from this draft, to derive a changed copy. */
  public Builder toBuilder() {
    return new Builder(this);
  }

  /** Builds a changed copy of a draft. */
  public static final class Builder {
    private Optional<String> name;
    private Optional<String> description;
    private Optional<String> include;
    private Optional<String> exclude;
    private Optional<String> colour;
    private Optional<String> key;
    private Optional<String> parent;
    private Optional<Direction> direction;

    private Builder(CodeDraft d) {
      name = d.name;
      description = d.description;
      include = d.include;
      exclude = d.exclude;
      colour = d.colour;
      key = d.key;
      parent = d.parent;
      direction = d.direction;
    }

    /** The name. */
    public Builder name(String v) {
      name = Optional.of(v);
      return this;
    }

    /** A short description. */
    public Builder description(String v) {
      description = Optional.of(v);
      return this;
    }

    /** Guidance on what belongs under it. */
    public Builder include(String v) {
      include = Optional.of(v);
      return this;
    }

    /** Guidance on what does not. */
    public Builder exclude(String v) {
      exclude = Optional.of(v);
      return this;
    }

    /** A hex colour such as {@code #3a7d44}; an empty one clears it. */
    public Builder colour(String v) {
      colour = Optional.of(v);
      return this;
    }

    /** The keyboard key that toggles it; an empty one clears it. */
    public Builder key(String v) {
      key = Optional.of(v);
      return this;
    }

    /** The name of its theme; an empty one puts it at the top level. */
    public Builder parent(String v) {
      parent = Optional.of(v);
      return this;
    }

    /** Praise, friction or neutral. */
    public Builder direction(Direction v) {
      direction = Optional.of(v);
      return this;
    }

    public CodeDraft build() {
      return new CodeDraft(name, description, include, exclude, colour, key, parent, direction);
    }
  }
}
