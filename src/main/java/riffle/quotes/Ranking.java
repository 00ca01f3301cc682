package riffle.quotes;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import riffle.model.Code;
import riffle.model.CodeQuotes;
import riffle.model.Direction;
import riffle.model.Quote;
import riffle.model.QuoteFindings;
import riffle.model.QuoteSlot;
import riffle.model.Sentence;
import riffle.model.Span;
import riffle.model.Token;

/**
 * One ranking run over a fixed set of answers and a codebook (see the package documentation).
 *
 * <p>Size: one class because each step (candidate clauses, scores, near-duplicate folding, per-slot
 * picks) reads the state the earlier steps left for the same run; the clause and word rules live in
 * {@link Clauses} and {@link QuoteWords}.
 */
final class Ranking {
  /** An answer with what the ranking reads from it. */
  private static final class Prepared {
    final QuoteSource source;
    final boolean quotable;

    /** Indices of the active codes it carries, ascending. */
    final int[] codes;

    int[] content = new int[0];
    List<Piece> pieces = List.of();
    List<int[]> clauses = List.of();

    Prepared(QuoteSource source, boolean quotable, int[] codes) {
      this.source = source;
      this.quotable = quotable;
      this.codes = codes;
    }
  }

  /** The best piece of one answer for one code. */
  private record Candidate(
      Prepared answer, Piece piece, double typicality, double direction, double score) {}

  /** Near-duplicate candidates, best first; {@code shown} are those inside the filters. */
  private record Group(Direction direction, List<Candidate> all, List<Candidate> shown) {
    Candidate rep() {
      return shown.get(0);
    }

    /**
     * The shown candidates worded as the best one (the same stems in the same order): the answers
     * that said it this way, not those that said a longer or shorter thing near it.
     */
    List<Candidate> sameWording() {
      int[] wording = rep().piece().wording();
      return shown.stream().filter(c -> Arrays.equals(c.piece().wording(), wording)).toList();
    }

    /** How many answers said it this way. */
    int saidThisWay() {
      return (int)
          sameWording().stream().mapToLong(c -> c.answer().source.answerId()).distinct().count();
    }
  }

  /** A code's groups, as its ranking and the candidates by use need them. */
  private record CodeRun(
      Code code, boolean leaf, int answers, List<Group> groups, List<Group> heads) {}

  private final QuoteSettings settings;

  /** The active (not archived) codes in codebook order; a code is known by its index here. */
  private final List<Code> codes;

  /** related[x][y]: y is x, or below x, or above x. */
  private final boolean[][] related;

  /** below[x]: the indices of x and every code under it. */
  private final boolean[][] below;

  private final boolean[] leaf;
  private final List<Prepared> answers = new ArrayList<>();

  /** Per code index, the answers carrying it or a code below it, in id order. */
  private final List<List<Prepared>> members = new ArrayList<>();

  private final double[] idf;
  private final int vocabularySize;
  private final Centroid[] centroids;

  Ranking(List<Code> codebook, List<QuoteSource> sources, QuoteSettings settings) {
    this.settings = settings;
    Map<Long, Code> active = new HashMap<>();
    Set<Long> known = new HashSet<>();
    for (Code c : codebook) {
      if (!known.add(c.id())) {
        throw new IllegalArgumentException("the codebook holds code id " + c.id() + " twice");
      }
      if (!c.archived()) {
        active.put(c.id(), c);
      }
    }
    List<Code> order = new ArrayList<>(active.values());
    order.sort(Comparator.comparingInt(Code::position).thenComparingLong(Code::id));
    this.codes = List.copyOf(order);
    int k = codes.size();
    Map<Long, Integer> index = new HashMap<>();
    for (int i = 0; i < k; i++) {
      index.put(codes.get(i).id(), i);
    }
    below = new boolean[k][k];
    for (int i = 0; i < k; i++) {
      below[i][i] = true;
      Set<Integer> chain = new HashSet<>(List.of(i));
      Code up = codes.get(i);
      while (up.parent().isPresent()) {
        Integer parent = index.get(up.parent().getAsLong());
        if (parent == null || !chain.add(parent)) {
          break;
        }
        below[parent][i] = true;
        up = codes.get(parent);
      }
    }
    related = new boolean[k][k];
    leaf = new boolean[k];
    for (int x = 0; x < k; x++) {
      int size = 0;
      for (int y = 0; y < k; y++) {
        related[x][y] = below[x][y] || below[y][x];
        size += below[x][y] ? 1 : 0;
      }
      leaf[x] = size == 1;
      members.add(new ArrayList<>());
    }
    boolean[] wanted = new boolean[k];
    for (int x = 0; x < k; x++) {
      if (settings.codes().isEmpty() || settings.codes().contains(codes.get(x).id())) {
        for (int y = 0; y < k; y++) {
          wanted[y] |= below[x][y];
        }
      }
    }

    List<QuoteSource> sorted = new ArrayList<>(sources);
    sorted.sort(Comparator.comparingLong(QuoteSource::answerId));
    Vocabulary vocabulary = new Vocabulary();
    Map<riffle.model.Analysis, Clauses.Cut> cuts = new HashMap<>();
    Map<riffle.model.Analysis, int[]> contents = new HashMap<>();
    for (int i = 0; i < sorted.size(); i++) {
      QuoteSource s = sorted.get(i);
      if (i > 0 && sorted.get(i - 1).answerId() == s.answerId()) {
        throw new IllegalArgumentException("answer " + s.answerId() + " is given twice");
      }
      int[] carried = new int[s.codes().size()];
      int n = 0;
      boolean cut = false;
      for (long code : s.codes()) {
        if (!known.contains(code)) {
          throw new IllegalArgumentException(
              "answer "
                  + s.answerId()
                  + " carries code "
                  + code
                  + ", which is not in the codebook");
        }
        Integer x = index.get(code);
        if (x != null) {
          carried[n++] = x;
          cut |= wanted[x];
        }
      }
      carried = Arrays.copyOf(carried, n);
      Arrays.sort(carried);
      Prepared p = new Prepared(s, passesFilters(s), carried);
      if (cut && !s.analysis().foreign()) {
        // Identical analyses (short answers repeat a lot) are cut once: the cut depends on the
        // analysis alone.
        Clauses.Cut c = cuts.computeIfAbsent(s.analysis(), a -> Clauses.cut(a, vocabulary));
        p.pieces = c.pieces();
        p.clauses = c.clauses();
        p.content = c.content();
      } else {
        p.content = contents.computeIfAbsent(s.analysis(), a -> content(a, vocabulary));
      }
      answers.add(p);
      boolean[] counted = new boolean[k];
      for (int x : carried) {
        for (int up = 0; up < k; up++) {
          if (below[up][x] && !counted[up]) {
            counted[up] = true;
            members.get(up).add(p);
          }
        }
      }
    }
    this.vocabularySize = vocabulary.size();
    int[] df = new int[vocabularySize];
    for (Prepared p : answers) {
      for (int t : p.content) {
        df[t]++;
      }
    }
    // Inverse document frequency, smoothed so that a word in every answer keeps a little weight
    // (Salton & Buckley 1988, "Term-weighting approaches in automatic text retrieval").
    this.idf = new double[vocabularySize];
    for (int t = 0; t < vocabularySize; t++) {
      idf[t] = df[t] == 0 ? 0 : Math.log(1 + answers.size() / (double) df[t]);
    }
    this.centroids = new Centroid[k];
    int[] counts = new int[vocabularySize];
    for (int x = 0; x < k; x++) {
      centroids[x] = centroid(members.get(x), counts);
    }
  }

  /** The centroid over a code's answers; {@code counts} is all zero before and after. */
  private Centroid centroid(List<Prepared> of, int[] counts) {
    if (of.isEmpty()) {
      return Centroid.EMPTY;
    }
    int[] touched = new int[16];
    int n = 0;
    for (Prepared p : of) {
      for (int t : p.content) {
        if (counts[t]++ == 0) {
          if (n == touched.length) {
            touched = Arrays.copyOf(touched, n * 2);
          }
          touched[n++] = t;
        }
      }
    }
    int[] ids = Arrays.copyOf(touched, n);
    Arrays.sort(ids);
    int[] c = new int[n];
    for (int i = 0; i < n; i++) {
      c[i] = counts[ids[i]];
      counts[ids[i]] = 0;
    }
    return Centroid.of(ids, c, of.size(), idf);
  }

  private boolean passesFilters(QuoteSource s) {
    if (!settings.waves().isEmpty() && !settings.waves().contains(s.wave())) {
      return false;
    }
    for (Map.Entry<String, String> e : settings.segments().entrySet()) {
      if (!e.getValue().equals(s.segments().get(e.getKey()))) {
        return false;
      }
    }
    return true;
  }

  private static int[] content(riffle.model.Analysis analysis, Vocabulary vocabulary) {
    int n = 0;
    for (Sentence sentence : analysis.sentences()) {
      n += sentence.tokens().size();
    }
    int[] ids = new int[n];
    int k = 0;
    for (Sentence sentence : analysis.sentences()) {
      for (Token t : sentence.tokens()) {
        if (QuoteWords.isContent(t)) {
          ids[k++] = vocabulary.id(t);
        }
      }
    }
    int[] a = Arrays.copyOf(ids, k);
    Arrays.sort(a);
    return Arrays.stream(a).distinct().toArray();
  }

  QuoteFindings run() {
    List<Integer> ranked = new ArrayList<>();
    for (int x = 0; x < codes.size(); x++) {
      if (settings.codes().isEmpty() || settings.codes().contains(codes.get(x).id())) {
        ranked.add(x);
      }
    }
    List<CodeRun> runs = ranked.parallelStream().map(this::runCode).toList();
    List<CodeQuotes> perCode = new ArrayList<>();
    for (CodeRun r : runs) {
      List<Quote> quotes = new ArrayList<>();
      List<Group> best = top(r.groups, g -> general(g), settings.perCode(), g -> true);
      for (Group g : best) {
        quotes.add(quote(r.code, g, general(g), Optional.empty()));
      }
      perCode.add(
          new CodeQuotes(r.code.id(), r.code.name(), r.code.direction(), r.answers, quotes));
    }
    List<Quote> slots = new ArrayList<>();
    List<CodeRun> praise = leafRuns(runs, Direction.PRAISE);
    List<CodeRun> friction = leafRuns(runs, Direction.FRICTION);
    slots.addAll(
        spread(praise, r -> r.heads, g -> headline(g), g -> compatible(g), QuoteSlot.HEADLINE));
    slots.addAll(
        spread(
            praise,
            r -> r.groups,
            g -> subheadline(g),
            g -> compatible(g) && g.rep().piece().words() >= Score.SUBHEADLINE_MIN_WORDS,
            QuoteSlot.SUBHEADLINE));
    for (CodeRun r : leading(praise)) {
      for (Group g : top(r.groups, g -> typical(g), 1, g -> compatible(g))) {
        slots.add(quote(r.code, g, typical(g), Optional.of(QuoteSlot.BENEFIT)));
      }
    }
    for (CodeRun r : leading(friction)) {
      for (Group g :
          top(r.groups, g -> typical(g), settings.objectionQuotes(), g -> compatible(g))) {
        slots.add(quote(r.code, g, typical(g), Optional.of(QuoteSlot.OBJECTION)));
      }
    }
    slots.addAll(
        spread(
            praise,
            r -> r.groups,
            g -> proof(g),
            g ->
                compatible(g)
                    && g.rep().piece().firstPerson()
                    && g.rep().piece().concreteness() > 0,
            QuoteSlot.PROOF));
    return new QuoteFindings(perCode, slots);
  }

  /** Per-slot candidates across codes: at most {@value #PER_CODE_IN_SLOT} per code. */
  static final int PER_CODE_IN_SLOT = 2;

  private List<Quote> spread(
      List<CodeRun> runs,
      java.util.function.Function<CodeRun, List<Group>> groups,
      java.util.function.ToDoubleFunction<Group> score,
      java.util.function.Predicate<Group> eligible,
      QuoteSlot slot) {
    record Scored(CodeRun run, Group group, double score, int order) {}
    List<Scored> all = new ArrayList<>();
    int order = 0;
    for (CodeRun r : runs) {
      for (Group g : top(groups.apply(r), score, PER_CODE_IN_SLOT, eligible)) {
        all.add(new Scored(r, g, score.applyAsDouble(g), order++));
      }
    }
    all.sort(Comparator.comparingDouble(Scored::score).reversed().thenComparingInt(Scored::order));
    List<Quote> out = new ArrayList<>();
    for (Scored s : all.subList(0, Math.min(settings.perSlot(), all.size()))) {
      out.add(quote(s.run.code, s.group, s.score, Optional.of(slot)));
    }
    return out;
  }

  private List<CodeRun> leafRuns(List<CodeRun> runs, Direction direction) {
    return runs.stream().filter(r -> r.leaf && r.code.direction() == direction).toList();
  }

  /** The leading themes: most answers within the filters first, then codebook order. */
  private List<CodeRun> leading(List<CodeRun> runs) {
    List<CodeRun> sorted = new ArrayList<>(runs.stream().filter(r -> r.answers > 0).toList());
    sorted.sort(Comparator.comparingInt((CodeRun r) -> r.answers).reversed());
    return sorted.subList(0, Math.min(settings.leadingThemes(), sorted.size()));
  }

  private static List<Group> top(
      List<Group> groups,
      java.util.function.ToDoubleFunction<Group> score,
      int limit,
      java.util.function.Predicate<Group> eligible) {
    record Scored(Group group, double score, int order) {}
    List<Scored> all = new ArrayList<>();
    for (int i = 0; i < groups.size(); i++) {
      Group g = groups.get(i);
      double s = score.applyAsDouble(g);
      if (s > 0 && eligible.test(g)) {
        all.add(new Scored(g, s, i));
      }
    }
    all.sort(Comparator.comparingDouble(Scored::score).reversed().thenComparingInt(Scored::order));
    return all.subList(0, Math.min(limit, all.size())).stream().map(Scored::group).toList();
  }

  // ----- scores of a group (its representative, times the popularity of its wording) -----

  private double general(Group g) {
    return g.rep().score() * Score.popularity(g.saidThisWay());
  }

  private double typical(Group g) {
    Candidate c = g.rep();
    return c.typicality()
        * lengthOf(c.piece())
        * directionOf(c)
        * Score.popularity(g.saidThisWay());
  }

  private double subheadline(Group g) {
    Candidate c = g.rep();
    Piece p = c.piece();
    double bonus =
        1 + (p.explains() ? Score.EXPLAINS_WEIGHT : 0) + Score.CONCRETE_WEIGHT * p.concreteness();
    return c.typicality()
        * lengthOf(p)
        * directionOf(c)
        * bonus
        * Score.popularity(g.saidThisWay());
  }

  private double proof(Group g) {
    Candidate c = g.rep();
    Piece p = c.piece();
    return c.typicality()
        * lengthOf(p)
        * directionOf(c)
        * (1 + p.concreteness())
        * Score.popularity(g.saidThisWay());
  }

  private double headline(Group g) {
    return g.rep().score() * Score.popularity(g.saidThisWay());
  }

  private static boolean compatible(Group g) {
    return Score.compatible(g.direction(), g.rep().piece().polarity());
  }

  private double lengthOf(Piece p) {
    return Score.length(p.words(), settings.minWords(), settings.maxWords());
  }

  private static double directionOf(Candidate c) {
    return c.direction();
  }

  private Quote quote(Code code, Group g, double score, Optional<QuoteSlot> slot) {
    List<Candidate> same = g.sameWording();
    Candidate c = mostCommonForm(same);
    QuoteSource s = c.answer().source;
    List<Long> ids =
        same.stream().map(x -> x.answer().source.answerId()).distinct().sorted().toList();
    boolean fresh = false;
    if (settings.latestWave().isPresent()) {
      String latest = settings.latestWave().get();
      fresh = g.all().stream().allMatch(x -> x.answer().source.wave().equals(latest));
    }
    Piece p = c.piece();
    return new Quote(
        code.id(),
        code.name(),
        s.answerId(),
        s.respondent(),
        s.wave(),
        s.question(),
        s.segments(),
        text(c),
        p.start(),
        p.end(),
        Score.rounded(score),
        ids.size(),
        ids,
        fresh,
        slot);
  }

  private static String text(Candidate c) {
    return c.answer().source.analysis().masked().substring(c.piece().start(), c.piece().end());
  }

  /**
   * Of candidates with one wording (best first), the one written in the form most of them share,
   * exactly ("Fast delivery" over "fast delivery!"); the best of that form.
   */
  private static Candidate mostCommonForm(List<Candidate> same) {
    Map<String, Integer> forms = new HashMap<>();
    for (Candidate x : same) {
      forms.merge(text(x), 1, Integer::sum);
    }
    Candidate best = same.get(0);
    for (Candidate x : same) {
      if (forms.get(text(x)) > forms.get(text(best))) {
        best = x;
      }
    }
    return best;
  }

  // ----- one code -----

  private CodeRun runCode(int x) {
    Code code = codes.get(x);
    List<Prepared> of = members.get(x);
    int shown = 0;
    for (Prepared p : of) {
      shown += p.quotable ? 1 : 0;
    }
    Centroid own = centroids[x];
    double[] centroid = own.dense(vocabularySize);
    double norm = own.norm();
    boolean heads = leaf[x] && code.direction() == Direction.PRAISE;
    List<Candidate> general = new ArrayList<>();
    List<Candidate> brief = new ArrayList<>();
    for (Prepared p : of) {
      List<Piece> eligible = eligible(p, x, own);
      Candidate best = null;
      Candidate bestShort = null;
      for (Piece piece : eligible) {
        double t = typicality(piece, centroid, norm);
        if (t <= 0) {
          continue;
        }
        double d = Score.direction(code.direction(), piece.polarity());
        double length = lengthOf(piece);
        double voice = piece.firstPerson() ? Score.VOICE_WEIGHT : 0;
        double score = t * length * d * (1 + voice + Score.CONCRETE_WEIGHT * piece.concreteness());
        if (best == null || score > best.score()) {
          best = new Candidate(p, piece, t, d, score);
        }
        if (heads && piece.words() <= settings.headlineMaxWords()) {
          double h =
              t
                  * Score.length(
                      piece.words(), Score.HEADLINE_MIN_WORDS, settings.headlineMaxWords())
                  * d
                  * (piece.firstPerson() ? Score.HEADLINE_FIRST_PERSON : 1);
          if (bestShort == null || h > bestShort.score()) {
            bestShort = new Candidate(p, piece, t, d, h);
          }
        }
      }
      if (best != null) {
        general.add(best);
      }
      if (bestShort != null) {
        brief.add(bestShort);
      }
    }
    return new CodeRun(
        code, leaf[x], shown, group(code.direction(), general), group(code.direction(), brief));
  }

  /**
   * The pieces that may speak for code {@code x}: those overlapping its span when it has one (and
   * any overlap); otherwise, when the answer also carries unrelated codes, those without a clause
   * that resembles one of those codes more than this one; all pieces when no piece is left.
   */
  private List<Piece> eligible(Prepared p, int x, Centroid own) {
    Span span = null;
    if (!p.source.spans().isEmpty()) {
      span = p.source.spans().get(codes.get(x).id());
      for (int c : p.codes) {
        if (span == null && below[x][c]) {
          span = p.source.spans().get(codes.get(c).id());
        }
      }
    }
    if (span != null) {
      List<Piece> inside = new ArrayList<>();
      for (Piece piece : p.pieces) {
        if (piece.start() < span.end() && piece.end() > span.start()) {
          inside.add(piece);
        }
      }
      return inside.isEmpty() ? p.pieces : inside;
    }
    List<Centroid> others = null;
    for (int c : p.codes) {
      if (!related[x][c]) {
        if (others == null) {
          others = new ArrayList<>();
        }
        others.add(centroids[c]);
      }
    }
    if (others == null) {
      return p.pieces;
    }
    boolean[] foreign = new boolean[p.clauses.size()];
    for (int i = 0; i < foreign.length; i++) {
      int[] clause = p.clauses.get(i);
      double mine = own.cosine(clause, idf);
      for (Centroid o : others) {
        foreign[i] |= o.cosine(clause, idf) > mine;
      }
    }
    List<Piece> kept = new ArrayList<>();
    for (Piece piece : p.pieces) {
      boolean clean = true;
      for (int i = piece.firstClause(); i <= piece.lastClause() && clean; i++) {
        clean = !foreign[i];
      }
      if (clean) {
        kept.add(piece);
      }
    }
    return kept.isEmpty() ? p.pieces : kept;
  }

  /** Cosine of the piece's idf-weighted word set with the centroid. */
  private double typicality(Piece piece, double[] centroid, double norm) {
    if (norm == 0) {
      return 0;
    }
    double dot = 0;
    double own = 0;
    for (int t : piece.content()) {
      dot += idf[t] * centroid[t];
      own += idf[t] * idf[t];
    }
    return own == 0 ? 0 : dot / (Math.sqrt(own) * norm);
  }

  /** Near-duplicate groups of the candidates, best first; groups with nothing shown dropped. */
  private List<Group> group(Direction direction, List<Candidate> candidates) {
    List<Candidate> sorted = new ArrayList<>(candidates);
    sorted.sort(
        Comparator.comparingDouble(Candidate::score)
            .reversed()
            .thenComparingLong(c -> c.answer().source.answerId()));
    int[] of =
        NearDuplicates.groups(
            sorted.stream().map(c -> c.piece().stems()).toList(), settings.similarity());
    List<List<Candidate>> all = new ArrayList<>();
    for (int i = 0; i < sorted.size(); i++) {
      if (of[i] == all.size()) {
        all.add(new ArrayList<>());
      }
      all.get(of[i]).add(sorted.get(i));
    }
    List<Group> out = new ArrayList<>();
    for (List<Candidate> g : all) {
      List<Candidate> shown = g.stream().filter(c -> c.answer().quotable).toList();
      if (!shown.isEmpty()) {
        out.add(new Group(direction, List.copyOf(g), shown));
      }
    }
    return out;
  }
}
