package org.morphscout.app.bench;

import java.util.SplittableRandom;

/**
 * Embedding-like synthetic vectors: a mixture of Gaussian clusters in a low-dimensional latent space, lifted into
 * {@code dimension} dimensions by a fixed random linear map plus a little isotropic noise, then normalised to unit
 * length. Real image descriptors have a low intrinsic dimension and form clusters (similar products, shoots);
 * uniform random vectors in hundreds of dimensions have neither and are a needlessly pessimistic test of HNSW.
 * Deterministic for a seed; immutable and thread-safe.
 */
public final class SyntheticVectors {
  /** Latent dimension (intrinsic dimension of the data). */
  static final int LATENT = 32;
  /** Standard deviation of the points around their cluster centre, in latent units (centres have sd 1). */
  static final double CLUSTER_SPREAD = 0.6;
  /** Standard deviation of the isotropic noise added per output dimension, relative to the lifted signal. */
  static final double NOISE = 0.05;

  private final int dimension;
  private final long seed;
  private final float[][] lift; // LATENT x dimension
  private final double[][] centres;

  /**
   * @param dimension output dimension, 2 to 4096
   * @param clusters number of clusters, at least 1
   */
  public SyntheticVectors(int dimension, int clusters, long seed) {
    if (dimension < 2 || dimension > 4096 || clusters < 1) {
      throw new IllegalArgumentException("need 2 <= dimension <= 4096 and clusters >= 1: " + dimension + ", "
          + clusters);
    }
    this.dimension = dimension;
    this.seed = seed;
    SplittableRandom rnd = new SplittableRandom(seed);
    lift = new float[LATENT][dimension];
    double scale = 1 / Math.sqrt(LATENT);
    for (float[] row : lift) {
      for (int d = 0; d < dimension; d++) {
        row[d] = (float) (gaussian(rnd) * scale);
      }
    }
    centres = new double[clusters][LATENT];
    for (double[] c : centres) {
      for (int i = 0; i < LATENT; i++) {
        c[i] = gaussian(rnd);
      }
    }
  }

  public int dimension() {
    return dimension;
  }

  /**
   * The {@code index}-th vector of stream {@code stream} (0 = the indexed data, 1 = queries, ...): the same
   * arguments always give the same vector, so large sets need not be kept to be regenerated.
   */
  public float[] vector(int stream, long index) {
    SplittableRandom rnd = new SplittableRandom(seed * 31 + stream * 1_000_003L + index * 0x9E3779B97F4A7C15L);
    double[] c = centres[rnd.nextInt(centres.length)];
    double[] z = new double[LATENT];
    for (int i = 0; i < LATENT; i++) {
      z[i] = c[i] + CLUSTER_SPREAD * gaussian(rnd);
    }
    float[] v = new float[dimension];
    for (int i = 0; i < LATENT; i++) {
      float zi = (float) z[i];
      float[] row = lift[i];
      for (int d = 0; d < dimension; d++) {
        v[d] += zi * row[d];
      }
    }
    double norm = 0;
    for (int d = 0; d < dimension; d++) {
      v[d] += (float) (NOISE * gaussian(rnd));
      norm += v[d] * v[d];
    }
    float inv = (float) (1 / Math.sqrt(norm));
    for (int d = 0; d < dimension; d++) {
      v[d] *= inv;
    }
    return v;
  }

  /** Standard normal deviate (Box-Muller; one of the pair is dropped for simplicity). */
  private static double gaussian(SplittableRandom rnd) {
    double u = 1 - rnd.nextDouble(); // (0, 1]: log stays finite
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rnd.nextDouble());
  }
}
