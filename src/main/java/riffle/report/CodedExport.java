package riffle.report;

import java.util.List;

/**
 * What the coded-answers exports are written from.
 *
 * @param codebook the codebook (archived codes included; the wide export leaves them out)
 * @param answers the answers, in the order the rows should have
 */
public record CodedExport(List<ReportCode> codebook, List<ExportAnswer> answers) {
  /** Copies the lists. */
  public CodedExport {
    codebook = List.copyOf(codebook);
    answers = List.copyOf(answers);
  }
}
