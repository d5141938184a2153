package org.morphscout.indexer.library;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicBoolean;
import org.morphscout.indexer.DiskSpace;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.analysis.ImageAnalyzer;
import org.morphscout.indexer.analysis.PreparedImage;
import org.morphscout.indexer.ingest.ImageReadException;
import org.morphscout.indexer.ingest.Thumbnails;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.vector.VectorIndex;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The analysing part of an indexing run: decodes and analyses files on a pool of named worker threads, keeps a bounded
 * window of images in flight (memory stays bounded), runs the appearance model in batches on the calling thread, and
 * stores each batch (features, status, vectors) in one catalog transaction. A file that fails or takes longer than the
 * per-file time limit is recorded with its reason and the run goes on. A worker abandoned at the time limit may go on
 * decoding (decoders do not all heed interrupts), but it never writes into the catalog folder once abandoned, so
 * nothing appears there after the run returns.
 */
final class AnalysisPipeline {
  private static final Logger LOG = LoggerFactory.getLogger(AnalysisPipeline.class);

  private final Library library;
  private final AnalysisSetup setup;
  private final IndexOptions options;

  AnalysisPipeline(Library library, AnalysisSetup setup, IndexOptions options) {
    this.library = library;
    this.setup = setup;
    this.options = options;
  }

  /**
   * Analyses {@code todo}, storing each batch; ids stored go to {@code analysed}, failures to {@code failures}.
   *
   * @throws CancellationToken.CancelledException when cancelled (after storing what was in flight)
   */
  void run(List<ImageRow> todo, ImageAnalyzer analyzer, VectorIndex index, List<Long> analysed,
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
          AtomicBoolean claim = new AtomicBoolean();
          inFlight.add(new Submitted(row, claim, pool.submit(() -> prepare(analyzer, thumbnails, row, claim))));
        }
        if (inFlight.isEmpty()) {
          break;
        }
        Submitted s = inFlight.poll();
        try {
          batch.add(s.await(options.perFileTimeLimit().toMillis()));
          batchRows.add(s.row);
        } catch (TimeoutException e) {
          fail(s.row, new FailureKind.Failure(FailureKind.TIMED_OUT, "timed out: reading and analysing took more "
              + "than " + options.perFileTimeLimit().toSeconds() + " s"), failures);
        } catch (ExecutionException e) {
          if (DiskSpace.isFull(e.getCause())) {
            // Not the file's fault: stop the run with one message instead of failing every file that follows.
            throw new MorphscoutException(DiskSpace.full(library.catalog().dir()), e.getCause());
          }
          fail(s.row, FailureKind.of(e.getCause()), failures);
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
      // Left in flight only when the run stops on an error: abandon them, and let any thumbnail write finish first.
      for (Submitted s : inFlight) {
        s.abandon();
      }
      pool.shutdownNow();
    }
  }

  /**
   * A file handed to a worker. {@code claim} decides, once, who owns the file's last step: the worker, to write its
   * thumbnail (the result is then used), or the run, to abandon it at the time limit (nothing may then be written).
   */
  private record Submitted(ImageRow row, AtomicBoolean claim, Future<PreparedImage> future) {

    /**
     * The prepared image, waiting at most {@code limitMs}. At the limit the work is abandoned, unless it is already
     * writing its thumbnail: the analysis is then complete, and the write is waited for.
     */
    PreparedImage await(long limitMs) throws TimeoutException, ExecutionException, InterruptedException {
      try {
        return future.get(limitMs, TimeUnit.MILLISECONDS);
      } catch (TimeoutException e) {
        if (claim.compareAndSet(false, true)) {
          future.cancel(true);
          throw e;
        }
        return future.get();
      }
    }

    /** Abandons the work, or, when the worker has claimed it, waits for its thumbnail write to end. */
    void abandon() {
      if (claim.compareAndSet(false, true)) {
        future.cancel(true);
        return;
      }
      boolean interrupted = false;
      while (!future.isDone()) {
        try {
          future.get();
        } catch (ExecutionException e) {
          break; // the run is stopping on another error; this file's own failure is not recorded
        } catch (InterruptedException e) {
          interrupted = true; // a thumbnail write is short: finish waiting, then restore the flag
        }
      }
      if (interrupted) {
        Thread.currentThread().interrupt();
      }
    }
  }

  private PreparedImage prepare(ImageAnalyzer analyzer, Thumbnails thumbnails, ImageRow row, AtomicBoolean claim)
      throws IOException {
    Path file = Path.of(row.path());
    PreparedImage p = analyzer.prepare(file, row.contentHash());
    if (!claim.compareAndSet(false, true)) {
      return p; // abandoned at the time limit: the run has moved on and nothing may be written for this file
    }
    try {
      Path base = library.catalog().thumbnailBase(row.id());
      Files.createDirectories(base.getParent());
      thumbnails.write(p.decoded().analysis(), base.getParent(), base.getFileName().toString());
    } catch (IOException e) {
      if (DiskSpace.isFull(e)) {
        throw e;
      }
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
        fail(r, new FailureKind.Failure(FailureKind.MODEL_FAILED, "appearance model failed: " + e.getMessage()),
            failures);
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
        fail(rows.get(i), new FailureKind.Failure(FailureKind.INVALID_VECTOR,
            "analysis produced an invalid vector (NaN); please report this file"), failures);
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


  private void fail(ImageRow row, FailureKind.Failure failure, List<IndexReport.FileFailure> failures) {
    library.catalog().inTransaction(c -> {
      library.images().markFailed(row.id(), failure.reason(), failure.kind().name(), failure.declaredPixels());
      return null;
    });
    failures.add(new IndexReport.FileFailure(row.path(), failure.reason()));
    LOG.info("{}: {}", row.path(), failure.reason());
  }
}
