package riffle.ingest;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;
import javax.xml.parsers.ParserConfigurationException;
import org.apache.poi.openxml4j.exceptions.OpenXML4JException;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.opc.PackageAccess;
import org.apache.poi.openxml4j.opc.PackagePart;
import org.apache.poi.ss.usermodel.DataFormatter;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.RichTextString;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.util.XMLHelper;
import org.apache.poi.xssf.eventusermodel.XSSFReader;
import org.apache.poi.xssf.eventusermodel.XSSFSheetXMLHandler;
import org.apache.poi.xssf.model.SharedStrings;
import org.apache.poi.xssf.model.StylesTable;
import org.apache.poi.xssf.usermodel.XSSFComment;
import org.apache.poi.xssf.usermodel.XSSFRelation;
import org.xml.sax.Attributes;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;
import org.xml.sax.XMLReader;
import org.xml.sax.helpers.DefaultHandler;

/**
 * Reads one sheet of an Excel workbook (.xlsx, ECMA-376 SpreadsheetML) into the records the CSV
 * path yields: one {@link CsvRecords.Raw} per sheet row, its line the sheet's row number, its cells
 * the values as the sheet shows them. The sheet is streamed with POI's event API (SAX over the
 * sheet part, shared strings read once as plain text), so a sheet of 100,000 rows never becomes a
 * workbook object model in memory.
 *
 * <p>Cell values: text and rich text as plain text; numbers as the General format shows them (no
 * float noise, integers without {@code .0}); booleans {@code TRUE}/{@code FALSE}; errors such as
 * {@code #N/A} as shown; formulas by their cached value, never evaluated; numbers formatted as
 * dates in ISO 8601, {@code yyyy-mm-dd} or {@code yyyy-mm-ddTHH:MM} with a time of day, in the
 * workbook's 1900 or 1904 date system. Empty trailing rows and columns are left out; every record
 * is padded to the widest row, so a sheet has no ragged rows.
 *
 * <p>Other spreadsheet files are refused with what to do: old .xls, .xlsb, OpenDocument .ods and
 * password-protected workbooks. POI's zip limits ({@code ZipSecureFile}) refuse zip bombs.
 */
final class WorkbookReader {
  /** The encoding label of a table read from a workbook, before the sheet's name. */
  static final String LABEL = "Excel workbook";

  private static final String SAVE_AS = "save it as .xlsx or CSV and import that";

  /**
   * A sheet read.
   *
   * @param name the sheet's name
   * @param records its non-blank rows, and blank ones between them, in order
   * @param notes problems about the whole sheet or workbook: hidden rows and columns, sheets not
   *     read
   */
  record Sheet(String name, List<CsvRecords.Raw> records, List<String> notes) {}

  /** One sheet of the workbook's list. */
  private record SheetRef(String name, String relation, boolean hidden) {}

  private WorkbookReader() {}

  /**
   * True for a zip archive holding an {@code xl/workbook.xml} part, an .xlsx or .xlsm, or the parts
   * written around it; and for an Office Open XML package that is no document or presentation,
   * which is a workbook cut short before its {@code xl/} parts (and is then refused as damaged).
   */
  static boolean isWorkbook(byte[] b) {
    if (!startsWith(b, 'P', 'K', 3, 4)) {
      return false;
    }
    for (String part : List.of("xl/workbook.xml", "xl/worksheets/", "xl/styles.xml", "xl/_rels/")) {
      if (contains(b, part, false)) {
        return true;
      }
    }
    return contains(b, "[Content_Types].xml", false)
        && !contains(b, "word/", false)
        && !contains(b, "ppt/", false);
  }

  /**
   * Refuses the spreadsheet files Riffle does not read, telling the analyst to save them as .xlsx
   * or CSV: an OLE2 file (an old .xls, or an encrypted .xlsx), a binary .xlsb, an OpenDocument
   * .ods.
   */
  static void refuseOtherSpreadsheets(byte[] b) throws BadInput {
    if (startsWith(b, 0xD0, 0xCF, 0x11, 0xE0)) {
      if (contains(b, "EncryptionInfo", true)) {
        throw new BadInput(
            "the workbook is protected with a password (encrypted), so it cannot be read; open it"
                + " in the spreadsheet program, remove the password (or save a copy without one)"
                + " as .xlsx or CSV and import that");
      }
      throw new BadInput(
          "this is an old Excel 97-2003 workbook (.xls), which cannot be read here; open it in the"
              + " spreadsheet program, "
              + SAVE_AS);
    }
    if (!startsWith(b, 'P', 'K', 3, 4)) {
      return;
    }
    if (contains(Arrays.copyOf(b, Math.min(b.length, 200)), "opendocument.spreadsheet", false)) {
      throw new BadInput(
          "this is an OpenDocument spreadsheet (.ods), which cannot be read here; " + SAVE_AS);
    }
    if (contains(b, "xl/workbook.bin", false)) {
      throw new BadInput(
          "this is a binary Excel workbook (.xlsb), which cannot be read here; " + SAVE_AS);
    }
  }

  /**
   * Reads the sheet the settings name, else the first visible sheet with data.
   *
   * @throws BadInput when the workbook is damaged, a zip bomb, has no such sheet or no data
   */
  static Sheet read(byte[] bytes, ImportSettings settings) throws BadInput {
    try (OPCPackage pkg = OPCPackage.open(new ByteArrayInputStream(bytes))) {
      return read(pkg, settings);
    } catch (BadInput e) {
      throw e;
    } catch (IOException | OpenXML4JException | RuntimeException e) {
      throw unreadable(e);
    }
  }

  /**
   * Reads a workbook on disk as {@link #read(byte[], ImportSettings)} does, its parts unpacked from
   * the file as they are read rather than all at once into memory.
   */
  static Sheet read(Path file, ImportSettings settings) throws BadInput {
    try (OPCPackage pkg = OPCPackage.open(file.toFile(), PackageAccess.READ)) {
      return read(pkg, settings);
    } catch (BadInput e) {
      throw e;
    } catch (OpenXML4JException | IOException | RuntimeException e) {
      throw unreadable(e);
    }
  }

  private static Sheet read(OPCPackage pkg, ImportSettings settings) throws BadInput {
    try {
      XSSFReader reader = new XSSFReader(pkg);
      Book book = new Book();
      try (InputStream in = reader.getWorkbookData()) {
        parse(in, book);
      }
      if (book.sheets.isEmpty()) {
        throw new BadInput("the workbook has no sheets; " + SAVE_AS + " from a sheet with data");
      }
      SharedStrings strings = new SharedText(pkg);
      StylesTable styles = reader.getStylesTable();
      DataFormatter cells = new Cells(book.date1904);
      int chosen = -1;
      Rows rows = null;
      if (settings.sheet().isPresent()) {
        chosen = pick(book.sheets, settings.sheet().get());
        rows = rows(reader, book.sheets.get(chosen), styles, strings, cells);
      } else {
        for (int i = 0; i < book.sheets.size() && chosen < 0; i++) {
          SheetRef s = book.sheets.get(i);
          if (!s.hidden()) {
            Rows r = rows(reader, s, styles, strings, cells);
            if (!r.records.isEmpty()) {
              chosen = i;
              rows = r;
            }
          }
        }
        if (chosen < 0) {
          throw new BadInput(
              0,
              0,
              "no visible sheet of the workbook holds data; put the answers on a sheet (header"
                  + " row first), or name a hidden sheet with the sheet setting",
              "sheet");
        }
      }
      SheetRef sheet = book.sheets.get(chosen);
      List<String> notes = new ArrayList<>();
      rows.hiddenNote().ifPresent(notes::add);
      for (int i = 0; i < book.sheets.size(); i++) {
        if (i != chosen) {
          SheetRef other = book.sheets.get(i);
          long n = countRows(reader, other);
          if (n > 0) {
            notes.add(
                (other.hidden() ? "hidden sheet '" : "sheet '")
                    + other.name()
                    + "' ("
                    + n
                    + (n == 1 ? " row" : " rows")
                    + ") was not read; --sheet "
                    + (other.name().matches("[\\p{L}\\p{N}_.-]+") ? other.name() : (i + 1))
                    + " reads it");
          }
        }
      }
      return new Sheet(sheet.name(), rows.finish(), notes);
    } catch (BadInput e) {
      throw e;
    } catch (IOException | OpenXML4JException | SAXException | RuntimeException e) {
      throw unreadable(e);
    }
  }

  /** Returns the index of the sheet a {@code --sheet} value names: a name, else a number. */
  private static int pick(List<SheetRef> sheets, String wanted) throws BadInput {
    for (int i = 0; i < sheets.size(); i++) {
      if (sheets.get(i).name().equalsIgnoreCase(wanted.strip())) {
        return i;
      }
    }
    if (wanted.strip().matches("\\d{1,4}")) {
      int n = Integer.parseInt(wanted.strip());
      if (n >= 1 && n <= sheets.size()) {
        return n - 1;
      }
    }
    StringBuilder names = new StringBuilder();
    for (int i = 0; i < sheets.size(); i++) {
      names.append(i == 0 ? "" : ", ").append(i + 1).append(" '").append(sheets.get(i).name());
      names.append('\'');
    }
    throw new BadInput(
        0,
        0,
        "the workbook has no sheet '"
            + wanted
            + "'; its sheets are "
            + names
            + ": give one of those names or numbers",
        "sheet");
  }

  private static BadInput unreadable(Exception e) {
    for (Throwable t = e; t != null; t = t.getCause()) {
      String m = String.valueOf(t.getMessage());
      if (m.contains("Zip bomb") || m.contains("potentially malicious")) {
        return new BadInput(
            "the workbook unpacks to far more data than its size suggests, which is refused as a"
                + " possible zip bomb; open it in the spreadsheet program, "
                + SAVE_AS);
      }
    }
    String reason = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    if (reason.length() > 120) {
      reason = reason.substring(0, 120) + "…";
    }
    return new BadInput(
        "the workbook cannot be opened: it is damaged or cut short ("
            + reason
            + "); open it in the spreadsheet program, "
            + SAVE_AS);
  }

  private static Rows rows(
      XSSFReader reader,
      SheetRef sheet,
      StylesTable styles,
      SharedStrings strings,
      DataFormatter cells)
      throws IOException, OpenXML4JException, SAXException {
    Rows rows = new Rows();
    XSSFSheetXMLHandler values = new XSSFSheetXMLHandler(styles, strings, rows, cells, false);
    try (InputStream in = reader.getSheet(sheet.relation())) {
      parse(in, new Layout(values, rows));
    }
    return rows;
  }

  /** Counts the rows with a value in a sheet not read, without formatting any cell. */
  private static long countRows(XSSFReader reader, SheetRef sheet)
      throws IOException, OpenXML4JException, SAXException {
    Counter counter = new Counter();
    try (InputStream in = reader.getSheet(sheet.relation())) {
      parse(in, counter);
    }
    return counter.rows;
  }

  private static void parse(InputStream in, DefaultHandler handler)
      throws IOException, SAXException {
    try {
      XMLReader xml = XMLHelper.newXMLReader();
      xml.setContentHandler(handler);
      xml.parse(new InputSource(in));
    } catch (ParserConfigurationException e) {
      throw new SAXException(e);
    }
  }

  /** The workbook part: its sheets in order and its date system. */
  private static final class Book extends DefaultHandler {
    private static final String RELATIONS =
        "http://schemas.openxmlformats.org/officeDocument/2006/relationships";
    final List<SheetRef> sheets = new ArrayList<>();
    boolean date1904;

    @Override
    public void startElement(String uri, String local, String qName, Attributes a) {
      if (local.equals("workbookPr")) {
        String v = a.getValue("date1904");
        date1904 = "1".equals(v) || "true".equalsIgnoreCase(v);
      } else if (local.equals("sheet")) {
        String state = a.getValue("state");
        sheets.add(
            new SheetRef(
                String.valueOf(a.getValue("name")),
                a.getValue(RELATIONS, "id"),
                "hidden".equals(state) || "veryHidden".equals(state)));
      }
    }
  }

  /**
   * Passes the sheet part on to POI's handler, noting what it does not report: hidden rows and
   * columns, and which cells are errors.
   */
  private static final class Layout extends DefaultHandler {
    private final DefaultHandler values;
    private final Rows rows;

    Layout(DefaultHandler values, Rows rows) {
      this.values = values;
      this.rows = rows;
    }

    @Override
    public void startElement(String uri, String local, String qName, Attributes a)
        throws SAXException {
      switch (local) {
        case "row" -> {
          if (on(a.getValue("hidden")) && a.getValue("r") != null) {
            rows.hiddenRows.add(Long.parseLong(a.getValue("r").strip()));
          }
        }
        case "col" -> {
          if (on(a.getValue("hidden")) && a.getValue("min") != null) {
            int min = Integer.parseInt(a.getValue("min").strip());
            int max = a.getValue("max") == null ? min : Integer.parseInt(a.getValue("max").strip());
            for (int c = min; c <= Math.min(max, min + 16_384); c++) {
              rows.hiddenColumns.add(c);
            }
          }
        }
        case "c" -> rows.error = "e".equals(a.getValue("t"));
        default -> {}
      }
      values.startElement(uri, local, qName, a);
    }

    @Override
    public void endElement(String uri, String local, String qName) throws SAXException {
      values.endElement(uri, local, qName);
    }

    @Override
    public void characters(char[] ch, int start, int length) throws SAXException {
      values.characters(ch, start, length);
    }

    private static boolean on(String v) {
      return "1".equals(v) || "true".equalsIgnoreCase(v);
    }
  }

  /** Collects a sheet's rows as records, blank rows only where a later row has a value. */
  private static final class Rows implements XSSFSheetXMLHandler.SheetContentsHandler {
    final List<CsvRecords.Raw> records = new ArrayList<>();
    final TreeSet<Long> hiddenRows = new TreeSet<>();
    final TreeSet<Integer> hiddenColumns = new TreeSet<>();
    boolean error;
    private String[] cells = new String[16];
    private int used;
    private int next;
    private long lastLine;
    private int width;

    @Override
    public void startRow(int rowNum) {
      used = 0;
      next = 0;
    }

    @Override
    public void cell(String ref, String value, XSSFComment comment) {
      int col = ref == null ? next : column(ref);
      next = col + 1;
      if (value == null || value.isEmpty()) {
        return;
      }
      if (col >= cells.length) {
        cells = Arrays.copyOf(cells, Math.max(col + 1, cells.length * 2));
      }
      for (int i = used; i < col; i++) {
        cells[i] = "";
      }
      cells[col] = error && value.startsWith("ERROR:") ? value.substring(6) : value;
      used = Math.max(used, col + 1);
    }

    @Override
    public void endRow(int rowNum) {
      int n = used;
      while (n > 0 && cells[n - 1].isBlank()) {
        n--;
      }
      if (n == 0) {
        return;
      }
      long line = rowNum + 1L;
      for (long blank = lastLine + 1; blank < line && !records.isEmpty(); blank++) {
        records.add(new CsvRecords.Raw(blank, new String[0]));
      }
      records.add(new CsvRecords.Raw(line, Arrays.copyOf(cells, n)));
      lastLine = line;
      width = Math.max(width, n);
    }

    /** The 0-based column of a cell reference such as {@code AB17}. */
    private static int column(String ref) {
      int col = 0;
      for (int i = 0; i < ref.length(); i++) {
        char c = ref.charAt(i);
        if (c >= 'A' && c <= 'Z') {
          col = col * 26 + (c - 'A' + 1);
        } else if (c != '$') {
          break;
        }
      }
      return col - 1;
    }

    /** The records, each padded to the widest row. */
    List<CsvRecords.Raw> finish() {
      List<CsvRecords.Raw> out = new ArrayList<>(records.size());
      for (CsvRecords.Raw r : records) {
        if (r.cells().length == width) {
          out.add(r);
        } else {
          String[] padded = Arrays.copyOf(r.cells(), width);
          Arrays.fill(padded, r.cells().length, width, "");
          out.add(new CsvRecords.Raw(r.line(), padded));
        }
      }
      return out;
    }

    /** One note naming the hidden rows and columns, which are read like the others. */
    Optional<String> hiddenNote() {
      List<String> parts = new ArrayList<>();
      if (!hiddenRows.isEmpty()) {
        parts.add((hiddenRows.size() == 1 ? "row " : "rows ") + listed(hiddenRows, false));
      }
      if (!hiddenColumns.isEmpty()) {
        parts.add(
            (hiddenColumns.size() == 1 ? "column " : "columns ") + listed(hiddenColumns, true));
      }
      if (parts.isEmpty()) {
        return Optional.empty();
      }
      return Optional.of(
          String.join(" and ", parts)
              + (hiddenRows.size() + hiddenColumns.size() == 1 ? " is" : " are")
              + " hidden in the sheet; they were read like the others (delete them in the"
              + " workbook if they should be left out)");
    }

    private static String listed(TreeSet<? extends Number> numbers, boolean letters) {
      StringBuilder sb = new StringBuilder();
      int shown = 0;
      for (Number n : numbers) {
        if (shown == 10) {
          sb.append(String.format(Locale.ROOT, " and %,d more", numbers.size() - shown));
          break;
        }
        sb.append(shown == 0 ? "" : ", ");
        sb.append(letters ? CellReference.convertNumToColString(n.intValue() - 1) : n.toString());
        shown++;
      }
      return sb.toString();
    }

    @Override
    public void endSheet() {}
  }

  /** Counts rows holding a value; formats nothing. */
  private static final class Counter extends DefaultHandler {
    long rows;
    private boolean counted;
    private boolean inValue;

    @Override
    public void startElement(String uri, String local, String qName, Attributes a) {
      if (local.equals("row")) {
        counted = false;
      } else if (local.equals("v") || local.equals("t")) {
        inValue = true;
      }
    }

    @Override
    public void endElement(String uri, String local, String qName) {
      if (local.equals("v") || local.equals("t")) {
        inValue = false;
      }
    }

    @Override
    public void characters(char[] ch, int start, int length) {
      if (inValue && !counted) {
        for (int i = start; i < start + length; i++) {
          if (!Character.isWhitespace(ch[i])) {
            counted = true;
            rows++;
            break;
          }
        }
      }
    }
  }

  /**
   * Formats numbers as the General format shows them, and numbers formatted as dates in ISO 8601.
   */
  private static final class Cells extends DataFormatter {
    private final boolean date1904;

    Cells(boolean date1904) {
      super(Locale.US);
      this.date1904 = date1904;
    }

    /** Whether each format seen is a date format; a sheet uses a handful, each on many cells. */
    private final Map<String, Boolean> dateFormats = new HashMap<>();

    @Override
    public String formatRawCellContents(double value, int formatIndex, String formatString) {
      Boolean date =
          dateFormats.computeIfAbsent(
              formatIndex + ":" + formatString,
              k -> DateUtil.isADateFormat(formatIndex, formatString));
      if (date) {
        String iso = isoDate(value, date1904);
        if (iso != null) {
          return iso;
        }
      }
      if (value == Math.rint(value) && Math.abs(value) < 1e11) {
        return Long.toString((long) value); // what General shows for a whole number of 11 digits
      }
      return super.formatRawCellContents(value, 0, "General");
    }
  }

  /**
   * The shared strings part read once, each item kept as its plain text: POI's read-only table
   * answers each cell with a new rich text object, whose XML bean costs more than the rest of the
   * cell. The text is the {@code t} elements of an item outside phonetic runs, with {@code _xHHHH_}
   * escapes decoded, as {@code ReadOnlySharedStringsTable} and {@code XSSFRichTextString} give it.
   */
  private static final class SharedText extends DefaultHandler implements SharedStrings {
    private final List<String> items = new ArrayList<>();
    private final StringBuilder text = new StringBuilder();
    private boolean inText;
    private boolean inPhonetic;

    SharedText(OPCPackage pkg) throws IOException, SAXException {
      for (PackagePart part :
          pkg.getPartsByContentType(XSSFRelation.SHARED_STRINGS.getContentType())) {
        try (InputStream in = part.getInputStream()) {
          parse(in, this);
        }
        break;
      }
    }

    @Override
    public void startElement(String uri, String local, String qName, Attributes a) {
      switch (local) {
        case "si" -> text.setLength(0);
        case "t" -> inText = true;
        case "rPh" -> inPhonetic = true;
        default -> {}
      }
    }

    @Override
    public void endElement(String uri, String local, String qName) {
      switch (local) {
        case "si" -> items.add(decode(text));
        case "t" -> inText = false;
        case "rPh" -> inPhonetic = false;
        default -> {}
      }
    }

    @Override
    public void characters(char[] ch, int start, int length) {
      if (inText && !inPhonetic) {
        text.append(ch, start, length);
      }
    }

    @Override
    public RichTextString getItemAt(int idx) {
      return new Plain(items.get(idx));
    }

    @Override
    public int getCount() {
      return items.size();
    }

    @Override
    public int getUniqueCount() {
      return items.size();
    }

    /** Decodes the {@code _xHHHH_} escapes SpreadsheetML writes for characters XML cannot hold. */
    static String decode(CharSequence s) {
      StringBuilder out = null;
      int last = 0;
      for (int i = 0; i + 7 <= s.length(); i++) {
        if (s.charAt(i) == '_' && s.charAt(i + 1) == 'x' && s.charAt(i + 6) == '_') {
          int code = hex(s, i + 2);
          if (code >= 0) {
            if (out == null) {
              out = new StringBuilder(s.length());
            }
            out.append(s, last, i).append((char) code);
            last = i + 7;
            i += 6;
          }
        }
      }
      if (out == null) {
        return s.toString();
      }
      return out.append(s, last, s.length()).toString();
    }

    private static int hex(CharSequence s, int from) {
      int v = 0;
      for (int i = from; i < from + 4; i++) {
        int d = Character.digit(s.charAt(i), 16);
        if (d < 0) {
          return -1;
        }
        v = v * 16 + d;
      }
      return v;
    }
  }

  /** A shared string's plain text, the only thing the sheet handler asks of it. */
  private record Plain(String text) implements RichTextString {
    @Override
    public String getString() {
      return text;
    }

    @Override
    public String toString() {
      return text;
    }

    @Override
    public int length() {
      return text.length();
    }

    @Override
    public int numFormattingRuns() {
      return 0;
    }

    @Override
    public int getIndexOfFormattingRun(int index) {
      return 0;
    }

    @Override
    public void applyFont(int startIndex, int endIndex, short fontIndex) {
      throw new UnsupportedOperationException("read-only");
    }

    @Override
    public void applyFont(int startIndex, int endIndex, Font font) {
      throw new UnsupportedOperationException("read-only");
    }

    @Override
    public void applyFont(Font font) {
      throw new UnsupportedOperationException("read-only");
    }

    @Override
    public void clearFormatting() {
      throw new UnsupportedOperationException("read-only");
    }

    @Override
    public void applyFont(short fontIndex) {
      throw new UnsupportedOperationException("read-only");
    }
  }

  /**
   * Writes a serial date-time in ISO 8601, per ECMA-376 Part 1 §18.17.4: in the 1900 date system
   * serial 1 is 1900-01-01 and serial 60 the fictitious 29 February 1900 (kept for compatibility,
   * written {@code 1900-02-29}); in the 1904 system serial 0 is 1904-01-01. The fraction is the
   * time of day, rounded to the minute and written only when not midnight; a serial below 1 in the
   * 1900 system is a time alone ({@code HH:MM}).
   *
   * @return the date, or null for a serial that is no date (negative, past 9999-12-31, not a
   *     number)
   */
  static String isoDate(double serial, boolean date1904) {
    if (!(serial >= 0) || serial >= 2_958_466) {
      return null;
    }
    long minutes = Math.round(serial * 1440);
    long days = minutes / 1440;
    int minute = (int) (minutes % 1440);
    String time = twoDigits(minute / 60) + ":" + twoDigits(minute % 60);
    String date;
    if (date1904) {
      date = LocalDate.of(1904, 1, 1).plusDays(days).toString();
    } else if (days == 0) {
      return time;
    } else if (days == 60) {
      date = "1900-02-29";
    } else if (days < 60) {
      date = LocalDate.of(1899, 12, 31).plusDays(days).toString();
    } else {
      date = LocalDate.of(1899, 12, 30).plusDays(days).toString();
    }
    return minute == 0 ? date : date + "T" + time;
  }

  private static String twoDigits(int n) {
    return n < 10 ? "0" + n : Integer.toString(n);
  }

  private static boolean startsWith(byte[] b, int... prefix) {
    if (b.length < prefix.length) {
      return false;
    }
    for (int i = 0; i < prefix.length; i++) {
      if ((b[i] & 0xFF) != prefix[i]) {
        return false;
      }
    }
    return true;
  }

  /**
   * Looks for an ASCII word in the bytes, as ASCII or as UTF-16LE (OLE2 directory names): first in
   * the last 64 KiB, where a zip's central directory names every entry, then everywhere.
   */
  private static boolean contains(byte[] b, String word, boolean utf16) {
    byte[] w = word.getBytes(utf16 ? StandardCharsets.UTF_16LE : StandardCharsets.US_ASCII);
    return contains(b, w, Math.max(0, b.length - 65_536)) || contains(b, w, 0);
  }

  private static boolean contains(byte[] b, byte[] w, int from) {
    outer:
    for (int i = from; i + w.length <= b.length; i++) {
      for (int j = 0; j < w.length; j++) {
        if (b[i + j] != w[j]) {
          continue outer;
        }
      }
      return true;
    }
    return false;
  }
}
