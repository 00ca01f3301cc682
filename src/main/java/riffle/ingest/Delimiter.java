package riffle.ingest;

import java.util.Locale;
import java.util.Optional;
import riffle.model.InputException;

/** The character that separates the fields of a survey export. */
public enum Delimiter {
  /** {@code ,} — the usual CSV separator. */
  COMMA(','),
  /** {@code ;} — what spreadsheets write in locales where the comma is the decimal mark. */
  SEMICOLON(';'),
  /** A tab — TSV files and cells copied from a spreadsheet. */
  TAB('\t'),
  /** {@code |} — some survey tools' "pipe-separated" exports. */
  PIPE('|');

  private static final String ACCEPTED = "auto, comma (,), semicolon (;), tab (\\t) or pipe (|)";

  private final char character;

  Delimiter(char character) {
    this.character = character;
  }

  /** Returns the separating character. */
  public char character() {
    return character;
  }

  /** Returns the lower-case name used in messages and in the {@code --delimiter} option. */
  public String label() {
    return name().toLowerCase(Locale.ROOT);
  }

  /**
   * Parses a {@code --delimiter} value.
   *
   * @param s {@code auto}, {@code ,}, {@code comma}, {@code ;}, {@code semicolon}, {@code tab},
   *     {@code \t} (backslash and t, or a real tab), {@code |} or {@code pipe}; case and
   *     surrounding spaces do not matter
   * @return the delimiter, or empty for {@code auto} (sniff it from the file)
   * @throws IllegalArgumentException for anything else, listing the accepted values
   */
  public static Optional<Delimiter> parse(String s) {
    if (s == null) {
      throw new InputException("missing delimiter; use " + ACCEPTED);
    }
    if (s.equals("\t")) {
      return Optional.of(TAB);
    }
    String v = s.strip().toLowerCase(Locale.ROOT);
    switch (v) {
      case "auto":
        return Optional.empty();
      case ",":
      case "comma":
        return Optional.of(COMMA);
      case ";":
      case "semicolon":
        return Optional.of(SEMICOLON);
      case "tab":
      case "\\t":
        return Optional.of(TAB);
      case "|":
      case "pipe":
        return Optional.of(PIPE);
      default:
        throw new InputException("unknown delimiter '" + s + "'; use " + ACCEPTED);
    }
  }

  /** Returns the delimiter for a character, if it is one of the four. */
  static Optional<Delimiter> of(char c) {
    for (Delimiter d : values()) {
      if (d.character == c) {
        return Optional.of(d);
      }
    }
    return Optional.empty();
  }
}
