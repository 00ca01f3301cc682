package riffle.web;

import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.Optional;
import riffle.app.FindingsQuery;
import riffle.app.Project;

/**
 * The API of the findings, the reports and the exports (coded answers as CSV or a workbook, the
 * codebook).
 */
final class FindingsRoutes {
  /** The media type of an Office Open XML workbook (ECMA-376). */
  static final String XLSX = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";

  private final ProjectAccess access;

  FindingsRoutes(ProjectAccess access) {
    this.access = access;
  }

  void register(JavalinConfig cfg) {
    cfg.routes.get("/api/findings", this::findings);
    cfg.routes.get("/api/segments", this::segments);
    cfg.routes.get("/api/report.html", this::reportHtml);
    cfg.routes.get("/api/report.md", this::reportMarkdown);
    cfg.routes.get("/api/export/coded.csv", this::codedCsv);
    cfg.routes.get("/api/export/coded.xlsx", this::codedWorkbook);
    cfg.routes.get("/api/export/codebook.csv", this::codebookCsv);
  }

  void findings(Context ctx) throws Exception {
    FindingsQuery query = findingsQuery(ctx);
    ctx.json(access.call(p -> p.reporting().findings(query)));
  }

  /** The segment columns and their values with answers and read bases, for the screens' picker. */
  void segments(Context ctx) throws Exception {
    Optional<String> question = Requests.text(ctx, "question");
    Optional<String> wave = Requests.text(ctx, "wave");
    ctx.json(Map.of("columns", access.call(p -> p.reporting().segments(question, wave))));
  }

  void reportHtml(Context ctx) throws Exception {
    FindingsQuery query = findingsQuery(ctx);
    String html =
        access.call(
            p -> p.reporting().html(p.reporting().findings(query), title(p) + " · findings"));
    download(ctx, "text/html; charset=utf-8", "findings.html", html);
  }

  void reportMarkdown(Context ctx) throws Exception {
    FindingsQuery query = findingsQuery(ctx);
    String md =
        access.call(
            p -> p.reporting().markdown(p.reporting().findings(query), title(p) + " · findings"));
    download(ctx, "text/markdown; charset=utf-8", "findings.md", md);
  }

  void codedCsv(Context ctx) throws Exception {
    boolean longFormat = "long".equals(ctx.queryParam("shape"));
    boolean bom = "yes".equals(ctx.queryParam("bom"));
    Optional<String> question = Requests.text(ctx, "question");
    String csv = access.call(p -> p.reporting().codedCsv(question, longFormat, bom));
    download(
        ctx,
        "text/csv; charset=utf-8",
        longFormat ? "coded-answers-long.csv" : "coded-answers.csv",
        csv);
  }

  /**
   * The coded answers as an Excel workbook (with the codebook and the findings), made whole before
   * a byte is sent: a failure is an error answer, never half a file.
   */
  void codedWorkbook(Context ctx) throws Exception {
    Optional<String> question = Requests.text(ctx, "question");
    byte[] book =
        access.call(
            p -> {
              ByteArrayOutputStream out = new ByteArrayOutputStream(1 << 16);
              p.reporting().codedWorkbook(question, out);
              return out.toByteArray();
            });
    ctx.header("Content-Disposition", "attachment; filename=\"coded-answers.xlsx\"");
    ctx.contentType(XLSX);
    ctx.result(book);
  }

  void codebookCsv(Context ctx) throws Exception {
    String csv = access.call(p -> p.codebook().exportCodebook("codebook.csv"));
    download(ctx, "text/csv; charset=utf-8", "codebook.csv", csv);
  }

  private static FindingsQuery findingsQuery(Context ctx) {
    Optional<String> from = Requests.text(ctx, "from");
    Optional<String> to = Requests.text(ctx, "to");
    if (from.isPresent() != to.isPresent()) {
      throw ApiError.badParameter(
          from.isPresent() ? "to" : "from", "give both waves to compare (from and to), or neither");
    }
    return new FindingsQuery(
        Requests.text(ctx, "question"), Requests.text(ctx, "segment"), from, to);
  }

  private static String title(Project p) {
    String name = p.file().getFileName().toString();
    return name.endsWith(".riffle") ? name.substring(0, name.length() - 7) : name;
  }

  private static void download(Context ctx, String type, String name, String body) {
    ctx.header("Content-Disposition", "attachment; filename=\"" + name + "\"");
    ctx.contentType(type);
    ctx.result(body.getBytes(StandardCharsets.UTF_8));
  }
}
