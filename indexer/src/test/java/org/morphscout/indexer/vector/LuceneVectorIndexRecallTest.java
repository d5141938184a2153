package org.morphscout.indexer.vector;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Random;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.morphscout.indexer.vector.LuceneIndexOptions.Quantization;

/**
 * Recall@10 of the HNSW index against exact search, on 10,000 seeded uniform random unit vectors of 64 dimensions,
 * averaged over 100 random queries. Uniform data on the sphere is a hard case for graph indexes (no structure;
 * neighbours barely closer than the rest), so real embeddings do better: the default candidate count (100) is tuned
 * for those (LuceneVectorIndexHighDimensionRecallTest), and this test asks for 200 candidates, as a library of such
 * descriptors would. Measured with the default seed: 0.998 (float) and 0.997 (int8; the exact rescoring recovers the
 * quantisation loss); 0.94 with the default 100.
 */
class LuceneVectorIndexRecallTest {
  @TempDir Path temp;

  @ParameterizedTest
  @EnumSource(Quantization.class)
  void recallAt10On10000UniformVectorsOf64Dimensions(Quantization quantization) throws IOException {
    Random random = new Random(TestVectors.SEED);
    float[][] vectors = TestVectors.randomUnits(random, 10_000, 64);
    float[][] queries = TestVectors.randomUnits(random, 100, 64);
    RecallMeter.Result result = RecallMeter.hnswRecallAt10(temp.resolve("vectors"),
        LuceneIndexOptions.defaults().withQuantization(quantization).withFanOut(5, 200), vectors, queries,
        "10000 x 64-d uniform");
    assertThat(result.recall())
        .as("recall@10, %s, seed=%d", quantization, TestVectors.SEED)
        .isGreaterThanOrEqualTo(0.95);
  }
}
