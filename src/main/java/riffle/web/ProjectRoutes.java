package riffle.web;

import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import java.util.LinkedHashMap;
import java.util.Map;
import riffle.app.PhraseQuery;
import riffle.app.Project;
import riffle.model.SettingException;
import riffle.model.ShownText;

/** The API of the project as a whole: its name and counts, its changes, search and phrases. */
final class ProjectRoutes {
  private final ProjectAccess access;

  ProjectRoutes(ProjectAccess access) {
    this.access = access;
  }

  void register(JavalinConfig cfg) {
    cfg.routes.get("/api/project", this::project);
    cfg.routes.get("/api/changes", this::changes);
    cfg.routes.get("/api/search", this::search);
    cfg.routes.get("/api/answers/{id}/similar", this::similar);
    cfg.routes.get("/api/phrases", this::phrases);
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

  void search(Context ctx) throws Exception {
    String q = ctx.queryParam("q");
    if (q == null || q.isBlank()) {
      throw ApiError.badParameter("q", "write a query, such as delivery or \"delivery date\"");
    }
    int limit = Requests.wholeNumber(ctx, "limit", 50, 1, WebServer.MAX_HITS);
    ctx.json(access.call(p -> p.search(q, limit)).shortened(ShownText.MAX_CHARS));
  }

  void similar(Context ctx) throws Exception {
    long id;
    try {
      id = Long.parseLong(ctx.pathParam("id"));
    } catch (NumberFormatException e) {
      throw new ApiError(400, "the answer id must be a number, not '" + ctx.pathParam("id") + "'");
    }
    int limit = Requests.wholeNumber(ctx, "limit", 20, 1, WebServer.MAX_HITS);
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
    Map<String, String> segments = Requests.segments(ctx);
    PhraseQuery query;
    try {
      query =
          new PhraseQuery(
              Requests.text(ctx, "wave"),
              Requests.text(ctx, "question"),
              segments,
              Requests.text(ctx, "against"),
              Requests.wholeNumber(ctx, "limit", 30, 1, 500));
    } catch (SettingException e) {
      throw ApiError.badParameter(e.setting(), e.getMessage());
    }
    ctx.json(access.call(p -> p.phrases(query)));
  }
}
