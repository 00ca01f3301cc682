package riffle.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.OptionalLong;
import java.util.Set;
import java.util.TreeSet;
import riffle.csv.SafeCsv;

/** The coded-answers exports (wide and long) and the codebook as CSV and Markdown. */
final class CodedCsv {
  private CodedCsv() {}

  static String wide(CodedExport export, boolean withBom) {
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
    header.addAll(codeHeaders(codebook));
    SafeCsv csv = SafeCsv.create(withBom).row(header);
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
      csv.row(row);
    }
    return csv.toString();
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

  static String longFormat(CodedExport export, boolean withBom) {
    Map<String, ReportCode> codes = new HashMap<>();
    for (ReportCode c : export.codebook()) {
      codes.put(c.id(), c);
    }
    SafeCsv csv =
        SafeCsv.create(withBom)
            .row(
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
                    "passage"));
    for (ExportAnswer a : export.answers()) {
      String read = a.read() ? "1" : "0";
      String readBy = String.join("; ", a.readBy());
      if (a.assignments().isEmpty() && a.read()) {
        // Read with no code applying: one row without a code, so that the file holds every read
        // answer (an answer with no row was not read).
        csv.row(
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
        csv.row(
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
    return csv.toString();
  }

  static String codebookMarkdown(List<ReportCode> codebook, String title) {
    Map<String, List<ReportCode>> children = new HashMap<>();
    Set<String> ids = new HashSet<>();
    for (ReportCode c : codebook) {
      ids.add(c.id());
    }
    List<ReportCode> roots = new ArrayList<>();
    for (ReportCode c : codebook) {
      if (c.parentId().isPresent() && ids.contains(c.parentId().get())) {
        children.computeIfAbsent(c.parentId().get(), k -> new ArrayList<>()).add(c);
      } else {
        roots.add(c);
      }
    }
    StringBuilder m = new StringBuilder("# ").append(MarkdownReport.md(title)).append("\n\n");
    for (ReportCode root : roots) {
      entry(m, root, 0, children, new HashSet<>());
    }
    return m.toString();
  }

  private static void entry(
      StringBuilder m,
      ReportCode c,
      int depth,
      Map<String, List<ReportCode>> children,
      Set<String> visiting) {
    if (!visiting.add(c.id())) {
      throw new IllegalArgumentException("the codebook's parents form a cycle through " + c.id());
    }
    m.append("  ".repeat(depth))
        .append("- **")
        .append(MarkdownReport.md(c.name()))
        .append("** (")
        .append(c.direction())
        .append(c.archived() ? ", archived" : "")
        .append(") `")
        .append(c.id().replace("`", "'"))
        .append("`\n");
    for (ReportCode child : children.getOrDefault(c.id(), List.of())) {
      entry(m, child, depth + 1, children, visiting);
    }
  }
}
