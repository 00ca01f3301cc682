package riffle.index;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import riffle.model.SearchHit;
import riffle.model.SearchResult;

class AnswerIndexTest {
  static final String Q1 = "What almost stopped you from ordering?";
  static final String Q2 = "What made you choose us?";

  static final List<IndexedAnswer> ANSWERS =
      List.of(
          answer(
              1,
              "W1-1",
              "Wave 1",
              Q1,
              "No delivery date shown at checkout",
              "delivery date unclear",
              "mobile"),
          answer(
              2,
              "W1-2",
              "Wave 1",
              Q1,
              "The delivery was late and the box was damaged",
              "",
              "desktop"),
          answer(
              3,
              "W1-3",
              "Wave 1",
              Q2,
              "Great price for a tested machine",
              "price and value",
              "mobile"),
          answer(
              4,
              "W2-1",
              "Wave 2",
              Q1,
              "I wasn't sure about the delivery dates",
              "delivery date unclear",
              "mobile"),
          answer(5, "W2-2", "Wave 2", Q1, "Shipping cost was too high", "shipping cost", "desktop"),
          answer(6, "W2-3", "Wave 2", Q2, "The warranty and the price", "", "tablet"),
          answer(7, "W3-1", "Wave 3", Q1, "Late delivery last time, still ordered", "", "mobile"));

  static IndexedAnswer answer(
      long id, String respondent, String wave, String q, String text, String code, String device) {
    return new IndexedAnswer(
        id,
        respondent,
        wave,
        q,
        text,
        code.isEmpty() ? List.of() : List.of(code),
        Map.of("device", device),
        List.of());
  }

  @TempDir Path dir;
  AnswerIndex index;

  @BeforeEach
  void build() throws Exception {
    index = AnswerIndex.open(dir.resolve("index"));
    try (AnswerIndex.Writer w = index.tryWrite().orElseThrow()) {
      w.rebuild(ANSWERS, "stamp-1");
    }
  }

  Set<Long> ids(String query) throws Exception {
    Set<Long> out = new TreeSet<>();
    index.search(query, List.of(Q1, Q2), 100).hits().forEach(h -> out.add(h.answerId()));
    return out;
  }

  @ParameterizedTest(name = "{0}")
  @CsvSource(
      delimiter = '|',
      value = {
        "delivery|1 2 4 7",
        "deliveries|1 2 4 7",
        "\"delivery date\"|1 4",
        "exact:\"delivery dates\"|4",
        "\"late delivery\"~3|2 7",
        "deliv*|1 2 4 7",
        "delivery late|2 7",
        "price OR shipping|3 5 6",
        "delivery NOT late|1 4",
        "(price OR warranty) AND wave:\"Wave 2\"|6",
        "wave:\"wave 1\"|1 2 3",
        "question:2|3 6",
        "code:\"delivery date unclear\"|1 4",
        "is:uncoded AND question:1|2 7",
        "device:mobile AND delivery|1 4 7",
        "|1 2 3 4 5 6 7",
      })
  void findsWhatAnAnalystAsksFor(String query, String expected) throws Exception {
    Set<Long> want = new TreeSet<>();
    for (String id : expected.split(" ")) {
      want.add(Long.parseLong(id));
    }
    assertEquals(want, ids(query == null ? "" : query));
  }

  @Test
  void countsHitsPerWaveAndMarksTheMatchedWords() throws Exception {
    SearchResult r = index.search("delivery", List.of(Q1, Q2), 10);
    assertEquals(4, r.total());
    assertEquals(Map.of("Wave 1", 2, "Wave 2", 1, "Wave 3", 1), r.waves());
    SearchHit first = r.hits().stream().filter(h -> h.answerId() == 1).findFirst().orElseThrow();
    assertEquals(List.of(new SearchHit.Stretch(3, 11)), first.highlight());
    assertEquals("delivery", first.text().substring(3, 11).toLowerCase(java.util.Locale.ROOT));
    assertEquals(Q1, first.question());
    assertEquals("W1-1", first.respondent());
  }

  @ParameterizedTest(name = "{0}")
  @CsvSource(
      delimiter = '|',
      value = {
        "delivery AND|13",
        "(price OR shipping|19",
        "\"delivery date|1",
        "colour:red|1",
        "is:maybe|1",
        "question:9|1",
      })
  void malformedQueriesSayWhere(String query, int column) {
    QuerySyntaxException e =
        assertThrows(QuerySyntaxException.class, () -> index.search(query, List.of(Q1, Q2), 10));
    assertEquals(column, e.located().orElseThrow().column(), e.getMessage());
    assertTrue(e.getMessage().startsWith("query:1:"), e.getMessage());
  }

  @Test
  void unknownFilterNamesTheFiltersThereAre() {
    QuerySyntaxException e =
        assertThrows(
            QuerySyntaxException.class, () -> index.search("colour:red", List.of(Q1, Q2), 10));
    assertTrue(e.getMessage().contains("device:"), e.getMessage());
  }

  @Test
  void findsAnswersLikeAGivenOne() throws Exception {
    SearchResult r = index.similar(1, 5);
    assertTrue(r.hits().stream().noneMatch(h -> h.answerId() == 1), "not the answer itself");
    assertEquals(4, r.hits().get(0).answerId(), "the other delivery-date answer comes first");
  }

  @Test
  void keepsItsStampAcrossReopening() throws Exception {
    index.close();
    index = AnswerIndex.open(dir.resolve("index"));
    assertEquals(Optional.of("stamp-1"), index.stamp());
    assertEquals(7, index.size());
  }

  @Test
  void aDamagedIndexOpensEmpty() throws Exception {
    index.close();
    try (var files = Files.list(dir.resolve("index"))) {
      for (Path f : files.toList()) {
        Files.writeString(f, "garbage", StandardCharsets.UTF_8);
      }
    }
    index = AnswerIndex.open(dir.resolve("index"));
    assertEquals(Optional.empty(), index.stamp());
    assertEquals(0, index.size());
    try (AnswerIndex.Writer w = index.tryWrite().orElseThrow()) {
      w.rebuild(ANSWERS, "stamp-2");
    }
    assertEquals(7, index.size());
  }

  @Test
  void addingAnAnswerAgainReplacesIt() throws Exception {
    try (AnswerIndex.Writer w = index.tryWrite().orElseThrow()) {
      w.add(
          List.of(answer(5, "W2-2", "Wave 2", Q1, "Shipping cost was too high", "", "desktop")),
          "stamp-3");
    }
    assertEquals(7, index.size());
    assertEquals(
        Set.of(2L, 5L, 7L),
        ids("is:uncoded AND question:1 AND wave:\"wave 2\" OR wave:\"wave 3\" OR late"));
  }

  @Test
  void oneWriterAtATimeWhileSearchesGoOn() throws Exception {
    try (AnswerIndex other = AnswerIndex.open(dir.resolve("index"));
        AnswerIndex.Writer w = index.tryWrite().orElseThrow()) {
      assertTrue(other.tryWrite().isEmpty(), "the second writer is refused, not let in");
      assertEquals(Set.of(1L, 2L, 4L, 7L), ids("delivery"), "searches go on while one writes");
      w.add(List.of(answer(8, "W3-2", "Wave 3", Q1, "Delivery was quick", "", "mobile")), "s-4");
      assertEquals(7, other.size(), "another reader sees the new commit only when it refreshes");
      other.refresh();
      assertEquals(8, other.size());
      assertEquals(Optional.of("s-4"), other.stamp());
    }
    try (AnswerIndex other = AnswerIndex.open(dir.resolve("index"));
        AnswerIndex.Writer w = other.tryWrite().orElseThrow()) {
      w.rebuild(ANSWERS, "s-5");
    }
    assertEquals(8, index.size(), "a reader keeps its commit until it refreshes");
    index.refresh();
    assertEquals(7, index.size());
    assertEquals(Optional.of("s-5"), index.stamp());
    assertEquals(Set.of(1L, 2L, 4L, 7L), ids("delivery"));
  }

  @Test
  void aWriterThatFailsCommitsNothing() throws Exception {
    AnswerIndex.Writer w = index.tryWrite().orElseThrow();
    List<IndexedAnswer> broken = new java.util.ArrayList<>(ANSWERS);
    broken.add(null);
    assertThrows(NullPointerException.class, () -> w.rebuild(broken, "half"));
    w.close();
    index.refresh();
    assertEquals(Optional.of("stamp-1"), index.stamp());
    assertEquals(7, index.size(), "the half-done rebuild was dropped, not committed");
  }
}
