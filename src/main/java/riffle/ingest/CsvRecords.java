package riffle.ingest;

import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Splits decoded text into records with Commons CSV, keeping the physical line each starts on.
 *
 * <p>The format is RFC 4180 with the given delimiter, double quotes, no escape character, no
 * comments, empty lines kept as records (so line numbers stay exact) and text after a closing quote
 * kept rather than rejected. Values are not trimmed.
 */
final class CsvRecords {
  /** One record and the 1-based physical line it starts on. */
  record Raw(long line, String[] cells) {}

  static final String UNCLOSED =
      "a quote opened here is never closed; check this answer in the file or re-export";

  private CsvRecords() {}

  static CSVFormat format(Delimiter d) {
    return CSVFormat.DEFAULT
        .builder()
        .setDelimiter(d.character())
        .setQuote('"')
        .setEscape(null)
        .setCommentMarker(null)
        .setIgnoreEmptyLines(false)
        .setIgnoreSurroundingSpaces(false)
        .setTrim(false)
        .setTrailingData(true)
        .setLenientEof(false)
        .get();
  }

  /**
   * Reads every record.
   *
   * @throws BadInput when a quote is never closed, positioned where it opened
   */
  static List<Raw> read(String text, Delimiter d) throws BadInput {
    List<Raw> records = new ArrayList<>();
    int pos = 0;
    long line = 1;
    try (CSVParser parser = CSVParser.parse(new StringReader(text), format(d))) {
      for (CSVRecord r : parser) {
        int start = (int) r.getCharacterPosition();
        while (pos < start) {
          char c = text.charAt(pos++);
          if (c == '\n') {
            line++;
          } else if (c == '\r') {
            if (pos < text.length() && text.charAt(pos) == '\n') {
              pos++;
            }
            line++;
          }
        }
        records.add(new Raw(line, r.values()));
      }
    } catch (IOException | UncheckedIOException e) {
      long[] at = QuoteScanner.unclosedQuote(text, d.character());
      if (at != null) {
        throw new BadInput(at[0], (int) at[1], UNCLOSED);
      }
      throw new BadInput(
          line,
          0,
          "cannot read the record here ("
              + e.getMessage()
              + "); check this part of the file or re-export the survey as CSV");
    }
    return records;
  }
}
