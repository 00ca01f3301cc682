package riffle.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;
import riffle.model.InputException;

/** {@code riffle undo}: takes back the coder's newest change. */
@Command(
    name = "undo",
    mixinStandardHelpOptions = true,
    description = {
      "Takes back your newest change still in effect (codes given or taken off, codebook "
          + "changes, rules).",
      "Another coder's later change to the same row is left alone."
    })
final class UndoCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Mixin CodingOptions options;

  @Override
  public Integer call() throws InputException {
    return CodesCommand.change(spec, options, (p, coder) -> p.coding().undo(coder));
  }
}
