package riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import riffle.app.Project;
import riffle.model.HistoryEntry;
import riffle.model.InputException;

/** {@code riffle history}: the audit trail, newest first. */
@Command(
    name = "history",
    mixinStandardHelpOptions = true,
    description = "Shows the audit trail: who changed what and when, newest first.")
final class HistoryCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--project", required = true, paramLabel = "P", description = "Project file.")
  Path project;

  @Option(
      names = "--limit",
      paramLabel = "N",
      defaultValue = "30",
      description = "Show the N newest changes (default: ${DEFAULT-VALUE}).")
  int limit;

  @Mixin JsonOption json;

  @Override
  public Integer call() throws InputException {
    if (limit < 1) {
      throw new InputException("--limit must be at least 1, not " + limit);
    }
    List<HistoryEntry> entries;
    try (Project p = Project.openExisting(project)) {
      entries = p.coding().history(limit);
    }
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      JsonOutput.print(out, Map.of("history", entries));
      return 0;
    }
    for (HistoryEntry e : entries) {
      Object summary = e.detail().get("summary");
      out.printf(
          Locale.ROOT,
          "%s  %-10s %-16s %s%n",
          e.at(),
          e.actor(),
          e.action(),
          summary != null ? summary : e.detail());
    }
    return 0;
  }
}
