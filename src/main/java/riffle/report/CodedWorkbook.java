package riffle.report;

import java.io.IOException;
import java.io.OutputStream;
import java.util.BitSet;
import java.util.List;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFSheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import riffle.model.CodeFrequency;
import riffle.model.Coverage;
import riffle.model.InputException;
import riffle.model.QuestionFindings;
import riffle.model.Share;
import riffle.model.WaveChange;

/**
 * The coded answers as an Excel workbook (Office Open XML, ECMA-376), written with POI's streaming
 * writer: at most {@link #WINDOW} rows of a sheet are in memory, the rest wait in temporary files
 * until the workbook is zipped into the output, so 100,000 answers cost no more memory than their
 * CSV.
 *
 * <p>Sheets: "Coded answers" (the wide CSV's rows), "Codes given" (the long CSV's rows), "Codebook"
 * (the codebook CSV's rows), "Findings" (each code's share per question and wave, one row each) and
 * "Changes" (each comparison between waves). Flags, counts and spans are number cells, shares
 * percent-formatted number cells, everything else text cells.
 */
final class CodedWorkbook {
  /** Rows of a sheet kept in memory while writing. */
  static final int WINDOW = 100;

  static final String CODED = "Coded answers";
  static final String LONG = "Codes given";
  static final String CODEBOOK = "Codebook";
  static final String FINDINGS = "Findings";
  static final String CHANGES = "Changes";

  private static final List<String> FINDINGS_HEADER =
      List.of(
          "question",
          "code",
          "code_id",
          "theme",
          "is_theme",
          "direction",
          "wave",
          "count",
          "base",
          "share",
          "ci_lower",
          "ci_upper",
          "by_rule",
          "small_base",
          "imprecise",
          "projected_count",
          "projected_lower",
          "projected_upper",
          "wave_answers",
          "no_share");

  private static final List<String> CHANGES_HEADER =
      List.of(
          "question",
          "code",
          "code_id",
          "from",
          "to",
          "change",
          "ci_lower",
          "ci_upper",
          "p",
          "p_adjusted",
          "verdict",
          "by_rule");

  private CodedWorkbook() {}

  static void write(CodedWorkbookInput in, OutputStream out) throws IOException, InputException {
    // Closing the workbook deletes its temporary files. They are gzipped: about a fifth more CPU
    // time (100,000 answers: 14.5 s instead of 11.7 s), but a fraction of the space, which matters
    // where the temporary folder is in memory (tmpfs).
    try (SXSSFWorkbook book = new SXSSFWorkbook(WINDOW)) {
      book.setCompressTempFiles(true);
      try {
        WorkbookSheet.Styles styles = WorkbookSheet.Styles.of(book);
        Rows wide = new Rows(book, styles, CODED);
        CodedRows.wide(in.coded(), wide);
        wide.sheet.finish();
        Rows longForm = new Rows(book, styles, LONG);
        CodedRows.longForm(in.coded(), longForm);
        longForm.sheet.finish();
        codebook(book, styles, in);
        findings(book, styles, in);
        changes(book, styles, in);
      } catch (RuntimeException e) {
        // Closing deletes a sheet's temporary file only once its rows are all flushed, as writing
        // the workbook would have done.
        for (Sheet sheet : book) {
          try {
            ((SXSSFSheet) sheet).flushRows();
          } catch (IOException flushing) {
            e.addSuppressed(flushing);
          }
        }
        throw e;
      }
      book.write(out);
    }
  }

  /** Writes the coded rows into a sheet: number columns as numbers, the rest as text. */
  private static final class Rows implements CodedRows.Sink {
    private final SXSSFWorkbook book;
    private final WorkbookSheet.Styles styles;
    private final String name;
    private WorkbookSheet sheet;
    private BitSet numbers;

    Rows(SXSSFWorkbook book, WorkbookSheet.Styles styles, String name) {
      this.book = book;
      this.styles = styles;
      this.name = name;
    }

    @Override
    public void header(List<String> names, BitSet numbers) {
      this.sheet = new WorkbookSheet(book, styles, name, names);
      this.numbers = numbers;
    }

    @Override
    public void row(List<String> cells) {
      sheet.row();
      for (int i = 0; i < cells.size(); i++) {
        String v = cells.get(i);
        if (numbers.get(i) && !v.isEmpty()) {
          sheet.number(Long.parseLong(v));
        } else {
          sheet.text(v);
        }
      }
    }
  }

  private static void codebook(
      SXSSFWorkbook book, WorkbookSheet.Styles styles, CodedWorkbookInput in)
      throws InputException {
    WorkbookSheet sheet = new WorkbookSheet(book, styles, CODEBOOK, in.codebookColumns());
    for (List<String> code : in.codebookRows()) {
      sheet.row();
      for (String cell : code) {
        sheet.text(cell);
      }
    }
    sheet.finish();
  }

  /**
   * One row per question, code and wave, the waves as the findings show them: the share with its
   * interval, its flags and any projection, or, where the code has no share, the reason.
   */
  private static void findings(
      SXSSFWorkbook book, WorkbookSheet.Styles styles, CodedWorkbookInput in)
      throws InputException {
    WorkbookSheet sheet = new WorkbookSheet(book, styles, FINDINGS, FINDINGS_HEADER);
    for (QuestionFindings q : in.findings().questions()) {
      for (CodeFrequency code : q.codes()) {
        for (String wave : q.bases().keySet()) {
          sheet
              .row()
              .text(q.question())
              .text(code.code())
              .text(code.codeId())
              .text(code.parent().orElse(""))
              .number(code.theme() ? 1 : 0)
              .text(code.direction())
              .text(wave);
          Share s = code.waves().get(wave);
          Coverage cov = q.coverage().get(wave);
          if (s == null) {
            sheet.blank().blank().blank().blank().blank().blank().blank().blank();
            sheet.blank().blank().blank();
            answers(sheet, cov).text(code.noShare().getOrDefault(wave, ""));
            continue;
          }
          sheet
              .number(s.count())
              .number(s.base())
              .percent(s.share())
              .percent(s.ci().lower())
              .percent(s.ci().upper())
              .number(s.byRule() ? 1 : 0)
              .number(s.smallBase() ? 1 : 0)
              .number(s.imprecise() ? 1 : 0);
          if (s.projected().isPresent()) {
            sheet
                .number(Math.round(s.projected().get().count()))
                .number(s.projected().get().lower())
                .number(s.projected().get().upper());
          } else {
            sheet.blank().blank().blank();
          }
          answers(sheet, cov).blank();
        }
      }
    }
    sheet.finish();
  }

  private static WorkbookSheet answers(WorkbookSheet sheet, Coverage cov) {
    return cov == null ? sheet.blank() : sheet.number(cov.answers());
  }

  /** One row per comparison of a code between two waves. */
  private static void changes(
      SXSSFWorkbook book, WorkbookSheet.Styles styles, CodedWorkbookInput in)
      throws InputException {
    WorkbookSheet sheet = new WorkbookSheet(book, styles, CHANGES, CHANGES_HEADER);
    for (QuestionFindings q : in.findings().questions()) {
      for (WaveChange c : q.changes()) {
        sheet
            .row()
            .text(q.question())
            .text(c.code())
            .text(c.codeId())
            .text(c.from())
            .text(c.to())
            .percent(c.diff())
            .percent(c.ci().lower())
            .percent(c.ci().upper())
            .number(c.p())
            .number(c.pAdjusted())
            .text(c.verdict())
            .number(c.byRule() ? 1 : 0);
      }
    }
    sheet.finish();
  }
}
