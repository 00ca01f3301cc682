package riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalLong;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import riffle.app.Project;
import riffle.model.Code;
import riffle.model.EditOutcome;
import riffle.model.InputException;
import riffle.model.Rule;
import riffle.model.RulePreview;
import riffle.model.SearchHit;

/** {@code riffle rules}: saved queries that code the answers they match. */
@Command(
    name = "rules",
    mixinStandardHelpOptions = true,
    description = {
      "Lists the saved rules.",
      "A rule is a search query owned by a code; applying it codes every matching answer, "
          + "except those from which a person took the code off. Rules run again on every new "
          + "wave."
    },
    subcommands = {RulesCommand.Add.class, RulesCommand.Preview.class})
final class RulesCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Mixin ListedProject shown;

  @Mixin JsonOption json;

  @Override
  public Integer call() throws InputException {
    Path project = shown.required();
    List<Rule> rules;
    Map<Long, String> names = new HashMap<>();
    try (Project p = Project.openExisting(project)) {
      rules = p.rules().rules();
      for (Code c : p.codebook().codes()) {
        names.put(c.id(), c.name());
      }
    }
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      JsonOutput.print(out, Map.of("rules", rules));
      return 0;
    }
    if (rules.isEmpty()) {
      out.println(
          "No rules yet. Try one: riffle rules preview --project "
              + project
              + " CODE --query QUERY");
    }
    for (Rule r : rules) {
      out.printf(Locale.ROOT, "#%d  %-28s %s%n", r.id(), names.get(r.codeId()), r.query());
    }
    return 0;
  }

  @Command(name = "add", mixinStandardHelpOptions = true, description = "Saves a rule for a code.")
  static final class Add implements Callable<Integer> {
    @Spec CommandSpec spec;
    @Mixin CodingOptions options;

    @Parameters(paramLabel = "CODE")
    String code;

    @Option(names = "--query", required = true, paramLabel = "Q", description = "The query.")
    String query;

    @Override
    public Integer call() throws InputException {
      return CodesCommand.change(
          spec,
          options,
          (p, coder) -> {
            Rule r = p.rules().addRule(coder, p.codebook().code(code).id(), query);
            return new EditOutcome(
                0,
                "add-rule",
                1,
                0,
                "Rule #" + r.id() + " saved; apply it with: riffle rules apply");
          });
    }
  }

  @Command(
      name = "preview",
      mixinStandardHelpOptions = true,
      description = "Shows how many answers a query would code for a code, with a sample.")
  static final class Preview implements Callable<Integer> {
    @Spec CommandSpec spec;
    @Mixin CodingOptions options;

    @Parameters(paramLabel = "CODE")
    String code;

    @Option(names = "--query", required = true, paramLabel = "Q", description = "The query.")
    String query;

    @Option(
        names = "--sample",
        defaultValue = "5",
        paramLabel = "N",
        description = "Show N answers (default: ${DEFAULT-VALUE}).")
    int sample;

    @Override
    public Integer call() throws InputException {
      RulePreview preview;
      try (Project p = Project.openExisting(options.project)) {
        preview = p.rules().preview(p.codebook().code(code).id(), query, Math.max(0, sample));
      }
      PrintWriter out = spec.commandLine().getOut();
      if (options.json.enabled) {
        JsonOutput.print(out, preview);
        return 0;
      }
      out.printf(
          Locale.ROOT,
          "%s would code %d answer(s): %d match, %d have the code already, %d were taken off by a"
              + " person.%n",
          preview.query(),
          preview.wouldCode(),
          preview.matches(),
          preview.alreadyCoded(),
          preview.keptOff());
      for (SearchHit h : preview.sample()) {
        out.printf(
            Locale.ROOT,
            "%n#%d  %s · %s%n  %s%n",
            h.answerId(),
            h.wave(),
            h.respondent(),
            SearchCommand.marked(h));
      }
      return 0;
    }
  }

  @Command(
      name = "apply",
      mixinStandardHelpOptions = true,
      description = "Applies the saved rules (all, or one code's).")
  int apply(
      @Mixin CodingOptions options,
      @Parameters(arity = "0..1", paramLabel = "CODE", description = "Only this code's rules.")
          String code) {
    return CodesCommand.change(
        spec,
        options,
        (p, coder) ->
            p.rules()
                .applyRules(
                    coder,
                    code == null
                        ? OptionalLong.empty()
                        : OptionalLong.of(p.codebook().code(code).id())));
  }

  @Command(
      name = "remove",
      mixinStandardHelpOptions = true,
      description = "Deletes a rule; what it coded stays.")
  int remove(
      @Mixin CodingOptions options,
      @Parameters(paramLabel = "ID", description = "The rule's number.") long id) {
    return CodesCommand.change(spec, options, (p, coder) -> p.rules().removeRule(coder, id));
  }
}
