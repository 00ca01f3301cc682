package riffle.web;

import io.javalin.http.Context;

/**
 * Query parameters read with Javalin's validators. A value that fails is thrown as Javalin's {@code
 * ValidationException}, which {@link Errors} answers once for every route: 400 naming the
 * parameter.
 */
final class QueryParams {
  private QueryParams() {}

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
}
