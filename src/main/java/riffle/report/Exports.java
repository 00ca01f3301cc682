package riffle.report;

import java.io.IOException;
import java.io.OutputStream;
import java.util.List;
import java.util.Objects;
import riffle.model.Findings;
import riffle.model.InputException;

/**
 * Writes findings and coded answers as files analysts hand on: the report as one self-contained
 * HTML page or as Markdown, the coded answers as CSV (wide: one row per answer and one column per
 * code, 1/0 on read answers; long: one row per code given) as CSV or, with the codebook and the
 * findings, as one Excel workbook, and the codebook as CSV or Markdown.
 *
 * <p>Every method but the workbook's returns the whole document as a string, to be written as
 * UTF-8. Answer text is the masked text only. In HTML all project text is escaped and never becomes
 * markup; in Markdown, Markdown and HTML syntax are escaped; in CSV every cell that starts with =,
 * +, −, @, a tab or a carriage return gets a leading single quote (OWASP's CSV-injection guidance),
 * and {@code withBom} starts the document with U+FEFF, which UTF-8 writes as the byte-order mark
 * that spreadsheet programs look for. The workbook's cells are typed (numbers or text, never
 * formulas), so its text needs no such quote.
 */
public final class Exports {
  private Exports() {}

  /** The findings as one HTML page with inline CSS and SVG charts, and no scripts. */
  public static String html(Findings findings, String title) {
    return HtmlReport.write(Objects.requireNonNull(findings, "findings"), title);
  }

  /** The findings as Markdown. */
  public static String markdown(Findings findings, String title) {
    return MarkdownReport.write(Objects.requireNonNull(findings, "findings"), title);
  }

  /**
   * One row per answer: id, respondent, wave, question, substantive (1/0), read (1/0) and read_by
   * (who read it, "; " between names), one column per metadata key (sorted), the masked text, then
   * one column per active code in codebook order: 1 when the answer carries the code or a code
   * below it (as the findings count), 0 when a person read it and it does not, blank when nobody
   * has read it (unknown, not absent).
   *
   * @throws IllegalArgumentException when an answer carries a code the codebook does not have
   */
  public static String codedAnswersCsv(CodedExport export, boolean withBom) {
    return CodedCsv.wide(export, withBom);
  }

  /**
   * One row per code given: answer, respondent, wave, question, read (1/0) and read_by of the
   * answer, code id and name, archived (1/0), coder, origin, and the span (start, end, passage of
   * the masked text; empty for the whole answer). An answer a person read without giving it a code
   * has one row with the code's columns empty; an answer with no row was not read.
   *
   * @throws IllegalArgumentException when an answer carries a code the codebook does not have
   */
  public static String codedAnswersLongCsv(CodedExport export, boolean withBom) {
    return CodedCsv.longFormat(export, withBom);
  }

  /**
   * The coded answers as an Excel workbook (.xlsx) written to {@code out}: the sheets "Coded
   * answers" (the rows of {@link #codedAnswersCsv}), "Codes given" (those of {@link
   * #codedAnswersLongCsv}), "Codebook", "Findings" (each code's share per question and wave, with
   * count, base, interval and flags) and "Changes" (each comparison between waves). Flags, counts
   * and spans are number cells, shares number cells shown as percentages, all else text cells; each
   * header row is bold, stays in view and carries an autofilter. Streamed: a few rows per sheet in
   * memory at a time.
   *
   * @throws InputException when a cell or a sheet would exceed what a workbook holds (32,767
   *     characters a cell, 1,048,576 rows a sheet)
   * @throws IllegalArgumentException when an answer carries a code the codebook does not have
   */
  public static void codedAnswersWorkbook(CodedWorkbookInput in, OutputStream out)
      throws IOException, InputException {
    CodedWorkbook.write(Objects.requireNonNull(in, "in"), out);
  }

  /** The codebook as a nested Markdown list, themes above their codes. */
  public static String codebookMarkdown(List<ReportCode> codebook, String title) {
    return CodedCsv.codebookMarkdown(codebook, title);
  }
}
