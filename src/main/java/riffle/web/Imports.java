package riffle.web;

import java.time.DateTimeException;
import java.time.LocalDate;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicLong;
import riffle.app.ImportReport;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.model.ColumnRole;
import riffle.model.Progress;

/**
 * Bringing in a wave from the page: uploaded files held until they are imported, the request built
 * from the page's choices, and import jobs that report their progress. Thread-safe.
 */
final class Imports {
  /** Uploads kept at once; the oldest is dropped first. */
  static final int MAX_UPLOADS = 8;

  /** Finished jobs kept for polling; the oldest is dropped first. */
  static final int MAX_JOBS = 32;

  /**
   * The page's choice of role for one column.
   *
   * @param header the column's header, as the preview gave it
   * @param role its role
   */
  record ColumnChoice(String header, ColumnRole role) {}

  /**
   * What to read and how: exactly one of {@code upload} (an id from {@code POST /api/uploads}) and
   * {@code paste} (pasted cells), then the reading options, each optional.
   */
  record Source(
      String upload,
      String paste,
      String delimiter,
      String encoding,
      List<ColumnChoice> columns,
      String wave,
      String date,
      Integer rows) {}

  /**
   * One import job's state, as the page polls it.
   *
   * @param job its id
   * @param state queued, running, done or failed
   * @param phase what it is doing ("reading", "analysing", "storing" …)
   * @param done units of the phase finished
   * @param total units of the phase, -1 when unknown
   * @param report what the import did, once done
   * @param error why it failed ({@code error}, {@code where}), once failed
   */
  record JobState(
      String job,
      String state,
      String phase,
      long done,
      long total,
      ImportReport report,
      Map<String, Object> error) {}

  /** An upload's receipt. */
  record Upload(String upload, String name, int bytes) {}

  private final Map<String, ImportSource.Bytes> uploads = new LinkedHashMap<>();
  private final Map<String, JobState> jobs = new LinkedHashMap<>();
  private final AtomicLong ids = new AtomicLong();

  /** Keeps an uploaded file until it is imported or pushed out by newer uploads. */
  synchronized Upload upload(String name, byte[] bytes) {
    String id = "u" + ids.incrementAndGet();
    uploads.put(id, new ImportSource.Bytes(name, bytes));
    while (uploads.size() > MAX_UPLOADS) {
      uploads.remove(uploads.keySet().iterator().next());
    }
    return new Upload(id, name, bytes.length);
  }

  /**
   * Builds the import request the page asks for.
   *
   * @throws ApiError 400 naming the field at fault, 404 for an upload no longer held
   */
  ImportRequest request(Source s, String actor) {
    if ((s.upload() == null) == (s.paste() == null)) {
      throw ApiError.badField(
          "upload", "give either an uploaded file (upload) or pasted cells (paste), not both");
    }
    ImportSource source;
    if (s.upload() != null) {
      synchronized (this) {
        source = uploads.get(s.upload());
      }
      if (source == null) {
        throw ApiError.notFound(
            "the uploaded file " + s.upload() + " is no longer held; choose the file again");
      }
    } else {
      if (s.paste().isBlank()) {
        throw ApiError.badField("paste", "nothing was pasted; paste the cells, header row first");
      }
      source = new ImportSource.Paste(s.paste());
    }
    ImportRequest.Builder b = ImportRequest.from(source).actor(actor);
    try {
      b.delimiter(Optional.ofNullable(s.delimiter()).orElse("auto"));
    } catch (IllegalArgumentException e) {
      throw ApiError.badField("delimiter", e.getMessage());
    }
    try {
      b.encoding(Optional.ofNullable(s.encoding()).orElse("auto"));
    } catch (IllegalArgumentException e) {
      throw ApiError.badField("encoding", e.getMessage());
    }
    if (s.wave() != null) {
      if (s.wave().isBlank()) {
        throw ApiError.badField("wave", "the wave needs a name");
      }
      b.wave(s.wave().strip());
    }
    if (s.date() != null && !s.date().isBlank()) {
      try {
        b.fieldedOn(LocalDate.parse(s.date().strip()));
      } catch (DateTimeException e) {
        throw ApiError.badField(
            "date", "the date '" + s.date() + "' is not a date; write it as YYYY-MM-DD");
      }
    }
    if (s.columns() != null) {
      for (int i = 0; i < s.columns().size(); i++) {
        ColumnChoice c = s.columns().get(i);
        if (c == null || c.header() == null || c.header().isBlank() || c.role() == null) {
          throw ApiError.badField("columns." + i, "each column needs its header and a role");
        }
        try {
          b.column(c.header(), c.role());
        } catch (IllegalArgumentException e) {
          throw ApiError.badField("columns." + i, e.getMessage());
        }
      }
    }
    try {
      return b.get();
    } catch (IllegalArgumentException e) {
      throw ApiError.badField("columns", e.getMessage());
    }
  }

  /** Registers a new job, queued. */
  synchronized String newJob() {
    String id = "j" + ids.incrementAndGet();
    jobs.put(id, new JobState(id, "queued", "waiting", 0, -1, null, null));
    while (jobs.size() > MAX_JOBS) {
      jobs.remove(jobs.keySet().iterator().next());
    }
    return id;
  }

  /** A progress listener that records the job's phase. */
  Progress progress(String job) {
    return (phase, done, total) -> update(job, "running", phase, done, total, null, null);
  }

  void finished(String job, ImportReport report) {
    update(job, "done", "done", 1, 1, report, null);
  }

  void failed(String job, Map<String, Object> error) {
    update(job, "failed", "failed", 0, -1, null, error);
  }

  private synchronized void update(
      String job,
      String state,
      String phase,
      long done,
      long total,
      ImportReport report,
      Map<String, Object> error) {
    if (jobs.containsKey(job)) {
      jobs.put(job, new JobState(job, state, phase, done, total, report, error));
    }
  }

  /**
   * The job's state.
   *
   * @throws ApiError 404 for an unknown job
   */
  synchronized JobState job(String id) {
    JobState s = jobs.get(id);
    if (s == null) {
      throw ApiError.notFound("there is no import job " + id + "; start the import again");
    }
    return s;
  }
}
