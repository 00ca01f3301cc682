package riffle.cli;

import java.nio.file.Path;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * The project a listing command ({@code codes}, {@code rules}, {@code board}) shows. Optional to
 * picocli, as its subcommands take their own {@code --project}; required when the command lists.
 */
final class ListedProject {
  @Spec(Spec.Target.MIXEE)
  CommandSpec mixee;

  @Option(names = "--project", paramLabel = "P", description = "Project file (to list it).")
  Path project;

  /** The project file, or a usage error naming the missing option. */
  Path required() {
    if (project == null) {
      throw new ParameterException(mixee.commandLine(), "Missing required option: '--project=P'");
    }
    return project;
  }
}
