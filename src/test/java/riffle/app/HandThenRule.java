package riffle.app;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import riffle.model.CodeDraft;
import riffle.model.InputException;
import riffle.model.Progress;
import riffle.store.ProjectStore;

/**
 * The trial of issue 13 as a project (fixture {@code riffle/app/hand-then-rule/}): wave 1 coded by
 * hand, a rule saved for two codes and applied, then wave 2 imported, which only the saved rules
 * touch (they run on every new wave).
 */
public final class HandThenRule {
  /** The folder of the fixture's files. */
  public static final Path FIXTURE = Path.of("src/test/resources/riffle/app/hand-then-rule");

  public static final String QUESTION = "What almost stopped you from buying?";
  public static final String UNSURE = "Unsure it fits";
  public static final String DELIVERY = "Delivery time";
  public static final String PRICE = "Price";

  private HandThenRule() {}

  /** Builds the project in {@code dir} and returns its file. */
  public static Path build(Path dir) throws InputException, IOException {
    Path file = dir.resolve("planters.riffle");
    importWave(file, "wave-1.csv", "Wave 1");
    try (Project p = Project.openExisting(file)) {
      Coding coding = p.coding();
      Map<String, Long> codes = new HashMap<>();
      for (String name : List.of(UNSURE, DELIVERY, PRICE)) {
        codes.put(name, p.codebook().create("mila", CodeDraft.named(name)).id());
      }
      Map<String, Long> answerOf = new HashMap<>();
      try (ProjectStore store = ProjectStore.openExisting(file)) {
        for (ProjectStore.AnswerRow r : store.answerRows(List.of(), Optional.empty())) {
          answerOf.put(r.respondent(), r.id());
        }
      }
      // Wave 1 read in full by Mila: her codes, or "read, no code applies".
      List<String> lines =
          Files.readAllLines(FIXTURE.resolve("wave-1-hand-codes.csv"), StandardCharsets.UTF_8);
      for (String line : lines.subList(1, lines.size())) {
        String[] cells = line.split(",", 2);
        long answer = answerOf.get(cells[0]);
        String given = cells.length > 1 ? cells[1].strip() : "";
        if (given.isEmpty()) {
          coding.markRead("mila", answer);
          continue;
        }
        for (String code : given.split(";")) {
          coding.assign("mila", answer, codes.get(code.strip()), Optional.empty());
        }
      }
      // Then rules for two codes, applied to what is there.
      p.rules().addRule("mila", codes.get(DELIVERY), "delivery OR arrive");
      p.rules().addRule("mila", codes.get(PRICE), "price OR expensive");
      p.rules().applyRules("mila", OptionalLong.empty());
    }
    // Wave 2 arrives; the saved rules run on it, nobody reads it.
    importWave(file, "wave-2.csv", "Wave 2");
    return file;
  }

  private static void importWave(Path file, String name, String wave) throws InputException {
    Project.importInto(
        file,
        ImportRequest.from(new ImportSource.File(FIXTURE.resolve(name)))
            .wave(wave)
            .idColumn("respondent")
            .metaColumn("device")
            .textColumn(QUESTION)
            .get(),
        Progress.NONE);
  }
}
