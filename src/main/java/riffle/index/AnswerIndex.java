package riffle.index;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.FieldType;
import org.apache.lucene.document.NumericDocValuesField;
import org.apache.lucene.document.SortedDocValuesField;
import org.apache.lucene.document.StoredField;
import org.apache.lucene.document.StringField;
import org.apache.lucene.document.TextField;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.FieldInfo;
import org.apache.lucene.index.IndexOptions;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.MultiReader;
import org.apache.lucene.index.NumericDocValues;
import org.apache.lucene.index.SortedDocValues;
import org.apache.lucene.index.StoredFields;
import org.apache.lucene.index.Term;
import org.apache.lucene.queries.mlt.MoreLikeThis;
import org.apache.lucene.search.BooleanClause;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.CollectorManager;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.search.ScoreMode;
import org.apache.lucene.search.SearcherManager;
import org.apache.lucene.search.SimpleCollector;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.search.TopDocs;
import org.apache.lucene.store.AlreadyClosedException;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.apache.lucene.store.FilterDirectory;
import org.apache.lucene.store.Lock;
import org.apache.lucene.store.LockObtainFailedException;
import org.apache.lucene.util.BytesRef;
import riffle.model.SearchHit;
import riffle.model.SearchResult;

/**
 * The answers' Lucene index in a folder of its own, shared by every process that opens the project.
 * Searches read the newest commit (reopened by {@link #refresh}, never left on a closed reader).
 * Writing needs the folder's write lock ({@link #tryWrite}: Lucene's {@code write.lock}, an OS file
 * lock that a process loses when it ends), held only while a {@link Writer} is open, so two
 * processes never write at once. Each commit carries a stamp saying what it was built from; a
 * caller compares the stamp with the project and writes when they differ. A folder that holds no
 * readable index (missing, damaged, another version) reads as empty with no stamp, and the next
 * writer replaces it. Searches are thread-safe; refreshing and writing belong to one thread.
 *
 * <p>Size: one class because the reader, the writer, the stamp and the lock are one Lucene folder's
 * life cycle; the analysts' query language is parsed elsewhere ({@link AnalystQueryParser}).
 */
public final class AnswerIndex implements AutoCloseable {
  /** Bump when fields or analysis change: older indexes are then rebuilt. */
  public static final String VERSION = "index-1";

  private static final String STAMP = "riffle.stamp";
  private static final String ID_KEY = "idkey";

  private static final FieldType HIGHLIGHTED = highlighted();

  private final Path folder;
  private final Directory directory;
  private final Analyzer analyzer = Fields.analyzer();

  /** Searchers over the newest commit read; null while the folder holds no readable index. */
  private volatile SearcherManager searchers;

  private AnswerIndex(Path folder, Directory directory) {
    this.folder = folder;
    this.directory = directory;
  }

  private static FieldType highlighted() {
    FieldType t = new FieldType(TextField.TYPE_STORED);
    t.setIndexOptions(IndexOptions.DOCS_AND_FREQS_AND_POSITIONS_AND_OFFSETS);
    t.setStoreTermVectors(true);
    t.freeze();
    return t;
  }

  /** Opens the index in {@code folder} for searching; writes nothing. */
  public static AnswerIndex open(Path folder) throws IOException {
    Files.createDirectories(folder);
    AnswerIndex index = new AnswerIndex(folder, FSDirectory.open(folder));
    index.refresh();
    return index;
  }

  /**
   * Moves the searches to the newest commit, which another process may have written. An index that
   * cannot be read is dropped (searches find nothing, {@link #stamp} is empty) until it is rebuilt.
   */
  public synchronized void refresh() {
    try {
      if (searchers == null) {
        if (DirectoryReader.indexExists(directory)) {
          searchers = new SearcherManager(directory, null);
        }
      } else {
        searchers.maybeRefreshBlocking();
      }
    } catch (IOException | RuntimeException unreadable) {
      drop();
    }
  }

  private void drop() {
    SearcherManager old = searchers;
    searchers = null;
    if (old != null) {
      try {
        old.close();
      } catch (IOException | RuntimeException e) {
        // the reader is unusable already; nothing of it is kept
      }
    }
  }

  /** What the newest commit read was built from; empty for a new or unreadable index. */
  public Optional<String> stamp() throws IOException {
    SearcherManager m = searchers;
    if (m == null) {
      return Optional.empty();
    }
    IndexSearcher s = m.acquire();
    try {
      return Optional.ofNullable(
          ((DirectoryReader) s.getIndexReader()).getIndexCommit().getUserData().get(STAMP));
    } finally {
      m.release(s);
    }
  }

  /**
   * Takes the folder's write lock when no other process or instance holds it, and opens a writer
   * under it; empty when the lock is held elsewhere. An index that cannot be opened for writing is
   * cleared first (it is derived data).
   */
  public synchronized Optional<Writer> tryWrite() throws IOException {
    Files.createDirectories(folder);
    Optional<Lock> obtained = obtainLock();
    if (obtained.isEmpty()) {
      return Optional.empty();
    }
    Lock lock = obtained.get();
    try {
      return Optional.of(new Writer(openWriter(new Locked(directory, lock)), lock));
    } catch (IOException | RuntimeException e) {
      lock.close();
      throw e;
    }
  }

  private Optional<Lock> obtainLock() throws IOException {
    for (int attempt = 0; ; attempt++) {
      Lock lock;
      try {
        lock = directory.obtainLock(IndexWriter.WRITE_LOCK_NAME);
      } catch (LockObtainFailedException held) {
        return Optional.empty();
      }
      try {
        lock.ensureValid();
        return Optional.of(lock);
      } catch (AlreadyClosedException damaged) {
        // Something wrote into the lock file, so no writer can ever use it: make it anew.
        lock.close();
        Path file = folder.resolve(IndexWriter.WRITE_LOCK_NAME);
        if (attempt > 0 || Files.size(file) == 0) {
          throw new IOException("the index's lock file " + file + " cannot be used", damaged);
        }
        Files.deleteIfExists(file);
      }
    }
  }

  private IndexWriter openWriter(Directory locked) throws IOException {
    try {
      return new IndexWriter(locked, config(IndexWriterConfig.OpenMode.CREATE_OR_APPEND));
    } catch (IOException | IllegalArgumentException unreadable) {
      clear(folder);
      return new IndexWriter(locked, config(IndexWriterConfig.OpenMode.CREATE));
    }
  }

  private static IndexWriterConfig config(IndexWriterConfig.OpenMode mode) {
    IndexWriterConfig config = new IndexWriterConfig(Fields.analyzer()).setOpenMode(mode);
    config.setRAMBufferSizeMB(64);
    // What was not committed is thrown away: a failed rebuild never commits half an index.
    config.setCommitOnClose(false);
    return config;
  }

  /** Deletes every file of the folder but the write lock, which this process holds. */
  private static void clear(Path folder) throws IOException {
    try (Stream<Path> files = Files.list(folder)) {
      for (Path f : files.sorted(Comparator.reverseOrder()).toList()) {
        if (!f.getFileName().toString().equals(IndexWriter.WRITE_LOCK_NAME)) {
          Files.deleteIfExists(f);
        }
      }
    }
  }

  /**
   * The folder with its write lock already held: the writer's own request gets that lock. Commits
   * are not forced to the disk (no fsync): the index is derived, a process that ends however it
   * ends leaves its writes with the operating system, and after a power cut an index that cannot be
   * read is rebuilt. Forcing every commit to the disk made catching up with one coded answer about
   * four times slower (measured on the shared build machine: p50 165 ms against 41 ms).
   */
  private static final class Locked extends FilterDirectory {
    private final Lock lock;

    Locked(Directory in, Lock lock) {
      super(in);
      this.lock = lock;
    }

    @Override
    public Lock obtainLock(String name) throws IOException {
      if (!name.equals(IndexWriter.WRITE_LOCK_NAME)) {
        return super.obtainLock(name);
      }
      return new Lock() {
        @Override
        public void close() {
          // released by Writer.close, after the writer
        }

        @Override
        public void ensureValid() throws IOException {
          lock.ensureValid();
        }
      };
    }

    @Override
    public void close() {
      // the folder stays open for searching
    }

    @Override
    public void sync(Collection<String> names) {
      // see the class comment
    }

    @Override
    public void syncMetaData() {
      // see the class comment
    }
  }

  /**
   * Writes to the index while holding its write lock; every change is committed with a stamp.
   * Closing releases the lock (changes not committed are dropped) and moves the searches to the new
   * commit.
   */
  public final class Writer implements AutoCloseable {
    private final IndexWriter writer;
    private final Lock lock;

    private Writer(IndexWriter writer, Lock lock) {
      this.writer = writer;
      this.lock = lock;
    }

    /** The stamp of the newest commit: with the lock held, no other process can change it. */
    public Optional<String> stamp() {
      Map<String, String> data = new HashMap<>();
      Iterable<Map.Entry<String, String>> live = writer.getLiveCommitData();
      if (live != null) {
        live.forEach(e -> data.put(e.getKey(), e.getValue()));
      }
      return Optional.ofNullable(data.get(STAMP));
    }

    /** Replaces everything with {@code answers} and commits with {@code stamp}. */
    public void rebuild(Iterable<IndexedAnswer> answers, String stamp) throws IOException {
      writer.deleteAll();
      for (IndexedAnswer a : answers) {
        writer.addDocument(document(a));
      }
      commit(stamp);
    }

    /** Adds answers (replacing any with the same id) and commits with {@code stamp}. */
    public void add(List<IndexedAnswer> answers, String stamp) throws IOException {
      for (IndexedAnswer a : answers) {
        writer.updateDocument(new Term(ID_KEY, Long.toString(a.answerId())), document(a));
      }
      commit(stamp);
    }

    private void commit(String stamp) throws IOException {
      writer.setLiveCommitData(Map.of(STAMP, stamp).entrySet());
      writer.commit();
    }

    @Override
    public void close() throws IOException {
      try {
        writer.close();
      } finally {
        lock.close();
        refresh();
      }
    }
  }

  private static Document document(IndexedAnswer a) {
    Document d = new Document();
    d.add(new StringField(ID_KEY, Long.toString(a.answerId()), Field.Store.NO));
    d.add(new StoredField(Fields.ID, a.answerId()));
    d.add(new NumericDocValuesField(Fields.ID, a.answerId()));
    d.add(new Field(Fields.TEXT, a.text(), HIGHLIGHTED));
    d.add(new TextField(Fields.EXACT, a.text(), Field.Store.NO));
    d.add(new TextField(Fields.NGRAMS, a.text(), Field.Store.NO));
    for (String chunk : a.chunks()) {
      d.add(new StringField(Fields.CHUNK, Fields.key(chunk), Field.Store.NO));
    }
    d.add(new StringField(Fields.WAVE, Fields.key(a.wave()), Field.Store.NO));
    d.add(new SortedDocValuesField(Fields.WAVE, new BytesRef(a.wave())));
    d.add(new StoredField(Fields.WAVE, a.wave()));
    d.add(new StringField(Fields.QUESTION, Fields.key(a.question()), Field.Store.YES));
    d.add(new StoredField(Fields.QUESTION + ".text", a.question()));
    d.add(new StoredField(Fields.RESPONDENT, a.respondent()));
    for (String code : a.codes()) {
      d.add(new StringField(Fields.CODE, Fields.key(code), Field.Store.NO));
    }
    d.add(new StringField(Fields.CODED, a.codes().isEmpty() ? "no" : "yes", Field.Store.NO));
    for (Map.Entry<String, String> s : a.segments().entrySet()) {
      d.add(
          new StringField(
              Fields.SEGMENT + Fields.key(s.getKey()), Fields.key(s.getValue()), Field.Store.NO));
    }
    return d;
  }

  /** A searcher over the newest commit read, or over nothing when there is no index. */
  private IndexSearcher acquire() throws IOException {
    SearcherManager m = searchers;
    if (m != null) {
      try {
        return m.acquire();
      } catch (AlreadyClosedException dropped) {
        // refreshed away meanwhile: search the empty index this time
      }
    }
    return new IndexSearcher(new MultiReader());
  }

  private static void release(IndexSearcher s) throws IOException {
    s.getIndexReader().decRef();
  }

  /** How many answers the index holds. */
  public int size() throws IOException {
    IndexSearcher s = acquire();
    try {
      return s.getIndexReader().numDocs();
    } finally {
      release(s);
    }
  }

  /** Segment columns that filters may name, lower-cased, sorted. */
  public Set<String> segments() throws IOException {
    IndexSearcher s = acquire();
    try {
      Set<String> out = new TreeSet<>();
      for (LeafReaderContext leaf : s.getIndexReader().leaves()) {
        for (FieldInfo f : leaf.reader().getFieldInfos()) {
          if (f.name.startsWith(Fields.SEGMENT)) {
            out.add(f.name.substring(Fields.SEGMENT.length()));
          }
        }
      }
      return out;
    } finally {
      release(s);
    }
  }

  /**
   * Runs an analyst's query.
   *
   * @param query the query (see {@link AnalystQueryParser} for the language)
   * @param questions the project's questions in order, for {@code question:N}
   * @param limit how many hits to return
   * @throws QuerySyntaxException when the query cannot be read; it gives the column
   */
  public SearchResult search(String query, List<String> questions, int limit)
      throws IOException, QuerySyntaxException {
    Query q = new AnalystQueryParser(analyzer, segments(), questions).read(query);
    return run(q, limit);
  }

  /** Answers like the given one (MoreLikeThis on the stemmed text), the answer itself left out. */
  public SearchResult similar(long answerId, int limit) throws IOException {
    IndexSearcher s = acquire();
    try {
      TopDocs own = s.search(new TermQuery(new Term(ID_KEY, Long.toString(answerId))), 1);
      if (own.scoreDocs.length == 0) {
        return new SearchResult(0, Map.of(), List.of());
      }
      MoreLikeThis mlt = new MoreLikeThis(s.getIndexReader());
      mlt.setAnalyzer(analyzer);
      mlt.setFieldNames(new String[] {Fields.TEXT});
      mlt.setMinTermFreq(1);
      mlt.setMinDocFreq(2);
      mlt.setMinWordLen(3);
      Query like = mlt.like(own.scoreDocs[0].doc);
      Query others =
          new BooleanQuery.Builder()
              .add(like, BooleanClause.Occur.MUST)
              .add(
                  new TermQuery(new Term(ID_KEY, Long.toString(answerId))),
                  BooleanClause.Occur.MUST_NOT)
              .build();
      return run(others, limit);
    } finally {
      release(s);
    }
  }

  private SearchResult run(Query q, int limit) throws IOException {
    IndexSearcher s = acquire();
    try {
      WaveCounter counter = s.search(q, WaveCounter.MANAGER);
      TopDocs top = s.search(q, Math.max(1, limit));
      List<List<SearchHit.Stretch>> marks = Highlights.of(s, analyzer, q, top);
      StoredFields stored = s.storedFields();
      List<SearchHit> hits = new ArrayList<>();
      for (int i = 0; i < top.scoreDocs.length && i < limit; i++) {
        ScoreDoc sd = top.scoreDocs[i];
        Document d = stored.document(sd.doc);
        hits.add(
            new SearchHit(
                d.getField(Fields.ID).numericValue().longValue(),
                d.get(Fields.RESPONDENT),
                d.get(Fields.WAVE),
                d.get(Fields.QUESTION + ".text"),
                d.get(Fields.TEXT),
                marks.get(i),
                sd.score));
      }
      return new SearchResult(counter.total, counter.waves(), hits);
    } finally {
      release(s);
    }
  }

  /**
   * The ids of every answer the query matches, in ascending order (for rules, which code them all).
   *
   * @throws QuerySyntaxException when the query cannot be read; it gives the column
   */
  public long[] matches(String query, List<String> questions)
      throws IOException, QuerySyntaxException {
    Query q = new AnalystQueryParser(analyzer, segments(), questions).read(query);
    IndexSearcher s = acquire();
    try {
      long[] ids = s.search(q, IdCollector.MANAGER).ids();
      java.util.Arrays.sort(ids);
      return ids;
    } finally {
      release(s);
    }
  }

  /** Collects answer ids from their doc values. */
  private static final class IdCollector extends SimpleCollector {
    static final CollectorManager<IdCollector, IdCollector> MANAGER =
        new CollectorManager<>() {
          @Override
          public IdCollector newCollector() {
            return new IdCollector();
          }

          @Override
          public IdCollector reduce(Collection<IdCollector> parts) {
            IdCollector all = new IdCollector();
            for (IdCollector part : parts) {
              for (int i = 0; i < part.size; i++) {
                all.add(part.found[i]);
              }
            }
            return all;
          }
        };

    private long[] found = new long[64];
    private int size;
    private NumericDocValues values;

    @Override
    protected void doSetNextReader(LeafReaderContext context) throws IOException {
      values = context.reader().getNumericDocValues(Fields.ID);
    }

    @Override
    public void collect(int doc) throws IOException {
      if (values != null && values.advanceExact(doc)) {
        add(values.longValue());
      }
    }

    private void add(long id) {
      if (size == found.length) {
        found = java.util.Arrays.copyOf(found, size * 2);
      }
      found[size++] = id;
    }

    long[] ids() {
      return java.util.Arrays.copyOf(found, size);
    }

    @Override
    public ScoreMode scoreMode() {
      return ScoreMode.COMPLETE_NO_SCORES;
    }
  }

  /** Counts matches per wave from the wave's doc values. */
  private static final class WaveCounter extends SimpleCollector {
    static final CollectorManager<WaveCounter, WaveCounter> MANAGER =
        new CollectorManager<>() {
          @Override
          public WaveCounter newCollector() {
            return new WaveCounter();
          }

          @Override
          public WaveCounter reduce(Collection<WaveCounter> parts) {
            WaveCounter all = new WaveCounter();
            for (WaveCounter part : parts) {
              all.total += part.total;
              part.counts.forEach((wave, n) -> all.counts.merge(wave, n, Integer::sum));
            }
            return all;
          }
        };

    final Map<String, Integer> counts = new LinkedHashMap<>();
    int total;
    private SortedDocValues waves;

    @Override
    protected void doSetNextReader(LeafReaderContext context) throws IOException {
      waves = context.reader().getSortedDocValues(Fields.WAVE);
    }

    @Override
    public void collect(int doc) throws IOException {
      total++;
      if (waves != null && waves.advanceExact(doc)) {
        counts.merge(waves.lookupOrd(waves.ordValue()).utf8ToString(), 1, Integer::sum);
      }
    }

    @Override
    public ScoreMode scoreMode() {
      return ScoreMode.COMPLETE_NO_SCORES;
    }

    Map<String, Integer> waves() {
      return counts;
    }
  }

  /** The folder the index lives in. */
  public Path folder() {
    return folder;
  }

  @Override
  public synchronized void close() {
    drop();
    try {
      directory.close();
    } catch (IOException e) {
      throw new UncheckedIOException("cannot close the index in " + folder, e);
    }
  }
}
