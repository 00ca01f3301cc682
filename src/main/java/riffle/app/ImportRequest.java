package riffle.app;

import java.time.LocalDate;
import java.util.Objects;
import java.util.Optional;
import riffle.ingest.ImportSettings;

/**
 * One import: what to read, into which wave, with which reading settings.
 *
 * @param source the export
 * @param wave the wave's name; when empty, the file's base name (or "Wave N" for a paste)
 * @param fieldedOn when the wave was fielded; when empty, the stored date of an existing wave, else
 *     the latest answer date in the export, else today
 * @param settings how to read the export
 * @param actor who runs the import, for the audit log
 */
public record ImportRequest(
    ImportSource source,
    Optional<String> wave,
    Optional<LocalDate> fieldedOn,
    ImportSettings settings,
    String actor) {
  public ImportRequest {
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(fieldedOn, "fieldedOn");
    Objects.requireNonNull(settings, "settings");
    Objects.requireNonNull(actor, "actor");
  }
}
