package riffle.ingest;

import java.nio.charset.Charset;
import java.nio.charset.IllegalCharsetNameException;
import java.nio.charset.UnsupportedCharsetException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import riffle.model.InputException;
import riffle.model.SettingException;

/**
 * How to read one survey export: delimiter and encoding (or sniff them), the columns the analyst
 * named for each role, and the limits. Immutable and safe to share; build one with {@link
 * #builder()}.
 *
 * <p>Naming columns for a role replaces detection of that role: when any text column is named, no
 * other column is detected as text, and the same holds for every other role.
 */
public final class ImportSettings {
  /** Default {@link #maxBytes()}: 100 MiB. */
  public static final long DEFAULT_MAX_BYTES = 100L * 1024 * 1024;

  /** Default {@link #maxProblems()}. */
  public static final int DEFAULT_MAX_PROBLEMS = 200;

  /**
   * Default {@link #maxColumns()}: 1,000, several times the widest survey exports seen in practice
   * (a few hundred columns with every matrix item and embedded field), while a file of thousands of
   * columns would make thousands of questions per row to analyse.
   */
  public static final int DEFAULT_MAX_COLUMNS = 1_000;

  private final Optional<Delimiter> delimiter;
  private final Optional<Charset> encoding;
  private final List<String> textColumns;
  private final Optional<String> idColumn;
  private final Optional<String> dateColumn;
  private final List<String> codesColumns;
  private final Optional<String> coderColumn;
  private final List<String> metaColumns;
  private final List<String> skippedColumns;
  private final long maxBytes;
  private final int maxProblems;
  private final int maxColumns;
  private final Optional<DateOrder> dateOrder;
  private final Optional<String> sheet;

  private ImportSettings(Builder b) {
    this.delimiter = Optional.ofNullable(b.delimiter);
    this.encoding = Optional.ofNullable(b.encoding);
    this.textColumns = List.copyOf(b.textColumns);
    this.idColumn = Optional.ofNullable(b.idColumn);
    this.dateColumn = Optional.ofNullable(b.dateColumn);
    this.codesColumns = List.copyOf(b.codesColumns);
    this.coderColumn = Optional.ofNullable(b.coderColumn);
    this.metaColumns = List.copyOf(b.metaColumns);
    this.skippedColumns = List.copyOf(b.skippedColumns);
    this.maxBytes = b.maxBytes;
    this.maxProblems = b.maxProblems;
    this.maxColumns = b.maxColumns;
    this.dateOrder = Optional.ofNullable(b.dateOrder);
    this.sheet = Optional.ofNullable(b.sheet);
  }

  /** Whether numeric dates are day-first or month-first; empty to decide from the date column. */
  public Optional<DateOrder> dateOrder() {
    return dateOrder;
  }

  /** Returns a builder with every option on auto and the default limits. */
  public static Builder builder() {
    return new Builder();
  }

  /** Returns the settings with every option on auto and the default limits. */
  public static ImportSettings defaults() {
    return builder().get();
  }

  /** Returns the delimiter to use; empty means sniff it. */
  public Optional<Delimiter> delimiter() {
    return delimiter;
  }

  /** Returns the encoding to decode with; empty means sniff it. */
  public Optional<Charset> encoding() {
    return encoding;
  }

  /** Returns the header names of the open-text columns the analyst named, in the order given. */
  public List<String> textColumns() {
    return textColumns;
  }

  /** Returns the header name of the respondent id column, if named. */
  public Optional<String> idColumn() {
    return idColumn;
  }

  /** Returns the header name of the answer date column, if named. */
  public Optional<String> dateColumn() {
    return dateColumn;
  }

  /** Returns the header names of the columns holding codes assigned elsewhere. */
  public List<String> codesColumns() {
    return codesColumns;
  }

  /** Returns the header name of the column saying who assigned the codes, if named. */
  public Optional<String> coderColumn() {
    return coderColumn;
  }

  /** Returns the header names of the segment columns to keep. */
  public List<String> metaColumns() {
    return metaColumns;
  }

  /**
   * Returns the header names of the columns not to import, whatever detection would make of them.
   */
  public List<String> skippedColumns() {
    return skippedColumns;
  }

  /** Returns the largest input accepted, in bytes. */
  public long maxBytes() {
    return maxBytes;
  }

  /** Returns how many problems are listed before the rest are only counted. */
  public int maxProblems() {
    return maxProblems;
  }

  /** Returns the most columns a header may have. */
  public int maxColumns() {
    return maxColumns;
  }

  /**
   * Returns the sheet of a workbook to read, by name or 1-based number; empty means the first
   * visible sheet with data. Text inputs have no sheets.
   */
  public Optional<String> sheet() {
    return sheet;
  }

  /** Returns each named column with the option that named it, in a fixed option order. */
  Map<String, List<String>> namedColumns() {
    Map<String, List<String>> named = new LinkedHashMap<>();
    named.put(Builder.TEXT, textColumns);
    named.put(Builder.ID, idColumn.map(List::of).orElse(List.of()));
    named.put(Builder.DATE, dateColumn.map(List::of).orElse(List.of()));
    named.put(Builder.CODES, codesColumns);
    named.put(Builder.CODER, coderColumn.map(List::of).orElse(List.of()));
    named.put(Builder.META, metaColumns);
    named.put(Builder.SKIP, skippedColumns);
    return named;
  }

  @Override
  public String toString() {
    return "ImportSettings[delimiter="
        + delimiter.map(Delimiter::label).orElse("auto")
        + ", encoding="
        + encoding.map(Charset::name).orElse("auto")
        + ", named="
        + namedColumns()
        + ", maxBytes="
        + maxBytes
        + ", maxProblems="
        + maxProblems
        + ", maxColumns="
        + maxColumns
        + sheet.map(n -> ", sheet=" + n).orElse("")
        + "]";
  }

  /**
   * Collects import options; {@link #get()} validates them together. Not thread-safe; each setter
   * returns this builder.
   */
  public static final class Builder {
    static final String TEXT = "text column";
    static final String ID = "id column";
    static final String DATE = "date column";
    static final String CODES = "codes column";
    static final String CODER = "coder column";
    static final String META = "segment column";
    static final String SKIP = "skipped column";

    private Delimiter delimiter;
    private Charset encoding;
    private final List<String> textColumns = new ArrayList<>();
    private String idColumn;
    private String dateColumn;
    private final List<String> codesColumns = new ArrayList<>();
    private String coderColumn;
    private final List<String> metaColumns = new ArrayList<>();
    private final List<String> skippedColumns = new ArrayList<>();
    private long maxBytes = DEFAULT_MAX_BYTES;
    private int maxProblems = DEFAULT_MAX_PROBLEMS;
    private int maxColumns = DEFAULT_MAX_COLUMNS;
    private DateOrder dateOrder;
    private String sheet;

    private Builder() {}

    /**
     * Sets the order of numeric dates.
     *
     * @param order day-first or month-first, or null to decide from the date column
     */
    public Builder dateOrder(DateOrder order) {
      this.dateOrder = order;
      return this;
    }

    /**
     * Sets the delimiter.
     *
     * @param delimiter the delimiter, or null to sniff it
     */
    public Builder delimiter(Delimiter delimiter) {
      this.delimiter = delimiter;
      return this;
    }

    /**
     * Sets the encoding by name.
     *
     * @param name {@code auto} (or null) to sniff it, or a charset name such as {@code UTF-8},
     *     {@code windows-1252}, {@code UTF-16LE}
     * @throws IllegalArgumentException for a name this Java runtime does not know
     */
    public Builder encoding(String name) {
      if (name == null || name.strip().equalsIgnoreCase("auto")) {
        this.encoding = null;
        return this;
      }
      try {
        this.encoding = Charset.forName(name.strip());
      } catch (IllegalCharsetNameException | UnsupportedCharsetException e) {
        throw new InputException(
            "unknown encoding '"
                + name
                + "'; use auto or a name such as UTF-8, windows-1252, UTF-16LE",
            e);
      }
      return this;
    }

    /** Adds an open-text column by header name; repeatable. */
    public Builder textColumn(String header) {
      textColumns.add(checkName(header, TEXT));
      return this;
    }

    /** Sets the respondent id column by header name (null clears it). */
    public Builder idColumn(String header) {
      this.idColumn = header == null ? null : checkName(header, ID);
      return this;
    }

    /** Sets the answer date column by header name (null clears it). */
    public Builder dateColumn(String header) {
      this.dateColumn = header == null ? null : checkName(header, DATE);
      return this;
    }

    /** Adds a column of codes assigned elsewhere, by header name; repeatable. */
    public Builder codesColumn(String header) {
      codesColumns.add(checkName(header, CODES));
      return this;
    }

    /** Sets the column saying who assigned the codes, by header name (null clears it). */
    public Builder coderColumn(String header) {
      this.coderColumn = header == null ? null : checkName(header, CODER);
      return this;
    }

    /** Adds a segment column to keep, by header name; repeatable. */
    public Builder metaColumn(String header) {
      metaColumns.add(checkName(header, META));
      return this;
    }

    /** Adds a column not to import, by header name; repeatable. */
    public Builder skippedColumn(String header) {
      skippedColumns.add(checkName(header, SKIP));
      return this;
    }

    /** Sets the largest input accepted, in bytes; must be positive. */
    public Builder maxBytes(long maxBytes) {
      this.maxBytes = maxBytes;
      return this;
    }

    /** Sets how many problems are listed before the rest are only counted; must be positive. */
    public Builder maxProblems(int maxProblems) {
      this.maxProblems = maxProblems;
      return this;
    }

    /** Sets the most columns a header may have; must be positive. */
    public Builder maxColumns(int maxColumns) {
      this.maxColumns = maxColumns;
      return this;
    }

    /**
     * Sets the sheet of a workbook to read.
     *
     * @param sheet a sheet's name or 1-based number, or null (or blank) for the first visible sheet
     *     with data
     */
    public Builder sheet(String sheet) {
      this.sheet = sheet == null || sheet.isBlank() ? null : sheet.strip();
      return this;
    }

    /**
     * Validates the options together and returns the settings.
     *
     * @throws IllegalArgumentException when one column is named for two roles (the message names
     *     both options and the fix), or a limit is not positive
     */
    public ImportSettings get() {
      if (maxBytes <= 0) {
        throw new InputException(
            "the max size must be positive, not " + maxBytes + " bytes; give 1 MiB or more");
      }
      if (maxProblems <= 0) {
        throw new InputException(
            "the number of problems listed must be positive, got " + maxProblems);
      }
      if (maxColumns <= 0) {
        throw new InputException(
            "the column limit must be positive, got " + maxColumns + "; give 1 or more");
      }
      dedupe(textColumns);
      dedupe(codesColumns);
      dedupe(metaColumns);
      dedupe(skippedColumns);
      ImportSettings settings = new ImportSettings(this);
      Map<String, String> optionByName = new LinkedHashMap<>();
      for (Map.Entry<String, List<String>> e : settings.namedColumns().entrySet()) {
        for (String name : e.getValue()) {
          String key = key(name);
          String earlier = optionByName.putIfAbsent(key, e.getKey());
          if (earlier != null && !earlier.equals(e.getKey())) {
            throw new InputException(
                "column '"
                    + name
                    + "' is given two roles, "
                    + earlier
                    + " and "
                    + e.getKey()
                    + "; a column has one role, so keep only one of the two for it");
          }
        }
      }
      return settings;
    }

    private static String checkName(String header, String option) {
      Objects.requireNonNull(header, option);
      String name = header.strip();
      if (name.isEmpty()) {
        throw new SettingException(option, "the " + option + " needs a name, not a blank one");
      }
      return name;
    }

    private static void dedupe(List<String> names) {
      List<String> seen = new ArrayList<>();
      names.removeIf(
          n -> {
            String k = key(n);
            if (seen.contains(k)) {
              return true;
            }
            seen.add(k);
            return false;
          });
    }

    private static String key(String name) {
      return HeaderNames.collapse(name).toLowerCase(Locale.ROOT);
    }
  }
}
