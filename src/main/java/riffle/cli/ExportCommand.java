package riffle.cli;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import riffle.app.FindingsQuery;
import riffle.app.Project;
import riffle.model.EditOutcome;
import riffle.model.InputException;

/**
 * {@code riffle export}: coded answers, the codebook or the findings as files; the coded answers
 * also as one Excel workbook with the codebook and the findings.
 */
@Command(
    name = "export",
    mixinStandardHelpOptions = true,
    description = {
      "Writes a file: the coded answers (csv: one row per answer with a 0/1 column per "
          + "code, or --long: one row per code given; xlsx: an Excel workbook with both, the "
          + "codebook and the findings, one sheet each), the codebook (csv, json, md), the "
          + "findings (html, md, json) or the copy board of quotes (md, txt, csv, json).",
      "Answers are always masked."
    })
final class ExportCommand implements Callable<Integer> {
  enum What {
    CODED,
    CODEBOOK,
    FINDINGS,
    QUOTES
  }

  enum Format {
    CSV,
    MD,
    JSON,
    HTML,
    TXT,
    XLSX
  }

  @Spec CommandSpec spec;

  @Option(names = "--project", required = true, paramLabel = "P", description = "Project file.")
  Path project;

  @Option(
      names = "--what",
      required = true,
      paramLabel = "WHAT",
      description = "coded, codebook, findings or quotes (the copy board).")
  What what;

  @Option(
      names = "--format",
      required = true,
      paramLabel = "F",
      description =
          "csv, md, json, html, txt or xlsx (an Excel workbook; coded answers only). Coded"
              + " answers: csv or xlsx; codebook: csv, json or md; findings: html, md or json;"
              + " quotes: md, txt, csv or json.")
  Format format;

  @Option(names = "--out", required = true, paramLabel = "FILE", description = "The file to write.")
  Path out;

  @Option(
      names = "--question",
      paramLabel = "Q",
      description = "Only this question: its number or text.")
  String question;

  @Option(
      names = "--long",
      description = "Coded answers: one row per code given, with coder, origin and span.")
  boolean longFormat;

  @Option(
      names = "--bom",
      description = "Start CSV files with a byte-order mark, for spreadsheets.")
  boolean bom;

  @Mixin JsonOption json;

  @Override
  public Integer call() throws InputException {
    String title = project.getFileName().toString();
    FindingsQuery findings =
        new FindingsQuery(
            Optional.ofNullable(question), Optional.empty(), Optional.empty(), Optional.empty());
    try (Project p = Project.openExisting(project)) {
      OutputFiles.Contents contents =
          switch (what) {
            case CODED ->
                switch (format) {
                  case CSV ->
                      text(p.reporting().codedCsv(Optional.ofNullable(question), longFormat, bom));
                  case XLSX -> {
                    require(
                        !longFormat,
                        "the workbook holds both forms (sheets \"Coded answers\" and \"Codes"
                            + " given\"); leave out --long");
                    yield o -> p.reporting().codedWorkbook(Optional.ofNullable(question), o);
                  }
                  case MD, JSON, HTML, TXT ->
                      throw new InputException("coded answers are written as csv or xlsx");
                };
            case CODEBOOK ->
                switch (format) {
                  case CSV ->
                      text((bom ? "\uFEFF" : "") + p.codebook().exportCodebook("codebook.csv"));
                  case JSON -> text(p.codebook().exportCodebook("codebook.json"));
                  case MD -> text(p.reporting().codebookMarkdown("Codebook — " + title));
                  case HTML, TXT, XLSX ->
                      throw new InputException(
                          "the codebook is written as csv, json or md (or, with the coded answers,"
                              + " as xlsx: --what coded --format xlsx)");
                };
            case FINDINGS ->
                switch (format) {
                  case HTML ->
                      text(
                          p.reporting()
                              .html(p.reporting().findings(findings), "Findings — " + title));
                  case MD ->
                      text(
                          p.reporting()
                              .markdown(p.reporting().findings(findings), "Findings — " + title));
                  case JSON ->
                      text(
                          JsonOutput.MAPPER
                                  .writerWithDefaultPrettyPrinter()
                                  .writeValueAsString(p.reporting().findings(findings))
                              + "\n");
                  case CSV, TXT, XLSX ->
                      throw new InputException(
                          "the findings are written as html, md or json (or, with the coded"
                              + " answers, as xlsx: --what coded --format xlsx)");
                };
            case QUOTES ->
                switch (format) {
                  case MD -> text(p.quotes().exportBoard("md"));
                  case TXT -> text(p.quotes().exportBoard("txt"));
                  case CSV -> text((bom ? "\uFEFF" : "") + p.quotes().exportBoard("csv"));
                  case JSON ->
                      text(
                          JsonOutput.MAPPER
                                  .writerWithDefaultPrettyPrinter()
                                  .writeValueAsString(p.quotes().board())
                              + "\n");
                  case HTML, XLSX ->
                      throw new InputException("the copy board is written as md, txt, csv or json");
                };
          };
      OutputFiles.write(out, contents);
    } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
      throw new IllegalStateException("cannot write JSON: " + e.getMessage(), e);
    }
    PrintWriter w = spec.commandLine().getOut();
    EditOutcome done = new EditOutcome(0, "export", 0, 0, "Wrote " + out + ".");
    if (json.enabled) {
      JsonOutput.print(w, done);
    } else {
      w.println(done.message());
    }
    return 0;
  }

  private static OutputFiles.Contents text(String text) {
    return o -> o.write(text.getBytes(StandardCharsets.UTF_8));
  }

  private static void require(boolean ok, String message) {
    if (!ok) {
      throw new InputException(message);
    }
  }
}
