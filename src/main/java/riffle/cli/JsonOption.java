package riffle.cli;

import picocli.CommandLine.Option;

/** The {@code --json} option every command shares; a failure then also prints its error as JSON. */
final class JsonOption {
  @Option(names = "--json", description = "Print one JSON document instead of text.")
  boolean enabled;
}
