package org.morphscout.indexer.vector;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.locks.ReentrantLock;
import java.util.function.BooleanSupplier;
import org.apache.lucene.codecs.KnnVectorsFormat;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.LeafReader;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.SegmentCommitInfo;
import org.apache.lucene.index.SegmentInfos;
import org.apache.lucene.search.AcceptDocs;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.KnnFloatVectorQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.search.SearcherManager;
import org.apache.lucene.search.TopDocs;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.apache.lucene.store.LockObtainFailedException;
import org.apache.lucene.util.IOUtils;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.values.VectorSegments;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The vector index on Apache Lucene's HNSW graphs: one document per image holding up to two unit vectors
 * ("appearance", "shape"), searched by cosine similarity.
 *
 * <p>Two modes. {@link #open} takes the folder's single writer (Lucene's {@code write.lock}; a second process gets a
 * {@link MorphscoutException}) and serves searches from a {@link SearcherManager} refreshed at every {@link
 * #commit()}. {@link #openReadOnly} only reads the last commit, so query-only commands can run while another process
 * indexes; {@link #refresh()} picks up that process's later commits, and all write methods throw.
 *
 * <p>Searches see committed state only. {@link #close()} discards uncommitted changes (like rolling back a database
 * transaction), so a cancelled indexing run cannot leave vectors of images the catalog never recorded.
 *
 * <p>The folder's files are memory-mapped and, when the index fits comfortably in memory, loaded at open
 * ({@link MappedIndexFiles}), so searches do not pay a page fault for each vector they first touch.
 *
 * <p>Thread-safety: all methods may be called from any thread. Writes are serialised by a lock; searches take no
 * lock and run concurrently with writes and commits.
 */
public final class LuceneVectorIndex implements VectorIndex {
  private static final Logger LOG = LoggerFactory.getLogger(LuceneVectorIndex.class);

  private final Path path;
  private final LuceneIndexOptions options;
  private final Directory directory;
  /** Absent in read-only mode (Lucene's IndexWriter has no null-object form). */
  private final IndexWriter writer;
  private final SearcherManager searchers;
  /** Dimensions of everything written so far, committed or not; only used by the writer. */
  private final FieldDimensions dimensions = new FieldDimensions();
  private final ReentrantLock writeLock = new ReentrantLock();

  private LuceneVectorIndex(
      Path path, LuceneIndexOptions options, Directory directory, IndexWriter writer, SearcherManager searchers)
      throws IOException {
    this.path = path;
    this.options = options;
    this.directory = directory;
    this.writer = writer;
    this.searchers = searchers;
    IndexSearcher searcher = searchers.acquire();
    try {
      for (Field field : Field.values()) {
        dimensions.set(field, LuceneSchema.dimension(searcher.getIndexReader(), field));
      }
    } finally {
      searchers.release(searcher);
    }
  }

  /**
   * Opens (creating if needed) the index in {@code dir} for reading and writing.
   *
   * @throws MorphscoutException when another process (or another open index in this one) holds the folder, or the
   *     index there is damaged or from an unsupported Lucene version
   */
  public static LuceneVectorIndex open(Path dir, LuceneIndexOptions options) throws IOException {
    Objects.requireNonNull(options, "options");
    Files.createDirectories(dir);
    Directory directory = MappedIndexFiles.open(dir);
    IndexWriter writer = null;
    SearcherManager searchers = null;
    try {
      IndexWriterConfig config = new IndexWriterConfig()
          .setOpenMode(IndexWriterConfig.OpenMode.CREATE_OR_APPEND)
          .setCodec(new VectorFieldCodec(options))
          .setRAMBufferSizeMB(options.ramBufferMb())
          .setCommitOnClose(false);
      writer = new IndexWriter(directory, config);
      if (!DirectoryReader.indexExists(directory)) {
        writer.commit(); // an empty first commit, so read-only openers find an index at once
      }
      searchers = new SearcherManager(writer, null);
      LuceneVectorIndex index = new LuceneVectorIndex(dir, options, directory, writer, searchers);
      LOG.debug("Opened vector index {} for writing with {}", dir, options);
      return index;
    } catch (LockObtainFailedException e) {
      IOUtils.closeWhileHandlingException(searchers, writer, directory);
      throw new MorphscoutException("catalog in use by another Morphscout process (vector index locked): " + dir, e);
    } catch (IOException | RuntimeException e) {
      IOUtils.closeWhileHandlingException(searchers, writer, directory);
      throw LuceneFailures.translate(e, dir);
    }
  }

  /**
   * Opens the last commit in {@code dir} for searching only; takes no lock, so another process may be indexing.
   *
   * @throws MorphscoutException when {@code dir} holds no index yet, or a damaged or unsupported one
   */
  public static LuceneVectorIndex openReadOnly(Path dir) throws IOException {
    return openReadOnly(dir, LuceneIndexOptions.defaults());
  }

  /** As {@link #openReadOnly(Path)}; only the search fan-out of {@code options} matters when reading. */
  public static LuceneVectorIndex openReadOnly(Path dir, LuceneIndexOptions options) throws IOException {
    Objects.requireNonNull(options, "options");
    if (!Files.isDirectory(dir)) {
      throw new MorphscoutException("No vector index at " + dir + ": index the catalog first.");
    }
    Directory directory = MappedIndexFiles.open(dir);
    SearcherManager searchers = null;
    try {
      if (!DirectoryReader.indexExists(directory)) {
        throw new MorphscoutException("No vector index at " + dir + ": index the catalog first.");
      }
      searchers = new SearcherManager(directory, null);
      return new LuceneVectorIndex(dir, options, directory, null, searchers);
    } catch (IOException | RuntimeException e) {
      IOUtils.closeWhileHandlingException(searchers, directory);
      throw LuceneFailures.translate(e, dir);
    }
  }

  /** The folder this index lives in. */
  public Path path() {
    return path;
  }

  public boolean isReadOnly() {
    return writer == null;
  }

  @Override
  public void upsert(long id, float[] appearance, float[] shape) throws IOException {
    requireWritable();
    if (appearance == null && shape == null) {
      delete(id); // an image with no vectors has nothing to find; keeps ids() = images with a vector
      return;
    }
    float[] unitAppearance = appearance == null ? null : unit(id, Field.APPEARANCE, appearance);
    float[] unitShape = shape == null ? null : unit(id, Field.SHAPE, shape);
    writeLock.lock();
    try {
      dimensions.admit(id, unitAppearance, unitShape);
      writer.updateDocument(LuceneSchema.idTerm(id), LuceneSchema.document(id, unitAppearance, unitShape));
    } finally {
      writeLock.unlock();
    }
  }

  @Override
  public void delete(long id) throws IOException {
    requireWritable();
    writeLock.lock();
    try {
      writer.deleteDocuments(LuceneSchema.idTerm(id));
    } finally {
      writeLock.unlock();
    }
  }

  /**
   * Makes the changes durable (fsync) and visible to this index's searches. Costs from a few to several hundred
   * milliseconds depending on the disk, so indexing should commit in batches (say every few hundred images or few
   * seconds), together with the catalog's own transaction.
   */
  @Override
  public void commit() throws IOException {
    requireWritable();
    writeLock.lock();
    try {
      writer.commit();
      // Refreshing under the write lock means the new searcher holds exactly the committed state.
      searchers.maybeRefreshBlocking();
    } finally {
      writeLock.unlock();
    }
  }

  /**
   * Removes everything (visible after {@link #commit()}). Also forgets the vector dimensions, so a catalog re-indexed
   * with a different model can start afresh.
   */
  @Override
  public void clear() throws IOException {
    requireWritable();
    writeLock.lock();
    try {
      writer.deleteAll(); // also drops Lucene's field schema, so new dimensions are accepted
      dimensions.reset();
    } finally {
      writeLock.unlock();
    }
  }

  /**
   * Up to this many excluded ids, a search asks each segment's graph directly; beyond, it goes through Lucene's
   * {@link KnnFloatVectorQuery}, which switches to an exact scan by itself when a filter leaves few documents.
   */
  static final int DIRECT_EXCLUDE_LIMIT = 64;

  @Override
  public List<Hit> search(Field field, float[] query, int k, Set<Long> exclude) throws IOException {
    return search(field, query, k, exclude, exclude.size() <= DIRECT_EXCLUDE_LIMIT);
  }

  /**
   * @param direct whether to search each segment's graph directly ({@link #graphCandidates}) rather than through
   *     Lucene's query machinery ({@link #queryCandidates}); both give the same candidates, the direct way without
   *     a query rewrite, weight, scorer and collector per search (about a tenth of a query's CPU time at small
   *     candidate counts: docs/BENCHMARKS.md, "Where a query's time goes")
   */
  List<Hit> search(Field field, float[] query, int k, Set<Long> exclude, boolean direct) throws IOException {
    Objects.requireNonNull(field, "field");
    int candidates = options.candidates(k);
    IndexSearcher searcher = searchers.acquire();
    try {
      int indexed = LuceneSchema.dimension(searcher.getIndexReader(), field);
      if (indexed == 0) {
        return List.of(); // no image has this vector yet
      }
      if (indexed != query.length) {
        throw FieldDimensions.queryMismatch(field, indexed, query.length);
      }
      float[] unitQuery = VectorMath.unitCopy(query, "The " + FieldDimensions.label(field) + " query vector");
      String name = LuceneSchema.fieldName(field);
      ScoreDoc[] found = direct
          ? graphCandidates(searcher, name, unitQuery, candidates, exclude)
          : queryCandidates(searcher, name, unitQuery, candidates, exclude);
      return ExactRescorer.rescore(searcher, found, name, unitQuery, k);
    } finally {
      searchers.release(searcher);
    }
  }

  /** The best {@code candidates} by Lucene's {@link KnnFloatVectorQuery} with the exclusions as a filter. */
  private static ScoreDoc[] queryCandidates(IndexSearcher searcher, String name, float[] unitQuery, int candidates,
      Set<Long> exclude) throws IOException {
    Query knn = new KnnFloatVectorQuery(name, unitQuery, candidates, LuceneSchema.excludeFilter(exclude));
    return searcher.search(knn, candidates).scoreDocs;
  }

  /**
   * The best {@code candidates}: each segment's HNSW graph searched for {@code candidates} (live, not excluded)
   * documents, the segments' lists merged by score. What the query does for a handful of segments, without its
   * per-search objects.
   */
  private static ScoreDoc[] graphCandidates(IndexSearcher searcher, String name, float[] unitQuery, int candidates,
      Set<Long> exclude) throws IOException {
    List<LeafReaderContext> leaves = searcher.getIndexReader().leaves();
    TopDocs[] perLeaf = new TopDocs[leaves.size()];
    for (int i = 0; i < perLeaf.length; i++) {
      LeafReaderContext leaf = leaves.get(i);
      LeafReader reader = leaf.reader();
      TopDocs top = reader.searchNearestVectors(name, unitQuery, candidates,
          AcceptDocs.fromLiveDocs(LuceneSchema.acceptDocs(reader, exclude), reader.maxDoc()), Integer.MAX_VALUE);
      for (ScoreDoc sd : top.scoreDocs) {
        sd.doc += leaf.docBase;
      }
      perLeaf[i] = top;
    }
    return perLeaf.length == 1 ? perLeaf[0].scoreDocs : TopDocs.merge(candidates, perLeaf).scoreDocs;
  }

  @Override
  public Set<Long> ids() throws IOException {
    IndexSearcher searcher = searchers.acquire();
    try {
      return Set.copyOf(LuceneSchema.ids(searcher.getIndexReader()));
    } finally {
      searchers.release(searcher);
    }
  }

  /** Number of images in the committed state. */
  public int count() throws IOException {
    IndexSearcher searcher = searchers.acquire();
    try {
      return searcher.getIndexReader().numDocs();
    } finally {
      searchers.release(searcher);
    }
  }

  /**
   * Read-only mode: switches to the newest commit on disk (another process's). Writer mode: does nothing, since
   * {@link #commit()} already refreshes (and refreshing here would expose uncommitted changes). Returns whether the
   * searched state changed.
   */
  public boolean refresh() throws IOException {
    if (writer != null) {
      return false;
    }
    IndexSearcher before = searchers.acquire();
    try {
      searchers.maybeRefreshBlocking();
    } finally {
      searchers.release(before);
    }
    IndexSearcher after = searchers.acquire();
    try {
      return after != before;
    } finally {
      searchers.release(after);
    }
  }

  /** The committed index's segments: how many, the live images in the largest one and outside it, deletions kept. */
  public VectorSegments segments() throws IOException {
    return segments(SegmentInfos.readLatestCommit(directory));
  }

  /**
   * The segments of the last commit in {@code dir}, read from the commit point alone (no vector file is opened), or
   * empty when {@code dir} holds no index yet.
   *
   * @throws MorphscoutException when the commit point is damaged or from an unsupported Lucene version
   */
  public static Optional<VectorSegments> committedSegments(Path dir) throws IOException {
    if (!Files.isDirectory(dir)) {
      return Optional.empty();
    }
    try (Directory d = FSDirectory.open(dir)) {
      if (!DirectoryReader.indexExists(d)) {
        return Optional.empty();
      }
      return Optional.of(segments(SegmentInfos.readLatestCommit(d)));
    } catch (MorphscoutException e) {
      throw e;
    } catch (IOException | RuntimeException e) {
      throw LuceneFailures.translate(e, dir);
    }
  }

  private static VectorSegments segments(SegmentInfos commit) {
    int largest = 0;
    int live = 0;
    int deleted = 0;
    for (SegmentCommitInfo segment : commit) {
      int segmentDeleted = segment.getDelCount() + segment.getSoftDelCount();
      int segmentLive = segment.info.maxDoc() - segmentDeleted;
      largest = Math.max(largest, segmentLive);
      live += segmentLive;
      deleted += segmentDeleted;
    }
    return new VectorSegments(commit.size(), live, live - largest, deleted);
  }

  /**
   * Merges the index into one segment and commits, unless {@code stop} turns true first (checked every 100 ms while
   * the merge runs on its own thread): the merge is then abandoned by rolling the index back to its last commit, which
   * closes it for writing (only {@link #close()} remains). Meant for after a commit, so nothing uncommitted is lost.
   * Lucene keeps the largest segment's graph and adds the other vectors to it when that segment has no deletions
   * (at 1,000,000 x 1024: 440 to 470 s for the 560,000 vectors outside it, against 2,131 s to build them all; 40 s for
   * 1,000), and builds the graph again otherwise (1,484 s); every vector is rewritten either way.
   *
   * @return whether the index was merged
   */
  public boolean mergeIntoOne(BooleanSupplier stop) throws IOException {
    requireWritable();
    writeLock.lock();
    ExecutorService merging = Executors.newSingleThreadExecutor(
        Thread.ofPlatform().name("morphscout-vector-merge").daemon(true).factory());
    try {
      Future<?> merge = merging.submit(() -> {
        writer.forceMerge(1);
        return null;
      });
      while (true) {
        if (stop.getAsBoolean()) {
          writer.rollback(); // aborts the running merge; the last commit stays as it was
          LOG.info("vector index merge stopped; {} keeps its last commit", path);
          return false;
        }
        try {
          merge.get(100, TimeUnit.MILLISECONDS);
          break;
        } catch (TimeoutException e) {
          // still merging: check stop again
        } catch (ExecutionException e) {
          throw e.getCause() instanceof IOException io ? io : new IOException(e.getCause());
        } catch (InterruptedException e) {
          writer.rollback();
          Thread.currentThread().interrupt();
          return false;
        }
      }
      writer.commit();
      searchers.maybeRefreshBlocking();
      return true;
    } finally {
      merging.shutdownNow();
      writeLock.unlock();
    }
  }

  /** Uncommitted changes are discarded (see the class comment). */
  @Override
  public void close() throws IOException {
    writeLock.lock();
    try {
      IOUtils.close(searchers, writer, directory);
    } finally {
      writeLock.unlock();
    }
  }

  private float[] unit(long id, Field field, float[] vector) {
    if (vector.length > KnnVectorsFormat.DEFAULT_MAX_DIMENSIONS) {
      throw new MorphscoutException(
          "Image " + id + ": " + FieldDimensions.label(field) + " vector has " + vector.length
              + " dimensions; the Lucene vector index supports at most " + KnnVectorsFormat.DEFAULT_MAX_DIMENSIONS
              + ". Choose a smaller feature model.");
    }
    return VectorMath.unitCopy(vector, "Image " + id + ": " + FieldDimensions.label(field) + " vector");
  }

  private void requireWritable() {
    if (writer == null) {
      throw new MorphscoutException(
          "The vector index at " + path + " is open read-only (for queries); it cannot be changed from here.");
    }
  }
}
