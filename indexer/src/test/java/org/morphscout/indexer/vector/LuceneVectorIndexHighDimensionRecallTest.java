package org.morphscout.indexer.vector;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.morphscout.indexer.vector.LuceneIndexOptions.Quantization;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Recall@10 at an embedding-like length (560) with default options, on 3,000 seeded vectors near a 16-dimensional
 * subspace ({@link TestVectors#lowIntrinsicUnits}), 100 queries from the same distribution. Kept to 3,000 vectors so
 * the test stays fast; the 10,000-vector runs, and uniform 560-d data (a much harder case), are in
 * LuceneVectorIndexRecallBenchmark. Measured with the default seed: 1.000 for float and int8.
 */
class LuceneVectorIndexHighDimensionRecallTest {
  private static final Logger LOG = LoggerFactory.getLogger(LuceneVectorIndexHighDimensionRecallTest.class);

  @TempDir Path temp;

  @ParameterizedTest
  @EnumSource(Quantization.class)
  void recallAt10On3000EmbeddingLikeVectorsOf560Dimensions(Quantization quantization) throws IOException {
    Random random = new Random(TestVectors.SEED);
    float[][] all = TestVectors.lowIntrinsicUnits(random, 3_100, 560, 16, 0.3);
    float[][] vectors = Arrays.copyOf(all, 3_000);
    float[][] queries = Arrays.copyOfRange(all, 3_000, 3_100);
    BruteForceVectorIndex exact = new BruteForceVectorIndex();
    RecallMeter.load(exact, vectors);
    LuceneIndexOptions options = LuceneIndexOptions.defaults().withQuantization(quantization);
    try (LuceneVectorIndex hnsw = LuceneVectorIndex.open(temp.resolve("vectors"), options)) {
      long buildMs = RecallMeter.load(hnsw, vectors);
      RecallMeter.Result result = RecallMeter.measure(hnsw, exact, vectors, queries, 10);
      LOG.info("recall@10 {} ({}; 3000 x 560-d, intrinsic 16; build {} ms CPU, query {} ms CPU; seed {})",
          String.format("%.3f", result.recall()), quantization, buildMs,
          String.format("%.2f", result.meanQueryCpuMillis()), TestVectors.SEED);
      assertThat(result.recall())
          .as("recall@10, %s, seed=%d", quantization, TestVectors.SEED)
          .isGreaterThanOrEqualTo(0.95);
    }
  }
}
