package riffle.web;

import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import riffle.app.Project;
import riffle.app.QuoteQuery;
import riffle.model.CopyBoard;
import riffle.model.EditOutcome;
import riffle.model.QuoteSlot;

/**
 * The API of the copy board: ranked buyer quotes and candidates per use, the board's slots, and
 * pinning, unpinning, moving and working lines (each an undoable edit of its coder). Items are
 * addressed by slot and index (from 0). Every use of the project goes through {@link
 * ProjectAccess}.
 */
final class QuoteRoutes {
  private final ProjectAccess access;

  QuoteRoutes(ProjectAccess access) {
    this.access = access;
  }

  void register(JavalinConfig cfg) {
    cfg.routes.get("/api/quotes", this::quotes);
    cfg.routes.get("/api/board", this::board);
    cfg.routes.post("/api/board/pin", this::pin);
    cfg.routes.post("/api/board/unpin", this::unpin);
    cfg.routes.post("/api/board/move", this::move);
    cfg.routes.post("/api/board/line", this::line);
    cfg.routes.get("/api/board/export", this::export);
  }

  record PinBody(String coder, QuoteSlot slot, Long answerId, String text, String code) {}

  record ItemBody(String coder, QuoteSlot slot, Integer index) {}

  record MoveBody(String coder, QuoteSlot slot, Integer from, QuoteSlot toSlot, Integer place) {}

  record LineBody(String coder, QuoteSlot slot, Integer index, String line) {}

  void quotes(Context ctx) throws Exception {
    Map<String, String> segments = Requests.segments(ctx);
    QuoteQuery query =
        new QuoteQuery(Requests.text(ctx, "code"), Requests.text(ctx, "wave"), segments);
    ctx.json(access.call(p -> p.quotes().rank(query)));
  }

  void board(Context ctx) throws Exception {
    ctx.json(access.call(QuoteRoutes::boardJson));
  }

  void pin(Context ctx) throws Exception {
    PinBody body = ApiJson.body(ctx, PinBody.class);
    String coder = Requests.coder(body.coder());
    QuoteSlot slot = slot(body.slot(), "slot");
    if (body.answerId() == null) {
      throw ApiError.badField("answer_id", "the request needs answer_id (the quote's answer)");
    }
    if (body.text() == null || body.text().isBlank()) {
      throw ApiError.badField("text", "give the quote's text, as the answer has it");
    }
    if (body.code() == null || body.code().isBlank()) {
      throw ApiError.badField("code", "name the code the quote was found under");
    }
    String code = body.code().strip();
    change(
        ctx,
        p -> {
          if (p.codebook().codes().stream().noneMatch(c -> c.name().equalsIgnoreCase(code))) {
            throw ApiError.notFound("there is no code named \"" + code + "\" in the codebook");
          }
          return p.quotes().pin(coder, slot, body.answerId(), body.text(), code);
        });
  }

  void unpin(Context ctx) throws Exception {
    ItemBody body = ApiJson.body(ctx, ItemBody.class);
    String coder = Requests.coder(body.coder());
    QuoteSlot slot = slot(body.slot(), "slot");
    int index = index(body.index(), "index");
    change(ctx, p -> p.quotes().unpin(coder, slot, index));
  }

  void move(Context ctx) throws Exception {
    MoveBody body = ApiJson.body(ctx, MoveBody.class);
    String coder = Requests.coder(body.coder());
    QuoteSlot slot = slot(body.slot(), "slot");
    int from = index(body.from(), "from");
    QuoteSlot to = body.toSlot() == null ? slot : body.toSlot();
    int place = index(body.place(), "place");
    change(ctx, p -> p.quotes().move(coder, slot, from, to, place));
  }

  void line(Context ctx) throws Exception {
    LineBody body = ApiJson.body(ctx, LineBody.class);
    String coder = Requests.coder(body.coder());
    QuoteSlot slot = slot(body.slot(), "slot");
    int index = index(body.index(), "index");
    String line = body.line() == null ? "" : body.line();
    if (line.length() > 1_000 || line.chars().anyMatch(c -> c == '\n' || c == '\r')) {
      throw ApiError.badField("line", "a working line is one line of at most 1,000 characters");
    }
    change(
        ctx,
        p ->
            p.quotes()
                .workingLine(coder, slot, index, Optional.of(line).filter(l -> !l.isBlank())));
  }

  void export(Context ctx) throws Exception {
    String format = Requests.text(ctx, "format").orElse("md").toLowerCase(Locale.ROOT);
    String type =
        switch (format) {
          case "md" -> "text/markdown; charset=utf-8";
          case "txt" -> "text/plain; charset=utf-8";
          case "csv" -> "text/csv; charset=utf-8";
          default ->
              throw ApiError.badParameter(
                  "format", "the board is exported as md, txt or csv, not '" + format + "'");
        };
    String body = access.call(p -> p.quotes().exportBoard(format));
    ctx.header("Content-Disposition", "attachment; filename=\"copy-board." + format + "\"");
    ctx.contentType(type);
    ctx.result(body.getBytes(StandardCharsets.UTF_8));
  }

  // ---- helpers ----

  /** Runs a change and answers with its outcome and the board after it. */
  private void change(Context ctx, ProjectAccess.Work<EditOutcome> work) throws Exception {
    ctx.json(
        access.call(
            p -> {
              EditOutcome done = work.run(p);
              Map<String, Object> out = new LinkedHashMap<>();
              out.put("outcome", done);
              out.put("board", boardJson(p));
              return out;
            }));
  }

  private static Map<String, Object> boardJson(Project p) throws Exception {
    CopyBoard board = p.quotes().board();
    Map<String, Object> out = new LinkedHashMap<>();
    out.put("title", board.title());
    out.put("consent_notice", CopyBoard.CONSENT_NOTICE);
    out.put("taken_off", p.quotes().takenOff());
    out.put("slots", board.slots());
    return out;
  }

  private static QuoteSlot slot(QuoteSlot slot, String field) {
    if (slot == null) {
      throw ApiError.badField(
          field,
          "name the slot: one of "
              + String.join(
                  ", ",
                  java.util.Arrays.stream(QuoteSlot.values())
                      .map(s -> s.name().toLowerCase(Locale.ROOT))
                      .toList()));
    }
    return slot;
  }

  private static int index(Integer index, String field) {
    if (index == null || index < 0) {
      throw ApiError.badField(field, field + " is a place in the slot, counted from 0");
    }
    return index;
  }

  private static Optional<String> text(Context ctx, String name) {
    return Optional.ofNullable(ctx.queryParam(name)).map(String::strip).filter(s -> !s.isEmpty());
  }
}
