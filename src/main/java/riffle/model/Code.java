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

  /** A copy with another name. */
  public Code withName(String newName) {
    return new Code(
        id,
        newName,
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

  /** A copy under another theme, or at the top level. */
  public Code withParent(OptionalLong newParent) {
    return new Code(
        id,
        name,
        description,
        include,
        exclude,
        colour,
        key,
        newParent,
        direction,
        archived,
        position,
        examples,
        imported);
  }

  /** A copy archived or brought back; an archived code gives up its key. */
  public Code withArchived(boolean newArchived) {
    return new Code(
        id,
        name,
        description,
        include,
        exclude,
        colour,
        newArchived ? Optional.empty() : key,
        parent,
        direction,
        newArchived,
        position,
        examples,
        imported);
  }

  /** A copy at another place in the order. */
  public Code withPosition(int newPosition) {
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
        newPosition,
        examples,
        imported);
  }

  /** A copy with other example answers. */
  public Code withExamples(List<Long> newExamples) {
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
        newExamples,
        imported);
  }
}
