package riffle.cli;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonSerializer;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.PropertyNamingStrategies;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.datatype.jdk8.Jdk8Module;
import com.fasterxml.jackson.datatype.jsr310.JavaTimeModule;
import java.io.IOException;
import java.io.PrintWriter;
import java.util.Locale;

/**
 * The one JSON style of the command line: snake_case keys, ISO dates, lower-case enum values, and
 * an absent optional value as null.
 */
final class Json {
  static final ObjectMapper MAPPER = mapper();

  private Json() {}

  @SuppressWarnings({"rawtypes", "unchecked"})
  private static ObjectMapper mapper() {
    SimpleModule enums = new SimpleModule("riffle-enums");
    enums.addSerializer(
        Enum.class,
        new JsonSerializer<Enum>() {
          @Override
          public void serialize(Enum value, JsonGenerator gen, SerializerProvider serializers)
              throws IOException {
            gen.writeString(value.name().toLowerCase(Locale.ROOT));
          }
        });
    return new ObjectMapper()
        .registerModule(new JavaTimeModule())
        .registerModule(new Jdk8Module())
        .registerModule(enums)
        .setPropertyNamingStrategy(PropertyNamingStrategies.SNAKE_CASE)
        .disable(SerializationFeature.WRITE_DATES_AS_TIMESTAMPS)
        .enable(SerializationFeature.INDENT_OUTPUT);
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
