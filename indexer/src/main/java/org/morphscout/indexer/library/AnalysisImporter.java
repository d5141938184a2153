package org.morphscout.indexer.library;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;
import org.morphscout.indexer.catalog.ImageStore;
import org.morphscout.indexer.catalog.WriterLock;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.vector.LuceneIndexOptions;
import org.morphscout.indexer.vector.LuceneVectorIndex;
import org.morphscout.indexer.vector.VectorIndex;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Loads analyses made outside the catalog (the cluster job's output) into it, as if {@code index} had made them:
 * images keep their identity by path and content hash (a picture found at a new path, its old file gone, keeps its id
 * and decisions), features, status and thumbnails are stored in one transaction per batch, vectors go into the vector
 * index, and the neighbour graph and stored pairs are brought up to date for what changed. Importing the same folder
 * twice changes nothing. The whole folder is checked before anything is stored.
 */
public final class AnalysisImporter {
  private static final Logger LOG = LoggerFactory.getLogger(AnalysisImporter.class);
  private static final int BATCH = 64;

  private final Library library;
  private final IndexOptions options;

  /** @param options threads and neighbour count used for the graph and pair steps, as {@code index} would */
  public AnalysisImporter(Library library, IndexOptions options) {
    this.library = library;
    this.options = options;
  }

  /** Imports {@code folder} read by {@code source}; cancelling keeps finished batches. */
  public ImportReport importFrom(OutsideAnalyses source, Path folder, ProgressListener progress,
      CancellationToken cancel) throws IOException {
    long start = System.nanoTime();
    try (WriterLock lock = WriterLock.acquire(library.catalog().dir())) {
      library.catalog().requireIntact();
      progress.phase("checking", -1);
      OutsideAnalyses.Summary summary = source.check(folder);
      adoptSetup(summary, folder);
      String stored = library.features().setting(LibrarySettings.VECTOR_QUANTIZATION).orElse("NONE");
      LuceneIndexOptions.Quantization quantization = LuceneIndexOptions.Quantization.valueOf(stored);
      VectorIndexRepair.Opened opened = VectorIndexRepair.open(library.catalog().vectorDir(),
          LuceneIndexOptions.defaults().withQuantization(quantization));
      Counts counts = new Counts();
      boolean cancelled = false;
      try (LuceneVectorIndex index = opened.index()) {
        // The catalog is the source of truth: restore what a crash lost before adding to it.
        VectorSync.sync(library.features(), index, summary.modelId(), opened.fresh(), new ArrayList<>());
        long rootId = library.images().ensureRoot(OutsideAnalysis.catalogName(summary.folder()));
        progress.phase("importing", summary.images());
        long done = 0;
        try (Stream<OutsideAnalysis> rows = source.read(folder)) {
          Iterator<OutsideAnalysis> it = rows.iterator();
          List<OutsideAnalysis> batch = new ArrayList<>(BATCH);
          while (it.hasNext()) {
            if (cancel.isCancelled()) {
              cancelled = true;
              break;
            }
            OutsideAnalysis next = it.next();
            batch.add(next);
            progress.progressed(++done, next.path());
            if (batch.size() == BATCH || !it.hasNext()) {
              store(batch, rootId, index, counts);
              batch.clear();
            }
          }
        }
        index.commit();
        if (!cancelled) {
          cancelled = !GraphAndPairs.update(library, index, summary.modelId(), counts.readied, counts.failedIds,
              options, progress, cancel);
        }
      }
      progress.finished();
      return new ImportReport(counts.added, counts.replaced, counts.moved, counts.unchanged, counts.failures,
          cancelled, summary.modelId(), Duration.ofNanos(System.nanoTime() - start));
    }
  }

  private static final class Counts {
    int added;
    int replaced;
    int moved;
    int unchanged;
    final List<Long> readied = new ArrayList<>();
    final List<Long> failedIds = new ArrayList<>();
    final List<IndexReport.FileFailure> failures = new ArrayList<>();
  }

  /**
   * Vectors and silhouettes of two setups are never mixed: an empty catalog takes the folder's setup, any other must
   * already have it.
   */
  private void adoptSetup(OutsideAnalyses.Summary summary, Path folder) {
    Optional<String> activeModel = LibrarySettings.activeModel(library.features());
    Optional<String> activeSilhouettes = library.features().setting(LibrarySettings.ACTIVE_SILHOUETTES)
        .map(s -> s.equals("default") ? "classical" : s);
    boolean holdsImages = library.countsByStatus().getOrDefault(ImageStatus.READY, 0) > 0;
    if (holdsImages && activeModel.isPresent() && !activeModel.get().equals(summary.modelId())) {
      throw new MorphscoutException("cannot import " + folder + ": its analyses use the appearance model "
          + summary.modelId() + ", this catalog uses " + activeModel.get() + " (import into a new catalog, or run the "
          + "job with the catalog's model)");
    }
    if (holdsImages && activeSilhouettes.isPresent() && !activeSilhouettes.get().equals(summary.silhouettes())) {
      throw new MorphscoutException("cannot import " + folder + ": its analyses use " + summary.silhouettes()
          + " silhouettes, this catalog uses " + activeSilhouettes.get() + " (import into a new catalog, or run the "
          + "job with --silhouettes " + activeSilhouettes.get() + ")");
    }
    library.features().registerModel(summary.modelId(), summary.dimension(), "built-in GIST + CIELAB layout");
    library.features().putSetting(LibrarySettings.ACTIVE_MODEL, summary.modelId());
    library.features().putSetting(LibrarySettings.ACTIVE_SILHOUETTES, summary.silhouettes());
  }

  /** Stores one batch in one transaction (thumbnails first, vectors after the commit). */
  private void store(List<OutsideAnalysis> batch, long rootId, VectorIndex index, Counts counts) throws IOException {
    ImageStore images = library.images();
    List<Planned> planned = new ArrayList<>(batch.size());
    List<Long> evicted = new ArrayList<>();
    for (OutsideAnalysis a : batch) {
      String path = OutsideAnalysis.catalogName(a.path());
      Optional<ImageRow> atPath = images.byPath(path);
      if (atPath.isPresent()) {
        ImageRow row = atPath.get();
        boolean same = a.contentHash().equals(row.contentHash());
        boolean asStored = a.analysed() ? row.status() == ImageStatus.READY && library.features().has(row.id())
            : row.status() == ImageStatus.FAILED;
        if (same && asStored) {
          counts.unchanged++;
          continue;
        }
        if (row.status() == ImageStatus.READY) {
          evicted.add(row.id());
        }
        planned.add(new Planned(a, path, row.id(), same ? Change.REDONE : Change.REPLACED));
      } else {
        Optional<ImageRow> moved = images.byHash(a.contentHash()).stream().filter(this::fileGone).findFirst();
        if (moved.isPresent()) {
          if (moved.get().status() == ImageStatus.READY) {
            evicted.add(moved.get().id());
          }
          planned.add(new Planned(a, path, moved.get().id(), Change.MOVED));
        } else {
          planned.add(new Planned(a, path, -1, Change.ADDED));
        }
      }
    }
    if (planned.isEmpty()) {
      return;
    }
    // The vector index lets go of pictures that change before the catalog stops counting them as ready.
    for (long id : evicted) {
      index.delete(id);
    }
    if (!evicted.isEmpty()) {
      index.commit();
    }
    List<Long> ready = new ArrayList<>();
    List<ImageAnalysis> readyAnalyses = new ArrayList<>();
    library.catalog().inTransaction(c -> {
      for (Planned p : planned) {
        OutsideAnalysis a = p.analysis;
        long id = p.id;
        if (p.change == Change.ADDED) {
          id = images.insertPending(rootId, p.path, a.size(), a.mtimeMs(), a.contentHash());
        } else {
          images.updateFile(id, rootId, p.path, a.size(), a.mtimeMs(), a.contentHash(), ImageStatus.PENDING);
        }
        if (a.analysed()) {
          library.features().put(id, a.analysis());
          images.markReady(id, a.analysis().width(), a.analysis().height(), a.orientation(), a.analysis().format());
          writeThumbnail(id, a);
          ready.add(id);
          readyAnalyses.add(a.analysis());
        } else {
          FailureKind.Failure f = a.failure();
          images.markFailed(id, f.reason(), f.kind().name(), f.declaredPixels());
          counts.failedIds.add(id);
        }
      }
      return null;
    });
    for (Planned p : planned) {
      switch (p.change) {
        case ADDED -> counts.added++;
        case REPLACED -> counts.replaced++;
        case MOVED -> counts.moved++;
        case REDONE -> { }
      }
      if (!p.analysis.analysed()) {
        counts.failures.add(new IndexReport.FileFailure(p.path, p.analysis.failure().reason()));
      }
    }
    for (int i = 0; i < ready.size(); i++) {
      ImageAnalysis a = readyAnalyses.get(i);
      index.upsert(ready.get(i), a.appearance(), VectorSync.nonZeroOrNull(a.shape().shapeVector()));
      counts.readied.add(ready.get(i));
    }
    index.commit();
  }

  private enum Change { ADDED, REPLACED, MOVED, REDONE }

  private record Planned(OutsideAnalysis analysis, String path, long id, Change change) {}

  /** A catalog row whose file is gone from this machine (a move source); rows named by URIs are never gone. */
  private boolean fileGone(ImageRow row) {
    if (row.status() == ImageStatus.MISSING) {
      return true;
    }
    return !row.path().contains("://") && !Files.exists(Path.of(row.path()));
  }

  private void writeThumbnail(long id, OutsideAnalysis a) {
    if (a.thumbnail() == null) {
      return;
    }
    Path base = library.catalog().thumbnailBase(id);
    Path target = base.resolveSibling(base.getFileName() + "." + a.thumbnailExtension());
    try {
      Files.createDirectories(target.getParent());
      Path tmp = Files.createTempFile(target.getParent(), base.getFileName().toString(), ".tmp");
      Files.write(tmp, a.thumbnail());
      Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    } catch (IOException e) {
      LOG.warn("no thumbnail for {}: {}", a.path(), e.getMessage());
    }
  }
}
