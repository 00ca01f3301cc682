package riffle.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.TreeMap;
import java.util.TreeSet;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.Assignment;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.Direction;
import riffle.model.EditOutcome;
import riffle.model.InputException;
import riffle.model.Origin;
import riffle.model.Progress;
import riffle.model.RulePreview;
import riffle.model.Span;

/** The codebook and coding use cases, on a small invented project. */
class CodingTest {
  @TempDir Path dir;

  static final String WAVE_1 =
      "id,What almost stopped you from ordering?\n"
          + "A1,The delivery date was not shown anywhere\n"
          + "A2,Shipping was expensive for a small order\n"
          + "A3,I could not find the delivery date before paying\n"
          + "A4,Not sure the warranty covered refurbished grinders\n"
          + "A5,The price felt high but the warranty convinced me\n"
          + "A6,nothing\n";

  static final String WAVE_2 =
      "id,What almost stopped you from ordering?\n"
          + "B1,No delivery date on the product page\n"
          + "B2,Expensive shipping to the islands\n";

  Path project;

  @BeforeEach
  void importFirstWave() throws Exception {
    project = dir.resolve("shop.riffle");
    importWave("W1", WAVE_1);
  }

  void importWave(String wave, String csv) throws Exception {
    Path file = dir.resolve(wave + ".csv");
    Files.writeString(file, csv, StandardCharsets.UTF_8);
    Project.importInto(
        project,
        ImportRequest.from(new ImportSource.File(file)).wave(wave).actor("ana").get(),
        Progress.NONE);
  }

  /** Every (answer → code names) pair in the project, for comparing whole states. */
  static Map<Long, TreeSet<String>> coding(Project p) throws InputException {
    Map<Long, String> names = new TreeMap<>();
    for (Code c : p.codebook().codes()) {
      names.put(c.id(), c.name());
    }
    Map<Long, TreeSet<String>> out = new TreeMap<>();
    for (Map.Entry<Long, List<Assignment>> e : p.coding().assignments(p.answerIds()).entrySet()) {
      TreeSet<String> codes = new TreeSet<>();
      e.getValue().forEach(a -> codes.add(names.get(a.codeId())));
      out.put(e.getKey(), codes);
    }
    return out;
  }

  long answer(Project p, String words) throws InputException {
    return p.search("exact:\"" + words + "\"", 1).hits().get(0).answerId();
  }

  @Test
  void renameMergeAndSplitKeepEveryAssignment() throws Exception {
    try (Project p = Project.openExisting(project)) {
      Coding c = p.coding();
      Code late = p.codebook().create("ana", CodeDraft.named("Delivery date unclear"));
      Code date = p.codebook().create("ana", CodeDraft.named("No date shown"));
      Code cost = p.codebook().create("ana", CodeDraft.named("Shipping cost"));
      long a1 = answer(p, "not shown anywhere");
      long a3 = answer(p, "could not find");
      long a2 = answer(p, "small order");
      c.assign("ana", a1, late.id(), Optional.empty());
      c.assign("ana", a1, date.id(), Optional.of(new Span(4, 17)));
      c.assign("ana", a3, date.id(), Optional.empty());
      c.assign("ana", a2, cost.id(), Optional.empty());

      p.codebook().change("ana", late.id(), CodeDraft.named("Delivery date missing"));
      assertEquals(
          Map.of(
              a1, new TreeSet<>(List.of("Delivery date missing", "No date shown")),
              a2, new TreeSet<>(List.of("Shipping cost")),
              a3, new TreeSet<>(List.of("No date shown"))),
          coding(p));

      EditOutcome merged = p.codebook().merge("ana", List.of(date.id()), late.id());
      assertTrue(
          merged.message().contains("1 assignment(s) moved, 1 already there"), merged.message());
      assertEquals(
          Map.of(
              a1, new TreeSet<>(List.of("Delivery date missing")),
              a2, new TreeSet<>(List.of("Shipping cost")),
              a3, new TreeSet<>(List.of("Delivery date missing"))),
          coding(p));
      assertTrue(p.codebook().codes().stream().noneMatch(k -> k.name().equals("No date shown")));

      p.codebook()
          .split("ana", late.id(), CodeDraft.named("Date not found"), "exact:\"could not find\"");
      assertEquals(
          Map.of(
              a1, new TreeSet<>(List.of("Delivery date missing")),
              a2, new TreeSet<>(List.of("Shipping cost")),
              a3, new TreeSet<>(List.of("Date not found"))),
          coding(p));
      assertEquals(1, p.search("code:\"date not found\"", 5).total(), "the index follows");
    }
  }

  @Test
  void undoAndRedoRoundTripEveryKindOfChange() throws Exception {
    try (Project p = Project.openExisting(project)) {
      Coding c = p.coding();
      Code theme =
          p.codebook()
              .create(
                  "ana",
                  CodeDraft.named("Delivery").toBuilder().direction(Direction.FRICTION).build());
      Code date =
          p.codebook()
              .create(
                  "ana", CodeDraft.named("Date unclear").toBuilder().parent("Delivery").build());
      Code cost = p.codebook().create("ana", CodeDraft.named("Cost").toBuilder().key("c").build());
      List<Long> ids = p.answerIds();
      List<Map<Long, TreeSet<String>>> states = new ArrayList<>();
      List<List<Code>> books = new ArrayList<>();
      states.add(coding(p));
      books.add(p.codebook().codes());
      c.assign("ana", ids.get(0), date.id(), Optional.empty());
      c.assign("ana", ids.get(2), date.id(), Optional.of(new Span(0, 3)));
      c.assign("ana", ids.get(1), cost.id(), Optional.empty());
      c.assign("ana", ids.get(2), cost.id(), Optional.empty());
      c.unassign("ana", ids.get(1), cost.id());
      p.codebook().change("ana", cost.id(), CodeDraft.named("Shipping cost"));
      p.codebook().merge("ana", List.of(cost.id()), date.id());
      p.codebook().reorder("ana", theme.id(), 3);
      for (int i = 0; i < 8; i++) {
        states.add(null);
      }
      Map<Long, TreeSet<String>> end = coding(p);
      List<Code> endBook = p.codebook().codes();
      for (int i = 0; i < 8; i++) {
        EditOutcome u = c.undo("ana");
        assertTrue(u.changed() > 0, u.message());
        assertEquals(0, u.skipped());
      }
      assertEquals(states.get(0), coding(p));
      assertEquals(books.get(0), p.codebook().codes());
      assertTrue(p.rules().rules().isEmpty());
      for (int i = 0; i < 8; i++) {
        assertTrue(c.redo("ana").changed() > 0);
      }
      assertEquals(end, coding(p));
      assertEquals(endBook, p.codebook().codes());
      assertEquals("Nothing to redo.", c.redo("ana").message());
    }
  }

  @Test
  void aNewEditEndsTheRedoChainAndUndoIsPerCoder() throws Exception {
    try (Project p = Project.openExisting(project)) {
      Coding c = p.coding();
      Code cost = p.codebook().create("ana", CodeDraft.named("Cost"));
      long a = p.answerIds().get(1);
      long b = p.answerIds().get(2);
      c.assign("ana", a, cost.id(), Optional.empty());
      c.assign("ben", b, cost.id(), Optional.empty());
      c.undo("ana");
      assertEquals(Map.of(b, new TreeSet<>(List.of("Cost"))), coding(p), "ben's code stays");
      c.assign("ana", b, cost.id(), Optional.of(new Span(0, 4)));
      assertEquals("Nothing to redo.", c.redo("ana").message());
    }
  }

  @Test
  void undoLeavesAloneWhatAnotherCoderChangedSince() throws Exception {
    try (Project p = Project.openExisting(project)) {
      Coding c = p.coding();
      Code cost = p.codebook().create("ana", CodeDraft.named("Cost"));
      long a = p.answerIds().get(1);
      c.assign("ana", a, cost.id(), Optional.empty());
      c.assign("ben", a, cost.id(), Optional.of(new Span(0, 8)));
      EditOutcome u = c.undo("ana");
      assertEquals(1, u.skipped(), u.message());
      assertTrue(u.message().contains("someone changed them since"), u.message());
      assertEquals(
          Optional.of(new Span(0, 8)),
          c.assignments(List.of(a)).get(a).get(0).span(),
          "ben's span is kept");
    }
  }

  @Test
  void rulesNeverOverrideAManualRemovalAndRunOnNewWaves() throws Exception {
    long removed;
    long codeId;
    try (Project p = Project.openExisting(project)) {
      Coding c = p.coding();
      Code date = p.codebook().create("ana", CodeDraft.named("Delivery date unclear"));
      codeId = date.id();
      RulePreview before = p.rules().preview(date.id(), "\"delivery date\"", 5);
      assertEquals(2, before.matches());
      assertEquals(2, before.wouldCode());
      assertEquals(2, before.sample().size());
      p.rules().addRule("ana", date.id(), "\"delivery date\"");
      EditOutcome applied = p.rules().applyRules("ana", OptionalLong.empty());
      assertEquals(2, applied.changed());
      removed = answer(p, "could not find");
      c.unassign("ana", removed, date.id());
      RulePreview after = p.rules().preview(date.id(), "\"delivery date\"", 5);
      assertEquals(1, after.alreadyCoded());
      assertEquals(1, after.keptOff());
      assertEquals(0, after.wouldCode());
      p.rules().applyRules("ana", OptionalLong.empty());
      assertFalse(coding(p).containsKey(removed), "the removal stands");
      Assignment made =
          c.assignments(List.of(answer(p, "not shown anywhere"))).values().iterator().next().get(0);
      assertEquals(Origin.RULE, made.origin());
    }
    importWave("W2", WAVE_2);
    try (Project p = Project.openExisting(project)) {
      long b1 = answer(p, "product page");
      assertEquals(
          Origin.RULE,
          p.coding().assignments(List.of(b1)).get(b1).get(0).origin(),
          "the new wave's answer was coded by the saved rule");
      assertFalse(coding(p).containsKey(removed));
      assertEquals(2, p.search("code:\"delivery date unclear\"", 10).total());
      assertEquals(codeId, p.coding().assignments(List.of(b1)).get(b1).get(0).codeId());
    }
  }

  @Test
  void badCodebookChangesAreRefusedAndChangeNothing() throws Exception {
    try (Project p = Project.openExisting(project)) {
      Coding c = p.coding();
      Code delivery = p.codebook().create("ana", CodeDraft.named("Delivery"));
      p.codebook()
          .create("ana", CodeDraft.named("Date").toBuilder().parent("Delivery").key("d").build());
      List<Code> book = p.codebook().codes();
      assertMessage(
          "already a code named", () -> p.codebook().create("ana", CodeDraft.named(" delivery ")));
      assertMessage("needs a name", () -> p.codebook().create("ana", CodeDraft.named("  ")));
      assertMessage(
          "two levels deep",
          () ->
              p.codebook()
                  .create("ana", CodeDraft.named("Day").toBuilder().parent("Date").build()));
      assertMessage(
          "themes are two levels deep",
          () ->
              p.codebook()
                  .change(
                      "ana",
                      delivery.id(),
                      CodeDraft.named("Delivery").toBuilder().parent("Date").build()));
      assertMessage(
          "already belongs to",
          () -> p.codebook().create("ana", CodeDraft.named("X").toBuilder().key("d").build()));
      assertMessage(
          "moves between answers",
          () -> p.codebook().create("ana", CodeDraft.named("X").toBuilder().key("j").build()));
      assertMessage(
          "no code named",
          () ->
              p.codebook().create("ana", CodeDraft.named("X").toBuilder().parent("Nope").build()));
      assertEquals(book, p.codebook().codes());
    }
  }

  @Test
  void removingACodeInUseArchivesIt() throws Exception {
    try (Project p = Project.openExisting(project)) {
      Coding c = p.coding();
      Code used = p.codebook().create("ana", CodeDraft.named("Used"));
      Code unused = p.codebook().create("ana", CodeDraft.named("Unused"));
      c.assign("ana", p.answerIds().get(0), used.id(), Optional.empty());
      assertTrue(p.codebook().remove("ana", used.id()).message().contains("instead of deleting"));
      p.codebook().remove("ana", unused.id());
      assertEquals(List.of("Used"), p.codebook().codes().stream().map(Code::name).toList());
      assertTrue(p.codebook().codes().get(0).archived());
      assertEquals(1, coding(p).size());
      assertMessage(
          "archived", () -> c.assign("ana", p.answerIds().get(1), used.id(), Optional.empty()));
    }
  }

  interface Call {
    Object run() throws Exception;
  }

  static void assertMessage(String words, Call call) {
    InputException e = assertThrows(InputException.class, call::run);
    assertTrue(e.getMessage().contains(words), e.getMessage());
  }

  @Test
  void undoingATakeOffShowsInTheSearchAtOnce() throws Exception {
    try (Project p = Project.openExisting(project)) {
      Coding c = p.coding();
      long late = p.codebook().create("ana", CodeDraft.named("late")).id();
      long answer = p.answerIds().get(0);
      c.assign("ana", answer, late, Optional.empty());
      assertEquals(1, p.search("code:late", 10).total());
      c.unassign("ana", answer, late);
      assertEquals(0, p.search("code:late", 10).total());
      c.undo("ana");
      assertEquals(1, p.search("code:late", 10).total(), "the index took the undo");
      c.undo("ana");
      assertEquals(0, p.search("code:late", 10).total());
    }
  }
}
