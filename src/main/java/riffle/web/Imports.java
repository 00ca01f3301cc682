package riffle.web;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.time.DateTimeException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.Stream;
import riffle.app.ImportReport;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.model.ColumnRole;
import riffle.model.InputException;
import riffle.model.PhaseClock;
import riffle.model.Progress;

/**
 * Bringing in a wave from the page: uploaded files held until they are imported, the request built
 * from the page's choices, and import jobs that report their progress. Thread-safe.
 *
 * <p>An upload is streamed to a file in a private temporary folder as it arrives (never held in
 * memory), under its own name so that problems and the default wave name read as they would for
 * {@code riffle import --file}. The folder is deleted by {@link #close}.
 */
final class Imports implements AutoCloseable {
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
   * {@code paste} (pasted cells), then the reading options, each optional ({@code sheet} names a
   * workbook's sheet by name or number).
   */
  record Source(
      String upload,
      String paste,
      String delimiter,
      String encoding,
      String dateOrder,
      String sheet,
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
   * @param pace the phase's units per second and seconds left, once they can be told; null before
   * @param report what the import did, once done
   * @param error why it failed ({@code error}, {@code where}), once failed
   */
  record JobState(
      String job,
      String state,
      String phase,
      long done,
      long total,
      PhaseClock.Estimate pace,
      ImportReport report,
      Map<String, Object> error) {}

  /** An upload's receipt. */
  record Upload(String upload, String name, long bytes) {}

  /** Longest file name kept, in UTF-8 bytes (file systems allow 255). */
  static final int MAX_NAME_BYTES = 200;

  private final Path folder;
  private final long maxBytes;
  private final Map<String, Path> uploads = new LinkedHashMap<>();
  private final Map<String, JobState> jobs = new LinkedHashMap<>();
  private final AtomicLong ids = new AtomicLong();

  /**
   * Creates the temporary folder for uploads.
   *
   * @param maxBytes the largest upload accepted
   * @throws UncheckedIOException when the folder cannot be created
   */
  Imports(long maxBytes) {
    this.maxBytes = maxBytes;
    try {
      this.folder = Files.createTempDirectory("riffle-uploads-");
    } catch (IOException e) {
      throw new UncheckedIOException(
          "cannot create a temporary folder for uploads (" + e.getMessage() + ")", e);
    }
  }

  /**
   * Streams an uploaded file to disk and keeps it until it is imported or pushed out by newer
   * uploads (the oldest first).
   *
   * @param name the file's name as the browser gave it; only its last path segment is kept
   * @param body the file's bytes
   * @throws ApiError 400 for an unusable name, 413 when the file is larger than the limit (nothing
   *     is kept)
   * @throws IOException when the body cannot be read or the file written
   */
  Upload upload(String name, InputStream body) throws IOException {
    String fileName = fileName(name);
    String id = "u" + ids.incrementAndGet();
    Path dir = Files.createDirectory(folder.resolve(id));
    Path file;
    try {
      file = dir.resolve(fileName);
    } catch (InvalidPathException e) {
      delete(dir);
      throw ApiError.badParameter("name", "the file's name cannot be used here; rename the file");
    }
    long total = 0;
    try (OutputStream out = Files.newOutputStream(file)) {
      byte[] buffer = new byte[64 * 1024];
      for (int n = body.read(buffer); n >= 0; n = body.read(buffer)) {
        total += n;
        if (total > maxBytes) {
          throw tooLarge(maxBytes);
        }
        out.write(buffer, 0, n);
      }
    } catch (IOException | RuntimeException e) {
      delete(dir);
      throw e;
    }
    List<Path> dropped = new ArrayList<>();
    synchronized (this) {
      uploads.put(id, file);
      while (uploads.size() > MAX_UPLOADS) {
        String oldest = uploads.keySet().iterator().next();
        dropped.add(uploads.remove(oldest).getParent());
      }
    }
    dropped.forEach(Imports::delete);
    return new Upload(id, fileName, total);
  }

  /** The temporary folder the uploads are written to. */
  Path folder() {
    return folder;
  }

  /** The refusal of an upload over {@code maxBytes}. */
  static ApiError tooLarge(long maxBytes) {
    return new ApiError(
        413,
        "the file is larger than "
            + (maxBytes >> 20)
            + " MiB; split it, or import it with riffle import --file (and --max-mb)");
  }

  /** The last path segment of a browser's file name, checked to be a plain file name. */
  static String fileName(String name) {
    String n = name.strip();
    n = n.substring(Math.max(n.lastIndexOf('/'), n.lastIndexOf('\\')) + 1).strip();
    if (n.isEmpty() || n.equals(".") || n.equals("..")) {
      throw ApiError.badParameter("name", "give the file's name as ?name=, such as wave-3.csv");
    }
    if (n.codePoints().anyMatch(c -> Character.isISOControl(c) || c == ':')) {
      throw ApiError.badParameter(
          "name", "the file's name holds a control character or a colon; rename the file");
    }
    if (n.getBytes(StandardCharsets.UTF_8).length > MAX_NAME_BYTES) {
      throw ApiError.badParameter("name", "the file's name is too long; rename the file");
    }
    return n;
  }

  /** Deletes every upload still held and the folder; later uploads fail. */
  @Override
  public void close() {
    synchronized (this) {
      uploads.clear();
    }
    delete(folder);
  }

  private static void delete(Path path) {
    if (!Files.exists(path)) {
      return;
    }
    try (Stream<Path> all = Files.walk(path)) {
      for (Path p : all.sorted(Comparator.reverseOrder()).toList()) {
        Files.deleteIfExists(p);
      }
    } catch (IOException e) {
      // A temporary file left behind is removed by the system's temporary-folder cleaning.
    }
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
      Path file;
      synchronized (this) {
        file = uploads.get(s.upload());
      }
      if (file == null) {
        throw ApiError.notFound(
            "the uploaded file " + s.upload() + " is no longer held; choose the file again");
      }
      source = new ImportSource.File(file);
    } else {
      if (s.paste().isBlank()) {
        throw ApiError.badField("paste", "nothing was pasted; paste the cells, header row first");
      }
      source = new ImportSource.Paste(s.paste());
    }
    ImportRequest.Builder b = ImportRequest.from(source).actor(actor);
    try {
      b.delimiter(Optional.ofNullable(s.delimiter()).orElse("auto"));
    } catch (InputException e) {
      throw ApiError.badField("delimiter", e.getMessage());
    }
    try {
      b.encoding(Optional.ofNullable(s.encoding()).orElse("auto"));
    } catch (InputException e) {
      throw ApiError.badField("encoding", e.getMessage());
    }
    try {
      b.dateOrder(s.dateOrder());
    } catch (InputException e) {
      throw ApiError.badField("date_order", e.getMessage());
    }
    b.sheet(s.sheet());
    if (s.wave() != null) {
      if (s.wave().isBlank()) {
        throw ApiError.badField("wave", "the wave needs a name");
      }
      try {
        b.wave(s.wave().strip());
      } catch (InputException e) {
        throw ApiError.badField("wave", e.getMessage());
      }
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
        } catch (InputException e) {
          throw ApiError.badField("columns." + i, e.getMessage());
        }
      }
    }
    try {
      return b.get();
    } catch (InputException e) {
      throw ApiError.badField("columns", e.getMessage());
    }
  }

  /** Registers a new job, queued. */
  synchronized String newJob() {
    String id = "j" + ids.incrementAndGet();
    jobs.put(id, new JobState(id, "queued", "waiting", 0, -1, null, null, null));
    while (jobs.size() > MAX_JOBS) {
      jobs.remove(jobs.keySet().iterator().next());
    }
    return id;
  }

  /** A progress listener that records the job's phase. */
  Progress progress(String job) {
    PhaseClock clock = new PhaseClock();
    return (phase, done, total) -> {
      Optional<PhaseClock.Estimate> pace = clock.update(phase, done, total, System.nanoTime());
      update(job, "running", phase, done, total, pace.orElse(null), null, null);
    };
  }

  void finished(String job, ImportReport report) {
    update(job, "done", "done", 1, 1, null, report, null);
  }

  void failed(String job, Map<String, Object> error) {
    update(job, "failed", "failed", 0, -1, null, null, error);
  }

  private synchronized void update(
      String job,
      String state,
      String phase,
      long done,
      long total,
      PhaseClock.Estimate pace,
      ImportReport report,
      Map<String, Object> error) {
    if (jobs.containsKey(job)) {
      jobs.put(job, new JobState(job, state, phase, done, total, pace, report, error));
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
