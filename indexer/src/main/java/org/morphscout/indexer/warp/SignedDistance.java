package org.morphscout.indexer.warp;

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
  private static final float INF = 1e20f;

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

  /** In place: f holds 0 at sites and INF elsewhere; becomes the squared distance to the nearest site. */
  private static void squaredDistance(float[] f, int w, int h) {
    int n = Math.max(w, h);
    float[] line = new float[n];
    float[] res = new float[n];
    int[] v = new int[n];
    float[] z = new float[n + 1];
    for (int y = 0; y < h; y++) {
      System.arraycopy(f, y * w, line, 0, w);
      oneDimension(line, w, res, v, z);
      System.arraycopy(res, 0, f, y * w, w);
    }
    for (int x = 0; x < w; x++) {
      for (int y = 0; y < h; y++) {
        line[y] = f[y * w + x];
      }
      oneDimension(line, h, res, v, z);
      for (int y = 0; y < h; y++) {
        f[y * w + x] = res[y];
      }
    }
  }

  /** Felzenszwalb-Huttenlocher 1-D transform of f[0..n) into d; v and z are scratch. */
  private static void oneDimension(float[] f, int n, float[] d, int[] v, float[] z) {
    int k = 0;
    v[0] = 0;
    z[0] = -INF;
    z[1] = INF;
    for (int q = 1; q < n; q++) {
      float s;
      while (true) {
        int p = v[k];
        s = ((f[q] + (float) q * q) - (f[p] + (float) p * p)) / (2f * q - 2f * p);
        if (s <= z[k] && k > 0) {
          k--;
        } else {
          break;
        }
      }
      if (s <= z[k]) {
        // k == 0 and the new parabola dominates the only one kept: replace it.
        v[0] = q;
        z[0] = -INF;
        z[1] = INF;
        continue;
      }
      k++;
      v[k] = q;
      z[k] = s;
      z[k + 1] = INF;
    }
    k = 0;
    for (int q = 0; q < n; q++) {
      while (z[k + 1] < q) {
        k++;
      }
      float dq = q - v[k];
      d[q] = dq * dq + f[v[k]];
    }
  }
}
