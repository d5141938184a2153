package org.morphscout.indexer.vector;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Path;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.morphscout.indexer.vector.VectorIndex.Field;
import org.morphscout.indexer.vector.VectorIndex.Hit;

/**
 * Measures recall@k of an index against exact search. Recall@k = |approximate top k ∩ exact top k| / k, averaged over
 * the queries: the measure of the ANN-Benchmarks suite (Aumüller, Bernhardsson and Faithfull, Information Systems 87,
 * 2020) and of Malkov and Yashunin's HNSW paper. Query time is thread CPU time, so a busy machine does not skew it.
 */
final class RecallMeter {
  record Result(double recall, double meanQueryCpuMillis) {}

  private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

  private RecallMeter() {}

  /**
   * Builds an HNSW index of {@code vectors} in {@code dir} with the default options and {@code quantization},
   * measures recall@10 of {@code queries} against an exact scan, logs the figures under {@code label} and returns them.
   */
  static Result hnswRecallAt10(Path dir, LuceneIndexOptions.Quantization quantization, float[][] vectors,
      float[][] queries, String label) throws IOException {
    return hnswRecallAt10(dir, LuceneIndexOptions.defaults().withQuantization(quantization), vectors, queries, label);
  }

  /** As above with the given options. */
  static Result hnswRecallAt10(Path dir, LuceneIndexOptions options, float[][] vectors, float[][] queries,
      String label) throws IOException {
    LuceneIndexOptions.Quantization quantization = options.quantization();
    BruteForceVectorIndex exact = new BruteForceVectorIndex();
    load(exact, vectors);
    try (LuceneVectorIndex hnsw = LuceneVectorIndex.open(dir, options)) {
      long buildMs = load(hnsw, vectors);
      Result result = measure(hnsw, exact, vectors, queries, 10);
      org.slf4j.LoggerFactory.getLogger(RecallMeter.class).info(
          "recall@10 {} ({}; {}; build {} ms CPU, query {} ms CPU; seed {})", String.format("%.3f", result.recall()),
          quantization, label, buildMs, String.format("%.2f", result.meanQueryCpuMillis()), TestVectors.SEED);
      return result;
    }
  }

  /** Loads {@code vectors} (ids = indices) into the index as appearance vectors and commits; returns CPU ms spent. */
  static long load(VectorIndex index, float[][] vectors) throws IOException {
    long start = THREADS.getCurrentThreadCpuTime();
    for (int i = 0; i < vectors.length; i++) {
      index.upsert(i, vectors[i], null);
    }
    index.commit();
    return (THREADS.getCurrentThreadCpuTime() - start) / 1_000_000;
  }

  /**
   * Recall of {@code approximate} against {@code exact} (both loaded with {@code vectors}); also checks that every
   * returned similarity is the exact cosine, since the Lucene index rescores its candidates.
   */
  static Result measure(VectorIndex approximate, VectorIndex exact, float[][] vectors, float[][] queries, int k)
      throws IOException {
    double recallSum = 0;
    long cpu = 0;
    for (float[] query : queries) {
      long start = THREADS.getCurrentThreadCpuTime();
      List<Hit> found = approximate.search(Field.APPEARANCE, query, k, Set.of());
      cpu += THREADS.getCurrentThreadCpuTime() - start;
      Set<Long> truth = new HashSet<>();
      exact.search(Field.APPEARANCE, query, k, Set.of()).forEach(h -> truth.add(h.id()));
      assertThat(found).hasSize(k);
      for (Hit hit : found) {
        if (truth.contains(hit.id())) {
          recallSum += 1.0 / k;
        }
        assertThat((double) hit.similarity())
            .as("similarity of %d, seed=%d", hit.id(), TestVectors.SEED)
            .isCloseTo(TestVectors.cosine(vectors[(int) hit.id()], query), within(1e-5));
      }
    }
    return new Result(recallSum / queries.length, cpu / 1e6 / queries.length);
  }
}
