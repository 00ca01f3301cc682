package riffle.app;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import riffle.coding.Codebook;
import riffle.index.QuerySyntaxException;
import riffle.model.AnswerRead;
import riffle.model.Assignment;
import riffle.model.Code;
import riffle.model.InputException;
import riffle.store.ProjectStore;

/**
 * Pages through a project's answers for coding: the filters become one query of the analysts'
 * language, the index finds the matching ids, and only the page's answers are read from the project
 * file — so a page costs the same in a project of 100,000 answers as in one of 100.
 */
public final class AnswerBrowser {
  private final ProjectStore store;
  private final AnswerSearch search;

  AnswerBrowser(ProjectStore store, AnswerSearch search) {
    this.store = store;
    this.search = search;
  }

  /**
   * One page of the answers the query matches, in id order, with their codes.
   *
   * @throws InputException when the search text cannot be read (its problem gives the column,
   *     counted in the search text) or the project cannot be read
   * @throws IllegalArgumentException when the query names a wave, question, segment or code the
   *     project lacks
   */
  public AnswerPage page(AnswerQuery query) throws InputException {
    List<String> questions = store.questions();
    String filters = filters(query, questions);
    String text = query.text().strip();
    if (!balanced(text)) {
      // Wrapped in brackets, "a) OR (b" would read as a different query: report its problem.
      matches(text, "", questions);
    }
    String whole =
        text.isEmpty() ? filters : filters.isEmpty() ? text : "(" + text + ") AND " + filters;
    long[] ids = matches(whole, text, questions);
    long[] readIds = store.readAnswerIds();
    if (query.coded().isPresent() && !query.coded().get()) {
      // "Not coded yet" leaves out the answers a person marked as read with no code applying.
      ids = without(ids, readIds);
    }
    int coded =
        whole.isEmpty()
            ? matches("is:coded", "", questions).length
            : matches("(" + whole + ") AND is:coded", text, questions).length;
    long[] nonAnswers = store.nonAnswerIds();
    int substantive = ids.length - common(ids, nonAnswers);
    int read = common(without(ids, nonAnswers), readIds);
    int from = Math.min(query.offset(), ids.length);
    int to = Math.min(ids.length, from + query.limit());
    List<Long> page = new ArrayList<>(to - from);
    for (long id : Arrays.copyOfRange(ids, from, to)) {
      page.add(id);
    }
    Map<String, Integer> numbers = new HashMap<>();
    for (int i = 0; i < questions.size(); i++) {
      numbers.put(questions.get(i), i + 1);
    }
    Map<Long, List<Assignment>> assigned = store.assignments(page);
    Map<Long, AnswerRead> reads = store.reads(page);
    List<AnswerPage.Entry> entries = new ArrayList<>(page.size());
    for (ProjectStore.AnswerRow r : store.answerRows(page)) {
      entries.add(
          AnswerPage.Entry.of(
              r,
              numbers.getOrDefault(r.question(), 0),
              assigned.getOrDefault(r.id(), List.of()),
              reads.get(r.id())));
    }
    return new AnswerPage(whole, ids.length, coded, substantive, read, from, entries);
  }

  /** How many ids two ascending arrays share. */
  static int common(long[] a, long[] b) {
    int n = 0;
    for (int i = 0, j = 0; i < a.length && j < b.length; ) {
      if (a[i] == b[j]) {
        n++;
        i++;
        j++;
      } else if (a[i] < b[j]) {
        i++;
      } else {
        j++;
      }
    }
    return n;
  }

  /** The ids of ascending {@code a} that ascending {@code b} lacks. */
  static long[] without(long[] a, long[] b) {
    long[] out = new long[a.length];
    int n = 0;
    for (int i = 0, j = 0; i < a.length; i++) {
      while (j < b.length && b[j] < a[i]) {
        j++;
      }
      if (j >= b.length || b[j] != a[i]) {
        out[n++] = a[i];
      }
    }
    return Arrays.copyOf(out, n);
  }

  /**
   * The whole masked text of one answer, for a page that was sent only its start.
   *
   * @return the text, or empty when there is no such answer
   */
  public Optional<String> text(long answerId) throws InputException {
    return store.answerRows(List.of(answerId)).stream()
        .findFirst()
        .map(ProjectStore.AnswerRow::masked);
  }

  /** How many answers carry each code, by code id (codes nobody used are left out). */
  public Map<Long, Integer> uses() throws InputException {
    Map<Long, Integer> out = new HashMap<>();
    for (Code c : store.codes()) {
      int n = store.assignmentsOfCode(c.id()).size();
      if (n > 0) {
        out.put(c.id(), n);
      }
    }
    return out;
  }

  private String filters(AnswerQuery query, List<String> questions) throws InputException {
    List<String> parts = new ArrayList<>();
    if (query.wave().isPresent()) {
      String wave = query.wave().get();
      boolean known = store.waveNames().contains(wave);
      if (!known) {
        throw new InputException("there is no wave \"" + wave + "\" in this project");
      }
      parts.add("wave:" + quoted(wave));
    }
    if (query.question().isPresent()) {
      int n = query.question().getAsInt();
      if (n < 1 || n > questions.size()) {
        throw new InputException(
            "there is no question " + n + "; the project has " + questions.size());
      }
      parts.add("question:" + n);
    }
    for (Map.Entry<String, String> s : query.segments().entrySet()) {
      parts.add(s.getKey().strip() + ":" + quoted(s.getValue()));
    }
    if (query.coded().isPresent()) {
      parts.add(query.coded().get() ? "is:coded" : "is:uncoded");
    }
    if (query.code().isPresent()) {
      Code c = Codebook.byId(store.codes(), query.code().getAsLong());
      parts.add("code:" + quoted(c.name()));
    }
    return String.join(" AND ", parts);
  }

  /** Whether the brackets outside quotes close in order (the parser refuses them otherwise). */
  static boolean balanced(String text) {
    int depth = 0;
    boolean quoted = false;
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (c == '\\') {
        i++;
      } else if (c == '"') {
        quoted = !quoted;
      } else if (!quoted && c == '(') {
        depth++;
      } else if (!quoted && c == ')' && --depth < 0) {
        return false;
      }
    }
    return depth == 0 && !quoted;
  }

  /** A filter value as a quoted term, its quotes and backslashes escaped. */
  private static String quoted(String value) {
    return "\"" + value.replace("\\", "\\\\").replace("\"", "\\\"") + "\"";
  }

  /**
   * The ids the whole query matches. When it cannot be read, the search text alone is read again,
   * so that the problem's column points into what the person typed.
   */
  private long[] matches(String whole, String text, List<String> qs) throws InputException {
    try {
      return search.matches(whole, qs);
    } catch (QuerySyntaxException e) {
      if (!text.isEmpty() && !text.equals(whole)) {
        search.matches(text, qs);
      }
      throw e;
    }
  }
}
