package riffle.app;

import java.time.LocalDate;
import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import riffle.ingest.DateOrder;
import riffle.ingest.Delimiter;
import riffle.ingest.ImportSettings;
import riffle.model.ColumnRole;
import riffle.model.ControlChars;
import riffle.model.InputException;
import riffle.model.SettingException;

/**
 * One import: what to read, into which wave, and how to read it. Built by {@link #from}; the
 * reading options are checked by {@link Builder#get()}.
 */
public final class ImportRequest {
  private final ImportSource source;
  private final Optional<String> wave;
  private final Optional<LocalDate> fieldedOn;
  private final ImportSettings settings;
  private final String actor;

  private ImportRequest(Builder b) {
    this.source = b.source;
    this.wave = Optional.ofNullable(b.wave);
    this.fieldedOn = Optional.ofNullable(b.fieldedOn);
    this.settings = b.settings.get();
    this.actor = b.actor;
  }

  /** Starts a request to import {@code source}. */
  public static Builder from(ImportSource source) {
    return new Builder(source);
  }

  /** The export. */
  public ImportSource source() {
    return source;
  }

  /** The wave's name; when empty, the file's base name (or "Wave N" for a paste). */
  public Optional<String> wave() {
    return wave;
  }

  /**
   * When the wave was fielded; when empty, the stored date of an existing wave, else the latest
   * answer date in the export, else today.
   */
  public Optional<LocalDate> fieldedOn() {
    return fieldedOn;
  }

  ImportSettings settings() {
    return settings;
  }

  /** Who runs the import, for the audit log. */
  public String actor() {
    return actor;
  }

  /** Collects a request; every reading option defaults to detection. */
  public static final class Builder {
    private final ImportSource source;
    private final ImportSettings.Builder settings = ImportSettings.builder();
    private String wave;
    private LocalDate fieldedOn;
    private String actor = "analyst";
    private final Map<ColumnRole, String> singles = new EnumMap<>(ColumnRole.class);

    private Builder(ImportSource source) {
      this.source = Objects.requireNonNull(source, "source");
    }

    /**
     * The wave to import into.
     *
     * @throws IllegalArgumentException when the name holds a line break or a control character
     */
    public Builder wave(String name) {
      this.wave = name == null ? null : ControlChars.checkName("the wave name", name);
      return this;
    }

    /** When the wave was fielded. */
    public Builder fieldedOn(LocalDate date) {
      this.fieldedOn = date;
      return this;
    }

    /** Who runs the import. */
    public Builder actor(String name) {
      this.actor = Objects.requireNonNull(name, "actor");
      return this;
    }

    /** {@code auto}, {@code ,}, {@code ;}, {@code tab} or {@code pipe}. */
    public Builder delimiter(String delimiter) {
      settings.delimiter(Delimiter.parse(delimiter).orElse(null));
      return this;
    }

    /** {@code auto} or a charset name such as {@code windows-1252}. */
    public Builder encoding(String encoding) {
      settings.encoding(encoding);
      return this;
    }

    /** {@code dmy} or {@code mdy}: how to read numeric dates; null or {@code auto} to decide. */
    public Builder dateOrder(String order) {
      settings.dateOrder(
          order == null || order.strip().equalsIgnoreCase("auto") ? null : DateOrder.parse(order));
      return this;
    }

    /** Refuse exports larger than this many MiB. */
    public Builder maxMegabytes(long megabytes) {
      if (megabytes <= 0 || megabytes > 1L << 20) {
        throw new SettingException(
            "max size", "the max size must be from 1 to " + (1L << 20) + " MiB, not " + megabytes);
      }
      settings.maxBytes(megabytes << 20);
      return this;
    }

    /** Refuse exports whose header has more columns than this. */
    public Builder maxColumns(int columns) {
      settings.maxColumns(columns);
      return this;
    }

    /** The sheet of a workbook to read, by name or 1-based number; null for the default. */
    public Builder sheet(String sheet) {
      settings.sheet(sheet);
      return this;
    }

    /** An open-text question column; repeatable. */
    public Builder textColumn(String header) {
      settings.textColumn(header);
      return this;
    }

    /** The respondent id column. */
    public Builder idColumn(String header) {
      settings.idColumn(header);
      return this;
    }

    /** The response date column. */
    public Builder dateColumn(String header) {
      settings.dateColumn(header);
      return this;
    }

    /** A column of codes assigned elsewhere; repeatable. */
    public Builder codesColumn(String header) {
      settings.codesColumn(header);
      return this;
    }

    /** The column naming who assigned the codes. */
    public Builder coderColumn(String header) {
      settings.coderColumn(header);
      return this;
    }

    /** A segment column to keep; repeatable. */
    public Builder metaColumn(String header) {
      settings.metaColumn(header);
      return this;
    }

    /** A column not to import, whatever detection would make of it; repeatable. */
    public Builder skippedColumn(String header) {
      settings.skippedColumn(header);
      return this;
    }

    /**
     * Names a column for a role, as the option for that role would ({@link ColumnRole#IGNORED}
     * skips it).
     */
    public Builder column(String header, ColumnRole role) {
      Objects.requireNonNull(role, "role");
      if (role == ColumnRole.ID || role == ColumnRole.DATE || role == ColumnRole.CODER) {
        String earlier = singles.putIfAbsent(role, header);
        if (earlier != null) {
          throw new InputException(
              "only one column can be the "
                  + role.name().toLowerCase(Locale.ROOT)
                  + " column, but both '"
                  + earlier
                  + "' and '"
                  + header
                  + "' were given that role; give one of them another role");
        }
      }
      switch (role) {
        case TEXT -> textColumn(header);
        case ID -> idColumn(header);
        case DATE -> dateColumn(header);
        case CODES -> codesColumn(header);
        case CODER -> coderColumn(header);
        case META -> metaColumn(header);
        case IGNORED -> skippedColumn(header);
      }
      return this;
    }

    /**
     * Checks the options and builds the request.
     *
     * @throws IllegalArgumentException naming the conflicting options and the fix
     */
    public ImportRequest get() {
      return new ImportRequest(this);
    }
  }
}
