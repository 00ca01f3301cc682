package riffle.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;
import riffle.app.ImportReport;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.app.Project;
import riffle.model.ColumnRole;
import riffle.model.InputProblem;

/** {@code riffle import}: brings one survey export in as (part of) a wave. */
@Command(
    name = "import",
    mixinStandardHelpOptions = true,
    description = {
      "Brings a survey export (CSV/TSV file, an Excel .xlsx workbook's sheet, or cells pasted on"
          + " standard input) in as a wave.",
      "Encoding, delimiter and column roles are detected unless named. Importing the same "
          + "rows into the same wave again adds nothing. An unusable file changes nothing and "
          + "exits 2."
    })
final class ImportCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @ParentCommand Main main;

  @Option(
      names = "--project",
      required = true,
      paramLabel = "P",
      description = "Project file (NAME.riffle); created when missing.")
  Path project;

  @ArgGroup(multiplicity = "1")
  Input input;

  static final class Input {
    @Option(names = "--file", paramLabel = "F", description = "The export to read.")
    Path file;

    @Option(
        names = "--paste",
        description = "Read cells pasted from a spreadsheet (tab-separated text) from stdin.")
    boolean paste;
  }

  @Option(
      names = "--wave",
      paramLabel = "NAME",
      description = "Wave to import into (default: the file's name, or \"Wave N\" for a paste).")
  String wave;

  @Option(
      names = "--date",
      paramLabel = "YYYY-MM-DD",
      converter = Dates.class,
      description = "When the wave was fielded (default: the latest answer date, else today).")
  LocalDate date;

  @Option(
      names = "--date-order",
      paramLabel = "ORDER",
      description =
          "How numeric dates read: dmy (31.12.2026), mdy (12/31/2026) or auto (default: decided"
              + " from the date column; asked for when it cannot be told).")
  String dateOrder;

  @Option(
      names = "--text-column",
      paramLabel = "C",
      description = "An open-text question column (repeatable); detected when none is named.")
  List<String> textColumns = new ArrayList<>();

  @Option(names = "--id-column", paramLabel = "C", description = "Respondent id column.")
  String idColumn;

  @Option(names = "--date-column", paramLabel = "C", description = "Response date column.")
  String dateColumn;

  @Option(
      names = "--codes-column",
      paramLabel = "C",
      description =
          "Codes assigned elsewhere, separated by ; or | (repeatable); they belong to the"
              + " nearest question column on the left.")
  List<String> codesColumns = new ArrayList<>();

  @Option(names = "--coder-column", paramLabel = "C", description = "Who assigned those codes.")
  String coderColumn;

  @Option(
      names = "--meta-column",
      paramLabel = "C",
      description = "A segment column to keep, such as device or plan (repeatable).")
  List<String> metaColumns = new ArrayList<>();

  @Option(
      names = "--skip-column",
      paramLabel = "C",
      description = "A column not to import, whatever it looks like (repeatable).")
  List<String> skippedColumns = new ArrayList<>();

  @Option(
      names = "--delimiter",
      paramLabel = "auto|,|;|tab|pipe",
      defaultValue = "auto",
      description = "Field delimiter (default: ${DEFAULT-VALUE}).")
  String delimiter;

  @Option(
      names = "--encoding",
      paramLabel = "auto|NAME",
      defaultValue = "auto",
      description = "Text encoding, such as UTF-8 or windows-1252 (default: ${DEFAULT-VALUE}).")
  String encoding;

  @Option(
      names = "--max-mb",
      paramLabel = "N",
      defaultValue = "100",
      description = "Refuse exports larger than N MiB (default: ${DEFAULT-VALUE}).")
  long maxMb;

  @Option(
      names = "--max-columns",
      paramLabel = "N",
      defaultValue = "1000",
      description = "Refuse exports with more than N columns (default: ${DEFAULT-VALUE}).")
  int maxColumns;

  @Option(
      names = "--sheet",
      paramLabel = "NAME|N",
      description =
          "The sheet of an .xlsx workbook to read, by name or number (default: the first visible"
              + " sheet with data).")
  String sheet;

  @Mixin JsonOption json;

  @Override
  public Integer call() throws IOException {
    ImportSource source =
        input.paste
            ? new ImportSource.Paste(new String(main.in.readAllBytes(), StandardCharsets.UTF_8))
            : new ImportSource.File(input.file);
    ImportRequest.Builder request =
        ImportRequest.from(source)
            .wave(wave)
            .fieldedOn(date)
            .dateOrder(dateOrder)
            .actor(Actor.current())
            .delimiter(delimiter)
            .encoding(encoding)
            .maxMegabytes(maxMb)
            .maxColumns(maxColumns)
            .sheet(sheet);
    textColumns.forEach(request::textColumn);
    codesColumns.forEach(request::codesColumn);
    metaColumns.forEach(request::metaColumn);
    skippedColumns.forEach(request::skippedColumn);
    if (idColumn != null) {
      request.idColumn(idColumn);
    }
    if (dateColumn != null) {
      request.dateColumn(dateColumn);
    }
    if (coderColumn != null) {
      request.coderColumn(coderColumn);
    }
    ImportReport report = Project.importInto(project, request.get(), TerminalProgress.forStderr());
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      JsonOutput.print(out, report);
    } else {
      print(out, report);
    }
    return 0;
  }

  private static void print(PrintWriter out, ImportReport r) {
    out.printf(
        Locale.ROOT,
        "Imported into wave \"%s\" (fielded %s: %s) from %s%n",
        r.wave(),
        r.fieldedOn(),
        r.dated(),
        r.source());
    if (r.readFromWorkbook()) {
      out.printf(Locale.ROOT, "  read from the %s%n", r.encoding());
    } else {
      out.printf(Locale.ROOT, "  read as %s, %s-separated%n", r.encoding(), r.delimiter());
    }
    out.println("  columns:");
    for (ImportReport.ColumnReport c : r.columns()) {
      out.printf(Locale.ROOT, "    %-14s %s  (%s)%n", roleLabel(c.role()), c.header(), c.reason());
    }
    out.printf(
        Locale.ROOT,
        "  %d rows read: %d answers added, %d rows already there (duplicates), %d rows skipped%n",
        r.rows(),
        r.answers(),
        r.duplicates(),
        r.skipped());
    if (r.codesCreated() > 0 || r.assignments() > 0) {
      out.printf(
          Locale.ROOT,
          "  %d imported code assignments, %d new codes in the codebook%n",
          r.assignments(),
          r.codesCreated());
    }
    if (!r.problems().isEmpty()) {
      out.printf(Locale.ROOT, "  %d problems:%n", r.problems().size());
      for (InputProblem p : r.problems()) {
        out.println("    " + p);
      }
    }
  }

  static String roleLabel(ColumnRole role) {
    return switch (role) {
      case ID -> "respondent id";
      case DATE -> "date";
      case TEXT -> "question";
      case META -> "segment";
      case CODES -> "codes";
      case CODER -> "coder";
      case IGNORED -> "not kept";
    };
  }
}
