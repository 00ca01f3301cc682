package riffle.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.OptionalLong;
import java.util.Set;
import java.util.TreeSet;

/**
 * The rows of the coded-answers exports, wide and long, as text cells: one model that the CSV and
 * the workbook writers both take, so that the two files cannot say different things. A cell of a
 * column marked as a number column holds a whole number (a 0/1 flag, a span end) or is blank.
 */
final class CodedRows {
  private CodedRows() {}

  /** Where the rows go: the header once, then each row with its cells in the header's order. */
  interface Sink {
    /** The column names, and (set bits) the columns whose cells are whole numbers or blank. */
    void header(List<String> names, BitSet numbers);

    /** One row. */
    void row(List<String> cells);
  }

  /**
   * One row per answer (see {@link Exports#codedAnswersCsv}).
   *
   * @throws IllegalArgumentException when an answer carries a code the codebook does not have
   */
  static void wide(CodedExport export, Sink sink) {
    CodeBits codebook = new CodeBits(export.codebook());
    Set<String> metaKeys = new TreeSet<>();
    for (ExportAnswer a : export.answers()) {
      metaKeys.addAll(a.metadata().keySet());
    }
    List<String> header =
        new ArrayList<>(
            List.of(
                "answer_id", "respondent", "wave", "question", "substantive", "read", "read_by"));
    header.addAll(metaKeys);
    header.add("text");
    int firstCode = header.size();
    header.addAll(codeHeaders(codebook));
    BitSet numbers = new BitSet();
    numbers.set(4, 6);
    numbers.set(firstCode, header.size());
    sink.header(header, numbers);
    long[] bits = new long[codebook.words];
    for (ExportAnswer a : export.answers()) {
      List<String> row = new ArrayList<>(header.size());
      row.add(a.id());
      row.add(a.respondent());
      row.add(a.wave());
      row.add(a.question());
      row.add(a.substantive() ? "1" : "0");
      row.add(a.read() ? "1" : "0");
      row.add(String.join("; ", a.readBy()));
      for (String key : metaKeys) {
        row.add(a.metadata().getOrDefault(key, ""));
      }
      row.add(a.maskedText());
      Arrays.fill(bits, 0);
      Set<String> ids = new HashSet<>();
      for (ExportAssignment as : a.assignments()) {
        ids.add(as.codeId());
      }
      codebook.mark(
          new ReportAnswer(
              a.id(), a.wave(), a.question(), true, ids, Map.of(), OptionalLong.empty()),
          bits,
          true);
      // 0 says a person read the answer and did not give the code; nobody has read an unread
      // answer, so its cell stays blank unless a rule gave it the code.
      String absent = a.read() ? "0" : "";
      for (int i = 0; i < codebook.size(); i++) {
        row.add((bits[i >>> 6] & (1L << i)) != 0 ? "1" : absent);
      }
      sink.row(row);
    }
  }

  /** Code names as column headers; a name used twice gets its id in brackets. */
  private static List<String> codeHeaders(CodeBits codebook) {
    Map<String, Integer> uses = new HashMap<>();
    for (ReportCode c : codebook.codes) {
      uses.merge(c.name(), 1, Integer::sum);
    }
    List<String> headers = new ArrayList<>();
    for (ReportCode c : codebook.codes) {
      headers.add(uses.get(c.name()) > 1 ? c.name() + " [" + c.id() + "]" : c.name());
    }
    return headers;
  }

  private static final List<String> LONG_HEADER =
      List.of(
          "answer_id",
          "respondent",
          "wave",
          "question",
          "read",
          "read_by",
          "code_id",
          "code",
          "archived",
          "coder",
          "origin",
          "span_start",
          "span_end",
          "passage");

  /** The number columns of the long form: read, archived, span_start and span_end. */
  private static final BitSet LONG_NUMBERS = new BitSet();

  static {
    LONG_NUMBERS.set(LONG_HEADER.indexOf("read"));
    LONG_NUMBERS.set(LONG_HEADER.indexOf("archived"));
    LONG_NUMBERS.set(LONG_HEADER.indexOf("span_start"));
    LONG_NUMBERS.set(LONG_HEADER.indexOf("span_end"));
  }

  /**
   * One row per code given (see {@link Exports#codedAnswersLongCsv}).
   *
   * @throws IllegalArgumentException when an answer carries a code the codebook does not have
   */
  static void longForm(CodedExport export, Sink sink) {
    Map<String, ReportCode> codes = new HashMap<>();
    for (ReportCode c : export.codebook()) {
      codes.put(c.id(), c);
    }
    sink.header(LONG_HEADER, (BitSet) LONG_NUMBERS.clone());
    for (ExportAnswer a : export.answers()) {
      String read = a.read() ? "1" : "0";
      String readBy = String.join("; ", a.readBy());
      if (a.assignments().isEmpty() && a.read()) {
        // Read with no code applying: one row without a code, so that the file holds every read
        // answer (an answer with no row was not read).
        sink.row(
            List.of(
                a.id(),
                a.respondent(),
                a.wave(),
                a.question(),
                read,
                readBy,
                "",
                "",
                "",
                "",
                "",
                "",
                "",
                ""));
        continue;
      }
      for (ExportAssignment as : a.assignments()) {
        ReportCode code = codes.get(as.codeId());
        if (code == null) {
          throw new IllegalArgumentException(
              "answer "
                  + a.id()
                  + " carries code "
                  + as.codeId()
                  + ", which is not in the codebook");
        }
        String passage = "";
        String start = "";
        String end = "";
        if (!as.wholeAnswer()) {
          int from = Math.min(as.spanStart(), a.maskedText().length());
          int to = Math.min(as.spanEnd(), a.maskedText().length());
          passage = a.maskedText().substring(from, to);
          start = Integer.toString(as.spanStart());
          end = Integer.toString(as.spanEnd());
        }
        sink.row(
            List.of(
                a.id(),
                a.respondent(),
                a.wave(),
                a.question(),
                read,
                readBy,
                code.id(),
                code.name(),
                code.archived() ? "1" : "0",
                as.coder(),
                as.origin(),
                start,
                end,
                passage));
      }
    }
  }
}
