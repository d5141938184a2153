package org.morphscout.indexer.library;

import java.time.Duration;

/**
 * How an indexing run works.
 *
 * @param threads worker threads for decoding and analysis (default: available processors); more threads use more
 *     memory (about one analysis image, ~2.5 MB at 768 px, per thread in flight)
 * @param batchSize images per appearance-model batch (default 16); larger batches are a little faster per image and
 *     hold more images in memory
 * @param perFileTimeLimit a file that takes longer to read and analyse fails with "timed out" (default 60 s)
 * @param followLinks follow symbolic links that lead out of the roots too (default false: only links whose target
 *     lies inside a root are followed)
 * @param rebuildVectors rebuild the vector index from the vectors stored in the catalog (default false)
 * @param neighbours neighbours kept per image in the neighbour graph (default 24)
 * @param commitEvery images between durable commits of the vector index (default 256); a crash loses at most this much
 *     vector-index work, which the next run restores from the catalog
 * @param int8 store the vectors in the HNSW index as int8 scalar-quantised values (default false): about a quarter of
 *     the index's vector memory, with a small loss of recall; results are re-scored exactly either way. Changing it
 *     rebuilds the vector index from the catalog.
 */
public record IndexOptions(
    int threads,
    int batchSize,
    Duration perFileTimeLimit,
    boolean followLinks,
    boolean rebuildVectors,
    int neighbours,
    int commitEvery,
    boolean int8) {

  public IndexOptions {
    if (threads < 1 || threads > 256) {
      throw new IllegalArgumentException("threads must be 1..256, got " + threads);
    }
    if (batchSize < 1 || batchSize > 512) {
      throw new IllegalArgumentException("batch size must be 1..512, got " + batchSize);
    }
    if (perFileTimeLimit.isNegative() || perFileTimeLimit.isZero()) {
      throw new IllegalArgumentException("per-file time limit must be positive");
    }
    if (neighbours < 1 || neighbours > 256) {
      throw new IllegalArgumentException("neighbours must be 1..256, got " + neighbours);
    }
    if (commitEvery < 1) {
      throw new IllegalArgumentException("commitEvery must be positive");
    }
  }

  public static IndexOptions defaults() {
    return new IndexOptions(Runtime.getRuntime().availableProcessors(), 16, Duration.ofSeconds(60), false, false, 24,
        256, false);
  }

  public IndexOptions withThreads(int n) {
    return new IndexOptions(n, batchSize, perFileTimeLimit, followLinks, rebuildVectors, neighbours, commitEvery, int8);
  }

  public IndexOptions withFollowLinks(boolean follow) {
    return new IndexOptions(threads, batchSize, perFileTimeLimit, follow, rebuildVectors, neighbours, commitEvery, int8);
  }

  public IndexOptions withRebuildVectors(boolean rebuild) {
    return new IndexOptions(threads, batchSize, perFileTimeLimit, followLinks, rebuild, neighbours, commitEvery, int8);
  }

  public IndexOptions withPerFileTimeLimit(Duration limit) {
    return new IndexOptions(threads, batchSize, limit, followLinks, rebuildVectors, neighbours, commitEvery, int8);
  }

  public IndexOptions withNeighbours(int k) {
    return new IndexOptions(threads, batchSize, perFileTimeLimit, followLinks, rebuildVectors, k, commitEvery, int8);
  }

  public IndexOptions withCommitEvery(int n) {
    return new IndexOptions(threads, batchSize, perFileTimeLimit, followLinks, rebuildVectors, neighbours, n, int8);
  }

  public IndexOptions withInt8(boolean quantize) {
    return new IndexOptions(threads, batchSize, perFileTimeLimit, followLinks, rebuildVectors, neighbours, commitEvery,
        quantize);
  }
}
