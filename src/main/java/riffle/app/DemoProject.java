package riffle.app;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import riffle.ingest.UnreadableInputException;
import riffle.model.Progress;
import riffle.model.ProjectSummary;
import riffle.store.ProjectStore;

/**
 * Builds the demo project from the sample waves bundled in the jar (a copy of {@code
 * sample-responses/}), in a working folder of the user's choosing. A later run reuses the project
 * when the bundled waves are unchanged, and rebuilds it from scratch when they changed (built aside
 * and put in place whole, with a derived folder of its own, as {@link NewProject} does).
 */
public final class DemoProject {
  static final String RESOURCES = "/riffle/sample-responses/";
  static final String MANIFEST = "demo-waves.csv";

  /** The demo's codebook: the themes and directions of the pilot's codes. */
  static final String CODEBOOK = "codebook.csv";

  static final String PROJECT = "demo.riffle";
  static final String FINGERPRINT = "demo.fingerprint";

  private DemoProject() {}

  /**
   * The outcome of {@link #prepare}.
   *
   * @param project the demo project file
   * @param reused true when an up-to-date project was found and left as it was
   * @param imports one report per imported file, empty when reused
   * @param summary the project's counts
   */
  public record Result(
      Path project, boolean reused, List<ImportReport> imports, ProjectSummary summary) {
    public Result {
      imports = List.copyOf(imports);
    }
  }

  /** One line of the manifest: which file holds which wave, fielded when. */
  record Entry(String file, String wave, LocalDate date) {}

  /** Creates or reuses the demo project in {@code folder}. */
  public static Result prepare(Path folder, Progress progress) throws IOException {
    Files.createDirectories(folder);
    Path project = folder.resolve(PROJECT);
    List<Entry> entries = manifest();
    String fingerprint = fingerprint(entries);
    Path marker = folder.resolve(FINGERPRINT);
    if (Files.isRegularFile(project)
        && Files.isRegularFile(marker)
        && Files.readString(marker, StandardCharsets.UTF_8).strip().equals(fingerprint)) {
      try (Project p = Project.openExisting(project)) {
        return new Result(project, true, List.of(), p.summary());
      }
    }
    List<ImportReport> imports = new ArrayList<>();
    try {
      NewProject.replace(
          project,
          p -> {
            for (Entry e : entries) {
              imports.add(
                  p.importWave(
                      ImportRequest.from(new ImportSource.Bytes(e.file(), resource(e.file())))
                          .wave(e.wave())
                          .fieldedOn(e.date())
                          .actor("demo")
                          .get(),
                      progress));
            }
            // The pilot's codes get their themes and directions from the demo's codebook file.
            p.codebook().importCodebook("demo", CODEBOOK, resource(CODEBOOK));
            return null;
          });
    } catch (UnreadableInputException e) {
      throw new IllegalStateException("a bundled demo file is unreadable: " + e.getMessage(), e);
    }
    Files.writeString(marker, fingerprint + "\n", StandardCharsets.UTF_8);
    try (Project p = Project.openExisting(project)) {
      return new Result(project, false, imports, p.summary());
    }
  }

  static List<Entry> manifest() {
    String text = new String(resource(MANIFEST), StandardCharsets.UTF_8);
    List<Entry> entries = new ArrayList<>();
    String[] lines = text.strip().split("\r?\n");
    for (int i = 1; i < lines.length; i++) {
      String[] parts = lines[i].split(",", -1);
      if (parts.length != 3) {
        throw new IllegalStateException(
            MANIFEST + " line " + (i + 1) + ": expected file,wave,date");
      }
      entries.add(new Entry(parts[0].strip(), parts[1].strip(), LocalDate.parse(parts[2].strip())));
    }
    return entries;
  }

  private static String fingerprint(List<Entry> entries) {
    try {
      MessageDigest digest = MessageDigest.getInstance("SHA-256");
      digest.update(resource(MANIFEST));
      digest.update(resource(CODEBOOK));
      for (Entry e : entries) {
        digest.update(resource(e.file()));
      }
      // A new schema also calls for a fresh demo project.
      digest.update(
          Integer.toString(ProjectStore.latestSchemaVersion()).getBytes(StandardCharsets.UTF_8));
      return HexFormat.of().formatHex(digest.digest());
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("this Java runtime lacks SHA-256", e);
    }
  }

  static byte[] resource(String name) {
    try (InputStream in = DemoProject.class.getResourceAsStream(RESOURCES + name)) {
      if (in == null) {
        throw new IllegalStateException(
            "the demo file " + name + " is missing from this build; rebuild with mvn package");
      }
      return in.readAllBytes();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
