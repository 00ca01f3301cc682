package riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import riffle.app.Project;
import riffle.model.BoardItem;
import riffle.model.CopyBoard;
import riffle.model.InputException;
import riffle.model.QuoteSlot;

/** {@code riffle board}: the copy board — quotes pinned into slots for page copy. */
@Command(
    name = "board",
    mixinStandardHelpOptions = true,
    description = "Shows the copy board; its subcommands pin, move, annotate and unpin quotes.",
    subcommands = {BoardCommand.Pin.class})
final class BoardCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Mixin ListedProject shown;

  @Mixin JsonOption json;

  static String heading(QuoteSlot slot) {
    return switch (slot) {
      case HEADLINE -> "Headline ideas";
      case SUBHEADLINE -> "Sub-headline ideas";
      case BENEFIT -> "Benefit lines";
      case OBJECTION -> "Objections to answer";
      case PROOF -> "Proof quotes";
    };
  }

  @Override
  public Integer call() throws InputException {
    Path project = shown.required();
    CopyBoard board;
    List<String> takenOff;
    try (Project p = Project.openExisting(project)) {
      board = p.quotes().board();
      takenOff = p.quotes().takenOff();
    }
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      java.util.Map<String, Object> doc = new java.util.LinkedHashMap<>();
      doc.put("title", board.title());
      doc.put("slots", board.slots());
      doc.put("taken_off", takenOff);
      JsonOutput.print(out, doc);
      return 0;
    }
    out.println(CopyBoard.CONSENT_NOTICE);
    for (String t : takenOff) {
      out.println();
      out.println(t);
    }
    for (QuoteSlot slot : QuoteSlot.values()) {
      List<BoardItem> items = board.items(slot);
      out.printf(Locale.ROOT, "%n%s (%s)%n", heading(slot), slot.name().toLowerCase(Locale.ROOT));
      for (int i = 0; i < items.size(); i++) {
        BoardItem b = items.get(i);
        out.printf(
            Locale.ROOT,
            "  %d. \"%s\"  (%s · #%d %s · %s)%n",
            i + 1,
            b.text(),
            b.code(),
            b.answerId(),
            b.respondent(),
            b.wave());
        b.workingLine().ifPresent(l -> out.println("     → " + l));
      }
    }
    return 0;
  }

  @Command(
      name = "pin",
      mixinStandardHelpOptions = true,
      description = "Pins a quote (the answer's own masked words) to a slot.")
  static final class Pin implements Callable<Integer> {
    @Spec CommandSpec spec;
    @Mixin CodingOptions options;

    @Option(
        names = "--slot",
        required = true,
        paramLabel = "SLOT",
        description = "headline, subheadline, benefit, objection or proof.")
    QuoteSlot slot;

    @Option(
        names = "--answer",
        required = true,
        paramLabel = "ID",
        description = "The answer it comes from.")
    long answer;

    @Option(
        names = "--text",
        required = true,
        paramLabel = "TEXT",
        description = "The quote, as written in the masked answer.")
    String text;

    @Option(
        names = "--code",
        paramLabel = "C",
        defaultValue = "",
        description = "The code it stands for.")
    String code;

    @Override
    public Integer call() throws InputException {
      return CodesCommand.quotes(
          spec, options, (q, coder) -> q.pin(coder, slot, answer, text, code));
    }
  }

  @Command(
      name = "unpin",
      mixinStandardHelpOptions = true,
      description = "Takes a quote off the board.")
  int unpin(@Mixin CodingOptions options, @Mixin BoardPlace quote) {
    return CodesCommand.quotes(
        spec, options, (q, coder) -> q.unpin(coder, quote.slot, quote.index()));
  }

  @Command(
      name = "move",
      mixinStandardHelpOptions = true,
      description = "Moves a quote within its slot or to another.")
  int move(
      @Mixin CodingOptions options,
      @Mixin BoardPlace quote,
      @Option(
              names = "--to",
              paramLabel = "SLOT",
              description = "Another slot (default: the same).")
          QuoteSlot to,
      @Option(
              names = "--place",
              required = true,
              paramLabel = "N",
              description = "Its new place (1 = first).")
          int place) {
    return CodesCommand.quotes(
        spec,
        options,
        (q, coder) ->
            q.move(coder, quote.slot, quote.index(), to == null ? quote.slot : to, place - 1));
  }

  @Command(
      name = "line",
      mixinStandardHelpOptions = true,
      description = "Writes your working line beside a quote (the quote stays as it is).")
  int line(
      @Mixin CodingOptions options,
      @Mixin BoardPlace quote,
      @Option(
              names = "--text",
              required = true,
              paramLabel = "TEXT",
              description = "The line (\"\" clears it).")
          String text) {
    return CodesCommand.quotes(
        spec,
        options,
        (q, coder) -> q.workingLine(coder, quote.slot, quote.index(), Optional.of(text)));
  }
}
