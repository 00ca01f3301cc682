package riffle.web;

import io.javalin.http.Context;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import riffle.app.AnswerQuery;
import riffle.app.Project;
import riffle.model.ControlChars;
import riffle.model.EditOutcome;

/**
 * Reading a request: path and query parameters, and the fields every change names. Bad values
 * become a 400 naming the parameter or field: Javalin's validators throw {@code
 * ValidationException}, the rest {@link ApiError}; {@link Errors} answers both.
 */
final class Requests {
  /** Longest coder name accepted. */
  static final int MAX_CODER = 60;

  /** The body of a change that needs nothing but its coder. */
  record CoderBody(String coder) {}

  private Requests() {}

  /** Runs a change and answers with its outcome. */
  static void outcome(Context ctx, ProjectAccess access, ProjectAccess.Work<EditOutcome> work)
      throws Exception {
    ctx.json(access.call(work));
  }

  /**
   * A whole number from {@code min} to {@code max}; {@code fallback} when the parameter is absent
   * or blank.
   */
  static int wholeNumber(Context ctx, String name, int fallback, int min, int max) {
    String v = ctx.queryParam(name);
    if (v == null || v.isBlank()) {
      return fallback;
    }
    return ctx.queryParamAsClass(name, Integer.class)
        .check(
            n -> n >= min && n <= max, name + " must be a whole number from " + min + " to " + max)
        .get();
  }

  /** The code's id, or 404 when the codebook has no such code. */
  static long known(Project p, long codeId) throws Exception {
    if (p.codebook().codes().stream().noneMatch(c -> c.id() == codeId)) {
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

  static String query(String query) {
    if (query == null || query.isBlank()) {
      throw ApiError.badField("query", "write a query, such as \"delivery date\"");
    }
    return query.strip();
  }

  static long required(Long value, String field) {
    if (value == null) {
      throw ApiError.badField(field, "the request needs " + field + " (an id)");
    }
    return value;
  }

  /**
   * The {@code segment} parameters, each {@code COLUMN=VALUE} (such as {@code device=mobile}), in
   * the order given.
   */
  static Map<String, String> segments(Context ctx) {
    Map<String, String> segments = new LinkedHashMap<>();
    for (String s : ctx.queryParams("segment")) {
      int eq = s.indexOf('=');
      if (eq <= 0 || eq == s.length() - 1) {
        throw ApiError.badParameter(
            "segment", "a segment is COLUMN=VALUE, such as device=mobile, not '" + s + "'");
      }
      segments.put(ApiError.segmentColumn(s.substring(0, eq).strip()), s.substring(eq + 1).strip());
    }
    return segments;
  }

  static long idParam(Context ctx) {
    try {
      return Long.parseLong(ctx.pathParam("id"));
    } catch (NumberFormatException e) {
      throw new ApiError(400, "the id must be a number, not '" + ctx.pathParam("id") + "'");
    }
  }

  static List<Long> ids(Context ctx) {
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

  static Optional<String> text(Context ctx, String name) {
    return Optional.ofNullable(ctx.queryParam(name)).map(String::strip).filter(s -> !s.isEmpty());
  }

  static long longParam(Context ctx, String name, long fallback) {
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
