package riffle.ingest;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import riffle.model.ColumnRole;
import riffle.model.ControlChars;

/**
 * Turns decoded text, or the records of a workbook's sheet, into a {@link SurveyTable}: delimiter
 * and records (text only), header, the ragged-row policy (see the package documentation) and column
 * roles, the same for both.
 */
final class TableParser {
  /** Decoded input and how it was decoded. */
  record Input(
      String source,
      String text,
      String encoding,
      boolean encodingDetected,
      List<EncodingSniffer.Warning> warnings,
      boolean paste) {}

  private TableParser() {}

  static SurveyTable parse(Input in, ImportSettings settings) throws BadInput {
    String text = in.text();
    ProblemList problems = new ProblemList(in.source(), settings.maxProblems());
    for (EncodingSniffer.Warning w : in.warnings()) {
      problems.add(w.line(), 0, w.message());
    }
    for (EncodingSniffer.Warning w : EncodingSniffer.doubleEncoded(text)) {
      problems.add(w.line(), 0, w.message());
    }
    Delimiter excelHint = sepLine(text);
    Delimiter delimiter;
    boolean delimiterDetected = settings.delimiter().isEmpty();
    if (settings.delimiter().isPresent()) {
      delimiter = settings.delimiter().get();
    } else if (excelHint != null) {
      delimiter = excelHint;
    } else {
      delimiter = DelimiterSniffer.sniff(text, in.paste());
    }
    List<CsvRecords.Raw> records = CsvRecords.read(text, delimiter);
    Body body =
        body(
            records,
            excelHint != null ? 1 : 0,
            in.paste() ? "the pasted text is empty" : "file is empty",
            problems,
            settings);
    int ragged = body.ragged();
    int kept = body.rows().size() + ragged;
    int width = body.names().length;
    if (ragged * 2 > kept) {
      throw new BadInput(
          0,
          0,
          ragged
              + " of "
              + kept
              + " rows have a different number of fields than the header, which has "
              + width
              + " with the delimiter "
              + delimiter.label()
              + (delimiterDetected ? " (detected)" : " (as given)")
              + "; the delimiter is probably wrong: set it (comma, semicolon, tab or pipe)",
          "delimiter");
    }
    if (text.indexOf('"') >= 0) {
      for (long[] q :
          QuoteScanner.strayQuotes(text, delimiter.character(), settings.maxProblems())) {
        problems.add(
            q[0],
            (int) q[1],
            "the quote that opens this answer closes "
                + (q[2] == q[0] ? "on the same line" : "on line " + q[2])
                + " but more text follows it; if the answer took in the rows after it, put the"
                + " quotes right in the file or re-export");
      }
    }
    return table(
        body,
        in.source(),
        in.encoding(),
        in.encodingDetected(),
        delimiter,
        delimiterDetected,
        problems);
  }

  /**
   * Builds the table from the records of a workbook's sheet: no delimiter or quotes, and no ragged
   * rows, as every record is as wide as the widest row.
   *
   * @param source the file and sheet, as problems name them
   * @param encoding how the input was read, such as {@code Excel workbook (sheet 'Answers')}
   * @param notes problems about the whole sheet
   */
  static SurveyTable parseSheet(
      String source,
      String encoding,
      List<CsvRecords.Raw> records,
      List<String> notes,
      ImportSettings settings)
      throws BadInput {
    ProblemList problems = new ProblemList(source, settings.maxProblems());
    for (String note : notes) {
      problems.add(0, 0, note);
    }
    Body body = body(records, 0, "the sheet is empty", problems, settings);
    return table(body, source, encoding, true, Delimiter.COMMA, false, problems);
  }

  /**
   * The header and rows of the records: the header is the first non-blank record from {@code
   * first}; blank records are skipped and counted, ragged ones skipped and reported.
   */
  private record Body(
      long headerLine,
      String[] names,
      String[] shortNames,
      ColumnRole[] named,
      List<SurveyRow> rows,
      int ragged,
      int blank,
      int trailingBlank) {}

  private static Body body(
      List<CsvRecords.Raw> records,
      int first,
      String empty,
      ProblemList problems,
      ImportSettings settings)
      throws BadInput {
    int h = first;
    while (h < records.size() && isBlank(records.get(h).cells())) {
      h++;
    }
    if (h >= records.size()) {
      throw new BadInput(empty);
    }
    CsvRecords.Raw header = records.get(h);
    int width = width(header.cells(), records, h);
    if (width > settings.maxColumns()) {
      throw new BadInput(
          header.line(),
          settings.maxColumns() + 1,
          String.format(
              Locale.ROOT,
              "the header has %,d columns, over the limit of %,d; keep only the columns the"
                  + " analysis needs (delete the others in the spreadsheet), or raise the column"
                  + " limit to %d",
              width,
              settings.maxColumns(),
              width),
          "max columns");
    }
    // A second header row with each question's wording: the wording names the column, and the
    // short name above it is kept as the question's name.
    boolean worded =
        h + 1 < records.size() && WordingRow.follows(header.cells(), records.get(h + 1).cells());
    String[] shortNames = new String[width];
    String[] headers = new String[width];
    for (int i = 0; i < width; i++) {
      String name = i < header.cells().length ? HeaderNames.collapse(header.cells()[i]) : "";
      String[] below = worded ? records.get(h + 1).cells() : new String[0];
      String wording = i < below.length ? HeaderNames.collapse(below[i]) : "";
      shortNames[i] = worded && !wording.isEmpty() ? name : "";
      headers[i] = shortNames[i].isEmpty() ? name : wording;
    }
    String[] names = HeaderNames.of(headers, width, header.line(), problems);
    ColumnRole[] named = RoleDetector.named(names, shortNames, settings, header.line());
    int data = worded ? h + 2 : h + 1;

    List<SurveyRow> rows = new ArrayList<>(Math.max(16, records.size() - h - 1));
    int ragged = 0;
    int blank = 0;
    int trailingBlank = 0;
    for (int r = data; r < records.size(); r++) {
      CsvRecords.Raw rec = records.get(r);
      String[] cells = rec.cells();
      if (isBlank(cells)) {
        blank++;
        trailingBlank++;
        continue;
      }
      trailingBlank = 0;
      if (fits(cells, width, header.cells())) {
        rows.add(new SurveyRow(r - data + 1, rec.line(), List.of(fit(cells, width))));
      } else {
        ragged++;
        problems.add(rec.line(), 0, raggedMessage(cells, width, rec.line()));
      }
    }
    if (rows.size() + ragged == 0) {
      throw new BadInput(header.line(), 0, "no answers below the header");
    }
    return new Body(header.line(), names, shortNames, named, rows, ragged, blank, trailingBlank);
  }

  private static SurveyTable table(
      Body body,
      String source,
      String encoding,
      boolean encodingDetected,
      Delimiter delimiter,
      boolean delimiterDetected,
      ProblemList problems)
      throws BadInput {
    List<SurveyRow> rows = body.rows();
    List<SurveyRow> sample = rows.subList(0, Math.min(rows.size(), RoleDetector.SAMPLE));
    List<Column> columns =
        RoleDetector.detect(
            body.names(), body.shortNames(), body.named(), sample, body.headerLine());
    checkCodeNames(columns, rows);
    return new SurveyTable(
        source,
        encoding,
        delimiter,
        delimiterDetected,
        encodingDetected,
        columns,
        rows,
        problems.list(),
        body.ragged() + body.blank() - body.trailingBlank());
  }

  /** Codes in a codes column become code names, which may not hold a control character. */
  private static void checkCodeNames(List<Column> columns, List<SurveyRow> rows) throws BadInput {
    for (Column c : columns) {
      if (c.role() != ColumnRole.CODES) {
        continue;
      }
      for (SurveyRow r : rows) {
        for (String code : CodeList.split(r.cell(c))) {
          Optional<String> unsafe = ControlChars.problem("the code", code);
          if (unsafe.isPresent()) {
            throw new BadInput(
                r.line(),
                c.index() + 1,
                unsafe.get()
                    + "; a code's name is one line of ordinary characters: fix the codes in the"
                    + " file");
          }
        }
      }
    }
  }

  /**
   * Returns the number of columns: the header's fields, less trailing blank header fields that hold
   * no value in any record.
   */
  private static int width(String[] header, List<CsvRecords.Raw> records, int h) {
    int named = header.length;
    while (named > 0 && header[named - 1].isBlank()) {
      named--;
    }
    int used = named;
    for (int r = h + 1; r < records.size() && used < header.length; r++) {
      String[] cells = records.get(r).cells();
      for (int i = Math.min(cells.length, header.length) - 1; i >= used; i--) {
        if (!cells[i].isBlank()) {
          used = i + 1;
          break;
        }
      }
    }
    return used;
  }

  /**
   * A record fits when it has every field up to the last named header and nothing but blanks after
   * the last column; missing fields under blank headers are taken as empty.
   */
  private static boolean fits(String[] cells, int width, String[] header) {
    int named = Math.min(width, header.length);
    while (named > 0 && header[named - 1].isBlank()) {
      named--;
    }
    if (cells.length < named) {
      return false;
    }
    for (int i = width; i < cells.length; i++) {
      if (!cells[i].isBlank()) {
        return false;
      }
    }
    return true;
  }

  private static String[] fit(String[] cells, int width) {
    if (cells.length == width) {
      return cells;
    }
    String[] fitted = Arrays.copyOf(cells, width);
    for (int i = cells.length; i < width; i++) {
      fitted[i] = "";
    }
    return fitted;
  }

  private static String raggedMessage(String[] cells, int width, long line) {
    String message =
        "row has "
            + cells.length
            + (cells.length == 1 ? " field" : " fields")
            + ", the header has "
            + width
            + "; the row was skipped — usually a line break inside an answer that is not in quotes";
    long breaks = 0;
    for (String c : cells) {
      breaks += lineBreaks(c);
    }
    if (breaks > 0) {
      message +=
          " (this row runs over lines "
              + line
              + "–"
              + (line + breaks)
              + ", so a quote in it may be misplaced)";
    }
    return message;
  }

  /** Recognises Excel's {@code sep=;} first line and returns the delimiter it names. */
  static Delimiter sepLine(String text) {
    int start = text.startsWith("\"") ? 1 : 0;
    if (!text.regionMatches(true, start, "sep=", 0, 4) || text.length() < start + 5) {
      return null;
    }
    int end = start + 5;
    if (start == 1) {
      if (text.length() <= end || text.charAt(end) != '"') {
        return null;
      }
      end++;
    }
    if (end < text.length() && text.charAt(end) != '\n' && text.charAt(end) != '\r') {
      return null;
    }
    return Delimiter.of(text.charAt(start + 4)).orElse(null);
  }

  private static boolean isBlank(String[] cells) {
    for (String c : cells) {
      if (!c.isBlank()) {
        return false;
      }
    }
    return true;
  }

  private static long lineBreaks(String s) {
    long n = 0;
    for (int i = 0; i < s.length(); i++) {
      char c = s.charAt(i);
      if (c == '\n' || (c == '\r' && (i + 1 == s.length() || s.charAt(i + 1) != '\n'))) {
        n++;
      }
    }
    return n;
  }

  /** Returns the 1-based line of a character offset, or 0 for a negative offset. */
  static long lineOf(String text, int offset) {
    if (offset < 0) {
      return 0;
    }
    return 1 + lineBreaks(text.substring(0, offset));
  }
}
