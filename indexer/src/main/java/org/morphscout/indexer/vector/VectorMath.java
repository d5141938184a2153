package org.morphscout.indexer.vector;

import org.morphscout.indexer.MorphscoutException;

/**
 * Plain scalar helpers for unit-vector (cosine) search. Deliberately simple loops: this is the reference the
 * optimised Lucene path is checked against. Stateless and thread-safe.
 */
public final class VectorMath {

  private VectorMath() {}

  /** The dot product of two vectors of equal length (summed in double to keep the reference exact to ~1e-7). */
  public static float dot(float[] a, float[] b) {
    if (a.length != b.length) {
      throw new IllegalArgumentException("vector lengths differ: " + a.length + " vs " + b.length);
    }
    double sum = 0;
    for (int i = 0; i < a.length; i++) {
      sum += (double) a[i] * b[i];
    }
    return (float) sum;
  }

  /** The Euclidean (L2) length of {@code v}. */
  public static double norm(float[] v) {
    double sum = 0;
    for (float x : v) {
      sum += (double) x * x;
    }
    return Math.sqrt(sum);
  }

  /**
   * A copy of {@code v} scaled to unit length, so that a dot product of two such copies is their cosine.
   *
   * @param what names the vector for the error message, e.g. "image 42: appearance vector"
   * @throws MorphscoutException when {@code v} is empty, zero, or holds NaN/infinite components: such a vector has
   *     no direction, so no cosine can be computed
   */
  public static float[] unitCopy(float[] v, String what) {
    if (v.length == 0) {
      throw new MorphscoutException(what + " is empty (0 dimensions); cannot search with it.");
    }
    double norm = norm(v);
    if (norm == 0 || !Double.isFinite(norm)) {
      throw new MorphscoutException(
          what + " has " + (norm == 0 ? "zero length" : "NaN or infinite components")
              + ", so it has no direction for cosine similarity; the feature extractor produced a bad vector.");
    }
    float[] unit = new float[v.length];
    for (int i = 0; i < v.length; i++) {
      unit[i] = (float) (v[i] / norm);
    }
    return unit;
  }

  /** Clamps a computed cosine into [-1, 1]: float rounding on unit vectors can overshoot by a few ulps. */
  static float clampCosine(float c) {
    return Math.max(-1f, Math.min(1f, c));
  }
}
