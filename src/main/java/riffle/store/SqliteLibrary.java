package riffle.store;

import java.io.IOException;
import java.io.InputStream;
import java.net.URL;
import java.net.URLConnection;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.sqlite.SQLiteJDBCLoader;
import org.sqlite.util.LibraryLoaderUtil;

/**
 * Points the SQLite driver at one extracted copy of its native library, kept in {@code
 * ~/.riffle/native/sqlite-VERSION/}. Left to itself the driver inflates the library (about 1 MB)
 * from the jar into the temporary folder, reads it back to compare, and loads that fresh file on
 * every start, which cost a short command such as {@code riffle phrases} about 0.15 s. The copy is
 * written once, under a temporary name and then moved into place, so a half-written file is never
 * loaded, and it is written again when its size differs from the library in the jar. When anything
 * goes wrong (no home folder, no write permission) nothing is set and the driver extracts as usual;
 * when the copy cannot be loaded the driver falls back to extracting too.
 */
final class SqliteLibrary {
  private static final String PATH = "org.sqlite.lib.path";
  private static final String NAME = "org.sqlite.lib.name";

  private SqliteLibrary() {}

  /** Runs once, before the first connection of the process. */
  static void prepare() {
    Holder.touch();
  }

  private static final class Holder {
    static {
      try {
        use(Path.of(System.getProperty("user.home"), ".riffle", "native"));
      } catch (IOException | RuntimeException e) {
        // The driver's own extraction still works; this only saves time.
      }
    }

    static void touch() {}
  }

  /** Extracts the library into {@code root} when needed and tells the driver to load it. */
  static void use(Path root) throws IOException {
    if (System.getProperty(PATH) != null || System.getProperty(NAME) != null) {
      return;
    }
    String resource = LibraryLoaderUtil.getNativeLibResourcePath();
    String name = LibraryLoaderUtil.getNativeLibName();
    URL url = SQLiteJDBCLoader.class.getResource(resource + "/" + name);
    if (url == null) {
      return;
    }
    URLConnection connection = url.openConnection();
    long size = connection.getContentLengthLong();
    Path folder = root.resolve("sqlite-" + SQLiteJDBCLoader.getVersion());
    Path library = folder.resolve(name);
    if (size < 0 || !Files.isRegularFile(library) || Files.size(library) != size) {
      Files.createDirectories(folder);
      Path partial = Files.createTempFile(folder, name, ".partial");
      try (InputStream in = connection.getInputStream()) {
        Files.copy(in, partial, StandardCopyOption.REPLACE_EXISTING);
        Files.move(
            partial, library, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
      } finally {
        Files.deleteIfExists(partial);
      }
    }
    System.setProperty(PATH, folder.toString());
    System.setProperty(NAME, name);
  }
}
