package riffle.web;

import io.javalin.Javalin;
import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpResponseException;
import io.javalin.http.staticfiles.Location;
import io.javalin.json.JavalinJackson;
import io.javalin.validation.ValidationException;
import java.io.UncheckedIOException;
import java.net.URI;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.SecureRandom;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Consumer;
import riffle.app.SuggestionTrainer;
import riffle.model.InputException;
import riffle.model.SettingException;

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
        throw new SettingException("host", "the host needs an address, such as 127.0.0.1");
      }
      if (port < 0 || port > 65_535) {
        throw new SettingException("port", "the port must be from 0 to 65535, not " + port);
      }
      if (waitMillis < 1) {
        throw new InputException("waitMillis must be positive, not " + waitMillis);
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
      throw new SettingException(
          "web folder", options.webDir().get() + " holds no index.html; point it at web/");
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
    List<Consumer<JavalinConfig>> routes =
        List.of(
            new ProjectRoutes(access)::register,
            new ImportRoutes(access, imports)::register,
            new CodebookRoutes(access)::register,
            new RuleRoutes(access)::register,
            new CodingRoutes(access, trainer)::register,
            new FindingsRoutes(access)::register,
            new QuoteRoutes(access)::register);
    Javalin app;
    try {
      app = Javalin.create(cfg -> configure(cfg, options, guard, routes)).start();
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
      JavalinConfig cfg, Options options, Guard guard, List<Consumer<JavalinConfig>> routes) {
    cfg.startup.showJavalinBanner = false;
    cfg.startup.showOldJavalinVersionWarning = false;
    cfg.jetty.host = options.host();
    cfg.jetty.port = options.port();
    cfg.http.maxRequestSize = MAX_JSON;
    cfg.jetty.modifyServer(server -> server.setErrorHandler(new ErrorPages()));
    cfg.jsonMapper(new JavalinJackson(ApiJson.MAPPER, false));
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
    routes.forEach(r -> r.accept(cfg));
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
}
