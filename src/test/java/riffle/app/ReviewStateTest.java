package riffle.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.AnswerRead;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.EditOutcome;
import riffle.model.InputException;
import riffle.model.Progress;

/**
 * Which answers a person has read (issue 13's contract): a code a person gave, accepted or took
 * off, or the "read, no code applies" mark, each undoable; never a rule's code.
 */
class ReviewStateTest {
  @TempDir Path dir;
  Path project;

  static final String WAVE =
      "id,What almost stopped you from ordering?\n"
          + "A1,The delivery date was not shown anywhere\n"
          + "A2,Shipping was expensive for a small order\n"
          + "A3,I could not find the delivery date before paying\n"
          + "A4,Nothing stopped me and it was easy\n";

  @BeforeEach
  void importWave() throws Exception {
    project = dir.resolve("shop.riffle");
    Path file = dir.resolve("w.csv");
    Files.writeString(file, WAVE, StandardCharsets.UTF_8);
    Project.importInto(
        project, ImportRequest.from(new ImportSource.File(file)).wave("W1").get(), Progress.NONE);
  }

  long answer(Project p, String words) throws Exception {
    return p.search("exact:\"" + words + "\"", 1).hits().get(0).answerId();
  }

  Map<Long, AnswerRead> reads(Project p) throws Exception {
    return p.coding().reads(p.answerIds());
  }

  @Test
  void personsMarksMakeAnAnswerReadAndRulesDoNot() throws Exception {
    try (Project p = Project.openExisting(project)) {
      Coding c = p.coding();
      Code date = p.codebook().create("ana", CodeDraft.named("Delivery date unclear"));
      Code cost = p.codebook().create("ana", CodeDraft.named("Shipping cost"));
      p.rules().addRule("ana", date.id(), "\"delivery date\"");
      p.rules().applyRules("ana", OptionalLong.empty());
      assertEquals(Map.of(), reads(p), "codes made by a rule make nothing read");

      long a1 = answer(p, "not shown anywhere");
      long a2 = answer(p, "small order");
      long a3 = answer(p, "before paying");
      long a4 = answer(p, "it was easy");
      c.assign("ana", a2, cost.id(), Optional.empty());
      c.unassign("eli", a3, date.id()); // a person said no to the rule's code
      c.accept("ana", a1, cost.id());
      EditOutcome marked = c.markRead("eli", a4);
      assertTrue(marked.message().contains("as read"), marked.message());
      Map<Long, AnswerRead> read = reads(p);
      assertEquals(List.of(a1, a2, a3, a4), read.keySet().stream().sorted().toList());
      assertEquals(List.of("eli"), read.get(a3).readers());
      assertTrue(read.get(a4).marked());
      assertFalse(read.get(a2).marked());
      assertEquals(0, c.markRead("eli", a4).edit(), "marking twice changes nothing");

      // The mark is an edit like any other: undone and redone by its coder.
      c.undo("eli");
      assertFalse(reads(p).containsKey(a4));
      c.redo("eli");
      assertTrue(reads(p).get(a4).marked());
      c.unmarkRead("ana", a4);
      assertFalse(reads(p).containsKey(a4));
      assertEquals(0, c.unmarkRead("ana", a4).edit());
      // Marking an answer that has a person's code keeps its codes; taking the mark off leaves it
      // read by those codes.
      c.markRead("ana", a2);
      c.unmarkRead("ana", a2);
      assertTrue(reads(p).containsKey(a2));
      assertEquals(1, c.assignments(List.of(a2)).get(a2).size());
      assertThrows(InputException.class, () -> c.markRead("ana", 999_999));
    }
  }

  @Test
  void rulesApplyCountsAnswersCodedAndCodesGivenApart() throws Exception {
    try (Project p = Project.openExisting(project)) {
      Coding c = p.coding();
      Code date = p.codebook().create("ana", CodeDraft.named("Delivery date unclear"));
      Code delivery = p.codebook().create("ana", CodeDraft.named("Delivery"));
      p.rules().addRule("ana", date.id(), "\"delivery date\"");
      p.rules().addRule("ana", delivery.id(), "delivery");
      EditOutcome out = p.rules().applyRules("ana", OptionalLong.empty());
      assertTrue(out.message().contains("2 answer(s) coded, 4 code(s) given"), out.message());
    }
  }
}
