package riffle.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import riffle.model.InputException;
import riffle.model.InputProblem;

/** Writing the files commands are asked for, with a clear message when that fails. */
final class OutputFiles {
  private OutputFiles() {}

  static void write(Path file, String text) throws InputException {
    try {
      Files.writeString(file, text, StandardCharsets.UTF_8);
    } catch (IOException e) {
      throw new InputException(
          new InputProblem(
              file.toString(),
              0,
              0,
              "cannot be written (" + e.getMessage() + "); check the folder"));
    }
  }
}
