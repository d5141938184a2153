package org.morphscout.app.bench;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.vector.LuceneIndexOptions;

/**
 * The benchmarks at small sizes, end to end (run with {@code mvn -P benchmarks -Dgroups=benchmark test}): they
 * finish and their figures are sane. Timings are printed by the bench command, never asserted.
 */
@Tag("benchmark")
class SmallSizesBenchmark {
  private static final long SEED = 7L;

  @Test
  void vectorSearchAtTwoThousandVectorsFindsTheExactNeighbours(@TempDir Path dir) throws Exception {
    VectorSearchBenchmark.Result r = VectorSearchBenchmark.run(new VectorSearchBenchmark.Config(2000, 64,
        LuceneIndexOptions.Quantization.NONE, 20, 10, SEED), dir.resolve("v"));
    // 200 exactly rescored candidates out of 2,000 for k = 10: HNSW recall is essentially perfect at this size
    // (common practice for HNSW with ef >> k on small sets).
    assertThat(r.recall()).as("seed %d", SEED).isGreaterThanOrEqualTo(0.95);
    assertThat(r.knn().count()).isEqualTo(20);
    assertThat(r.diskBytes()).isPositive();
  }

  @Test
  void chainsAndWalksRunOnSmallInputs() {
    ChainBenchmark.Result c = ChainBenchmark.run(5000, 12, 5, SEED);
    assertThat(c.nodes()).isEqualTo(5000);
    assertThat(c.found()).as("seed %d: ends a few neighbour radii apart are connected", SEED).isPositive();
    WalkBenchmark.Result w = WalkBenchmark.run(200, 1, SEED);
    assertThat(w.plan().p50Ms()).isPositive();
  }
}
