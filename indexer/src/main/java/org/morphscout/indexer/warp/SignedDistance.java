package org.morphscout.indexer.warp;

import org.morphscout.indexer.silhouette.DistanceTransform;

/**
 * Truncated Euclidean signed distance transform of a coverage grid: positive inside the object, negative outside,
 * in pixels, clipped to [-limit, limit].
 *
 * <p>Exact squared Euclidean distances by the lower-envelope-of-parabolas algorithm of Felzenszwalb and Huttenlocher
 * (2012, "Distance transforms of sampled functions", Theory of Computing 8), run along rows then columns.
 * Departure: the object boundary is taken half a pixel from the pixel centres (d_in - d_out shifted by 0.5 on each
 * side), so a straight edge gets the same value from both sides.
 */
final class SignedDistance {
  private static final float INF = DistanceTransform.FAR;

  private SignedDistance() {}

  static float[] of(float[] coverage, int w, int h, float limit) {
    float[] inside = new float[w * h];
    float[] outside = new float[w * h];
    for (int i = 0; i < coverage.length; i++) {
      boolean obj = coverage[i] >= 0.5f;
      inside[i] = obj ? INF : 0; // distance to nearest background
      outside[i] = obj ? 0 : INF; // distance to nearest object
    }
    squaredDistance(inside, w, h);
    squaredDistance(outside, w, h);
    float[] out = new float[w * h];
    for (int i = 0; i < out.length; i++) {
      float v = coverage[i] >= 0.5f
          ? (float) Math.sqrt(inside[i]) - 0.5f
          : 0.5f - (float) Math.sqrt(outside[i]);
      out[i] = Math.max(-limit, Math.min(limit, v));
    }
    return out;
  }

  private static void squaredDistance(float[] f, int w, int h) {
    DistanceTransform.squaredInPlace(f, w, h);
  }
}
