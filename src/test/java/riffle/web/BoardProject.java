package riffle.web;

import java.nio.file.Path;
import java.util.Optional;
import java.util.Set;
import riffle.app.ImportRequest;
import riffle.app.ImportSource;
import riffle.app.Project;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.Direction;
import riffle.model.Progress;

/**
 * A project for the copy board: the precoded pilot (its reasons to choose the shop marked praise,
 * what almost stopped buyers marked friction) and a small later wave with a hostile answer.
 */
final class BoardProject {
  static final Set<String> PRAISE =
      Set.of(
          "price and value",
          "tested and certified",
          "good reviews",
          "helpful advice",
          "warranty included",
          "wide choice",
          "less waste",
          "fast delivery");

  /** A later wave: a few reasons to choose the shop, one of them hostile markup. */
  static final String WAVE_2 =
      "response_id\tWhat made you choose us?\tchose codes\n"
          + "W2-01\tThe machine arrived the next day and works like new\tfast delivery\n"
          + "W2-02\tNext day delivery "
          + WebServerTest.HOSTILE
          + " and a fair price\tfast delivery\n"
          + "W2-03\tThe advice on the phone helped me pick the right grinder\thelpful advice\n";

  private BoardProject() {}

  static Path build(Path folder) throws Exception {
    Path project = folder.resolve("board.riffle");
    Project.importInto(
        project,
        ImportRequest.from(new ImportSource.File(Path.of("sample-responses/precoded-pilot.tsv")))
            .wave("Pilot")
            .get(),
        Progress.NONE);
    Project.importInto(
        project,
        ImportRequest.from(new ImportSource.Paste(WAVE_2)).wave("Wave 2").get(),
        Progress.NONE);
    try (Project p = Project.openExisting(project)) {
      for (Code c : p.codebook().codes()) {
        Direction d = PRAISE.contains(c.name()) ? Direction.PRAISE : Direction.FRICTION;
        p.codebook()
            .change(
                "setup",
                c.id(),
                new CodeDraft(
                    Optional.empty(),
                    Optional.empty(),
                    Optional.empty(),
                    Optional.empty(),
                    Optional.empty(),
                    Optional.empty(),
                    Optional.empty(),
                    Optional.of(d)));
      }
    }
    return project;
  }
}
