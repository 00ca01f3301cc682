package riffle.ingest;

import java.util.Locale;

/**
 * Which comes first in a date written with numbers only and the year last: the day or the month.
 */
public enum DateOrder {
  /** {@code 03.04.2026} is 3 April 2026. */
  DMY("day-first"),
  /** {@code 04/03/2026} is April 3, 2026. */
  MDY("month-first");

  private final String label;

  DateOrder(String label) {
    this.label = label;
  }

  /** The order in words: {@code day-first} or {@code month-first}. */
  public String label() {
    return label;
  }

  /** Reads {@code dmy} or {@code mdy}, in any case. */
  public static DateOrder parse(String value) {
    return switch (value.strip().toLowerCase(Locale.ROOT)) {
      case "dmy" -> DMY;
      case "mdy" -> MDY;
      default ->
          throw new riffle.model.SettingException(
              "date order",
              "the date order is dmy (day first, 31.12.2026) or mdy (month first, 12/31/2026), not '"
                  + value
                  + "'");
    };
  }
}
