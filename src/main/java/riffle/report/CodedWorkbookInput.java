package riffle.report;

import java.util.List;
import java.util.Objects;
import riffle.model.Findings;

/**
 * What the coded-answers workbook is written from.
 *
 * @param coded the coded answers, as the CSV exports have them
 * @param codebookColumns the codebook file's column names
 * @param codebookRows one row per code, its cells in {@code codebookColumns}' order, as the
 *     codebook CSV has them
 * @param findings the findings of the same answers
 */
public record CodedWorkbookInput(
    CodedExport coded,
    List<String> codebookColumns,
    List<List<String>> codebookRows,
    Findings findings) {
  /** Checks the components and copies the lists. */
  public CodedWorkbookInput {
    Objects.requireNonNull(coded, "coded");
    Objects.requireNonNull(findings, "findings");
    codebookColumns = List.copyOf(codebookColumns);
    codebookRows = codebookRows.stream().map(List::copyOf).toList();
    for (List<String> r : codebookRows) {
      if (r.size() != codebookColumns.size()) {
        throw new IllegalArgumentException(
            "a codebook row has " + r.size() + " cells for " + codebookColumns.size() + " columns");
      }
    }
  }
}
