package org.morphscout.app.bench;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

/** The benchmark's ground truth (exact scan, synthetic data, synthetic graph) against plain reference versions. */
class ExactTopTest {
  private static final long SEED = 42L;

  @Test
  void exactTopEqualsAFullSortOfTheDotProducts() {
    SyntheticVectors gen = new SyntheticVectors(64, 20, SEED);
    float[][] data = new float[2000][];
    for (int i = 0; i < data.length; i++) {
      data[i] = gen.vector(0, i);
    }
    for (int q = 0; q < 20; q++) {
      float[] query = gen.vector(1, q);
      // Plain reference: score everything, sort descending, take 10.
      int[] expected = IntStream.range(0, data.length).boxed()
          .sorted(Comparator.comparingDouble((Integer i) -> -dot(query, data[i])))
          .limit(10).mapToInt(Integer::intValue).toArray();
      assertThat(VectorSearchBenchmark.exactTop(data, query, 10)).as("seed %d, query %d", SEED, q)
          .containsExactly(expected);
    }
  }

  @Test
  void syntheticVectorsAreUnitLengthDeterministicAndClustered() {
    SyntheticVectors a = new SyntheticVectors(560, 50, SEED);
    SyntheticVectors b = new SyntheticVectors(560, 50, SEED);
    float[] v = a.vector(0, 123);
    assertThat(v).containsExactly(b.vector(0, 123));
    assertThat(Math.sqrt(dot(v, v))).as("seed %d", SEED).isBetween(0.9999, 1.0001);
    assertThat(a.vector(0, 124)).isNotEqualTo(v);
    // Clustered: some pairs among 500 vectors are much closer than independent random directions in 560-d, whose
    // cosine has a standard deviation of 1/sqrt(560) ~ 0.04 (common practice: concentration of measure).
    float best = -1;
    for (int j = 1; j < 500; j++) {
      best = Math.max(best, dot(a.vector(0, 0), a.vector(0, j)));
    }
    assertThat(best).as("seed %d", SEED).isGreaterThan(0.5f);
  }

  @Test
  void spatialGridNearestEqualsABruteForceSearch() {
    java.util.SplittableRandom rnd = new java.util.SplittableRandom(SEED);
    int n = 3000;
    double[] x = new double[n];
    double[] y = new double[n];
    for (int i = 0; i < n; i++) {
      x[i] = rnd.nextDouble();
      y[i] = rnd.nextDouble();
    }
    SpatialGrid grid = new SpatialGrid(x, y, 8);
    int mismatches = 0;
    for (int i = 0; i < n; i += 7) {
      final int p = i;
      int[] expected = IntStream.range(0, n).filter(j -> j != p).boxed()
          .sorted(Comparator.comparingDouble((Integer j) -> Math.hypot(x[p] - x[j], y[p] - y[j])))
          .limit(8).mapToInt(Integer::intValue).toArray();
      int[] got = grid.nearest(i, 8);
      Arrays.sort(expected);
      Arrays.sort(got);
      mismatches += Arrays.equals(expected, got) ? 0 : 1;
    }
    // The 5x5 block of cells holding ~8 points each nearly always contains the 8 nearest (documented as approximate).
    assertThat(mismatches).as("seed %d", SEED).isLessThanOrEqualTo(2);
  }

  private static float dot(float[] a, float[] b) {
    float s = 0;
    for (int i = 0; i < a.length; i++) {
      s += a[i] * b[i];
    }
    return s;
  }
}
