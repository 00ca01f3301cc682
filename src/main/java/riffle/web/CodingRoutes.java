package riffle.web;

import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.OptionalLong;
import riffle.app.AnswerQuery;
import riffle.app.FindingsQuery;
import riffle.app.Project;
import riffle.app.SuggestionTrainer;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.ControlChars;
import riffle.model.Direction;
import riffle.model.EditOutcome;
import riffle.model.ShownSuggestion;
import riffle.model.ShownText;
import riffle.model.Span;
import riffle.model.SuggestionReport;

/**
 * The API of the coding screens: the codebook, rules, assignments, undo and redo, suggestions, the
 * paged answer list and the findings. Every change names its coder and is a single-row intent
 * ("give C to A", "take C off A"), never "set A's codes"; every use of the project goes through
 * {@link ProjectAccess}.
 */
final class CodingRoutes {
  /** Longest coder name accepted. */
  static final int MAX_CODER = 60;

  private final ProjectAccess access;
  private final SuggestionTrainer trainer;

  CodingRoutes(ProjectAccess access, SuggestionTrainer trainer) {
    this.access = access;
    this.trainer = trainer;
  }

  void register(JavalinConfig cfg) {
    new QueueRoutes(access).register(cfg);
    cfg.routes.get("/api/codes", this::codes);
    cfg.routes.post("/api/codes", this::createCode);
    cfg.routes.patch("/api/codes/{id}", this::changeCode);
    cfg.routes.post("/api/codes/{id}/archive", this::archiveCode);
    cfg.routes.post("/api/codes/{id}/remove", this::removeCode);
    cfg.routes.post("/api/codes/{id}/move", this::moveCode);
    cfg.routes.post("/api/codes/{id}/split", this::splitCode);
    cfg.routes.post("/api/codes/merge", this::mergeCodes);
    cfg.routes.get("/api/rules", this::rules);
    cfg.routes.post("/api/rules", this::addRule);
    cfg.routes.post("/api/rules/preview", this::previewRule);
    cfg.routes.post("/api/rules/apply", this::applyRules);
    cfg.routes.post("/api/rules/{id}/remove", this::removeRule);
    cfg.routes.get("/api/answers", this::answers);
    cfg.routes.get("/api/answers/{id}/text", this::answerText);
    cfg.routes.get("/api/assignments", this::assignments);
    cfg.routes.post("/api/assignments", this::assign);
    cfg.routes.post("/api/assignments/remove", this::unassign);
    cfg.routes.post("/api/assignments/accept", this::accept);
    cfg.routes.post("/api/answers/read", this::markRead);
    cfg.routes.post("/api/answers/read/remove", this::unmarkRead);
    cfg.routes.post("/api/assignments/bulk/preview", this::bulkPreview);
    cfg.routes.post("/api/assignments/bulk", this::bulk);
    cfg.routes.post("/api/undo", this::undo);
    cfg.routes.post("/api/redo", this::redo);
    cfg.routes.get("/api/history", this::history);
    cfg.routes.get("/api/suggestions", this::suggestions);
    cfg.routes.post("/api/suggestions/accept-above", this::acceptAbove);
    cfg.routes.get("/api/findings", this::findings);
    cfg.routes.get("/api/segments", this::segments);
    cfg.routes.get("/api/report.html", this::reportHtml);
    cfg.routes.get("/api/report.md", this::reportMarkdown);
    cfg.routes.get("/api/export/coded.csv", this::codedCsv);
    cfg.routes.get("/api/export/codebook.csv", this::codebookCsv);
  }

  // ---- request bodies ----

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

  record CoderBody(String coder) {}

  record MoveBody(String coder, Integer place) {}

  record MergeBody(String coder, List<Long> codes, Long into) {}

  record SplitBody(String coder, CodeBody code, List<Long> answers, String query) {}

  record RuleBody(String coder, Long code, String query, Integer sample) {}

  record ApplyBody(String coder, Long code) {}

  record SpanBody(Integer start, Integer end) {}

  record AssignBody(String coder, Long answer, Long code, SpanBody span) {}

  record AcceptAboveBody(String coder, List<Long> answers, Double above) {}

  // ---- the codebook ----

  void codes(Context ctx) throws Exception {
    ctx.json(
        access.call(
            p -> {
              Map<String, Object> out = new LinkedHashMap<>();
              out.put("codes", p.coding().codes());
              out.put("uses", p.answers().uses());
              return out;
            }));
  }

  void createCode(Context ctx) throws Exception {
    CodeBody body = Json.body(ctx, CodeBody.class);
    String coder = coder(body.coder());
    if (body.name().map(String::isBlank).orElse(true)) {
      throw ApiError.badField("name", "give the new code a name");
    }
    Code made = access.call(p -> p.coding().create(coder, body.draft()));
    ctx.status(201).json(Map.of("code", made, "message", "Created code \"" + made.name() + "\"."));
  }

  void changeCode(Context ctx) throws Exception {
    long id = idParam(ctx);
    CodeBody body = Json.body(ctx, CodeBody.class);
    String coder = coder(body.coder());
    Code changed =
        access.call(
            p -> {
              known(p, id);
              return p.coding().change(coder, id, body.draft());
            });
    ctx.json(Map.of("code", changed, "message", "Saved \"" + changed.name() + "\"."));
  }

  void archiveCode(Context ctx) throws Exception {
    long id = idParam(ctx);
    ArchiveBody body = Json.body(ctx, ArchiveBody.class);
    String coder = coder(body.coder());
    boolean archived = body.archived() == null || body.archived();
    outcome(ctx, p -> p.coding().archive(coder, known(p, id), archived));
  }

  void removeCode(Context ctx) throws Exception {
    long id = idParam(ctx);
    String coder = coder(Json.body(ctx, CoderBody.class).coder());
    outcome(ctx, p -> p.coding().remove(coder, known(p, id)));
  }

  void moveCode(Context ctx) throws Exception {
    long id = idParam(ctx);
    MoveBody body = Json.body(ctx, MoveBody.class);
    String coder = coder(body.coder());
    if (body.place() == null || body.place() < 1) {
      throw ApiError.badField("place", "give the code's new place, 1 for first");
    }
    outcome(ctx, p -> p.coding().reorder(coder, known(p, id), body.place()));
  }

  void mergeCodes(Context ctx) throws Exception {
    MergeBody body = Json.body(ctx, MergeBody.class);
    String coder = coder(body.coder());
    if (body.codes() == null || body.codes().isEmpty()) {
      throw ApiError.badField("codes", "name the codes to merge, by id");
    }
    if (body.into() == null) {
      throw ApiError.badField("into", "name the code to merge them into, by id");
    }
    outcome(
        ctx,
        p -> {
          for (long c : body.codes()) {
            known(p, c);
          }
          return p.coding().merge(coder, body.codes(), known(p, body.into()));
        });
  }

  void splitCode(Context ctx) throws Exception {
    long id = idParam(ctx);
    SplitBody body = Json.body(ctx, SplitBody.class);
    String coder = coder(body.coder());
    if (body.code() == null || body.code().name().map(String::isBlank).orElse(true)) {
      throw ApiError.badField("code.name", "give the new code a name");
    }
    boolean byQuery = body.query() != null && !body.query().isBlank();
    if (byQuery == (body.answers() != null)) {
      throw ApiError.badField(
          "query", "give either the answers to move (answers) or a query that finds them");
    }
    outcome(
        ctx,
        p -> {
          known(p, id);
          return byQuery
              ? p.coding().split(coder, id, body.code().draft(), body.query())
              : p.coding().split(coder, id, body.code().draft(), body.answers());
        });
  }

  // ---- rules ----

  void rules(Context ctx) throws Exception {
    ctx.json(access.call(p -> Map.of("rules", p.coding().rules())));
  }

  void addRule(Context ctx) throws Exception {
    RuleBody body = Json.body(ctx, RuleBody.class);
    String coder = coder(body.coder());
    long code = required(body.code(), "code");
    String query = query(body.query());
    ctx.status(201)
        .json(access.call(p -> Map.of("rule", p.coding().addRule(coder, known(p, code), query))));
  }

  void previewRule(Context ctx) throws Exception {
    RuleBody body = Json.body(ctx, RuleBody.class);
    long code = required(body.code(), "code");
    String query = query(body.query());
    int sample = body.sample() == null ? 5 : body.sample();
    if (sample < 0 || sample > 50) {
      throw ApiError.badField("sample", "sample must be from 0 to 50, not " + sample);
    }
    ctx.json(
        access.call(
            p -> p.coding().preview(known(p, code), query, sample).shortened(ShownText.MAX_CHARS)));
  }

  void applyRules(Context ctx) throws Exception {
    ApplyBody body = Json.body(ctx, ApplyBody.class);
    String coder = coder(body.coder());
    outcome(
        ctx,
        p ->
            p.coding()
                .applyRules(
                    coder,
                    body.code() == null
                        ? OptionalLong.empty()
                        : OptionalLong.of(known(p, body.code()))));
  }

  void removeRule(Context ctx) throws Exception {
    long id = idParam(ctx);
    String coder = coder(Json.body(ctx, CoderBody.class).coder());
    outcome(
        ctx,
        p -> {
          if (p.coding().rules().stream().noneMatch(r -> r.id() == id)) {
            throw ApiError.notFound("there is no rule " + id);
          }
          return p.coding().removeRule(coder, id);
        });
  }

  // ---- answers and their codes ----

  void answers(Context ctx) throws Exception {
    Map<String, String> segments = new LinkedHashMap<>();
    for (String s : ctx.queryParams("segment")) {
      int eq = s.indexOf('=');
      if (eq <= 0 || eq == s.length() - 1) {
        throw ApiError.badParameter(
            "segment", "a segment is COLUMN=VALUE, such as device=mobile, not '" + s + "'");
      }
      segments.put(ApiError.segmentColumn(s.substring(0, eq).strip()), s.substring(eq + 1).strip());
    }
    Optional<Boolean> coded =
        switch (Optional.ofNullable(ctx.queryParam("coded")).orElse("").strip()) {
          case "" -> Optional.empty();
          case "yes" -> Optional.of(true);
          case "no" -> Optional.of(false);
          default -> throw ApiError.badParameter("coded", "coded is yes or no");
        };
    int question = QueryParams.wholeNumber(ctx, "question", 0, 0, 10_000);
    long code = longParam(ctx, "code", 0);
    AnswerQuery query =
        new AnswerQuery(
            text(ctx, "wave"),
            question == 0 ? OptionalInt.empty() : OptionalInt.of(question),
            segments,
            coded,
            code == 0 ? OptionalLong.empty() : OptionalLong.of(code),
            Optional.ofNullable(ctx.queryParam("q")).orElse(""),
            QueryParams.wholeNumber(ctx, "offset", 0, 0, Integer.MAX_VALUE),
            QueryParams.wholeNumber(ctx, "limit", 50, 1, AnswerQuery.MAX_LIMIT));
    ctx.json(
        access.call(
            p -> {
              if (code != 0) {
                known(p, code);
              }
              return p.answers().page(query);
            }));
  }

  /** The whole masked text of an answer the page was sent only the start of. */
  void answerText(Context ctx) throws Exception {
    long id = idParam(ctx);
    String text =
        access.call(
            p ->
                p.answers()
                    .text(id)
                    .orElseThrow(
                        () -> ApiError.notFound("there is no answer " + id + " in this project")));
    ctx.json(Map.of("id", id, "text", text));
  }

  void assignments(Context ctx) throws Exception {
    List<Long> ids = ids(ctx);
    ctx.json(
        access.call(
            p -> {
              Map<String, Object> out = new LinkedHashMap<>();
              out.put("assignments", p.coding().assignments(ids));
              var reads = p.coding().reads(ids);
              out.put("read", reads.keySet().stream().sorted().toList());
              out.put(
                  "marked",
                  reads.values().stream()
                      .filter(r -> r.marked())
                      .map(r -> r.answerId())
                      .sorted()
                      .toList());
              return out;
            }));
  }

  void assign(Context ctx) throws Exception {
    AssignBody body = Json.body(ctx, AssignBody.class);
    String coder = coder(body.coder());
    long answer = required(body.answer(), "answer");
    long code = required(body.code(), "code");
    Optional<Span> span = Optional.empty();
    if (body.span() != null) {
      Integer start = body.span().start();
      Integer end = body.span().end();
      if (start == null || end == null || start < 0 || end <= start) {
        throw ApiError.badField(
            "span", "a span needs 0 <= start < end, as character offsets into the masked answer");
      }
      span = Optional.of(new Span(start, end));
    }
    Optional<Span> marked = span;
    change(ctx, answer, p -> p.coding().assign(coder, answer, known(p, code), marked));
  }

  void unassign(Context ctx) throws Exception {
    AssignBody body = Json.body(ctx, AssignBody.class);
    String coder = coder(body.coder());
    long answer = required(body.answer(), "answer");
    long code = required(body.code(), "code");
    change(ctx, answer, p -> p.coding().unassign(coder, answer, known(p, code)));
  }

  void accept(Context ctx) throws Exception {
    AssignBody body = Json.body(ctx, AssignBody.class);
    String coder = coder(body.coder());
    long answer = required(body.answer(), "answer");
    long code = required(body.code(), "code");
    change(ctx, answer, p -> p.coding().accept(coder, answer, known(p, code)));
  }

  /** Marks an answer as read with no (other) code applying. */
  void markRead(Context ctx) throws Exception {
    AssignBody body = Json.body(ctx, AssignBody.class);
    String coder = coder(body.coder());
    long answer = required(body.answer(), "answer");
    change(ctx, answer, p -> p.coding().markRead(coder, answer));
  }

  /** Takes the "read, no code applies" mark off an answer. */
  void unmarkRead(Context ctx) throws Exception {
    AssignBody body = Json.body(ctx, AssignBody.class);
    String coder = coder(body.coder());
    long answer = required(body.answer(), "answer");
    change(ctx, answer, p -> p.coding().unmarkRead(coder, answer));
  }

  void bulkPreview(Context ctx) throws Exception {
    previewRule(ctx);
  }

  void bulk(Context ctx) throws Exception {
    RuleBody body = Json.body(ctx, RuleBody.class);
    String coder = coder(body.coder());
    long code = required(body.code(), "code");
    String query = query(body.query());
    outcome(ctx, p -> p.coding().assignAll(coder, known(p, code), query));
  }

  void undo(Context ctx) throws Exception {
    String coder = coder(Json.body(ctx, CoderBody.class).coder());
    outcome(ctx, p -> p.coding().undo(coder));
  }

  void redo(Context ctx) throws Exception {
    String coder = coder(Json.body(ctx, CoderBody.class).coder());
    outcome(ctx, p -> p.coding().redo(coder));
  }

  void history(Context ctx) throws Exception {
    int limit = QueryParams.wholeNumber(ctx, "limit", 50, 1, 1_000);
    ctx.json(access.call(p -> Map.of("history", p.coding().history(limit))));
  }

  // ---- suggestions ----

  void suggestions(Context ctx) throws Exception {
    List<Long> ids = ids(ctx);
    ctx.json(
        access.call(
            p -> {
              Optional<SuggestionReport> report = p.suggestFor(ids, trainer);
              Map<String, Object> out = new LinkedHashMap<>();
              out.put("ready", report.isPresent());
              out.put("training", trainer.training());
              out.put("problem", trainer.problem().orElse(null));
              out.put("suggestions", report.map(SuggestionReport::suggestions).orElse(List.of()));
              out.put("metrics", report.map(SuggestionReport::metrics).orElse(List.of()));
              out.put("examples", report.map(SuggestionReport::examples).orElse(0));
              return out;
            }));
  }

  void acceptAbove(Context ctx) throws Exception {
    AcceptAboveBody body = Json.body(ctx, AcceptAboveBody.class);
    String coder = coder(body.coder());
    if (body.answers() == null || body.answers().isEmpty()) {
      throw ApiError.badField("answers", "name the answers whose suggestions to accept, by id");
    }
    if (body.above() == null || !(body.above() > 0 && body.above() <= 1)) {
      throw ApiError.badField("above", "above is a confidence between 0 and 1, such as 0.9");
    }
    outcome(
        ctx,
        p -> {
          // The suggestions are read again here: the page's copy may be stale, and a confidence
          // sent by a page is not to be trusted.
          List<ShownSuggestion> shown =
              p.suggestFor(body.answers(), trainer)
                  .map(SuggestionReport::suggestions)
                  .orElse(List.of());
          return p.coding().acceptAbove(coder, shown, body.above());
        });
  }

  // ---- findings and exports ----

  void findings(Context ctx) throws Exception {
    FindingsQuery query = findingsQuery(ctx);
    ctx.json(access.call(p -> p.reporting().findings(query)));
  }

  /** The segment columns and their values with answers and read bases, for the screens' picker. */
  void segments(Context ctx) throws Exception {
    Optional<String> question = text(ctx, "question");
    Optional<String> wave = text(ctx, "wave");
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
    Optional<String> question = text(ctx, "question");
    String csv = access.call(p -> p.reporting().codedCsv(question, longFormat, bom));
    download(
        ctx,
        "text/csv; charset=utf-8",
        longFormat ? "coded-answers-long.csv" : "coded-answers.csv",
        csv);
  }

  void codebookCsv(Context ctx) throws Exception {
    String csv = access.call(p -> p.coding().exportCodebook("codebook.csv"));
    download(ctx, "text/csv; charset=utf-8", "codebook.csv", csv);
  }

  private static FindingsQuery findingsQuery(Context ctx) {
    Optional<String> from = text(ctx, "from");
    Optional<String> to = text(ctx, "to");
    if (from.isPresent() != to.isPresent()) {
      throw ApiError.badParameter(
          from.isPresent() ? "to" : "from", "give both waves to compare (from and to), or neither");
    }
    return new FindingsQuery(text(ctx, "question"), text(ctx, "segment"), from, to);
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

  // ---- helpers ----

  /** Runs a change and answers with its outcome. */
  private void outcome(Context ctx, ProjectAccess.Work<EditOutcome> work) throws Exception {
    ctx.json(access.call(work));
  }

  /** Runs a change to one answer and answers with its outcome and the answer's codes after it. */
  private void change(Context ctx, long answer, ProjectAccess.Work<EditOutcome> work)
      throws Exception {
    ctx.json(
        access.call(
            p -> {
              EditOutcome done = work.run(p);
              Map<String, Object> out = new LinkedHashMap<>();
              out.put("outcome", done);
              out.put(
                  "assignments",
                  p.coding().assignments(List.of(answer)).getOrDefault(answer, List.of()));
              var read = p.coding().reads(List.of(answer)).get(answer);
              out.put("read", read != null);
              out.put("marked", read != null && read.marked());
              return out;
            }));
  }

  /** The code's id, or 404 when the codebook has no such code. */
  private static long known(Project p, long codeId) throws Exception {
    if (p.coding().codes().stream().noneMatch(c -> c.id() == codeId)) {
      throw ApiError.notFound("there is no code " + codeId + " in the codebook");
    }
    return codeId;
  }

  static String coder(String coder) {
    String c = coder == null ? "" : coder.strip();
    if (c.isEmpty()) {
      throw ApiError.badField("coder", "say who is coding: give your name as coder");
    }
    if (c.length() > MAX_CODER || c.chars().anyMatch(ControlChars::breaksName)) {
      throw ApiError.badField(
          "coder", "a coder's name is at most " + MAX_CODER + " characters, on one line");
    }
    return c;
  }

  private static String query(String query) {
    if (query == null || query.isBlank()) {
      throw ApiError.badField("query", "write a query, such as \"delivery date\"");
    }
    return query.strip();
  }

  private static long required(Long value, String field) {
    if (value == null) {
      throw ApiError.badField(field, "the request needs " + field + " (an id)");
    }
    return value;
  }

  private static long idParam(Context ctx) {
    try {
      return Long.parseLong(ctx.pathParam("id"));
    } catch (NumberFormatException e) {
      throw new ApiError(400, "the id must be a number, not '" + ctx.pathParam("id") + "'");
    }
  }

  private static List<Long> ids(Context ctx) {
    String raw = Optional.ofNullable(ctx.queryParam("answers")).orElse("").strip();
    if (raw.isEmpty()) {
      throw ApiError.badParameter("answers", "name the answers as ?answers=1,2,3");
    }
    List<Long> ids = new ArrayList<>();
    for (String s : raw.split(",", -1)) {
      try {
        ids.add(Long.parseLong(s.strip()));
      } catch (NumberFormatException e) {
        throw ApiError.badParameter("answers", "answer ids are numbers, not '" + s + "'");
      }
    }
    if (ids.size() > AnswerQuery.MAX_LIMIT) {
      throw ApiError.badParameter(
          "answers", "ask for at most " + AnswerQuery.MAX_LIMIT + " answers at a time");
    }
    return ids;
  }

  private static Optional<String> text(Context ctx, String name) {
    return Optional.ofNullable(ctx.queryParam(name)).map(String::strip).filter(s -> !s.isEmpty());
  }

  private static long longParam(Context ctx, String name, long fallback) {
    String v = ctx.queryParam(name);
    if (v == null || v.isBlank()) {
      return fallback;
    }
    try {
      return Long.parseLong(v.strip());
    } catch (NumberFormatException e) {
      throw ApiError.badParameter(name, name + " must be an id (a number), not '" + v + "'");
    }
  }
}
