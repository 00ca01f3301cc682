package riffle.cli;

import java.io.InputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.util.function.Consumer;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;
import riffle.app.Project;

/** Command-line entry: {@code riffle COMMAND [OPTIONS]}. */
@Command(
    name = "riffle",
    mixinStandardHelpOptions = true,
    versionProvider = Main.Version.class,
    description =
        "Turns open-text answers of buyer surveys into coded, counted, quotable evidence.",
    subcommands = {
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
      CommandLine.HelpCommand.class
    })
public final class Main implements Runnable {
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
    CommandLine cl = new CommandLine(new Main(in));
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

  /** Reads the version from the jar's manifest, when there is one. */
  static final class Version implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
      String v = Main.class.getPackage().getImplementationVersion();
      return new String[] {"riffle " + (v == null ? "(development build)" : v)};
    }
  }
}
