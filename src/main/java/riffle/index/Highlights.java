package riffle.index;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.TopDocs;
import org.apache.lucene.search.uhighlight.Passage;
import org.apache.lucene.search.uhighlight.PassageFormatter;
import org.apache.lucene.search.uhighlight.UnifiedHighlighter;
import org.apache.lucene.search.uhighlight.WholeBreakIterator;
import riffle.model.SearchHit;

/**
 * Finds the matched stretches of each hit's text as offsets (never as markup: answer text is
 * untrusted and is shown as text).
 */
final class Highlights extends UnifiedHighlighter {
  private Highlights(IndexSearcher searcher, Analyzer analyzer) {
    super(
        UnifiedHighlighter.builder(searcher, analyzer)
            .withBreakIterator(WholeBreakIterator::new)
            .withMaxNoHighlightPassages(0)
            .withFormatter(new Offsets()));
  }

  static List<List<SearchHit.Stretch>> of(
      IndexSearcher searcher, Analyzer analyzer, Query query, TopDocs top) throws IOException {
    int[] docs = new int[top.scoreDocs.length];
    int[] passages = new int[docs.length];
    for (int i = 0; i < docs.length; i++) {
      docs[i] = top.scoreDocs[i].doc;
      passages[i] = 1;
    }
    Object[] found =
        new Highlights(searcher, analyzer)
            .highlightFieldsAsObjects(new String[] {Fields.TEXT}, query, docs, new int[] {1})
            .get(Fields.TEXT);
    List<List<SearchHit.Stretch>> out = new ArrayList<>(docs.length);
    for (int i = 0; i < docs.length; i++) {
      @SuppressWarnings("unchecked")
      List<SearchHit.Stretch> stretches =
          found != null && found[i] instanceof List<?> l ? (List<SearchHit.Stretch>) l : List.of();
      out.add(stretches);
    }
    return out;
  }

  /** Formats a passage as its match offsets. */
  private static final class Offsets extends PassageFormatter {
    @Override
    public Object format(Passage[] passages, String content) {
      List<SearchHit.Stretch> out = new ArrayList<>();
      for (Passage p : passages) {
        for (int i = 0; i < p.getNumMatches(); i++) {
          int start = p.getMatchStarts()[i];
          int end = p.getMatchEnds()[i];
          if (!out.isEmpty() && start <= out.get(out.size() - 1).end()) {
            SearchHit.Stretch last = out.remove(out.size() - 1);
            out.add(new SearchHit.Stretch(last.start(), Math.max(end, last.end())));
          } else {
            out.add(new SearchHit.Stretch(start, end));
          }
        }
      }
      return out;
    }
  }
}
