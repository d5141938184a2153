package org.morphscout.indexer.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.apache.lucene.util.VectorUtil;
import org.morphscout.indexer.vector.LuceneIndexOptions;
import org.morphscout.indexer.vector.LuceneVectorIndex;
import org.morphscout.indexer.vector.VectorIndex;

/**
 * k-nearest-neighbour search on {@link LuceneVectorIndex} (the production code path: HNSW candidates, exact float
 * rescoring) against an exact scan of the same vectors, on {@link SyntheticVectors}.
 *
 * <p>The exact scan is a flat loop of Lucene's {@link VectorUtil#dotProduct} (SIMD when the vector module is on), so
 * the speed-up is measured against a fair scan, not a slow one. The index's heap is the used-heap difference with the
 * finished index open read-only and warmed up, against before it was built; Lucene keeps vectors and graphs in
 * memory-mapped files, so most of the index lives in the OS page cache, not the heap ({@link Result#diskBytes}).
 */
public final class VectorSearchBenchmark {

  /**
   * @param size vectors indexed, at least 100
   * @param dimension vector dimension (560 = the built-in appearance descriptor)
   * @param quantization float or int8 HNSW vectors
   * @param queries timed queries, at least 10 (plus as many untimed warm-up queries)
   * @param k neighbours per query (10 for recall@10)
   * @param seed seed of the synthetic data
   */
  public record Config(int size, int dimension, LuceneIndexOptions.Quantization quantization, int queries, int k,
      long seed) {
    public Config {
      if (size < 100 || queries < 10 || k < 1 || k > size) {
        throw new IllegalArgumentException("need size >= 100, queries >= 10 and 1 <= k <= size");
      }
    }
  }

  /**
   * @param buildSeconds time to add all vectors and commit (single writer thread)
   * @param knn latency of {@link LuceneVectorIndex#search}
   * @param knnCpu CPU time of the querying thread per search (insensitive to other processes' load)
   * @param scan latency of the exact scan
   * @param recall mean recall@k of the index against the scan
   * @param heapBytes heap held by the open, warmed-up index
   * @param diskBytes the index's files
   */
  public record Result(Config config, double buildSeconds, Latencies knn, Latencies knnCpu, Latencies scan,
      double recall, long heapBytes, long diskBytes) {
    /** Median scan latency over median kNN latency. */
    public double speedUp() {
      return scan.p50Ms() / knn.p50Ms();
    }
  }

  private VectorSearchBenchmark() {}

  /** Runs one configuration, using {@code workDir} (must be empty or absent) for the index. */
  public static Result run(Config config, Path workDir) throws IOException {
    SyntheticVectors gen = new SyntheticVectors(config.dimension(), Math.max(10, config.size() / 100), config.seed());
    float[][] data = new float[config.size()][];
    for (int i = 0; i < data.length; i++) {
      data[i] = gen.vector(0, i);
    }
    float[][] queries = new float[config.queries() * 2][];
    for (int q = 0; q < queries.length; q++) {
      queries[q] = gen.vector(1, q);
    }
    long before = HeapMeter.usedAfterGc();

    // One big RAM buffer: up to ~2 GB the index is written as one segment (one graph), as after a force-merge.
    LuceneIndexOptions options = LuceneIndexOptions.defaults().withQuantization(config.quantization());
    options = new LuceneIndexOptions(options.maxConn(), options.beamWidth(), options.quantization(),
        options.fanOutMultiplier(), options.minCandidates(), 2047);
    long start = System.nanoTime();
    try (LuceneVectorIndex writer = LuceneVectorIndex.open(workDir, options)) {
      for (int i = 0; i < data.length; i++) {
        writer.upsert(i, data[i], null);
      }
      writer.commit();
    }
    double buildSeconds = (System.nanoTime() - start) / 1e9;

    try (LuceneVectorIndex index = LuceneVectorIndex.openReadOnly(workDir, options)) {
      for (int q = config.queries(); q < queries.length; q++) { // warm-up on the second half of the queries
        index.search(VectorIndex.Field.APPEARANCE, queries[q], config.k(), Set.of());
      }
      long[] knnNanos = new long[config.queries()];
      long[] knnCpu = new long[config.queries()];
      long[] scanNanos = new long[config.queries()];
      double recallSum = 0;
      for (int q = 0; q < config.queries(); q++) {
        long c0 = CpuClock.threadNanos();
        long t0 = System.nanoTime();
        List<VectorIndex.Hit> hits = index.search(VectorIndex.Field.APPEARANCE, queries[q], config.k(), Set.of());
        knnNanos[q] = System.nanoTime() - t0;
        knnCpu[q] = CpuClock.threadNanos() - c0;
        t0 = System.nanoTime();
        int[] exact = exactTop(data, queries[q], config.k());
        scanNanos[q] = System.nanoTime() - t0;
        Set<Long> found = new HashSet<>();
        hits.forEach(h -> found.add(h.id()));
        int overlap = 0;
        for (int id : exact) {
          overlap += found.contains((long) id) ? 1 : 0;
        }
        recallSum += (double) overlap / config.k();
      }
      long heap = Math.max(0, HeapMeter.usedAfterGc() - before);
      return new Result(config, buildSeconds, Latencies.ofNanos(knnNanos), Latencies.ofNanos(knnCpu),
          Latencies.ofNanos(scanNanos),
          recallSum / config.queries(), heap, folderBytes(workDir));
    }
  }

  /** The k largest dot products with {@code query}, by a scan with a small insertion-sorted top list. */
  static int[] exactTop(float[][] data, float[] query, int k) {
    int[] ids = new int[k];
    float[] scores = new float[k];
    java.util.Arrays.fill(scores, Float.NEGATIVE_INFINITY);
    for (int i = 0; i < data.length; i++) {
      float s = VectorUtil.dotProduct(query, data[i]);
      if (s > scores[k - 1]) {
        int j = k - 1;
        while (j > 0 && scores[j - 1] < s) {
          scores[j] = scores[j - 1];
          ids[j] = ids[j - 1];
          j--;
        }
        scores[j] = s;
        ids[j] = i;
      }
    }
    return ids;
  }

  static long folderBytes(Path dir) throws IOException {
    try (Stream<Path> files = Files.walk(dir)) {
      return files.filter(Files::isRegularFile).mapToLong(p -> p.toFile().length()).sum();
    }
  }
}
