package riffle.app;

import java.nio.file.Path;
import java.util.Objects;

/** Where an import reads from: a file, or text pasted from spreadsheet cells. */
public sealed interface ImportSource {
  /**
   * A survey export on disk.
   *
   * @param path the file
   */
  record File(Path path) implements ImportSource {
    public File {
      Objects.requireNonNull(path, "path");
    }
  }

  /**
   * Cells copied from a spreadsheet.
   *
   * @param text the pasted text
   */
  record Paste(String text) implements ImportSource {
    public Paste {
      Objects.requireNonNull(text, "text");
    }
  }

  /**
   * An export already in memory, such as a demo file from the jar.
   *
   * @param name the file name to report problems against
   * @param bytes its content
   */
  record Bytes(String name, byte[] bytes) implements ImportSource {
    public Bytes {
      Objects.requireNonNull(name, "name");
      Objects.requireNonNull(bytes, "bytes");
    }
  }
}
