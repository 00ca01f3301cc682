package riffle.web;

import io.javalin.Javalin;
import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpResponseException;
import io.javalin.http.staticfiles.Location;
import io.javalin.json.JavalinJackson;
import io.javalin.validation.ValidationException;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URI;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.SecureRandom;
import java.util.Base64;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import riffle.app.ImportPreview;
import riffle.app.ImportReport;
import riffle.app.ImportRequest;
import riffle.app.PhraseQuery;
import riffle.app.Project;
import riffle.app.SuggestionTrainer;
import riffle.model.InputException;
import riffle.model.ShownText;

/**
 * Serves one project to the browser: the JSON API under {@code /api/} and the page from {@code
 * web/} (bundled in the jar, or a working copy). Listens on 127.0.0.1 unless told otherwise; on any
 * other address every API request needs the access token the server generates. Start with {@link
 * #start}, stop with {@link #close}. Thread-safe.
 */
public final class WebServer implements AutoCloseable {
  /** Largest upload accepted, as the importer's own limit (100 MiB). */
  static final long MAX_UPLOAD = 100L << 20;

  /**
   * Largest JSON body accepted (16 MiB): enough for cells pasted from a spreadsheet; a larger table
   * comes as an upload, which is streamed to disk.
   */
  static final long MAX_JSON = 16L << 20;

  /** Largest number of answers one search returns. */
  static final int MAX_HITS = 500;

  /**
   * How to serve.
   *
   * @param host the address to listen on ({@code 127.0.0.1} by default)
   * @param port the port, 0 for any free one
   * @param webDir serve the page from this folder instead of the jar's copy
   * @param requireToken require an access token even on loopback (as beyond loopback, where it is
   *     always required)
   * @param waitMillis how long a request waits for the project while other work holds it
   */
  public record Options(
      String host, int port, Optional<Path> webDir, boolean requireToken, long waitMillis) {
    public Options {
      Objects.requireNonNull(host, "host");
      Objects.requireNonNull(webDir, "webDir");
      if (host.isBlank()) {
        throw new IllegalArgumentException("--host needs an address, such as 127.0.0.1");
      }
      if (port < 0 || port > 65_535) {
        throw new IllegalArgumentException("--port must be between 0 and 65535, not " + port);
      }
      if (waitMillis < 1) {
        throw new IllegalArgumentException("waitMillis must be positive, not " + waitMillis);
      }
    }

    /** Loopback, any free port, the page from the jar. */
    public static Options defaults() {
      return new Options(
          "127.0.0.1", 0, Optional.empty(), false, ProjectAccess.WAIT_SECONDS * 1_000);
    }

    /** These options listening on {@code host} and {@code port}. */
    public Options at(String host, int port) {
      return new Options(host, port, webDir, requireToken, waitMillis);
    }

    /** These options serving the page from {@code folder}. */
    public Options webDir(Path folder) {
      return new Options(host, port, Optional.of(folder), requireToken, waitMillis);
    }

    /** These options with the access token required on loopback too. */
    public Options withToken() {
      return new Options(host, port, webDir, true, waitMillis);
    }

    /** These options with requests waiting at most {@code millis} for the project. */
    public Options waiting(long millis) {
      return new Options(host, port, webDir, requireToken, millis);
    }
  }

  private final Javalin app;
  private final ProjectAccess access;
  private final URI url;
  private final Optional<String> token;
  private final SuggestionTrainer trainer;
  private final Imports imports;

  private WebServer(
      Javalin app,
      ProjectAccess access,
      SuggestionTrainer trainer,
      Imports imports,
      URI url,
      Optional<String> token) {
    this.app = app;
    this.access = access;
    this.trainer = trainer;
    this.imports = imports;
    this.url = url;
    this.token = token;
  }

  /**
   * Opens the project (creating it when missing) and starts serving it.
   *
   * @throws InputException when the project file cannot be opened
   * @throws IllegalArgumentException when the web folder has no {@code index.html}
   * @throws IllegalStateException when the address cannot be listened on
   */
  public static WebServer start(Path project, Options options) throws InputException {
    if (options.webDir().isPresent()
        && !Files.isRegularFile(options.webDir().get().resolve("index.html"))) {
      throw new IllegalArgumentException(
          "--web-dir " + options.webDir().get() + " holds no index.html; point it at web/");
    }
    Optional<String> token =
        options.requireToken() || !Guard.isLoopback(options.host())
            ? Optional.of(newToken())
            : Optional.empty();
    Guard guard = new Guard(options.host(), token);
    ProjectAccess access = ProjectAccess.open(project, options.waitMillis());
    Imports imports;
    try {
      imports = new Imports(MAX_UPLOAD);
    } catch (UncheckedIOException e) {
      access.close();
      throw new IllegalStateException(e.getMessage(), e);
    }
    SuggestionTrainer trainer = new SuggestionTrainer(project);
    CodingRoutes coding = new CodingRoutes(access, trainer);
    QuoteRoutes quotes = new QuoteRoutes(access);
    Javalin app;
    try {
      app =
          Javalin.create(
                  cfg -> configure(cfg, options, guard, new Api(access, imports), coding, quotes))
              .start();
    } catch (RuntimeException e) {
      trainer.close();
      imports.close();
      access.close();
      throw new IllegalStateException(
          "cannot listen on " + options.host() + ":" + options.port() + " (" + e.getMessage() + ")",
          e);
    }
    guard.bound(app.port());
    String host = options.host().contains(":") ? "[" + options.host() + "]" : options.host();
    return new WebServer(
        app,
        access,
        trainer,
        imports,
        URI.create("http://" + host + ":" + app.port() + "/"),
        token);
  }

  private static String newToken() {
    byte[] bytes = new byte[24];
    new SecureRandom().nextBytes(bytes);
    return Base64.getUrlEncoder().withoutPadding().encodeToString(bytes);
  }

  private static void configure(
      JavalinConfig cfg,
      Options options,
      Guard guard,
      Api api,
      CodingRoutes coding,
      QuoteRoutes quotes) {
    cfg.startup.showJavalinBanner = false;
    cfg.startup.showOldJavalinVersionWarning = false;
    cfg.jetty.host = options.host();
    cfg.jetty.port = options.port();
    cfg.http.maxRequestSize = MAX_JSON;
    cfg.jetty.modifyServer(server -> server.setErrorHandler(new ErrorPages()));
    cfg.jsonMapper(new JavalinJackson(Json.MAPPER, false));
    cfg.staticFiles.add(
        sf -> {
          sf.hostedPath = "/";
          if (options.webDir().isPresent()) {
            sf.directory = options.webDir().get().toAbsolutePath().toString();
            sf.location = Location.EXTERNAL;
          } else {
            sf.directory = "/web";
            sf.location = Location.CLASSPATH;
          }
          sf.headers = Map.of("Cache-Control", "no-cache");
        });
    cfg.routes.before(guard::check);
    cfg.routes.get("/api/project", api::project);
    cfg.routes.get("/api/changes", api::changes);
    cfg.routes.post("/api/uploads", api::upload);
    cfg.routes.post("/api/import/preview", api::preview);
    cfg.routes.post("/api/imports", api::startImport);
    cfg.routes.get("/api/imports/{job}", api::job);
    cfg.routes.get("/api/search", api::search);
    cfg.routes.get("/api/answers/{id}/similar", api::similar);
    cfg.routes.get("/api/phrases", api::phrases);
    coding.register(cfg);
    quotes.register(cfg);
    cfg.routes.exception(Exception.class, Errors::answer);
    cfg.routes.exception(ValidationException.class, Errors::answer);
    cfg.routes.exception(HttpResponseException.class, WebServer::refused);
    cfg.routes.error(
        404,
        ctx -> {
          if (ctx.path().startsWith("/api/") && !isJson(ctx)) {
            ctx.json(
                Errors.body(
                    "there is no " + ctx.method() + " " + ctx.path() + " in Riffle's API",
                    Map.of("path", ctx.path())));
          }
        });
    cfg.routes.error(
        405,
        ctx -> {
          if (!isJson(ctx)) {
            ctx.json(Errors.body(ctx.method() + " is not allowed on " + ctx.path(), Map.of()));
          }
        });
  }

  /**
   * Answers a refusal Javalin made itself (a body over {@link #MAX_JSON}, an unknown route): in the
   * API's shape; unknown routes and methods are worded by the error mappers, which know the path.
   */
  private static void refused(HttpResponseException e, Context ctx) {
    if (e.getStatus() == 404 || e.getStatus() == 405) {
      ctx.status(e.getStatus());
      return;
    }
    Errors.answer(e, ctx);
  }

  private static boolean isJson(Context ctx) {
    String type = ctx.res().getContentType();
    return type != null && type.startsWith("application/json");
  }

  /** The address to open, such as {@code http://127.0.0.1:41234/}. */
  public URI url() {
    return url;
  }

  /** The access token, when one is required. */
  public Optional<String> accessToken() {
    return token;
  }

  /** The address a person opens: {@link #url} with {@code ?token=} when a token is required. */
  public URI openUrl() {
    return token.map(t -> URI.create(url + "?token=" + t)).orElse(url);
  }

  /** Stops serving and closes the project, after the work already handed in has finished. */
  @Override
  public void close() {
    app.stop();
    trainer.close();
    imports.close();
    access.close();
  }

  /** The API's handlers; each uses the project through {@link ProjectAccess} only. */
  private static final class Api {
    private final ProjectAccess access;
    private final Imports imports;

    Api(ProjectAccess access, Imports imports) {
      this.access = access;
      this.imports = imports;
    }

    void project(Context ctx) throws Exception {
      ctx.json(
          access.call(
              p -> {
                Map<String, Object> out = new LinkedHashMap<>();
                out.put("name", p.file().getFileName().toString());
                out.put("summary", p.summary());
                return out;
              }));
    }

    void changes(Context ctx) throws Exception {
      ctx.json(Map.of("version", access.call(Project::changes)));
    }

    /** Streams the body to a temporary file; one declared over the limit is refused unread. */
    void upload(Context ctx) throws IOException {
      String name = Optional.ofNullable(ctx.queryParam("name")).orElse("").strip();
      if (name.isEmpty()) {
        throw ApiError.badParameter("name", "give the file's name as ?name=");
      }
      if (ctx.req().getContentLengthLong() > MAX_UPLOAD) {
        throw Imports.tooLarge(MAX_UPLOAD);
      }
      ctx.status(201).json(imports.upload(name, ctx.bodyInputStream()));
    }

    void preview(Context ctx) throws Exception {
      Imports.Source source = Json.body(ctx, Imports.Source.class);
      int rows = source.rows() == null ? 10 : source.rows();
      if (rows < 1 || rows > 200) {
        throw ApiError.badField("rows", "rows must be between 1 and 200, not " + rows);
      }
      ImportRequest request = imports.request(source, "web");
      ImportPreview preview = ImportPreview.of(request, rows);
      ctx.json(preview);
    }

    void startImport(Context ctx) {
      Imports.Source source = Json.body(ctx, Imports.Source.class);
      ImportRequest request = imports.request(source, "web");
      String job = imports.newJob();
      access.submit(
          p -> {
            try {
              ImportReport report = p.importWave(request, imports.progress(job));
              imports.finished(job, report);
            } catch (Exception e) {
              imports.failed(job, Errors.of(e).body());
            }
            return null;
          });
      ctx.status(202).json(imports.job(job));
    }

    void job(Context ctx) {
      ctx.json(imports.job(ctx.pathParam("job")));
    }

    void search(Context ctx) throws Exception {
      String q = ctx.queryParam("q");
      if (q == null || q.isBlank()) {
        throw ApiError.badParameter("q", "write a query, such as delivery or \"delivery date\"");
      }
      int limit = QueryParams.wholeNumber(ctx, "limit", 50, 1, MAX_HITS);
      ctx.json(access.call(p -> p.search(q, limit)).shortened(ShownText.MAX_CHARS));
    }

    void similar(Context ctx) throws Exception {
      long id;
      try {
        id = Long.parseLong(ctx.pathParam("id"));
      } catch (NumberFormatException e) {
        throw new ApiError(
            400, "the answer id must be a number, not '" + ctx.pathParam("id") + "'");
      }
      int limit = QueryParams.wholeNumber(ctx, "limit", 20, 1, MAX_HITS);
      ctx.json(
          access.call(
              p -> {
                if (!p.answerIds().contains(id)) {
                  throw ApiError.notFound("there is no answer " + id + " in this project");
                }
                return p.similar(id, limit).shortened(ShownText.MAX_CHARS);
              }));
    }

    void phrases(Context ctx) throws Exception {
      Map<String, String> segments = new LinkedHashMap<>();
      for (String s : ctx.queryParams("segment")) {
        int eq = s.indexOf('=');
        if (eq <= 0 || eq == s.length() - 1) {
          throw ApiError.badParameter(
              "segment", "a segment is COLUMN=VALUE, such as device=mobile, not '" + s + "'");
        }
        segments.put(
            ApiError.segmentColumn(s.substring(0, eq).strip()), s.substring(eq + 1).strip());
      }
      PhraseQuery query;
      try {
        query =
            new PhraseQuery(
                text(ctx, "wave"),
                text(ctx, "question"),
                segments,
                text(ctx, "against"),
                QueryParams.wholeNumber(ctx, "limit", 30, 1, 500));
      } catch (IllegalArgumentException e) {
        throw ApiError.badParameter("against", e.getMessage().replace("--", ""));
      }
      ctx.json(access.call(p -> p.phrases(query)));
    }

    private static Optional<String> text(Context ctx, String name) {
      return Optional.ofNullable(ctx.queryParam(name)).map(String::strip).filter(s -> !s.isEmpty());
    }
  }
}
