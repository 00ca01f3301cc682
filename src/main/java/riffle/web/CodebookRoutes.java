package riffle.web;

import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.Direction;

/**
 * The API of the codebook: codes listed, created, changed, archived, deleted, moved, merged and
 * split. Every change names its coder; every use of the project goes through {@link ProjectAccess}.
 */
final class CodebookRoutes {
  private final ProjectAccess access;

  CodebookRoutes(ProjectAccess access) {
    this.access = access;
  }

  void register(JavalinConfig cfg) {
    cfg.routes.get("/api/codes", this::codes);
    cfg.routes.post("/api/codes", this::createCode);
    cfg.routes.patch("/api/codes/{id}", this::changeCode);
    cfg.routes.post("/api/codes/{id}/archive", this::archiveCode);
    cfg.routes.post("/api/codes/{id}/remove", this::removeCode);
    cfg.routes.post("/api/codes/{id}/move", this::moveCode);
    cfg.routes.post("/api/codes/{id}/split", this::splitCode);
    cfg.routes.post("/api/codes/merge", this::mergeCodes);
  }

  void codes(Context ctx) throws Exception {
    ctx.json(
        access.call(
            p -> {
              Map<String, Object> out = new LinkedHashMap<>();
              out.put("codes", p.codebook().codes());
              out.put("uses", p.answers().uses());
              return out;
            }));
  }

  void createCode(Context ctx) throws Exception {
    CodeBody body = ApiJson.body(ctx, CodeBody.class);
    String coder = Requests.coder(body.coder());
    if (body.name().map(String::isBlank).orElse(true)) {
      throw ApiError.badField("name", "give the new code a name");
    }
    Code made = access.call(p -> p.codebook().create(coder, body.draft()));
    ctx.status(201).json(Map.of("code", made, "message", "Created code \"" + made.name() + "\"."));
  }

  void changeCode(Context ctx) throws Exception {
    long id = Requests.idParam(ctx);
    CodeBody body = ApiJson.body(ctx, CodeBody.class);
    String coder = Requests.coder(body.coder());
    Code changed =
        access.call(
            p -> {
              Requests.known(p, id);
              return p.codebook().change(coder, id, body.draft());
            });
    ctx.json(Map.of("code", changed, "message", "Saved \"" + changed.name() + "\"."));
  }

  void archiveCode(Context ctx) throws Exception {
    long id = Requests.idParam(ctx);
    ArchiveBody body = ApiJson.body(ctx, ArchiveBody.class);
    String coder = Requests.coder(body.coder());
    boolean archived = body.archived() == null || body.archived();
    Requests.outcome(
        ctx, access, p -> p.codebook().archive(coder, Requests.known(p, id), archived));
  }

  void removeCode(Context ctx) throws Exception {
    long id = Requests.idParam(ctx);
    String coder = Requests.coder(ApiJson.body(ctx, Requests.CoderBody.class).coder());
    Requests.outcome(ctx, access, p -> p.codebook().remove(coder, Requests.known(p, id)));
  }

  void moveCode(Context ctx) throws Exception {
    long id = Requests.idParam(ctx);
    MoveBody body = ApiJson.body(ctx, MoveBody.class);
    String coder = Requests.coder(body.coder());
    if (body.place() == null || body.place() < 1) {
      throw ApiError.badField("place", "give the code's new place, 1 for first");
    }
    Requests.outcome(
        ctx, access, p -> p.codebook().reorder(coder, Requests.known(p, id), body.place()));
  }

  void mergeCodes(Context ctx) throws Exception {
    MergeBody body = ApiJson.body(ctx, MergeBody.class);
    String coder = Requests.coder(body.coder());
    if (body.codes() == null || body.codes().isEmpty()) {
      throw ApiError.badField("codes", "name the codes to merge, by id");
    }
    if (body.into() == null) {
      throw ApiError.badField("into", "name the code to merge them into, by id");
    }
    Requests.outcome(
        ctx,
        access,
        p -> {
          for (long c : body.codes()) {
            Requests.known(p, c);
          }
          return p.codebook().merge(coder, body.codes(), Requests.known(p, body.into()));
        });
  }

  void splitCode(Context ctx) throws Exception {
    long id = Requests.idParam(ctx);
    SplitBody body = ApiJson.body(ctx, SplitBody.class);
    String coder = Requests.coder(body.coder());
    if (body.code() == null || body.code().name().map(String::isBlank).orElse(true)) {
      throw ApiError.badField("code.name", "give the new code a name");
    }
    boolean byQuery = body.query() != null && !body.query().isBlank();
    if (byQuery == (body.answers() != null)) {
      throw ApiError.badField(
          "query", "give either the answers to move (answers) or a query that finds them");
    }
    Requests.outcome(
        ctx,
        access,
        p -> {
          Requests.known(p, id);
          return byQuery
              ? p.codebook().split(coder, id, body.code().draft(), body.query())
              : p.codebook().split(coder, id, body.code().draft(), body.answers());
        });
  }

  /** A code's fields; an absent field is left as it is, an empty colour, key or theme clears it. */
  record CodeBody(
      String coder,
      Optional<String> name,
      Optional<String> description,
      Optional<String> include,
      Optional<String> exclude,
      Optional<String> colour,
      Optional<String> key,
      Optional<String> parent,
      Optional<Direction> direction) {
    CodeDraft draft() {
      return new CodeDraft(
          name.map(String::strip),
          description,
          include,
          exclude,
          colour.map(String::strip),
          key.map(String::strip),
          parent.map(String::strip),
          direction);
    }
  }

  record ArchiveBody(String coder, Boolean archived) {}

  record MoveBody(String coder, Integer place) {}

  record MergeBody(String coder, List<Long> codes, Long into) {}

  record SplitBody(String coder, CodeBody code, List<Long> answers, String query) {}
}
