package riffle.web;

import io.javalin.http.Context;
import io.javalin.http.HttpResponseException;
import io.javalin.validation.ValidationError;
import io.javalin.validation.ValidationException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import riffle.model.InputException;
import riffle.model.InputProblem;
import riffle.model.SettingException;

/**
 * Turns every failure into one JSON shape, {@code {"error": "...", "where": {...}}}: bad input is
 * 4xx with its message (and, where it has one, the source, line and column); anything unexpected is
 * 500 with a generic message, logged by its type and stack only — never its message, which may
 * quote an answer. A 500 names no exception class: it would tell the person nothing and a prober
 * something. Refusals made by Javalin or Jetty before a route runs (a body over the size limit, an
 * address that cannot be decoded) get the same shape, with a message of ours for their status.
 */
final class Errors {
  private static final Logger LOG = LoggerFactory.getLogger(Errors.class);

  private Errors() {}

  /** The body of an error answer. */
  static Map<String, Object> body(String message, Map<String, Object> where) {
    Map<String, Object> body = new LinkedHashMap<>();
    body.put("error", message);
    body.put("where", where);
    return body;
  }

  /** The JSON body for a failure, with its status; used for requests and for import jobs. */
  static Failure of(Exception e) {
    if (e instanceof ApiError a) {
      return new Failure(a.status(), body(a.getMessage(), a.where()));
    }
    if (e instanceof InputException input) {
      Map<String, Object> where = new LinkedHashMap<>();
      String message = Objects.requireNonNullElse(input.getMessage(), "the input cannot be used");
      if (input.located().isPresent()) {
        InputProblem p = input.located().get();
        where.put("source", p.source());
        where.put("line", p.line());
        where.put("column", p.column());
        message = p.message();
        p.setting().ifPresent(setting -> where.put("setting", setting));
      }
      if (input instanceof SettingException s) {
        where.put("setting", s.setting());
      }
      return new Failure(
          input.located().isPresent() || input.inRequest() ? 400 : 422, body(message, where));
    }
    if (e instanceof ValidationException v) {
      return validation(v);
    }
    if (e instanceof HttpResponseException h) {
      return new Failure(h.getStatus(), body(forStatus(h.getStatus()), Map.of()));
    }
    StackTraceElement[] stack = e.getStackTrace();
    LOG.error(
        "unexpected {} at {}; its message is left out of the log as it may quote an answer",
        e.getClass().getName(),
        stack.length > 0 ? stack[0] : "(no stack)");
    return new Failure(
        500,
        body(
            "something went wrong inside Riffle; nothing was half-written. Try again, and report"
                + " it if it happens again.",
            Map.of()));
  }

  /**
   * What to tell the person about a refusal that carries only its HTTP status (one made by Javalin
   * or Jetty rather than by Riffle's routes).
   */
  static String forStatus(int status) {
    return switch (status) {
      case 400 ->
          "the request cannot be read (its address, headers or body are malformed); check the"
              + " address and send it again";
      case 413 ->
          "the request is too large: a JSON body may hold at most "
              + (WebServer.MAX_JSON >> 20)
              + " MiB and an upload "
              + (WebServer.MAX_UPLOAD >> 20)
              + " MiB; upload a large file with POST /api/uploads, or split it";
      case 414 -> "the address is too long; shorten the query";
      case 431 -> "the request's headers are too large; clear the site's cookies and try again";
      default ->
          status >= 500
              ? "something went wrong inside Riffle; nothing was half-written. Try again, and"
                  + " report it if it happens again."
              : "the request cannot be served (HTTP " + status + ")";
    };
  }

  /**
   * A query parameter refused by Javalin's validator: 400 naming the parameter; the message is the
   * rule the route checked, or that the value is not a whole number, with the value sent.
   */
  private static Failure validation(ValidationException v) {
    for (Map.Entry<String, List<ValidationError<Object>>> entry : v.getErrors().entrySet()) {
      if (entry.getValue().isEmpty()) {
        continue;
      }
      ValidationError<Object> error = entry.getValue().get(0);
      String rule =
          "TYPE_CONVERSION_FAILED".equals(error.getMessage())
              ? entry.getKey() + " must be a whole number"
              : error.getMessage();
      return new Failure(
          400, body(rule + ", not '" + error.value + "'", Map.of("parameter", entry.getKey())));
    }
    return new Failure(400, body("the request is not valid", Map.of()));
  }

  /** Answers a request with the failure. */
  static void answer(Exception e, Context ctx) {
    Failure f = of(e);
    ctx.status(f.status()).json(f.body());
  }

  /**
   * A failure ready to send.
   *
   * @param status the HTTP status
   * @param body the JSON body
   */
  record Failure(int status, Map<String, Object> body) {}
}
