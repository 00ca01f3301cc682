package riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;
import riffle.app.Project;
import riffle.app.QueueKey;
import riffle.app.QueuePage;
import riffle.app.QueueStatus;
import riffle.model.InputException;
import riffle.model.ReviewQueue;

/** {@code riffle queue}: random review queues, and whether the answers read are a sample. */
@Command(
    name = "queue",
    mixinStandardHelpOptions = true,
    description = {
      "Lists the random review queues.",
      "A queue puts the answers of one wave and question (or of one segment value) in a "
          + "seeded random order; the answers read from its start are a random sample, so the "
          + "findings can project a share to every answer of the wave."
    },
    subcommands = {QueueCommand.Start.class, QueueCommand.Next.class})
final class QueueCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--project", paramLabel = "P", description = "Project file (to list it).")
  Path project;

  @Mixin JsonOption json;

  @Override
  public Integer call() throws InputException {
    if (project == null) {
      throw new ParameterException(spec.commandLine(), "Missing required option: '--project=P'");
    }
    List<QueueStatus> queues;
    try (Project p = Project.openExisting(project)) {
      queues = p.queues().all();
    }
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      JsonOutput.print(out, Map.of("queues", queues));
      return 0;
    }
    if (queues.isEmpty()) {
      out.println(
          "No random review queue yet. Start one: riffle queue start --project "
              + project
              + " --wave W --question Q");
    }
    for (QueueStatus s : queues) {
      out.println(title(s.queue()));
      out.println("  " + s.summary());
    }
    return 0;
  }

  /** The options that name one queue. */
  static final class Which {
    @Option(names = "--project", required = true, paramLabel = "P", description = "Project file.")
    Path project;

    @Option(names = "--wave", required = true, paramLabel = "W", description = "The wave.")
    String wave;

    @Option(
        names = "--question",
        required = true,
        paramLabel = "Q",
        description = "The question: its number (1, 2 …) or its text.")
    String question;

    @Option(
        names = "--segment",
        paramLabel = "COLUMN=VALUE",
        description = "Only respondents with this segment value, e.g. device=mobile.")
    String segment;

    QueueKey key() {
      return QueueKey.of(wave, question, Optional.ofNullable(segment));
    }
  }

  @Command(
      name = "start",
      mixinStandardHelpOptions = true,
      description = {
        "Starts the random order of a wave's answers to a question (or of one segment value).",
        "Starting it again changes nothing: the order keeps its seed."
      })
  static final class Start implements Callable<Integer> {
    @Spec CommandSpec spec;
    @Mixin Which which;

    @Option(
        names = "--seed",
        paramLabel = "N",
        description = "The order's seed, 0 to 9007199254740991 (default: drawn from the clock).")
    Long seed;

    @Option(
        names = "--coder",
        paramLabel = "NAME",
        description = "Who starts it, for the audit trail (default: your user name).")
    String coder;

    @Mixin JsonOption json;

    @Override
    public Integer call() throws InputException {
      String who = coder == null || coder.isBlank() ? Actor.current() : coder.strip();
      QueueStatus s;
      try (Project p = Project.openExisting(which.project)) {
        s =
            p.queues()
                .start(
                    who, which.key(), seed == null ? OptionalLong.empty() : OptionalLong.of(seed));
      }
      PrintWriter out = spec.commandLine().getOut();
      if (json.enabled) {
        JsonOutput.print(out, s);
        return 0;
      }
      ReviewQueue q = s.queue();
      out.println(
          (s.startedNow() ? "Started the random order of " : "The random order of ")
              + where(q)
              + (s.startedNow()
                  ? " (seed " + q.seed() + ")."
                  : " was started by "
                      + q.startedBy()
                      + " on "
                      + q.startedAt().toString().substring(0, 10)
                      + " (seed "
                      + q.seed()
                      + "); it goes on."));
      out.println(s.summary());
      out.println(
          "Read on with: riffle queue next --project "
              + which.project
              + " --wave \""
              + q.wave()
              + "\" --question "
              + which.question
              + q.segment().map(g -> " --segment " + g).orElse(""));
      return 0;
    }
  }

  @Command(
      name = "next",
      mixinStandardHelpOptions = true,
      description =
          "Shows the next answers to read in the queue's random order (masked), with their ids "
              + "to code them by (riffle code --answer ID --add CODE).")
  static final class Next implements Callable<Integer> {
    @Spec CommandSpec spec;
    @Mixin Which which;

    @Option(
        names = "--limit",
        paramLabel = "N",
        defaultValue = "10",
        description = "Show at most N answers, 1 to 500 (default: ${DEFAULT-VALUE}).")
    int limit;

    @Mixin JsonOption json;

    @Override
    public Integer call() throws InputException {
      QueueKey key = which.key();
      Optional<QueuePage> page;
      try (Project p = Project.openExisting(which.project)) {
        page = p.queues().next(key, limit);
      }
      if (page.isEmpty()) {
        throw new InputException(
            "no random order has been started for wave \""
                + which.wave
                + "\", question "
                + which.question
                + (which.segment == null ? "" : ", segment " + which.segment)
                + "; start it with: riffle queue start --project "
                + which.project
                + " --wave \""
                + which.wave
                + "\" --question "
                + which.question
                + (which.segment == null ? "" : " --segment " + which.segment));
      }
      PrintWriter out = spec.commandLine().getOut();
      if (json.enabled) {
        JsonOutput.print(out, page.get());
        return 0;
      }
      QueueStatus s = page.get().status();
      out.println(title(s.queue()));
      out.println(s.summary());
      if (page.get().answers().isEmpty()) {
        out.println("Every answer in this order is read.");
        return 0;
      }
      out.println("Next to read (position, answer id, respondent, masked text):");
      for (QueuePage.Item i : page.get().answers()) {
        out.printf(
            Locale.ROOT,
            "  #%-5d %8d  %-12s %s%n",
            i.position(),
            i.answer().id(),
            i.answer().respondent(),
            i.answer().text().replace('\n', ' '));
      }
      out.println(
          "Code one with: riffle code --project " + which.project + " --answer ID --add CODE");
      return 0;
    }
  }

  private static String title(ReviewQueue q) {
    return q.wave()
        + " · "
        + q.question()
        + q.segment().map(s -> " · " + s).orElse("")
        + " · seed "
        + q.seed()
        + " · started by "
        + q.startedBy()
        + " on "
        + q.startedAt().toString().substring(0, 10);
  }

  private static String where(ReviewQueue q) {
    return "the answers of wave \""
        + q.wave()
        + "\" to \""
        + q.question()
        + "\""
        + q.segment().map(s -> " with " + s).orElse("");
  }
}
