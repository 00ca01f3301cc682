package riffle.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.PrintWriter;

/**
 * The command line's JSON: Riffle's one JSON style ({@link riffle.web.ApiJson#style}: snake_case
 * keys, ISO dates, lower-case enum values, an absent optional value as null), indented.
 */
final class JsonOutput {
  static final ObjectMapper MAPPER = mapper();

  private JsonOutput() {}

  private static ObjectMapper mapper() {
    return riffle.web.ApiJson.style().enable(SerializationFeature.INDENT_OUTPUT).build();
  }

  static void print(PrintWriter out, Object value) {
    try {
      out.println(MAPPER.writeValueAsString(value));
      out.flush();
    } catch (JsonProcessingException e) {
      throw new IllegalStateException("cannot write JSON: " + e.getMessage(), e);
    }
  }
}
