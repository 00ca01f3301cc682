package riffle.web;

import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import java.util.Map;
import java.util.OptionalLong;
import riffle.model.ShownText;

/** The API of the rules: saved queries that code the answers they match, previewed and applied. */
final class RuleRoutes {
  private final ProjectAccess access;

  RuleRoutes(ProjectAccess access) {
    this.access = access;
  }

  void register(JavalinConfig cfg) {
    cfg.routes.get("/api/rules", this::rules);
    cfg.routes.post("/api/rules", this::addRule);
    cfg.routes.post("/api/rules/preview", this::previewRule);
    cfg.routes.post("/api/rules/apply", this::applyRules);
    cfg.routes.post("/api/rules/{id}/remove", this::removeRule);
    cfg.routes.post("/api/assignments/bulk", this::bulk);
    cfg.routes.post("/api/assignments/bulk/preview", this::bulkPreview);
  }

  void rules(Context ctx) throws Exception {
    ctx.json(access.call(p -> Map.of("rules", p.rules().rules())));
  }

  void addRule(Context ctx) throws Exception {
    RuleBody body = ApiJson.body(ctx, RuleBody.class);
    String coder = Requests.coder(body.coder());
    long code = Requests.required(body.code(), "code");
    String query = Requests.query(body.query());
    ctx.status(201)
        .json(
            access.call(
                p -> Map.of("rule", p.rules().addRule(coder, Requests.known(p, code), query))));
  }

  void previewRule(Context ctx) throws Exception {
    RuleBody body = ApiJson.body(ctx, RuleBody.class);
    long code = Requests.required(body.code(), "code");
    String query = Requests.query(body.query());
    int sample = body.sample() == null ? 5 : body.sample();
    if (sample < 0 || sample > 50) {
      throw ApiError.badField("sample", "sample must be from 0 to 50, not " + sample);
    }
    ctx.json(
        access.call(
            p ->
                p.rules()
                    .preview(Requests.known(p, code), query, sample)
                    .shortened(ShownText.MAX_CHARS)));
  }

  void applyRules(Context ctx) throws Exception {
    ApplyBody body = ApiJson.body(ctx, ApplyBody.class);
    String coder = Requests.coder(body.coder());
    Requests.outcome(
        ctx,
        access,
        p ->
            p.rules()
                .applyRules(
                    coder,
                    body.code() == null
                        ? OptionalLong.empty()
                        : OptionalLong.of(Requests.known(p, body.code()))));
  }

  void removeRule(Context ctx) throws Exception {
    long id = Requests.idParam(ctx);
    String coder = Requests.coder(ApiJson.body(ctx, Requests.CoderBody.class).coder());
    Requests.outcome(
        ctx,
        access,
        p -> {
          if (p.rules().rules().stream().noneMatch(r -> r.id() == id)) {
            throw ApiError.notFound("there is no rule " + id);
          }
          return p.rules().removeRule(coder, id);
        });
  }

  record RuleBody(String coder, Long code, String query, Integer sample) {}

  record ApplyBody(String coder, Long code) {}

  void bulkPreview(Context ctx) throws Exception {
    previewRule(ctx);
  }

  void bulk(Context ctx) throws Exception {
    RuleBody body = ApiJson.body(ctx, RuleBody.class);
    String coder = Requests.coder(body.coder());
    long code = Requests.required(body.code(), "code");
    String query = Requests.query(body.query());
    Requests.outcome(ctx, access, p -> p.rules().assignAll(coder, Requests.known(p, code), query));
  }
}
