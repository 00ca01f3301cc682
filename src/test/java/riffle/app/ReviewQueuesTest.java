package riffle.app;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.OptionalLong;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.coding.ReviewOrder;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.InputException;
import riffle.model.Progress;
import riffle.model.ReadSample;
import riffle.model.ReviewQueue;

/** Random review queues on a small invented wave: the order, the sample rule, growth, segments. */
class ReviewQueuesTest {
  static final String Q = "What almost stopped you from ordering?";
  static final String[] REASONS = {
    "the delivery date was not shown",
    "shipping to the islands cost extra",
    "not sure the warranty covered the pump",
    "the grinder looked worn in the photos",
    "the price was above a new machine on sale",
    "I could not tell if it would fit my counter",
    "checkout asked for my phone number twice",
    "the steam wand might be scratched"
  };

  @TempDir Path dir;
  Path project;

  /** Respondents {@code from}..{@code to}; every tenth gives a non-answer. */
  static String wave(int from, int to) {
    StringBuilder csv = new StringBuilder("id,device," + Q + "\n");
    for (int i = from; i <= to; i++) {
      String text = i % 10 == 0 ? "n/a" : REASONS[i % REASONS.length] + " (order " + i + ")";
      csv.append("R-").append(i).append(',').append(i % 3 == 0 ? "Mobile" : "desktop");
      csv.append(',').append(text).append('\n');
    }
    return csv.toString();
  }

  void importWave(String name, String csv) throws Exception {
    Path file = dir.resolve(name + "-" + csv.length() + ".csv");
    Files.writeString(file, csv, StandardCharsets.UTF_8);
    Project.importInto(
        project,
        ImportRequest.from(new ImportSource.File(file)).wave(name).actor("ana").get(),
        Progress.NONE);
  }

  @BeforeEach
  void fortyRespondents() throws Exception {
    project = dir.resolve("shop.riffle");
    importWave("Wave 1", wave(1, 40));
  }

  static List<Long> ids(QueuePage page) {
    List<Long> out = new ArrayList<>();
    page.answers().forEach(i -> out.add(i.answer().id()));
    return out;
  }

  static List<Long> substantive(Project p) throws Exception {
    List<Long> out = new ArrayList<>();
    for (AnswerPage.Entry e :
        p.answers()
            .page(
                new AnswerQuery(
                    Optional.of("Wave 1"),
                    OptionalInt.of(1),
                    java.util.Map.of(),
                    Optional.empty(),
                    OptionalLong.empty(),
                    "",
                    0,
                    500))
            .answers()) {
      if (e.substantive()) {
        out.add(e.id());
      }
    }
    return out;
  }

  @Test
  void theQueueServesTheWavesAnswersInItsSeededOrderAndSaysWhenTheReadingIsASample()
      throws Exception {
    try (Project p = Project.openExisting(project)) {
      ReviewQueues queues = p.queues();
      QueueKey key = QueueKey.of("wave 1", "1");
      assertTrue(queues.status(key).isEmpty());
      assertTrue(queues.next(key, 5).isEmpty(), "no queue, nothing served");

      QueueStatus started = queues.start("ana", key, OptionalLong.of(42));
      assertTrue(started.startedNow());
      assertEquals("Wave 1", started.queue().wave());
      assertEquals(42, started.queue().seed());
      assertEquals(new ReadSample(36, 0, 0, 0, 0, false), started.sample(), "4 non-answers out");
      assertTrue(started.summary().startsWith("Nothing read yet"), started.summary());

      long[] order = ReviewOrder.order(42, substantive(p));
      QueuePage next = queues.next(key, 5).orElseThrow();
      assertEquals(
          List.of(order[0], order[1], order[2], order[3], order[4]), ids(next), "queue order");
      assertEquals(
          List.of(1, 2, 3, 4, 5), next.answers().stream().map(QueuePage.Item::position).toList());
      assertTrue(next.answers().get(0).answer().text().contains("(order "), "masked text shown");

      Code fit = p.codebook().create("ana", CodeDraft.named("Fit"));
      Code price = p.codebook().create("ana", CodeDraft.named("Price"));
      for (int i = 0; i < 3; i++) {
        p.coding().assign("ana", order[i], fit.id(), Optional.empty());
      }
      QueueStatus three = queues.status(key).orElseThrow();
      assertEquals(new ReadSample(36, 3, 3, 0, 0, true), three.sample());
      assertTrue(three.summary().contains("the first 3 of 36"), three.summary());

      // A rule's code is nobody's reading: the sample is unchanged.
      p.rules().addRule("ana", price.id(), "price");
      p.rules().applyRules("ana", OptionalLong.of(price.id()));
      assertEquals(three.sample(), queues.status(key).orElseThrow().sample());

      // An answer coded out of order (found by search, say) breaks the sample, and says how.
      p.coding().assign("ana", order[9], fit.id(), Optional.empty());
      QueueStatus broken = queues.status(key).orElseThrow();
      assertEquals(new ReadSample(36, 4, 3, 1, 6, false), broken.sample());
      assertTrue(broken.summary().contains("not a random sample"), broken.summary());
      assertTrue(broken.summary().contains("random sample of 10"), broken.summary());
      QueuePage mend = queues.next(key, 3).orElseThrow();
      assertEquals(List.of(order[3], order[4], order[5]), ids(mend), "the skipped come first");
      QueuePage stretch = queues.page(key, OptionalInt.empty(), 8).orElseThrow();
      assertEquals(3, stretch.offset(), "a stretch starts at the first unread answer");
      assertEquals(order[9], stretch.answers().get(6).answer().id());
      assertTrue(stretch.answers().get(6).read());
      assertFalse(stretch.answers().get(0).read());

      // Taking a code off is a reading too (a veto): reading the six skipped mends the sample.
      for (int i = 3; i < 9; i++) {
        p.coding().assign("ana", order[i], price.id(), Optional.empty());
      }
      p.coding().unassign("ana", order[8], price.id());
      assertEquals(
          new ReadSample(36, 10, 10, 0, 0, true), queues.status(key).orElseThrow().sample());
    }
  }

  @Test
  void aQueueKeepsItsSeedAndWelcomesAnswersAddedLater() throws Exception {
    try (Project p = Project.openExisting(project)) {
      QueueKey key = QueueKey.of("Wave 1", Q);
      QueueStatus first = p.queues().start("ana", key, OptionalLong.empty());
      long seed = first.queue().seed();
      assertTrue(seed >= 0 && seed <= ReviewQueue.MAX_SEED);
      QueueStatus again = p.queues().start("ben", key, OptionalLong.empty());
      assertFalse(again.startedNow());
      assertEquals("ana", again.queue().startedBy());
      assertEquals(again, p.queues().start("ben", key, OptionalLong.of(seed)));
      InputException other =
          assertThrows(
              InputException.class,
              () -> p.queues().start("ben", key, OptionalLong.of(seed == 1 ? 2 : 1)));
      assertTrue(other.getMessage().contains("keeps that seed"), other.getMessage());
      assertThrows(
          InputException.class,
          () -> p.queues().start("ana", QueueKey.of("Wave 1", "1"), OptionalLong.of(-5)));
    }
    List<Long> before;
    try (Project p = Project.openExisting(project)) {
      before =
          ids(p.queues().page(QueueKey.of("Wave 1", "1"), OptionalInt.of(0), 500).orElseThrow());
    }
    importWave("Wave 1", wave(41, 70));
    try (Project p = Project.openExisting(project)) {
      List<Long> after =
          ids(p.queues().page(QueueKey.of("Wave 1", "1"), OptionalInt.of(0), 500).orElseThrow());
      assertEquals(36 + 27, after.size());
      List<Long> kept = new ArrayList<>(after);
      kept.retainAll(before);
      assertEquals(before, kept, "answers already there keep their order");
      assertFalse(after.subList(0, 36).containsAll(before), "the new ones fall among them");
    }
  }

  @Test
  void aQueueCanBeLimitedToOneSegmentValue() throws Exception {
    try (Project p = Project.openExisting(project)) {
      QueueKey mobile = QueueKey.of("Wave 1", "1", Optional.of("DEVICE= mobile"));
      QueueStatus s = p.queues().start("ana", mobile, OptionalLong.of(7));
      assertEquals(Optional.of("device=mobile"), s.queue().segment());
      assertEquals(12, s.sample().answers(), "every third respondent, less R-30");
      for (QueuePage.Item i : p.queues().next(mobile, 50).orElseThrow().answers()) {
        assertEquals("Mobile", i.answer().segments().get("device"));
      }
      long[] whole = ReviewOrder.order(7, substantive(p));
      QueuePage page = p.queues().page(mobile, OptionalInt.of(0), 50).orElseThrow();
      long[] mine = ids(page).stream().mapToLong(Long::longValue).toArray();
      long[] expected =
          java.util.Arrays.stream(whole).filter(id -> ids(page).contains(id)).toArray();
      assertArrayEquals(expected, mine, "the segment's answers in the same keyed order");
      InputException column =
          assertThrows(
              InputException.class,
              () ->
                  p.queues()
                      .start(
                          "ana",
                          QueueKey.of("Wave 1", "1", Optional.of("plan=basic")),
                          OptionalLong.empty()));
      assertTrue(column.getMessage().contains("they have: device"), column.getMessage());
      assertThrows(
          InputException.class,
          () ->
              p.queues()
                  .start(
                      "ana",
                      QueueKey.of("Wave 1", "1", Optional.of("device=tv")),
                      OptionalLong.empty()));
      assertThrows(InputException.class, () -> QueueKey.of("Wave 1", "1", Optional.of("device")));
      assertThrows(InputException.class, () -> p.queues().status(QueueKey.of("Wave 9", "1")));
      assertEquals(List.of(s.queue()), p.queues().all().stream().map(QueueStatus::queue).toList());
    }
  }

  /**
   * Findings from a random sample: the first 12 of the 36 substantive answers in the queue's order
   * are read (every third carries "Fit"), so the wave's share is projected with the
   * finite-population interval of {@code riffle.stats.FinitePopulation} (checked there against
   * Cochran 1977); one answer read outside the order ends the projection and the findings say the
   * reading is not a random sample.
   */
  @Test
  void findingsProjectARandomSampleToTheWaveAndStopWhenAnAnswerIsReadOutsideTheOrder()
      throws Exception {
    try (Project p = Project.openExisting(project)) {
      QueueKey key = QueueKey.of("Wave 1", "1");
      p.queues().start("ana", key, OptionalLong.of(7));
      long[] order = ReviewOrder.order(7, substantive(p));
      Code fit = p.codebook().create("ana", CodeDraft.named("Fit"));
      for (int i = 0; i < 12; i++) {
        if (i % 3 == 0) {
          p.coding().assign("ana", order[i], fit.id(), Optional.empty());
        } else {
          p.coding().markRead("ana", order[i]);
        }
      }
      var q = p.reporting().findings(FindingsQuery.ALL).questions().get(0);
      var coverage = q.coverage().get("Wave 1");
      assertEquals(riffle.model.Coverage.RANDOM, coverage.sample());
      assertEquals(12, coverage.read());
      var share = q.codes().get(0).waves().get("Wave 1");
      assertEquals(4, share.count());
      assertEquals(12, share.base());
      var projected = share.projected().orElseThrow();
      assertEquals(36, projected.population());
      assertEquals(12.0, projected.count(), 1e-9, "36 × 4/12");
      var expected = riffle.stats.FinitePopulation.project(4, 12, 36).orElseThrow();
      assertEquals(expected.lower(), projected.lower());
      assertEquals(expected.upper(), projected.upper());
      assertTrue(projected.lower() >= 4 && projected.upper() <= 4 + 24, "inside what can be");
      String text = p.reporting().markdown(p.reporting().findings(FindingsQuery.ALL), "t");
      assertTrue(text.contains("a random sample"), text);
      assertTrue(text.contains("about 12 of 36 in the wave"), text);

      p.coding().markRead("ana", order[30]);
      q = p.reporting().findings(FindingsQuery.ALL).questions().get(0);
      assertEquals(riffle.model.Coverage.NOT_RANDOM, q.coverage().get("Wave 1").sample());
      assertTrue(q.codes().get(0).waves().get("Wave 1").projected().isEmpty());
      text = p.reporting().markdown(p.reporting().findings(FindingsQuery.ALL), "t");
      assertTrue(text.contains("not a random sample"), text);
      assertFalse(text.contains("in the wave ("), text);
    }
  }
}
