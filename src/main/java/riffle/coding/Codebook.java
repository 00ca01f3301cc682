package riffle.coding;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.ControlChars;
import riffle.model.Direction;
import riffle.model.InputException;

/** The codebook's rules: drafts applied to codes, and the whole book checked. */
public final class Codebook {
  /** Keys the coding screen keeps for itself: next, previous, undo. */
  public static final Set<String> RESERVED_KEYS = Set.of("j", "k", "z");

  /** Longest name accepted; longer ones are descriptions. */
  public static final int MAX_NAME = 80;

  private static final Pattern KEY = Pattern.compile("[a-z0-9]");
  private static final Pattern COLOUR = Pattern.compile("#([0-9a-fA-F]{3}|[0-9a-fA-F]{6})");

  private Codebook() {}

  /** The code with this name, regardless of case and surrounding spaces. */
  public static Optional<Code> find(List<Code> book, String name) {
    String wanted = fold(name);
    return book.stream().filter(c -> fold(c.name()).equals(wanted)).findFirst();
  }

  /**
   * The code with this name.
   *
   * @throws IllegalArgumentException naming the codes there are, when there is none
   */
  public static Code named(List<Code> book, String name) {
    return find(book, name)
        .orElseThrow(
            () ->
                new InputException(
                    "no code named \""
                        + name.strip()
                        + "\""
                        + (book.isEmpty()
                            ? "; the codebook is empty"
                            : "; codes: "
                                + book.stream()
                                    .map(Code::name)
                                    .collect(Collectors.joining(", ")))));
  }

  /** The code with this id. */
  public static Code byId(List<Code> book, long id) {
    return book.stream()
        .filter(c -> c.id() == id)
        .findFirst()
        .orElseThrow(() -> new InputException("no code with id " + id));
  }

  /**
   * A new code from a draft, placed last.
   *
   * @throws IllegalArgumentException when the draft has no name, its name holds a line break or a
   *     control character, or it breaks a rule of the book
   */
  public static Code create(List<Code> book, CodeDraft draft, long id) {
    String name =
        draft
            .name()
            .filter(n -> !n.isBlank())
            .orElseThrow(() -> new InputException("a code needs a name"));
    int position = book.stream().mapToInt(Code::position).max().orElse(0) + 1;
    Code blank =
        new Code(
            id,
            name,
            "",
            "",
            "",
            Optional.empty(),
            Optional.empty(),
            OptionalLong.empty(),
            Direction.NEUTRAL,
            false,
            position,
            List.of(),
            false);
    Code made = apply(book, blank, draft);
    if (draft.direction().isEmpty() && made.parent().isPresent()) {
      // A code under a theme says what its theme says unless told otherwise.
      Code theme = byId(book, made.parent().getAsLong());
      made = made.toBuilder().direction(theme.direction()).build();
    }
    ControlChars.checkName("the code name", made.name());
    List<Code> after = new ArrayList<>(book);
    after.add(made);
    check(after);
    return made;
  }

  /**
   * An existing code with a draft's changes.
   *
   * @throws IllegalArgumentException when the result breaks a rule of the book
   */
  public static Code change(List<Code> book, Code code, CodeDraft draft) {
    Code changed = apply(book, code, draft);
    if (!changed.name().equals(code.name())) {
      ControlChars.checkName("the code name", changed.name());
    }
    check(replace(book, changed));
    return changed;
  }

  /** The book with {@code code} in place of the code with its id. */
  public static List<Code> replace(List<Code> book, Code code) {
    List<Code> out = new ArrayList<>(book.size());
    for (Code c : book) {
      out.add(c.id() == code.id() ? code : c);
    }
    return out;
  }

  private static Code apply(List<Code> book, Code c, CodeDraft d) {
    OptionalLong parent = c.parent();
    if (d.parent().isPresent()) {
      String p = d.parent().get();
      parent = p.isBlank() ? OptionalLong.empty() : OptionalLong.of(named(book, p).id());
    }
    return c.toBuilder()
        .name(d.name().map(String::strip).orElse(c.name()))
        .description(d.description().map(String::strip).orElse(c.description()))
        .include(d.include().map(String::strip).orElse(c.include()))
        .exclude(d.exclude().map(String::strip).orElse(c.exclude()))
        .colour(d.colour().isPresent() ? blankToEmpty(d.colour().get()) : c.colour())
        .key(
            d.key().isPresent()
                ? blankToEmpty(d.key().get()).map(k -> k.toLowerCase(Locale.ROOT))
                : c.key())
        .parent(parent)
        .direction(d.direction().orElse(c.direction()))
        .build();
  }

  private static Optional<String> blankToEmpty(String s) {
    return s.isBlank() ? Optional.empty() : Optional.of(s.strip());
  }

  /**
   * Checks the whole book.
   *
   * @throws IllegalArgumentException naming the first problem and what to do about it
   */
  public static void check(List<Code> book) {
    Map<String, Code> names = new HashMap<>();
    Map<String, Code> keys = new HashMap<>();
    Map<Long, Code> ids = new HashMap<>();
    for (Code c : book) {
      ids.put(c.id(), c);
    }
    for (Code c : book) {
      if (c.name().isBlank()) {
        throw new InputException("a code needs a name");
      }
      if (c.name().length() > MAX_NAME) {
        throw new InputException(
            "the name \""
                + c.name().substring(0, 20)
                + "…\" is longer than "
                + MAX_NAME
                + " characters; put the detail in its description");
      }
      Code same = names.putIfAbsent(fold(c.name()), c);
      if (same != null) {
        throw new InputException(
            "there is already a code named \"" + same.name() + "\"; pick another name or merge");
      }
      if (c.key().isPresent()) {
        String k = c.key().get();
        if (!KEY.matcher(k).matches()) {
          throw new InputException(
              "key \"" + k + "\" of \"" + c.name() + "\": a key is one letter (a-z) or digit");
        }
        if (RESERVED_KEYS.contains(k)) {
          throw new InputException(
              "key \""
                  + k
                  + "\" moves between answers or undoes while coding; give \""
                  + c.name()
                  + "\" another key");
        }
        Code holder = keys.putIfAbsent(k, c);
        if (holder != null) {
          throw new InputException(
              "key \"" + k + "\" already belongs to \"" + holder.name() + "\"; pick another key");
        }
      }
      if (c.colour().isPresent() && !COLOUR.matcher(c.colour().get()).matches()) {
        throw new InputException(
            "colour \"" + c.colour().get() + "\" of \"" + c.name() + "\": write it as #rrggbb");
      }
      if (c.parent().isPresent()) {
        Code p = ids.get(c.parent().getAsLong());
        if (p == null) {
          throw new InputException("\"" + c.name() + "\" is under a code that is gone");
        }
        if (p.id() == c.id()) {
          throw new InputException("\"" + c.name() + "\" cannot be its own theme");
        }
        if (p.parent().isPresent()) {
          throw cycleOrDepth(book, c, p, ids);
        }
      }
    }
  }

  private static InputException cycleOrDepth(List<Code> book, Code c, Code p, Map<Long, Code> ids) {
    Set<Long> seen = new HashSet<>();
    Code at = c;
    while (at.parent().isPresent() && seen.add(at.id())) {
      at = ids.get(at.parent().getAsLong());
      if (at == null) {
        break;
      }
      if (at.id() == c.id()) {
        return new InputException(
            "\"" + c.name() + "\" would end up under itself; pick a theme outside its own branch");
      }
    }
    return new InputException(
        "\""
            + p.name()
            + "\" is itself under \""
            + ids.get(p.parent().getAsLong()).name()
            + "\"; themes are two levels deep, so put \""
            + c.name()
            + "\" under a top-level theme");
  }

  /** The codes directly under a theme. */
  public static List<Code> children(List<Code> book, long themeId) {
    return book.stream()
        .filter(c -> c.parent().isPresent() && c.parent().getAsLong() == themeId)
        .toList();
  }

  private static String fold(String name) {
    return name.strip().toLowerCase(Locale.ROOT);
  }
}
