package riffle.cli;

import picocli.CommandLine.Option;

/** The {@code --json} option every command shares. */
final class JsonOption {
  @Option(names = "--json", description = "Print one JSON document instead of text.")
  boolean enabled;
}
