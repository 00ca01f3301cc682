package riffle.app;

import java.io.IOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import java.util.TreeSet;
import riffle.coding.CodebookFile;
import riffle.model.AnswerRead;
import riffle.model.Assignment;
import riffle.model.Code;
import riffle.model.Coverage;
import riffle.model.Findings;
import riffle.model.InputException;
import riffle.model.Origin;
import riffle.model.QuestionFindings;
import riffle.model.SegmentFindings;
import riffle.report.CodedExport;
import riffle.report.CodedWorkbookInput;
import riffle.report.ExportAnswer;
import riffle.report.ExportAssignment;
import riffle.report.Exports;
import riffle.report.Report;
import riffle.report.ReportAnswer;
import riffle.report.ReportCode;
import riffle.report.ReportInput;
import riffle.report.ReportSettings;
import riffle.store.ProjectStore;

/** Findings and exports of a project: read from the project file, computed by {@code report}. */
public final class Reporting {
  private final ProjectStore store;

  Reporting(ProjectStore store) {
    this.store = store;
  }

  /** What the findings are computed from, loaded once. */
  private record Loaded(
      List<String> questions,
      List<String> waves,
      List<Code> codes,
      List<ProjectStore.AnswerRow> rows,
      Map<Long, List<Assignment>> assignments,
      Map<Long, AnswerRead> reads) {}

  private Loaded load(Optional<String> question) throws InputException {
    List<String> questions = store.questions();
    Optional<String> only =
        question.map(q -> Lookups.question(q, questions, store.questionNames()));
    List<String> waves = store.waveNames();
    List<ProjectStore.AnswerRow> rows = store.answerRows(List.of(), only);
    List<Long> ids = new ArrayList<>(rows.size());
    rows.forEach(r -> ids.add(r.id()));
    return new Loaded(
        only.map(List::of).orElse(questions),
        waves,
        store.codes(),
        rows,
        store.assignments(ids),
        store.reads());
  }

  /**
   * Theme frequencies with intervals, changes between waves, co-occurrence and saturation.
   *
   * @throws IllegalArgumentException when the query names a question, wave or segment the project
   *     lacks
   */
  public Findings findings(FindingsQuery query) throws InputException {
    return new Findings(findings(load(query.question()), query).questions(), store.questionNames());
  }

  /**
   * The segment columns of a question's answers (every question's when none is given) with their
   * values, merged as the findings merge them, and each value's answers, substantive answers and
   * answers read, in one wave or all.
   *
   * @throws IllegalArgumentException when the question or wave is not the project's
   */
  public List<SegmentColumn> segments(Optional<String> question, Optional<String> wave)
      throws InputException {
    Loaded l = load(question);
    Optional<String> only = wave.map(w -> Lookups.wave(w, l.waves, "wave"));
    Set<String> columns = new TreeSet<>();
    for (ProjectStore.AnswerRow r : l.rows) {
      if (only.isEmpty() || only.get().equals(r.wave())) {
        columns.addAll(r.segments().keySet());
      }
    }
    List<SegmentColumn> out = new ArrayList<>(columns.size());
    for (String column : columns) {
      Findings f =
          findings(
              l,
              new FindingsQuery(question, Optional.of(column), Optional.empty(), Optional.empty()));
      // Per value in the findings' order; with every question, a value's counts are summed.
      Map<String, int[]> counts = new LinkedHashMap<>();
      for (QuestionFindings q : f.questions()) {
        for (SegmentFindings s : q.segments()) {
          int[] c = counts.computeIfAbsent(s.value(), v -> new int[3]);
          for (Map.Entry<String, Coverage> e : s.coverage().entrySet()) {
            if (only.isEmpty() || only.get().equals(e.getKey())) {
              Coverage cov = e.getValue();
              c[0] += cov.answers() + cov.nonAnswers();
              c[1] += cov.answers();
              c[2] += cov.read();
            }
          }
        }
      }
      List<SegmentColumn.Value> values = new ArrayList<>(counts.size());
      counts.forEach(
          (v, c) -> {
            if (c[0] > 0) {
              values.add(
                  new SegmentColumn.Value(
                      v,
                      c[0],
                      c[1],
                      c[2],
                      c[2] < Report.SMALL_BASE,
                      !v.equals(SegmentFindings.NO_VALUE)));
            }
          });
      if (values.stream().anyMatch(SegmentColumn.Value::filterable)) {
        out.add(new SegmentColumn(column, values));
      }
    }
    return out;
  }

  private Findings findings(Loaded l, FindingsQuery query) throws InputException {
    ReportSettings settings = ReportSettings.DEFAULTS;
    if (query.segment().isPresent()) {
      settings = settings.withSegment(query.segment().get());
    }
    if (query.from().isPresent() || query.to().isPresent()) {
      settings =
          new ReportSettings(
              settings.segment(),
              query.from().map(w -> Lookups.wave(w, l.waves, "from")),
              query.to().map(w -> Lookups.wave(w, l.waves, "to")),
              false);
    }
    List<ReportAnswer> answers = new ArrayList<>(l.rows.size());
    for (ProjectStore.AnswerRow r : l.rows) {
      List<Assignment> as = l.assignments.getOrDefault(r.id(), List.of());
      AnswerRead read = l.reads.get(r.id());
      Set<String> codes = new HashSet<>();
      Set<String> byRule = new HashSet<>();
      for (Assignment a : as) {
        codes.add(Long.toString(a.codeId()));
        // A rule's code counts as a person's when it was on the answer while they read it; one a
        // rule gave later, or to an answer nobody read, is the rule's alone.
        if (a.origin() == Origin.RULE && (read == null || a.at().isAfter(read.last()))) {
          byRule.add(Long.toString(a.codeId()));
        }
      }
      answers.add(
          new ReportAnswer(
              Long.toString(r.id()),
              r.wave(),
              r.question(),
              r.substantive(),
              codes,
              r.segments(),
              // Reading order: when a person first read it (ties, such as one import, in id order).
              read == null ? OptionalLong.empty() : OptionalLong.of(read.first().toEpochMilli()),
              read != null,
              byRule));
    }
    return Report.compute(
        new ReportInput(l.questions, l.waves, codebook(l.codes), answers, randomSamples()),
        settings);
  }

  /**
   * Per question, the waves whose read answers are a random sample of the wave's: the first k of a
   * review queue of the whole wave (a queue of one segment samples that segment, not the wave).
   */
  private Map<String, Set<String>> randomSamples() throws InputException {
    Map<String, Set<String>> out = new HashMap<>();
    for (QueueStatus s : new ReviewQueues(store).all()) {
      if (s.queue().segment().isEmpty() && s.sample().random()) {
        out.computeIfAbsent(s.queue().question(), q -> new HashSet<>()).add(s.queue().wave());
      }
    }
    return out;
  }

  /** The findings as one self-contained HTML page. */
  public String html(Findings findings, String title) {
    return Exports.html(findings, title);
  }

  /** The findings as Markdown. */
  public String markdown(Findings findings, String title) {
    return Exports.markdown(findings, title);
  }

  /**
   * The coded answers as CSV: one row per answer with a 0/1 column per code, or ({@code long}) one
   * row per assignment. Masked text only.
   */
  public String codedCsv(Optional<String> question, boolean longFormat, boolean withBom)
      throws InputException {
    CodedExport export = codedExport(load(question));
    return longFormat
        ? Exports.codedAnswersLongCsv(export, withBom)
        : Exports.codedAnswersCsv(export, withBom);
  }

  /**
   * The coded answers as an Excel workbook written to {@code out}: the rows of both CSV forms, the
   * codebook and the findings of the same answers, one sheet each. Masked text only.
   *
   * @throws InputException when the question is not the project's, or a cell or a sheet would
   *     exceed what a workbook holds
   */
  public void codedWorkbook(Optional<String> question, OutputStream out)
      throws InputException, IOException {
    Loaded l = load(question);
    Findings findings =
        findings(
            l, new FindingsQuery(question, Optional.empty(), Optional.empty(), Optional.empty()));
    Exports.codedAnswersWorkbook(
        new CodedWorkbookInput(
            codedExport(l), CodebookFile.COLUMNS, CodebookFile.rows(l.codes), findings),
        out);
  }

  private static CodedExport codedExport(Loaded l) {
    List<ExportAnswer> answers = new ArrayList<>(l.rows.size());
    for (ProjectStore.AnswerRow r : l.rows) {
      List<ExportAssignment> as = new ArrayList<>();
      for (Assignment a : l.assignments.getOrDefault(r.id(), List.of())) {
        as.add(
            new ExportAssignment(
                Long.toString(a.codeId()),
                a.coder(),
                a.origin().name().toLowerCase(Locale.ROOT),
                a.span().map(s -> s.start()).orElse(ExportAssignment.WHOLE_ANSWER),
                a.span().map(s -> s.end()).orElse(ExportAssignment.WHOLE_ANSWER)));
      }
      answers.add(
          new ExportAnswer(
              Long.toString(r.id()),
              r.respondent(),
              r.wave(),
              r.question(),
              r.substantive(),
              r.masked(),
              r.segments(),
              as,
              l.reads.containsKey(r.id()) ? l.reads.get(r.id()).readers() : List.of()));
    }
    return new CodedExport(codebook(l.codes), answers);
  }

  /** The codebook as Markdown, themes above their codes. */
  public String codebookMarkdown(String title) throws InputException {
    return Exports.codebookMarkdown(codebook(store.codes()), title);
  }

  private static List<ReportCode> codebook(List<Code> codes) {
    List<ReportCode> out = new ArrayList<>(codes.size());
    Map<Long, Code> byId = new HashMap<>();
    codes.forEach(c -> byId.put(c.id(), c));
    for (Code c : codes) {
      out.add(
          new ReportCode(
              Long.toString(c.id()),
              c.name(),
              c.parent().isPresent()
                  ? Optional.of(Long.toString(c.parent().getAsLong()))
                  : Optional.empty(),
              c.direction().name().toLowerCase(Locale.ROOT),
              c.archived()));
    }
    return out;
  }
}
