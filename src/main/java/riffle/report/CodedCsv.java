package riffle.report;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;
import riffle.csv.SafeCsv;

/**
 * The coded-answers exports (wide and long, rows from {@link CodedRows}) as CSV, and the codebook
 * as Markdown.
 */
final class CodedCsv {
  private CodedCsv() {}

  static String wide(CodedExport export, boolean withBom) {
    return write(withBom, sink -> CodedRows.wide(export, sink));
  }

  static String longFormat(CodedExport export, boolean withBom) {
    return write(withBom, sink -> CodedRows.longForm(export, sink));
  }

  private static String write(boolean withBom, Consumer<CodedRows.Sink> rows) {
    SafeCsv csv = SafeCsv.create(withBom);
    rows.accept(
        new CodedRows.Sink() {
          @Override
          public void header(List<String> names, BitSet numbers) {
            csv.row(names);
          }

          @Override
          public void row(List<String> cells) {
            csv.row(cells);
          }
        });
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
