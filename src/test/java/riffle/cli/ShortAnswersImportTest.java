package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static riffle.cli.CliTest.ok;
import static riffle.cli.CliTest.riffle;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A wave as a small shop exports it: 150 buyers, a question answered in sentences, a question
 * answered in a word or two ("Price", "fast delivery!"), a yes/no question and dates written
 * day-first with dots. Both questions are kept, each column's role is printed with its reason, and
 * the wave is dated by its latest answer, not today.
 */
class ShortAnswersImportTest {
  @TempDir Path dir;

  private static final String[] STOPPED = {
    "I was not sure the lamp would fit the shelf in my hallway",
    "The delivery estimate of ten days felt long for a small parcel",
    "I could not find whether the bulb was included in the box",
    "Your returns page did not say who pays for the postage back",
    "A review said the shade scratches easily, which worried me",
  };

  private static final String[] CHOSE = {
    "Price",
    "price",
    "Price!",
    "the price",
    "Fast delivery",
    "fast delivery!",
    "Quick shipping",
    "Good reviews",
    "reviews",
    "Design",
    "Nice design",
    "Free returns",
    "Recommended by a friend",
    "Looked sturdy",
    "Colour choice",
    "Cheaper than elsewhere",
  };

  private Path export(String name, String separator) throws IOException {
    return export(name, separator, "");
  }

  /** The export, with {@code names} as a first header row above the questions' wording. */
  private Path export(String name, String separator, String names) throws IOException {
    Random random = new Random(18L);
    StringBuilder sb =
        new StringBuilder(names)
            .append(
                "Respondent,Completed,What almost stopped you from buying?,What made you choose us?"
                    + ",Did you use a discount code?\n");
    for (int i = 0; i < 150; i++) {
      int day = 1 + random.nextInt(28);
      int month = 1 + random.nextInt(2);
      sb.append("B-")
          .append(1000 + i)
          .append(',')
          .append(
              String.format(
                  java.util.Locale.ROOT, "%02d%s%02d%s2026", day, separator, month, separator))
          .append(',')
          .append('"')
          .append(STOPPED[random.nextInt(STOPPED.length)])
          .append(i % 7 == 0 ? ", to be honest" : "")
          .append('"')
          .append(',')
          .append(CHOSE[random.nextInt(CHOSE.length)])
          .append(',')
          .append(random.nextBoolean() ? "Yes" : "No")
          .append('\n');
    }
    // The latest answer, so that the wave's date is known: 14 March 2026.
    sb.append("B-2000,14")
        .append(separator)
        .append("03")
        .append(separator)
        .append("2026,\"The lamp looked smaller in the photos\",Price,No\n");
    Path file = dir.resolve(name);
    Files.writeString(file, sb.toString(), StandardCharsets.UTF_8);
    return file;
  }

  @Test
  void bothQuestionsAreKeptAndTheWaveIsDatedByItsLatestAnswer() throws IOException {
    Path file = export("spring.csv", ".");
    String project = dir.resolve("shop.riffle").toString();
    CliTest.Run run = ok("import", "--project", project, "--file", file.toString());
    assertTrue(
        run.out().contains("fielded 2026-03-14: the latest date in column 'Completed', read"),
        run.out());
    assertTrue(
        run.out()
            .contains(
                "question       What made you choose us?  (the header asks a question; short"
                    + " repeated answers kept as its answers)"),
        run.out());
    assertTrue(
        run.out()
            .contains("segment        Did you use a discount code?  (2 distinct yes/no answers"),
        run.out());
    assertTrue(run.out().contains("151 rows read: 302 answers added"), run.out());
    String info = ok("info", "--project", project).out();
    assertTrue(info.contains("What made you choose us?"), info);
    assertTrue(info.contains("What almost stopped you from buying?"), info);
  }

  @Test
  void aFirstHeaderRowOfShortNamesIsKeptAsTheQuestionsNames() throws IOException {
    Path file = export("named.csv", ".", "resp_id,end_date,Q1,Q2,Q3\n");
    String project = dir.resolve("shop.riffle").toString();
    CliTest.Run run = ok("import", "--project", project, "--file", file.toString());
    assertTrue(run.out().contains("151 rows read: 302 answers added"), run.out());
    String info = ok("info", "--project", project).out();
    assertTrue(info.contains("Q2: What made you choose us?"), info);
    String phrases = ok("phrases", "--project", project, "--question", "q2").out();
    assertTrue(phrases.contains("151 answers mined"), phrases);
    assertTrue(phrases.contains("Price"), phrases);
    String report = ok("report", "--project", project).out();
    assertTrue(report.contains("Q2: What made you choose us?"), report);
  }

  @Test
  void slashedDatesThatCanReadEitherWayAreAskedFor() throws IOException {
    Path file = dir.resolve("ambiguous.csv");
    Files.writeString(
        file,
        "id,Completed,What almost stopped you from buying?\n"
            + "A1,03/04/2026,\"The delivery estimate felt long for a small parcel\"\n"
            + "A2,05/02/2026,\"I could not tell whether the bulb was in the box\"\n",
        StandardCharsets.UTF_8);
    String project = dir.resolve("shop.riffle").toString();
    CliTest.Run refused = riffle("import", "--project", project, "--file", file.toString());
    assertEquals(2, refused.code(), refused.err());
    assertTrue(
        refused.err().contains("--date-order: the dates in column 'Completed'"), refused.err());
    assertTrue(!Files.exists(Path.of(project)), "nothing is written");
    CliTest.Run run =
        ok("import", "--project", project, "--file", file.toString(), "--date-order", "mdy");
    assertTrue(run.out().contains("fielded 2026-05-02"), run.out());
  }
}
