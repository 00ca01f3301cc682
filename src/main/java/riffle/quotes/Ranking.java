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

/** One ranking run over a fixed set of answers and a codebook (see the package documentation). */
final class Ranking {
  /** An answer with what the ranking reads from it. */
  private static final class Prepared {
    final QuoteSource source;
    final int[] content;
    final boolean quotable;
    List<Piece> pieces = List.of();
    List<int[]> clauses = List.of();

    Prepared(QuoteSource source, int[] content, boolean quotable) {
      this.source = source;
      this.content = content;
      this.quotable = quotable;
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
  }

  /** A code's groups, as its ranking and the candidates by use need them. */
  private record CodeRun(
      Code code, boolean leaf, int answers, List<Group> groups, List<Group> heads) {}

  private final QuoteSettings settings;
  private final List<Code> ranked;
  private final Map<Long, Set<Long>> family = new HashMap<>();
  private final Set<Long> leaves = new HashSet<>();
  private final List<Prepared> answers = new ArrayList<>();
  private final double[] idf;
  private final int vocabularySize;
  private final Map<Long, Centroid> centroids;

  Ranking(List<Code> codebook, List<QuoteSource> sources, QuoteSettings settings) {
    this.settings = settings;
    Map<Long, Code> active = new HashMap<>();
    for (Code c : codebook) {
      if (active.containsKey(c.id()) && !active.get(c.id()).equals(c)) {
        throw new IllegalArgumentException("the codebook holds code id " + c.id() + " twice");
      }
      if (!c.archived()) {
        active.put(c.id(), c);
      }
    }
    Set<Long> known = new HashSet<>();
    codebook.forEach(c -> known.add(c.id()));
    List<Code> order = new ArrayList<>(active.values());
    order.sort(Comparator.comparingInt(Code::position).thenComparingLong(Code::id));
    for (Code c : order) {
      family.computeIfAbsent(c.id(), k -> new HashSet<>()).add(c.id());
      Set<Long> chain = new HashSet<>();
      Code up = c;
      while (up.parent().isPresent() && chain.add(up.id())) {
        Code parent = active.get(up.parent().getAsLong());
        if (parent == null) {
          break;
        }
        family.computeIfAbsent(parent.id(), k -> new HashSet<>()).add(c.id());
        up = parent;
      }
    }
    for (Code c : order) {
      if (family.get(c.id()).size() == 1) {
        leaves.add(c.id());
      }
    }
    this.ranked =
        order.stream()
            .filter(c -> settings.codes().isEmpty() || settings.codes().contains(c.id()))
            .toList();
    Set<Long> wanted = new HashSet<>();
    ranked.forEach(c -> wanted.addAll(family.get(c.id())));

    List<QuoteSource> sorted = new ArrayList<>(sources);
    sorted.sort(Comparator.comparingLong(QuoteSource::answerId));
    Vocabulary vocabulary = new Vocabulary();
    List<int[]> contents = new ArrayList<>();
    for (int i = 0; i < sorted.size(); i++) {
      QuoteSource s = sorted.get(i);
      if (i > 0 && sorted.get(i - 1).answerId() == s.answerId()) {
        throw new IllegalArgumentException("answer " + s.answerId() + " is given twice");
      }
      for (long code : s.codes()) {
        if (!known.contains(code)) {
          throw new IllegalArgumentException(
              "answer "
                  + s.answerId()
                  + " carries code "
                  + code
                  + ", which is not in the codebook");
        }
      }
      int[] content = content(s, vocabulary);
      contents.add(content);
      Prepared p = new Prepared(s, content, passesFilters(s));
      if (!s.analysis().foreign() && s.codes().stream().anyMatch(wanted::contains)) {
        Clauses.Cut cut = Clauses.cut(s.analysis(), vocabulary);
        p.pieces = cut.pieces();
        p.clauses = cut.clauses();
      }
      answers.add(p);
    }
    this.vocabularySize = vocabulary.size();
    int[] df = new int[vocabularySize];
    for (int[] c : contents) {
      for (int t : c) {
        df[t]++;
      }
    }
    // Inverse document frequency, smoothed so that a word in every answer keeps a little weight
    // (Salton & Buckley 1988, "Term-weighting approaches in automatic text retrieval").
    this.idf = new double[vocabularySize];
    for (int t = 0; t < vocabularySize; t++) {
      idf[t] = df[t] == 0 ? 0 : Math.log(1 + answers.size() / (double) df[t]);
    }
    this.centroids = centroids(order);
  }

  /**
   * The centroid of every code that is not archived, over the answers it or a code below carries.
   */
  private Map<Long, Centroid> centroids(List<Code> order) {
    Map<Long, Set<Long>> upward = new HashMap<>();
    for (Map.Entry<Long, Set<Long>> e : family.entrySet()) {
      for (long member : e.getValue()) {
        upward.computeIfAbsent(member, k -> new HashSet<>()).add(e.getKey());
      }
    }
    Map<Long, Map<Integer, Integer>> counts = new HashMap<>();
    Map<Long, Integer> sizes = new HashMap<>();
    for (Prepared p : answers) {
      Set<Long> codes = new HashSet<>();
      for (long c : p.source.codes()) {
        codes.addAll(upward.getOrDefault(c, Set.of()));
      }
      for (long c : codes) {
        sizes.merge(c, 1, Integer::sum);
        Map<Integer, Integer> m = counts.computeIfAbsent(c, k -> new HashMap<>());
        for (int t : p.content) {
          m.merge(t, 1, Integer::sum);
        }
      }
    }
    Map<Long, Centroid> out = new HashMap<>();
    for (Code c : order) {
      Map<Integer, Integer> m = counts.get(c.id());
      if (m == null) {
        out.put(c.id(), Centroid.EMPTY);
        continue;
      }
      int[] ids = m.keySet().stream().mapToInt(Integer::intValue).sorted().toArray();
      int[] n = new int[ids.length];
      for (int i = 0; i < ids.length; i++) {
        n[i] = m.get(ids[i]);
      }
      out.put(c.id(), Centroid.of(ids, n, sizes.get(c.id()), idf));
    }
    return out;
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

  private static int[] content(QuoteSource s, Vocabulary vocabulary) {
    int n = 0;
    for (Sentence sentence : s.analysis().sentences()) {
      n += sentence.tokens().size();
    }
    int[] ids = new int[n];
    int k = 0;
    for (Sentence sentence : s.analysis().sentences()) {
      for (Token t : sentence.tokens()) {
        if (Words.isContent(t)) {
          ids[k++] = vocabulary.id(t);
        }
      }
    }
    int[] a = Arrays.copyOf(ids, k);
    Arrays.sort(a);
    return Arrays.stream(a).distinct().toArray();
  }

  QuoteFindings run() {
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
    return g.rep().score() * Score.popularity(g.shown().size());
  }

  private double typical(Group g) {
    Candidate c = g.rep();
    return c.typicality()
        * lengthOf(c.piece())
        * directionOf(c)
        * Score.popularity(g.shown().size());
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
        * Score.popularity(g.shown().size());
  }

  private double proof(Group g) {
    Candidate c = g.rep();
    Piece p = c.piece();
    return c.typicality()
        * lengthOf(p)
        * directionOf(c)
        * (1 + p.concreteness())
        * Score.popularity(g.shown().size());
  }

  private double headline(Group g) {
    return g.rep().score() * Score.popularity(g.shown().size());
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
    Candidate c = g.rep();
    QuoteSource s = c.answer().source;
    List<Long> ids = g.shown().stream().map(x -> x.answer().source.answerId()).sorted().toList();
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
        s.analysis().masked().substring(p.start(), p.end()),
        p.start(),
        p.end(),
        Score.rounded(score),
        ids.size(),
        ids,
        fresh,
        slot);
  }

  // ----- one code -----

  private CodeRun runCode(Code code) {
    Set<Long> ids = family.get(code.id());
    List<Prepared> members = new ArrayList<>();
    int shown = 0;
    for (Prepared p : answers) {
      if (carries(p.source, ids)) {
        members.add(p);
        shown += p.quotable ? 1 : 0;
      }
    }
    Centroid own = centroids.get(code.id());
    double[] centroid = own.dense(vocabularySize);
    double norm = own.norm();
    boolean leaf = leaves.contains(code.id());
    boolean heads = leaf && code.direction() == Direction.PRAISE;
    List<Candidate> general = new ArrayList<>();
    List<Candidate> brief = new ArrayList<>();
    for (Prepared p : members) {
      List<Piece> eligible = eligible(p, ids, code, own);
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
        code, leaf, shown, group(code.direction(), general), group(code.direction(), brief));
  }

  private static boolean carries(QuoteSource s, Set<Long> ids) {
    for (long c : s.codes()) {
      if (ids.contains(c)) {
        return true;
      }
    }
    return false;
  }

  /**
   * The pieces that may speak for the code: those overlapping its span when it has one (and any
   * overlap); otherwise, when the answer also carries unrelated codes, those without a clause that
   * resembles one of those codes more than this one; all pieces when no piece is left.
   */
  private List<Piece> eligible(Prepared p, Set<Long> ids, Code code, Centroid own) {
    Span span = p.source.spans().get(code.id());
    if (span == null) {
      for (Map.Entry<Long, Span> e : p.source.spans().entrySet()) {
        if (ids.contains(e.getKey())) {
          span = e.getValue();
          break;
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
    List<Centroid> others = new ArrayList<>();
    for (long c : p.source.codes()) {
      Set<Long> below = family.get(c);
      if (!ids.contains(c) && below != null && !below.contains(code.id())) {
        others.add(centroids.get(c));
      }
    }
    if (others.isEmpty()) {
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
