package org.morphscout.indexer.silhouette;

/**
 * Exact Euclidean distance transform of a binary raster: the squared distance of every pixel to the nearest "site"
 * pixel, by the separable lower-envelope-of-parabolas algorithm of Felzenszwalb and Huttenlocher, "Distance Transforms
 * of Sampled Functions", Theory of Computing 8(19), 2012. O(pixels). Used by morphology with disk elements and by the
 * signed distance maps of warp estimation. Thread-safe (stateless).
 */
public final class DistanceTransform {
  /** The value for "no site on this line yet"; larger than any squared distance in an image. */
  public static final float FAR = 1e20f;
  private static final float INF = FAR;

  private DistanceTransform() {}

  /**
   * Squared distance of each pixel to the nearest pixel whose mask value equals {@code feature} (0 or non-zero).
   * Pixels of that value get 0; when there is none at all, every pixel gets {@link #FAR}.
   */
  public static float[] squared(byte[] mask, int width, int height, byte feature) {
    float[] g = new float[mask.length];
    for (int i = 0; i < g.length; i++) {
      g[i] = (mask[i] != 0) == (feature != 0) ? 0f : INF;
    }
    squaredInPlace(g, width, height);
    return g;
  }

  /** In place: {@code f} holds 0 at sites and {@link #FAR} elsewhere, and becomes the squared distance to them. */
  public static void squaredInPlace(float[] g, int width, int height) {
    int n = Math.max(width, height);
    float[] f = new float[n];
    float[] out = new float[n];
    int[] v = new int[n];
    float[] z = new float[n + 1];
    for (int x = 0; x < width; x++) {
      for (int y = 0; y < height; y++) {
        f[y] = g[y * width + x];
      }
      transform1d(f, height, out, v, z);
      for (int y = 0; y < height; y++) {
        g[y * width + x] = out[y];
      }
    }
    for (int y = 0; y < height; y++) {
      System.arraycopy(g, y * width, f, 0, width);
      transform1d(f, width, out, v, z);
      System.arraycopy(out, 0, g, y * width, width);
    }
  }

  private static void transform1d(float[] f, int n, float[] d, int[] v, float[] z) {
    int k = 0;
    int first = 0;
    while (first < n && f[first] >= INF) {
      first++;
    }
    if (first == n) {
      for (int q = 0; q < n; q++) {
        d[q] = INF;
      }
      return;
    }
    v[0] = first;
    z[0] = Float.NEGATIVE_INFINITY;
    z[1] = Float.POSITIVE_INFINITY;
    for (int q = first + 1; q < n; q++) {
      if (f[q] >= INF) {
        continue; // infinite parabolas never form part of the envelope
      }
      float s = intersection(f, q, v[k]);
      while (s <= z[k]) {
        k--;
        s = intersection(f, q, v[k]);
      }
      k++;
      v[k] = q;
      z[k] = s;
      z[k + 1] = Float.POSITIVE_INFINITY;
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
  private static float intersection(float[] f, int q, int p) {
    return ((f[q] + (float) q * q) - (f[p] + (float) p * p)) / (2f * q - 2f * p);
  }}
