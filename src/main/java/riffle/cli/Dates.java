package riffle.cli;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import picocli.CommandLine;

/** Reads {@code YYYY-MM-DD} options with a message that shows the expected form. */
final class Dates implements CommandLine.ITypeConverter<LocalDate> {
  @Override
  public LocalDate convert(String value) {
    try {
      return LocalDate.parse(value.strip());
    } catch (DateTimeParseException e) {
      throw new CommandLine.TypeConversionException(
          "'" + value + "' is not a date; write it as YYYY-MM-DD, for example 2026-03-15");
    }
  }
}
