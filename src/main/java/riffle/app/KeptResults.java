package riffle.app;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.datatype.jdk8.Jdk8Module;
import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.CodeSource;
import java.util.Optional;
import riffle.store.AnalysisCache;
import riffle.store.ProjectFileException;
import riffle.store.ProjectStore;
import riffle.text.AnalysisCodec;

/**
 * Results of costly read-only computations, kept in the derived cache so that the next command
 * asking the same of an unchanged project reads them instead of computing them again: a script that
 * runs {@code riffle phrases} after every step pays for the mining once per change.
 *
 * <p>A result is kept under what was asked and the build of Riffle that computed it, stamped with
 * the project's content stamp and the analysis version (which moves when answers are masked or
 * parsed anew). Any change to the answers, codebook, coding, rules or board, in any process, moves
 * the stamp, and the result is computed afresh; so does a result that cannot be read back.
 */
final class KeptResults {
  private KeptResults() {}

  private static final ObjectMapper MAPPER =
      JsonMapper.builder().addModule(new Jdk8Module()).build();

  /** A computation whose result can be kept. */
  interface Computation<T> {
    T compute() throws ProjectFileException;
  }

  /**
   * The result of {@code compute} for {@code query} ({@code kind} names the computation), read from
   * the cache when it was computed from the project as it stands, else computed and kept.
   */
  static <T> T get(
      ProjectStore store, String kind, Object query, Class<T> type, Computation<T> compute)
      throws ProjectFileException {
    String key;
    try {
      key = kind + "|" + Build.ID + "|" + MAPPER.writeValueAsString(query);
    } catch (JsonProcessingException e) {
      throw new IllegalStateException("cannot write the query " + query, e);
    }
    String stamp = AnalysisCodec.VERSION + "|" + store.contentStamp();
    try (AnalysisCache cache = AnalysisCache.open(store.file())) {
      Optional<T> kept = cache.result(key, stamp).flatMap(bytes -> read(bytes, type));
      if (kept.isPresent()) {
        return kept.get();
      }
      T fresh = compute.compute();
      // Kept only if the project did not change while it was computed.
      if (stamp.equals(AnalysisCodec.VERSION + "|" + store.contentStamp())) {
        try {
          cache.putResult(key, stamp, MAPPER.writeValueAsBytes(fresh));
        } catch (JsonProcessingException e) {
          throw new IllegalStateException("cannot write the result " + kind, e);
        }
      }
      return fresh;
    }
  }

  private static <T> Optional<T> read(byte[] bytes, Class<T> type) {
    try {
      return Optional.of(MAPPER.readValue(bytes, type));
    } catch (IOException | RuntimeException e) {
      // Damaged, or from a shape this build no longer reads: computed afresh.
      return Optional.empty();
    }
  }

  /**
   * The build of Riffle running: the jar's size and time of change (a rebuilt or upgraded jar keeps
   * nothing an older one computed), or, run from compiled classes, the time of change of this
   * class.
   */
  private static final class Build {
    static final String ID = id();

    private static String id() {
      try {
        CodeSource source = KeptResults.class.getProtectionDomain().getCodeSource();
        Path at = Path.of(source.getLocation().toURI());
        if (Files.isDirectory(at)) {
          at = at.resolve("riffle/app/KeptResults.class");
        }
        return Files.size(at) + "@" + Files.getLastModifiedTime(at).toMillis();
      } catch (IOException | URISyntaxException | RuntimeException e) {
        // Unknown build: nothing kept can be trusted to be this build's.
        return "unknown-" + System.nanoTime();
      }
    }
  }
}
