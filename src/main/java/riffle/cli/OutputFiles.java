package riffle.cli;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import riffle.model.InputException;
import riffle.model.InputProblem;

/**
 * Writing the files commands are asked for, whole or not at all, with a clear message when that
 * fails. The contents go to a new temporary file beside the target (same folder, so the same file
 * system), which is moved into the target's place only once everything is written: a failure
 * halfway, a full disk or a workbook cell too long, leaves the target as it was (absent, or the
 * previous file) and removes the temporary file.
 */
final class OutputFiles {
  private OutputFiles() {}

  /** What writes a file's contents into a stream (which the caller closes). */
  @FunctionalInterface
  interface Contents {
    void writeTo(OutputStream out) throws IOException, InputException;
  }

  /** Writes the text as UTF-8. */
  static void write(Path file, String text) throws InputException {
    write(file, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
  }

  /** Writes what {@code contents} writes. */
  static void write(Path file, Contents contents) throws InputException {
    Path target = file.toAbsolutePath();
    if (Files.isDirectory(target)) {
      // Moving into place would replace an empty folder.
      throw new InputException(
          new InputProblem(file.toString(), 0, 0, "is a folder; give the name of a file to write"));
    }
    Path part =
        target.resolveSibling(
            "."
                + target.getFileName()
                + "."
                + ProcessHandle.current().pid()
                + "-"
                + Long.toHexString(System.nanoTime())
                + ".part");
    try {
      try (OutputStream out =
          new BufferedOutputStream(
              Files.newOutputStream(part, StandardOpenOption.CREATE_NEW), 1 << 16)) {
        contents.writeTo(out);
      }
      try {
        Files.move(
            part, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
      } catch (AtomicMoveNotSupportedException e) {
        Files.move(part, target, StandardCopyOption.REPLACE_EXISTING);
      }
    } catch (IOException e) {
      throw new InputException(
          new InputProblem(
              file.toString(),
              0,
              0,
              "cannot be written (" + e.getMessage() + "); check the folder"));
    } finally {
      try {
        Files.deleteIfExists(part);
      } catch (IOException e) {
        // The temporary file stays behind; the message above (or the file written) says enough.
      }
    }
  }
}
