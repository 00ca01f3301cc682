package riffle.web;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import riffle.app.ImportSource;

/** Uploads from the page: streamed to a temporary file, bounded, and deleted when done. */
class ImportsTest {
  private static final byte[] WAVE =
      "id,Why did you choose us?\n1,The grinder came with fresh burrs\n"
          .getBytes(StandardCharsets.UTF_8);

  private static Imports.Source upload(String id) {
    return new Imports.Source(id, null, null, null, null, null, null, null, null, null);
  }

  /** A body of {@code n} bytes made as it is read, never held whole. */
  private static InputStream bytes(long n) {
    return new InputStream() {
      long left = n;

      @Override
      public int read() {
        return left-- > 0 ? 'x' : -1;
      }

      @Override
      public int read(byte[] b, int off, int len) {
        if (left <= 0) {
          return -1;
        }
        int k = (int) Math.min(len, left);
        java.util.Arrays.fill(b, off, off + k, (byte) 'x');
        left -= k;
        return k;
      }
    };
  }

  private static long filesIn(Path folder) throws Exception {
    try (Stream<Path> all = Files.walk(folder)) {
      return all.filter(Files::isRegularFile).count();
    }
  }

  @Test
  void anUploadIsWrittenToAFileUnderItsOwnName() throws Exception {
    Path folder;
    Path file;
    try (Imports imports = new Imports(1024)) {
      folder = imports.folder();
      Imports.Upload u =
          imports.upload("C:\\Users\\ana\\wave-3.csv", new ByteArrayInputStream(WAVE));
      assertEquals("wave-3.csv", u.name());
      assertEquals(WAVE.length, u.bytes());
      ImportSource source = imports.request(upload(u.upload()), "web").source();
      file = ((ImportSource.File) source).path();
      assertEquals("wave-3.csv", file.getFileName().toString(), "problems name the upload");
      assertTrue(file.startsWith(folder));
      assertArrayEquals(WAVE, Files.readAllBytes(file));
    }
    assertFalse(Files.exists(file), "closing deletes the uploads");
    assertFalse(Files.exists(folder));
  }

  @Test
  void anUploadOverTheLimitIs413AndKeepsNothing() throws Exception {
    try (Imports imports = new Imports(64 * 1024)) {
      ApiError e =
          assertThrows(ApiError.class, () -> imports.upload("big.csv", bytes(64 * 1024 + 1)));
      assertEquals(413, e.status());
      assertEquals(0, filesIn(imports.folder()), "the partial file is deleted");
      Imports.Upload exact = imports.upload("fits.csv", bytes(64 * 1024));
      assertEquals(64 * 1024, exact.bytes(), "a file of exactly the limit is taken");
    }
  }

  @Test
  void onlyTheNewestUploadsAreKeptOnDisk() throws Exception {
    try (Imports imports = new Imports(1024)) {
      String first = imports.upload("w0.csv", new ByteArrayInputStream(WAVE)).upload();
      for (int i = 1; i <= Imports.MAX_UPLOADS; i++) {
        imports.upload("w" + i + ".csv", new ByteArrayInputStream(WAVE));
      }
      assertEquals(Imports.MAX_UPLOADS, filesIn(imports.folder()));
      ApiError gone = assertThrows(ApiError.class, () -> imports.request(upload(first), "web"));
      assertEquals(404, gone.status());
    }
  }

  @Test
  void fileNamesThatCannotBeFilesAreRefused() throws Exception {
    try (Imports imports = new Imports(1024)) {
      for (String name : new String[] {"..", "folder/", "wave\u001B[31m.csv", "a\nb.csv"}) {
        ApiError e =
            assertThrows(
                ApiError.class, () -> imports.upload(name, new ByteArrayInputStream(WAVE)), name);
        assertEquals(400, e.status(), name);
        assertEquals("name", e.where().get("parameter"), name);
      }
      assertEquals(
          "passwd", imports.upload("../../etc/passwd", new ByteArrayInputStream(WAVE)).name());
      assertEquals(1, filesIn(imports.folder()), "only the last path segment is used");
    }
  }
}
