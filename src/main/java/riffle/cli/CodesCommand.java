package riffle.cli;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import riffle.app.Project;
import riffle.model.Assignment;
import riffle.model.Code;
import riffle.model.EditOutcome;
import riffle.model.InputException;
import riffle.model.InputProblem;

/**
 * {@code riffle codes}: the codebook — list, add, change, merge, split, archive, files.
 *
 * <p>Size: one nested class per subcommand of {@code codes}, as picocli reads them; each is a few
 * lines of options and one call into {@code app}.
 */
@Command(
    name = "codes",
    mixinStandardHelpOptions = true,
    description = "Lists the codebook; its subcommands change it (every change can be undone).",
    subcommands = {
      CodesCommand.Add.class,
      CodesCommand.Change.class,
      CodesCommand.Merge.class,
      CodesCommand.Split.class
    })
final class CodesCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Mixin ListedProject shown;

  @Mixin JsonOption json;

  /** One code with how many answers carry it, as {@code codes --json} lists them. */
  record Listed(Code code, String theme, int answers) {}

  @Override
  public Integer call() throws InputException {
    Path project = shown.required();
    List<Listed> listed = new ArrayList<>();
    try (Project p = Project.openExisting(project)) {
      List<Code> book = p.codebook().codes();
      Map<Long, Integer> uses = new HashMap<>();
      for (List<Assignment> as : p.coding().assignments(p.answerIds()).values()) {
        as.forEach(a -> uses.merge(a.codeId(), 1, Integer::sum));
      }
      Map<Long, String> names = new HashMap<>();
      book.forEach(c -> names.put(c.id(), c.name()));
      for (Code c : book) {
        listed.add(
            new Listed(
                c,
                c.parent().isPresent() ? names.get(c.parent().getAsLong()) : null,
                uses.getOrDefault(c.id(), 0)));
      }
    }
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      JsonOutput.print(out, Map.of("codes", listed));
      return 0;
    }
    if (listed.isEmpty()) {
      out.println(
          "The codebook is empty. Add a code: riffle codes add --project " + project + " NAME");
    }
    for (Listed l : listed) {
      Code c = l.code();
      out.printf(
          Locale.ROOT,
          "%s%-32s %-8s %-3s %5d answers%s%n",
          l.theme() == null ? "" : "  ",
          c.name(),
          c.direction().name().toLowerCase(Locale.ROOT),
          c.key().map(k -> "[" + k + "]").orElse(""),
          l.answers(),
          c.archived() ? "  (archived)" : "");
    }
    return 0;
  }

  /** Runs one change to the open project. */
  interface Work {
    EditOutcome run(Project project, String coder) throws InputException;
  }

  /** Runs one change to the copy board. */
  interface BoardWork {
    EditOutcome run(riffle.app.Quotes quotes, String coder) throws InputException;
  }

  static int quotes(CommandSpec spec, CodingOptions options, BoardWork change)
      throws InputException {
    EditOutcome outcome;
    try (Project p = Project.openExisting(options.project)) {
      outcome = change.run(p.quotes(), options.coder());
    }
    options.print(spec.commandLine().getOut(), outcome);
    return 0;
  }

  static int change(CommandSpec spec, CodingOptions options, Work change) throws InputException {
    EditOutcome outcome;
    try (Project p = Project.openExisting(options.project)) {
      outcome = change.run(p, options.coder());
    }
    options.print(spec.commandLine().getOut(), outcome);
    return 0;
  }

  @Command(name = "add", mixinStandardHelpOptions = true, description = "Adds a code.")
  static final class Add implements Callable<Integer> {
    @Spec CommandSpec spec;
    @Mixin CodingOptions options;
    @Mixin CodeFields fields;

    @Parameters(paramLabel = "NAME", description = "The new code's name.")
    String name;

    @Override
    public Integer call() throws InputException {
      return change(
          spec,
          options,
          (p, coder) -> {
            Code made = p.codebook().create(coder, fields.draft(Optional.of(name)));
            return new EditOutcome(0, "create-code", 1, 0, "Created code \"" + made.name() + "\".");
          });
    }
  }

  @Command(
      name = "change",
      mixinStandardHelpOptions = true,
      description = "Renames a code or changes its theme, key, colour, direction or texts.")
  static final class Change implements Callable<Integer> {
    @Spec CommandSpec spec;
    @Mixin CodingOptions options;
    @Mixin CodeFields fields;

    @Parameters(paramLabel = "CODE", description = "The code's name.")
    String code;

    @Option(names = "--name", paramLabel = "NEW", description = "Its new name.")
    String rename;

    @Option(
        names = "--examples",
        split = ",",
        paramLabel = "ID",
        description = "Answers that show it well (replaces the list; \"\" for none).")
    List<String> examples;

    @Override
    public Integer call() throws InputException {
      return change(
          spec,
          options,
          (p, coder) -> {
            Code before = p.codebook().code(code);
            Code after =
                p.codebook().change(coder, before.id(), fields.draft(Optional.ofNullable(rename)));
            if (examples != null) {
              List<Long> ids = new ArrayList<>();
              for (String e : examples) {
                if (!e.isBlank()) {
                  try {
                    ids.add(Long.parseLong(e.strip()));
                  } catch (NumberFormatException bad) {
                    throw new InputException(
                        "--examples " + e + ": give answer ids, such as 12,31");
                  }
                }
              }
              p.codebook().setExamples(coder, after.id(), ids);
            }
            return new EditOutcome(0, "change-code", 1, 0, "Saved \"" + after.name() + "\".");
          });
    }
  }

  @Command(
      name = "merge",
      mixinStandardHelpOptions = true,
      description = "Merges codes into one; their answers, rules and examples move with them.")
  static final class Merge implements Callable<Integer> {
    @Spec CommandSpec spec;
    @Mixin CodingOptions options;

    @Parameters(arity = "1..*", paramLabel = "CODE", description = "The codes to merge away.")
    List<String> sources;

    @Option(
        names = "--into",
        required = true,
        paramLabel = "TARGET",
        description = "The code they become.")
    String into;

    @Override
    public Integer call() throws InputException {
      return change(
          spec,
          options,
          (p, coder) -> {
            List<Long> ids = new ArrayList<>();
            for (String s : sources) {
              ids.add(p.codebook().code(s).id());
            }
            return p.codebook().merge(coder, ids, p.codebook().code(into).id());
          });
    }
  }

  @Command(
      name = "split",
      mixinStandardHelpOptions = true,
      description = "Moves some of a code's answers to a new code beside it.")
  static final class Split implements Callable<Integer> {
    @Spec CommandSpec spec;
    @Mixin CodingOptions options;
    @Mixin CodeFields fields;

    @Parameters(paramLabel = "CODE", description = "The code to split.")
    String code;

    @Option(
        names = "--into",
        required = true,
        paramLabel = "NEW",
        description = "The new code's name.")
    String into;

    @ArgGroup(multiplicity = "1")
    Which which;

    static final class Which {
      @Option(
          names = "--query",
          paramLabel = "Q",
          description = "Move the answers this query matches.")
      String query;

      @Option(
          names = "--answers",
          split = ",",
          paramLabel = "ID",
          description = "Move these answers.")
      List<Long> answers;
    }

    @Override
    public Integer call() throws InputException {
      return change(
          spec,
          options,
          (p, coder) -> {
            long id = p.codebook().code(code).id();
            return which.query != null
                ? p.codebook().split(coder, id, fields.draft(Optional.of(into)), which.query)
                : p.codebook().split(coder, id, fields.draft(Optional.of(into)), which.answers);
          });
    }
  }

  @Command(
      name = "archive",
      mixinStandardHelpOptions = true,
      description = "Retires a code, keeping its answers.")
  int archive(@Mixin CodingOptions options, @Parameters(paramLabel = "CODE") String code) {
    return change(
        spec,
        options,
        (p, coder) -> p.codebook().archive(coder, p.codebook().code(code).id(), true));
  }

  @Command(
      name = "restore",
      mixinStandardHelpOptions = true,
      description = "Brings an archived code back.")
  int restore(@Mixin CodingOptions options, @Parameters(paramLabel = "CODE") String code) {
    return change(
        spec,
        options,
        (p, coder) -> p.codebook().archive(coder, p.codebook().code(code).id(), false));
  }

  @Command(
      name = "remove",
      mixinStandardHelpOptions = true,
      description = "Deletes a code nobody used; a code in use is archived instead.")
  int remove(@Mixin CodingOptions options, @Parameters(paramLabel = "CODE") String code) {
    return change(
        spec, options, (p, coder) -> p.codebook().remove(coder, p.codebook().code(code).id()));
  }

  @Command(
      name = "order",
      mixinStandardHelpOptions = true,
      description = "Moves a code to another place in the list.")
  int order(
      @Mixin CodingOptions options,
      @Parameters(paramLabel = "CODE") String code,
      @Option(
              names = "--place",
              required = true,
              paramLabel = "N",
              description = "Its new place (1 = first).")
          int place) {
    return change(
        spec,
        options,
        (p, coder) -> p.codebook().reorder(coder, p.codebook().code(code).id(), place));
  }

  @Command(
      name = "load",
      mixinStandardHelpOptions = true,
      description =
          "Brings in a codebook file (.csv or .json): named codes updated, new ones added.")
  int load(
      @Mixin CodingOptions options,
      @Option(
              names = "--file",
              required = true,
              paramLabel = "F",
              description = "The codebook file.")
          Path file) {
    return change(spec, options, (p, coder) -> p.codebook().importCodebook(coder, file));
  }

  @Command(
      name = "save",
      mixinStandardHelpOptions = true,
      description = "Writes the codebook to a file (.csv or .json).")
  int save(
      @Mixin CodingOptions options,
      @Option(
              names = "--out",
              required = true,
              paramLabel = "F",
              description = "The file to write.")
          Path file) {
    String text;
    try (Project p = Project.openExisting(options.project)) {
      text = p.codebook().exportCodebook(file.getFileName().toString());
    }
    try {
      Files.writeString(file, text, StandardCharsets.UTF_8);
    } catch (java.io.IOException e) {
      throw new InputException(
          new InputProblem(file.toString(), 0, 0, "cannot be written (" + e.getMessage() + ")"));
    }
    options.print(
        spec.commandLine().getOut(),
        new EditOutcome(0, "save-codebook", 0, 0, "Wrote the codebook to " + file + "."));
    return 0;
  }
}
