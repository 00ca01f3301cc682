package riffle.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The driver's native library is extracted once, whole, and reused by later starts. */
class SqliteLibraryTest {
  @TempDir Path dir;

  private static final List<String> KEYS = List.of("org.sqlite.lib.path", "org.sqlite.lib.name");

  /** Runs {@code use(dir)} as a first start would, restoring this JVM's settings afterwards. */
  private Path extract() throws Exception {
    String path = System.clearProperty(KEYS.get(0));
    String name = System.clearProperty(KEYS.get(1));
    try {
      SqliteLibrary.use(dir);
      Path folder = Path.of(System.getProperty(KEYS.get(0)));
      return folder.resolve(System.getProperty(KEYS.get(1)));
    } finally {
      restore(KEYS.get(0), path);
      restore(KEYS.get(1), name);
    }
  }

  private static void restore(String key, String value) {
    if (value == null) {
      System.clearProperty(key);
    } else {
      System.setProperty(key, value);
    }
  }

  @Test
  void theLibraryIsExtractedOnceAndATruncatedCopyIsReplaced() throws Exception {
    Path library = extract();
    assertTrue(library.startsWith(dir), library.toString());
    long size = Files.size(library);
    assertTrue(size > 100_000, "a native library, not a stub: " + size);
    Files.write(library, new byte[] {1, 2, 3});
    assertEquals(library, extract());
    assertEquals(size, Files.size(library), "the damaged copy was written again");
    try (var files = Files.list(library.getParent())) {
      assertEquals(List.of(library), files.toList(), "no partial file left behind");
    }
  }

  @Test
  void aLibraryChosenBySettingsIsLeftAlone() throws Exception {
    String path = System.getProperty(KEYS.get(0));
    String name = System.getProperty(KEYS.get(1));
    System.setProperty(KEYS.get(0), dir.resolve("elsewhere").toString());
    System.setProperty(KEYS.get(1), "chosen.so");
    try {
      SqliteLibrary.use(dir.resolve("root"));
      assertEquals(dir.resolve("elsewhere").toString(), System.getProperty(KEYS.get(0)));
      assertTrue(Files.notExists(dir.resolve("root")));
    } finally {
      restore(KEYS.get(0), path);
      restore(KEYS.get(1), name);
    }
  }
}
