package riffle.report;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * The active (not archived) codes in display order, each with a bit index, and for each code the
 * bits an answer carrying it counts towards: its own and its active ancestors'.
 */
final class CodeBits {
  final List<ReportCode> codes;
  final Map<String, Integer> indexById;
  final Map<String, ReportCode> all;
  final boolean[] theme;
  final int[] depth;

  /** For each active code, the words with its own bit and its active ancestors' bits set. */
  final long[][] carries;

  /** For each active code, the words with its own bit only. */
  final long[][] own;

  final int words;

  CodeBits(List<ReportCode> codebook) {
    all = new LinkedHashMap<>();
    for (ReportCode c : codebook) {
      all.put(c.id(), c);
    }
    for (ReportCode c : codebook) {
      if (c.parentId().isPresent() && !all.containsKey(c.parentId().get())) {
        throw new IllegalArgumentException(
            "code "
                + c.id()
                + " names parent "
                + c.parentId().get()
                + ", which is not in the codebook");
      }
      // Walk up to detect cycles.
      String at = c.id();
      for (int steps = 0; at != null; steps++) {
        if (steps > all.size()) {
          throw new IllegalArgumentException(
              "the codebook's parents form a cycle through " + c.id());
        }
        at = all.get(at).parentId().orElse(null);
      }
    }
    // Display order: depth first from the top-level codes, siblings in codebook order.
    Map<String, List<ReportCode>> children = new HashMap<>();
    List<ReportCode> roots = new ArrayList<>();
    for (ReportCode c : codebook) {
      if (c.archived()) {
        continue;
      }
      Optional<String> parent = activeParent(c);
      if (parent.isPresent()) {
        children.computeIfAbsent(parent.get(), k -> new ArrayList<>()).add(c);
      } else {
        roots.add(c);
      }
    }
    List<ReportCode> ordered = new ArrayList<>();
    List<Integer> depths = new ArrayList<>();
    for (ReportCode root : roots) {
      visit(root, 0, children, ordered, depths);
    }
    codes = List.copyOf(ordered);
    int n = codes.size();
    words = Math.max(1, (n + 63) / 64);
    indexById = new HashMap<>();
    for (int i = 0; i < n; i++) {
      indexById.put(codes.get(i).id(), i);
    }
    theme = new boolean[n];
    depth = new int[n];
    carries = new long[n][words];
    own = new long[n][words];
    for (int i = 0; i < n; i++) {
      depth[i] = depths.get(i);
      ReportCode c = codes.get(i);
      theme[i] = children.containsKey(c.id());
      own[i][i >>> 6] |= 1L << i;
      for (ReportCode at = c; at != null; ) {
        int j = indexById.get(at.id());
        carries[i][j >>> 6] |= 1L << j;
        at = activeParent(at).map(all::get).orElse(null);
      }
    }
  }

  /** The nearest ancestor that is not archived. */
  private Optional<String> activeParent(ReportCode c) {
    Optional<String> parent = c.parentId();
    while (parent.isPresent() && all.get(parent.get()).archived()) {
      parent = all.get(parent.get()).parentId();
    }
    return parent;
  }

  private static void visit(
      ReportCode c,
      int depth,
      Map<String, List<ReportCode>> children,
      List<ReportCode> ordered,
      List<Integer> depths) {
    ordered.add(c);
    depths.add(depth);
    for (ReportCode child : children.getOrDefault(c.id(), List.of())) {
      visit(child, depth + 1, children, ordered, depths);
    }
  }

  int size() {
    return codes.size();
  }

  /** The name of the nearest active ancestor of code i, if any. */
  Optional<String> parentName(int i) {
    return activeParent(codes.get(i)).map(id -> all.get(id).name());
  }

  /** Whether code j is an ancestor of code i or i of j. */
  boolean related(int i, int j) {
    return (carries[i][j >>> 6] & (1L << j)) != 0 || (carries[j][i >>> 6] & (1L << i)) != 0;
  }

  /**
   * ORs into {@code into} the bits the answer's codes count towards ({@code withAncestors}) or just
   * their own bits.
   *
   * @throws IllegalArgumentException when a code id is not in the codebook
   */
  void mark(ReportAnswer answer, long[] into, boolean withAncestors) {
    mark(answer.id(), answer.codes(), Set.of(), into, withAncestors);
  }

  /**
   * ORs into {@code into} the bits of the codes {@code ids} but {@code except}, as {@link #mark}.
   *
   * @throws IllegalArgumentException when a code id is not in the codebook
   */
  void mark(
      String answerId,
      Collection<String> ids,
      Set<String> except,
      long[] into,
      boolean withAncestors) {
    for (String id : ids) {
      if (except.contains(id)) {
        continue;
      }
      Integer i = indexById.get(id);
      if (i == null) {
        if (!all.containsKey(id)) {
          throw new IllegalArgumentException(
              "answer " + answerId + " carries code " + id + ", which is not in the codebook");
        }
        continue; // archived
      }
      long[] bits = withAncestors ? carries[i] : own[i];
      for (int w = 0; w < words; w++) {
        into[w] |= bits[w];
      }
    }
  }
}
