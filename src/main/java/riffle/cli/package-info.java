/**
 * The command line: {@code riffle COMMAND}. Every command prints text for people by default and one
 * JSON document on stdout with {@code --json}. Exit codes: 0 done, 1 internal failure, 2 bad input
 * or usage (the message on stderr names the file, line and column where there is one).
 */
package riffle.cli;
