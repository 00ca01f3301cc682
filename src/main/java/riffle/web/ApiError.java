package riffle.web;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import riffle.model.ControlChars;

/** A request that cannot be served as asked: an HTTP status, a message and where it went wrong. */
final class ApiError extends RuntimeException {
  private static final long serialVersionUID = 1L;

  private final int status;
  private final transient Map<String, Object> where;

  ApiError(int status, String message, Map<String, Object> where) {
    super(Objects.requireNonNull(message, "message"));
    this.status = status;
    this.where = new LinkedHashMap<>(where);
  }

  ApiError(int status, String message) {
    this(status, message, Map.of());
  }

  static ApiError badField(String field, String message) {
    return new ApiError(400, message, Map.of("field", field));
  }

  static ApiError badParameter(String parameter, String message) {
    return new ApiError(400, message, Map.of("parameter", parameter));
  }

  /**
   * A segment column named in a {@code segment=COLUMN=VALUE} parameter, checked to be a name.
   *
   * @throws ApiError 400 for the parameter when it holds a line break or a control character
   */
  static String segmentColumn(String column) {
    Optional<String> problem = ControlChars.problem("the segment column", column);
    if (problem.isPresent()) {
      throw badParameter("segment", problem.get() + "; name the column as its header reads");
    }
    return column;
  }

  static ApiError notFound(String message) {
    return new ApiError(404, message);
  }

  int status() {
    return status;
  }

  Map<String, Object> where() {
    return where;
  }
}
