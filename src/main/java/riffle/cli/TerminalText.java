package riffle.cli;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import riffle.model.ControlChars;

/**
 * The one way the command line prints: everything written to standard output and standard error
 * passes through here, so that no answer, name or message can steer the terminal. Each character
 * {@link ControlChars#isControl} marks (ESC, C1 controls, bidirectional overrides …) and a carriage
 * return that does not end a line before its line feed are written as visible escapes such as
 * {@code \u001B}. Inside a JSON string that escape is the JSON escape of the same character, so
 * {@code --json} output stays valid and means the same; text output shows it as written. Not
 * thread-safe, like the writer it wraps.
 */
final class TerminalText extends FilterWriter {
  private boolean carriageReturn;

  private TerminalText(Writer out) {
    super(out);
  }

  /** A writer to {@code stream} (UTF-8, flushed on every line) that escapes control characters. */
  static PrintWriter writer(PrintStream stream) {
    return new PrintWriter(
        new TerminalText(new OutputStreamWriter(stream, StandardCharsets.UTF_8)), true);
  }

  @Override
  public void write(int c) throws IOException {
    StringBuilder sb = new StringBuilder(8);
    put(sb, (char) c);
    out.write(sb.toString());
  }

  @Override
  public void write(char[] cbuf, int off, int len) throws IOException {
    StringBuilder sb = new StringBuilder(len + 8);
    for (int i = off; i < off + len; i++) {
      put(sb, cbuf[i]);
    }
    out.write(sb.toString());
  }

  @Override
  public void write(String str, int off, int len) throws IOException {
    StringBuilder sb = new StringBuilder(len + 8);
    for (int i = off; i < off + len; i++) {
      put(sb, str.charAt(i));
    }
    out.write(sb.toString());
  }

  @Override
  public void flush() throws IOException {
    StringBuilder sb = new StringBuilder(8);
    end(sb);
    out.write(sb.toString());
    out.flush();
  }

  @Override
  public void close() throws IOException {
    flush();
    out.close();
  }

  private void put(StringBuilder sb, char c) {
    if (carriageReturn) {
      carriageReturn = false;
      sb.append(c == '\n' ? "\r" : ControlChars.escape('\r'));
    }
    if (c == '\r') {
      carriageReturn = true;
    } else if (ControlChars.isControl(c)) {
      sb.append(ControlChars.escape(c));
    } else {
      sb.append(c);
    }
  }

  /** A carriage return still waiting for its line feed when output stops is shown as one. */
  private void end(StringBuilder sb) {
    if (carriageReturn) {
      carriageReturn = false;
      sb.append(ControlChars.escape('\r'));
    }
  }
}
