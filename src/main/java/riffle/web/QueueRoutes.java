package riffle.web;

import com.fasterxml.jackson.core.type.TypeReference;
import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.OptionalLong;
import riffle.app.AnswerQuery;
import riffle.app.QueueKey;
import riffle.app.QueuePage;
import riffle.app.QueueStatus;
import riffle.model.InputException;

/**
 * The API of random review queues: start one for a wave and question (and segment), read its
 * answers in its random order, and see whether the answers read are a random sample. Every use of
 * the project goes through {@link ProjectAccess}.
 */
final class QueueRoutes {
  private static final TypeReference<Map<String, Object>> OBJECT = new TypeReference<>() {};

  private final ProjectAccess access;

  QueueRoutes(ProjectAccess access) {
    this.access = access;
  }

  void register(JavalinConfig cfg) {
    cfg.routes.get("/api/queues", this::queues);
    cfg.routes.post("/api/queues", this::start);
    cfg.routes.get("/api/queues/status", this::status);
    cfg.routes.get("/api/queues/answers", this::answers);
  }

  record StartBody(String coder, String wave, String question, String segment, Long seed) {}

  void queues(Context ctx) throws Exception {
    ctx.json(access.call(p -> Map.of("queues", p.queues().all())));
  }

  void start(Context ctx) throws Exception {
    StartBody body = ApiJson.body(ctx, StartBody.class);
    String coder = Requests.coder(body.coder());
    QueueKey key = key(body.wave(), body.question(), body.segment(), true);
    OptionalLong seed = body.seed() == null ? OptionalLong.empty() : OptionalLong.of(body.seed());
    QueueStatus s = access.call(p -> p.queues().start(coder, key, seed));
    ctx.status(s.startedNow() ? 201 : 200).json(s);
  }

  void status(Context ctx) throws Exception {
    QueueKey key = key(ctx);
    ctx.json(access.call(p -> p.queues().status(key)).orElseThrow(() -> notStarted(key)));
  }

  /**
   * A stretch of the queue's order shaped as the answer list's page ({@code total}, {@code coded} —
   * here the answers read —, {@code substantive}, {@code read}, {@code offset}, {@code answers}),
   * each answer with its {@code position} and whether it is {@code read}, plus the queue's {@code
   * status}.
   */
  void answers(Context ctx) throws Exception {
    QueueKey key = key(ctx);
    String given = ctx.queryParam("offset");
    OptionalInt offset =
        given == null || given.isBlank()
            ? OptionalInt.empty()
            : OptionalInt.of(Requests.wholeNumber(ctx, "offset", 0, 0, Integer.MAX_VALUE));
    int limit = Requests.wholeNumber(ctx, "limit", 50, 1, AnswerQuery.MAX_LIMIT);
    QueuePage page =
        access.call(p -> p.queues().page(key, offset, limit)).orElseThrow(() -> notStarted(key));
    List<Map<String, Object>> answers = new ArrayList<>();
    for (QueuePage.Item item : page.answers()) {
      Map<String, Object> a = ApiJson.MAPPER.convertValue(item.answer(), OBJECT);
      a.put("position", item.position());
      a.put("read", item.read());
      answers.add(a);
    }
    Map<String, Object> out = new LinkedHashMap<>();
    out.put("status", page.status());
    out.put("query", "");
    out.put("total", page.status().sample().answers());
    out.put("coded", page.status().sample().read());
    // A queue holds substantive answers only: all of them count, and "read" is the sample's.
    out.put("substantive", page.status().sample().answers());
    out.put("read", page.status().sample().read());
    out.put("offset", page.offset());
    out.put("answers", answers);
    ctx.json(out);
  }

  private static QueueKey key(Context ctx) {
    return key(
        ctx.queryParam("wave"), ctx.queryParam("question"), ctx.queryParam("segment"), false);
  }

  /** The queue a request names; {@code body} says whether it came as fields or parameters. */
  private static QueueKey key(String wave, String question, String segment, boolean body) {
    if (wave == null || wave.isBlank()) {
      throw missing(body, "wave", "name the wave (a random order is drawn per wave and question)");
    }
    if (question == null || question.isBlank()) {
      throw missing(body, "question", "name the question, by its number or its text");
    }
    try {
      return QueueKey.of(wave.strip(), question.strip(), Optional.ofNullable(segment));
    } catch (InputException e) {
      throw missing(body, "segment", e.getMessage());
    }
  }

  private static ApiError missing(boolean body, String name, String message) {
    return body ? ApiError.badField(name, message) : ApiError.badParameter(name, message);
  }

  private static ApiError notStarted(QueueKey key) {
    return ApiError.notFound(
        "no random order has been started for wave \""
            + key.wave()
            + "\", question "
            + key.question()
            + key.segmentColumn()
                .map(c -> ", segment " + c + "=" + key.segmentValue().orElse(""))
                .orElse("")
            + "; start one first (POST /api/queues)");
  }
}
