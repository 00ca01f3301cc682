package riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import riffle.app.Project;
import riffle.model.InputException;
import riffle.model.ProjectSummary;

/** {@code riffle info}: what a project holds. */
@Command(
    name = "info",
    mixinStandardHelpOptions = true,
    description = "Shows a project's waves, questions, answers, codes and assignments.")
final class InfoCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--project", required = true, paramLabel = "P", description = "Project file.")
  Path project;

  @Mixin JsonOption json;

  @Override
  public Integer call() throws InputException {
    ProjectSummary summary;
    try (Project p = Project.openExisting(project)) {
      summary = p.summary();
    }
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      JsonOutput.print(out, summary);
    } else {
      SummaryText.print(out, project, summary);
    }
    return 0;
  }
}
