package riffle.cli;

import java.util.Optional;
import picocli.CommandLine.Option;
import riffle.model.CodeDraft;
import riffle.model.Direction;

/** The options that describe a code, for {@code codes add} and {@code codes change}. */
final class CodeFields {
  @Option(
      names = "--theme",
      paramLabel = "THEME",
      description = "The theme it belongs under (\"\" for none).")
  String theme;

  @Option(names = "--direction", paramLabel = "D", description = "praise, friction or neutral.")
  Direction direction;

  @Option(
      names = "--key",
      paramLabel = "K",
      description = "Key that toggles it while coding (\"\" for none).")
  String key;

  @Option(names = "--colour", paramLabel = "#RRGGBB", description = "Its colour (\"\" for none).")
  String colour;

  @Option(names = "--description", paramLabel = "TEXT", description = "A short description.")
  String description;

  @Option(names = "--include", paramLabel = "TEXT", description = "What belongs under it.")
  String include;

  @Option(names = "--exclude", paramLabel = "TEXT", description = "What does not.")
  String exclude;

  CodeDraft draft(Optional<String> name) {
    return new CodeDraft(
        name,
        Optional.ofNullable(description),
        Optional.ofNullable(include),
        Optional.ofNullable(exclude),
        Optional.ofNullable(colour),
        Optional.ofNullable(key),
        Optional.ofNullable(theme),
        Optional.ofNullable(direction));
  }
}
