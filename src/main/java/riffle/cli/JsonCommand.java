package riffle.cli;

/** A command that can print one JSON document instead of text. */
interface JsonCommand {
  /** True when the user asked for {@code --json}. */
  boolean json();
}
