package riffle.store;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The forward migrations of the project schema. Migration {@code n} takes a project to schema
 * {@code n}; its SQL lives in {@code V<n>__<name>.sql} beside this class, and the number in the
 * name is the version it writes.
 */
final class Migrations {
  /** Resource names, in order of their versions; the last one's is the newest schema known. */
  private static final List<String> SCRIPTS =
      List.of(
          "V1__project.sql",
          "V2__analysis.sql",
          "V3__coding.sql",
          "V4__board.sql",
          "V5__review.sql",
          "V6__queue.sql",
          "V7__question_names.sql");

  private Migrations() {}

  static int latest() {
    return version(SCRIPTS.get(SCRIPTS.size() - 1));
  }

  /** The schema version a script writes: the number after its {@code V}. */
  static int version(String script) {
    return Integer.parseInt(script.substring(1, script.indexOf("__")));
  }

  /** Applies every migration after {@code from}, inside the caller's transaction. */
  static void apply(Connection connection, int from) throws SQLException {
    for (String script : SCRIPTS) {
      int version = version(script);
      if (version <= from) {
        continue;
      }
      try (Statement statement = connection.createStatement()) {
        for (String sql : statements(read(script))) {
          statement.executeUpdate(sql);
        }
        statement.executeUpdate("PRAGMA user_version = " + version);
      }
    }
  }

  /** The scripts' names, in order (for tests). */
  static List<String> scripts() {
    return SCRIPTS;
  }

  /** Splits a script into statements, dropping {@code --} comments first. */
  static List<String> statements(String script) {
    StringBuilder code = new StringBuilder();
    for (String line : script.split("\n", -1)) {
      int comment = line.indexOf("--");
      code.append(comment >= 0 ? line.substring(0, comment) : line).append('\n');
    }
    List<String> out = new ArrayList<>();
    for (String part : code.toString().split(";")) {
      if (!part.isBlank()) {
        out.add(part.strip());
      }
    }
    return out;
  }

  private static String read(String resource) {
    try (InputStream in =
        Objects.requireNonNull(
            Migrations.class.getResourceAsStream("/riffle/store/" + resource), resource)) {
      return new String(in.readAllBytes(), StandardCharsets.UTF_8);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
