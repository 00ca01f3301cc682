package riffle.ingest;

import java.nio.charset.StandardCharsets;

/** Test helpers: read a CSV written in the test as UTF-8 bytes. */
final class Csv {
  private Csv() {}

  static SurveyTable read(String text) throws UnreadableInputException {
    return read(text, ImportSettings.builder().get());
  }

  static SurveyTable read(String text, ImportSettings settings) throws UnreadableInputException {
    return SurveyReader.readBytes("test.csv", text.getBytes(StandardCharsets.UTF_8), settings);
  }

  /** Joins lines with LF and ends with one. */
  static String lines(String... lines) {
    return String.join("\n", lines) + "\n";
  }
}
