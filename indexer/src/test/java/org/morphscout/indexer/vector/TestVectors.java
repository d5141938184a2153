package org.morphscout.indexer.vector;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import java.util.Set;

/** Seeded random vectors and a plain exact ranking, for the vector index tests. */
final class TestVectors {
  /** Override with -Dmorphscout.test.seed=... to reproduce or vary a run; every failure message prints it. */
  static final long SEED = Long.getLong("morphscout.test.seed", 0x5EED_2026L);

  private TestVectors() {}

  /** A Gaussian vector scaled to unit length: uniformly distributed on the sphere (Muller 1959, common practice). */
  static float[] randomUnit(Random random, int dim) {
    float[] v = new float[dim];
    double norm = 0;
    for (int i = 0; i < dim; i++) {
      v[i] = (float) random.nextGaussian();
      norm += (double) v[i] * v[i];
    }
    double scale = 1 / Math.sqrt(norm);
    for (int i = 0; i < dim; i++) {
      v[i] = (float) (v[i] * scale);
    }
    return v;
  }

  static float[][] randomUnits(Random random, int count, int dim) {
    float[][] vectors = new float[count][];
    for (int i = 0; i < count; i++) {
      vectors[i] = randomUnit(random, dim);
    }
    return vectors;
  }

  /**
   * Unit vectors of length {@code dim} lying near a random {@code latent}-dimensional subspace: v = A z + noise * e,
   * with A a fixed dim x latent Gaussian matrix, z ~ N(0, I) and e ~ N(0, I), then scaled to unit length. A common
   * synthetic stand-in for learned embeddings, whose intrinsic dimension is far below their length (Pope et al.,
   * "The Intrinsic Dimension of Images and Its Impact on Learning", ICLR 2021, estimate a few tens for natural-image
   * datasets; from memory). {@code noise} is relative to the per-component signal deviation sqrt(latent).
   */
  static float[][] lowIntrinsicUnits(Random random, int count, int dim, int latent, double noise) {
    double[][] basis = new double[latent][dim];
    for (double[] row : basis) {
      for (int j = 0; j < dim; j++) {
        row[j] = random.nextGaussian();
      }
    }
    double noiseSd = noise * Math.sqrt(latent);
    float[][] vectors = new float[count][];
    for (int n = 0; n < count; n++) {
      double[] v = new double[dim];
      for (int i = 0; i < latent; i++) {
        double z = random.nextGaussian();
        for (int j = 0; j < dim; j++) {
          v[j] += z * basis[i][j];
        }
      }
      float[] f = new float[dim];
      for (int j = 0; j < dim; j++) {
        f[j] = (float) (v[j] + noiseSd * random.nextGaussian());
      }
      vectors[n] = VectorMath.unitCopy(f, "test vector");
    }
    return vectors;
  }

  /** Cosine computed independently of the code under test (textbook definition: dot / (|a| |b|)). */
  static double cosine(float[] a, float[] b) {
    double dot = 0, na = 0, nb = 0;
    for (int i = 0; i < a.length; i++) {
      dot += (double) a[i] * b[i];
      na += (double) a[i] * a[i];
      nb += (double) b[i] * b[i];
    }
    return dot / Math.sqrt(na * nb);
  }

  /** Ids (array indices + idBase) of the k vectors closest to query by cosine, best first, skipping exclude. */
  static List<Long> exactTop(float[][] vectors, long idBase, float[] query, int k, Set<Long> exclude) {
    List<Integer> order = new ArrayList<>();
    for (int i = 0; i < vectors.length; i++) {
      if (vectors[i] != null && !exclude.contains(idBase + i)) {
        order.add(i);
      }
    }
    order.sort(Comparator.comparingDouble((Integer i) -> -cosine(vectors[i], query)));
    return order.stream().limit(k).map(i -> idBase + i).toList();
  }
}
