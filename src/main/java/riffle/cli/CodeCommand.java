package riffle.cli;

import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import riffle.model.InputException;
import riffle.model.Span;

/** {@code riffle code}: gives a code to an answer, takes it off, or marks the answer as read. */
@Command(
    name = "code",
    mixinStandardHelpOptions = true,
    description = {
      "Gives a code to an answer (--add, optionally --span START:END of the words that "
          + "carry it), takes it off (--remove; rules will not give it back), accepts a "
          + "suggestion (--accept), or marks the answer as read with no (other) code applying "
          + "(--none; --none-off takes the mark off, and so does riffle undo).",
      "Findings count only answers a person has read."
    })
final class CodeCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Mixin CodingOptions options;

  @Option(names = "--answer", required = true, paramLabel = "ID", description = "The answer's id.")
  long answer;

  @ArgGroup(multiplicity = "1")
  What what;

  static final class What {
    @Option(names = "--add", paramLabel = "CODE", description = "Give this code.")
    String add;

    @Option(names = "--remove", paramLabel = "CODE", description = "Take this code off.")
    String remove;

    @Option(names = "--accept", paramLabel = "CODE", description = "Accept this suggested code.")
    String accept;

    @Option(names = "--none", description = "Mark the answer as read: no (other) code applies.")
    boolean none;

    @Option(names = "--none-off", description = "Take the --none mark off the answer.")
    boolean noneOff;
  }

  @Option(
      names = "--span",
      paramLabel = "START:END",
      description = "Character offsets into the masked answer of the words that carry the code.")
  String span;

  @Override
  public Integer call() throws InputException {
    Optional<Span> marked = span == null ? Optional.empty() : Optional.of(span(span));
    if (marked.isPresent() && what.add == null) {
      throw new InputException("--span goes with --add");
    }
    return CodesCommand.change(
        spec,
        options,
        (p, coder) -> {
          if (what.add != null) {
            return p.coding().assign(coder, answer, p.codebook().code(what.add).id(), marked);
          }
          if (what.remove != null) {
            return p.coding().unassign(coder, answer, p.codebook().code(what.remove).id());
          }
          if (what.none) {
            return p.coding().markRead(coder, answer);
          }
          if (what.noneOff) {
            return p.coding().unmarkRead(coder, answer);
          }
          return p.coding().accept(coder, answer, p.codebook().code(what.accept).id());
        });
  }

  static Span span(String text) {
    String[] parts = text.split(":", -1);
    try {
      if (parts.length == 2) {
        return new Span(Integer.parseInt(parts[0].strip()), Integer.parseInt(parts[1].strip()));
      }
    } catch (NumberFormatException e) {
      // reported below
    }
    throw new InputException(
        "--span " + text + ": write the start and end offsets as START:END, such as 4:17");
  }
}
