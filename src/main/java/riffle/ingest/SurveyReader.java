package riffle.ingest;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import riffle.model.InputProblem;

/**
 * Reads a survey export (a CSV/TSV file, one sheet of an Excel .xlsx workbook, or cells pasted from
 * a spreadsheet) into a {@link SurveyTable}. The front door of the ingest stage; stateless and
 * thread-safe.
 *
 * <p>Problems in single rows are collected in the table; an input that cannot be used at all throws
 * {@link UnreadableInputException} with a positioned message an analyst can act on.
 */
public final class SurveyReader {
  private static final long MIB = 1024L * 1024;

  private SurveyReader() {}

  /**
   * Reads an export file. Its size is checked against {@link ImportSettings#maxBytes()} before
   * anything is read.
   *
   * @param file the export
   * @param settings how to read it
   * @return the table, named after the file
   * @throws UnreadableInputException when the file is missing, too large or unusable
   */
  public static SurveyTable readFile(Path file, ImportSettings settings)
      throws UnreadableInputException {
    Objects.requireNonNull(file, "file");
    Objects.requireNonNull(settings, "settings");
    Path name = file.getFileName();
    String source = name == null ? file.toString() : name.toString();
    byte[] bytes;
    try {
      if (Files.isDirectory(file)) {
        throw unreadable(source, "is a folder, not a file; give the path of the exported CSV");
      }
      long size = Files.size(file);
      checkSize(source, size, settings, "file");
      bytes = Files.readAllBytes(file);
    } catch (NoSuchFileException e) {
      throw unreadable(source, "file not found; check the path " + file);
    } catch (AccessDeniedException e) {
      throw unreadable(source, "file cannot be read (permission denied); check its permissions");
    } catch (UnreadableInputException e) {
      throw e;
    } catch (IOException e) {
      throw unreadable(source, "file cannot be read (" + e.getMessage() + ")");
    }
    return read(source, bytes, file, settings);
  }

  /**
   * Reads an export from memory. A zip archive holding {@code xl/workbook.xml} is read as an Excel
   * workbook (see {@link WorkbookReader}), whatever its name; an old .xls, an .xlsb, an .ods or an
   * encrypted workbook is refused with what to do.
   *
   * @param source the name used in the table and in messages, usually the file name
   * @param bytes the whole export
   * @param settings how to read it
   * @throws UnreadableInputException when the input is too large or unusable
   */
  public static SurveyTable readBytes(String source, byte[] bytes, ImportSettings settings)
      throws UnreadableInputException {
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(bytes, "bytes");
    Objects.requireNonNull(settings, "settings");
    checkSize(source, bytes.length, settings, "file");
    return read(source, bytes, null, settings);
  }

  /** Reads the bytes of an export, a workbook from {@code file} when it is on disk. */
  private static SurveyTable read(String source, byte[] bytes, Path file, ImportSettings settings)
      throws UnreadableInputException {
    try {
      WorkbookReader.refuseOtherSpreadsheets(bytes);
      if (WorkbookReader.isWorkbook(bytes)) {
        return readWorkbook(
            source,
            file == null
                ? WorkbookReader.read(bytes, settings)
                : WorkbookReader.read(file, settings),
            settings);
      }
      EncodingSniffer.Decoded d = EncodingSniffer.decode(bytes, settings.encoding());
      List<EncodingSniffer.Warning> warnings = new ArrayList<>(d.warnings());
      settings
          .sheet()
          .ifPresent(
              s ->
                  warnings.add(
                      new EncodingSniffer.Warning(
                          0,
                          "the sheet setting ('"
                              + s
                              + "') applies to Excel workbooks only; this file was read as text")));
      return TableParser.parse(
          new TableParser.Input(source, d.text(), d.label(), d.detected(), warnings, false),
          settings);
    } catch (BadInput e) {
      throw new UnreadableInputException(e.at(source));
    }
  }

  /**
   * Reads one sheet of a workbook; problems in it name the file and the sheet ({@code
   * wave.xlsx:Answers:17:3}), the line being the sheet's row number and the column its number.
   */
  private static SurveyTable readWorkbook(
      String source, WorkbookReader.Sheet sheet, ImportSettings settings)
      throws UnreadableInputException {
    String at = source + ":" + sheet.name();
    try {
      return TableParser.parseSheet(
          at,
          WorkbookReader.LABEL + " (sheet '" + sheet.name() + "')",
          sheet.records(),
          sheet.notes(),
          settings);
    } catch (BadInput e) {
      throw new UnreadableInputException(e.at(at));
    }
  }

  /**
   * Reads cells pasted from a spreadsheet: tab-separated, a cell with line breaks in quotes, as
   * spreadsheets put them on the clipboard. The delimiter is still sniffed unless set (tab wins
   * ties); the encoding setting does not apply. The source is {@code "paste"}.
   *
   * @param text the pasted text, header row first
   * @param settings how to read it
   * @throws UnreadableInputException when the text is too large or unusable
   */
  public static SurveyTable readPaste(String text, ImportSettings settings)
      throws UnreadableInputException {
    Objects.requireNonNull(text, "text");
    Objects.requireNonNull(settings, "settings");
    String source = "paste";
    checkSize(source, utf8Length(text), settings, "pasted text");
    String t = !text.isEmpty() && text.charAt(0) == '\uFEFF' ? text.substring(1) : text;
    try {
      if (t.isBlank()) {
        throw new BadInput(
            "the pasted text is empty; copy the cells with the header row and paste again");
      }
      EncodingSniffer.checkText(t);
      return TableParser.parse(
          new TableParser.Input(source, t, "pasted text", false, List.of(), true), settings);
    } catch (BadInput e) {
      throw new UnreadableInputException(e.at(source));
    }
  }

  private static void checkSize(String source, long size, ImportSettings settings, String what)
      throws UnreadableInputException {
    long max = settings.maxBytes();
    if (size <= max) {
      return;
    }
    long suggested = (size + MIB - 1) / MIB;
    throw unreadable(
        source,
        what
            + " is "
            + bytes(size)
            + ", over the limit of "
            + bytes(max)
            + "; raise the max size to "
            + suggested
            + " MiB or split the export",
        "max size");
  }

  /** Formats a size in MB (1 MB = 1,048,576 bytes) from 1 MB up, else in bytes. */
  static String bytes(long n) {
    if (n >= MIB) {
      double mb = (double) n / MIB;
      return mb == Math.rint(mb)
          ? String.format(Locale.ROOT, "%d MB", (long) mb)
          : String.format(Locale.ROOT, "%.1f MB", mb);
    }
    return String.format(Locale.ROOT, "%,d bytes", n);
  }

  /** Counts the UTF-8 length of a text without encoding it. */
  private static long utf8Length(String s) {
    long n = 0;
    for (int i = 0; i < s.length(); i++) {
      char c = s.charAt(i);
      if (c < 0x80) {
        n++;
      } else if (c < 0x800) {
        n += 2;
      } else if (Character.isHighSurrogate(c)) {
        n += 4;
        i++;
      } else {
        n += 3;
      }
    }
    return n;
  }

  private static UnreadableInputException unreadable(String source, String message) {
    return new UnreadableInputException(new InputProblem(source, 0, 0, message));
  }

  private static UnreadableInputException unreadable(
      String source, String message, String setting) {
    return new UnreadableInputException(
        new InputProblem(source, 0, 0, message, java.util.Optional.of(setting)));
  }
}
