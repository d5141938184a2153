package org.morphscout.indexer.vector;

import java.util.Objects;
import org.apache.lucene.codecs.lucene99.Lucene99HnswVectorsFormat;

/**
 * Tuning of the {@link LuceneVectorIndex} HNSW graphs. Immutable; validated on construction.
 *
 * <p>Terms from Malkov and Yashunin (HNSW): {@code maxConn} is the paper's <i>M</i>, {@code beamWidth} is
 * <i>efConstruction</i>, and the query candidate count from {@link #candidates(int)} plays the role of <i>ef</i> at
 * search time.
 *
 * @param maxConn neighbours kept per node and layer (<i>M</i>), 1 to 512, default {@value #DEFAULT_MAX_CONN}. Raise to
 *     32..48 for vectors of high intrinsic dimension (recall up, memory and build time up roughly in proportion).
 * @param beamWidth candidate list size while inserting (<i>efConstruction</i>), 1 to 3200, default
 *     {@value #DEFAULT_BEAM_WIDTH}. Raising it gives a better graph (higher recall at the same query cost) at a build
 *     time roughly linear in it; 200 is a common choice when indexing time does not matter.
 * @param quantization how the searched copy of each vector is stored, default {@link Quantization#NONE}
 * @param fanOutMultiplier candidates fetched per wanted result, at least 1, default
 *     {@value #DEFAULT_FAN_OUT_MULTIPLIER}: the cheapest recall knob, needs no rebuild, query time grows about linearly
 * @param minCandidates lower bound on candidates per query, at least 1, default {@value #DEFAULT_MIN_CANDIDATES}, so
 *     small {@code k} still searches a useful part of the graph
 * @param ramBufferMb indexing buffer before Lucene writes a segment, in MiB, 1 to 2047, default
 *     {@value #DEFAULT_RAM_BUFFER_MB}; bigger buffers mean fewer segments (each is searched separately) and merges
 */
public record LuceneIndexOptions(
    int maxConn, int beamWidth, Quantization quantization, int fanOutMultiplier, int minCandidates, int ramBufferMb) {

  /** How the vectors that HNSW compares are stored. The full float vectors are always kept as well. */
  public enum Quantization {
    /** 32-bit floats: exact scores during graph search; 4 bytes per dimension. */
    NONE,
    /**
     * One byte per dimension (Lucene's scalar quantisation to 7 bits between per-segment quantiles): the graph
     * search reads a quarter of the memory, at a small recall cost that the exact float rescoring of the candidates
     * mostly recovers. Worth it from roughly a hundred thousand images or when memory is tight. Disk use grows
     * (floats + bytes).
     */
    INT8
  }

  public static final int DEFAULT_MAX_CONN = 16;
  public static final int DEFAULT_BEAM_WIDTH = 100;
  /**
   * Candidate defaults. On embedding-like 560-d vectors (Gaussian clusters in a 32-d latent space; docs/BENCHMARKS.md,
   * run of 2026-12-02) recall@10 was 1.000 with 50, 100 and 200 candidates at 10k, 100k and 1M vectors, float and
   * int8, while the query cost grew with the candidates: at 100k float 0.46, 0.56 and 1.29 ms CPU, at 1M float 1.6,
   * 2.1 and 3.4 ms. On uniform random unit vectors (no structure; the hard case of LuceneVectorIndexRecallTest,
   * 10,000 x 64-d) recall@10 is 0.82 with 50, 0.94 with 100 and 0.99 with 200 candidates. 100 keeps a margin over
   * the point where real descriptors saturate and is more than twice as fast as 200; libraries of unusual
   * descriptors may want more ({@link #withFanOut}).
   */
  public static final int DEFAULT_FAN_OUT_MULTIPLIER = 5;

  public static final int DEFAULT_MIN_CANDIDATES = 100;
  public static final int DEFAULT_RAM_BUFFER_MB = 64;

  /** Upper bound on candidates per query unless {@code k} itself is larger: keeps a careless fan-out bounded. */
  static final int MAX_CANDIDATES = 10_000;

  public LuceneIndexOptions {
    Objects.requireNonNull(quantization, "quantization");
    requireRange("maxConn", maxConn, 1, Lucene99HnswVectorsFormat.MAXIMUM_MAX_CONN);
    requireRange("beamWidth", beamWidth, 1, Lucene99HnswVectorsFormat.MAXIMUM_BEAM_WIDTH);
    requireRange("fanOutMultiplier", fanOutMultiplier, 1, 1000);
    requireRange("minCandidates", minCandidates, 1, MAX_CANDIDATES);
    requireRange("ramBufferMb", ramBufferMb, 1, 2047);
  }

  /** The defaults listed on the record components. */
  public static LuceneIndexOptions defaults() {
    return new LuceneIndexOptions(
        DEFAULT_MAX_CONN, DEFAULT_BEAM_WIDTH, Quantization.NONE, DEFAULT_FAN_OUT_MULTIPLIER,
        DEFAULT_MIN_CANDIDATES, DEFAULT_RAM_BUFFER_MB);
  }

  public LuceneIndexOptions withQuantization(Quantization q) {
    return new LuceneIndexOptions(maxConn, beamWidth, q, fanOutMultiplier, minCandidates, ramBufferMb);
  }

  public LuceneIndexOptions withGraph(int newMaxConn, int newBeamWidth) {
    return new LuceneIndexOptions(newMaxConn, newBeamWidth, quantization, fanOutMultiplier, minCandidates, ramBufferMb);
  }

  public LuceneIndexOptions withFanOut(int multiplier, int minimum) {
    return new LuceneIndexOptions(maxConn, beamWidth, quantization, multiplier, minimum, ramBufferMb);
  }

  /**
   * How many candidates to take from the graph for {@code k} results: {@code max(k * fanOutMultiplier,
   * minCandidates)}, capped at {@code max(k, 10000)}. The candidates are rescored exactly and the best {@code k} kept.
   */
  public int candidates(int k) {
    if (k < 1) {
      throw new IllegalArgumentException("k must be at least 1: " + k);
    }
    long wanted = Math.max((long) k * fanOutMultiplier, minCandidates);
    return (int) Math.min(wanted, Math.max(k, MAX_CANDIDATES));
  }

  private static void requireRange(String name, int value, int min, int max) {
    if (value < min || value > max) {
      throw new IllegalArgumentException(name + " must be in [" + min + ", " + max + "]: " + value);
    }
  }
}
