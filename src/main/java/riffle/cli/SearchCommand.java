package riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import riffle.app.Project;
import riffle.model.InputException;
import riffle.model.SearchHit;
import riffle.model.SearchResult;

/** {@code riffle search}: finds answers with the analysts' query language. */
@Command(
    name = "search",
    mixinStandardHelpOptions = true,
    description = {
      "Finds answers: words (stemmed), \"exact phrases\", \"near words\"~3, prefix*, AND, "
          + "OR, NOT, parentheses, and filters wave:, question:N, code:, is:uncoded and any "
          + "segment column (device:mobile).",
      "Shows the masked answers with the matched words marked."
    })
final class SearchCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--project", required = true, paramLabel = "P", description = "Project file.")
  Path project;

  @ArgGroup(multiplicity = "1")
  What what;

  static final class What {
    @Option(names = "--query", paramLabel = "Q", description = "The query.")
    String query;

    @Option(
        names = "--like",
        paramLabel = "ANSWER",
        description = "Find answers like this one (its id, from a --json search).")
    Long like;
  }

  @Option(
      names = "--limit",
      paramLabel = "N",
      defaultValue = "20",
      description = "Show at most N answers (default: ${DEFAULT-VALUE}).")
  int limit;

  @Mixin JsonOption json;

  @Override
  public Integer call() throws InputException {
    if (limit < 1 || limit > 10_000) {
      throw new InputException("--limit must be between 1 and 10000, not " + limit);
    }
    SearchResult result;
    try (Project p = Project.openExisting(project)) {
      result = what.like != null ? p.similar(what.like, limit) : p.search(what.query, limit);
    }
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      JsonOutput.print(out, result);
      return 0;
    }
    out.printf(Locale.ROOT, "%d answers match", result.total());
    if (!result.waves().isEmpty()) {
      out.print(" (");
      String sep = "";
      for (Map.Entry<String, Integer> w : result.waves().entrySet()) {
        out.printf(Locale.ROOT, "%s%s: %d", sep, w.getKey(), w.getValue());
        sep = ", ";
      }
      out.print(")");
    }
    out.println();
    for (SearchHit h : result.hits()) {
      out.printf(
          Locale.ROOT,
          "%n#%d  %s · %s · %s%n",
          h.answerId(),
          h.wave(),
          h.respondent(),
          h.question());
      out.println("  " + marked(h));
    }
    return 0;
  }

  /** The answer with its matches in [brackets]. */
  static String marked(SearchHit h) {
    StringBuilder sb = new StringBuilder();
    int at = 0;
    for (SearchHit.Stretch s : h.highlight()) {
      sb.append(h.text(), at, s.start())
          .append('[')
          .append(h.text(), s.start(), s.end())
          .append(']');
      at = s.end();
    }
    return sb.append(h.text().substring(at)).toString().replace("\n", "\n  ");
  }
}
