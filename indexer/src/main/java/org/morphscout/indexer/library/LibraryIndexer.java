package org.morphscout.indexer.library;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.analysis.ImageAnalyzer;
import org.morphscout.indexer.analysis.PreparedImage;
import org.morphscout.indexer.catalog.ImageRow;
import org.morphscout.indexer.catalog.ImageStatus;
import org.morphscout.indexer.catalog.WriterLock;
import org.morphscout.indexer.ingest.FoundFile;
import org.morphscout.indexer.ingest.ImageReadException;
import org.morphscout.indexer.ingest.LibraryScanner;
import org.morphscout.indexer.ingest.ScanOptions;
import org.morphscout.indexer.ingest.ScanProblem;
import org.morphscout.indexer.ingest.ScanResult;
import org.morphscout.indexer.ingest.Thumbnails;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.vector.LuceneVectorIndex;
import org.morphscout.indexer.vector.VectorIndex;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Indexes library roots into a catalog: scan, reconcile with the catalog, analyse new and changed files on all cores
 * (appearance model in batches), store features and thumbnails, update the vector index and the neighbour graph.
 *
 * <p>Crash safety: each batch's catalog writes are one transaction; the vector index is committed every
 * {@link IndexOptions#commitEvery()} images and at the end, and {@link VectorSync} restores whatever a crash lost from
 * the catalog at the next run. Only one indexer may run on a catalog at a time ({@link WriterLock}).
 */
public final class LibraryIndexer {
  private static final Logger LOG = LoggerFactory.getLogger(LibraryIndexer.class);

  private final Library library;
  private final AnalysisSetup setup;
  private final IndexOptions options;

  public LibraryIndexer(Library library, AnalysisSetup setup, IndexOptions options) {
    this.library = library;
    this.setup = setup;
    this.options = options;
  }

  /** Indexes {@code roots}; returns what happened. Cancelling keeps finished work and returns a cancelled report. */
  public IndexReport index(List<Path> roots, ProgressListener progress, CancellationToken cancel) throws IOException {
    long start = System.nanoTime();
    List<IndexReport.FileFailure> failures = new ArrayList<>();
    try (WriterLock lock = WriterLock.acquire(library.catalog().dir())) {
      library.catalog().requireIntact();
      ImageAnalyzer analyzer = AnalyzerFactory.create(library, setup);
      try (VectorIndex index = LuceneVectorIndex.open(library.catalog().vectorDir(),
              org.morphscout.indexer.vector.LuceneIndexOptions.defaults())) {
        String modelId = analyzer.embedder().modelId();
        List<Long> reembed = switchModelIfNeeded(modelId, analyzer.embedder().dimension(), index);

        Map<Long, List<FoundFile>> found = scan(roots, failures, progress, cancel);
        Map<Path, String> hashFailures = new LinkedHashMap<>();
        ScanReconciler.Plan plan = new ScanReconciler(library).reconcile(found, hashFailures);
        hashFailures.forEach((p, r) -> failures.add(new IndexReport.FileFailure(ScanReconciler.key(p), r)));
        List<ImageRow> todo = new ArrayList<>(plan.toAnalyse());
        Set<Long> queued = new java.util.HashSet<>(todo.stream().map(ImageRow::id).toList());
        for (long id : reembed) {
          if (queued.add(id)) {
            library.images().byId(id).filter(r -> Files.exists(Path.of(r.path()))).ifPresent(todo::add);
          }
        }
        // The catalog is the source of truth: restore what a crash lost, drop what went missing or changed.
        List<Long> invalid = new ArrayList<>();
        int restored = VectorSync.sync(library.features(), index, modelId, options.rebuildVectors(), invalid);
        for (long id : invalid) {
          library.images().setStatus(id, ImageStatus.PENDING);
          if (queued.add(id)) {
            library.images().byId(id).ifPresent(todo::add);
          }
        }

        List<Long> analysed = new ArrayList<>();
        boolean cancelled = false;
        try {
          analyse(todo, analyzer, index, analysed, failures, progress, cancel);
        } catch (CancellationToken.CancelledException e) {
          cancelled = true;
        }
        index.commit();
        if (!cancelled) {
          AnalysisCache cache = new AnalysisCache(library, 50_000);
          List<Long> removed = new ArrayList<>(plan.nowMissing());
          for (IndexReport.FileFailure f : failures) {
            library.images().byPath(f.path()).ifPresent(r -> removed.add(r.id()));
          }
          // Also images that are ready but have no neighbour list (returned files, an interrupted earlier run).
          Set<Long> linked = library.neighbours().idsWithLinks();
          List<Long> changed = new ArrayList<>(analysed);
          for (long id : library.features().readyIds(modelId)) {
            if (!linked.contains(id) && !analysed.contains(id)) {
              changed.add(id);
            }
          }
          try {
            new NeighbourGraphUpdater(library, index, cache, options.neighbours())
                .update(changed, removed, progress, cancel);
          } catch (CancellationToken.CancelledException e) {
            cancelled = true;
          }
        }
        progress.finished();
        return new IndexReport(analysed.size(), plan.unchanged(), plan.moved(), plan.nowMissing().size(), failures,
            restored, cancelled, modelId, Duration.ofNanos(System.nanoTime() - start));
      } finally {
        analyzer.embedder().close();
      }
    }
  }

  /**
   * When the catalog's vectors came from another model, or its silhouettes from another extractor, every ready image
   * is analysed again with the current ones: vectors and silhouettes of two setups are never mixed.
   */
  private List<Long> switchModelIfNeeded(String modelId, int dimension, VectorIndex index) throws IOException {
    library.features().registerModel(modelId, dimension,
        setup.model().isPresent() ? "user model " + setup.model().get().modelFile() : "built-in GIST + CIELAB layout");
    String active = LibrarySettings.activeModel(library.features()).orElse(null);
    String silhouettes = setup.silhouettes().name().toLowerCase(java.util.Locale.ROOT);
    String activeSilhouettes = library.features().setting(LibrarySettings.ACTIVE_SILHOUETTES).orElse(silhouettes);
    List<Long> reembed = new ArrayList<>();
    boolean modelChanged = active != null && !active.equals(modelId);
    if (modelChanged || !activeSilhouettes.equals(silhouettes)) {
      LOG.warn("analysis changed (model {} -> {}, silhouettes {} -> {}): every image is analysed again", active,
          modelId, activeSilhouettes, silhouettes);
      for (ImageRow row : library.images().withStatus(ImageStatus.READY)) {
        reembed.add(row.id());
      }
      if (modelChanged) {
        index.clear();
        index.commit();
      }
      library.neighbours().clear();
    }
    library.features().putSetting(LibrarySettings.ACTIVE_MODEL, modelId);
    library.features().putSetting(LibrarySettings.ACTIVE_SILHOUETTES, silhouettes);
    return reembed;
  }

  private Map<Long, List<FoundFile>> scan(List<Path> roots, List<IndexReport.FileFailure> failures,
      ProgressListener progress, CancellationToken cancel) throws IOException {
    progress.phase("scanning", -1);
    Map<Long, List<FoundFile>> found = new LinkedHashMap<>();
    ScanOptions scanOptions = ScanOptions.defaults()
        .withLinks(options.followLinks() ? ScanOptions.LinkPolicy.ANY : ScanOptions.LinkPolicy.WITHIN_ROOTS)
        .withExcludedFolders(Set.of(library.catalog().dir()));
    LibraryScanner scanner = new LibraryScanner(scanOptions);
    for (Path root : roots) {
      Path abs = root.toAbsolutePath().normalize();
      if (!Files.isDirectory(abs)) {
        throw new MorphscoutException(Files.exists(abs) ? "not a folder: " + abs + " (index takes folders)"
            : "folder not found: " + abs);
      }
      long rootId = library.images().ensureRoot(abs);
      ScanResult result = scanner.scan(List.of(abs), progress, cancel);
      found.put(rootId, result.files());
      for (ScanProblem p : result.problems()) {
        failures.add(new IndexReport.FileFailure(ScanReconciler.key(p.path()), p.reason()));
      }
    }
    return found;
  }

  private void analyse(List<ImageRow> todo, ImageAnalyzer analyzer, VectorIndex index, List<Long> analysed,
      List<IndexReport.FileFailure> failures, ProgressListener progress, CancellationToken cancel) throws IOException {
    progress.phase("analysing", todo.size());
    if (todo.isEmpty()) {
      return;
    }
    Thumbnails thumbnails = new Thumbnails(setup.decode());
    ExecutorService pool = Executors.newFixedThreadPool(options.threads(),
        Thread.ofPlatform().name("morphscout-analyse-", 1).daemon(true).factory());
    int window = options.threads() * 2 + options.batchSize();
    Deque<Submitted> inFlight = new ArrayDeque<>();
    List<PreparedImage> batch = new ArrayList<>();
    List<ImageRow> batchRows = new ArrayList<>();
    int next = 0;
    long done = 0;
    int sinceCommit = 0;
    try {
      while (next < todo.size() || !inFlight.isEmpty()) {
        while (next < todo.size() && inFlight.size() < window && !cancel.isCancelled()) {
          ImageRow row = todo.get(next++);
          inFlight.add(new Submitted(row, pool.submit(() -> prepare(analyzer, thumbnails, row))));
        }
        if (inFlight.isEmpty()) {
          break;
        }
        Submitted s = inFlight.poll();
        try {
          batch.add(s.future.get(options.perFileTimeLimit().toMillis(), TimeUnit.MILLISECONDS));
          batchRows.add(s.row);
        } catch (TimeoutException e) {
          s.future.cancel(true);
          fail(s.row, "timed out: reading and analysing took more than " + options.perFileTimeLimit().toSeconds()
              + " s", failures);
        } catch (ExecutionException e) {
          fail(s.row, reason(e.getCause()), failures);
        } catch (InterruptedException e) {
          Thread.currentThread().interrupt();
          throw new CancellationToken.CancelledException();
        }
        progress.progressed(++done, s.row.path());
        if (batch.size() >= options.batchSize() || (inFlight.isEmpty() && !batch.isEmpty())) {
          sinceCommit += store(analyzer, batch, batchRows, index, analysed, failures);
          batch.clear();
          batchRows.clear();
          if (sinceCommit >= options.commitEvery()) {
            index.commit();
            sinceCommit = 0;
          }
        }
        if (cancel.isCancelled() && next < todo.size()) {
          // Finish what is in flight, keep it, then stop.
          next = todo.size();
        }
      }
      cancel.throwIfCancelled();
    } finally {
      pool.shutdownNow();
    }
  }

  private record Submitted(ImageRow row, Future<PreparedImage> future) {}

  private PreparedImage prepare(ImageAnalyzer analyzer, Thumbnails thumbnails, ImageRow row) throws IOException {
    Path file = Path.of(row.path());
    PreparedImage p = analyzer.prepare(file, row.contentHash());
    Path base = library.catalog().thumbnailBase(row.id());
    Files.createDirectories(base.getParent());
    try {
      thumbnails.write(p.decoded().analysis(), base.getParent(), base.getFileName().toString());
    } catch (IOException e) {
      LOG.warn("no thumbnail for {}: {}", file, e.getMessage());
    }
    return p;
  }

  /** Embeds a batch and stores it in one transaction; returns how many were stored. */
  private int store(ImageAnalyzer analyzer, List<PreparedImage> batch, List<ImageRow> rows, VectorIndex index,
      List<Long> analysed, List<IndexReport.FileFailure> failures) throws IOException {
    List<ImageAnalysis> results;
    try {
      results = analyzer.finish(batch, rows.stream().map(ImageRow::id).toList());
    } catch (RuntimeException e) {
      for (ImageRow r : rows) {
        fail(r, "appearance model failed: " + e.getMessage(), failures);
      }
      return 0;
    }
    List<ImageAnalysis> good = new ArrayList<>();
    List<PreparedImage> goodPrepared = new ArrayList<>();
    for (int i = 0; i < results.size(); i++) {
      if (VectorSync.finite(results.get(i).appearance()) && VectorSync.finite(results.get(i).shape().shapeVector())) {
        good.add(results.get(i));
        goodPrepared.add(batch.get(i));
      } else {
        fail(rows.get(i), "analysis produced an invalid vector (NaN); please report this file", failures);
      }
    }
    library.catalog().inTransaction(c -> {
      for (int i = 0; i < good.size(); i++) {
        ImageAnalysis a = good.get(i);
        PreparedImage p = goodPrepared.get(i);
        library.features().put(a.id(), a);
        library.images().markReady(a.id(), p.decoded().width(), p.decoded().height(), p.decoded().orientation(),
            p.decoded().format());
      }
      return null;
    });
    for (ImageAnalysis a : good) {
      index.upsert(a.id(), a.appearance(), VectorSync.nonZeroOrNull(a.shape().shapeVector()));
      analysed.add(a.id());
    }
    return good.size();
  }


  private void fail(ImageRow row, String reason, List<IndexReport.FileFailure> failures) {
    library.catalog().inTransaction(c -> {
      library.images().markFailed(row.id(), reason);
      return null;
    });
    failures.add(new IndexReport.FileFailure(row.path(), reason));
    LOG.info("{}: {}", row.path(), reason);
  }

  static String reason(Throwable t) {
    if (t instanceof ImageReadException r) {
      return r.reason();
    }
    if (t instanceof java.nio.file.NoSuchFileException) {
      return "file disappeared before it could be read";
    }
    if (t instanceof OutOfMemoryError) {
      return "not enough memory to analyse this image";
    }
    String m = t.getMessage();
    return "analysis failed: " + (m == null ? t.getClass().getSimpleName() : m);
  }
}
