package riffle.coding;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import riffle.csv.SafeCsv;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.Direction;
import riffle.model.InputException;
import riffle.model.InputProblem;

/**
 * The codebook as a file: CSV (one row per code, a header naming the columns) or JSON (an object
 * with a {@code codes} array). Both carry the same fields: name, theme (the parent's name),
 * direction, key, colour, description, include, exclude, archived. Reading names the line (CSV) or
 * the code's place (JSON) of every problem.
 */
public final class CodebookFile {
  /** The columns, in the order written. */
  public static final List<String> COLUMNS =
      List.of(
          "name",
          "theme",
          "direction",
          "key",
          "colour",
          "description",
          "include",
          "exclude",
          "archived");

  private static final ObjectMapper JSON =
      new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

  /** A file's format. */
  public enum Format {
    CSV,
    JSON;

    /** The format a file name's extension says. */
    public static Format of(String fileName) {
      String lower = fileName.toLowerCase(Locale.ROOT);
      if (lower.endsWith(".json")) {
        return JSON;
      }
      if (lower.endsWith(".csv")) {
        return CSV;
      }
      throw new InputException(fileName + ": a codebook file ends in .csv or .json");
    }
  }

  /**
   * One code read from a file.
   *
   * @param draft its fields (an absent theme means top level)
   * @param archived whether it is archived
   * @param line where it was read: the CSV line, or the 1-based place in the JSON array
   */
  public record Row(CodeDraft draft, boolean archived, long line) {}

  private CodebookFile() {}

  /**
   * Reads a codebook file.
   *
   * @throws InputException naming the file, line and column of the first problem
   */
  public static List<Row> read(String source, byte[] bytes, Format format) throws InputException {
    String text = utf8(source, bytes);
    if (text.startsWith("\uFEFF")) {
      text = text.substring(1);
    }
    List<Row> rows = format == Format.CSV ? readCsv(source, text) : readJson(source, text);
    Map<String, Long> seen = new HashMap<>();
    for (Row r : rows) {
      String name = r.draft().name().orElse("").strip().toLowerCase(Locale.ROOT);
      Long first = seen.putIfAbsent(name, r.line());
      if (first != null) {
        throw problem(
            source,
            r.line(),
            1,
            "the code \""
                + r.draft().name().orElse("")
                + "\" is listed twice (first on line "
                + first
                + ")");
      }
    }
    return rows;
  }

  private static String utf8(String source, byte[] bytes) throws InputException {
    try {
      return StandardCharsets.UTF_8
          .newDecoder()
          .onMalformedInput(CodingErrorAction.REPORT)
          .decode(ByteBuffer.wrap(bytes))
          .toString();
    } catch (CharacterCodingException e) {
      throw problem(source, 0, 0, "is not UTF-8 text; save the codebook as UTF-8 and try again");
    }
  }

  private static List<Row> readCsv(String source, String text) throws InputException {
    CSVFormat format =
        CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).setTrim(true).get();
    List<Row> rows = new ArrayList<>();
    try (CSVParser parser = CSVParser.parse(new StringReader(text), format)) {
      Map<String, Integer> header = new HashMap<>();
      int at = 0;
      for (String h : parser.getHeaderNames()) {
        String key = h.strip().toLowerCase(Locale.ROOT);
        at++;
        if (!COLUMNS.contains(key)) {
          throw problem(
              source,
              1,
              at,
              "unknown column \"" + h + "\"; the columns are " + String.join(", ", COLUMNS));
        }
        header.put(key, at - 1);
      }
      if (!header.containsKey("name")) {
        throw problem(source, 1, 0, "the header needs a \"name\" column");
      }
      for (CSVRecord r : parser) {
        long line = r.getCharacterPosition() >= 0 ? lineOf(text, r.getCharacterPosition()) : 0;
        Map<String, String> cells = new HashMap<>();
        for (Map.Entry<String, Integer> h : header.entrySet()) {
          if (h.getValue() < r.size()) {
            cells.put(h.getKey(), SafeCsv.restore(r.get(h.getValue())));
          }
        }
        rows.add(row(source, line, cells, header));
      }
    } catch (IOException | UncheckedIOException | IllegalStateException e) {
      throw problem(source, 0, 0, "cannot be read as CSV (" + e.getMessage() + ")");
    }
    return rows;
  }

  private static long lineOf(String text, long offset) {
    long line = 1;
    for (int i = 0; i < offset && i < text.length(); i++) {
      if (text.charAt(i) == '\n') {
        line++;
      }
    }
    return line;
  }

  private static List<Row> readJson(String source, String text) throws InputException {
    JsonNode root;
    try {
      root = JSON.readTree(text);
    } catch (JsonProcessingException e) {
      long line = e.getLocation() == null ? 0 : e.getLocation().getLineNr();
      int column = e.getLocation() == null ? 0 : e.getLocation().getColumnNr();
      throw problem(source, line, column, "is not valid JSON (" + e.getOriginalMessage() + ")");
    }
    JsonNode codes = root == null ? null : root.get("codes");
    if (codes == null || !codes.isArray()) {
      throw problem(source, 0, 0, "needs an object with a \"codes\" array");
    }
    List<Row> rows = new ArrayList<>();
    long place = 0;
    for (JsonNode n : codes) {
      place++;
      if (!n.isObject()) {
        throw problem(source, 0, 0, "code " + place + " is not an object");
      }
      Map<String, String> cells = new HashMap<>();
      Map<String, Integer> header = new HashMap<>();
      for (Map.Entry<String, JsonNode> f : n.properties()) {
        if (!COLUMNS.contains(f.getKey())) {
          throw problem(
              source,
              0,
              0,
              "code "
                  + place
                  + " has the unknown field \""
                  + f.getKey()
                  + "\"; the fields are "
                  + String.join(", ", COLUMNS));
        }
        header.put(f.getKey(), COLUMNS.indexOf(f.getKey()));
        cells.put(f.getKey(), f.getValue().isNull() ? "" : f.getValue().asText());
      }
      rows.add(row(source, place, cells, header));
    }
    return rows;
  }

  private static Row row(
      String source, long line, Map<String, String> cells, Map<String, Integer> header)
      throws InputException {
    String name = cells.getOrDefault("name", "");
    if (name.isBlank()) {
      throw problem(source, line, header.getOrDefault("name", 0) + 1, "a code needs a name");
    }
    Optional<Direction> direction = Optional.empty();
    String d = cells.getOrDefault("direction", "").strip().toLowerCase(Locale.ROOT);
    if (!d.isEmpty()) {
      try {
        direction = Optional.of(Direction.valueOf(d.toUpperCase(Locale.ROOT)));
      } catch (IllegalArgumentException e) {
        throw problem(
            source,
            line,
            header.get("direction") + 1,
            "direction \"" + d + "\" of \"" + name + "\": write praise, friction or neutral");
      }
    }
    String archived = cells.getOrDefault("archived", "").strip().toLowerCase(Locale.ROOT);
    if (!Set.of("", "yes", "no", "true", "false", "1", "0").contains(archived)) {
      throw problem(
          source,
          line,
          header.get("archived") + 1,
          "archived \"" + archived + "\" of \"" + name + "\": write yes or no");
    }
    CodeDraft draft =
        new CodeDraft(
            Optional.of(name.strip()),
            field(cells, "description"),
            field(cells, "include"),
            field(cells, "exclude"),
            Optional.of(cells.getOrDefault("colour", "")),
            Optional.of(cells.getOrDefault("key", "")),
            Optional.of(cells.getOrDefault("theme", "")),
            direction);
    return new Row(draft, Set.of("yes", "true", "1").contains(archived), line);
  }

  private static Optional<String> field(Map<String, String> cells, String key) {
    return Optional.ofNullable(cells.get(key));
  }

  private static InputException problem(String source, long line, int column, String message) {
    return new InputException(new InputProblem(source, line, column, message));
  }

  /** The codebook as CSV (RFC 4180), cells a spreadsheet would run as formulas neutralised. */
  public static String csv(List<Code> book) {
    SafeCsv out = SafeCsv.create(false).row(COLUMNS);
    rows(book).forEach(out::row);
    return out.toString();
  }

  /** One row per code with the cells of {@link #COLUMNS}, as the CSV has them (not neutralised). */
  public static List<List<String>> rows(List<Code> book) {
    Map<Long, String> names = names(book);
    List<List<String>> out = new ArrayList<>(book.size());
    for (Code c : book) {
      out.add(values(c, names));
    }
    return out;
  }

  /** The codebook as JSON: {@code {"codes": [...]}}. */
  public static String json(List<Code> book) {
    Map<Long, String> names = names(book);
    ObjectNode root = JSON.createObjectNode();
    ArrayNode codes = root.putArray("codes");
    for (Code c : book) {
      ObjectNode n = codes.addObject();
      List<String> v = values(c, names);
      for (int i = 0; i < COLUMNS.size(); i++) {
        String col = COLUMNS.get(i);
        if (col.equals("archived")) {
          n.put(col, c.archived());
        } else {
          n.put(col, v.get(i));
        }
      }
    }
    try {
      return JSON.writeValueAsString(root) + "\n";
    } catch (JsonProcessingException e) {
      throw new IllegalStateException(e);
    }
  }

  private static Map<Long, String> names(List<Code> book) {
    Map<Long, String> names = new HashMap<>();
    book.forEach(c -> names.put(c.id(), c.name()));
    return names;
  }

  private static List<String> values(Code c, Map<Long, String> names) {
    return List.of(
        c.name(),
        c.parent().isPresent() ? names.getOrDefault(c.parent().getAsLong(), "") : "",
        c.direction().name().toLowerCase(Locale.ROOT),
        c.key().orElse(""),
        c.colour().orElse(""),
        c.description(),
        c.include(),
        c.exclude(),
        c.archived() ? "yes" : "no");
  }
}
