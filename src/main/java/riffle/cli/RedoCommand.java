package riffle.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;
import riffle.model.InputException;

/** {@code riffle redo}: makes again the change the coder took back most recently. */
@Command(
    name = "redo",
    mixinStandardHelpOptions = true,
    description = "Makes again the change you took back most recently (until you make a new one).")
final class RedoCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Mixin CodingOptions options;

  @Override
  public Integer call() throws InputException {
    return CodesCommand.change(spec, options, (p, coder) -> p.coding().redo(coder));
  }
}
