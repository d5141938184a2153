package org.morphscout.indexer.library;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalyzer;
import org.morphscout.indexer.catalog.WriterLock;
import org.morphscout.indexer.ingest.FoundFile;
import org.morphscout.indexer.ingest.LibraryScanner;
import org.morphscout.indexer.ingest.ScanOptions;
import org.morphscout.indexer.ingest.ScanProblem;
import org.morphscout.indexer.ingest.ScanResult;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.values.ImageFailure;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;
import org.morphscout.indexer.vector.LuceneIndexOptions;
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
      LuceneIndexOptions.Quantization quantization = options.int8() ? LuceneIndexOptions.Quantization.INT8
          : LuceneIndexOptions.Quantization.NONE;
      VectorIndexRepair.Opened opened = VectorIndexRepair.open(library.catalog().vectorDir(),
          LuceneIndexOptions.defaults().withQuantization(quantization));
      try (LuceneVectorIndex index = opened.index()) {
        String modelId = analyzer.embedder().modelId();
        // The vector format is fixed per segment: a change of quantisation rebuilds the index from the catalog.
        String stored = library.features().setting(LibrarySettings.VECTOR_QUANTIZATION).orElse("NONE");
        boolean rebuild = options.rebuildVectors() || opened.fresh() || !stored.equals(quantization.name());
        library.features().putSetting(LibrarySettings.VECTOR_QUANTIZATION, quantization.name());
        List<Long> reembed = switchModelIfNeeded(modelId, analyzer.embedder().dimension(), index);

        Map<Long, List<FoundFile>> found = scan(roots, failures, progress, cancel);
        Map<Path, String> hashFailures = new LinkedHashMap<>();
        ScanReconciler reconciler = new ScanReconciler(library, setup.decode().maxPixels());
        ScanReconciler.Plan plan = reconciler.reconcile(found, hashFailures, ids -> {
          for (long id : ids) {
            index.delete(id);
          }
          index.commit();
        });
        hashFailures.forEach((p, r) -> failures.add(new IndexReport.FileFailure(ScanReconciler.key(p), r)));
        List<ImageRow> todo = new ArrayList<>(plan.toAnalyse());
        Set<Long> queued = new java.util.HashSet<>(todo.stream().map(ImageRow::id).toList());
        // Features stored before the pixel fingerprint existed (catalog schema version 4) lack it: analyse those
        // images again, keeping their ids (and so the user's decisions).
        List<Long> again = new ArrayList<>(reembed);
        again.addAll(library.features().readyIdsWithoutFingerprint());
        for (long id : again) {
          if (queued.add(id)) {
            library.images().byId(id).filter(r -> Files.exists(Path.of(r.path()))).ifPresent(todo::add);
          }
        }
        // The catalog is the source of truth: restore what a crash lost, drop what went missing or changed.
        List<Long> invalid = new ArrayList<>();
        int restored = VectorSync.sync(library.features(), index, modelId, rebuild, invalid);
        for (long id : invalid) {
          library.images().setStatus(id, ImageStatus.PENDING);
          if (queued.add(id)) {
            library.images().byId(id).ifPresent(todo::add);
          }
        }

        List<Long> analysed = new ArrayList<>();
        boolean cancelled = false;
        try {
          new AnalysisPipeline(library, setup, options).run(todo, analyzer, index, analysed, failures, progress, cancel);
        } catch (CancellationToken.CancelledException e) {
          cancelled = true;
        }
        index.commit();
        if (!cancelled) {
          List<Long> removed = new ArrayList<>(plan.nowMissing());
          for (IndexReport.FileFailure f : failures) {
            library.images().byPath(f.path()).ifPresent(r -> removed.add(r.id()));
          }
          cancelled = !GraphAndPairs.update(library, index, modelId, analysed, removed, options, progress, cancel);
        }
        listKnownFailures(roots, failures);
        progress.finished();
        return new IndexReport(analysed.size(), plan.unchanged(), plan.moved(), plan.replaced(),
            plan.nowMissing().size(), failures,
            restored, cancelled, modelId, Duration.ofNanos(System.nanoTime() - start));
      } finally {
        analyzer.embedder().close();
      }
    }
  }

  /**
   * Files under the indexed roots that failed in an earlier run and did not change stay failed: the summary lists them
   * again (with their stored reason), so a run over a folder that still holds an unreadable file never reports a clean
   * success.
   */
  private void listKnownFailures(List<Path> roots, List<IndexReport.FileFailure> failures) {
    Set<String> listed = new java.util.HashSet<>();
    failures.forEach(f -> listed.add(f.path()));
    for (ImageFailure f : library.images().failures()) {
      if (listed.contains(f.path())) {
        continue;
      }
      for (Path root : roots) {
        if (Path.of(f.path()).startsWith(root.toAbsolutePath().normalize())) {
          failures.add(new IndexReport.FileFailure(f.path(), f.reason()));
          break;
        }
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
    String silhouettes = AnalyzerFactory.effectiveSilhouettes(library, setup);
    String activeSilhouettes = library.features().setting(LibrarySettings.ACTIVE_SILHOUETTES)
        .map(s -> s.equals("default") ? "classical" : s) // the classical extractor's earlier name
        .orElse(silhouettes);
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
      library.pairs().clear();
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
}
