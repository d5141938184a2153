package org.morphscout.app.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.ingest.DecodeOptions;
import org.morphscout.indexer.ingest.ImageDecoder;
import org.morphscout.indexer.ingest.OpenCvJpegDecoder;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.library.IndexOptions;
import org.morphscout.indexer.library.IndexReport;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.LibraryIndexer;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;

/**
 * Indexing throughput of {@link LibraryIndexer} (scan, hash, decode, silhouette, shape, colour, appearance model,
 * thumbnails, catalog, vector index, neighbour graph) next to its floor: the same decoder with the same options on
 * the same number of threads, doing nothing else. The decode-only pass runs first, so both read the files from the
 * page cache. A small warm-up index (a few of the files, into a throwaway catalog) runs before timing, so JIT
 * compilation and the model's first load are not counted.
 */
public final class IndexingBenchmark {

  /**
   * @param images photos indexed
   * @param threads worker threads of both passes
   * @param silhouettes the silhouette extractor of the indexing run
   * @param decodeOnlyPerSecond images per second of the decode-only pass
   * @param indexPerSecond images per second of the full indexing run
   * @param decodeCpuSecondsPerImage process CPU seconds per image of the decode-only pass
   * @param indexCpuSecondsPerImage process CPU seconds per image of the indexing run
   * @param peakHeapBytes peak heap during the indexing run (sum of the heap pools' peaks)
   * @param failures files the indexer could not index (should be 0)
   */
  public record Result(int images, int threads, AnalysisSetup.SilhouetteMode silhouettes, double decodeOnlyPerSecond, double indexPerSecond,
      double decodeCpuSecondsPerImage, double indexCpuSecondsPerImage, long peakHeapBytes, int failures) {
    /** Indexing throughput as a fraction of the decode-only floor. */
    public double ratio() {
      return indexPerSecond / decodeOnlyPerSecond;
    }

    /**
     * The same ratio by CPU time (decode CPU per image over indexing CPU per image): what the ratio would be on an
     * otherwise idle machine whose cores the work keeps busy.
     */
    public double cpuRatio() {
      return decodeCpuSecondsPerImage / indexCpuSecondsPerImage;
    }
  }

  private IndexingBenchmark() {}

  /**
   * Indexing with the library's default analysis (classical silhouettes) on the default number of threads.
   *
   * @param photoDir a folder holding only the photos to index
   * @param workDir an empty scratch folder (catalogs are made in it)
   */
  public static Result run(Path photoDir, Path workDir) throws IOException {
    return run(photoDir, workDir, IndexOptions.defaults().threads(), AnalysisSetup.defaults());
  }

  /**
   * The decode-only floor and indexing at every thread count of {@code threadCounts}, once per silhouette extractor
   * of {@code silhouettes}, in that order (so the photos are read from the page cache after the first pass).
   */
  public static List<Result> scaling(Path photoDir, Path workDir, List<Integer> threadCounts,
      List<AnalysisSetup.SilhouetteMode> silhouettes) throws IOException {
    List<Result> results = new ArrayList<>();
    for (AnalysisSetup.SilhouetteMode mode : silhouettes) {
      for (int threads : threadCounts) {
        Path dir = Files.createDirectories(workDir.resolve(mode.name().toLowerCase(java.util.Locale.ROOT) + "-"
            + threads));
        results.add(run(photoDir, dir, threads, AnalysisSetup.defaults().withSilhouettes(mode)));
      }
    }
    return results;
  }

  /**
   * @param photoDir a folder holding only the photos to index
   * @param workDir an empty scratch folder (catalogs are made in it)
   * @param threads worker threads of both passes
   * @param setup the analysis of the indexing run
   */
  public static Result run(Path photoDir, Path workDir, int threads, AnalysisSetup setup) throws IOException {
    List<Path> photos;
    try (var files = Files.list(photoDir)) {
      photos = files.filter(Files::isRegularFile).sorted().toList();
    }
    if (photos.isEmpty()) {
      throw new MorphscoutException("No photos to index in " + photoDir);
    }
    IndexOptions options = IndexOptions.defaults().withThreads(threads);

    Path warmRoot = Files.createDirectories(workDir.resolve("warm-up-photos"));
    for (Path p : photos.subList(0, Math.min(6, photos.size()))) {
      Files.copy(p, warmRoot.resolve(p.getFileName()));
    }
    index(warmRoot, workDir.resolve("warm-up-catalog"), options, setup);
    decodeAll(photos.subList(0, Math.min(6, photos.size())), threads);

    long c0 = CpuClock.processNanos();
    long t0 = System.nanoTime();
    decodeAll(photos, threads);
    double decodeSeconds = (System.nanoTime() - t0) / 1e9;
    double decodeCpu = (CpuClock.processNanos() - c0) / 1e9;

    HeapMeter.usedAfterGc();
    HeapMeter.resetPeak();
    c0 = CpuClock.processNanos();
    t0 = System.nanoTime();
    IndexReport report = index(photoDir, workDir.resolve("catalog"), options, setup);
    double indexSeconds = (System.nanoTime() - t0) / 1e9;
    double indexCpu = (CpuClock.processNanos() - c0) / 1e9;
    long peak = HeapMeter.peakSinceReset();
    return new Result(photos.size(), threads, setup.silhouettes(), photos.size() / decodeSeconds,
        photos.size() / indexSeconds, decodeCpu / photos.size(), indexCpu / photos.size(), peak, report.failed());
  }

  private static IndexReport index(Path root, Path catalogDir, IndexOptions options, AnalysisSetup setup)
      throws IOException {
    try (Library library = Library.open(catalogDir)) {
      return new LibraryIndexer(library, setup, options)
          .index(List.of(root), ProgressListener.NONE, CancellationToken.none());
    }
  }

  /** Decodes every file on {@code threads} threads; a failure is an error (the photos are generated). */
  static void decodeAll(List<Path> files, int threads) throws IOException {
    ImageDecoder decoder = OpenCvJpegDecoder.create(DecodeOptions.defaults()); // what index uses
    ExecutorService pool = Executors.newFixedThreadPool(threads, BenchThreads.factory());
    try {
      List<Future<Integer>> done = new ArrayList<>();
      for (Path f : files) {
        done.add(pool.submit(() -> decoder.decode(f).width()));
      }
      for (Future<Integer> d : done) {
        d.get();
      }
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new MorphscoutException("Decode benchmark interrupted", e);
    } catch (ExecutionException e) {
      if (e.getCause() instanceof IOException io) {
        throw io;
      }
      throw new MorphscoutException("Decode benchmark failed: " + e.getCause(), e.getCause());
    } finally {
      pool.shutdownNow();
    }
  }
}
