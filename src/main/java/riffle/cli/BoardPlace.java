package riffle.cli;

import picocli.CommandLine.Option;
import riffle.model.QuoteSlot;

/** Which quote on the copy board a change is about: its slot and its number there. */
final class BoardPlace {
  @Option(names = "--slot", required = true, paramLabel = "SLOT")
  QuoteSlot slot;

  @Option(
      names = "--number",
      required = true,
      paramLabel = "N",
      description = "Its number in the slot (1 = first).")
  int number;

  /** The quote's place in its slot, counted from 0. */
  int index() {
    return number - 1;
  }
}
