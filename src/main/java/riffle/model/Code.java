package riffle.model;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalLong;

/**
 * A code of the codebook.
 *
 * @param id the code's id
 * @param name its name, unique regardless of case
 * @param description a short description
 * @param include guidance on what belongs under it
 * @param exclude guidance on what does not
 * @param colour a CSS hex colour such as {@code #3a7d44}, when set
 * @param key the keyboard key that toggles it while coding, when set
 * @param parent the theme it belongs to, when it is a child code
 * @param direction praise, friction or neutral
 * @param archived whether it is retired (kept for its assignments, offered no more)
 * @param position its place in the codebook's order
 * @param examples ids of answers that show it well
 * @param imported whether it was created by an import of codes made elsewhere
 */
public record Code(
    long id,
    String name,
    String description,
    String include,
    String exclude,
    Optional<String> colour,
    Optional<String> key,
    OptionalLong parent,
    Direction direction,
    boolean archived,
    int position,
    List<Long> examples,
    boolean imported) {
  public Code {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(description, "description");
    Objects.requireNonNull(include, "include");
    Objects.requireNonNull(exclude, "exclude");
    Objects.requireNonNull(colour, "colour");
    Objects.requireNonNull(key, "key");
    Objects.requireNonNull(parent, "parent");
    Objects.requireNonNull(direction, "direction");
    examples = List.copyOf(examples);
  }

  /** A builder that starts from this code, to derive a changed copy; its id and origin stay. */
  public Builder toBuilder() {
    return new Builder(this);
  }

  /** Builds a changed copy of a code; {@link #build()} checks it like the constructor does. */
  public static final class Builder {
    private final long id;
    private String name;
    private String description;
    private String include;
    private String exclude;
    private Optional<String> colour;
    private Optional<String> key;
    private OptionalLong parent;
    private Direction direction;
    private boolean archived;
    private int position;
    private List<Long> examples;
    private final boolean imported;

    private Builder(Code c) {
      id = c.id;
      name = c.name;
      description = c.description;
      include = c.include;
      exclude = c.exclude;
      colour = c.colour;
      key = c.key;
      parent = c.parent;
      direction = c.direction;
      archived = c.archived;
      position = c.position;
      examples = c.examples;
      imported = c.imported;
    }

    public Builder name(String v) {
      name = v;
      return this;
    }

    public Builder description(String v) {
      description = v;
      return this;
    }

    public Builder include(String v) {
      include = v;
      return this;
    }

    public Builder exclude(String v) {
      exclude = v;
      return this;
    }

    public Builder colour(Optional<String> v) {
      colour = v;
      return this;
    }

    public Builder key(Optional<String> v) {
      key = v;
      return this;
    }

    /** Under another theme, or at the top level when empty. */
    public Builder parent(OptionalLong v) {
      parent = v;
      return this;
    }

    public Builder direction(Direction v) {
      direction = v;
      return this;
    }

    /** Archived or brought back; archiving also gives up the key. */
    public Builder archived(boolean v) {
      archived = v;
      if (v) {
        key = Optional.empty();
      }
      return this;
    }

    /** Another place in the codebook's order. */
    public Builder position(int v) {
      position = v;
      return this;
    }

    /** Other example answers. */
    public Builder examples(List<Long> v) {
      examples = v;
      return this;
    }

    public Code build() {
      return new Code(
          id,
          name,
          description,
          include,
          exclude,
          colour,
          key,
          parent,
          direction,
          archived,
          position,
          examples,
          imported);
    }
  }
}
