package riffle.web;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.JsonSerializer;
import com.fasterxml.jackson.databind.MapperFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.PropertyNamingStrategies;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.exc.InvalidFormatException;
import com.fasterxml.jackson.databind.exc.MismatchedInputException;
import com.fasterxml.jackson.databind.exc.UnrecognizedPropertyException;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.datatype.jdk8.Jdk8Module;
import com.fasterxml.jackson.datatype.jsr310.JavaTimeModule;
import io.javalin.http.Context;
import java.io.IOException;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * The API's JSON: Riffle's one JSON style ({@link #style}), enum values read in any case; request
 * bodies with unknown fields are refused.
 */
public final class ApiJson {
  static final ObjectMapper MAPPER = mapper();

  private ApiJson() {}

  private static ObjectMapper mapper() {
    return style()
        .enable(MapperFeature.ACCEPT_CASE_INSENSITIVE_ENUMS)
        .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
        .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
        .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
        .build();
  }

  /**
   * Riffle's one JSON style, shared by the API and the command line: snake_case keys, ISO dates,
   * lower-case enum values, an absent optional value as null. The API adds its strict reading; the
   * command line its indentation.
   */
  @SuppressWarnings({"rawtypes", "unchecked"})
  public static JsonMapper.Builder style() {
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
    return JsonMapper.builder()
        .addModule(new JavaTimeModule())
        .addModule(new Jdk8Module())
        .addModule(enums)
        .propertyNamingStrategy(PropertyNamingStrategies.SNAKE_CASE)
        .disable(SerializationFeature.WRITE_DATES_AS_TIMESTAMPS);
  }

  /**
   * Reads the request body as {@code type}.
   *
   * @return the body, never null
   * @throws ApiError 400 naming the line and column of malformed JSON, or the field that is unknown
   *     or of the wrong kind; 400 for a body that is the JSON value {@code null}
   */
  static <T> T body(Context ctx, Class<T> type) {
    String body = ctx.body();
    if (body.isBlank()) {
      throw new ApiError(400, "the request has no JSON body; send a JSON object");
    }
    T value;
    try {
      value = MAPPER.readValue(body, type);
    } catch (UnrecognizedPropertyException e) {
      String known =
          e.getKnownPropertyIds() == null
              ? ""
              : e.getKnownPropertyIds().stream()
                  .map(Object::toString)
                  .sorted()
                  .collect(Collectors.joining(", "));
      throw new ApiError(
          400,
          "unknown field '" + e.getPropertyName() + "'; the fields are: " + known,
          Map.of("field", path(e)));
    } catch (InvalidFormatException e) {
      throw new ApiError(
          400,
          "field '"
              + path(e)
              + "' has a value of the wrong kind"
              + (e.getTargetType() != null && e.getTargetType().isEnum()
                  ? "; use one of " + enumValues(e.getTargetType())
                  : ""),
          Map.of("field", path(e)));
    } catch (MismatchedInputException e) {
      String field = path(e);
      throw new ApiError(
          400,
          field.isEmpty()
              ? "the request body must be a JSON object"
              : "field '" + field + "' has a value of the wrong kind",
          field.isEmpty() ? Map.of() : Map.of("field", field));
    } catch (JsonProcessingException e) {
      Map<String, Object> where = new LinkedHashMap<>();
      if (e.getLocation() != null) {
        where.put("line", e.getLocation().getLineNr());
        where.put("column", e.getLocation().getColumnNr());
      }
      throw new ApiError(
          400,
          "the request body is not valid JSON"
              + (where.isEmpty()
                  ? ""
                  : " (line " + where.get("line") + ", column " + where.get("column") + ")")
              + "; send a JSON object",
          where);
    }
    if (value == null) {
      throw new ApiError(400, "the request body is null; send a JSON object");
    }
    return value;
  }

  private static String path(JsonMappingException e) {
    return e.getPath().stream()
        .map(r -> r.getFieldName() != null ? r.getFieldName() : Integer.toString(r.getIndex()))
        .collect(Collectors.joining("."));
  }

  private static String enumValues(Class<?> type) {
    StringBuilder sb = new StringBuilder();
    for (Object c : type.getEnumConstants()) {
      if (sb.length() > 0) {
        sb.append(", ");
      }
      sb.append(((Enum<?>) c).name().toLowerCase(Locale.ROOT));
    }
    return sb.toString();
  }
}
