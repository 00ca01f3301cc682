package riffle.app;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.text.Normalizer;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import riffle.ingest.CodeList;
import riffle.ingest.Column;
import riffle.ingest.DateColumn;
import riffle.ingest.NonAnswers;
import riffle.ingest.SurveyReader;
import riffle.ingest.SurveyRow;
import riffle.ingest.SurveyTable;
import riffle.ingest.UnreadableInputException;
import riffle.model.Analysis;
import riffle.model.BatchOutcome;
import riffle.model.ColumnRole;
import riffle.model.ControlChars;
import riffle.model.InputException;
import riffle.model.InputProblem;
import riffle.model.NewAnswer;
import riffle.model.NewRespondent;
import riffle.model.Progress;
import riffle.model.SettingException;
import riffle.model.WaveBatch;
import riffle.store.ProjectFileException;
import riffle.store.ProjectStore;
import riffle.text.AnalysisCodec;
import riffle.text.TextAnalyzer;

/** Reads an export and stores it as (part of) a wave, all in one transaction. */
final class WaveImporter {
  /** The coder recorded for imported codes when the export has no coder column. */
  static final String DEFAULT_CODER = "import";

  private final ProjectStore store;
  private final Indexes.Around storing;
  private final Map<String, Analyses.Parsed> analysed;

  /**
   * An importer into {@code store}; {@code storing} wraps the writes to the project and the
   * analysis cache (the search index holds its lock around them); {@code analysed} keeps the
   * analysis of each text, so that a second attempt with the same table analyses nothing again.
   */
  WaveImporter(ProjectStore store, Indexes.Around storing, Map<String, Analyses.Parsed> analysed) {
    this.store = store;
    this.storing = storing;
    this.analysed = analysed;
  }

  /** Stores a table read by {@link #read} as (part of) the requested wave. */
  ImportReport store(ImportRequest request, SurveyTable table, Progress progress)
      throws InputException {
    String wave = request.wave().map(String::strip).orElseGet(() -> defaultWave(request));
    if (wave.isEmpty()) {
      throw new SettingException("wave", "the wave name is empty; name the wave");
    }
    if (request.wave().isEmpty()) {
      try {
        ControlChars.checkName("the wave name", wave);
      } catch (InputException e) {
        throw new SettingException(
            "wave", e.getMessage() + " (it comes from the file's name; name the wave instead)");
      }
    }
    Optional<LocalDate> stored = store.waveDate(wave);
    if (stored.isPresent()
        && request.fieldedOn().isPresent()
        && !stored.get().equals(request.fieldedOn().get())) {
      throw new InputException(
          "wave \""
              + wave
              + "\" is dated "
              + stored.get()
              + ", not "
              + request.fieldedOn().get()
              + "; leave out its date to add to it, or name a new wave");
    }
    DateColumn.Reading dates =
        DateColumn.read(table, request.settings().dateOrder(), request.settings().maxProblems());
    if (stored.isEmpty() && request.fieldedOn().isEmpty() && dates.unsettled().isPresent()) {
      throw new SettingException("date order", dates.unsettled().get());
    }
    LocalDate date =
        stored
            .or(request::fieldedOn)
            .orElseGet(() -> dates.latest().orElse(LocalDate.now(ZoneId.systemDefault())));

    List<Column> texts = table.columnsWith(ColumnRole.TEXT);
    List<String> questions = texts.stream().map(Column::header).toList();
    Map<String, String> questionNames = new LinkedHashMap<>();
    for (Column t : texts) {
      if (!t.name().isEmpty()) {
        questionNames.put(t.header(), t.name());
      }
    }
    List<NewRespondent> respondents =
        respondents(table, texts, store.storedTexts(wave), analysed, progress);
    WaveBatch batch =
        new WaveBatch(
            wave,
            date,
            table.source(),
            sha256(request),
            table.encoding(),
            table.delimiter().label(),
            table.rows().size() + table.skippedRows(),
            table.skippedRows(),
            questions,
            questionNames,
            respondents,
            request.actor(),
            AnalysisCodec.VERSION);
    BatchOutcome outcome =
        storing.around(
            () -> {
              BatchOutcome o = store.store(batch, progress);
              Analyses.cache(store.file(), o.added(), analysed);
              Analyses.refresh(store, progress);
              return o;
            });
    List<InputProblem> problems = new ArrayList<>(table.problems());
    problems.addAll(dates.problems());
    problems.addAll(outcome.problems());
    problems.addAll(analysedInPart(table.source(), respondents, request.settings().maxProblems()));
    return new ImportReport(
        wave,
        date,
        stored.isPresent()
            ? "the wave's date"
            : request.fieldedOn().isPresent()
                ? "as given"
                : dates.latest().isPresent()
                    ? "the latest date in column '"
                        + dates.column().orElseThrow()
                        + "', read "
                        + dates.read()
                    : dates.column().isPresent()
                        ? "today: no date in column '" + dates.column().get() + "' could be read"
                        : "today: the export has no date column",
        table.source(),
        table.encoding(),
        table.delimiter().label(),
        table.columns().stream().map(ImportReport.ColumnReport::of).toList(),
        table.rows().size() + table.skippedRows(),
        outcome.answersAdded(),
        table.skippedRows(),
        outcome.duplicateRows(),
        outcome.codesCreated(),
        outcome.assignmentsAdded(),
        problems);
  }

  /**
   * Notes for the answers longer than the analysed prefix: stored whole, analysed in part. At most
   * {@code max} are listed, then one line counting the rest.
   */
  static List<InputProblem> analysedInPart(
      String source, List<NewRespondent> respondents, int max) {
    List<InputProblem> out = new ArrayList<>();
    long unlisted = 0;
    for (NewRespondent r : respondents) {
      for (NewAnswer a : r.answers()) {
        if (!a.analysis().truncated()) {
          continue;
        }
        if (out.size() < max) {
          out.add(
              new InputProblem(
                  source,
                  a.line(),
                  a.column(),
                  String.format(
                      Locale.ROOT,
                      "this answer is %,d characters long; it is stored, searched and shown"
                          + " whole, but only its first %,d characters are analysed for phrases,"
                          + " suggestions and quotes",
                      a.original().length(),
                      TextAnalyzer.MAX_ANALYSED_CHARS)));
        } else {
          unlisted++;
        }
      }
    }
    if (unlisted > 0) {
      out.add(
          new InputProblem(
              source,
              0,
              0,
              unlisted
                  + (unlisted == 1 ? " more answer" : " more answers")
                  + " analysed only in part, not listed"));
    }
    return out;
  }

  /** Reads the request's export, before any project is opened. */
  static SurveyTable read(ImportRequest request, Progress progress)
      throws UnreadableInputException {
    progress.update("reading", 0, -1);
    ImportSource source = request.source();
    if (source instanceof ImportSource.File f) {
      return SurveyReader.readFile(f.path(), request.settings());
    }
    if (source instanceof ImportSource.Paste p) {
      return SurveyReader.readPaste(p.text(), request.settings());
    }
    ImportSource.Bytes b = (ImportSource.Bytes) source;
    return SurveyReader.readBytes(b.name(), b.bytes(), request.settings());
  }

  private String defaultWave(ImportRequest request) {
    if (request.source() instanceof ImportSource.File f) {
      return baseName(f.path().getFileName().toString());
    }
    if (request.source() instanceof ImportSource.Bytes b) {
      return baseName(b.name());
    }
    try {
      return "Wave " + (store.waveCount() + 1);
    } catch (ProjectFileException e) {
      return "Pasted wave";
    }
  }

  private static String baseName(String fileName) {
    int dot = fileName.lastIndexOf('.');
    return dot > 0 ? fileName.substring(0, dot) : fileName;
  }

  /**
   * Builds the respondents of a table, analysing every answer that is not already stored with the
   * same text (those would be duplicates, and analysing them is wasted work).
   */
  private static List<NewRespondent> respondents(
      SurveyTable table,
      List<Column> texts,
      Map<String, String> stored,
      Map<String, Analyses.Parsed> analysed,
      Progress progress) {
    Optional<Column> id = first(table, ColumnRole.ID);
    Optional<Column> date = first(table, ColumnRole.DATE);
    Optional<Column> coder = first(table, ColumnRole.CODER);
    List<Column> metas = table.columnsWith(ColumnRole.META);
    List<Column> codes = table.columnsWith(ColumnRole.CODES);
    List<String> ids = new ArrayList<>(table.rows().size());
    // Per row and question: the NFC text, and whether the wave already holds this very answer.
    String[][] normalized = new String[table.rows().size()][texts.size()];
    boolean[][] known = new boolean[table.rows().size()][texts.size()];
    List<String> fresh = new ArrayList<>();
    for (int r = 0; r < table.rows().size(); r++) {
      SurveyRow row = table.rows().get(r);
      String externalId = id.map(c -> row.cell(c).strip()).orElse("");
      if (externalId.isEmpty()) {
        externalId = "row-" + row.number();
      }
      ids.add(externalId);
      for (int q = 0; q < texts.size(); q++) {
        Column t = texts.get(q);
        String original = row.cell(t);
        normalized[r][q] = Normalizer.normalize(original, Normalizer.Form.NFC);
        known[r][q] = original.equals(stored.get(ProjectStore.answerKey(externalId, t.header())));
        if (!known[r][q]) {
          fresh.add(normalized[r][q]);
        }
      }
    }
    // Each distinct text is analysed once, and kept encoded until it is stored.
    List<String> unknown = fresh.stream().distinct().filter(t -> !analysed.containsKey(t)).toList();
    Iterator<Analyses.Parsed> done = Analyses.parseAll(unknown, progress).iterator();
    for (String text : unknown) {
      analysed.put(text, done.next());
    }
    Iterator<Analysis> analyses = fresh.stream().map(t -> analysed.get(t).analysis()).iterator();
    List<NewRespondent> out = new ArrayList<>(table.rows().size());
    for (int r = 0; r < table.rows().size(); r++) {
      SurveyRow row = table.rows().get(r);
      String externalId = ids.get(r);
      Map<String, String> meta = new LinkedHashMap<>();
      for (Column m : metas) {
        String value = row.cell(m).strip();
        if (!value.isEmpty()) {
          meta.put(m.header(), value);
        }
      }
      String coderName = coder.map(c -> row.cell(c).strip()).orElse("");
      if (coderName.isEmpty()) {
        coderName = DEFAULT_CODER;
      }
      List<NewAnswer> answers = new ArrayList<>(texts.size());
      for (int q = 0; q < texts.size(); q++) {
        Column t = texts.get(q);
        String original = row.cell(t);
        List<String> assigned = new ArrayList<>();
        boolean codedElsewhere = false;
        for (Column c : codes) {
          if (c.answersColumn() == t.index()) {
            assigned.addAll(CodeList.split(row.cell(c)));
            codedElsewhere = true;
          }
        }
        answers.add(
            new NewAnswer(
                t.header(),
                original,
                normalized[r][q],
                !NonAnswers.isNonAnswer(original),
                row.line(),
                t.index() + 1,
                assigned,
                coderName,
                known[r][q] ? Analyses.unanalysed(normalized[r][q]) : analyses.next(),
                codedElsewhere));
      }
      out.add(
          new NewRespondent(
              externalId,
              row.line(),
              date.map(c -> row.cell(c).strip()).orElse(""),
              meta,
              answers));
    }
    return out;
  }

  private static Optional<Column> first(SurveyTable table, ColumnRole role) {
    return table.columnsWith(role).stream().findFirst();
  }

  private static String sha256(ImportRequest request) {
    MessageDigest digest;
    try {
      digest = MessageDigest.getInstance("SHA-256");
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("this Java runtime lacks SHA-256", e);
    }
    ImportSource source = request.source();
    if (source instanceof ImportSource.File f) {
      try (InputStream in = new DigestInputStream(Files.newInputStream(f.path()), digest)) {
        in.transferTo(OutputStream.nullOutputStream());
      } catch (IOException e) {
        // The file was just read in full; if it vanished since, the digest stays partial.
      }
    } else if (source instanceof ImportSource.Paste p) {
      digest.update(p.text().getBytes(StandardCharsets.UTF_8));
    } else {
      digest.update(((ImportSource.Bytes) source).bytes());
    }
    return HexFormat.of().formatHex(digest.digest());
  }
}
