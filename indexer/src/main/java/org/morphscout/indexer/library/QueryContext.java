package org.morphscout.indexer.library;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.analysis.ImageAnalyzer;
import org.morphscout.indexer.catalog.WriterLock;
import org.morphscout.indexer.ingest.ImageDecoder;
import org.morphscout.indexer.ingest.ImageIoDecoder;
import org.morphscout.indexer.ingest.ImageReadException;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;
import org.morphscout.indexer.vector.BruteForceVectorIndex;
import org.morphscout.indexer.vector.LuceneIndexOptions;
import org.morphscout.indexer.vector.LuceneVectorIndex;
import org.morphscout.indexer.vector.UnusableIndexException;
import org.morphscout.indexer.vector.VectorIndex;

/**
 * What query services share: the library, a read-only view of the vector index (so queries work while another process
 * indexes), a cache of stored analyses, and an analyser for images outside the catalog, created on first need with the
 * catalog's own appearance model. Thread-safe. Close it when done.
 */
public final class QueryContext implements AutoCloseable {
  private static final org.slf4j.Logger LOG = org.slf4j.LoggerFactory.getLogger(QueryContext.class);

  private final Library library;
  private final AnalysisSetup setup;
  private final AnalysisCache cache;
  private LuceneVectorIndex index;
  /** The exact index built from the stored vectors while the catalog has no vector folder; null otherwise. */
  private BruteForceVectorIndex exact;
  private int exactSize = -1;
  private String notice = "";
  private ImageAnalyzer analyzer;

  public QueryContext(Library library, AnalysisSetup setup) {
    this.library = library;
    this.setup = setup;
    this.cache = new AnalysisCache(library, 20_000);
  }

  public Library library() {
    return library;
  }

  /** How images outside the catalog are analysed. */
  public AnalysisSetup setup() {
    return setup;
  }

  public AnalysisCache cache() {
    return cache;
  }

  /**
   * The vector index as last committed; reopened to see newer commits. A catalog with no vector folder (written
   * before the folder existed, or copied without it) gets an exact index built in memory from its stored vectors,
   * rebuilt when the number of ready images changes, and {@link #notice()} says so in one line.
   */
  public synchronized VectorIndex index() throws IOException {
    if (index == null && !Files.isDirectory(library.catalog().vectorDir())) {
      return exactIndex();
    }
    if (index == null) {
      exact = null;
      notice = "";
      repairIfNeeded();
      index = LuceneVectorIndex.openReadOnly(library.catalog().vectorDir(), LuceneIndexOptions.defaults());
    } else {
      index.refresh();
    }
    return index;
  }

  private VectorIndex exactIndex() throws IOException {
    String model = modelId();
    int ready = library.features().readyIds(model).size();
    if (exact == null || exactSize != ready) {
      BruteForceVectorIndex built = new BruteForceVectorIndex();
      VectorSync.sync(library.features(), built, model, false, new java.util.ArrayList<>());
      exact = built;
      exactSize = ready;
      notice = "The catalog has no vector folder: searching its " + ready + " stored vectors exactly (slower on "
          + "large catalogs; morphscout index --rebuild-vectors writes the folder).";
      LOG.info(notice);
    }
    return exact;
  }

  /** A one-line notice about how queries are served (empty when the catalog's own vector index serves them). */
  public synchronized String notice() {
    return notice;
  }

  /**
   * On open, the vector index must hold exactly the catalog's ready images. When it does not (a crash between the two
   * commits, a copied or damaged index) and no indexer is running, it is brought in line from the catalog's stored
   * vectors; a running indexer does the same itself when it starts.
   */
  private void repairIfNeeded() throws IOException {
    java.util.Set<Long> ready = new java.util.HashSet<>(library.features().readyIds(modelId()));
    UnusableIndexException unusable = null;
    try (LuceneVectorIndex probe = LuceneVectorIndex.openReadOnly(library.catalog().vectorDir(),
        LuceneIndexOptions.defaults())) {
      if (probe.ids().equals(ready)) {
        return;
      }
    } catch (UnusableIndexException e) {
      unusable = e;
    }
    if (library.catalog().onReadOnlyMedia()) {
      if (unusable != null) {
        throw unusable;
      }
      LOG.info("vector index differs from the catalog, which is read-only here: answers use the index as it is");
      return;
    }
    WriterLock lock;
    try {
      lock = WriterLock.acquire(library.catalog().dir());
    } catch (MorphscoutException inUse) {
      if (unusable != null) {
        throw unusable;
      }
      LOG.info("vector index differs from the catalog; the running indexer will bring it in line");
      return;
    }
    LuceneIndexOptions.Quantization q = "INT8".equals(
        library.features().setting(LibrarySettings.VECTOR_QUANTIZATION).orElse("NONE"))
        ? LuceneIndexOptions.Quantization.INT8 : LuceneIndexOptions.Quantization.NONE;
    VectorIndexRepair.Opened opened;
    try {
      opened = VectorIndexRepair.open(library.catalog().vectorDir(), LuceneIndexOptions.defaults().withQuantization(q));
    } catch (IOException | RuntimeException e) {
      lock.close();
      throw e;
    }
    try (lock; LuceneVectorIndex writer = opened.index()) {
      int added = VectorSync.sync(library.features(), writer, modelId(), opened.fresh(), new java.util.ArrayList<>());
      LOG.warn("vector index differed from the catalog; brought in line ({} images added)", added);
    }
  }

  /** The catalog's active appearance model. */
  public String modelId() {
    return LibrarySettings.activeModel(library.features()).orElseThrow(() -> new MorphscoutException(
        "the catalog " + library.catalog().dir() + " holds no analysed images yet: run morphscout index first"));
  }

  /**
   * The analysis of an image named on the command line or picked in the browser: the stored one when the file is a
   * ready catalog image, else computed on the fly from the file.
   *
   * @throws MorphscoutException naming the path when the file is neither in the catalog nor readable
   */
  public ImageAnalysis resolve(String pathArgument) {
    Path path = Path.of(pathArgument).toAbsolutePath().normalize();
    Optional<ImageRow> row = library.images().byPath(path.toString());
    if (row.isPresent() && row.get().status() == ImageStatus.READY) {
      Optional<ImageAnalysis> stored = cache.get(row.get().id());
      if (stored.isPresent() && stored.get().modelId().equals(modelId())) {
        return stored.get();
      }
    }
    if (!Files.isRegularFile(path)) {
      throw new MorphscoutException("image not found: " + path);
    }
    try {
      ImageAnalysis a = analyzer().analyze(path);
      return row.isPresent() ? withId(a, row.get().id()) : a;
    } catch (ImageReadException e) {
      throw new MorphscoutException(path + ": " + e.reason(), e);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  private static ImageAnalysis withId(ImageAnalysis a, long id) {
    return new ImageAnalysis(id, a.path(), a.width(), a.height(), a.format(), a.appearance(), a.modelId(),
        a.silhouette(), a.shape(), a.colour(), a.contentHash(), a.fingerprint());
  }

  /** The id of a catalog image with the same bytes as {@code a}, when there is one (to leave the query out). */
  public Optional<Long> sameContent(ImageAnalysis a) {
    if (a.id() >= 0) {
      return Optional.of(a.id());
    }
    if (a.contentHash().isEmpty()) {
      return Optional.empty();
    }
    return library.images().byHash(a.contentHash()).stream().map(ImageRow::id).findFirst();
  }

  /** A decoder with the setup's options, for showing images (needs no appearance model). */
  public ImageDecoder decoder() {
    return new ImageIoDecoder(setup.decode());
  }

  /** An analyser with the catalog's model, for images outside it. */
  public synchronized ImageAnalyzer analyzer() throws IOException {
    if (analyzer == null) {
      analyzer = AnalyzerFactory.create(library, setup);
      if (!analyzer.embedder().modelId().equals(modelId())) {
        String made = analyzer.embedder().modelId();
        analyzer.embedder().close();
        analyzer = null;
        throw new MorphscoutException("the catalog's vectors come from model " + modelId() + ", but this command "
            + "would analyse with " + made + ": give the same --model options the catalog was indexed with");
      }
    }
    return analyzer;
  }

  @Override
  public synchronized void close() throws IOException {
    if (analyzer != null) {
      analyzer.embedder().close();
    }
    if (index != null) {
      index.close();
    }
  }
}
