package riffle.app;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.Assignment;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.Progress;

/**
 * Two coders (or two browser tabs, each with its own connection) changing the same answers at the
 * same moment never lose an assignment: each change is a single-row intent in its own write
 * transaction.
 */
class ConcurrentCodingTest {
  @TempDir Path dir;

  @Test
  void twoCodersOnTheSameAnswersLoseNothing() throws Exception {
    StringBuilder csv = new StringBuilder("id,Why did you choose us?\n");
    for (int i = 1; i <= 40; i++) {
      csv.append("R").append(i).append(",The grinder number ").append(i).append(" looked good\n");
    }
    Path file = dir.resolve("w.csv");
    Files.writeString(file, csv.toString(), StandardCharsets.UTF_8);
    Path project = dir.resolve("p.riffle");
    Project.importInto(
        project, ImportRequest.from(new ImportSource.File(file)).wave("W1").get(), Progress.NONE);
    List<Long> answers;
    Code looks;
    Code value;
    try (Project p = Project.openExisting(project)) {
      answers = p.answerIds();
      looks = p.codebook().create("ana", CodeDraft.named("Looks"));
      value = p.codebook().create("ana", CodeDraft.named("Value"));
    }
    CountDownLatch start = new CountDownLatch(1);
    ExecutorService pool = Executors.newFixedThreadPool(2);
    List<Future<?>> done = new ArrayList<>();
    for (Object[] coder : new Object[][] {{"ana", looks}, {"ben", value}}) {
      done.add(
          pool.submit(
              () -> {
                try (Project p = Project.openExisting(project)) {
                  start.await();
                  for (long a : answers) {
                    p.coding()
                        .assign((String) coder[0], a, ((Code) coder[1]).id(), Optional.empty());
                  }
                  // A stale tab repeats the same intent: nothing changes, nothing is lost.
                  p.coding()
                      .assign(
                          (String) coder[0],
                          answers.get(0),
                          ((Code) coder[1]).id(),
                          Optional.empty());
                }
                return null;
              }));
    }
    start.countDown();
    for (Future<?> f : done) {
      f.get();
    }
    pool.shutdown();
    try (Project p = Project.openExisting(project)) {
      var all = p.coding().assignments(answers);
      for (long a : answers) {
        assertEquals(
            List.of(looks.id(), value.id()),
            all.get(a).stream().map(Assignment::codeId).sorted().toList(),
            "answer " + a);
      }
      p.coding().undo("ben");
      assertEquals(40 + 39, p.summary().assignments(), "ben's undo takes back ben's last only");
    }
  }
}
