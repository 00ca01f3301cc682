package riffle.cli;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.BooleanSupplier;

/**
 * Coders working through a server's API at once, each on answers of their own: giving and taking
 * off codes, undoing their own last change, and reading the answer list and the search (which make
 * the server's index catch up). Each coder keeps what the server acknowledged — the assignments it
 * should hold, and the stack of edits that undo takes back — and at the end the server's
 * assignments are compared with it. Seeded: the same seed makes the same requests. Coders are named
 * after the seed: runs with different seeds and codes do not undo each other's edits.
 */
final class CodingLoad {
  /**
   * What a run measured.
   *
   * @param requests requests sent (changes and reads)
   * @param seconds wall time of the run
   * @param changeMillis latencies of the changes (give, take off, undo), sorted
   * @param readMillis latencies of the reads, sorted
   * @param refused requests answered other than 2xx
   * @param lost acknowledged assignments the server does not hold at the end
   * @param extra assignments the server holds that no acknowledged change left
   * @param undoWrong undos whose outcome differed from the coder's own stack
   */
  record Result(
      int requests,
      double seconds,
      double[] changeMillis,
      double[] readMillis,
      int refused,
      int lost,
      int extra,
      int undoWrong) {
    double perSecond() {
      return requests / seconds;
    }

    static double percentile(double[] sorted, double p) {
      if (sorted.length == 0) {
        return Double.NaN;
      }
      int i = (int) Math.ceil(p * sorted.length) - 1;
      return sorted[Math.max(0, Math.min(sorted.length - 1, i))];
    }

    String summary() {
      return String.format(
          Locale.ROOT,
          "%d requests in %.1f s (%.0f/s); changes p50 %.1f ms, p99 %.1f ms, max %.1f ms; reads"
              + " p50 %.1f ms, p99 %.1f ms; refused %d, lost %d, extra %d, undo mismatches %d",
          requests,
          seconds,
          perSecond(),
          percentile(changeMillis, 0.5),
          percentile(changeMillis, 0.99),
          percentile(changeMillis, 1.0),
          percentile(readMillis, 0.5),
          percentile(readMillis, 0.99),
          refused,
          lost,
          extra,
          undoWrong);
    }
  }

  private record Edit(long answer, long code, boolean after) {}

  private CodingLoad() {}

  /**
   * Runs {@code coders} coders over {@code answers} (coder i takes every answer at positions i, i +
   * coders …) and {@code codes}: each sends at least {@code least} requests, and goes on while
   * {@code meanwhile} holds, up to {@code most}.
   */
  static Result run(
      ServerClient api,
      List<Long> answers,
      List<Long> codes,
      int coders,
      int least,
      int most,
      BooleanSupplier meanwhile,
      long seed)
      throws Exception {
    ExecutorService pool = Executors.newFixedThreadPool(coders);
    List<Future<Coder>> running = new ArrayList<>();
    long start = System.nanoTime();
    for (int i = 0; i < coders; i++) {
      List<Long> own = new ArrayList<>();
      for (int k = i; k < answers.size(); k += coders) {
        own.add(answers.get(k));
      }
      Coder c = new Coder(api, "coder-" + seed + "-" + i, own, codes, new Random(seed + i));
      running.add(pool.submit(() -> c.work(least, most, meanwhile)));
    }
    List<Coder> done = new ArrayList<>();
    for (Future<Coder> f : running) {
      done.add(f.get());
    }
    pool.shutdown();
    double seconds = (System.nanoTime() - start) / 1e9;

    Map<Long, Set<Long>> expected = new HashMap<>();
    List<Double> changes = new ArrayList<>();
    List<Double> reads = new ArrayList<>();
    int requests = 0;
    int refused = 0;
    int undoWrong = 0;
    for (Coder c : done) {
      c.has.forEach(
          (answer, set) -> expected.computeIfAbsent(answer, k -> new HashSet<>()).addAll(set));
      changes.addAll(c.changeMillis);
      reads.addAll(c.readMillis);
      requests += c.requests;
      refused += c.refused;
      undoWrong += c.undoWrong;
    }
    Set<Long> watched = new HashSet<>(codes);
    Map<Long, Set<Long>> actual = assignments(api, answers, watched);
    int lost = 0;
    int extra = 0;
    for (long answer : answers) {
      Set<Long> want = expected.getOrDefault(answer, Set.of());
      Set<Long> got = actual.getOrDefault(answer, Set.of());
      for (long code : want) {
        if (!got.contains(code)) {
          lost++;
        }
      }
      for (long code : got) {
        if (!want.contains(code)) {
          extra++;
        }
      }
    }
    return new Result(
        requests, seconds, sorted(changes), sorted(reads), refused, lost, extra, undoWrong);
  }

  private static double[] sorted(List<Double> values) {
    double[] out = values.stream().mapToDouble(Double::doubleValue).toArray();
    Arrays.sort(out);
    return out;
  }

  /** The server's assignments of {@code codes} to {@code answers}. */
  static Map<Long, Set<Long>> assignments(ServerClient api, List<Long> answers, Set<Long> codes)
      throws IOException, InterruptedException {
    Map<Long, Set<Long>> out = new HashMap<>();
    for (int from = 0; from < answers.size(); from += 200) {
      List<Long> part = answers.subList(from, Math.min(answers.size(), from + 200));
      StringBuilder ids = new StringBuilder();
      for (long id : part) {
        ids.append(ids.length() == 0 ? "" : ",").append(id);
      }
      ServerClient.Answer a = api.get("/api/assignments?answers=" + ids);
      if (!a.ok()) {
        throw new IllegalStateException("assignments could not be read: " + a.body());
      }
      JsonNode all = a.json().get("assignments");
      for (long id : part) {
        JsonNode list = all.get(Long.toString(id));
        if (list != null) {
          for (JsonNode x : list) {
            long code = x.get("code_id").asLong();
            if (codes.contains(code)) {
              out.computeIfAbsent(id, k -> new HashSet<>()).add(code);
            }
          }
        }
      }
    }
    return out;
  }

  /** One coder: a thread of requests and what the server acknowledged to it. */
  private static final class Coder {
    private final ServerClient api;
    private final String name;
    private final List<Long> answers;
    private final List<Long> codes;
    private final Random random;
    final Map<Long, Set<Long>> has = new HashMap<>();
    private final Deque<Edit> edits = new ArrayDeque<>();
    final List<Double> changeMillis = new ArrayList<>();
    final List<Double> readMillis = new ArrayList<>();
    int requests;
    int refused;
    int undoWrong;

    Coder(ServerClient api, String name, List<Long> answers, List<Long> codes, Random random) {
      this.api = api;
      this.name = name;
      this.answers = answers;
      this.codes = codes;
      this.random = random;
    }

    Coder work(int least, int most, BooleanSupplier meanwhile)
        throws IOException, InterruptedException {
      for (int i = 0; i < most && (i < least || meanwhile.getAsBoolean()); i++) {
        int roll = random.nextInt(10);
        if (roll < 6) {
          toggle();
        } else if (roll < 8) {
          undo();
        } else {
          read();
        }
      }
      return this;
    }

    private void toggle() throws IOException, InterruptedException {
      long answer = answers.get(random.nextInt(answers.size()));
      long code = codes.get(random.nextInt(codes.size()));
      boolean give = !has.getOrDefault(answer, Set.of()).contains(code);
      Map<String, Object> body = Map.of("coder", name, "answer", answer, "code", code);
      ServerClient.Answer a =
          timed(
              changeMillis,
              () -> api.post(give ? "/api/assignments" : "/api/assignments/remove", body));
      if (!a.ok()) {
        refused++;
        return;
      }
      if (a.json().get("outcome").get("edit").asLong() != 0) {
        edits.push(new Edit(answer, code, give));
      }
      set(answer, code, give);
    }

    private void undo() throws IOException, InterruptedException {
      ServerClient.Answer a =
          timed(changeMillis, () -> api.post("/api/undo", Map.of("coder", name)));
      if (!a.ok()) {
        refused++;
        return;
      }
      boolean undid = a.json().get("edit").asLong() != 0;
      if (undid != !edits.isEmpty() || a.json().get("skipped").asInt() != 0) {
        undoWrong++;
      }
      if (undid && !edits.isEmpty()) {
        Edit e = edits.pop();
        set(e.answer(), e.code(), !e.after());
      }
    }

    private void read() throws IOException, InterruptedException {
      long code = codes.get(random.nextInt(codes.size()));
      String path =
          random.nextBoolean()
              ? "/api/answers?limit=20&code=" + code
              : "/api/search?limit=20&q=" + ServerClient.q("delivery OR price");
      ServerClient.Answer a = timed(readMillis, () -> api.get(path));
      if (!a.ok()) {
        refused++;
      }
    }

    private void set(long answer, long code, boolean on) {
      Set<Long> s = has.computeIfAbsent(answer, k -> new HashSet<>());
      if (on) {
        s.add(code);
      } else {
        s.remove(code);
      }
    }

    private interface Request {
      ServerClient.Answer send() throws IOException, InterruptedException;
    }

    private ServerClient.Answer timed(List<Double> into, Request r)
        throws IOException, InterruptedException {
      long t = System.nanoTime();
      ServerClient.Answer a = r.send();
      into.add((System.nanoTime() - t) / 1e6);
      requests++;
      return a;
    }
  }
}
