package riffle.web;

import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.OptionalLong;
import riffle.app.AnswerQuery;
import riffle.app.SuggestionTrainer;
import riffle.model.EditOutcome;
import riffle.model.ShownSuggestion;
import riffle.model.Span;
import riffle.model.SuggestionReport;

/**
 * The API of the coding screen: the paged answer list, codes given and taken off, answers marked
 * read, bulk coding, undo and redo, the history and the suggestions. Every change names its coder
 * and is a single-row intent ("give C to A", "take C off A"), never "set A's codes"; every use of
 * the project goes through {@link ProjectAccess}.
 */
final class CodingRoutes {
  private final ProjectAccess access;

  private final SuggestionTrainer trainer;

  CodingRoutes(ProjectAccess access, SuggestionTrainer trainer) {
    this.access = access;
    this.trainer = trainer;
  }

  void register(JavalinConfig cfg) {
    new QueueRoutes(access).register(cfg);
    cfg.routes.get("/api/answers", this::answers);
    cfg.routes.get("/api/answers/{id}/text", this::answerText);
    cfg.routes.get("/api/assignments", this::assignments);
    cfg.routes.post("/api/assignments", this::assign);
    cfg.routes.post("/api/assignments/remove", this::unassign);
    cfg.routes.post("/api/assignments/accept", this::accept);
    cfg.routes.post("/api/answers/read", this::markRead);
    cfg.routes.post("/api/answers/read/remove", this::unmarkRead);
    cfg.routes.post("/api/undo", this::undo);
    cfg.routes.post("/api/redo", this::redo);
    cfg.routes.get("/api/history", this::history);
    cfg.routes.get("/api/suggestions", this::suggestions);
    cfg.routes.post("/api/suggestions/accept-above", this::acceptAbove);
  }

  void answers(Context ctx) throws Exception {
    Map<String, String> segments = Requests.segments(ctx);
    Optional<Boolean> coded =
        switch (Optional.ofNullable(ctx.queryParam("coded")).orElse("").strip()) {
          case "" -> Optional.empty();
          case "yes" -> Optional.of(true);
          case "no" -> Optional.of(false);
          default -> throw ApiError.badParameter("coded", "coded is yes or no");
        };
    int question = Requests.wholeNumber(ctx, "question", 0, 0, 10_000);
    long code = Requests.longParam(ctx, "code", 0);
    AnswerQuery query =
        new AnswerQuery(
            Requests.text(ctx, "wave"),
            question == 0 ? OptionalInt.empty() : OptionalInt.of(question),
            segments,
            coded,
            code == 0 ? OptionalLong.empty() : OptionalLong.of(code),
            Optional.ofNullable(ctx.queryParam("q")).orElse(""),
            Requests.wholeNumber(ctx, "offset", 0, 0, Integer.MAX_VALUE),
            Requests.wholeNumber(ctx, "limit", 50, 1, AnswerQuery.MAX_LIMIT));
    ctx.json(
        access.call(
            p -> {
              if (code != 0) {
                Requests.known(p, code);
              }
              return p.answers().page(query);
            }));
  }

  /** The whole masked text of an answer the page was sent only the start of. */
  void answerText(Context ctx) throws Exception {
    long id = Requests.idParam(ctx);
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
    List<Long> ids = Requests.ids(ctx);
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
    AssignBody body = ApiJson.body(ctx, AssignBody.class);
    String coder = Requests.coder(body.coder());
    long answer = Requests.required(body.answer(), "answer");
    long code = Requests.required(body.code(), "code");
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
    change(ctx, answer, p -> p.coding().assign(coder, answer, Requests.known(p, code), marked));
  }

  void unassign(Context ctx) throws Exception {
    AssignBody body = ApiJson.body(ctx, AssignBody.class);
    String coder = Requests.coder(body.coder());
    long answer = Requests.required(body.answer(), "answer");
    long code = Requests.required(body.code(), "code");
    change(ctx, answer, p -> p.coding().unassign(coder, answer, Requests.known(p, code)));
  }

  void accept(Context ctx) throws Exception {
    AssignBody body = ApiJson.body(ctx, AssignBody.class);
    String coder = Requests.coder(body.coder());
    long answer = Requests.required(body.answer(), "answer");
    long code = Requests.required(body.code(), "code");
    change(ctx, answer, p -> p.coding().accept(coder, answer, Requests.known(p, code)));
  }

  /** Marks an answer as read with no (other) code applying. */
  void markRead(Context ctx) throws Exception {
    AssignBody body = ApiJson.body(ctx, AssignBody.class);
    String coder = Requests.coder(body.coder());
    long answer = Requests.required(body.answer(), "answer");
    change(ctx, answer, p -> p.coding().markRead(coder, answer));
  }

  /** Takes the "read, no code applies" mark off an answer. */
  void unmarkRead(Context ctx) throws Exception {
    AssignBody body = ApiJson.body(ctx, AssignBody.class);
    String coder = Requests.coder(body.coder());
    long answer = Requests.required(body.answer(), "answer");
    change(ctx, answer, p -> p.coding().unmarkRead(coder, answer));
  }

  void undo(Context ctx) throws Exception {
    String coder = Requests.coder(ApiJson.body(ctx, Requests.CoderBody.class).coder());
    Requests.outcome(ctx, access, p -> p.coding().undo(coder));
  }

  void redo(Context ctx) throws Exception {
    String coder = Requests.coder(ApiJson.body(ctx, Requests.CoderBody.class).coder());
    Requests.outcome(ctx, access, p -> p.coding().redo(coder));
  }

  void history(Context ctx) throws Exception {
    int limit = Requests.wholeNumber(ctx, "limit", 50, 1, 1_000);
    ctx.json(access.call(p -> Map.of("history", p.coding().history(limit))));
  }

  void suggestions(Context ctx) throws Exception {
    List<Long> ids = Requests.ids(ctx);
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
    AcceptAboveBody body = ApiJson.body(ctx, AcceptAboveBody.class);
    String coder = Requests.coder(body.coder());
    if (body.answers() == null || body.answers().isEmpty()) {
      throw ApiError.badField("answers", "name the answers whose suggestions to accept, by id");
    }
    if (body.above() == null || !(body.above() > 0 && body.above() <= 1)) {
      throw ApiError.badField("above", "above is a confidence between 0 and 1, such as 0.9");
    }
    Requests.outcome(
        ctx,
        access,
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

  record SpanBody(Integer start, Integer end) {}

  record AssignBody(String coder, Long answer, Long code, SpanBody span) {}

  record AcceptAboveBody(String coder, List<Long> answers, Double above) {}

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
}
