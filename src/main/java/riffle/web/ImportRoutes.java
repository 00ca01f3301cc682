package riffle.web;

import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import java.io.IOException;
import java.util.Optional;
import riffle.app.ImportPreview;
import riffle.app.ImportReport;
import riffle.app.ImportRequest;

/** The API of importing: files uploaded, previewed and imported as a wave, and the import jobs. */
final class ImportRoutes {
  private final ProjectAccess access;

  private final Imports imports;

  ImportRoutes(ProjectAccess access, Imports imports) {
    this.access = access;
    this.imports = imports;
  }

  void register(JavalinConfig cfg) {
    cfg.routes.post("/api/uploads", this::upload);
    cfg.routes.post("/api/import/preview", this::preview);
    cfg.routes.post("/api/imports", this::startImport);
    cfg.routes.get("/api/imports/{job}", this::job);
  }

  /** Streams the body to a temporary file; one declared over the limit is refused unread. */
  void upload(Context ctx) throws IOException {
    String name = Optional.ofNullable(ctx.queryParam("name")).orElse("").strip();
    if (name.isEmpty()) {
      throw ApiError.badParameter("name", "give the file's name as ?name=");
    }
    if (ctx.req().getContentLengthLong() > WebServer.MAX_UPLOAD) {
      throw Imports.tooLarge(WebServer.MAX_UPLOAD);
    }
    ctx.status(201).json(imports.upload(name, ctx.bodyInputStream()));
  }

  void preview(Context ctx) throws Exception {
    Imports.Source source = ApiJson.body(ctx, Imports.Source.class);
    int rows = source.rows() == null ? 10 : source.rows();
    if (rows < 1 || rows > 200) {
      throw ApiError.badField("rows", "rows must be between 1 and 200, not " + rows);
    }
    ImportRequest request = imports.request(source, "web");
    ImportPreview preview = ImportPreview.of(request, rows);
    ctx.json(preview);
  }

  void startImport(Context ctx) {
    Imports.Source source = ApiJson.body(ctx, Imports.Source.class);
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
}
