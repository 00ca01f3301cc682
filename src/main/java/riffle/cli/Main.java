package riffle.cli;

import java.io.InputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;
import riffle.app.Project;

/**
 * Command-line entry: {@code riffle COMMAND [OPTIONS]}. The commands are {@link #COMMANDS}, added
 * by {@link #commandLine}.
 */
@Command(
    name = "riffle",
    mixinStandardHelpOptions = true,
    versionProvider = Main.Version.class,
    description =
        "Turns open-text answers of buyer surveys into coded, counted, quotable evidence.")
public final class Main implements Runnable {
  /** Every command, in the order the help lists them. */
  static final List<Class<?>> COMMANDS =
      List.of(
          ImportCommand.class,
          InfoCommand.class,
          AnalyzeCommand.class,
          SearchCommand.class,
          PhrasesCommand.class,
          CodesCommand.class,
          CodeCommand.class,
          UndoCommand.class,
          RedoCommand.class,
          RulesCommand.class,
          QueueCommand.class,
          HistoryCommand.class,
          SuggestCommand.class,
          ReportCommand.class,
          QuotesCommand.class,
          BoardCommand.class,
          ExportCommand.class,
          ServeCommand.class,
          DemoCommand.class,
          CommandLine.HelpCommand.class);

  @Spec CommandSpec spec;

  /** Standard input, for {@code import --paste}. */
  final InputStream in;

  private Main(InputStream in) {
    this.in = in;
  }

  @Override
  public void run() {
    spec.commandLine().usage(spec.commandLine().getOut());
  }

  @SuppressForbidden("the command line is the one place that ends the process with its exit code")
  public static void main(String[] args) {
    System.exit(run(args, System.in, System.out, System.err));
  }

  /** Runs one command with the given streams and returns its exit code. */
  public static int run(String[] args, InputStream in, PrintStream out, PrintStream err) {
    CommandLine cl = commandLine(in, args);
    cl.setOut(TerminalText.writer(out));
    cl.setErr(TerminalText.writer(err));
    cl.setExecutionExceptionHandler(new Failures());
    cl.setCaseInsensitiveEnumValuesAllowed(true);
    PrintWriter errors = cl.getErr();
    // A wait for another Riffle process (after a second) is said on stderr.
    Consumer<String> before =
        Project.announceWaitsTo(
            message -> {
              errors.println("riffle: " + message);
              errors.flush();
            });
    try {
      return cl.execute(args);
    } finally {
      Project.announceWaitsTo(before);
      cl.getOut().flush();
      cl.getErr().flush();
    }
  }

  /**
   * The command line for {@code args}. Picocli reads every option of every command it is given,
   * which took half a second of each run's start: a run that names a command gets only that one;
   * help, a mistyped name and no name get them all, so that the list and the suggestions are whole.
   */
  static CommandLine commandLine(InputStream in, String[] args) {
    CommandLine cl = new CommandLine(new Main(in));
    Optional<Class<?>> named =
        args.length == 0
            ? Optional.empty()
            : COMMANDS.stream()
                .filter(c -> c != CommandLine.HelpCommand.class)
                .filter(c -> c.getAnnotation(Command.class).name().equals(args[0]))
                .findFirst();
    if (named.isPresent()) {
      cl.addSubcommand(named.get());
    } else {
      COMMANDS.forEach(cl::addSubcommand);
    }
    return cl;
  }

  /** Reads the version from the jar's manifest, when there is one. */
  static final class Version implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
      String v = Main.class.getPackage().getImplementationVersion();
      return new String[] {"riffle " + (v == null ? "(development build)" : v)};
    }
  }
}
