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

/**
 * Recall@10 at an embedding-like length (560) with default options, on 3,000 seeded vectors near a 16-dimensional
 * subspace ({@link TestVectors#lowIntrinsicUnits}), 100 queries from the same distribution. Kept to 3,000 vectors so
 * the test stays fast; the 10,000-vector runs, and uniform 560-d data (a much harder case), are in
 * LuceneVectorIndexRecallBenchmark. Measured with the default seed: 1.000 for float and int8.
 */
class LuceneVectorIndexHighDimensionRecallTest {
  @TempDir Path temp;

  @ParameterizedTest
  @EnumSource(Quantization.class)
  void recallAt10On3000EmbeddingLikeVectorsOf560Dimensions(Quantization quantization) throws IOException {
    Random random = new Random(TestVectors.SEED);
    float[][] all = TestVectors.lowIntrinsicUnits(random, 3_100, 560, 16, 0.3);
    float[][] vectors = Arrays.copyOf(all, 3_000);
    float[][] queries = Arrays.copyOfRange(all, 3_000, 3_100);
    RecallMeter.Result result = RecallMeter.hnswRecallAt10(temp.resolve("vectors"), quantization, vectors, queries,
        "3000 x 560-d, intrinsic 16");
    assertThat(result.recall())
        .as("recall@10, %s, seed=%d", quantization, TestVectors.SEED)
        .isGreaterThanOrEqualTo(0.95);
  }
}
